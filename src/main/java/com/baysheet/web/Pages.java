package com.baysheet.web;

import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

/** Small things every page handler does the same way. */
final class Pages {
    private Pages() {}

    /** Post-redirect-get: after a successful save, the browser fetches the page afresh. */
    static void seeOther(Context ctx, String path) {
        ctx.redirect(path, HttpStatus.SEE_OTHER);
    }
}
