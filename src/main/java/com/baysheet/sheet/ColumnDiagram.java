package com.baysheet.sheet;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.ResultKey;
import com.lowagie.text.Element;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;

import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

/**
 * An axial member sketched as a column in elevation with the load arriving at its head, labelled with the
 * record's own axial results (dead, design live, roof live, factored and service), as shown.
 */
final class ColumnDiagram {
    private static final List<ResultKey> KEYS = Stream.of("D", "Ldes", "Lr", "LRFD", "ASD").map(ResultKey::axial).toList();

    private ColumnDiagram() {}

    static PdfTemplate draw(PdfContentByte page, Fonts fonts, CalcRecord record) {
        PdfTemplate t = page.createTemplate(LoadDiagram.WIDTH, LoadDiagram.HEIGHT);
        float cx = 90, base = 22, head = LoadDiagram.HEIGHT - 40;
        t.setColorStroke(Fonts.INK);
        t.setColorFill(Fonts.INK);
        t.setLineWidth(0.8f);
        t.rectangle(cx - 6, base, 12, head - base);
        t.stroke();
        t.setLineWidth(0.5f);
        Drawing.line(t, cx - 22, head, cx + 22, head);                 // the floor it supports
        Drawing.line(t, cx - 18, base, cx + 18, base);                 // footing or column below
        for (float h = cx - 17; h < cx + 18; h += 3) Drawing.line(t, h, base, h - 3, base - 3);
        t.setLineWidth(1.1f);
        Drawing.arrow(t, cx, LoadDiagram.HEIGHT - 8, cx, head + 1.5f, 5f);
        Text.show(t, fonts.bold, 6.5f, Fonts.INK, Element.ALIGN_LEFT, "P", cx + 5, LoadDiagram.HEIGHT - 16);
        float y = head;
        for (Entry e : present(record)) {
            Text.show(t, fonts.regular, 6.5f, Fonts.INK, Element.ALIGN_LEFT, e.label(), cx + 40, y);
            Text.show(t, fonts.bold, 6.5f, Fonts.INK, Element.ALIGN_RIGHT, e.shown(), LoadDiagram.WIDTH - 8, y);
            y -= 11;
        }
        return t;
    }

    private static List<Entry> present(CalcRecord r) {
        List<Entry> out = new ArrayList<>();
        for (ResultKey k : KEYS)
            for (Entry e : r.results()) if (e.key().equals(k.text())) out.add(e);
        return out;
    }
}
