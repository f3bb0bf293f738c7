package com.baysheet.web.review;

import com.baysheet.engine.InputError;
import com.baysheet.issue.Issuing;
import com.baysheet.issue.PackageJobs;
import com.baysheet.review.PackageScope;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import com.baysheet.project.Firm;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.HashMap;
import java.util.LinkedHashSet;
import java.util.Map;

/**
 * Calculation packages of a level or of the whole project, as checking copies: start one (post), follow
 * its progress, download it. Issued sheets come from the sheet check, one member at a time.
 */
public final class PackageRoutes {
    private static final String BASE = "/projects/{project}/packages";

    private final Store store;
    private final Issuing issuing;

    public PackageRoutes(Store store, Issuing issuing) {
        this.store = store;
        this.issuing = issuing;
    }

    public void install(RoutesConfig r) {
        r.get(BASE, this::list, Admit.OFFICE);
        r.post(BASE, this::start, Admit.PREPARER);
        r.get(BASE + "/{job}", this::progress, Admit.OFFICE);
        r.get(BASE + "/{job}/file", this::file, Admit.OFFICE);
    }

    void list(Context ctx) {
        Results.Computed c = store.results().of(SheetContext.project(ctx));
        Map<String, Object> m = new HashMap<>();
        m.put("project", c.project());
        m.put("levels", new LinkedHashSet<>(c.derived().members().stream().map(x -> x.level()).toList()));
        ctx.render("review/packages", m);
    }

    /** Starts a checking copy of the project or of one level, then follows its progress. */
    void start(Context ctx) {
        Results.Computed c = store.results().of(SheetContext.project(ctx));
        String scope = ctx.formParam("scope");
        if (scope == null || scope.isBlank()) throw new InputError("scope", "\"\"", "choose the project or one level");
        PackageJobs.Job job = issuing.startPackage(c, SheetContext.marks(store, c), store.projects().submittals().find(c.project().id()),
                scope.equals("project") ? PackageScope.PROJECT : PackageScope.ofLevel(scope));
        ctx.redirect("/projects/" + job.project() + "/packages/" + job.id(), HttpStatus.SEE_OTHER);
    }

    void progress(Context ctx) {
        PackageJobs.Job job = job(ctx);
        PackageJobs.View v = job.view();
        if ("json".equals(ctx.queryParam("format"))) {
            ctx.json(Map.of("done", v.done(), "total", v.total(), "finished", v.finished(),
                    "error", v.error() == null ? "" : v.error()));
            return;
        }
        Map<String, Object> m = new HashMap<>();
        m.put("project", store.results().of(job.project()).project());
        m.put("job", v);
        ctx.render("review/package-job", m);
    }

    void file(Context ctx) {
        PackageJobs.Job job = job(ctx);
        Path file = job.file().orElseThrow(() -> new NotFound("finished package", job.id()));
        ctx.contentType("application/pdf");
        ctx.header("X-Content-SHA256", job.sha256());
        ctx.header("Content-Disposition", "attachment; filename=\"" + job.fileName().replaceAll("[^A-Za-z0-9._-]", "_") + "\"");
        try (InputStream in = Files.newInputStream(file)) {
            ctx.result(in.readAllBytes());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private PackageJobs.Job job(Context ctx) {
        String id = ctx.pathParam("job");
        return issuing.job(SheetContext.project(ctx), id).orElseThrow(() -> new NotFound("package", id));
    }
}
