package com.baysheet.store;

import com.baysheet.review.store.ReviewDatabases;
import com.baysheet.review.store.TestClock;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The office's package queue over the real migrations: claims, leases, cancel, the queue's cap, pruning. */
abstract class PackageJobStoreContract {
    static final Duration LEASE = Duration.ofSeconds(3);
    final TestClock clock = new TestClock(Instant.parse("2026-03-02T08:00:00Z"));
    Database db;
    PackageJobStore jobs;
    long project, other;
    @TempDir
    Path dir;

    abstract Database open();

    @BeforeEach
    void setUp() {
        db = open();
        jobs = new PackageJobStore(new Sql(db.dataSource(), clock));
        project = ReviewDatabases.project(db, "PJ-1");
        other = ReviewDatabases.project(db, "PJ-2");
    }

    @AfterEach
    void tearDown() {
        if (db != null) db.close();
    }

    long enqueue(long p) {
        return jobs.enqueue(new PackageJob.Request(p, "Level 2", "Level 2 package", "PJ-Level 2 package-checking-copy.pdf", "pia", 7));
    }

    PackageJob job(long p, long id) { return jobs.find(p, id).orElseThrow(); }

    Path pdf(String text) throws Exception {
        return Files.writeString(dir.resolve(text + ".pdf"), "%PDF-1.4 " + text);
    }

