package com.baysheet.e2e;

import java.net.http.HttpResponse;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * A package job taken over from a server that stopped mid-render. Server B is frozen (SIGSTOP) while the package is
 * asked for on A, so that A's worker claims it; the moment the job table shows it running for A, A is frozen too:
 * it holds the lease and beats no more, as a hung or cut-off machine. B goes on; once the lease has run out B
 * claims the job (the table names B's process as its owner), A is killed (SIGKILL) and B renders the job to the end.
 * Freezing rather than killing first makes the takeover certain: a render quicker than a kill could not finish on
 * A unseen. The job's row is read by the test's own connection, since the pages do not name a job's server.
 */
final class PackageTakeover {
    /** Packages asked for before giving up on catching one mid-render on A. */
    private static final int TRIES = 3;
    private static final long CLAIM_WAIT_MS = 60_000;
    private static final long RENDER_WAIT_MS = 180_000;

    record Outcome(long job, int attempts) {}

    private record Row(String state, String owner, int attempts) {
        boolean runningFor(ChildServer s) { return state.equals("running") && owner != null && owner.contains("-" + s.process.pid() + "-"); }
    }

    private final TwoServers office;

    PackageTakeover(TwoServers office) {
        this.office = office;
    }

    Outcome run(long project) throws Exception {
        long job;
        TwoServers.signal(office.b, "STOP");
        try {
            job = frozenOnA(project);
        } finally {
            TwoServers.signal(office.b, "CONT");
        }
        // A is frozen: whoever moves the job on from A (running for B, or already done) is B
        Row claimed = await(job, r -> !r.runningFor(office.a), CLAIM_WAIT_MS, "claimed by server B once A's lease ran out");
        if (!claimed.runningFor(office.b) && !claimed.state().equals("done"))
            throw new IllegalStateException("package job " + job + " left server A for " + claimed + ", not for B:\n" + office.logs());
        if (!office.a.process.isAlive()) throw new IllegalStateException("server A ended while frozen:\n" + office.logs());
        office.a.kill(); // B holds the job now; A dies holding nothing but its stale view of it
        await(job, r -> r.state().equals("done"), RENDER_WAIT_MS, "done by server B");
        return new Outcome(job, claimed.attempts());
    }

    /** Asks A for the whole project's package and freezes A while the job runs for it (and A holds no lock on its row). */
    private long frozenOnA(long project) throws Exception {
        for (int attempt = 1; attempt <= TRIES; attempt++) {
            HttpResponse<String> started = OfficeClient.expect(office.engineerA.form("/projects/" + project + "/packages",
                    Map.of("scope", "project")), 303);
            Matcher m = Pattern.compile("/packages/(\\d+)$").matcher(started.headers().firstValue("Location").orElse(""));
            if (!m.find()) throw new IllegalStateException("no package job in " + started.headers().map());
            long job = Long.parseLong(m.group(1));
            Row r = await(job, x -> x.runningFor(office.a) || !x.state().equals("queued") && !x.state().equals("running"),
                    CLAIM_WAIT_MS, "claimed by server A");
            if (!r.runningFor(office.a)) continue; // rendered before it could be seen running: a bigger chance next time
            TwoServers.signal(office.a, "STOP");
            // frozen inside a heartbeat's transaction, A would hold the row's lock and no other server could claim it:
            // let it run a moment and freeze it again
            for (int thaw = 0; locked(job) && thaw < 50; thaw++) {
                TwoServers.signal(office.a, "CONT");
                Thread.sleep(20);
                TwoServers.signal(office.a, "STOP");
            }
            if (locked(job)) throw new IllegalStateException("server A kept the package job's row locked:\n" + office.logs());
            if (row(job).runningFor(office.a)) return job;
            TwoServers.signal(office.a, "CONT"); // it finished just before the freeze: ask again
        }
        throw new IllegalStateException("in " + TRIES + " tries the package rendered before server A could be stopped mid-way");
    }

    private interface Test {
        boolean on(Row r);
    }

    private Row await(long job, Test until, long waitMs, String what) throws Exception {
        long deadline = System.currentTimeMillis() + waitMs;
        Row r = row(job);
        while (!until.on(r)) {
            if (r.state().equals("failed") || r.state().equals("cancelled"))
                throw new IllegalStateException("package job " + job + " " + r + ", waiting to see it " + what + ":\n" + office.logs());
            if (System.currentTimeMillis() > deadline)
                throw new IllegalStateException("package job " + job + " was not " + what + " within " + waitMs + " ms: " + r
                        + "\n" + office.logs());
            Thread.sleep(5);
            r = row(job);
        }
        return r;
    }

    private Row row(long job) throws SQLException {
        try (Connection c = office.db();
             PreparedStatement s = c.prepareStatement("SELECT state, lease_owner, attempts FROM package_job WHERE id = ?")) {
            s.setLong(1, job);
            try (ResultSet rs = s.executeQuery()) {
                if (!rs.next()) throw new IllegalStateException("no package job " + job);
                return new Row(rs.getString(1), rs.getString(2), rs.getInt(3));
            }
        }
    }

    /** Whether another transaction holds the job's row lock (PostgreSQL: 55P03, lock not available). */
    private boolean locked(long job) throws SQLException {
        try (Connection c = office.db()) {
            c.setAutoCommit(false);
            try (PreparedStatement s = c.prepareStatement("SELECT id FROM package_job WHERE id = ? FOR UPDATE NOWAIT")) {
                s.setLong(1, job);
                s.executeQuery().close();
                return false;
            } catch (SQLException e) {
                if ("55P03".equals(e.getSQLState())) return true;
                throw e;
            } finally {
                c.rollback();
            }
        }
    }
}
