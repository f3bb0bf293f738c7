package com.baysheet.sheet;

import java.io.ByteArrayOutputStream;
import java.io.OutputStream;
import java.util.List;
import java.security.MessageDigest;
import java.nio.charset.StandardCharsets;

/**
 * Renders a calculation package to PDF/A-1b: cover with the design criteria, index, the member sheets
 * grouped by level and member kind, the column take-downs and the revision log, "n of N" on every page.
 * Pages are written to the stream as they are completed, so a package of hundreds of members needs little
 * memory; the index's page numbers and N are small templates filled in as the pages become known.
 */
public final class PackageRenderer {
    private PackageRenderer() {}

    /** Told after each member sheet is laid out, for a progress bar; called on the rendering thread. */
    @FunctionalInterface
    public interface Progress {
        void sheetDone(int done, int total);

        Progress NONE = (done, total) -> {};
    }

    /**
     * The issued package written to {@code out} (left open). The package header must name its checker and its
     * issue date. Each member sheet's title block states that member's own check and revision, as given (its own
     * sheet may be unchecked or unissued: the package's check and issue are on its cover and in every band).
     */
    public static StreamedPdf render(CalcPackage pkg, OutputStream out, Progress progress) {
        SheetRenderer.requireIssued(pkg.header());
        return write(pkg, out, progress, Markups.ISSUED);
    }

    /**
     * A checking copy of the package, for reading and marking up before anything is issued: the checking mark
     * on every page, "not yet checked" where no checker has signed, never a copy for submittal. The package
     * itself is not issued by it: its own pages say "not issued" and the date printed, whatever its header says;
     * each member page states that member's own state as given.
     */
    public static StreamedPdf checking(CalcPackage pkg, OutputStream out, Progress progress) {
        return write(pkg.withHeader(pkg.header().notIssued()), out, progress, Markups.checking(List.of()));
    }

    private static StreamedPdf write(CalcPackage pkg, OutputStream out, Progress progress, Markups markups) {
        byte[] id = markups.checking() ? Hashes.of("checking-package", java.util.Arrays.toString(digest(pkg))) : digest(pkg);
        PdfaDocument pdf = PdfaDocument.open(out, pkg.header(), pkg.title() + ", " + pkg.header().project(), id, markups.checking());
        pdf.frame.site(pkg.submittal());
        pdf.frame.wording(Wording.of(pkg));
        Index index = new Index(pdf, pkg);
        pdf.frame.show(pkg.header(), pkg.title() + " · cover");
        new Cover(pdf, pkg, markups.checking()).write();
        pdf.newPage();
        pdf.frame.show(pkg.header().withSubject("Design criteria"), pkg.title() + " · design criteria");
        index.startsHere(Index.CRITERIA);
        new CriteriaPage(pdf, pkg).write();
        pdf.newPage();
        pdf.frame.show(pkg.header().withSubject("Index of sheets"), pkg.title() + " · index");
        index.write();
        PackageSections.plans(pdf, pkg, index);
        int done = 0;
        for (MemberSheet s : pkg.sheets()) {
            pdf.newPage();
            pdf.frame.show(s.header(), SheetRenderer.context(s));
            index.startsHere(s);
            new MemberSheetWriter(pdf, s, markups).write();
            progress.sheetDone(++done, pkg.sheets().size());
        }
        if (!pkg.takeDowns().isEmpty()) {
            pdf.newPage();
            pdf.frame.show(pkg.header().withSubject("Column take-downs"), pkg.title() + " · column take-downs");
            index.startsHere(Index.TAKE_DOWNS);
            new TakeDownPages(pdf, pkg.takeDowns()).write();
        }
        if (!pkg.methodTables().isEmpty()) {
            pdf.newPage();
            pdf.frame.show(pkg.header().withSubject("Reduction methods compared"), pkg.title() + " · reduction methods compared");
            index.startsHere(Index.METHODS);
            new TakeDownPages(pdf, pkg.methodTables()).write();
        }
        PackageSections.schedules(pdf, pkg, index);
        pdf.newPage();
        pdf.frame.show(pkg.header().withSubject("Revision log"), pkg.title() + " · revision log");
        index.startsHere(Index.REVISIONS);
        new RevisionLog(pdf, pkg, markups.checking()).write();
        return pdf.finish();
    }

    /** The issued package in memory, for small packages and tests. */
    public static RenderedPdf render(CalcPackage pkg) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(256 * 1024);
        StreamedPdf s = render(pkg, out, Progress.NONE);
        return new RenderedPdf(out.toByteArray(), s.sha256(), s.pages());
    }

    /** A digest of everything printed, fed part by part so that a large package is never one string. */
    private static byte[] digest(CalcPackage pkg) {
        MessageDigest d = Hashes.sha256();
        d.update(("package|" + pkg.header() + "|" + pkg.title() + "|" + pkg.criteria() + "|" + pkg.revisions() + "|" + pkg.submittal())
                .getBytes(StandardCharsets.UTF_8));
        for (MemberSheet s : pkg.sheets()) d.update(s.toString().getBytes(StandardCharsets.UTF_8));
        for (TakeDownTable t : pkg.takeDowns()) d.update(t.toString().getBytes(StandardCharsets.UTF_8));
        for (TakeDownTable t : pkg.methodTables()) d.update(t.toString().getBytes(StandardCharsets.UTF_8));
        for (FramingPlan p : pkg.plans()) d.update(p.toString().getBytes(StandardCharsets.UTF_8));
        for (var s : pkg.schedules()) d.update(s.toString().getBytes(StandardCharsets.UTF_8));
        return d.digest();
    }
}
