package com.baysheet.sheet;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.record.Step;
import com.lowagie.text.Chunk;
import com.lowagie.text.Element;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;

/** Notes and cautions of the record (cautions marked), the clause footnote, and on a checking copy the markups. */
final class NotesBlock {
    private final PdfaDocument pdf;
    private final Fonts fonts;
    private final CalcRecord r;
    private final Markups markups;

    NotesBlock(PdfaDocument pdf, CalcRecord r, Markups markups) {
        this.pdf = pdf;
        this.fonts = pdf.fonts;
        this.r = r;
        this.markups = markups;
    }

    void write() {
        PdfPTable t = Cells.table(4, 96);
        Cells.title(t, "Notes and cautions", fonts);
        t.setHeaderRows(1);
        int n = 0;
        for (Note note : r.notes()) {
            t.addCell(bare(new Phrase(++n + ".", fonts.body())));
            Phrase p = new Phrase("", fonts.body());
            if (note.level() == Note.Level.CAUTION) p.add(new Chunk("CAUTION  ", fonts.mark()));
            p.add(new Chunk(note.text(), fonts.body()));
            if (note.clause() != null && !note.clause().isNone())
                p.add(new Chunk("  (" + note.clause().label() + ")", fonts.smallGrey()));
            t.addCell(bare(p));
        }
        if (r.steps().stream().map(Step::clause).anyMatch(StepTable::unconfirmed)) {
            t.addCell(bare(new Phrase(StepTable.UNCONFIRMED, fonts.smallGrey())));
            t.addCell(bare(new Phrase("Clause number not yet confirmed against the printed edition: "
                    + "the checking engineer should confirm it against the adopted code.", fonts.smallGrey())));
        }
        pdf.add(t);
        if (markups.checking()) markupTable();
    }

    private static PdfPCell bare(Phrase p) {
        PdfPCell c = Cells.cell(p, Element.ALIGN_LEFT);
        c.setBorder(0);
        c.setPaddingBottom(1.5f);
        return c;
    }

    private void markupTable() {
        PdfPTable t = Cells.table(6, 14, 10, 10, 60);
        Cells.title(t, "Checker's markups", fonts);
        if (markups.list().isEmpty()) {
            PdfPCell none = Cells.text("No markups yet.", fonts.body());
            none.setColspan(5);
            t.addCell(none);
            pdf.add(t);
            return;
        }
        t.setHeaderRows(2);
        for (String h : new String[]{"No.", "On", "By", "Status", "Markup and replies"}) t.addCell(Cells.head(h, fonts));
        int i = 0;
        for (Markup m : markups.list()) {
            t.addCell(Cells.text("M" + ++i, fonts.mark()));
            t.addCell(Cells.text(m.target().isEmpty() ? "whole sheet" : m.target(), fonts.body()));
            t.addCell(Cells.text(m.author(), fonts.body()));
            t.addCell(Cells.text(m.resolved() ? "resolved" : "OPEN", m.resolved() ? fonts.body() : fonts.mark()));
            Phrase text = new Phrase(m.text(), fonts.body());
            for (Markup.Reply reply : m.replies()) text.add(new Chunk("\n" + reply.author() + ": " + reply.text(), fonts.smallGrey()));
            t.addCell(Cells.cell(text, Element.ALIGN_LEFT));
        }
        pdf.add(t);
    }
}
