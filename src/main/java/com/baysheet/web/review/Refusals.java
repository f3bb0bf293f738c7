package com.baysheet.web.review;

import com.baysheet.auth.LoginRefused;
import com.baysheet.review.ReviewRefused;
import com.baysheet.store.review.ConcurrentChange;
import com.baysheet.web.Form;
import com.baysheet.web.auth.Access;
import com.baysheet.web.auth.AccessRefused;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.net.URLEncoder;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;

/**
 * The refusals of login, access and review as responses, in one place: a page saying what was refused and
 * why, JSON under /api, and for a page that needs a login a redirect to it that comes back afterwards.
 */
public final class Refusals {
    private Refusals() {}

    public static void access(AccessRefused e, Context ctx) {
        boolean page = !api(ctx) && ctx.method().name().equals("GET");
        if (page && e.why() == AccessRefused.Why.LOGIN) {
            String next = ctx.path() + (ctx.queryString() == null ? "" : "?" + ctx.queryString());
            ctx.redirect("/login?next=" + URLEncoder.encode(next, StandardCharsets.UTF_8), HttpStatus.SEE_OTHER);
        } else if (!api(ctx) && e.why() == AccessRefused.Why.CHANGE_PASSWORD) {
            ctx.redirect(Access.CHANGE_PASSWORD_PAGE, HttpStatus.SEE_OTHER);
        } else if (!api(ctx) && e.why() == AccessRefused.Why.SET_UP) {
            ctx.redirect("/setup", HttpStatus.SEE_OTHER);
        } else if (e.why() == AccessRefused.Why.TOKEN) {
            ctx.header("WWW-Authenticate", "Bearer realm=\"baysheet\", error=\"invalid_token\""); // RFC 6750 section 3
            respond(ctx, e.status(), "API token refused", e.getMessage());
        } else {
            respond(ctx, e.status(), e.why() == AccessRefused.Why.LOGIN ? "Log in" : "Not allowed", e.getMessage());
        }
    }

    public static void login(LoginRefused e, Context ctx) {
        Form f = Form.filled(Map.of("username", value(ctx, "username"), "next", value(ctx, "next")));
        f.reject(Form.GENERAL, e.getMessage());
        ctx.status(e.retryAfter().isPresent() ? HttpStatus.TOO_MANY_REQUESTS : HttpStatus.UNAUTHORIZED);
        Map<String, Object> m = new HashMap<>();
        m.put("form", f);
        ctx.render("auth/login", m);
    }

    public static void review(ReviewRefused e, Context ctx) {
        boolean rights = e instanceof ReviewRefused.NotPermitted || e instanceof ReviewRefused.FourEyes;
        respond(ctx, rights ? 403 : 409, "Not done", e.getMessage());
    }

    public static void conflict(ConcurrentChange e, Context ctx) {
        respond(ctx, 409, "Changed meanwhile", e.getMessage());
    }

    private static void respond(Context ctx, int status, String title, String message) {
        ctx.status(HttpStatus.forStatus(status));
        if (api(ctx)) {
            ctx.json(Map.of("status", status, "error", message));
            return;
        }
        Map<String, Object> m = new HashMap<>();
        m.put("title", title);
        m.put("message", message);
        m.put("back", ctx.header("Referer") == null ? "/projects" : "");
        ctx.render("review/refused", m);
    }

    private static boolean api(Context ctx) {
        return ctx.path().equals("/api") || ctx.path().startsWith("/api/");
    }

    private static String value(Context ctx, String field) {
        String v = ctx.formParam(field);
        return v == null ? "" : v;
    }
}
