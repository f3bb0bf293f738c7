package com.baysheet.sheet;

import com.lowagie.text.Paragraph;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;

import java.util.List;

/** The package cover: project and issue data, the design criteria, the loads used, what the package holds, the seal. */
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
        pair(project, "Prepared by", h.firm());
        pair(project, "Prepared by (engineer)", h.isSubmitted() ? h.preparedBy() + ", " + h.preparedOn() : h.preparedBy());
        pair(project, "Checked by", h.isChecked() ? h.checkedBy() + ", " + h.checkedOn() : "not yet checked");
        pair(project, "Revision and issue date", standing(h));
        pdf.add(project);

        DesignCriteria c = pkg.criteria();
        PdfPTable criteria = Cells.table(25, 75);
        Cells.title(criteria, "Design criteria", fonts);
        pair(criteria, "Code edition", c.edition() + " (the adopted local code and its amendments govern)");
        pair(criteria, "Units", c.units());
        for (String o : c.options()) {
            int colon = o.indexOf(':');
            pair(criteria, colon > 0 ? o.substring(0, colon) : "Option", colon > 0 ? o.substring(colon + 1).strip() : o);
        }
        pdf.add(criteria);

        PdfPTable loads = Cells.table(26, 12, 14, 18, 30);
        Cells.title(loads, "Occupancies and loads used", fonts);
        for (String s : List.of("Occupancy", "Live load L0", "Concentrated", "Dead loads used", "Live load reduction"))
            loads.addCell(Cells.head(s, fonts));
        for (DesignCriteria.LoadRow r : c.loads()) {
            loads.addCell(Cells.text(r.occupancy(), fonts.body()));
            loads.addCell(Cells.right(r.liveLoad(), fonts.body()));
            loads.addCell(Cells.right(r.concentrated(), fonts.body()));
            loads.addCell(Cells.text(r.deadLoad(), fonts.body()));
            loads.addCell(Cells.text(r.reduction(), fonts.body()));
        }
        pdf.add(loads);

        long levels = pkg.sheets().stream().map(MemberSheet::level).distinct().count();
        pdf.add(Cells.line("This package holds " + pkg.sheets().size() + " member sheets on " + levels
                + (levels == 1 ? " level" : " levels") + " and " + pkg.takeDowns().size() + " column take-downs, listed in the index that follows.",
                fonts.body()));
        pdf.add(new ClosingBlock(fonts, false, pkg.header().auditHead()).table(null));
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
