package com.baysheet.web.auth;

import com.baysheet.web.Tls;
import io.javalin.http.Context;

import java.time.Duration;

/**
 * The two cookies of a login: the session, and before login the token that the login and set-up forms
 * echo. Both HttpOnly (no script reads them) and SameSite=Lax (not sent on another site's form posts);
 * Secure when the request came over HTTPS, directly or through the TLS proxy ({@code --behind-tls}). Written as headers so that every attribute is visible here.
 */
final class Cookies {
    static final String SESSION = "bs_session";
    static final String FORM = "bs_form";

    private Cookies() {}

    static void set(Context ctx, String name, String value, Duration maxAge) {
        ctx.res().addHeader("Set-Cookie", name + "=" + value + "; Path=/; Max-Age=" + maxAge.toSeconds()
                + "; HttpOnly; SameSite=Lax" + secure(ctx));
    }

    static void clear(Context ctx, String name) {
        ctx.res().addHeader("Set-Cookie", name + "=; Path=/; Max-Age=0; HttpOnly; SameSite=Lax" + secure(ctx));
    }

    private static String secure(Context ctx) {
        return Tls.secure(ctx) ? "; Secure" : "";
    }

    /** A cookie value we could have issued (URL-safe base64 of 32 bytes), or null. */
    static String token(Context ctx, String name) {
        String v = ctx.cookie(name);
        return v != null && TOKEN.matcher(v).matches() ? v : null;
    }

    /** Compiled once: every request with a cookie is checked against it. */
    private static final java.util.regex.Pattern TOKEN = java.util.regex.Pattern.compile("[A-Za-z0-9_-]{43}");
}
