package com.baysheet.web.auth;

import com.baysheet.store.auth.ApiTokens;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.web.auth.AccessRefused.Why;
import io.javalin.http.Context;

import java.util.Locale;
import java.util.Optional;

/**
 * A personal API token sent as {@code Authorization: Bearer TOKEN} (RFC 6750 section 2.1): it opens the API
 * under {@code /api} alone, with its owner's role as the owner's account stands at this request. It needs no
 * form token: a form token guards against a browser sending its cookie with a request some other site made
 * it send, and a browser never adds an Authorization header of its own accord, so a request carrying a token
 * was sent on purpose by whoever holds it. Any other Authorization scheme is not ours and is ignored.
 */
final class Bearer {
    static final String SCHEME = "bearer ";
    static final String REFUSED = "This API token is not valid: it may have been revoked, or its owner's account made inactive. "
            + "Make a new one on your account's API tokens page.";
    static final String NOT_A_PAGE = "An API token opens only the API (paths under /api/); pages need a login in the browser.";

    private Bearer() {}

    /** The token the request presents, if it presents one (blank if the header names the scheme and nothing else). */
    static Optional<String> presented(Context ctx) {
        String h = ctx.header("Authorization");
        if (h == null) return Optional.empty();
        String t = h.strip();
        if (t.equalsIgnoreCase(SCHEME.strip())) return Optional.of("");
        if (!t.toLowerCase(Locale.ROOT).startsWith(SCHEME)) return Optional.empty();
        return Optional.of(t.substring(SCHEME.length()).strip());
    }

    /** The login the token stands for; refused (401) when it opens nothing, or when the path is not the API. */
    static SignedIn signedIn(Context ctx, String token, ApiTokens tokens) {
        if (!api(ctx.path())) throw new AccessRefused(Why.TOKEN, NOT_A_PAGE);
        ApiTokens.Holder h = tokens.holder(token).orElseThrow(() -> new AccessRefused(Why.TOKEN, REFUSED));
        // no session: no cookie value, no form token, and nothing to lapse but the token itself
        return new SignedIn(h.user(), null, null, null).withMustChangePassword(h.mustChangePassword());
    }

    static boolean api(String path) {
        return path.equals("/api") || path.startsWith("/api/");
    }
}
