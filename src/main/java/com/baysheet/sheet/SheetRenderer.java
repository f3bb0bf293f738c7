package com.baysheet.sheet;

import com.baysheet.engine.InputError;

import java.io.ByteArrayOutputStream;
import java.io.OutputStream;
import java.util.List;

/**
 * Renders one member sheet to PDF/A-1b. An issued copy must name its checker; a checking copy carries the
 * checking mark on every page and lists the markups passed in. The same sheet and issue date always give
 * the same bytes, so the returned SHA-256 identifies what was issued.
 */
public final class SheetRenderer {
    private SheetRenderer() {}

    /** The issued copy, in memory. A sheet is small (tens of kilobytes). */
    public static RenderedPdf issued(MemberSheet sheet) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
        StreamedPdf s = issued(sheet, out);
        return new RenderedPdf(out.toByteArray(), s.sha256(), s.pages());
    }

    /** The issued copy, written to {@code out} (left open). */
    public static StreamedPdf issued(MemberSheet sheet, OutputStream out) {
        requireIssued(sheet.header());
        return write(sheet, Markups.ISSUED, out);
    }

    /**
     * The checking copy with the checker's markups (an empty list prints "No markups yet"). A checking copy is
     * never an issue: whatever the header says, it prints "not issued" and the date it was printed.
     */
    public static RenderedPdf checking(MemberSheet sheet, List<Markup> markups) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
        StreamedPdf s = write(sheet.withHeader(sheet.header().notIssued()), Markups.checking(markups), out);
        return new RenderedPdf(out.toByteArray(), s.sha256(), s.pages());
    }

    /** An issued copy names its checker and its issue date. */
    static void requireIssued(SheetHeader h) {
        if (!h.isChecked())
            throw new InputError("checkedBy", "\"\"", "an issued sheet must name its checker; render a checking copy until it is checked");
        if (!h.isIssued())
            throw new InputError("issueDate", "none", "an issued copy needs its issue date; render a checking copy until it is issued");
    }

    private static StreamedPdf write(MemberSheet sheet, Markups markups, OutputStream out) {
        PdfaDocument pdf = PdfaDocument.open(out, sheet.header(), sheet.record().subject(),
                Hashes.of("member-sheet", sheet, markups.checking(), markups.list()), markups.checking());
        pdf.frame.wording(Wording.of(sheet.record().units()));
        pdf.frame.show(sheet.header(), context(sheet));
        new MemberSheetWriter(pdf, sheet, markups).write();
        return pdf.finish();
    }

    static String context(MemberSheet s) {
        String place = s.level().isEmpty() ? "Member calculation" : s.level() + (s.group().isEmpty() ? "" : " · " + s.group());
        return place + " · " + s.record().edition() + " · gravity dead and live loads";
    }
}
