package com.baysheet.web;

import com.baysheet.auth.LoginRefused;
import com.baysheet.auth.SetupCode;
import com.baysheet.issue.Batch;
import com.baysheet.issue.Issuing;
import com.baysheet.issue.PackageJobs;
import com.baysheet.issue.PackageWorker;
import com.baysheet.sheet.signing.PdfSigner;
import com.baysheet.review.ReviewRefused;
import com.baysheet.notice.Notifier;
import com.baysheet.store.PackageJobStore;
import com.baysheet.store.Sql;
import com.baysheet.store.Store;
import com.baysheet.store.auth.Accounts;
import com.baysheet.store.auth.Logins;
import com.baysheet.store.review.ConcurrentChange;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.web.auth.Access;
import com.baysheet.web.auth.AccessRefused;
import com.baysheet.web.auth.AdminRoutes;
import com.baysheet.web.auth.Admit;
import com.baysheet.web.auth.AuditRecorder;
import com.baysheet.web.auth.AuthRoutes;
import com.baysheet.web.auth.BackupRoutes;
import com.baysheet.web.auth.CsrfForms;
import com.baysheet.web.auth.TokenRoutes;
import com.baysheet.web.review.IssuedRoutes;
import com.baysheet.web.review.MarkRoutes;
import com.baysheet.web.review.MarkupRoutes;
import com.baysheet.web.review.PackageRoutes;
import com.baysheet.web.review.QueueRoutes;
import com.baysheet.web.review.ReviewNotices;
import com.baysheet.web.auth.MailRoutes;
import com.baysheet.web.review.Refusals;
import com.baysheet.web.review.ReviewRoutes;
import io.javalin.Javalin;
import io.javalin.config.RoutesConfig;
import org.eclipse.jetty.http.HttpException;
import io.javalin.config.SizeUnit;

import javax.sql.DataSource;
import java.time.Clock;
import java.util.Optional;

/**
 * The whole office server, wired in this one place: the store, the accounts, the review store and the issuing
 * service over one database and one clock, and the server that puts the routes of every feature behind one
 * access check. Each route declares who it admits ({@link Admit}) where it is declared; the check before every
 * matched route ({@code beforeMatched}, {@link Access#check}) enforces it. Tests build the same office with a
 * cheap password hash, their own clock and a known set-up code.
 *
 * @param packages  the office's queue of package checking copies, in the database; each started server renders from it
 * @param setupCode what the first-start set-up asks for (printed in the console by the server)
 * @param ds        what {@code /health} asks whether the database answers, and what backups copy
 * @param clock     what refusals and downloads are recorded by
 * @param notifier  sends the review steps' e-mail notices, after their commit and off the request threads
 */
