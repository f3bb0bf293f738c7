package com.baysheet.sheet;

import com.baysheet.engine.units.Display;
import com.baysheet.framing.schedule.LoadSchedule;
import com.lowagie.text.Element;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;

import java.util.List;

/**
 * The load summaries of a package, each a table under its title with the unit in every heading, values to
 * three significant figures (the CSV and XLSX downloads carry them at full precision), a dash where a value
 * does not apply, and the notes that say how to read it. Headings repeat on every page a table runs onto.
 */
final class SchedulePages {
    static final String CAUTION = "Results must be checked by a licensed engineer; the adopted local code and its amendments govern.";

    private final PdfaDocument pdf;
    private final List<LoadSchedule> schedules;

    SchedulePages(PdfaDocument pdf, List<LoadSchedule> schedules) {
        this.pdf = pdf;
        this.schedules = schedules;
    }

    void write() {
        Fonts fonts = pdf.fonts;
        for (LoadSchedule s : schedules) {
            int n = s.columns().size();
            float[] widths = new float[n];
            for (int c = 0; c < n; c++) widths[c] = s.columns().get(c).isNumber() ? 6 : text(s, c);
            PdfPTable t = Cells.table(widths);
            Cells.title(t, s.title(), fonts);
            for (int c = 0; c < n; c++) t.addCell(Cells.head(s.heading(c), fonts));
            t.setHeaderRows(2);
            for (int r = 0; r < s.rows().size(); r++)
                for (int c = 0; c < n; c++) {
                    if (!s.columns().get(c).isNumber()) t.addCell(Cells.text((String) s.rows().get(r).get(c), fonts.small()));
                    else {
                        double v = s.shown(r, c);
                        t.addCell(Cells.right(Double.isNaN(v) ? "—" : Display.sig3(v), fonts.small()));
                    }
                }
            Phrase foot = new Phrase(String.join("\n", s.notes()) + "\n" + CAUTION, fonts.smallGrey());
            PdfPCell c = Cells.cell(foot, Element.ALIGN_LEFT);
            c.setColspan(n);
            c.setBorder(0);
            t.addCell(c);
            pdf.add(t);
        }
    }

    /** A text column's share of the width: wider for labels and combinations than for a count. */
    private static float text(LoadSchedule s, int c) {
        String h = s.columns().get(c).heading();
        if (h.equals("Count")) return 4;
        return h.endsWith("combination") ? 11 : 10;
    }
}
