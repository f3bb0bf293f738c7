package com.baysheet.web.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.DerivedMember;
import com.baysheet.review.PackageManifest;
import com.baysheet.review.PackageScope;
import com.baysheet.review.SheetRef;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import io.javalin.http.Context;

/**
 * The sheet a check request names, as the current derivation gives it: a member's sheet (path parameter
 * {@code member}) or a package ({@code package}), with the record its check is about. The lifecycle and
 * markup routes take either; only the pages and PDFs tell them apart.
 */
sealed interface SheetContext permits SheetContext.OfMember, SheetContext.OfPackage {
    Results.Computed computed();

    SheetRef ref();

    /** What the check is about now: the member's record, or the package's manifest. */
    CalcRecord current();

    /** The sheet's name in messages and headings. */
    String name();

    /** The sheet page's path, for redirects after each action. */
    String path();

    record OfMember(Results.Computed computed, DerivedMember member, SheetRef ref) implements SheetContext {
        public CalcRecord current() { return member.result().record(); }

        public String name() { return member.name(); }

        public String path() { return "/review/projects/" + ref.projectId() + "/members/" + ref.subject(); }
    }

    record OfPackage(Results.Computed computed, PackageScope scope, SheetRef ref, CalcRecord current) implements SheetContext {
        public String name() { return scope.title(); }

        public String path() { return "/review/projects/" + ref.projectId() + "/packages/" + scope.key(); }
    }

    static SheetContext of(Store store, Context ctx) {
        return ctx.pathParamMap().containsKey("package") ? pkg(store, ctx) : member(store, ctx);
    }

    static OfMember member(Store store, Context ctx) {
        long project = project(ctx);
        Results.Computed c = store.results().of(project);
        String id = ctx.pathParam("member");
        DerivedMember m = c.derived().member(id).orElseThrow(() -> new NotFound("member", id));
        return new OfMember(c, m, new SheetRef(project, id));
    }

    static OfPackage pkg(Store store, Context ctx) {
        long project = project(ctx);
        Results.Computed c = store.results().of(project);
        String key = ctx.pathParam("package");
        PackageScope s = PackageScope.find(c.derived(), key).orElseThrow(() -> new NotFound("package", key));
        return new OfPackage(c, s, new SheetRef(project, s.subject()), PackageManifest.of(s, c.derived()));
    }

    static long project(Context ctx) {
        String text = ctx.pathParam("project");
        try {
            return Long.parseLong(text);
        } catch (NumberFormatException e) {
            throw new NotFound("project", text);
        }
    }
}
