package com.baysheet.issue;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.PackageManifest;
import com.baysheet.review.PackageScope;
import com.baysheet.review.SheetRef;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;

/**
 * The sheet a check is about, as the current derivation gives it: a typical member's sheet under its mark, or a
 * package, with the record its check is about. The lifecycle and markups take either; only the pages and PDFs
 * tell them apart.
 */
public sealed interface SheetSubject permits SheetSubject.OfMark, SheetSubject.OfPackage {
    Results.Computed computed();

    SheetRef ref();

    /** What the check is about now: the mark's record, or the package's manifest. */
    CalcRecord current();

    /** The sheet's name in messages and headings. */
    String name();

    /** The sheet page's path, for redirects after each action. */
    String path();

    /** A typical member's sheet, under its mark: the unit of review. */
    record OfMark(Results.Computed computed, MarkSheets marks, MarkSheets.MarkSheet sheet, SheetRef ref) implements SheetSubject {
        public CalcRecord current() { return sheet.record(); }

        public String name() { return sheet.text(); }

        public String path() { return path(ref.projectId(), sheet.mark().id()); }

        public static String path(long project, long markId) { return "/review/projects/" + project + "/marks/" + markId; }
    }

    record OfPackage(Results.Computed computed, PackageScope scope, SheetRef ref, MarkSheets marks, CalcRecord current) implements SheetSubject {
        public String name() { return scope.title(); }

        public String path() { return "/review/projects/" + ref.projectId() + "/packages/" + scope.key(); }
    }

    /** The mark sheet of this stored mark id in the project's current derivation, or not found. */
    static OfMark mark(Results.Computed c, MarkSheets marks, String id) {
        MarkSheets.MarkSheet s;
        try {
            s = marks.byId(Long.parseLong(id)).orElseThrow(() -> new NotFound("mark", id));
        } catch (NumberFormatException e) {
            throw new NotFound("mark", id);
        }
        return new OfMark(c, marks, s, s.ref(c.project().id()));
    }

    /** The mark sheet a member belongs to now, or not found. */
    static OfMark markOf(Results.Computed c, MarkSheets marks, String memberId) {
        MarkSheets.MarkSheet s = marks.ofMember(memberId).orElseThrow(() -> new NotFound("member", memberId));
        return new OfMark(c, marks, s, s.ref(c.project().id()));
    }

    /** The package of this key ("project", or a level's) in the project's current derivation, or not found. */
    static OfPackage pkg(Results.Computed c, MarkSheets marks, String key) {
        PackageScope s = PackageScope.find(c.derived(), key).orElseThrow(() -> new NotFound("package", key));
        return pkg(c, marks, s);
    }

    static OfPackage pkg(Results.Computed c, MarkSheets marks, PackageScope s) {
        return new OfPackage(c, s, new SheetRef(c.project().id(), s.subject()), marks, PackageManifest.of(s, c.derived(), marks));
    }
}
