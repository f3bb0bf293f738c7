package com.baysheet.web.auth;

import com.baysheet.sheet.signing.OfficeKey;

import com.baysheet.auth.NewUser;
import com.baysheet.auth.Role;
import com.baysheet.auth.User;
import com.baysheet.review.AuditCsv;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.ChainCheck;
import com.baysheet.engine.InputError;
import com.baysheet.store.Editor;
import com.baysheet.store.NotFound;
import com.baysheet.store.auth.Accounts;
import com.baysheet.project.Firm;
import com.baysheet.store.auth.ResetCodes;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.engine.code.Editions;
import com.baysheet.web.Editors;
import com.baysheet.web.Form;
import com.baysheet.web.Saved;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.io.BufferedWriter;
import java.io.IOException;
import java.io.OutputStreamWriter;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.util.HashMap;
import java.util.Map;
import java.util.function.Consumer;

/**
 * The administrator's pages, all under /admin, each declared for the administrator alone.
 *
 * @param signingKey the key that signs issued PDFs, whose certificate's fingerprint the firm page shows
 * @param firmChanged run after the firm's settings are saved (names, in every project's audit entry, the issued sheets they changed)
 */
public record AdminRoutes(Accounts accounts, ReviewStore review, OfficeKey signingKey, Consumer<Editor> firmChanged) {
    private static final int AUDIT_PAGE = 100;

    public void install(RoutesConfig r) {
        r.get("/admin/users", ctx -> users(ctx, Form.filled(Map.of("role", "engineer"))), Admit.ADMINISTRATOR);
        r.post("/admin/users", this::addUser, Admit.ADMINISTRATOR);
        r.post("/admin/users/{user}/role", this::setRole, Admit.ADMINISTRATOR);
        r.post("/admin/users/{user}/active", this::setActive, Admit.ADMINISTRATOR);
        r.post("/admin/users/{user}/password", this::resetPassword, Admit.ADMINISTRATOR);
        r.post("/admin/users/{user}/unlock", this::unlock, Admit.ADMINISTRATOR);
        r.get("/admin/firm", ctx -> firm(ctx, null), Admit.ADMINISTRATOR);
        r.post("/admin/firm", this::updateFirm, Admit.ADMINISTRATOR);
        r.get("/admin/audit", ctx -> audit(ctx, null), Admit.ADMINISTRATOR);
        r.get("/admin/audit/verify", ctx -> audit(ctx, review.audit().verify()), Admit.ADMINISTRATOR);
        r.get("/admin/audit.csv", this::auditCsv, Admit.ADMINISTRATOR);
    }

    void users(Context ctx, Form f) {
        Map<String, Object> m = new HashMap<>();
        m.put("form", f);
        m.put("users", accounts.users().findAll());
        m.put("roles", Role.values());
        m.put("me", Access.user(ctx));
        m.put("waiting", accounts.logins().waiting());
        m.put("tokens", accounts.tokens().byUser());
        ctx.render("auth/users", m);
    }

    /**
     * Adds a person with no password and shows their one-time set-up code on this response only (no redirect: it
     * is stored nowhere to show again). A password posted along is ignored: the administrator never sets one.
     */
    void addUser(Context ctx) {
        Form f = Form.of(ctx);
        var issued = f.attempt(() -> accounts.admin().add(Access.user(ctx), new NewUser(f.text("username"), f.text("fullName"),
                f.text("initials"), Role.parse("role", f.text("role"))), ctx.ip()));
        if (issued.isPresent()) {
            ctx.render("auth/first-code", codePage(issued.get()));
        } else {
            ctx.status(HttpStatus.BAD_REQUEST);
            users(ctx, f);
        }
    }

    private static Map<String, Object> codePage(ResetCodes.Issued issued) {
        return Map.of("issued", issued,
                "expires", issued.expiresAt().truncatedTo(java.time.temporal.ChronoUnit.MINUTES).toString().replace('T', ' '));
    }

    void setRole(Context ctx) {
        accounts.admin().setRole(Access.user(ctx), userId(ctx), Role.parse("role", ctx.formParam("role")), ctx.ip());
        ctx.redirect(Saved.USER.after("/admin/users"), HttpStatus.SEE_OTHER);
    }

    void setActive(Context ctx) {
        accounts.admin().setActive(Access.user(ctx), userId(ctx), "true".equals(ctx.formParam("active")), ctx.ip());
        ctx.redirect(Saved.USER.after("/admin/users"), HttpStatus.SEE_OTHER);
    }

    /** Lifts a user's login wait at once (after guessing by someone else, say). */
    void unlock(Context ctx) {
        accounts.logins().unlock(Access.user(ctx), accounts.users().find(userId(ctx)), ctx.ip());
        ctx.redirect(Saved.USER.after("/admin/users"), HttpStatus.SEE_OTHER);
    }

