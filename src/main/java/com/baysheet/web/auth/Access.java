package com.baysheet.web.auth;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.auth.User;
import com.baysheet.store.auth.ApiTokens;
import com.baysheet.store.auth.Logins;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.project.Firm;
import com.baysheet.web.FirmOnPage;
import com.baysheet.web.auth.AccessRefused.Why;
import io.javalin.http.Context;
import io.javalin.security.RouteRole;

import java.time.Duration;
import java.util.Optional;
import java.util.Set;
import java.util.function.Supplier;

/**
 * The check run before every matched route and static file ({@code beforeMatched}): finds the login from the
 * session cookie, lets the request through only if one of the roles its route declares ({@link Admit})
 * admits it, and refuses any state-changing request whose form token (field {@code _csrf}, or header
 * {@code X-CSRF-Token} for the API) is not the session's, or before login the one of the form cookie.
 * A login whose password was set by someone else reaches only routes that admit {@link Admit#ACCOUNT} or
 * anyone until it is changed. A request to the API may instead present a personal API token ({@link Bearer}):
 * then the token alone says who it is (the cookie is not read) and no form token is asked for.
 * Handlers read the login with {@link #user(Context)}.
 */
public final class Access {
    public static final String SIGNED_IN = "signedIn";
    static final String CSRF = "csrf";
    static final String CSRF_FIELD = "_csrf";
    static final String CSRF_HEADER = "X-CSRF-Token";
    /** Set on a request whose login is an API token's. */
    static final String BY_TOKEN = "byApiToken";
    /** The firm's settings as read with the request's session. */
    private static final String FIRM_READ = "firmReadWithSession";
    private static final Duration FORM_COOKIE_AGE = Duration.ofHours(12);
    public static final String CHANGE_PASSWORD_PAGE = "/account/password";
    public static final String CHANGE_FIRST = "Your password was set by someone else: choose your own password before going on.";
    /** What a page no route matches is treated as: an office page, so a stranger learns nothing of which paths exist. */
    private static final Set<RouteRole> UNKNOWN_PATH = Set.of(Admit.OFFICE);

    private final Logins logins;
    private final ApiTokens tokens;
    private final Supplier<Firm> firm;
    private final AuditRecorder recorder;
    /** Set-up is done once and never undone, so after the first yes we stop asking the database. */
    private volatile boolean setupDone;

    /**
     * @param firm the firm's settings, put on every request let through for the page header and new projects
     * @param recorder where refused privileged attempts and form-token failures are recorded (null: nowhere)
     */
    public Access(Logins logins, ApiTokens tokens, Supplier<Firm> firm, AuditRecorder recorder) {
        this.logins = logins;
        this.tokens = tokens;
        this.firm = firm;
        this.recorder = recorder;
    }

    /** The {@code beforeMatched} check: returns when the route's roles admit the request, throws (and records) otherwise. */
    public void check(Context ctx) {
        try {
            admitRoute(ctx);
        } catch (AccessRefused e) {
            if (recorder != null) recorder.refused(ctx, e);
            throw e;
        }
    }

    private void admitRoute(Context ctx) {
        Set<RouteRole> admits = ctx.routeRoles();
        // the health check asks the database itself: it must answer (503) when the session lookup would fail
        if (admits.contains(Admit.OPEN)) return;
        admit(ctx, admits);
        checkFormToken(ctx);
    }

    /** A request no route matched: refused as a stranger's request for an office page would be, else not found. */
    public Optional<AccessRefused> unmatched(Context ctx) {
        try {
            admit(ctx, UNKNOWN_PATH);
            return Optional.empty();
        } catch (AccessRefused e) {
            return Optional.of(e);
        }
    }

