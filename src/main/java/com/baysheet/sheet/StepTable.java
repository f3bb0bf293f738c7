package com.baysheet.sheet;

import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.Step;
import com.lowagie.text.Chunk;
import com.lowagie.text.Element;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfPTable;

import java.util.List;

/**
 * The steps of the calculation, numbered, with the head row repeated on each page. A clause label not
 * confirmed against the printed code (confidence other than "seen") carries a dagger, explained in the notes.
 */
final class StepTable {
    static final String UNCONFIRMED = "†";

    private final Fonts fonts;
    private final Markups markups;
    private final String edition;

    StepTable(Fonts fonts, Markups markups, String edition) {
        this.fonts = fonts;
        this.markups = markups;
        this.edition = edition;
    }

    PdfPTable of(List<Step> steps) {
        PdfPTable t = Cells.table(3.5f, 27, 20, 27, 10, 12.5f);
        Cells.title(t, "Calculation", fonts);
        t.setHeaderRows(2);
        for (String h : new String[]{"No.", "Step", "Formula", "Substituted", "Result", "Clause"}) t.addCell(Cells.head(h, fonts));
        int n = 0;
        for (Step s : steps) {
            n++;
            Phrase no = new Phrase(String.valueOf(n), fonts.smallGrey());
            String mark = markups.on(s.symbol());
            if (!mark.isEmpty()) no.add(new Chunk("\n" + mark, fonts.mark()));
            t.addCell(Cells.cell(no, Element.ALIGN_LEFT));
            t.addCell(Cells.text(s.description(), fonts.body()));
            t.addCell(Cells.text(s.formula(), fonts.body()));
            t.addCell(Cells.text(s.substituted(), fonts.body()));
            t.addCell(Cells.right(s.shown(), fonts.bodyBold()));
            t.addCell(Cells.text(clause(s.clause()), fonts.small()));
        }
        return t;
    }

    String clause(Clause c) {
        if (c == null || c.isNone()) return "";
        String ref = c.edition().equals(edition) || c.edition().isEmpty() ? c.ref() : c.label();
        return unconfirmed(c) ? ref + " " + UNCONFIRMED : ref;
    }

    static boolean unconfirmed(Clause c) { return c != null && !c.isNone() && !"seen".equals(c.confidence()); }
}