    /**
     * Makes a one-time reset code and shows it on this response only (no redirect: it is stored nowhere to show
     * again). {@code confirm=reset} is asked for so that a stray empty POST makes no code.
     */
    void resetPassword(Context ctx) {
        if (!"reset".equals(ctx.formParam("confirm")))
            throw new InputError("confirm", String.valueOf(ctx.formParam("confirm")), "must be \"reset\" to make a reset code");
        ResetCodes.Issued issued = accounts.resets().make(Access.user(ctx), userId(ctx), ctx.ip());
        ctx.render("auth/reset-code", codePage(issued));
    }

    void firm(Context ctx, Form f) {
        Firm firm = review.firm().get();
        Form shown = f != null ? f : Form.filled(Map.of("firmName", firm.name(), "logoText", firm.logoText(),
                "defaultEdition", firm.defaultEdition(), "version", String.valueOf(firm.version()),
                "infillBeamWeight", plain(firm.infillBeamWeight()), "gridBeamWeight", plain(firm.gridBeamWeight()),
                "girderWeight", plain(firm.girderWeight()), "columnWeight", plain(firm.columnWeight())));
        ctx.render("auth/firm", Map.of("form", shown, "editions", Editions.builtIn().ids(),
                "signingFingerprint", signingKey.fingerprint(), "signingSubject", signingKey.subject()));
    }

    void updateFirm(Context ctx) {
        Form f = Form.of(ctx);
        User u = Access.user(ctx);
        long version = f.version();
        if (f.attempt(() -> {
            review.firm().update(new Firm(f.text("firmName"), f.text("logoText"), f.text("defaultEdition"),
                            weight(f, "infillBeamWeight"), weight(f, "gridBeamWeight"), weight(f, "girderWeight"),
                            weight(f, "columnWeight"), version),
                    AuditEvent.of(u.id(), u.username(), "firm settings", "firm", f.text("firmName"), ctx.ip()));
            // the self weights enter every project's calculation: what they change is named now, not on a later GET
            firmChanged.accept(Editors.of(ctx));
            return true;
        }).isPresent()) {
            ctx.redirect(Saved.FIRM.after("/admin/firm"), HttpStatus.SEE_OTHER);
        } else {
            ctx.status(HttpStatus.BAD_REQUEST);
            firm(ctx, f);
        }
    }

    /** A self weight field: blank is 0 (not included, and every sheet says so). */
    private static double weight(Form f, String field) {
        return f.text(field).isEmpty() ? 0 : f.number(field);
    }

    private static String plain(double v) { return com.baysheet.engine.units.Display.plain(v); }

    /** @param check the chain's verification, or null when not asked for */
    void audit(Context ctx, ChainCheck check) {
        int page = parsePage(ctx.queryParam("page"));
        Map<String, Object> m = new HashMap<>();
        m.put("head", review.audit().head());
        m.put("check", check);
        m.put("events", review.audit().page(AUDIT_PAGE, page * AUDIT_PAGE));
        m.put("page", page);
        m.put("more", review.audit().count() > (long) (page + 1) * AUDIT_PAGE);
        ctx.render("auth/audit", m);
    }

    void auditCsv(Context ctx) throws IOException {
        ctx.header("Content-Disposition", "attachment; filename=\"baysheet-audit-trail.csv\"");
        ctx.contentType("text/csv; charset=utf-8");
        // streamed a row at a time: the trail grows without bound and is never held whole in memory
        Writer w = new BufferedWriter(new OutputStreamWriter(ctx.outputStream(), StandardCharsets.UTF_8));
        AuditCsv csv = new AuditCsv(w);
        review.audit().forEach(csv::row);
        w.flush();
    }

    /** The furthest page whose offset (page × page size) still fits an int. */
    static final int MAX_AUDIT_PAGE = Integer.MAX_VALUE / AUDIT_PAGE - 1;

    /** ?page=N, from 0; anything else (text, negative, past {@link #MAX_AUDIT_PAGE}) is the user's mistake: a 400. */
    private static int parsePage(String p) {
        if (p == null || p.isBlank()) return 0;
        try {
            int n = Integer.parseInt(p.strip());
            if (n >= 0 && n <= MAX_AUDIT_PAGE) return n;
        } catch (NumberFormatException e) {
            // refused below, naming the text
        }
        throw new InputError("page", p, "must be a whole number from 0 to " + MAX_AUDIT_PAGE);
    }

    private static long userId(Context ctx) {
        try {
            return Long.parseLong(ctx.pathParam("user"));
        } catch (NumberFormatException e) {
            throw new NotFound("user", ctx.pathParam("user"));
        }
    }
}
