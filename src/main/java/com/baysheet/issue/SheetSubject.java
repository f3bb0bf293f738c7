package com.baysheet.issue;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.DerivedMember;
import com.baysheet.review.PackageManifest;
import com.baysheet.review.PackageScope;
import com.baysheet.review.SheetRef;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;

/**
 * The sheet a check is about, as the current derivation gives it: a member's sheet or a package, with the
 * record its check is about. The lifecycle and markups take either; only the pages and PDFs tell them apart.
 */
public sealed interface SheetSubject permits SheetSubject.OfMember, SheetSubject.OfPackage {
    Results.Computed computed();

    SheetRef ref();

    /** What the check is about now: the member's record, or the package's manifest. */
    CalcRecord current();

    /** The sheet's name in messages and headings. */
    String name();

    /** The sheet page's path, for redirects after each action. */
    String path();

    record OfMember(Results.Computed computed, DerivedMember member, SheetRef ref) implements SheetSubject {
        public CalcRecord current() { return member.result().record(); }

        public String name() { return member.name(); }

        public String path() { return "/review/projects/" + ref.projectId() + "/members/" + ref.subject(); }
    }

    record OfPackage(Results.Computed computed, PackageScope scope, SheetRef ref, CalcRecord current) implements SheetSubject {
        public String name() { return scope.title(); }

        public String path() { return "/review/projects/" + ref.projectId() + "/packages/" + scope.key(); }
    }

    /** The member of this id in the project's current derivation, or not found. */
    static OfMember member(Results.Computed c, String id) {
        DerivedMember m = c.derived().member(id).orElseThrow(() -> new NotFound("member", id));
        return new OfMember(c, m, new SheetRef(c.project().id(), id));
    }

    /** The package of this key ("project", or a level's) in the project's current derivation, or not found. */
    static OfPackage pkg(Results.Computed c, String key) {
        PackageScope s = PackageScope.find(c.derived(), key).orElseThrow(() -> new NotFound("package", key));
        return pkg(c, s);
    }

    static OfPackage pkg(Results.Computed c, PackageScope s) {
        return new OfPackage(c, s, new SheetRef(c.project().id(), s.subject()), PackageManifest.of(s, c.derived()));
    }
}
