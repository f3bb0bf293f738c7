package com.baysheet.sheet;

import com.lowagie.text.pdf.PdfPTable;

/** The revision log: each earlier revision, then the present issue. */
final class RevisionLog {
    private final PdfaDocument pdf;
    private final CalcPackage pkg;

    RevisionLog(PdfaDocument pdf, CalcPackage pkg) {
        this.pdf = pdf;
        this.pkg = pkg;
    }

    void write() {
        Fonts fonts = pdf.fonts;
        PdfPTable t = Cells.table(10, 14, 62, 14);
        Cells.title(t, "Revision log", fonts);
        for (String h : new String[]{"Revision", "Date", "Description", "By"}) t.addCell(Cells.head(h, fonts));
        t.setHeaderRows(2);
        for (Revision r : pkg.revisions()) {
            t.addCell(Cells.text(r.label(), fonts.body()));
            t.addCell(Cells.text(r.date().toString(), fonts.body()));
            t.addCell(Cells.text(r.description(), fonts.body()));
            t.addCell(Cells.text(r.by(), fonts.body()));
        }
        SheetHeader h = pkg.header();
        boolean listed = pkg.revisions().stream().anyMatch(r -> r.label().equals(h.revision()));
        if (!listed) {
            t.addCell(Cells.text(h.revision(), fonts.bodyBold()));
            t.addCell(Cells.text(h.issueDate().toString(), fonts.bodyBold()));
            t.addCell(Cells.text("This issue" + (pkg.revisions().isEmpty() ? " (no earlier revisions)" : ""), fonts.bodyBold()));
            t.addCell(Cells.text(h.preparedBy() + " / " + h.checkedBy(), fonts.bodyBold()));
        }
        pdf.add(t);
    }
}
