package com.baysheet.sheet;

import com.baysheet.framing.model.Submittal;
import com.lowagie.text.pdf.PdfPTable;

import java.util.List;

/**
 * The criteria page at the front of a package, as a plan reviewer reads it first: the building code as the
 * jurisdiction adopted it and the load standard used, the units, the occupancies with the loads used, the
 * options (partitions, reduction, snow inputs), the load combinations, the self weights and the scope.
 */
final class CriteriaPage {
    private final PdfaDocument pdf;
    private final CalcPackage pkg;
    private final Fonts fonts;

    CriteriaPage(PdfaDocument pdf, CalcPackage pkg) {
        this.pdf = pdf;
        this.pkg = pkg;
        this.fonts = pdf.fonts;
    }

    void write() {
        DesignCriteria c = pkg.criteria();
        Submittal s = pkg.submittal();
        PdfPTable codes = Cells.table(25, 75);
        Cells.title(codes, "Design criteria", fonts);
        pair(codes, "Building code", s.adoptedCode().isEmpty() ? "not given (enter it in the project's submittal data)" : s.adoptedCode());
        pair(codes, "Loads", c.edition() + " (the adopted local code and its amendments govern)");
        pair(codes, "Units", c.units());
        for (String o : c.options()) {
            int colon = o.indexOf(':');
            pair(codes, colon > 0 ? o.substring(0, colon) : "Option", colon > 0 ? o.substring(colon + 1).strip() : o);
        }
        pdf.add(codes);

        PdfPTable loads = Cells.table(26, 12, 14, 18, 30);
        Cells.title(loads, "Occupancies and loads used", fonts);
        for (String h : List.of("Occupancy", "Live load L0", "Concentrated", "Dead loads used", "Live load reduction"))
            loads.addCell(Cells.head(h, fonts));
        for (DesignCriteria.LoadRow r : c.loads()) {
            loads.addCell(Cells.text(r.occupancy(), fonts.body()));
            loads.addCell(Cells.right(r.liveLoad(), fonts.body()));
            loads.addCell(Cells.right(r.concentrated(), fonts.body()));
            loads.addCell(Cells.text(r.deadLoad(), fonts.body()));
            loads.addCell(Cells.text(r.reduction(), fonts.body()));
        }
        pdf.add(loads);

        PdfPTable rest = Cells.table(25, 75);
        Cells.title(rest, "Combinations, self weights and scope", fonts);
        if (!c.combinations().isEmpty()) pair(rest, "Load combinations (gravity)", String.join("\n", c.combinations()));
        if (!c.selfWeights().isEmpty()) pair(rest, "Self weights", String.join("\n", c.selfWeights()));
        pair(rest, "Materials", "Not part of these calculations: the sheets give the loads, reactions, shears and moments "
                + "that member design takes elsewhere. Lateral loads are not included.");
        pdf.add(rest);
        pdf.add(Cells.line(SchedulePages.CAUTION, fonts.body()));
    }

    private void pair(PdfPTable t, String label, String value) {
        t.addCell(Cells.text(label, fonts.smallGrey()));
        t.addCell(Cells.text(value, fonts.body()));
    }
}
