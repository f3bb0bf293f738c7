package com.baysheet.issue;

import com.baysheet.sheet.PackageRenderer;
import com.baysheet.sheet.StreamedPdf;
import com.baysheet.store.PackageJob;
import com.baysheet.store.PackageJobStore;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

import java.io.IOException;
import java.net.InetAddress;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Optional;
import java.util.UUID;
import java.util.concurrent.Executors;
import java.util.concurrent.ScheduledExecutorService;
import java.util.concurrent.ScheduledFuture;
import java.util.concurrent.TimeUnit;

/**
 * A server's renderer of package jobs: one thread claims the office's next job, renders it and stores the PDF,
 * while a timer renews its lease (and records the progress) every second or so. A job that is cancelled, or
 * whose lease another server took over, stops at the next sheet after the heartbeat finds it no longer running
 * for this server. Stopping the server puts a job under way back in the queue; a server that dies leaves it to
 * be claimed again when its lease runs out ({@value #LEASE_PROPERTY} seconds, 60 unless set). Packages render into
 * this server's own {@link RenderFolder}, made at start (removing those a killed server left) and removed at stop.
 */
public final class PackageWorker {
    public static final String LEASE_PROPERTY = "baysheet.packageLeaseSeconds";
    private static final Logger LOG = LoggerFactory.getLogger(PackageWorker.class);
    /** How long an idle worker waits before asking for a job again. */
    private static final long IDLE_MS = 500;

    private final PackageJobs packages;
    private final PackageJobStore jobs;
    private final Duration lease;
    private final Duration beat;
    private final String owner;
    private final Path tempParent;
    private RenderFolder folder;
    private volatile boolean running;
    private Thread thread;
    private ScheduledExecutorService heart;

    public PackageWorker(PackageJobs packages, Duration lease) {
        this(packages, lease, RenderFolder.defaultParent());
    }

    /** @param tempParent where each server of the machine makes its folder for packages while they render */
    PackageWorker(PackageJobs packages, Duration lease, Path tempParent) {
        if (lease.isNegative() || lease.isZero()) throw new IllegalArgumentException("lease: a positive time, not " + lease);
        this.packages = packages;
        this.jobs = packages.store();
        this.lease = lease;
        // renewed well before it runs out: three beats to a lease, and at least each second for the progress bar
        this.beat = lease.dividedBy(3).compareTo(Duration.ofSeconds(1)) < 0 ? lease.dividedBy(3) : Duration.ofSeconds(1);
        this.owner = ownerName();
        this.tempParent = tempParent;
    }

    /** The lease of {@value #LEASE_PROPERTY} (whole seconds, at least 1), 60 s when it is not set. */
    public static Duration leaseFromSystem() {
        String s = System.getProperty(LEASE_PROPERTY, "60").strip();
        try {
            long seconds = Long.parseLong(s);
            if (seconds >= 1 && seconds <= 86_400) return Duration.ofSeconds(seconds);
        } catch (NumberFormatException e) {
            // refused below, naming the property
        }
        throw new IllegalArgumentException(LEASE_PROPERTY + ": whole seconds from 1 to 86400, not \"" + s + "\"");
    }

    public synchronized void start() {
        if (running) return;
        folder = RenderFolder.open(tempParent, owner);
        running = true;
        heart = Executors.newSingleThreadScheduledExecutor(r -> daemon(r, "package-heartbeat"));
        thread = daemon(this::loop, "package-worker");
        thread.start();
    }

    /** Stops claiming; a job under way stops at its next sheet and goes back in the queue. */
    public synchronized void stop() {
        if (!running) return;
        running = false;
        thread.interrupt();
        try {
            thread.join(10_000);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
        heart.shutdownNow();
        // a render still writing keeps its folder; the next start on this machine removes it once unlocked
        if (!thread.isAlive()) folder.close();
    }

    /** This server's folder for packages while they render (none before start). */
    Path folder() { return folder == null ? null : folder.dir(); }

    public String owner() { return owner; }

    private void loop() {
        while (running) {
            try {
                Optional<PackageJob> job = jobs.claim(owner, lease);
                if (job.isPresent()) render(job.get());
                else Thread.sleep(IDLE_MS);
            } catch (InterruptedException e) {
                return;
            } catch (RuntimeException e) {
                // the database unreachable for a moment: try again, slowly, rather than end the worker
                LOG.warn("package worker {}: {}", owner, e.toString());
                try {
                    Thread.sleep(IDLE_MS * 4);
                } catch (InterruptedException stop) {
                    return;
                }
            }
        }
    }

    /** Renders one claimed job to the end, or until it is no longer this server's to render. */
    private void render(PackageJob job) {
        Beat b = new Beat(job);
        ScheduledFuture<?> ticks = heart.scheduleAtFixedRate(b::tick, beat.toMillis(), beat.toMillis(), TimeUnit.MILLISECONDS);
        Path file = null;
        try {
            file = folder.newFile();
            StreamedPdf pdf = packages.render(job, file, b);
            ticks.cancel(false);
            jobs.finish(job.id(), owner, file, pdf.sha256());
        } catch (Stopped s) {
            if (!running) jobs.release(job.id(), owner); // this server stops: another (or this one again) takes it up
        } catch (IOException e) {
            jobs.fail(job.id(), owner, "the package could not be written: " + e.getMessage());
        } catch (RuntimeException e) {
            LOG.warn("package job {} failed", job.id(), e);
            jobs.fail(job.id(), owner, "the package could not be rendered: " + e.getMessage());
        } finally {
            ticks.cancel(false);
            delete(file);
            jobs.prune(job.project());
        }
    }

    /** The progress of the job under way, written by the heartbeat; the renderer stops when the beat finds the job gone. */
    private final class Beat implements PackageRenderer.Progress {
        private final PackageJob job;
        private volatile int done, total;
        private volatile boolean lost;

        Beat(PackageJob job) {
            this.job = job;
            this.total = job.total();
        }

        @Override
        public void sheetDone(int done, int total) {
            this.done = done;
            this.total = total;
            if (lost || !running) throw new Stopped();
        }

        void tick() {
            try {
                if (!jobs.heartbeat(job.id(), owner, lease, done, total)) lost = true;
            } catch (RuntimeException e) {
                LOG.warn("package job {}: heartbeat failed: {}", job.id(), e.toString()); // the next beat tries again
            }
        }
    }

    /** Thrown through the renderer to stop it at the next sheet. */
    private static final class Stopped extends RuntimeException {
        Stopped() { super(null, null, false, false); }
    }

    private static void delete(Path file) {
        if (file == null) return;
        try {
            Files.deleteIfExists(file);
        } catch (IOException e) {
            LOG.warn("a rendered package's temporary file was left at {}", file);
        }
    }

    private static Thread daemon(Runnable r, String name) {
        Thread t = new Thread(r, name);
        t.setDaemon(true);
        return t;
    }

    private static String ownerName() {
        String host;
        try {
            host = InetAddress.getLocalHost().getHostName();
        } catch (IOException e) {
            host = "server";
        }
        String name = host + "-" + ProcessHandle.current().pid() + "-" + UUID.randomUUID().toString().substring(0, 8);
        return name.length() > 100 ? name.substring(name.length() - 100) : name;
    }
}
