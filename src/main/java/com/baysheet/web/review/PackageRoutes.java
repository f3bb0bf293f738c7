package com.baysheet.web.review;

import com.baysheet.engine.InputError;
import com.baysheet.issue.PackageJobs;
import com.baysheet.review.PackageScope;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import com.baysheet.web.Editors;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.Map;

/**
 * Calculation packages of a level or of the whole project, as checking copies: queue one (post), follow
 * its progress, cancel it, download it. Issued sheets come from the sheet check, one member at a time.
 */
public record PackageRoutes(Store store, PackageJobs packages) {
    private static final String BASE = "/projects/{project}/packages";

    public void install(RoutesConfig r) {
        r.get(BASE, this::list, Admit.OFFICE);
        r.post(BASE, this::start, Admit.PREPARER);
        r.get(BASE + "/{job}", this::progress, Admit.OFFICE);
        r.post(BASE + "/{job}/cancel", this::cancel, Admit.PREPARER);
        r.get(BASE + "/{job}/file", this::file, Admit.OFFICE);
    }

    void list(Context ctx) {
        Results.Computed c = store.results().of(SheetContext.project(ctx));
        Map<String, Object> m = new HashMap<>();
        m.put("project", c.project());
        m.put("levels", new LinkedHashSet<>(c.derived().members().stream().map(x -> x.level()).toList()));
        ctx.render("review/packages", m);
    }

    /** Queues a checking copy of the project or of one level, then follows its progress. */
    void start(Context ctx) {
        Results.Computed c = store.results().of(SheetContext.project(ctx));
        String scope = ctx.formParam("scope");
        if (scope == null || scope.isBlank()) throw new InputError("scope", "\"\"", "choose the project or one level");
        long job = packages.start(c, SheetContext.marks(store, c), scope.equals("project") ? PackageScope.PROJECT
                : PackageScope.ofLevel(scope), Editors.of(ctx).username());
        ctx.redirect("/projects/" + c.project().id() + "/packages/" + job, HttpStatus.SEE_OTHER);
    }

    void progress(Context ctx) {
        PackageJobs.View v = job(ctx);
        if ("json".equals(ctx.queryParam("format"))) {
            ctx.json(Map.of("done", v.done(), "total", v.total(), "finished", v.finished(), "cancelled", v.cancelled(),
                    "error", v.error() == null ? "" : v.error()));
            return;
        }
        Map<String, Object> m = new HashMap<>();
        m.put("project", store.results().of(SheetContext.project(ctx)).project());
        m.put("job", v);
        ctx.render("review/package-job", m);
    }

    /** Cancels a queued or running package; the form says so ({@code cancel=yes}), so a stray post cancels nothing. */
    void cancel(Context ctx) {
        long project = SheetContext.project(ctx);
        if (!"yes".equals(ctx.formParam("cancel")))
            throw new InputError("cancel", String.valueOf(ctx.formParam("cancel")), "must be \"yes\" to cancel the package");
        packages.cancel(project, ctx.pathParam("job"));
        ctx.redirect("/projects/" + project + "/packages/" + ctx.pathParam("job"), HttpStatus.SEE_OTHER);
    }

    void file(Context ctx) {
        long project = SheetContext.project(ctx);
        String id = ctx.pathParam("job");
        PackageJobs.Download d = packages.file(project, id).orElseThrow(() -> new NotFound("finished package", id));
        ctx.contentType("application/pdf");
        ctx.header("X-Content-SHA256", d.sha256());
        ctx.header("Content-Disposition", "attachment; filename=\"" + d.fileName().replaceAll("[^A-Za-z0-9._-]", "_") + "\"");
        ctx.result(d.pdf());
    }

    private PackageJobs.View job(Context ctx) {
        String id = ctx.pathParam("job");
        return packages.view(SheetContext.project(ctx), id).orElseThrow(() -> new NotFound("package", id));
    }
}