    @Test
    void aQueuedJobIsClaimedByOnlyOneOfTwoClaimersAtOnce() throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(2);
        try {
            for (int round = 0; round < 15; round++) {
                long id = enqueue(project);
                CyclicBarrier together = new CyclicBarrier(2);
                List<Future<Optional<PackageJob>>> claims = new ArrayList<>();
                for (String owner : List.of("server-a", "server-b"))
                    claims.add(pool.submit(() -> {
                        together.await(5, TimeUnit.SECONDS);
                        return jobs.claim(owner, LEASE);
                    }));
                List<PackageJob> won = new ArrayList<>();
                for (Future<Optional<PackageJob>> f : claims) f.get(20, TimeUnit.SECONDS).ifPresent(won::add);
                assertThat(won).as("round %d: claims that got the one job", round).hasSize(1);
                assertThat(won.get(0).id()).isEqualTo(id);
                assertThat(job(project, id).state()).isEqualTo(PackageJob.State.RUNNING);
                assertThat(jobs.cancel(project, id)).isTrue(); // out of the queue before the next round
            }
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void twoClaimersTakeTwoJobsOldestFirst() {
        long first = enqueue(project), second = enqueue(other);
        assertThat(jobs.claim("server-a", LEASE).orElseThrow().id()).isEqualTo(first);
        assertThat(jobs.claim("server-b", LEASE).orElseThrow().id()).isEqualTo(second);
        assertThat(jobs.claim("server-c", LEASE)).isEmpty();
    }

    @Test
    void aJobWhoseLeaseRanOutIsClaimedAgainAndItsFirstServerCanNoLongerWriteIt() throws Exception {
        long id = enqueue(project);
        assertThat(jobs.claim("server-a", LEASE)).isPresent();
        assertThat(jobs.heartbeat(id, "server-a", LEASE, 3, 7)).isTrue();
        assertThat(job(project, id).done()).isEqualTo(3);
        clock.advance(Duration.ofSeconds(2));
        assertThat(jobs.claim("server-b", LEASE)).as("the lease renewed at the heartbeat still runs").isEmpty();

        clock.advance(Duration.ofSeconds(2)); // 4 s after the heartbeat: server-a stopped renewing it
        PackageJob again = jobs.claim("server-b", LEASE).orElseThrow();
        assertThat(again.id()).isEqualTo(id);
        assertThat(again.attempts()).isEqualTo(2);
        assertThat(again.done()).as("rendered again from the start").isZero();
        assertThat(jobs.heartbeat(id, "server-a", LEASE, 5, 7)).isFalse();
        assertThat(jobs.finish(id, "server-a", pdf("stale"), "aa")).isFalse();
        assertThat(jobs.finish(id, "server-b", pdf("fresh"), "bb")).isTrue();

        PackageJob done = job(project, id);
        assertThat(done.state()).isEqualTo(PackageJob.State.DONE);
        assertThat(done.sha256()).isEqualTo("bb");
        assertThat(done.finished()).isNotNull();
        assertThat(jobs.pdf(project, id)).hasValueSatisfying(b -> assertThat(new String(b)).isEqualTo("%PDF-1.4 fresh"));
        assertThat(jobs.pdf(other, id)).as("another project's job").isEmpty();
    }

    @Test
    void aJobThatStoppedItsServerEveryTimeFailsAfterItsLastAttempt() {
        long id = enqueue(project);
        for (int i = 1; i <= PackageJobClaims.MAX_ATTEMPTS; i++) {
            assertThat(jobs.claim("server-" + i, LEASE)).as("claim %d", i).isPresent();
            clock.advance(LEASE.plusSeconds(1));
        }
        assertThat(jobs.claim("server-x", LEASE)).isEmpty();
        PackageJob failed = job(project, id);
        assertThat(failed.state()).isEqualTo(PackageJob.State.FAILED);
        assertThat(failed.error()).contains("stopped " + PackageJobClaims.MAX_ATTEMPTS + " times");
    }

    @Test
    void aCancelledJobIsNotClaimedAndItsRendererIsToldAtItsNextHeartbeat() throws Exception {
        long queued = enqueue(project);
        assertThat(jobs.cancel(project, queued)).isTrue();
        assertThat(jobs.claim("server-a", LEASE)).as("a cancelled job waits for nobody").isEmpty();
        assertThat(job(project, queued).state()).isEqualTo(PackageJob.State.CANCELLED);

        long running = enqueue(project);
        jobs.claim("server-a", LEASE).orElseThrow();
        assertThat(jobs.cancel(other, running)).as("not that project's job").isFalse();
        assertThat(jobs.cancel(project, running)).isTrue();
        assertThat(jobs.heartbeat(running, "server-a", LEASE, 1, 7)).isFalse();
        assertThat(jobs.finish(running, "server-a", pdf("late"), "cc")).isFalse();
        assertThat(job(project, running).state()).isEqualTo(PackageJob.State.CANCELLED);
        clock.advance(LEASE.multipliedBy(2));
        assertThat(jobs.claim("server-b", LEASE)).as("a cancelled job is not taken up when its lease would have run out").isEmpty();
        assertThat(jobs.cancel(project, running)).as("cancelled already").isFalse();
    }

    @Test
    void theOfficeQueueHoldsFourJobsAndRefusesAFifthNamingTheLimit() {
        List<Long> ids = new ArrayList<>();
        for (int i = 0; i < 4; i++) ids.add(enqueue(i % 2 == 0 ? project : other));
        jobs.claim("server-a", LEASE).orElseThrow(); // running counts as well as queued
        assertThatThrownBy(() -> enqueue(project)).isInstanceOf(TooBusy.class)
                .hasMessageContaining("at most 4").hasMessageContaining("packageQueue")
                .satisfies(e -> assertThat(((TooBusy) e).limit()).isEqualTo("packageQueue"));
        assertThat(jobs.fail(ids.get(0), "server-a", "no fonts")).isTrue();
        assertThat(job(project, ids.get(0)).error()).isEqualTo("no fonts");
        assertThat(enqueue(project)).as("a place freed by a finished job").isPositive();
    }

    @Test
    void eightRequestsAtOnceGetFourPlacesInTheQueue() throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(8);
        try {
            CyclicBarrier together = new CyclicBarrier(8);
            List<Future<Boolean>> asked = new ArrayList<>();
            for (int i = 0; i < 8; i++) {
                long p = i % 2 == 0 ? project : other;
                asked.add(pool.submit(() -> {
                    together.await(5, TimeUnit.SECONDS);
                    try {
                        enqueue(p);
                        return true;
                    } catch (TooBusy e) {
                        return false;
                    }
                }));
            }
            int queued = 0;
            for (Future<Boolean> f : asked) if (f.get(30, TimeUnit.SECONDS)) queued++;
            assertThat(queued).isEqualTo(4);
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void aStoppingServerPutsItsJobBackWithoutCountingTheAttempt() {
        long id = enqueue(project);
        jobs.claim("server-a", LEASE).orElseThrow();
        assertThat(jobs.release(id, "server-b")).as("not server-b's to release").isFalse();
        assertThat(jobs.release(id, "server-a")).isTrue();
        PackageJob back = job(project, id);
        assertThat(back.state()).isEqualTo(PackageJob.State.QUEUED);
        assertThat(back.attempts()).isZero();
        assertThat(jobs.claim("server-b", LEASE).orElseThrow().id()).as("taken up at once by another").isEqualTo(id);
    }

    @Test
    void pruningKeepsTheNewestTwentyFinishedJobsOfTheProjectAndEveryUnfinishedOne() {
        List<Long> finished = new ArrayList<>();
        for (int i = 0; i < 25; i++) {
            long id = enqueue(project);
            jobs.cancel(project, id);
            finished.add(id);
        }
        long otherDone = enqueue(other);
        jobs.cancel(other, otherDone);
        long waiting = enqueue(project);

        assertThat(jobs.prune(project)).isEqualTo(5);
        for (int i = 0; i < 25; i++)
            assertThat(jobs.find(project, finished.get(i)).isPresent()).as("finished job %d kept", i).isEqualTo(i >= 5);
        assertThat(jobs.find(project, waiting)).as("the queued job").isPresent();
        assertThat(jobs.find(other, otherDone)).as("another project's").isPresent();
        assertThat(jobs.prune(project)).isZero();
    }
}
