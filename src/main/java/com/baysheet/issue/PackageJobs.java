package com.baysheet.issue;

import com.baysheet.engine.InputError;
import com.baysheet.review.MarkSheets;
import com.baysheet.review.PackageScope;
import com.baysheet.sheet.CalcPackage;
import com.baysheet.sheet.PackageRenderer;
import com.baysheet.sheet.StreamedPdf;
import com.baysheet.store.NotFound;
import com.baysheet.store.PackageJob;
import com.baysheet.store.PackageJobStore;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import com.baysheet.store.review.ReviewStore;
import com.baysheet.store.review.Reviews;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.LocalDate;
import java.util.Optional;

/**
 * Package checking copies, rendered off the request threads by whichever server of the office claims them
 * ({@link PackageWorker}): a request queues the scope, the browser follows the progress the job table holds and
 * downloads the PDF stored there. The package is rendered from the model, the marks and the reviews as they are
 * when a server takes it up, so a job taken up again after a server stopped renders the same way.
 */
public final class PackageJobs {
    /** A job's state for the template, read once so the page is consistent. */
    public record View(String id, String title, int done, int total, String sha256, String error, boolean ready,
                       boolean finished, boolean cancelled, boolean queued, String requestedBy) {}

    /** A done job's PDF, under the download's name ({@code <job number>-<package>-checking-copy.pdf}). */
    public record Download(String fileName, String sha256, byte[] pdf) {}

    private final Store store;
    private final ReviewStore review;
    private final PackageJobStore jobs;
    private final Clock clock;

    public PackageJobs(Store store, ReviewStore review, PackageJobStore jobs, Clock clock) {
        this.store = store;
        this.review = review;
        this.jobs = jobs;
        this.clock = clock;
    }

    /** Queues a checking copy of the scope; refused when it has no members, is too large, or the office's queue is full. */
    public long start(Results.Computed c, MarkSheets marks, PackageScope scope, String requestedBy) {
        if (scope.members(c.derived()).isEmpty())
            throw new InputError("level", scope.isProject() ? "project" : scope.level(), "has no members in this model");
        int sheets = scope.marks(c.derived(), marks).size();
        String title = scope.title();
        return jobs.enqueue(new PackageJob.Request(c.project().id(), scope.level(), title,
                c.project().info().jobNumber() + "-" + title + "-checking-copy.pdf", requestedBy, sheets));
    }

    public Optional<View> view(long project, String id) {
        return job(project, id).map(j -> new View(String.valueOf(j.id()), j.title(), j.done(), j.total(), j.sha256(), j.error(),
                j.state() == PackageJob.State.DONE, j.state().finished(), j.state() == PackageJob.State.CANCELLED,
                j.state() == PackageJob.State.QUEUED, j.requestedBy()));
    }

    public Optional<Download> file(long project, String id) {
        return job(project, id).filter(j -> j.state() == PackageJob.State.DONE)
                .flatMap(j -> jobs.pdf(project, j.id()).map(pdf -> new Download(j.fileName(), j.sha256(), pdf)));
    }

    /** Cancels a queued or running job; its renderer stops at its next heartbeat. Refused once it has finished. */
    public void cancel(long project, String id) {
        PackageJob j = job(project, id).orElseThrow(() -> new NotFound("package", id));
        if (!jobs.cancel(project, j.id()))
            throw new InputError("cancel", "yes", "the package has finished already (" + j.state().column() + "); nothing to cancel");
    }

    /**
     * Renders a claimed job into {@code out}: the package's own revision under way and each member's own state,
     * as they are now. A scope the model no longer has is refused by name (the job fails saying so).
     */
    StreamedPdf render(PackageJob job, Path out, PackageRenderer.Progress progress) throws IOException {
        Results.Computed c = store.results().of(job.project());
        PackageScope scope = job.level().isEmpty() ? PackageScope.PROJECT : PackageScope.ofLevel(job.level());
        if (scope.members(c.derived()).isEmpty())
            throw new InputError("level", scope.isProject() ? "project" : scope.level(), "has no members in this model any more");
        MarkSheets marks = store.marks().of(job.project(), c.derived());
        SheetSubject.OfPackage s = SheetSubject.pkg(c, marks, scope);
        Reviews reviews = review.reviews();
        CalcPackage pkg = PackagePdfs.checking(review.firm().get(), store.projects().submittals().find(job.project()), s,
                reviews.view(s.ref()), reviews.latestOf(job.project()), LocalDate.now(clock));
        try (OutputStream o = Files.newOutputStream(out)) {
            return PackageRenderer.checking(pkg, o, progress);
        }
    }

    /** The project's job of this id; an id that is not a number is no job. */
    private Optional<PackageJob> job(long project, String id) {
        try {
            return jobs.find(project, Long.parseLong(id));
        } catch (NumberFormatException e) {
            return Optional.empty();
        }
    }

    PackageJobStore store() { return jobs; }
}
