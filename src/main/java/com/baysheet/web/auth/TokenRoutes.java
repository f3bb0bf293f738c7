package com.baysheet.web.auth;

import com.baysheet.auth.User;
import com.baysheet.engine.InputError;
import com.baysheet.store.NotFound;
import com.baysheet.store.auth.ApiTokens;
import com.baysheet.web.Form;
import com.baysheet.web.Saved;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * One's own API tokens (any signed-in member of the office: each token acts with its owner's role), and the
 * administrator revoking anyone's from the users page. The token's id is a form field, not a path parameter.
 */
public record TokenRoutes(ApiTokens tokens) {
    public static final String PAGE = "/account/tokens";

    public void install(RoutesConfig r) {
        r.get(PAGE, ctx -> page(ctx, Form.filled(Map.of()), null), Admit.OFFICE);
        r.post(PAGE, this::make, Admit.OFFICE);
        r.post(PAGE + "/revoke", this::revokeOwn, Admit.OFFICE);
        r.post("/admin/users/{user}/tokens/revoke", this::revokeAny, Admit.ADMINISTRATOR);
    }

    /** @param issued the token just made, shown on this response alone (no redirect: it is stored nowhere to show again) */
    private void page(Context ctx, Form f, ApiTokens.Issued issued) {
        Map<String, Object> m = new HashMap<>();
        m.put("form", f);
        m.put("issued", issued);
        m.put("tokens", tokens.of(Access.user(ctx).id()));
        m.put("max", ApiTokens.MAX_PER_USER);
        ctx.render("auth/tokens", m);
    }

    void make(Context ctx) {
        Form f = Form.of(ctx);
        Optional<ApiTokens.Issued> made = f.attempt(() -> tokens.make(Access.user(ctx), f.text("name"), ctx.ip()));
        if (made.isEmpty()) ctx.status(HttpStatus.BAD_REQUEST);
        page(ctx, made.isPresent() ? Form.filled(Map.of()) : f, made.orElse(null));
    }

    void revokeOwn(Context ctx) {
        User me = Access.user(ctx);
        tokens.revoke(me, me.id(), tokenId(ctx), ctx.ip());
        ctx.redirect(Saved.TOKEN_REVOKED.after(PAGE), HttpStatus.SEE_OTHER);
    }

    void revokeAny(Context ctx) {
        long owner;
        try {
            owner = Long.parseLong(ctx.pathParam("user"));
        } catch (NumberFormatException e) {
            throw new NotFound("user", ctx.pathParam("user"));
        }
        tokens.revoke(Access.user(ctx), owner, tokenId(ctx), ctx.ip());
        ctx.redirect(Saved.TOKEN_REVOKED.after("/admin/users"), HttpStatus.SEE_OTHER);
    }

    private static long tokenId(Context ctx) {
        String v = ctx.formParam("token");
        try {
            return Long.parseLong(v == null ? "" : v.strip());
        } catch (NumberFormatException e) {
            throw new InputError("token", v, "must be the number of one of the listed tokens");
        }
    }
}
