package com.baysheet.web.auth;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.auth.User;
import com.baysheet.store.auth.Logins;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.web.auth.AccessRefused.Why;
import io.javalin.http.Context;

import java.time.Duration;
import java.util.Optional;

/**
 * The before-filter of every request: finds the login from the session cookie, applies {@link AccessRules},
 * and refuses any state-changing request whose form token (field {@code _csrf}, or header
 * {@code X-CSRF-Token} for the API) is not the session's, or before login the one of the form cookie.
 * A login whose password was set by someone else (the administrator, or the demo console) reaches only the
 * password change, logout and static files until it is changed. Handlers read the login with {@link #user(Context)}.
 */
public final class Access {
    public static final String SIGNED_IN = "signedIn";
    static final String CSRF = "csrf";
    static final String CSRF_FIELD = "_csrf";
    static final String CSRF_HEADER = "X-CSRF-Token";
    static final String HEALTH = "/health";
    private static final Duration FORM_COOKIE_AGE = Duration.ofHours(12);
    public static final String CHANGE_PASSWORD_PAGE = "/account/password";
    public static final String CHANGE_FIRST = "Your password was set by someone else: choose your own password before going on.";

    private final Logins logins;
    private final AuditRecorder recorder;
    /** Set-up is done once and never undone, so after the first yes we stop asking the database. */
    private volatile boolean setupDone;

    public Access(Logins logins) {
        this(logins, null);
    }

    /** @param recorder where refused privileged attempts and form-token failures are recorded (null: nowhere) */
    public Access(Logins logins, AuditRecorder recorder) {
        this.logins = logins;
        this.recorder = recorder;
    }

    public void before(Context ctx) {
        try {
            check(ctx);
        } catch (AccessRefused e) {
            if (recorder != null) recorder.refused(ctx, e);
            throw e;
        }
    }

    private void check(Context ctx) {
        // the health check asks the database itself: it must answer (503) when the session lookup would fail
        if (ctx.path().equals(HEALTH)) return;
        Optional<SignedIn> s = logins.session(Cookies.token(ctx, Cookies.SESSION));
        s.ifPresent(x -> {
            ctx.attribute(SIGNED_IN, x);
            ctx.attribute(CSRF, x.csrfToken());
        });
        if (s.isEmpty()) ctx.attribute(CSRF, formToken(ctx));
        Role role = s.map(x -> x.user().role()).orElse(null);
        switch (AccessRules.decide(ctx.method().name(), ctx.path(), role, setupDone())) {
            case ALLOW -> {
                checkFormToken(ctx);
                if (s.isPresent() && s.get().mustChangePassword() && !mayBeforeChange(ctx.path()))
                    throw new AccessRefused(Why.CHANGE_PASSWORD, CHANGE_FIRST);
            }
            case LOGIN -> throw new AccessRefused(Why.LOGIN, "Please log in to continue.");
            case SET_UP -> throw new AccessRefused(Why.SET_UP, "Baysheet has no administrator yet: set it up first.");
            case FORBIDDEN -> throw new AccessRefused(Why.FORBIDDEN,
                    "Your role (" + role.label() + ") does not allow this. Ask your administrator if you need it.");
        }
    }

    /** The logged-in user of a request that passed the filter on a route that needs one. */
    public static User user(Context ctx) {
        return signedIn(ctx).user();
    }

    public static SignedIn signedIn(Context ctx) {
        SignedIn s = ctx.attribute(SIGNED_IN);
        if (s == null) throw new AccessRefused(Why.LOGIN, "Please log in to continue.");
        return s;
    }

    /** What a login with a password set by someone else may still reach: the change itself, logout, static files. */
    private static boolean mayBeforeChange(String path) {
        return path.equals(CHANGE_PASSWORD_PAGE) || path.equals("/logout") || path.equals("/login") || AccessRules.isOpen(path);
    }

    private boolean setupDone() {
        if (!setupDone) setupDone = logins.setupDone();
        return setupDone;
    }

    private static void checkFormToken(Context ctx) {
        String m = ctx.method().name();
        if (m.equals("GET") || m.equals("HEAD") || m.equals("OPTIONS")) return;
        String sent = ctx.header(CSRF_HEADER);
        if (sent == null) sent = ctx.formParam(CSRF_FIELD);
        if (!Tokens.same(sent, ctx.attribute(CSRF)))
            throw new AccessRefused(Why.FORM_TOKEN, "This form has expired or did not come from this Baysheet page. "
                    + "Reload the page and try again.");
    }

    /** The token of the pre-login forms, kept in its own cookie (double submit); issued when missing. */
    private static String formToken(Context ctx) {
        String t = Cookies.token(ctx, Cookies.FORM);
        if (t == null) {
            t = Tokens.random();
            Cookies.set(ctx, Cookies.FORM, t, FORM_COOKIE_AGE);
        }
        return t;
    }
}
