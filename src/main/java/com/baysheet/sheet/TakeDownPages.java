package com.baysheet.sheet;

import com.baysheet.engine.record.Note;
import com.lowagie.text.Chunk;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;

import java.util.List;

/** The column take-downs, one table per column stack from the roof down, with the clauses used and the notes. */
final class TakeDownPages {
    private final PdfaDocument pdf;
    private final List<TakeDownTable> tables;

    TakeDownPages(PdfaDocument pdf, List<TakeDownTable> tables) {
        this.pdf = pdf;
        this.tables = tables;
    }

    void write() {
        Fonts fonts = pdf.fonts;
        for (TakeDownTable td : tables) {
            float[] widths = new float[td.headings().size()];
            for (int i = 0; i < widths.length; i++) widths[i] = i < 2 ? 9 : 6;
            PdfPTable t = Cells.table(widths);
            Cells.title(t, td.title(), fonts);
            for (String h : td.headings()) t.addCell(Cells.head(h, fonts));
            t.setHeaderRows(2);
            t.setKeepTogether(true);
            for (List<String> row : td.rows())
                for (int i = 0; i < row.size(); i++)
                    t.addCell(i < 2 ? Cells.text(row.get(i), fonts.small()) : Cells.right(row.get(i), fonts.small()));
            Phrase foot = new Phrase("Clauses: " + String.join("; ", td.clauses()), fonts.smallGrey());
            for (Note n : td.notes()) {
                foot.add(new Chunk("\n" + (n.level() == Note.Level.CAUTION ? "CAUTION  " : ""), fonts.mark()));
                foot.add(new Chunk(n.text() + (n.clause() == null || n.clause().isNone() ? "" : " (" + n.clause().label() + ")"), fonts.small()));
            }
            PdfPCell c = Cells.cell(foot, com.lowagie.text.Element.ALIGN_LEFT);
            c.setColspan(widths.length);
            c.setBorder(0);
            t.addCell(c);
            pdf.add(t);
        }
    }
}
