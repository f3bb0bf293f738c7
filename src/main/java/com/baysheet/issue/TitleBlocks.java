package com.baysheet.issue;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.review.CalcFingerprint;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.SheetRevision;
import com.baysheet.review.SheetState;
import com.baysheet.sheet.SheetHeader;
import com.baysheet.project.ProjectInfo;
import com.baysheet.project.Firm;
import com.baysheet.store.review.StoredRevision;

import java.time.LocalDate;
import java.util.Map;

/**
 * Title blocks that state what happened to the calculation printed, read from its sheet's latest revision:
 * a preparer only if the calculation printed is the one submitted, a checker only if that revision was
 * approved, an issue only if it was issued and still stands. A revision whose calculation has changed since
 * (changed since issue) vouches for nothing on the page.
 */
final class TitleBlocks {
    private TitleBlocks() {}

    /** The issued copy of an approved revision, issued (and printed) on {@code on}. */
    static SheetHeader issuing(Firm firm, ProjectInfo info, String subject, StoredRevision approved, LocalDate on) {
        SheetRevision r = approved.revision();
        return new SheetHeader(firm.name(), info.name(), info.jobNumber(), subject, r.preparer().initials(),
                r.preparer().on(), r.approval().initials(), r.approval().on(), approved.label(), on, on, firm.logoText());
    }

    /** A checking copy of a sheet under check (a mark's, or a package's own pages): the revision under way, not issued. */
    static SheetHeader underCheck(Firm firm, ProjectInfo info, String subject, StoredRevision r, CalcRecord printed, LocalDate on) {
        return own(firm, info, subject, r.revision(), printed, on, r.label());
    }

    /**
     * Each mark's sheet in a package: the mark sheet's own preparer and checker, its issued revision or
     * {@link SheetHeader#NOT_ISSUED}, never the package's.
     *
     * @param latest the latest revision of each sheet of the project ({@code Reviews.latestOf})
     */
    static SheetHeader mark(Firm firm, ProjectInfo info, Map<String, StoredRevision> latest, MarkSheets.MarkSheet s, long project,
                            LocalDate on) {
        StoredRevision stored = latest.getOrDefault(s.ref(project).subject(), StoredRevision.unsubmitted(s.ref(project)));
        SheetRevision r = stored.revision();
        CalcRecord printed = s.record();
        String revision = stands(r, printed) && r.state() == SheetState.ISSUED ? stored.label() : SheetHeader.NOT_ISSUED;
        return own(firm, info, s.text(), r, printed, on, revision);
    }

    private static SheetHeader own(Firm firm, ProjectInfo info, String subject, SheetRevision r, CalcRecord printed, LocalDate on,
                                   String revision) {
        boolean stands = stands(r, printed);
        boolean prepared = stands && r.preparer() != null, checked = stands && r.approval() != null;
        boolean issued = stands && r.state() == SheetState.ISSUED;
        return new SheetHeader(firm.name(), info.name(), info.jobNumber(), subject,
                prepared ? r.preparer().initials() : SheetHeader.NOT_SUBMITTED, prepared ? r.preparer().on() : null,
                checked ? r.approval().initials() : "", checked ? r.approval().on() : null,
                revision, issued ? r.issue().on() : null, on, firm.logoText());
    }

    /** Whether the revision is about the calculation printed: submitted with exactly its fingerprint. */
    private static boolean stands(SheetRevision r, CalcRecord printed) {
        return r.fingerprint() != null && r.fingerprint().equals(CalcFingerprint.of(printed));
    }
}
