package com.baysheet.web.review;

import com.baysheet.engine.InputError;
import com.baysheet.review.PackageManifest;
import com.baysheet.review.PackageScope;
import com.baysheet.review.SheetRef;
import com.baysheet.sheet.CalcPackage;
import com.baysheet.store.NotFound;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import com.baysheet.store.review.Firm;
import com.baysheet.store.review.ReviewStore;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.time.Clock;
import java.time.LocalDate;
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
    private final ReviewStore review;
    private final Clock clock;
    private final PackageJobs jobs = new PackageJobs();

    public PackageRoutes(Store store, ReviewStore review, Clock clock) {
        this.store = store;
        this.review = review;
        this.clock = clock;
    }

    public void install(RoutesConfig r) {
        r.get(BASE, this::list);
        r.post(BASE, this::start);
        r.get(BASE + "/{job}", this::progress);
        r.get(BASE + "/{job}/file", this::file);
    }

    void list(Context ctx) {
        Results.Computed c = store.results().of(SheetContext.project(ctx));
        Map<String, Object> m = new HashMap<>();
        m.put("project", c.project());
        m.put("levels", new LinkedHashSet<>(c.derived().members().stream().map(x -> x.level()).toList()));
        ctx.render("review/packages", m);
    }

    /** Starts a checking copy: the package's own revision under way, and each member's own state, as they are now. */
    void start(Context ctx) {
        long project = SheetContext.project(ctx);
        Results.Computed c = store.results().of(project);
        String scope = ctx.formParam("scope");
        if (scope == null || scope.isBlank()) throw new InputError("scope", "\"\"", "choose the project or one level");
        PackageScope ps = scope.equals("project") ? PackageScope.PROJECT : PackageScope.ofLevel(scope);
        if (ps.members(c.derived()).isEmpty()) throw new InputError("level", scope, "has no members in this model");
        SheetRef ref = new SheetRef(project, ps.subject());
        SheetContext.OfPackage s = new SheetContext.OfPackage(c, ps, ref, PackageManifest.of(ps, c.derived()));
        CalcPackage pkg = PackagePdfs.checking(review.firm().get(), store.projects().submittals().find(project), s, review.reviews().view(ref),
                review.reviews().latestOf(project), LocalDate.now(clock));
        PackageJobs.Job job = jobs.start(project, pkg);
        ctx.redirect("/projects/" + project + "/packages/" + job.id, io.javalin.http.HttpStatus.SEE_OTHER);
    }

    void progress(Context ctx) {
        PackageJobs.Job job = job(ctx);
        if ("json".equals(ctx.queryParam("format"))) {
            ctx.json(Map.of("done", job.done, "total", job.total, "finished", job.finished(),
                    "error", job.error == null ? "" : job.error));
            return;
        }
        Map<String, Object> m = new HashMap<>();
        m.put("project", store.results().of(job.project).project());
        m.put("job", job.view());
        ctx.render("review/package-job", m);
    }

    void file(Context ctx) {
        PackageJobs.Job job = job(ctx);
        if (job.file == null) throw new NotFound("finished package", job.id);
        ctx.contentType("application/pdf");
        ctx.header("X-Content-SHA256", job.sha256);
        ctx.header("Content-Disposition", "attachment; filename=\"" + job.fileName.replaceAll("[^A-Za-z0-9._-]", "_") + "\"");
        try (InputStream in = Files.newInputStream(job.file)) {
            ctx.result(in.readAllBytes());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private PackageJobs.Job job(Context ctx) {
        long project = SheetContext.project(ctx);
        String id = ctx.pathParam("job");
        PackageJobs.Job job = jobs.find(id).orElseThrow(() -> new NotFound("package", id));
        if (job.project != project) throw new NotFound("package", id);
        return job;
    }
}
