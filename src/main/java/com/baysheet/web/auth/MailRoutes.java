package com.baysheet.web.auth;

import com.baysheet.auth.User;
import com.baysheet.notice.MailSettings;
import com.baysheet.notice.Notifier;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.NotFound;
import com.baysheet.store.auth.UserStore;
import com.baysheet.store.review.MailStore;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.web.Form;
import com.baysheet.web.Saved;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.util.HashMap;
import java.util.Map;

/**
 * The administrator's e-mail notice settings (the firm's SMTP server, switched on or off, the address notices link
 * to), the last notice that failed to send, and each person's address. Only wiring: the notices are
 * {@code com.baysheet.notice}'s, the settings the store's.
 */
public final class MailRoutes {
    private final ReviewStore review;
    private final UserStore users;
    private final Notifier notifier;

    public MailRoutes(ReviewStore review, UserStore users, Notifier notifier) {
        this.review = review;
        this.users = users;
        this.notifier = notifier;
    }

    public void install(RoutesConfig r) {
        r.get("/admin/mail", ctx -> show(ctx, null), Admit.ADMINISTRATOR);
        r.post("/admin/mail", this::update, Admit.ADMINISTRATOR);
        r.post("/admin/mail/addresses/{user}", this::setAddress, Admit.ADMINISTRATOR);
    }

    void show(Context ctx, Form f) {
        MailStore.Stored s = review.mail().get();
        MailSettings m = s.settings();
        Form shown = f != null ? f : Form.filled(Map.of("on", m.on() ? "on" : "", "host", m.host(), "port", String.valueOf(m.port()),
                "security", m.security().name(), "username", m.username(), "fromAddress", m.fromAddress(),
                "officeAddress", m.officeAddress(), "version", String.valueOf(s.version())));
        Map<String, Object> model = new HashMap<>();
        model.put("form", shown);
        model.put("on", f != null ? f.checked("on") : m.on());
        model.put("securities", MailSettings.Security.values());
        // the store keeps the last failure across restarts; this server's own may be newer than the stored one failed to be
        model.put("failure", notifier.lastFailure().or(s::lastFailure).orElse(null));
        model.put("passwordGiven", notifier.hasPassword());
        model.put("users", users.findAll());
        model.put("addresses", review.mail().addresses());
        ctx.render("auth/mail", model);
    }

    void update(Context ctx) {
        Form f = Form.of(ctx);
        User u = Access.user(ctx);
        long version = f.version();
        if (f.attempt(() -> {
            MailSettings s = new MailSettings(f.checked("on"), f.text("host"), f.integer("port"),
                    MailSettings.Security.parse("security", f.text("security")), f.text("username"), f.text("fromAddress"), f.text("officeAddress"));
            review.mail().save(s, version, AuditEvent.of(u.id(), u.username(), "mail settings", "mail",
                    (s.on() ? "notices on, through " : "notices off; server ") + s.server(), ctx.ip()));
            return true;
        }).isPresent()) {
            ctx.redirect(Saved.MAIL.after("/admin/mail"), HttpStatus.SEE_OTHER);
        } else {
            ctx.status(HttpStatus.BAD_REQUEST);
            show(ctx, f);
        }
    }

    /** A person's address for notices; blank clears it. */
    void setAddress(Context ctx) {
        long id = userId(ctx);
        Form f = Form.of(ctx);
        // blank clears the address; a post without the field at all is not a clearing but a broken form
        if (!f.checked("email")) f.reject("email", "the address is missing from the form (blank clears it)");
        String text = f.text("email");
        if (f.attempt(() -> text.isEmpty() ? "" : MailSettings.address("email", text).getAddress()).map(email -> {
            User admin = Access.user(ctx);
            User who = users.find(id);
            review.mail().setAddress(id, email.isEmpty() ? null : email, AuditEvent.of(admin.id(), admin.username(),
                    "notice address", "user " + who.username(), email.isEmpty() ? "cleared" : email, ctx.ip()));
            return true;
        }).isPresent()) {
            ctx.redirect(Saved.MAIL.after("/admin/mail") + "#addresses", HttpStatus.SEE_OTHER);
        } else {
            ctx.status(HttpStatus.BAD_REQUEST);
            show(ctx, null);
        }
    }

    private static long userId(Context ctx) {
        try {
            return Long.parseLong(ctx.pathParam("user"));
        } catch (NumberFormatException e) {
            throw new NotFound("user", ctx.pathParam("user"));
        }
    }
}
