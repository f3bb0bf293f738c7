package com.baysheet.issue;

import com.baysheet.framing.model.Limits;
import com.baysheet.sheet.CalcPackage;
import com.baysheet.sheet.PackageRenderer;
import com.baysheet.sheet.StreamedPdf;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.Optional;
import java.util.UUID;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;

/**
 * Long packages are rendered off the request threads, one at a time, into a temporary file: the browser
 * follows the progress and downloads the file when it is done, and other users' pages are not held up.
 * The newest {@link #KEPT} jobs are kept; older files are deleted.
 */
public final class PackageJobs {
    static final int KEPT = 20;

    /**
     * A package being rendered. {@code sha256} and {@code file} are set when it is done; {@code fileName} is
     * the download's, {@code <job>-<package>-checking-copy.pdf}.
     */
    public static final class Job {
        private final String id, title, fileName;
        private final long project;
        private volatile int done, total;
        private volatile String sha256, error;
        private volatile Path file;

        Job(String id, String title, String fileName, long project) {
            this.id = id;
            this.title = title;
            this.fileName = fileName;
            this.project = project;
        }

        public String id() { return id; }

        public long project() { return project; }

        public String fileName() { return fileName; }

        public String sha256() { return sha256; }

        /** The rendered file, once it is done. */
        public Optional<Path> file() { return Optional.ofNullable(file); }

        boolean finished() { return file != null || error != null; }

        /** What the progress page shows, read once so the page is consistent. */
        public View view() { return new View(id, title, done, total, sha256, error, file != null, finished()); }
    }

    /** A job's state for the template. */
    public record View(String id, String title, int done, int total, String sha256, String error, boolean ready,
                       boolean finished) {}

    private final ExecutorService worker = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "package-renderer");
        t.setDaemon(true);
        return t;
    });
    private final Map<String, Job> jobs = new LinkedHashMap<>();

    synchronized Job start(long project, CalcPackage pkg) {
        Limits.count("package", pkg.sheets().size(), Limits.MAX_PACKAGE_SHEETS, "member sheets in one package");
        long waiting = jobs.values().stream().filter(j -> !j.finished()).count();
        if (waiting >= Limits.MAX_QUEUED_PACKAGES)
            throw new TooBusy("packageQueue", "at most " + Limits.MAX_QUEUED_PACKAGES
                    + " packages are rendered or waiting at once (limit packageQueue); try again in a minute", 60);
        Job job = new Job(UUID.randomUUID().toString(), pkg.title(),
                pkg.header().jobNumber() + "-" + pkg.title() + "-checking-copy.pdf", project);
        job.total = pkg.sheets().size();
        jobs.put(job.id, job);
        while (jobs.size() > KEPT) forget(jobs.keySet().iterator().next());
        worker.submit(() -> render(job, pkg));
        return job;
    }

    synchronized Optional<Job> find(String id) { return Optional.ofNullable(jobs.get(id)); }

    private static void render(Job job, CalcPackage pkg) {
        try {
            Path f = Files.createTempFile("baysheet-package-", ".pdf");
            try (OutputStream out = Files.newOutputStream(f)) {
                StreamedPdf s = PackageRenderer.checking(pkg, out, (done, total) -> { job.done = done; job.total = total; });
                job.sha256 = s.sha256();
            }
            job.file = f;
        } catch (IOException e) {
            job.error = "the package could not be written: " + e.getMessage();
            throw new UncheckedIOException(e);
        } catch (RuntimeException e) {
            job.error = "the package could not be rendered: " + e.getMessage();
            throw e;
        }
    }

    private void forget(String id) {
        Job j = jobs.remove(id);
        if (j != null && j.file != null) {
            try {
                Files.deleteIfExists(j.file);
            } catch (IOException ignored) {
                // a temporary file left behind is cleaned by the system
            }
        }
    }
}
