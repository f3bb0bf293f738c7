package com.baysheet.web;

import io.javalin.http.Context;

/**
 * Headers on every response: no content sniffing, never framed (against clickjacking), and a
 * Content-Security-Policy that allows scripts, styles, images and form posts from this server only: no
 * inline script anywhere (page scripts live under static/), no plug-ins, no other base. Style attributes
 * are allowed ({@code style-src-attr}): the bay grid and plan legends colour cells with them, and a style
 * attribute cannot run script. Behind a TLS proxy ({@code --behind-tls}) also Strict-Transport-Security: a
 * year, this host only (not its subdomains: other machines of the office may still speak plain HTTP).
 */
final class Headers {
    static final String CSP = "default-src 'self'; script-src 'self'; style-src 'self'; style-src-attr 'unsafe-inline'; "
            + "img-src 'self' data:; object-src 'none'; base-uri 'none'; form-action 'self'; frame-ancestors 'none'";

    static final String HSTS = "max-age=31536000";

    private Headers() {}

    static void apply(Context ctx, boolean behindTls) {
        if (behindTls) {
            Tls.mark(ctx);
            ctx.header("Strict-Transport-Security", HSTS);
        }
        ctx.header("X-Content-Type-Options", "nosniff");
        ctx.header("X-Frame-Options", "DENY");
        ctx.header("Content-Security-Policy", CSP);
        ctx.header("Referrer-Policy", "same-origin");
    }

    /** An after-filter: a page rendered as plain "text/html" says its charset, so no browser guesses one. */
    static void charset(Context ctx) {
        String type = ctx.res().getContentType();
        if (type != null && type.startsWith("text/html") && !type.toLowerCase().contains("charset"))
            ctx.contentType("text/html; charset=utf-8");
    }
}
