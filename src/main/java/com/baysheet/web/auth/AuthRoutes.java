package com.baysheet.web.auth;

import com.baysheet.auth.NewUser;
import com.baysheet.auth.Role;
import com.baysheet.auth.SessionPolicy;
import com.baysheet.auth.SetupCode;
import com.baysheet.store.auth.Logins;
import com.baysheet.store.auth.ResetCodes;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.web.Form;
import com.baysheet.web.Saved;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * Logging in and out, the one-time set-up of the first administrator (which asks for the code the server
 * printed in its console), a password change, and a password chosen with a one-time reset code.
 */
public record AuthRoutes(Logins logins, SetupCode setupCode, ResetCodes resets) {
    /** Where a person uses a one-time reset code; open without a login. */
    public static final String RESET_PAGE = "/account/reset";

    public void install(RoutesConfig r) {
        r.get("/login", this::loginForm, Admit.ANYONE);
        r.post("/login", this::login, Admit.ANYONE);
        r.post("/logout", this::logout, Admit.ACCOUNT);
        r.get("/setup", this::setupForm, Admit.FIRST_START);
        r.post("/setup", this::setup, Admit.FIRST_START);
        r.get("/account/password", this::passwordForm, Admit.ACCOUNT);
        r.post("/account/password", this::changePassword, Admit.ACCOUNT);
        r.get(RESET_PAGE, ctx -> ctx.render("auth/reset", model(Form.filled(Map.of()))), Admit.ANYONE);
        r.post(RESET_PAGE, this::reset, Admit.ANYONE);
    }

    void loginForm(Context ctx) {
        Map<String, Object> m = model(Form.filled(Map.of("next", safeNext(ctx.queryParam("next")))));
        ctx.render("auth/login", m);
    }

    void login(Context ctx) {
        Form f = Form.of(ctx);
        SignedIn s = logins.login(f.text("username"), f.value("password"), ctx.ip(), Cookies.token(ctx, Cookies.SESSION));
        startSession(ctx, s);
        String next = s.mustChangePassword() ? Access.CHANGE_PASSWORD_PAGE : safeNext(f.text("next"));
        if (s.failedAttempts() == 0 && s.notices().isEmpty()) {
            ctx.redirect(next, HttpStatus.SEE_OTHER);
            return;
        }
        // the user is told before going on: someone may have been guessing their password, or had it reset
        ctx.render("auth/login-notice", Map.of("attempts", s.failedAttempts(), "notices", s.notices(), "next", next));
    }

    /** The person chooses their own password with the administrator's one-time code, then logs in. */
    void reset(Context ctx) {
        Form f = Form.of(ctx);
        if (f.attempt(() -> {
            resets.use(f.text("username"), f.value("code"), f.value("newPassword"), f.value("confirmPassword"), ctx.ip());
            return true;
        }).isPresent()) {
            ctx.redirect(Saved.PASSWORD.after("/login"), HttpStatus.SEE_OTHER);
        } else {
            ctx.status(HttpStatus.BAD_REQUEST);
            ctx.render("auth/reset", model(f));
        }
    }

    void logout(Context ctx) {
        logins.logout(Access.signedIn(ctx), ctx.ip());
        Cookies.clear(ctx, Cookies.SESSION);
        ctx.redirect("/login", HttpStatus.SEE_OTHER);
    }

    void setupForm(Context ctx) {
        ctx.render("auth/setup", model(Form.filled(Map.of())));
    }

    void setup(Context ctx) {
        Form f = Form.of(ctx);
        Optional<Optional<SignedIn>> done = f.attempt(() -> {
            setupCode.check("setupCode", f.text("setupCode"));
            return logins.setUp(new NewUser(f.text("username"), f.text("fullName"),
                f.text("initials"), Role.ADMINISTRATOR), f.value("password"), f.value("confirmPassword"), ctx.ip());
        });
        if (done.isEmpty()) {
            ctx.status(HttpStatus.BAD_REQUEST);
            ctx.render("auth/setup", model(f));
        } else if (done.get().isEmpty()) {
            ctx.redirect("/login", HttpStatus.SEE_OTHER); // someone else finished the set-up first
        } else {
            startSession(ctx, done.get().get());
            ctx.redirect("/admin/users", HttpStatus.SEE_OTHER);
        }
    }

    void passwordForm(Context ctx) {
        ctx.render("auth/password", passwordModel(ctx, Form.filled(Map.of())));
    }

    /** The form, with the notice when the password was set by someone else and must be changed first. */
    private static Map<String, Object> passwordModel(Context ctx, Form f) {
        Map<String, Object> m = model(f);
        if (Access.signedIn(ctx).mustChangePassword()) m.put("mustChange", Access.CHANGE_FIRST);
        return m;
    }

    void changePassword(Context ctx) {
        Form f = Form.of(ctx);
        SignedIn s = Access.signedIn(ctx);
        if (f.attempt(() -> {
            logins.changePassword(s, f.value("currentPassword"), f.value("newPassword"), f.value("confirmPassword"), ctx.ip());
            return true;
        }).isPresent()) {
            ctx.redirect(Saved.PASSWORD.after("/account/password"), HttpStatus.SEE_OTHER);
        } else {
            ctx.status(HttpStatus.BAD_REQUEST);
            ctx.render("auth/password", passwordModel(ctx, f));
        }
    }

    static Map<String, Object> model(Form f) {
        Map<String, Object> m = new HashMap<>();
        m.put("form", f);
        return m;
    }

    private static void startSession(Context ctx, SignedIn s) {
        // the cookie lasts no longer than the longest session; the server ends it sooner when idle
        Cookies.set(ctx, Cookies.SESSION, s.token(), SessionPolicy.OFFICE.absolute());
        ctx.attribute(Access.CSRF, s.csrfToken());
    }

    /** The sections of this server a login may return to. */
    private static final java.util.regex.Pattern OWN_PATH = java.util.regex.Pattern.compile(
            "/(projects|review|admin|account|occupancies|verify)(/[A-Za-z0-9._~%/-]*)?(\\?[A-Za-z0-9._~%&=+-]*)?");

    /**
     * Only an absolute path into one of this server's own sections, in plain URL characters: never another
     * site ({@code //host}, {@code /\\host}, a tab or other control character that a browser drops), never
     * the login page again. Anything else is {@code /}.
     */
    static String safeNext(String next) {
        if (next == null || !OWN_PATH.matcher(next).matches() || next.contains("//")) return "/";
        return next;
    }
}
