package com.baysheet.sheet;

import com.lowagie.text.pdf.PdfPTable;

/**
 * The revision log: each earlier revision, then the present issue; on a checking copy, the revision being
 * checked, said to be not issued and dated when printed.
 */
final class RevisionLog {
    private final PdfaDocument pdf;
    private final CalcPackage pkg;
    private final boolean checking;

    RevisionLog(PdfaDocument pdf, CalcPackage pkg, boolean checking) {
        this.pdf = pdf;
        this.pkg = pkg;
        this.checking = checking;
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
            boolean issue = !checking && h.isIssued();
            String earlier = pkg.revisions().isEmpty() ? " (no earlier revisions)" : "";
            t.addCell(Cells.text(h.revision(), fonts.bodyBold()));
            t.addCell(Cells.text((issue ? h.issueDate() : h.printedOn()).toString(), fonts.bodyBold()));
            t.addCell(Cells.text(issue ? "This issue" + earlier : "Not issued: checking copy printed on this date" + earlier, fonts.bodyBold()));
            t.addCell(Cells.text(h.signatures(), fonts.bodyBold()));
        }
        pdf.add(t);
    }
}