    private void admit(Context ctx, Set<RouteRole> admits) {
        Optional<SignedIn> s = identify(ctx);
        Role role = s.map(x -> x.user().role()).orElse(null);
        Optional<Why> refused = decide(admits, role, s.map(SignedIn::mustChangePassword).orElse(false), setupDone());
        if (refused.isPresent()) throw refusal(refused.get(), role);
        // the firm's settings as read with the session, else (no session, an API token) read now
        Firm read = ctx.attribute(FIRM_READ);
        FirmOnPage.put(ctx, read != null ? read : firm.get());
    }

    /**
     * Whether a route declaring {@code admits} lets in a user of {@code role} (null: nobody signed in), the one
     * rule every route follows: empty when let through, else why not. A route that declares no role admits nobody.
     */
    public static Optional<Why> decide(Set<? extends RouteRole> admits, Role role, boolean mustChangePassword, boolean setupDone) {
        if (admits.isEmpty()) return Optional.of(Why.FORBIDDEN);
        if (admits.contains(Admit.OPEN)) return Optional.empty();
        if (admits.contains(Admit.FIRST_START)) return setupDone ? Optional.of(Why.LOGIN) : Optional.empty();
        if (!setupDone) return Optional.of(Why.SET_UP);
        if (admits.contains(Admit.ANYONE)) return Optional.empty();
        if (role == null) return Optional.of(Why.LOGIN);
        if (admits.stream().noneMatch(a -> a instanceof Admit x && x.lets(role))) return Optional.of(Why.FORBIDDEN);
        if (mustChangePassword && !admits.contains(Admit.ACCOUNT)) return Optional.of(Why.CHANGE_PASSWORD);
        return Optional.empty();
    }

    private static AccessRefused refusal(Why why, Role role) {
        return new AccessRefused(why, switch (why) {
            case LOGIN -> "Please log in to continue.";
            case SET_UP -> "Baysheet has no administrator yet: set it up first.";
            case CHANGE_PASSWORD -> CHANGE_FIRST;
            case TOKEN -> Bearer.REFUSED;
            case FORBIDDEN, FORM_TOKEN -> role == null ? "Nobody is let in here."
                    : "Your role (" + role.label() + ") does not allow this. Ask your administrator if you need it.";
        });
    }

    /** The login of the API token or else the session cookie on the request, and the form token its forms carry. */
    private Optional<SignedIn> identify(Context ctx) {
        Optional<String> token = Bearer.presented(ctx);
        if (token.isPresent()) {
            SignedIn t = Bearer.signedIn(ctx, token.get(), tokens);
            ctx.attribute(SIGNED_IN, t);
            ctx.attribute(BY_TOKEN, Boolean.TRUE);
            return Optional.of(t);
        }
        Optional<Logins.Arrival> arrived = logins.arrive(Cookies.token(ctx, Cookies.SESSION));
        Optional<SignedIn> s = arrived.map(Logins.Arrival::signedIn);
        arrived.ifPresent(a -> {
            ctx.attribute(SIGNED_IN, a.signedIn());
            ctx.attribute(CSRF, a.signedIn().csrfToken());
            if (a.firm() != null) ctx.attribute(FIRM_READ, a.firm());
        });
        if (s.isEmpty()) ctx.attribute(CSRF, formToken(ctx));
        return s;
    }

    /** The logged-in user of a request that passed the check on a route that needs one. */
    public static User user(Context ctx) {
        return signedIn(ctx).user();
    }

    public static SignedIn signedIn(Context ctx) {
        SignedIn s = ctx.attribute(SIGNED_IN);
        if (s == null) throw new AccessRefused(Why.LOGIN, "Please log in to continue.");
        return s;
    }

    private boolean setupDone() {
        if (!setupDone) setupDone = logins.setupDone();
        return setupDone;
    }

    /** GET, HEAD and OPTIONS change nothing (no route of ours writes on them); everything else carries the token. */
    private static void checkFormToken(Context ctx) {
        String m = ctx.method().name();
        if (m.equals("GET") || m.equals("HEAD") || m.equals("OPTIONS")) return;
        if (Boolean.TRUE.equals(ctx.attribute(BY_TOKEN))) return; // no cookie was used: see Bearer
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
