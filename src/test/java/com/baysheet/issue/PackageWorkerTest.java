package com.baysheet.issue;

import com.baysheet.auth.Tokens;
import com.baysheet.framing.Derivation;
import com.baysheet.project.Project;
import com.baysheet.review.PackageScope;
import com.baysheet.review.store.ReviewDatabases;
import com.baysheet.review.store.TestClock;
import com.baysheet.sheet.PdfText;
import com.baysheet.store.Database;
import com.baysheet.store.Demo;
import com.baysheet.store.PackageJob;
import com.baysheet.store.PackageJobStore;
import com.baysheet.store.Results;
import com.baysheet.store.Sql;
import com.baysheet.store.Store;
import com.baysheet.store.review.ReviewStore;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.List;
import java.util.stream.Stream;
import java.time.Instant;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A server's package worker over a real database: a queued job rendered and stored, leaving no file behind; a scope
 * the model lost fails by name.
 */
class PackageWorkerTest {
    @TempDir
    Path temp;
    final TestClock clock = new TestClock(Instant.parse("2026-03-02T08:00:00Z"));
    Database db;
    Store store;
    PackageJobStore jobs;
    PackageJobs packages;
    PackageWorker worker;
    Project demo;

    @BeforeEach
    void setUp() {
        db = ReviewDatabases.h2();
        store = Store.on(db.dataSource(), Derivation::derive, clock);
        demo = Demo.loadIfEmpty(store).get(0);
        Sql sql = new Sql(db.dataSource(), clock);
        jobs = new PackageJobStore(sql);
        packages = new PackageJobs(store, ReviewStore.on(sql), jobs, clock);
        worker = new PackageWorker(packages, Duration.ofSeconds(3), temp);
    }

    @AfterEach
    void tearDown() {
        if (worker != null) worker.stop();
        if (db != null) db.close();
    }

    /** The job once it has finished, waiting at most a minute for the worker. */
    private PackageJob finished(long id) throws InterruptedException {
        for (int i = 0; i < 600; i++) {
            PackageJob j = jobs.find(demo.id(), id).orElseThrow();
            if (j.state().finished()) return j;
            Thread.sleep(100);
        }
        throw new AssertionError("package job " + id + " still " + jobs.find(demo.id(), id).orElseThrow().state());
    }

    @Test
    void aQueuedPackageIsRenderedAndItsPdfStoredWithItsHash() throws Exception {
        Results.Computed c = store.results().of(demo.id());
        String level = c.derived().members().get(0).level();
        long id = packages.start(c, store.marks().of(demo.id(), c.derived()), PackageScope.ofLevel(level), "pia");
        assertThat(jobs.find(demo.id(), id).orElseThrow().state()).isEqualTo(PackageJob.State.QUEUED);
        worker.start();

        PackageJob done = finished(id);
        assertThat(done.state()).as("error: %s", done.error()).isEqualTo(PackageJob.State.DONE);
        assertThat(done.done()).isEqualTo(done.total()).isPositive();
        PackageJobs.Download d = packages.file(demo.id(), String.valueOf(id)).orElseThrow();
        assertThat(d.sha256()).isEqualTo(Tokens.sha256(d.pdf()));
        assertThat(d.fileName()).isEqualTo(demo.info().jobNumber() + "-" + level + " package-checking-copy.pdf");
        List<String> cover = PdfText.pages(d.pdf()).get(0);
        assertThat(cover).anySatisfy(l -> assertThat(l).startsWith("Printed ").endsWith(" CHECK PRINT — NOT FOR CONSTRUCTION"));
        assertThat(PdfText.after(cover, "Subject")).isEqualTo(level + " package");
    }

    @Test
    void aRenderedPackageLeavesNoFileAndStoppingRemovesTheServersFolder() throws Exception {
        Results.Computed c = store.results().of(demo.id());
        String level = c.derived().members().get(0).level();
        worker.start();
        Path mine = worker.folder();
        assertThat(mine.getParent()).isEqualTo(temp);
        long id = packages.start(c, store.marks().of(demo.id(), c.derived()), PackageScope.ofLevel(level), "pia");
        assertThat(finished(id).state()).isEqualTo(PackageJob.State.DONE);
        try (Stream<Path> left = Files.list(mine)) {
            assertThat(left.map(p -> p.getFileName().toString())).as("only the lock stays").containsExactly(RenderFolder.LOCK);
        }
        worker.stop();
        worker = null;
        try (Stream<Path> left = Files.list(temp)) {
            assertThat(left).as("nothing of this server under the shared folder").isEmpty();
        }
    }

    @Test
    void aPackageOfALevelTheModelNoLongerHasFailsNamingIt() throws Exception {
        long id = jobs.enqueue(new PackageJob.Request(demo.id(), "Level 99", "Level 99 package", "x.pdf", "pia", 3));
        worker.start();
        PackageJob failed = finished(id);
        assertThat(failed.state()).isEqualTo(PackageJob.State.FAILED);
        assertThat(failed.error()).contains("Level 99", "no members");
        assertThat(packages.file(demo.id(), String.valueOf(id))).isEmpty();
    }
}
