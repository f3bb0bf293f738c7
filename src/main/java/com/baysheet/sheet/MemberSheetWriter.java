package com.baysheet.sheet;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.Step;
import com.baysheet.engine.units.UnitSystem;
import com.lowagie.text.Chunk;
import com.lowagie.text.Element;
import com.lowagie.text.Image;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfTemplate;

import java.util.List;

/**
 * Lays out one member sheet as a hand calculation reads: what the member is, its sketch and key plan, the
 * inputs, each step with its formula, substituted numbers, result and clause, the results with the
 * governing ones set apart, notes and cautions, then the disclaimer and the stamp box. On a checking copy
 * the rows a markup points at carry its number and the markups are listed before the stamp box.
 */
final class MemberSheetWriter {
    private final PdfaDocument pdf;
    private final Fonts fonts;
    private final MemberSheet sheet;
    private final CalcRecord r;
    private final Markups markups;
    private final List<PdfTemplate> drawings = new java.util.ArrayList<>();

    MemberSheetWriter(PdfaDocument pdf, MemberSheet sheet, Markups markups) {
        this.pdf = pdf;
        this.fonts = pdf.fonts;
        this.sheet = sheet;
        this.r = sheet.record();
        this.markups = markups;
    }

    void write() {
        pdf.add(intro());
        pdf.add(figures());
        drawings.forEach(this::release);
        pdf.add(new EntryTable(fonts, markups).of("Design inputs", r.inputs()));
        pdf.add(new StepTable(fonts, markups, r.edition()).of(r.steps()));
        ResultMatrix matrix = new ResultMatrix(fonts, r.results(), r.governing());
        if (!matrix.isEmpty()) pdf.add(matrix.table());
        if (!matrix.others.isEmpty()) pdf.add(new EntryTable(fonts, markups).of("Other results", matrix.others));
        new NotesBlock(pdf, r, markups).write();
        if (!sheet.revisions().isEmpty()) pdf.add(revisionBlock());
        pdf.add(new ClosingBlock(fonts, markups.checking(), pdf.frame.wording(), sheet.header().auditHead()).table(governing()));
    }

    /** The sheet's revision block, as drawings carry one: each issued revision with its date, description and initials. */
    private PdfPTable revisionBlock() {
        PdfPTable t = Cells.table(8, 14, 64, 14);
        Cells.title(t, "Revisions", fonts);
        for (String h : new String[]{"Rev", "Date", "Description", "By"}) t.addCell(Cells.head(h, fonts));
        for (Revision x : sheet.revisions()) {
            t.addCell(Cells.text(x.label(), fonts.body()));
            t.addCell(Cells.text(x.date().toString(), fonts.body()));
            t.addCell(Cells.text(x.description(), fonts.body()));
            t.addCell(Cells.text(x.by(), fonts.body()));
        }
        return t;
    }

    private Paragraph intro() {
        Paragraph p = new Paragraph("", fonts.body());
        p.add(new Chunk(r.subject(), fonts.title()));
        p.add(new Chunk("\n", fonts.body()));
        String kind = text("kind"), support = text("support");
        String where = sheet.level().isEmpty() ? "" : sheet.level() + " · ";
        p.add(new Chunk(where + kind + (support.isEmpty() ? "" : " · " + support) + " · " + r.edition() + " · "
                + (r.units().equals(UnitSystem.SI.name()) ? "SI units" : "US customary units"), fonts.body()));
        p.setSpacingAfter(4);
        return p;
    }

    private String text(String key) {
        for (Entry e : r.inputs()) if (e.key().equals(key)) return e.shown();
        return "";
    }

    /** The drawings are complete once placed: writing them out at once keeps a long package's memory flat. */
    private void release(PdfTemplate t) {
        try {
            pdf.writer.releaseTemplate(t);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private PdfPTable figures() {
        PdfPTable t = Cells.table(LoadDiagram.WIDTH, 10, KeyPlanDrawing.WIDTH);
        UnitSystem system = UnitSystem.parse("units", r.units());
        PdfTemplate diagram = r.sketch().support().equals("axial")
                ? ColumnDiagram.draw(pdf.writer.getDirectContent(), fonts, r)
                : LoadDiagram.draw(pdf.writer.getDirectContent(), fonts, system, r.sketch());
        t.addCell(figure(diagram));
        drawings.add(diagram);
        t.addCell(Cells.blank(fonts));
        if (sheet.keyPlan() != null) {
            PdfTemplate plan = KeyPlanDrawing.draw(pdf.writer.getDirectContent(), fonts, sheet.keyPlan());
            drawings.add(plan);
            t.addCell(figure(plan));
        } else t.addCell(Cells.text("No key plan: this member was entered on its own, not derived from a floor plan.", fonts.smallGrey()));
        t.addCell(caption(r.sketch().support().equals("axial")
                ? "Axial load at the column head (from the results below)."
                : "Load diagram: dead (w_D, P_D) and design live loads (w_L, P_L: floor live reduced, roof live included); service reactions D + L + Lr."
                + keyed(system)));
        t.addCell(Cells.blank(fonts));
        t.addCell(caption(sheet.keyPlan() == null ? "" : "Key plan, " + sheet.keyPlan().level()
                + ": member as a heavy line, tributary area shaded."));
        return t;
    }

    /** The point loads that had no room for their label on the diagram, listed with their positions. */
    private String keyed(UnitSystem system) {
        List<String> key = LoadDiagram.pointLabels(fonts, system, r.sketch()).key();
        return key.isEmpty() ? "" : " Point loads by key: " + String.join("; ", key) + ".";
    }

    private PdfPCell figure(PdfTemplate template) {
        try {
            PdfPCell c = new PdfPCell(Image.getInstance(template), false);
            c.setBorderWidth(0.3f);
            c.setBorderColor(Fonts.RULE);
            c.setPadding(2);
            return c;
        } catch (com.lowagie.text.BadElementException e) {
            throw new IllegalStateException("drawing could not be placed", e);
        }
    }

    private PdfPCell caption(String s) {
        PdfPCell c = Cells.text(s, fonts.smallGrey());
        c.setBorder(0);
        return c;
    }

    private PdfPTable governing() {
        PdfPTable t = Cells.table(70, 30);
        t.setSpacingBefore(0);
        t.setSpacingAfter(8);
        PdfPCell head = Cells.cell(new Phrase("GOVERNING RESULTS", fonts.bodyBold()), Element.ALIGN_LEFT);
        head.setColspan(2);
        head.setBackgroundColor(Fonts.SHADE);
        head.setBorderWidth(1.2f);
        head.setBorderColor(Fonts.INK);
        t.addCell(head);
        for (String key : r.governing()) {
            Entry e = r.entry(key);
            PdfPCell l = Cells.text(e.label(), fonts.bodyBold()), v = Cells.right(e.shown(), fonts.heading());
            for (PdfPCell c : new PdfPCell[]{l, v}) { c.setBorderWidth(1.2f); c.setBorderColor(Fonts.INK); }
            t.addCell(l);
            t.addCell(v);
        }
        return t;
    }
}
