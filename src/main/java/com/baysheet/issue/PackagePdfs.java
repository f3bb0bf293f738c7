package com.baysheet.issue;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.review.RevisionComparison;
import com.baysheet.review.SheetRevision;
import com.baysheet.sheet.CalcPackage;
import com.baysheet.sheet.FramingSheets;
import com.baysheet.sheet.PackageRenderer;
import com.baysheet.sheet.Revision;
import com.baysheet.sheet.SheetHeader;
import com.baysheet.project.Firm;
import com.baysheet.framing.model.Submittal;
import com.baysheet.store.review.Reviews;
import com.baysheet.store.review.StoredRevision;


import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.HashMap;
import java.util.Map;
import com.baysheet.sheet.MemberSheet;

/**
 * Packages rendered from the current derivation: the issued copy under the approved revision's title block
 * (its checker's initials and date on the cover and the package's own pages), the checking copy under the
 * package's revision under way; in both, each member's page states that member's own check and revision. The
 * revision log lists the earlier issues and, on the issued copy, this one, each saying which sheets it changed.
 */
final class PackagePdfs {
    /** A revision log line names at most this many changed sheets, then counts the rest. */
    private static final int NAMED = 6;

    private PackagePdfs() {}

    /** @param latest the latest revision of every sheet of the project, for each member's own title block */
    static byte[] issued(Firm firm, Submittal site, SheetSubject.OfPackage s, Reviews.SheetView v, List<StoredRevision> latest,
                         LocalDate today, String description, String auditHead) {
        SheetRevision r = v.current().revision();
        var info = s.computed().project().info();
        SheetHeader h = TitleBlocks.issuing(firm, info, s.name(), v.current(), today).withAuditHead(auditHead);
        List<Revision> log = new ArrayList<>();
        CalcRecord before = earlier(v.history(), r.number(), log);
        log.add(line(v.current(), r, today, before, s.current(), description));
        return PackageRenderer.render(of(s, h, log, firm, latest, today).withSubmittal(site)).bytes();
    }

    /** The checking copy of a package: the package's revision under way, not issued; its earlier issues logged. */
    static CalcPackage checking(Firm firm, Submittal site, SheetSubject.OfPackage s, Reviews.SheetView v, List<StoredRevision> latest, LocalDate today) {
        var info = s.computed().project().info();
        SheetHeader h = TitleBlocks.underCheck(firm, info, s.name(), v.current(), s.current(), today);
        List<Revision> log = new ArrayList<>();
        earlier(v.history(), Integer.MAX_VALUE, log);
        return of(s, h, log, firm, latest, today).withSubmittal(site);
    }

    /** The package of one sheet per mark in its scope, each under the mark sheet's own title block. */
    private static CalcPackage of(SheetSubject.OfPackage s, SheetHeader h, List<Revision> log, Firm firm, List<StoredRevision> latest,
                                  LocalDate today) {
        Map<String, StoredRevision> bySubject = new HashMap<>();
        for (StoredRevision x : latest) bySubject.put(x.sheet().subject(), x);
        var d = s.computed().derived();
        long project = s.ref().projectId();
        List<MemberSheet> sheets = s.scope().marks(d, s.marks()).stream()
                .map(m -> FramingSheets.typical(TitleBlocks.mark(firm, s.computed().project().info(), bySubject, m, project, today), d, m.group(), m.text()))
                .toList();
        var marks = s.marks().labels();
        return s.scope().isProject() ? FramingSheets.projectOf(h, d, log, sheets, marks)
                : FramingSheets.levelOf(h, d, s.scope().level(), log, sheets, marks);
    }

    /** Adds a line for each issued revision numbered below {@code below}; returns the last one's record (null if none). */
    private static CalcRecord earlier(List<StoredRevision> history, int below, List<Revision> out) {
        CalcRecord before = null;
        for (StoredRevision h : history) {
            SheetRevision x = h.revision();
            if (x.issue() == null || x.number() >= below) continue;
            CalcRecord rec = h.record().orElseThrow();
            out.add(line(h, x, x.issue().on(), before, rec, x.issue().description()));
            before = rec;
        }
        return before;
    }

    /** A revision log line: what the issuer said it changed (revisions issued before it was asked: the sheets that changed). */
    static Revision line(StoredRevision h, SheetRevision x, LocalDate on, CalcRecord before, CalcRecord after, String said) {
        String what = said == null || said.isBlank() ? describe(before, after) : said;
        return new Revision(h.label(), on, what, x.preparer().initials() + " / " + x.approval().initials());
    }

    /** "First issue", or the sheets whose calculation changed since the issue before. */
    static String describe(CalcRecord before, CalcRecord after) {
        if (before == null) return "First issue";
        List<String> changed = RevisionComparison.of(before, after).inputs().stream()
                .map(c -> c.label() + (c.kind() == RevisionComparison.Kind.CHANGED ? "" : " (" + c.kind().name().toLowerCase() + ")"))
                .toList();
        if (changed.isEmpty()) return "Reissued";
        String named = String.join("; ", changed.subList(0, Math.min(NAMED, changed.size())));
        return "Revised: " + named + (changed.size() > NAMED ? "; and " + (changed.size() - NAMED) + " more" : "");
    }
}
