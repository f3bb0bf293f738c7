package com.baysheet.sheet;

import com.baysheet.framing.model.Submittal;
import com.lowagie.text.Paragraph;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;


/** The package cover: project, submittal and issue data, what the package holds, the seal; the design criteria follow on their own page. */
final class Cover {
    private final PdfaDocument pdf;
    private final CalcPackage pkg;
    private final Fonts fonts;
    private final boolean checking;

    Cover(PdfaDocument pdf, CalcPackage pkg, boolean checking) {
        this.pdf = pdf;
        this.pkg = pkg;
        this.fonts = pdf.fonts;
        this.checking = checking;
    }

    void write() {
        SheetHeader h = pkg.header();
        Paragraph title = new Paragraph("Structural calculations: gravity dead and live loads", fonts.title());
        title.setSpacingBefore(18);
        pdf.add(title);
        Paragraph sub = new Paragraph(pkg.title() + " · " + h.project() + " · job " + h.jobNumber(), fonts.heading());
        sub.setSpacingAfter(10);
        pdf.add(sub);

        PdfPTable project = Cells.table(25, 75);
        Cells.title(project, "Project", fonts);
        pair(project, "Project", h.project());
        pair(project, "Job number", h.jobNumber());
        Submittal site = pkg.submittal();
        if (!site.address().isEmpty()) pair(project, "Site address", site.address());
        if (!site.client().isEmpty()) pair(project, "Client", site.client());
        pair(project, "Engineer of record", site.engineerLine().isEmpty() ? "not given" : site.engineerLine());
        if (!site.adoptedCode().isEmpty()) pair(project, "Building code", site.adoptedCode());
        pair(project, "Prepared by", h.firm());
        pair(project, "Prepared by (engineer)", h.isSubmitted() ? h.preparedBy() + ", " + h.preparedOn() : h.preparedBy());
        pair(project, "Checked by", h.isChecked() ? h.checkedBy() + ", " + h.checkedOn() : "not yet checked");
        pair(project, "Revision and issue date", standing(h));
        pdf.add(project);

        long levels = pkg.sheets().stream().map(MemberSheet::level).distinct().count();
        pdf.add(Cells.line("This package holds " + pkg.sheets().size() + " member sheets on " + levels
                + (levels == 1 ? " level" : " levels") + ", " + pkg.plans().size() + " framing plans and " + pkg.takeDowns().size()
                + " column take-downs; the design criteria follow, then the index.",
                fonts.body()));
        pdf.add(new ClosingBlock(fonts, false, pdf.frame.wording(), pkg.header().auditHead()).table(null));
    }

    /**
     * The package's own revision and issue. A checking copy is not an issue, whatever revision it shows; where
     * that revision was issued before (it is in the log), the cover says when.
     */
    private String standing(SheetHeader h) {
        if (!checking && h.isIssued()) return "Revision " + h.revision() + ", issued " + h.issueDate();
        return pkg.revisions().stream().filter(r -> r.label().equals(h.revision())).findFirst()
                .map(r -> "Revision " + h.revision() + ", issued " + r.date() + "; this checking copy, printed " + h.printedOn() + ", is not an issue")
                .orElse("Revision " + h.revision() + ", not issued: checking copy printed " + h.printedOn());
    }

    private void pair(PdfPTable t, String label, String value) {
        PdfPCell l = Cells.text(label, fonts.smallGrey());
        t.addCell(l);
        t.addCell(Cells.text(value, fonts.bodyBold()));
    }
}
