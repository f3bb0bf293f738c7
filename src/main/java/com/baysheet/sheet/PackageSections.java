package com.baysheet.sheet;

import com.lowagie.text.BadElementException;
import com.lowagie.text.Image;
import com.lowagie.text.PageSize;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfTemplate;

/**
 * The package's plan sheets and load summaries, written between the sections {@link PackageRenderer} lays out:
 * each framing plan on a page of its own (landscape where the level is wider than deep), the schedules
 * after the take-downs.
 */
final class PackageSections {
    /** Room kept free under a plan so that it never spills onto a page of its own. */
    private static final float SLACK = 6;

    private PackageSections() {}

    static void plans(PdfaDocument pdf, CalcPackage pkg, Index index) {
        for (FramingPlan p : pkg.plans()) {
            Rectangle size = p.wide() ? PageSize.LETTER.rotate() : PageSize.LETTER;
            pdf.document.setPageSize(size);
            pdf.newPage();
            pdf.frame.show(pkg.header().withSubject("Framing plan, " + p.level()), pkg.title() + " · framing plan " + p.level());
            index.startsHere(p);
            float w = size.getWidth() - pdf.document.leftMargin() - pdf.document.rightMargin();
            float h = size.getHeight() - pdf.document.topMargin() - pdf.document.bottomMargin() - SLACK;
            PdfTemplate t = FramingPlanDrawing.draw(pdf.writer.getDirectContent(), pdf.fonts, p, w, h);
            try {
                pdf.add(Image.getInstance(t));
            } catch (BadElementException e) {
                throw new IllegalStateException(e);
            }
            // the page after a plan is upright again; this page keeps the size it was opened with
            pdf.document.setPageSize(PageSize.LETTER);
        }
    }

    static void schedules(PdfaDocument pdf, CalcPackage pkg, Index index) {
        if (pkg.schedules().isEmpty()) return;
        pdf.newPage();
        pdf.frame.show(pkg.header().withSubject("Load summaries"), pkg.title() + " · load summaries");
        index.startsHere(Index.SCHEDULES);
        new SchedulePages(pdf, pkg.schedules()).write();
    }
}
