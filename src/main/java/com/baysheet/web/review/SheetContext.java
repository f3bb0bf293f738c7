package com.baysheet.web.review;

import com.baysheet.issue.SheetSubject;
import com.baysheet.review.Mark;
import com.baysheet.review.MarkSheets;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import io.javalin.http.Context;

import java.util.Optional;

/**
 * The sheet a check request names in its path: a typical member's sheet under its mark (path parameter
 * {@code mark}, the mark's stored id) or a package ({@code package}) of the project {@code project}, read from
 * the project's current derivation.
 */
final class SheetContext {
    private SheetContext() {}

    static SheetSubject of(Store store, Context ctx) {
        return ctx.pathParamMap().containsKey("package") ? pkg(store, ctx) : mark(store, ctx);
    }

    static SheetSubject.OfMark mark(Store store, Context ctx) {
        long project = project(ctx);
        Results.Computed c = store.results().of(project);
        return SheetSubject.mark(c, store.marks().of(project, c.derived()), ctx.pathParam("mark"));
    }

    /** The stored mark a request names when no member carries it now (its sheet is history); empty otherwise. */
    static Optional<Mark> retired(Store store, Context ctx) {
        long project = project(ctx);
        long id;
        try {
            id = Long.parseLong(ctx.pathParam("mark"));
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
        Results.Computed c = store.results().of(project);
        if (store.marks().of(project, c.derived()).byId(id).isPresent()) return Optional.empty();
        return store.marks().stored(project, id);
    }

    /** The mark sheet a member belongs to now. */
    static SheetSubject.OfMark markOf(Store store, long project, String memberId) {
        Results.Computed c = store.results().of(project);
        return SheetSubject.markOf(c, store.marks().of(project, c.derived()), memberId);
    }

    static SheetSubject.OfPackage pkg(Store store, Context ctx) {
        long project = project(ctx);
        Results.Computed c = store.results().of(project);
        return SheetSubject.pkg(c, marks(store, c), ctx.pathParam("package"));
    }

    static MarkSheets marks(Store store, Results.Computed c) {
        return store.marks().of(c.project().id(), c.derived());
    }

    static long project(Context ctx) {
        try {
            return Long.parseLong(ctx.pathParam("project"));
        } catch (NumberFormatException e) {
            throw new NotFound("project", ctx.pathParam("project"));
        }
    }
}
