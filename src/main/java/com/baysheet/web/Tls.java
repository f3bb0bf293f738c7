package com.baysheet.web;

import io.javalin.http.Context;

/**
 * Whether the browser reached this server over HTTPS: directly (the request is secure), or through the
 * office's TLS proxy when the server was started with {@code --behind-tls} (the proxy speaks plain HTTP to
 * us, so the request alone cannot tell). Cookies are then Secure, and responses carry Strict-Transport-Security.
 */
public final class Tls {
    private static final String BEHIND = "baysheet.behindTls";

    private Tls() {}

    static void mark(Context ctx) {
        ctx.attribute(BEHIND, Boolean.TRUE);
    }

    /** Whether cookies set on this response must be Secure. */
    public static boolean secure(Context ctx) {
        return ctx.req().isSecure() || Boolean.TRUE.equals(ctx.attribute(BEHIND));
    }
}
