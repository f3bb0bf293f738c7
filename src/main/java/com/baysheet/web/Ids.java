package com.baysheet.web;

import com.baysheet.store.NotFound;
import io.javalin.http.Context;

/** Numeric ids from the path: anything that is not one names nothing, so it is a 404 like any unknown id. */
final class Ids {
    private Ids() {}

    static long project(Context ctx) { return id(ctx, "project"); }

    static long level(Context ctx) { return id(ctx, "level"); }

    static long lineLoad(Context ctx) { return id(ctx, "lineLoad"); }

    static long pointLoad(Context ctx) { return id(ctx, "pointLoad"); }

    static long item(Context ctx) { return id(ctx, "item"); }

    private static long id(Context ctx, String name) {
        String text = ctx.pathParam(name);
        try {
            return Long.parseLong(text);
        } catch (NumberFormatException e) {
            throw new NotFound(name, text);
        }
    }
}
