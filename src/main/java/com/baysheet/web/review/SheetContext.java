package com.baysheet.web.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.PackageManifest;
import com.baysheet.review.PackageScope;
import com.baysheet.review.SheetRef;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import io.javalin.http.Context;

/**
 * The sheet a check request names, as the current derivation gives it: a typical member's sheet under its mark
 * (path parameter {@code mark}, the mark's stored id) or a package ({@code package}), with the record its check is about. The lifecycle and
 * markup routes take either; only the pages and PDFs tell them apart.
 */
sealed interface SheetContext permits SheetContext.OfMark, SheetContext.OfPackage {
    Results.Computed computed();

    SheetRef ref();

    /** What the check is about now: the member's record, or the package's manifest. */
    CalcRecord current();

    /** The sheet's name in messages and headings. */
    String name();

    /** The sheet page's path, for redirects after each action. */
    String path();

    /** A typical member's sheet, under its mark: the unit of review. */
    record OfMark(Results.Computed computed, MarkSheets marks, MarkSheets.MarkSheet sheet, SheetRef ref) implements SheetContext {
        public CalcRecord current() { return sheet.record(); }

        public String name() { return sheet.text(); }

        public String path() { return path(ref.projectId(), sheet.mark().id()); }

        static String path(long project, long markId) { return "/review/projects/" + project + "/marks/" + markId; }
    }

    record OfPackage(Results.Computed computed, PackageScope scope, SheetRef ref, MarkSheets marks, CalcRecord current) implements SheetContext {
        public String name() { return scope.title(); }

        public String path() { return "/review/projects/" + ref.projectId() + "/packages/" + scope.key(); }
    }

    static SheetContext of(Store store, Context ctx) {
        return ctx.pathParamMap().containsKey("package") ? pkg(store, ctx) : mark(store, ctx);
    }

    static OfMark mark(Store store, Context ctx) {
        long project = project(ctx);
        Results.Computed c = store.results().of(project);
        MarkSheets marks = store.marks().of(project, c.derived());
        String text = ctx.pathParam("mark");
        MarkSheets.MarkSheet s;
        try {
            s = marks.byId(Long.parseLong(text)).orElseThrow(() -> new NotFound("mark", text));
        } catch (NumberFormatException e) {
            throw new NotFound("mark", text);
        }
        return new OfMark(c, marks, s, s.ref(project));
    }

    /** The stored mark a request names when no member carries it now (its sheet is history); empty otherwise. */
    static java.util.Optional<com.baysheet.review.Mark> retired(Store store, Context ctx) {
        long project = project(ctx);
        long id;
        try {
            id = Long.parseLong(ctx.pathParam("mark"));
        } catch (NumberFormatException e) {
            return java.util.Optional.empty();
        }
        Results.Computed c = store.results().of(project);
        if (store.marks().of(project, c.derived()).byId(id).isPresent()) return java.util.Optional.empty();
        return store.marks().stored(project, id);
    }

    /** The mark sheet a member belongs to now. */
    static OfMark markOf(Store store, long project, String memberId) {
        Results.Computed c = store.results().of(project);
        MarkSheets marks = store.marks().of(project, c.derived());
        MarkSheets.MarkSheet s = marks.ofMember(memberId).orElseThrow(() -> new NotFound("member", memberId));
        return new OfMark(c, marks, s, s.ref(project));
    }

    static OfPackage pkg(Store store, Context ctx) {
        long project = project(ctx);
        Results.Computed c = store.results().of(project);
        String key = ctx.pathParam("package");
        PackageScope s = PackageScope.find(c.derived(), key).orElseThrow(() -> new NotFound("package", key));
        MarkSheets marks = store.marks().of(project, c.derived());
        return new OfPackage(c, s, new SheetRef(project, s.subject()), marks, PackageManifest.of(s, c.derived(), marks));
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
