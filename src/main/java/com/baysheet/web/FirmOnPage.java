package com.baysheet.web;

import com.baysheet.engine.code.Editions;
import com.baysheet.project.Firm;
import io.javalin.http.Context;

/**
 * The firm's settings for this request: put on each request the access check lets through, read by the page
 * header (name and logo text) and by a new project (the default code edition). A request without them (an
 * open route) starts new projects with the built-in default edition.
 */
public final class FirmOnPage {
    /** The request attribute, and the name the page layout reads it by. */
    public static final String ATTRIBUTE = "firmSettings";

    private FirmOnPage() {}

    public static void put(Context ctx, Firm firm) {
        ctx.attribute(ATTRIBUTE, firm);
    }

    /** The edition a new project starts with when none is chosen. */
    static String defaultEdition(Context ctx) {
        Firm f = ctx.attribute(ATTRIBUTE);
        return f == null ? Editions.builtIn().byDefault().id() : f.defaultEdition();
    }
}
