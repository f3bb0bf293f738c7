package com.baysheet.e2e;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.Statement;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.Collectors;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The machine dies during the working day: the server (a process of its own on the embedded H2 file) is
 * killed with SIGKILL while eight users save at once, then started again on the same data directory.
 * Every save that was answered as saved must be there, every answered version must be reached, and the
 * database must open as it is, without any repair.
 */
class CrashSafetyIT {
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final int USERS = 8;
    /** Enough acknowledged saves that the kill lands in the middle of the stream, whatever the machine's speed. */
    private static final int KILL_AFTER_ACKS = 200;
    private static final String PASSWORD = "crash test password";

    private final Set<String> ackedProjects = ConcurrentHashMap.newKeySet();
    private final Set<String> ackedOccupancies = ConcurrentHashMap.newKeySet();
    private final Map<Long, Long> ackedVersions = new ConcurrentHashMap<>();
    private final AtomicInteger acks = new AtomicInteger();
    private final AtomicInteger refusedAfterKill = new AtomicInteger();

    @Test
    void everyAnsweredSaveSurvivesSigkill() throws Exception {
        Path data = Files.createDirectories(Path.of("target", "crash-safety", "run-" + System.currentTimeMillis())).resolve("data");
        ChildServer first = ChildServer.start(data, true);
        OfficeClient eng;
        try {
            OfficeClient admin = new OfficeClient(first.base()).setUp("admin", PASSWORD, first.setupCode());
            admin.addUser("erin", "engineer", PASSWORD);
            eng = new OfficeClient(first.base()).logIn("erin", PASSWORD);
            List<Long> own = new ArrayList<>();
            for (int u = 0; u < USERS; u++) own.add(create(eng, "own-" + u));
            saveUntilKilled(eng, own, first);
        } finally {
            first.kill();
        }
        assertThat(acks.get()).isGreaterThanOrEqualTo(KILL_AFTER_ACKS);

        long restartStarted = System.nanoTime();
        try (ChildServer second = ChildServer.start(data, false)) {
            long restartMs = (System.nanoTime() - restartStarted) / 1_000_000;
            OfficeClient again = new OfficeClient(second.base()).logIn("erin", PASSWORD);
            JsonNode projects = JSON.readTree(OfficeClient.expect(again.get("/api/projects"), 200).body());
            Set<String> jobs = new java.util.HashSet<>();
            Map<Long, Long> versions = new HashMap<>();
            for (JsonNode p : projects) {
                jobs.add(p.path("info").path("jobNumber").asText());
                versions.put(p.path("id").asLong(), p.path("version").asLong());
            }
            assertThat(jobs).as("every project answered 201 is there (server logs: %s, %s)", first.log, second.log)
                    .containsAll(ackedProjects);
            ackedVersions.forEach((id, v) -> assertThat(versions.get(id)).as("project " + id + " reached its answered version")
                    .isGreaterThanOrEqualTo(v));
            Set<String> occupancies = new java.util.HashSet<>();
            for (JsonNode o : JSON.readTree(OfficeClient.expect(again.get("/api/occupancies"), 200).body()))
                occupancies.add(o.path("id").asText());
            assertThat(occupancies).as("every firm occupancy answered 201 is there").containsAll(ackedOccupancies);
            assertThat(second.logText()).doesNotContainIgnoringCase("corrupt").doesNotContainIgnoringCase("recover");
            System.out.printf("crash-safety: %d saves answered before SIGKILL (%d projects, %d occupancies, %d updates), "
                            + "%d requests failed at the kill, restart to healthy in %d ms, all answered saves present%n",
                    acks.get(), ackedProjects.size(), ackedOccupancies.size(), ackedVersions.size(), refusedAfterKill.get(), restartMs);
        }
        // closed normally now: the file opens with plain JDBC, as is, and reads back
        try (Connection c = DriverManager.getConnection("jdbc:h2:file:" + data.toAbsolutePath().resolve("baysheet")
                + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;IFEXISTS=TRUE");
             Statement s = c.createStatement(); ResultSet r = s.executeQuery("select count(*) from project")) {
            r.next();
            assertThat(r.getLong(1)).isGreaterThanOrEqualTo(ackedProjects.size());
        }
    }

    private void saveUntilKilled(OfficeClient eng, List<Long> own, ChildServer server) throws Exception {
        ExecutorService pool = Executors.newFixedThreadPool(USERS);
        for (int u = 0; u < USERS; u++) {
            int user = u;
            pool.submit(() -> saveLoop(eng, user, own.get(user)));
        }
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(40);
        while (acks.get() < KILL_AFTER_ACKS && System.nanoTime() < deadline) Thread.sleep(5);
        server.kill();
        pool.shutdown();
        // every client has seen the server gone before the restart: a save still running then could be answered by
        // the restarted server (it may get the same port) and be counted as answered before the kill
        assertThat(pool.awaitTermination(60, TimeUnit.SECONDS)).as("every client stopped at the kill").isTrue();
    }

    /** Creates projects, updates its own project by version and adds firm occupancies until the server is gone. */
    private void saveLoop(OfficeClient eng, int user, long ownProject) {
        long version = 1;
        for (int i = 0; ; i++) {
            try {
                switch (i % 3) {
                    case 0 -> {
                        String job = "crash-" + user + "-" + i;
                        create(eng, job);
                        ackedProjects.add(job);
                    }
                    case 1 -> {
                        HttpResponse<String> r = eng.json("PUT", "/api/projects/" + ownProject, "{\"version\": " + version
                                + ", \"jobNumber\": \"own-" + user + "\", \"name\": \"Own project, save " + i + "\", \"units\": \"US\"}");
                        if (r.statusCode() == 200) {
                            version = JSON.readTree(r.body()).path("version").asLong();
                            ackedVersions.put(ownProject, version);
                        } else throw new IllegalStateException("update answered " + r.statusCode() + ": " + r.body());
                    }
                    default -> {
                        String id = "crash-occ-" + user + "-" + i;
                        OfficeClient.expect(eng.json("POST", "/api/occupancies", "{\"id\": \"" + id + "\", \"name\": \"Crash room " + i
                                + "\", \"units\": \"US\", \"uniform\": 75, \"concentrated\": 0, \"contactSide\": 30, \"rule\": \"ORDINARY\"}"), 201);
                        ackedOccupancies.add(id);
                    }
                }
                acks.incrementAndGet();
            } catch (java.io.UncheckedIOException e) {
                refusedAfterKill.incrementAndGet();
                return; // the server is gone
            } catch (Exception e) {
                throw new IllegalStateException("user " + user + ", save " + i, e);
            }
        }
    }

    private static long create(OfficeClient eng, String job) throws Exception {
        HttpResponse<String> r = OfficeClient.expect(eng.json("POST", "/api/projects",
                "{\"jobNumber\": \"" + job + "\", \"name\": \"Crash test " + job + "\", \"units\": \"US\"}"), 201);
        return JSON.readTree(r.body()).path("id").asLong();
    }

    static String summary(Set<String> s) { return s.stream().sorted().collect(Collectors.joining(",")); }
}
