package com.baysheet.web.review;

import com.baysheet.engine.InputError;
import com.baysheet.issue.Issuing;
import com.baysheet.issue.SheetSubject;
import com.baysheet.notice.Notice;
import com.baysheet.review.Caller;
import com.baysheet.review.PackageScope;
import com.baysheet.store.Store;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.store.review.Reviews;
import com.baysheet.store.review.StoredRevision;
import com.baysheet.web.auth.Access;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.time.LocalDate;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The check in the browser: the list of a project's sheets (one per mark) and packages, a mark's sheet page, and
 * the lifecycle actions (post, then redirect) that mark sheets and packages share.
 */
public record ReviewRoutes(Store store, ReviewStore review, Issuing issuing, ReviewNotices notices) {
    /** A member's sheet before marks came in: now the way to its mark's sheet. */
    static final String SHEET = "/review/projects/{project}/members/{member}";
    static final String MARK = "/review/projects/{project}/marks/{mark}";
    static final String PACKAGE = "/review/projects/{project}/packages/{package}";
    /** Where the shared actions and markups are installed: a typical member's sheet under its mark, and a package. */
    static final List<String> SHEETS = List.of(MARK, PACKAGE);

    public void install(RoutesConfig r) {
        r.get("/review/projects/{project}", this::list, Admit.OFFICE);
        r.get(SHEET, this::memberSheet, Admit.OFFICE);
        r.get(MARK, this::show, Admit.OFFICE);
        r.get(PACKAGE, this::showPackage, Admit.OFFICE);
        for (String base : SHEETS) {
            r.post(base + "/submit", ctx -> act(ctx, (s, v) -> reviews().submit(s.ref(), v, caller(ctx), today(), s.current()), Notice.Kind.SUBMITTED), Admit.PREPARER);
            r.post(base + "/resubmit", ctx -> act(ctx, (s, v) -> reviews().resubmit(s.ref(), v, caller(ctx), today(), s.current()), Notice.Kind.SUBMITTED), Admit.PREPARER);
            r.post(base + "/take-back", ctx -> act(ctx, (s, v) -> reviews().takeBack(s.ref(), v, caller(ctx)), null), Admit.PREPARER);
            r.post(base + "/return", ctx -> act(ctx, (s, v) -> reviews().returnWithMarkups(s.ref(), v, caller(ctx)), Notice.Kind.RETURNED), Admit.PREPARER);
            r.post(base + "/approve", ctx -> act(ctx, (s, v) -> reviews().approve(s.ref(), v, caller(ctx), today(), s.current()), Notice.Kind.APPROVED), Admit.PREPARER);
            r.post(base + "/issue", this::issue, Admit.PREPARER);
        }
    }

    void list(Context ctx) {
        long project = SheetContext.project(ctx);
        var computed = store.results().of(project);
        Map<String, Object> m = new HashMap<>();
        m.put("project", computed.project());
        var search = com.baysheet.review.SheetSearch.of(ctx.queryParam("q"));
        m.put("search", search);
        m.put("marks", store.marks().of(project, computed.derived()).all().stream().filter(search::admits).toList());
        m.put("packages", PackageScope.all(computed.derived()));
        m.put("sheets", latestBySubject(project));
        m.put("withdrawn", reviews().withdrawn(project));
        ctx.render("review/list", m);
    }

    /** A member's sheet is its mark's: the member's address leads there. */
    void memberSheet(Context ctx) {
        SheetSubject.OfMark s = SheetContext.markOf(store, SheetContext.project(ctx), ctx.pathParam("member"));
        ctx.redirect(s.path(), HttpStatus.SEE_OTHER);
    }

    void show(Context ctx) {
        var retired = SheetContext.retired(store, ctx);
        if (retired.isPresent()) {
            retiredMark(ctx, retired.get());
            return;
        }
        SheetSubject.OfMark s = SheetContext.mark(store, ctx);
        Map<String, Object> m = new HashMap<>();
        m.put("project", s.computed().project());
        m.put("mark", s.sheet());
        m.put("base", s.path());
        m.put("page", SheetPage.of(reviews().view(s.ref()), s.current(), Access.user(ctx)));
        m.put("before", beforeMarks(s));
        m.put("error", ctx.queryParam("error"));
        ctx.render("review/sheet", m);
    }

    /** A mark no member carries now: its sheet's revisions stay readable, and its issued copies downloadable. */
    private void retiredMark(Context ctx, com.baysheet.review.Mark mark) {
        long project = SheetContext.project(ctx);
        Map<String, Object> m = new HashMap<>();
        m.put("project", store.results().of(project).project());
        m.put("mark", mark);
        var view = reviews().view(new com.baysheet.review.SheetRef(project, com.baysheet.review.MarkSheets.PREFIX + mark.id()));
        m.put("history", view.history());
        m.put("withdrawn", view.withdrawn());
        ctx.render("review/retired-mark", m);
    }

    /** A package's page: its manifest (each sheet with its own state), markups and the same actions. */
    void showPackage(Context ctx) {
        SheetSubject.OfPackage s = SheetContext.pkg(store, ctx);
        Map<String, Object> m = new HashMap<>();
        m.put("project", s.computed().project());
        m.put("scope", s.scope());
        m.put("base", s.path());
        m.put("page", SheetPage.of(reviews().view(s.ref()), s.current(), Access.user(ctx)));
        m.put("sheets", latestBySubject(s.ref().projectId()));
        m.put("error", ctx.queryParam("error"));
        ctx.render("review/package", m);
    }

    /** Renders the issued copy and issues it: the issuing service checks the version and state first. */
    void issue(Context ctx) {
        SheetSubject s = SheetContext.of(store, ctx);
        issuing.issue(s, version(ctx), caller(ctx), ctx.formParam("description"), store.projects().submittals().find(s.ref().projectId()));
        ctx.redirect(s.path(), HttpStatus.SEE_OTHER);
    }

    /** An action on the sheet at the version the page showed, then back to the sheet page. */
    /** Runs the step (its own transaction), then, once it has committed, posts its notice ({@code notice} null: none). */
    private void act(Context ctx, Action a, Notice.Kind notice) {
        SheetSubject s = SheetContext.of(store, ctx);
        a.run(s, version(ctx));
        if (notice != null) notices.after(notice, s.computed().project(), List.of(s), caller(ctx));
        ctx.redirect(s.path(), HttpStatus.SEE_OTHER);
    }

    @FunctionalInterface
    interface Action {
        void run(SheetSubject s, long version);
    }

    /** The member sheets of the mark's members checked before marks came in: history, readable and verifiable. */
    private List<StoredRevision> beforeMarks(SheetSubject.OfMark s) {
        var ids = new java.util.HashSet<>(s.sheet().group().memberIds());
        return reviews().latestOf(s.ref().projectId()).stream().filter(r -> ids.contains(r.sheet().subject())).toList();
    }

    private Map<String, StoredRevision> latestBySubject(long project) {
        Map<String, StoredRevision> bySubject = new HashMap<>();
        for (StoredRevision s : reviews().latestOf(project)) bySubject.put(s.sheet().subject(), s);
        return bySubject;
    }

    private Reviews reviews() { return review.reviews(); }

    private LocalDate today() { return issuing.today(); }

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
