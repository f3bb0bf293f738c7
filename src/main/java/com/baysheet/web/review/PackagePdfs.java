package com.baysheet.web.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.review.RevisionComparison;
import com.baysheet.review.SheetRevision;
import com.baysheet.sheet.CalcPackage;
import com.baysheet.sheet.FramingSheets;
import com.baysheet.sheet.PackageRenderer;
import com.baysheet.sheet.Revision;
import com.baysheet.sheet.SheetHeader;
import com.baysheet.store.review.Firm;
import com.baysheet.store.review.Reviews;
import com.baysheet.store.review.StoredRevision;

import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;

/**
 * The issued copy of a package, rendered from the current derivation under the approved revision's title
 * block (the checker's initials and date on every sheet), with a revision log of the earlier issues and of
 * this one, each saying which sheets it changed.
 */
final class PackagePdfs {
    /** A revision log line names at most this many changed sheets, then counts the rest. */
    private static final int NAMED = 6;

    private PackagePdfs() {}

    static byte[] issued(Firm firm, SheetContext.OfPackage s, Reviews.SheetView v, LocalDate today) {
        SheetRevision r = v.current().revision();
        var info = s.computed().project().info();
        SheetHeader h = new SheetHeader(firm.name(), info.name(), info.jobNumber(), s.name(), r.preparer().initials(),
                r.preparer().on(), r.approval().initials(), r.approval().on(), String.valueOf(r.number()), today, firm.logoText());
        List<Revision> log = log(v.history(), r, s.current(), today);
        CalcPackage pkg = s.scope().isProject() ? FramingSheets.project(h, s.computed().derived(), log)
                : FramingSheets.level(h, s.computed().derived(), s.scope().level(), log);
        return PackageRenderer.render(pkg).bytes();
    }

    static List<Revision> log(List<StoredRevision> history, SheetRevision now, CalcRecord current, LocalDate today) {
        List<Revision> out = new ArrayList<>();
        CalcRecord before = null;
        for (StoredRevision h : history) {
            SheetRevision x = h.revision();
            if (x.issue() == null || x.number() >= now.number()) continue;
            CalcRecord rec = h.record().orElseThrow();
            out.add(line(x, x.issue().on(), before, rec));
            before = rec;
        }
        out.add(line(now, today, before, current));
        return out;
    }

    private static Revision line(SheetRevision x, LocalDate on, CalcRecord before, CalcRecord after) {
        return new Revision(String.valueOf(x.number()), on, describe(before, after),
                x.preparer().initials() + " / " + x.approval().initials());
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
