package com.baysheet.web.review;

import com.baysheet.engine.InputError;
import com.baysheet.review.Caller;
import com.baysheet.review.PackageScope;
import com.baysheet.review.ReviewAction;
import com.baysheet.review.ReviewRefused;
import com.baysheet.review.SheetState;
import com.baysheet.store.Store;
import com.baysheet.store.review.ConcurrentChange;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.store.review.Reviews;
import com.baysheet.store.review.StoredRevision;
import com.baysheet.web.auth.Access;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.time.Clock;
import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The check in the browser: the list of a project's sheets and packages, a member's sheet page, and the
 * lifecycle actions (post, then redirect) that member sheets and packages share.
 */
public final class ReviewRoutes {
    static final String SHEET = "/review/projects/{project}/members/{member}";
    static final String PACKAGE = "/review/projects/{project}/packages/{package}";
    /** Where the shared actions and markups are installed: a member's sheet and a package. */
    static final List<String> SHEETS = List.of(SHEET, PACKAGE);

    private final Store store;
    private final ReviewStore review;
    private final Clock clock;

    public ReviewRoutes(Store store, ReviewStore review, Clock clock) {
        this.store = store;
        this.review = review;
        this.clock = clock;
    }

    public void install(RoutesConfig r) {
        r.get("/review/projects/{project}", this::list);
        r.get(SHEET, this::show);
        r.get(PACKAGE, this::showPackage);
        for (String base : SHEETS) {
            r.post(base + "/submit", ctx -> act(ctx, (s, v) -> reviews().submit(s.ref(), v, caller(ctx), today(), s.current())));
            r.post(base + "/resubmit", ctx -> act(ctx, (s, v) -> reviews().resubmit(s.ref(), v, caller(ctx), today(), s.current())));
            r.post(base + "/return", ctx -> act(ctx, (s, v) -> reviews().returnWithMarkups(s.ref(), v, caller(ctx))));
            r.post(base + "/approve", ctx -> act(ctx, (s, v) -> reviews().approve(s.ref(), v, caller(ctx), today(), s.current())));
            r.post(base + "/issue", this::issue);
        }
    }

    void list(Context ctx) {
        long project = SheetContext.project(ctx);
        var computed = store.results().of(project);
        Map<String, Object> m = new HashMap<>();
        m.put("project", computed.project());
        m.put("members", computed.derived().members());
        m.put("packages", PackageScope.all(computed.derived()));
        m.put("sheets", latestBySubject(project));
        ctx.render("review/list", m);
    }

    void show(Context ctx) {
        SheetContext.OfMember s = SheetContext.member(store, ctx);
        Map<String, Object> m = new HashMap<>();
        m.put("project", s.computed().project());
        m.put("member", s.member());
        m.put("page", SheetPage.of(reviews().view(s.ref()), s.current(), Access.user(ctx)));
        m.put("error", ctx.queryParam("error"));
        ctx.render("review/sheet", m);
    }

    /** A package's page: its manifest (each sheet with its own state), markups and the same actions. */
    void showPackage(Context ctx) {
        SheetContext.OfPackage s = SheetContext.pkg(store, ctx);
        Map<String, Object> m = new HashMap<>();
        m.put("project", s.computed().project());
        m.put("scope", s.scope());
        m.put("base", s.path());
        m.put("page", SheetPage.of(reviews().view(s.ref()), s.current(), Access.user(ctx)));
        m.put("sheets", latestBySubject(s.ref().projectId()));
        m.put("error", ctx.queryParam("error"));
        ctx.render("review/package", m);
    }

    void issue(Context ctx) {
        SheetContext s = SheetContext.of(store, ctx);
        long version = version(ctx);
        Reviews.SheetView v = reviews().view(s.ref());
        StoredRevision cur = v.current();
        // checked before rendering the PDF; the review rules check everything again when issuing
        if (cur.version() != version) throw new ConcurrentChange("The sheet " + s.name());
        if (cur.revision().state() != SheetState.APPROVED)
            throw new ReviewRefused.WrongState(ReviewAction.ISSUE, cur.revision().state(), "only an approved sheet is issued");
        byte[] pdf = s instanceof SheetContext.OfMember m ? SheetPdfs.issued(review.firm().get(), m, cur.revision(), today()).bytes()
                : PackagePdfs.issued(review.firm().get(), store.projects().submittals().find(s.ref().projectId()), (SheetContext.OfPackage) s, v, reviews().latestOf(s.ref().projectId()), today());
        reviews().issue(s.ref(), version, caller(ctx), today(), s.current(), pdf);
        ctx.redirect(s.path(), HttpStatus.SEE_OTHER);
    }

    /** An action on the sheet at the version the page showed, then back to the sheet page. */
    private void act(Context ctx, Action a) {
        SheetContext s = SheetContext.of(store, ctx);
        a.run(s, version(ctx));
        ctx.redirect(s.path(), HttpStatus.SEE_OTHER);
    }

    @FunctionalInterface
    interface Action {
        void run(SheetContext s, long version);
    }

    private Map<String, StoredRevision> latestBySubject(long project) {
        Map<String, StoredRevision> bySubject = new HashMap<>();
        for (StoredRevision s : reviews().latestOf(project)) bySubject.put(s.sheet().subject(), s);
        return bySubject;
    }

    private Reviews reviews() { return review.reviews(); }

    private LocalDate today() { return LocalDate.now(clock); }

    static Caller caller(Context ctx) {
        return Caller.of(Access.user(ctx), ctx.ip());
    }

    static long version(Context ctx) {
        String v = ctx.formParam("version");
        try {
            return Long.parseLong(v == null ? "" : v.strip());
        } catch (NumberFormatException e) {
            throw new InputError("version", v, "the form carries no sheet version; reload the page");
        }
    }
}
