package com.baysheet.web.review;

import com.baysheet.auth.LoginRefused;
import com.baysheet.auth.LoginThrottle;
import com.baysheet.auth.Passwords;
import com.baysheet.auth.SessionPolicy;
import com.baysheet.auth.SetupCode;
import com.baysheet.review.ReviewRefused;
import com.baysheet.store.Sql;
import com.baysheet.store.Store;
import com.baysheet.store.auth.Accounts;
import com.baysheet.store.auth.Logins;
import com.baysheet.store.review.ConcurrentChange;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.web.FirmOnPage;
import com.baysheet.web.Health;
import com.baysheet.web.auth.Access;
import com.baysheet.web.auth.AccessRefused;
import com.baysheet.web.auth.AdminRoutes;
import com.baysheet.web.auth.AuditRecorder;
import com.baysheet.web.auth.AuthRoutes;
import com.baysheet.web.auth.BackupRoutes;
import com.baysheet.web.auth.CsrfForms;
import io.javalin.config.RoutesConfig;

import javax.sql.DataSource;
import java.time.Clock;

/**
 * Users, access and the sheet check, installed into the server's routes: the access filter first (login,
 * roles, form tokens) and the firm's settings for the page header and new projects, then the pages of login, administration and review, and the mapping of their
 * refusals to pages. Installed by the server before its own filters and routes.
 */
public final class Signoff {
    private final Store store;
    private final Accounts accounts;
    private final ReviewStore review;
    private final Clock clock;
    private final SetupCode setupCode;
    private final Health health;
    private final DataSource ds;

    /**
     * {@code setupCode} is the one the first-start set-up asks for (printed in the console by the server;
     * a test passes one it knows); {@code ds} is what {@code /health} asks whether the database answers.
     */
    public Signoff(Store store, Accounts accounts, ReviewStore review, Clock clock, SetupCode setupCode, DataSource ds) {
        this.store = store;
        this.accounts = accounts;
        this.review = review;
        this.clock = clock;
        this.setupCode = setupCode;
        this.health = new Health(ds);
        this.ds = ds;
    }

    /** The office's production wiring: bcrypt at full strength, working-day sessions, the office throttle. */
    public static Signoff on(Store store, DataSource ds) {
        Sql sql = new Sql(ds);
        ReviewStore review = ReviewStore.on(sql);
        Logins.Policy policy = new Logins.Policy(new Passwords(Passwords.DEFAULT_STRENGTH), SessionPolicy.OFFICE,
                LoginThrottle.OFFICE, Clock.systemDefaultZone());
        return new Signoff(store, Accounts.on(sql, review.audit(), policy), review, Clock.systemDefaultZone(),
                SetupCode.random(), ds);
    }

    public Accounts accounts() { return accounts; }

    public ReviewStore review() { return review; }

    /** The code the set-up form asks for while no administrator exists: for the console, never a page. */
    public SetupCode setupCode() { return setupCode; }

    public void install(RoutesConfig r) {
        AuditRecorder recorder = new AuditRecorder(review.audit(), clock);
        Access access = new Access(accounts.logins(), recorder);
        r.before(access::before);
        r.before(ctx -> {
            if (!ctx.path().startsWith("/static/") && !ctx.path().equals("/health")) FirmOnPage.put(ctx, review.firm().get());
        });
        r.after(CsrfForms::after);
        r.exception(AccessRefused.class, Refusals::access);
        r.exception(LoginRefused.class, Refusals::login);
        r.exception(ReviewRefused.class, (e, ctx) -> { recorder.refusedReview(ctx, e); Refusals.review(e, ctx); });
        r.exception(ConcurrentChange.class, Refusals::conflict);
        health.install(r);
        new AuthRoutes(accounts.logins(), setupCode, accounts.resets()).install(r);
        new AdminRoutes(accounts, review, who -> store.projects().firmChanged(who, "firm settings saved")).install(r);
        new BackupRoutes(ds, review.audit(), clock).install(r);
        new ReviewRoutes(store, review, clock).install(r);
        new MarkupRoutes(store, review.markups()).install(r);
        new IssuedRoutes(store, review, clock, recorder).install(r);
        new PackageRoutes(store, review, clock).install(r);
    }
}
