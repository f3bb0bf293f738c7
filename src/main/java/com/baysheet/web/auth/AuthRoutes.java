package com.baysheet.web.auth;

import com.baysheet.auth.NewUser;
import com.baysheet.auth.Role;
import com.baysheet.auth.SessionPolicy;
import com.baysheet.store.auth.Logins;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.web.Form;
import com.baysheet.web.Saved;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/** Logging in and out, the one-time set-up of the first administrator, a password change, and the health check. */
public final class AuthRoutes {
    private final Logins logins;

    public AuthRoutes(Logins logins) {
        this.logins = logins;
    }

    public void install(RoutesConfig r) {
        r.get("/health", ctx -> ctx.json(Map.of("status", "ok")));
        r.get("/login", this::loginForm);
        r.post("/login", this::login);
        r.post("/logout", this::logout);
        r.get("/setup", this::setupForm);
        r.post("/setup", this::setup);
        r.get("/account/password", this::passwordForm);
        r.post("/account/password", this::changePassword);
    }

    void loginForm(Context ctx) {
        Map<String, Object> m = model(Form.filled(Map.of("next", safeNext(ctx.queryParam("next")))));
        ctx.render("auth/login", m);
    }

    void login(Context ctx) {
        Form f = Form.of(ctx);
        SignedIn s = logins.login(f.text("username"), f.value("password"), ctx.ip(), Cookies.token(ctx, Cookies.SESSION));
        startSession(ctx, s);
        ctx.redirect(safeNext(f.text("next")), HttpStatus.SEE_OTHER);
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
        Optional<Optional<SignedIn>> done = f.attempt(() -> logins.setUp(new NewUser(f.text("username"), f.text("fullName"),
                f.text("initials"), Role.ADMINISTRATOR), f.value("password"), f.value("confirmPassword"), ctx.ip()));
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
        ctx.render("auth/password", model(Form.filled(Map.of())));
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
            ctx.render("auth/password", model(f));
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

    /** Only a path of this server: never another site (an open redirect), never the login page again. */
    static String safeNext(String next) {
        if (next == null || !next.startsWith("/") || next.startsWith("//") || next.startsWith("/\\")
                || next.startsWith("/login") || next.contains("\r") || next.contains("\n")) return "/projects";
        return next;
    }
}
