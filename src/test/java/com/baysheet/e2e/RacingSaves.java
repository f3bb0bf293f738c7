package com.baysheet.e2e;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.concurrent.CyclicBarrier;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;
import java.util.stream.LongStream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Saves racing across two servers: users on each server add a level of their own to one project, each sending the
 * version it has just read. All read first and then send at once (a barrier), so the first round can have one
 * winner at most; a refused user reads again and sends again, as a person reloads and applies their change, until
 * it is accepted. What is checked afterwards: every refusal was a 409 (never a 500), and only of a version some
 * accepted save had already moved past (it really was stale); no two accepted saves started from one version (no
 * save overwrote another); the version advanced by exactly the number accepted; every accepted level is in the
 * model; and each has its audit entry naming the version it moved from and to, with the chain intact.
 */
final class RacingSaves {
    private static final ObjectMapper JSON = new ObjectMapper();
    /** A user still refused after this many tries has met something other than the race. */
    private static final int TRIES = 100;

    record Accepted(String level, long from) {}

    private final long project;
    private final int users;
    private final List<Accepted> accepted = Collections.synchronizedList(new ArrayList<>());
    private final List<Long> refused = Collections.synchronizedList(new ArrayList<>());
    private final List<String> unexpected = Collections.synchronizedList(new ArrayList<>());
    private long start;
    private long end;

    private RacingSaves(long project, int users) {
        this.project = project;
        this.users = users;
    }

    /** {@code perServer} users on each of the two servers' clients, each adding one level. */
    static RacingSaves run(long project, OfficeClient a, OfficeClient b, int perServer) throws Exception {
        RacingSaves r = new RacingSaves(project, 2 * perServer);
        r.start = version(a, project);
        CyclicBarrier together = new CyclicBarrier(r.users);
        ExecutorService pool = Executors.newFixedThreadPool(r.users);
        for (int i = 0; i < r.users; i++) {
            OfficeClient c = i < perServer ? a : b;
            String name = "Race " + (i < perServer ? "A" : "B") + (i % perServer + 1);
            double elevation = 10 + 12 * i;
            pool.submit(() -> r.save(c, name, elevation, together));
        }
        pool.shutdown();
        if (!pool.awaitTermination(5, TimeUnit.MINUTES)) {
            pool.shutdownNow();
            throw new IllegalStateException("the racing saves did not end within 5 minutes");
        }
        r.end = version(a, project);
        return r;
    }

    private void save(OfficeClient c, String level, double elevation, CyclicBarrier together) {
        try {
            for (int attempt = 0; attempt < TRIES; attempt++) {
                long v = version(c, project);
                if (attempt == 0) together.await(2, TimeUnit.MINUTES);
                HttpResponse<String> r = c.json("POST", "/api/projects/" + project + "/levels",
                        "{\"version\": " + v + ", \"name\": \"" + level + "\", \"elevation\": " + elevation + "}");
                if (r.statusCode() == 201) {
                    accepted.add(new Accepted(level, v));
                    return;
                }
                if (r.statusCode() != 409) {
                    unexpected.add(level + " at version " + v + ": " + r.statusCode() + " " + r.body());
                    return;
                }
                refused.add(v);
            }
            unexpected.add(level + ": still refused after " + TRIES + " tries");
        } catch (Exception e) {
            unexpected.add(level + ": " + e);
        }
    }

    List<Accepted> accepted() { return List.copyOf(accepted); }

    List<Long> refusedVersions() { return List.copyOf(refused); }

    /** The checks above, reading the model and the audit trail back through the given clients (any server). */
    void check(OfficeClient reader, OfficeClient admin) throws Exception {
        assertThat(unexpected).as("answers other than 201 or 409").isEmpty();
        assertThat(accepted).as("every user's level was saved in the end").hasSize(users);
        assertThat(end - start).as("the version advanced once per accepted save").isEqualTo(accepted.size());
        List<Long> from = accepted.stream().map(Accepted::from).sorted().toList();
        assertThat(from).as("each accepted save started from its own version: none overwrote another")
                .containsExactlyElementsOf(LongStream.range(start, end).boxed().toList());
        assertThat(refused).as("the first round, all at once, refused all but one").hasSizeGreaterThanOrEqualTo(users - 1);
        assertThat(new HashSet<>(from)).as("every refused version had been moved past by an accepted save").containsAll(refused);

        Set<String> levels = new HashSet<>();
        for (JsonNode l : JSON.readTree(OfficeClient.expect(reader.get("/api/projects/" + project + "/levels"), 200).body()))
            levels.add(l.path("name").asText());
        assertThat(levels).as("every accepted level is in the model")
                .containsExactlyInAnyOrderElementsOf(accepted.stream().map(Accepted::level).toList());

        List<String> entries = AuditRows.of(OfficeClient.expect(admin.get("/admin/audit.csv"), 200).body());
        for (Accepted a : accepted)
            assertThat(entries).as("the audit entry of " + a)
                    .anyMatch(e -> e.contains(a.level()) && e.contains("model version " + a.from() + " → " + (a.from() + 1)));
        assertThat(OfficeClient.expect(admin.get("/admin/audit/verify"), 200).body()).contains("Chain verified");
    }

    private static long version(OfficeClient c, long project) throws Exception {
        return JSON.readTree(OfficeClient.expect(c.get("/api/projects/" + project), 200).body()).path("project").path("version").asLong();
    }
}
