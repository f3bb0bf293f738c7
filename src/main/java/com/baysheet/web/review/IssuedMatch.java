package com.baysheet.web.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.review.SheetRevision;
import com.baysheet.review.SheetState;
import com.baysheet.store.Store;
import com.baysheet.store.review.Reviews;
import com.baysheet.store.review.StoredRevision;

import java.time.LocalDate;

/**
 * An issued revision as a person asks after it: which job and project, which mark, member or package (by the name
 * its sheet was issued under, never a stored id), which revision, who prepared and checked it, when it was
 * issued and whether it still stands (superseded by a later issue of its sheet, whose revision is then
 * {@code current}, or withdrawn when its members were deleted); with the address of its sheet page and its
 * download's file name.
 *
 * @param current the label of the sheet's revision in force, "" when none is (the sheet was withdrawn)
 */
public record IssuedMatch(String jobNumber, String project, String sheet, boolean isPackage, String revision,
                          String state, String preparedBy, String checkedBy, LocalDate issuedOn, String href,
                          boolean superseded, boolean withdrawn, String current) {

    static IssuedMatch of(Store store, Reviews reviews, StoredRevision r) {
        Reviews.Standing standing = reviews.standing(r);
        var info = store.projects().find(r.sheet().projectId()).info();
        SheetRevision x = r.revision();
        String sheet = r.record().map(CalcRecord::subject).orElse(r.sheet().isPackage() ? "package" : "member sheet");
        String base = "/review/projects/" + r.sheet().projectId();
        var mark = com.baysheet.review.MarkSheets.markId(r.sheet().subject());
        // a member sheet checked before marks came in leads to the mark sheet its member carries now
        String href = r.sheet().isPackage()
                ? base + "/packages/" + r.sheet().subject().substring(com.baysheet.review.SheetRef.PACKAGE_PREFIX.length())
                : mark.isPresent() ? base + "/marks/" + mark.get() : base + "/members/" + r.sheet().subject();
        return new IssuedMatch(info.jobNumber(), info.name(), sheet, r.sheet().isPackage(), r.label(), x.state().label(),
                x.preparer() == null ? "" : x.preparer().initials(), x.approval() == null ? "" : x.approval().initials(),
                x.issue() == null ? null : x.issue().on(), href, x.state() == SheetState.SUPERSEDED,
                // withdrawn itself, or superseded by an issue since withdrawn: no revision of the sheet stands
                standing.withdrawn() || standing.inForce().isEmpty(), standing.inForce().map(StoredRevision::label).orElse(""));
    }

    /** Whether the file is its sheet's revision in force. */
    public boolean inForce() { return !superseded && !withdrawn; }

    /** Where the file stands in the verdict's words; "" while it is in force. */
    public String standing() {
        if (superseded && !current.isEmpty()) return "superseded: revision " + current + " of this " + kind() + " is current";
        if (superseded) return "superseded, and its " + kind() + " since withdrawn: no revision of it is current";
        if (withdrawn) return "withdrawn: its members were deleted, and no revision of this " + kind() + " is current";
        return "";
    }

    /** What the sheet is in the verdict's words: a package, a mark (a typical member's sheet), or a member checked before marks. */
    public String kind() {
        return isPackage ? "package" : href.contains("/marks/") ? "mark" : "member";
    }

    /** {@code <job>-<sheet>-rev<revision>.pdf}, as docs/sheets.md promises (made safe for a header by the caller). */
    String fileName() { return jobNumber + "-" + sheet + "-rev" + revision + ".pdf"; }
}
