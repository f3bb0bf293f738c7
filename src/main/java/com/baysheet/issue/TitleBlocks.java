package com.baysheet.issue;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.DerivedMember;
import com.baysheet.review.CalcFingerprint;
import com.baysheet.review.SheetRevision;
import com.baysheet.review.SheetState;
import com.baysheet.sheet.SheetHeader;
import com.baysheet.project.ProjectInfo;
import com.baysheet.project.Firm;
import com.baysheet.store.review.StoredRevision;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * Title blocks that state what happened to the calculation printed, read from its sheet's latest revision:
 * a preparer only if the calculation printed is the one submitted, a checker only if that revision was
 * approved, an issue only if it was issued and still stands. A revision whose calculation has changed since
 * (not yet marked superseded) vouches for nothing on the page.
 */
final class TitleBlocks {
    private TitleBlocks() {}

    /** The issued copy of an approved revision, issued (and printed) on {@code on}. */
    static SheetHeader issuing(Firm firm, ProjectInfo info, String subject, SheetRevision approved, LocalDate on) {
        return new SheetHeader(firm.name(), info.name(), info.jobNumber(), subject, approved.preparer().initials(),
                approved.preparer().on(), approved.approval().initials(), approved.approval().on(),
                String.valueOf(approved.number()), on, on, firm.logoText());
    }

    /** A checking copy of a sheet under check (a member's, or a package's own pages): the revision under way, not issued. */
    static SheetHeader underCheck(Firm firm, ProjectInfo info, String subject, SheetRevision r, CalcRecord printed, LocalDate on) {
        return own(firm, info, subject, r, printed, on, String.valueOf(r.number()));
    }

    /**
     * Each member's page in a package: the member's own preparer and checker, its issued revision number or
     * {@link SheetHeader#NOT_ISSUED}, never the package's.
     *
     * @param latest the latest revision of each sheet of the project ({@code Reviews.latestOf})
     */
    static Function<DerivedMember, SheetHeader> members(Firm firm, ProjectInfo info, List<StoredRevision> latest, LocalDate on) {
        Map<String, SheetRevision> bySubject = new HashMap<>();
        for (StoredRevision s : latest) bySubject.put(s.sheet().subject(), s.revision());
        return m -> {
            SheetRevision r = bySubject.getOrDefault(m.id(), SheetRevision.opened(1));
            CalcRecord printed = m.result().record();
            String revision = stands(r, printed) && r.state() == SheetState.ISSUED ? String.valueOf(r.number()) : SheetHeader.NOT_ISSUED;
            return own(firm, info, m.name(), r, printed, on, revision);
        };
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
