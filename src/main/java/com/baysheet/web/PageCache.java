package com.baysheet.web;

import com.baysheet.auth.Role;
import com.baysheet.store.ProjectVersions;
import com.baysheet.store.Store;
import com.baysheet.web.auth.Access;
import com.baysheet.web.auth.CsrfForms;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * The result pages of a project (members, take-downs, the framing plan), kept once rendered. A page is a pure
 * function of its address, the viewer's role and the {@link ProjectVersions.Version} it was rendered from, so it
 * is kept under exactly those; every request reads the versions from the database afresh (several servers may
 * share it) and only the rendering is skipped when they are unchanged. What belongs to the request (the header's
 * firm and user, the confirmation after a save, the form token) is rendered per request into the places the kept
 * page leaves for it. Browsers get an entity tag of the bytes sent and revalidate every time ({@code no-cache}).
 */
final class PageCache {
    /** Bounds (docs/reliability.md, the limits): a member page is tens of kilobytes, a large member list a few megabytes. */
    static final int MAX_PAGES = 1_000;
    static final long MAX_BYTES = 32L * 1024 * 1024;
    static final long MAX_PAGE_BYTES = 4L * 1024 * 1024;

    /** A template and its model, as a handler would render them. */
    record View(String template, Map<String, Object> model) {}

    /** A page rendered from a project's results and marks. */
    @FunctionalInterface
    interface Page {
        View render(ProjectVersions.State state);
    }

    private record Key(String path, String query, Role role, ProjectVersions.Version version) {}

    /**
     * What the header's firm-and-user part is a function of (the firm's settings, the viewer's role and initials):
     * rendered once per such triple, not once per request, and given the request's form token as it is sent.
     */
    private record Who(Object firm, Role role, String initials) {}

    /** Header parts kept; a handful per office (one per person, role and firm settings), dropped wholesale past this. */
    static final int MAX_HEADERS = 512;

    private final Store store;
    private final Views views;
    private final KeptPage.Places places = KeptPage.Places.random();
    private final PageLru<Key> kept;
    private final Map<Who, String> headers = new java.util.concurrent.ConcurrentHashMap<>();

    PageCache(Store store, Views views) {
        this(store, views, MAX_PAGES, MAX_BYTES, MAX_PAGE_BYTES);
    }

    PageCache(Store store, Views views, int maxPages, long maxBytes, long maxPageBytes) {
        this.store = store;
        this.views = views;
        this.kept = new PageLru<>(maxPages, maxBytes, maxPageBytes);
    }

    /** Answers with the page of the request's project: kept when its versions are unchanged, else rendered (and kept). */
    void serve(Context ctx, Page page) {
        long project = Ids.project(ctx);
        Role role = Access.user(ctx).role();
        KeptPage p = kept.get(new Key(ctx.path(), ctx.queryString(), role, store.versions().of(project)));
        if (p == null) p = render(ctx, project, role, page);
        send(ctx, p);
    }

    private KeptPage render(Context ctx, long project, Role role, Page page) {
        ProjectVersions.State state = store.versions().state(project);
        View v = page.render(state);
        Map<String, Object> model = new HashMap<>(v.model());
        model.put("pageParts", places);
        // a plan is drawn apart and put in the kept page at its marker: thousands of members' markup go through
        // neither the template engine nor the form-token search
        List<String> drawings = new ArrayList<>();
        model.replaceAll((name, x) -> {
            if (!(x instanceof PlanView plan)) return x;
            drawings.add(plan.svg());
            return plan.drawnLater(places.drawing(drawings.size() - 1));
        });
        KeptPage p = KeptPage.of(CsrfForms.insert(views.render(v.template(), model, ctx), places.token()), places, drawings);
        // kept under the versions it was rendered from (not those read before): it is exactly their page
        if (state.version() != null) kept.put(new Key(ctx.path(), ctx.queryString(), role, state.version()), p);
        return p;
    }

    private void send(Context ctx, KeptPage p) {
        String token = CsrfForms.token(ctx);
        // the header kept with the token's marker in its forms: the request's token put in by a plain replace
        String who = header(ctx).replace(places.token(), String.valueOf(token));
        String notice = ctx.attribute(Saved.ATTRIBUTE) == null ? "" : views.fragment("fragments/header", "notice", Map.of(), ctx);
        KeptPage.Parts parts = KeptPage.Parts.of(who, notice, token);
        String etag = p.etag(parts);
        ctx.header("ETag", etag);
        ctx.header("Cache-Control", "private, no-cache");
        CsrfForms.filled(ctx);
        if (matches(ctx.header("If-None-Match"), etag)) {
            ctx.status(HttpStatus.NOT_MODIFIED);
            return;
        }
        ctx.contentType("text/html; charset=utf-8");
        ctx.result(p.filled(parts));
    }

    private String header(Context ctx) {
        var user = Access.user(ctx);
        Who w = new Who(ctx.attribute(FirmOnPage.ATTRIBUTE), user.role(), user.initials());
        String kept = headers.get(w);
        if (kept != null) return kept;
        String rendered = CsrfForms.insert(views.fragment("fragments/header", "who", Map.of(), ctx), places.token());
        if (headers.size() >= MAX_HEADERS) headers.clear();
        headers.put(w, rendered);
        return rendered;
    }

    /** Whether If-None-Match names this tag (weak comparison, RFC 9110 13.1.2: a W/ prefix is ignored). */
    static boolean matches(String ifNoneMatch, String etag) {
        if (ifNoneMatch == null) return false;
        for (String t : ifNoneMatch.split(",")) {
            String x = t.trim();
            if (x.startsWith("W/")) x = x.substring(2);
            if (x.equals("*") || x.equals(etag)) return true;
        }
        return false;
    }

    int keptCount() { return kept.count(); }
}
