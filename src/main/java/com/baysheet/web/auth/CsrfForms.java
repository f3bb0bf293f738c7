package com.baysheet.web.auth;

import io.javalin.http.Context;

import java.util.regex.Pattern;

/**
 * The after-filter that gives every POST form of every HTML page the request's form token as a hidden
 * {@code _csrf} field, server-side, so that no template can forget it and no script is needed. The token
 * is URL-safe base64 (no character that needs escaping in an attribute).
 */
public final class CsrfForms {
    private static final Pattern POST_FORM = Pattern.compile("<form\\b[^>]*\\bmethod=\"post\"[^>]*>", Pattern.CASE_INSENSITIVE);

    private CsrfForms() {}

    /** The request attribute that says this response's forms carry the token already (a kept page, filled in). */
    private static final String FILLED = "csrfFilled";

    public static void after(Context ctx) {
        if (ctx.attribute(FILLED) != null) return;
        String token = ctx.attribute(Access.CSRF);
        String type = ctx.res().getContentType();
        if (token == null || type == null || !type.startsWith("text/html")) return;
        String html = ctx.result();
        if (html == null || !html.contains("<form")) return;
        ctx.result(insert(html, token));
    }

    /** The request's form token (the session's, or before login the form cookie's); null on an open route. */
    public static String token(Context ctx) {
        return ctx.attribute(Access.CSRF);
    }

    /** Marks this response as one whose forms already carry the token, so that the after-filter leaves it alone. */
    public static void filled(Context ctx) {
        ctx.attribute(FILLED, Boolean.TRUE);
    }

    /** The page with the hidden token field {@code token} in every POST form. */
    public static String insert(String html, String token) {
        String field = "<input type=\"hidden\" name=\"" + Access.CSRF_FIELD + "\" value=\"" + token + "\">";
        // find each "<form" tag by plain search and match only the tag itself: running the case-insensitive
        // pattern over a whole page took a quarter of a member page's time under load
        StringBuilder out = new StringBuilder(html.length() + 256);
        int from = 0;
        for (int at = formTag(html, 0); at >= 0; at = formTag(html, from)) {
            int end = html.indexOf('>', at);
            if (end < 0) break;
            out.append(html, from, end + 1);
            if (POST_FORM.matcher(html.substring(at, end + 1)).matches()) out.append(field);
            from = end + 1;
        }
        return out.append(html, from, html.length()).toString();
    }

    /**
     * Where the next {@code <form} tag starts (in any letter case), or -1. Only tags that start with an f are
     * looked at, each found by plain search, so that the thousands of other tags of a plan go by at search speed.
     */
    private static int formTag(String html, int from) {
        int lower = html.indexOf("<f", from), upper = html.indexOf("<F", from);
        while (lower >= 0 || upper >= 0) {
            int at = upper < 0 || (lower >= 0 && lower < upper) ? lower : upper;
            if (html.regionMatches(true, at, "<form", 0, 5)) return at;
            if (at == lower) lower = html.indexOf("<f", at + 1);
            else upper = html.indexOf("<F", at + 1);
        }
        return -1;
    }
}