public record Office(Store store, Accounts accounts, ReviewStore review, Issuing issuing, PackageJobs packages, SetupCode setupCode,
                     DataSource ds, Clock clock, Notifier notifier) {

    /**
     * The office over this database: the store's clock for every stamp and date, the given login policy, and the
     * office's key signing every issued PDF.
     */
    public static Office on(Store store, DataSource ds, Clock clock, Logins.Policy policy, SetupCode setupCode, PdfSigner signer) {
        return on(store, ds, clock, policy, setupCode, signer, "");
    }

    /** The same, with the SMTP password the notices log in with (kept as the server's other secrets: read from a file at start). */
    public static Office on(Store store, DataSource ds, Clock clock, Logins.Policy policy, SetupCode setupCode, PdfSigner signer,
                            String smtpPassword) {
        Sql sql = new Sql(ds, clock);
        ReviewStore review = ReviewStore.on(sql);
        PackageJobs packages = new PackageJobs(store, review, new PackageJobStore(sql), clock);
        Notifier notifier = new Notifier(() -> review.mail().get().settings(), () -> smtpPassword, clock, review.mail()::failed);
        return new Office(store, Accounts.on(sql, review.audit(), policy), review, new Issuing(review, clock, signer), packages,
                setupCode, ds, clock, notifier);
    }

    /** The office's production wiring: bcrypt at full strength, working-day sessions, the office throttle. */
    public static Office on(Store store, DataSource ds, Clock clock, PdfSigner signer) {
        return on(store, ds, clock, signer, "");
    }

    /** The production wiring, with the SMTP password of the e-mail notices. */
    public static Office on(Store store, DataSource ds, Clock clock, PdfSigner signer, String smtpPassword) {
        return on(store, ds, clock, Logins.Policy.office(clock), SetupCode.random(), signer, smtpPassword);
    }

    /**
     * A configured server, not yet started ({@code start(host, port)}, or {@code start(0)} for a random port),
     * believing X-Forwarded-For only from {@code trustedProxy} (null: from nobody) so that the address the
     * throttle counts and the audit trail records cannot be chosen by the client; {@code behindTls} when
     * browsers reach it through an HTTPS proxy: cookies Secure and Strict-Transport-Security ({@link Headers}).
     * While it runs, the server renders package jobs of the office's queue ({@link PackageWorker}, its lease from
     * {@value PackageWorker#LEASE_PROPERTY}).
     */
    public Javalin server(String trustedProxy, boolean behindTls) {
        AuditRecorder recorder = new AuditRecorder(review.audit(), clock);
        Access access = new Access(accounts.logins(), accounts.tokens(), () -> review.firm().get(), recorder);
        PackageWorker worker = new PackageWorker(packages, PackageWorker.leaseFromSystem());
        ApiDescription description = new ApiDescription();
        Javalin app = Javalin.create(cfg -> {
            cfg.startup.showJavalinBanner = false;
            cfg.events.serverStarted(worker::start);
            cfg.events.serverStopping(worker::stop);
            cfg.contextResolver.ip = ctx -> ClientAddress.of(ctx.req().getRemoteAddr(), ctx.header("X-Forwarded-For"), trustedProxy);
            // request-size limits: a form or JSON body is a few kilobytes (a 413 past 1 MB, before it is read
            // whole); the only upload is a PDF to verify, and no sheet or package comes near 50 MB
            cfg.http.maxRequestSize = 1_000_000L;
            cfg.jetty.multipartConfig.maxFileSize(50, SizeUnit.MB);
            cfg.jetty.multipartConfig.maxTotalRequestSize(51, SizeUnit.MB);
            Views views = new Views();
            cfg.fileRenderer(views);
            filters(cfg.routes, behindTls);
            cfg.routes.beforeMatched(access::check);
            cfg.routes.after(Headers::charset);
            cfg.routes.after(CsrfForms::after);
            exceptions(cfg.routes, access, recorder);
            routes(cfg.routes, recorder, new PageCache(store, views));
            description.install(cfg.routes);
        });
        description.describe(app); // the description is read from the finished route table
        return app;
    }

    /** Before-filters of every request, matched or not (the access check runs after them, on matched routes). */
    private static void filters(RoutesConfig r, boolean behindTls) {
        // first: a refusal halts the request with a redirect that needs the headers too
        r.before(ctx -> Headers.apply(ctx, behindTls));
        // pages show live project state: never let a browser or proxy reuse an old copy (the kept result pages
        // replace this with private, no-cache and an ETag: the browser asks again every time; PageCache)
        r.before(ctx -> {
            if (!ctx.path().startsWith("/static/")) ctx.header("Cache-Control", "no-store");
        });
        r.before(Saved::onRequest);
        // a body declared larger than the largest upload (a PDF to verify) is refused from its length, unread:
        // no thread reads what would be refused anyway, and a client that asks first (Expect: 100-continue, as
        // curl does for a large body) is told before it sends a byte of it
        r.before(ctx -> {
            if (ctx.req().getContentLengthLong() > MAX_BODY_BYTES)
                throw new HttpException.RuntimeException(413, "larger than any form or sheet this server takes");
        });
    }

    /** The largest body any route reads: the multipart limit of the verify upload (51 MB). */
    static final long MAX_BODY_BYTES = 51L * 1024 * 1024;

    private static void exceptions(RoutesConfig r, Access access, AuditRecorder recorder) {
        r.exception(AccessRefused.class, Refusals::access);
        r.exception(LoginRefused.class, Refusals::login);
        r.exception(ReviewRefused.class, (e, ctx) -> {
            recorder.refusedReview(ctx, e);
            Refusals.review(e, ctx);
        });
        r.exception(ConcurrentChange.class, Refusals::conflict);
        Errors.install(r);
        // no route matched (Javalin's own 404): answered as an office page would be, log in first, then the
        // same page as an unknown id; under /static/ (files anyone may fetch) a plain not found
        r.error(404, ctx -> {
            if (Errors.answered(ctx)) return;
            Optional<AccessRefused> refused = ctx.path().startsWith("/static/") ? Optional.empty() : access.unmatched(ctx);
            if (refused.isPresent()) Refusals.access(refused.get(), ctx);
            else Errors.notFound(ctx, "no page at " + ctx.path());
        });
    }

    /** The routes of every feature; each declares its roles beside its path. */
    private void routes(RoutesConfig r, AuditRecorder recorder, PageCache pages) {
        new Health(ds).install(r);
        new StaticFiles().install(r);
        new AuthRoutes(accounts.logins(), setupCode, accounts.resets()).install(r);
        new AdminRoutes(accounts, review, issuing.signingKey(), who -> store.projects().firmChanged(who, "firm settings saved")).install(r);
        new TokenRoutes(accounts.tokens()).install(r);
        new BackupRoutes(ds, review.audit(), clock).install(r);
        new ModelFileRoutes(store).install(r); // before ProjectRoutes: /projects/import is not a project id
        new ProjectRoutes(store, review).install(r);
        new JobRoutes(store).install(r);
        new LevelRoutes(store).install(r);
        new DeleteRoutes(store).install(r);
        new DeletedRoutes(store).install(r);
        new TypicalRoutes(store).install(r);
        new UnitRoutes(store).install(r);
        new BayRoutes(store).install(r);
        new LineLoadRoutes(store).install(r);
        new PointLoadRoutes(store).install(r);
        new SelfWeightRoutes(store).install(r);
        new PlanRoutes(pages).install(r);
        new MemberRoutes(pages).install(r);
        new MemberWeightRoutes(store).install(r);
        new ApiWeightRoutes(store).install(r);
        new TakeDownRoutes(pages).install(r);
        new MethodRoutes(store).install(r);
        new ScheduleRoutes(store).install(r);
        new SubmittalRoutes(store).install(r);
        new OccupancyRoutes(store).install(r);
        new ApiRoutes(store).install(r);
        new ApiTypicalRoutes(store).install(r);
        new ApiResultRoutes(store).install(r);
        ReviewNotices notices = new ReviewNotices(review, notifier);
        new MailRoutes(review, accounts.users(), notifier).install(r);
        new ReviewRoutes(store, review, issuing, notices).install(r);
        new QueueRoutes(store, review, new Batch(review, issuing), recorder, clock, notices).install(r);
        new MarkRoutes(store).install(r);
        new MarkupRoutes(store, review.markups()).install(r);
        new IssuedRoutes(store, review, issuing, recorder).install(r);
        new PackageRoutes(store, packages).install(r);
    }
}
