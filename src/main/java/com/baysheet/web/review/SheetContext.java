package com.baysheet.web.review;

import com.baysheet.issue.SheetSubject;
import com.baysheet.store.NotFound;
import com.baysheet.store.Store;
import io.javalin.http.Context;

/**
 * The sheet a check request names in its path: a member's sheet (path parameter {@code member}) or a package
 * ({@code package}) of the project {@code project}, read from the project's current derivation.
 */
final class SheetContext {
    private SheetContext() {}

    static SheetSubject of(Store store, Context ctx) {
        return ctx.pathParamMap().containsKey("package") ? pkg(store, ctx) : member(store, ctx);
    }

    static SheetSubject.OfMember member(Store store, Context ctx) {
        return SheetSubject.member(store.results().of(project(ctx)), ctx.pathParam("member"));
    }

    static SheetSubject.OfPackage pkg(Store store, Context ctx) {
        return SheetSubject.pkg(store.results().of(project(ctx)), ctx.pathParam("package"));
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
