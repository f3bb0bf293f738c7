package com.baysheet.sheet;

import com.baysheet.engine.record.Entry;
import com.lowagie.text.Chunk;
import com.lowagie.text.Element;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfPTable;

import java.util.List;

/** Named values (the inputs, or results that fit no table) in two label/value column pairs. */
final class EntryTable {
    private final Fonts fonts;
    private final Markups markups;

    EntryTable(Fonts fonts, Markups markups) {
        this.fonts = fonts;
        this.markups = markups;
    }

    PdfPTable of(String title, List<Entry> entries) {
        PdfPTable t = Cells.table(30, 20, 30, 20);
        Cells.title(t, title, fonts);
        t.setHeaderRows(1);
        for (Entry e : entries) {
            Phrase label = new Phrase(e.label(), fonts.body());
            String mark = markups.on(e.key());
            if (!mark.isEmpty()) label.add(new Chunk("  " + mark, fonts.mark()));
            t.addCell(Cells.cell(label, Element.ALIGN_LEFT));
            t.addCell(Cells.right(e.shown(), fonts.body()));
        }
        if (entries.size() % 2 == 1) {
            t.addCell(Cells.text("", fonts.body()));
            t.addCell(Cells.text("", fonts.body()));
        }
        return t;
    }
}
