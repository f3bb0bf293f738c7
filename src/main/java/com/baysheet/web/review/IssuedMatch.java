package com.baysheet.web.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.review.SheetRevision;
import com.baysheet.store.Store;
import com.baysheet.store.review.StoredRevision;

import java.time.LocalDate;

/**
 * An issued revision as a person asks after it: which job and project, which member or package (by the name
 * its sheet was issued under, never a stored id), which revision, who prepared and checked it, when it was
 * issued and whether it still stands; with the address of its sheet page and its download's file name.
 */
public record IssuedMatch(String jobNumber, String project, String sheet, boolean isPackage, int revision,
                          String state, String preparedBy, String checkedBy, LocalDate issuedOn, String href) {

    static IssuedMatch of(Store store, StoredRevision r) {
        var info = store.projects().find(r.sheet().projectId()).info();
        SheetRevision x = r.revision();
        String sheet = r.record().map(CalcRecord::subject).orElse(r.sheet().isPackage() ? "package" : "member sheet");
        String base = "/review/projects/" + r.sheet().projectId();
        String href = r.sheet().isPackage()
                ? base + "/packages/" + r.sheet().subject().substring(com.baysheet.review.SheetRef.PACKAGE_PREFIX.length())
                : base + "/members/" + r.sheet().subject();
        return new IssuedMatch(info.jobNumber(), info.name(), sheet, r.sheet().isPackage(), x.number(), x.state().label(),
                x.preparer() == null ? "" : x.preparer().initials(), x.approval() == null ? "" : x.approval().initials(),
                x.issue() == null ? null : x.issue().on(), href);
    }

    /** {@code <job>-<sheet>-rev<revision>.pdf}, as docs/sheets.md promises (made safe for a header by the caller). */
    String fileName() { return jobNumber + "-" + sheet + "-rev" + revision + ".pdf"; }
}
