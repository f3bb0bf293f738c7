package com.baysheet.web;

import com.baysheet.store.Editor;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.model.Limits;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.ProjectInfo;
import com.baysheet.project.StoredLevel;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/** Bounded work: a request that asks for too much, or for an absurd number, is refused naming the field. */
class BoundsTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();

    static JsonNode json(HttpResponse<String> r) throws Exception { return RecordJson.mapper().readTree(r.body()); }

    private static StoredLevel firstLevel(long project) { return server.store.levels().findByProject(project).get(0); }

    private static long usedHeap() {
        Runtime rt = Runtime.getRuntime();
        System.gc();
        return rt.totalMemory() - rt.freeMemory();
    }

    @Test
    void aHugeBayRangeIsRefusedBeforeItIsExpanded() throws Exception {
        long p = server.alder().id();
        long before = usedHeap();
        HttpResponse<String> r = server.json("POST", "/api/projects/" + p + "/levels/" + firstLevel(p).id() + "/bays",
                "{\"version\": " + server.version(p) + ", \"cols\": [0, 2147483647], \"rows\": [0, 2147483647],"
                        + " \"occupancy\": \"office\", \"deadLoad\": 60, \"beams\": \"Y\", \"infillBeams\": 2}");
        long after = usedHeap();
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(json(r).get("field").asText()).isEqualTo("cols");
        assertThat(json(r).get("problem").asText()).contains("within the grid");
        // a generous bound: listing even a million cells would take far more than this
        assertThat(after - before).isLessThan(64L << 20);
    }

    @Test
    void theBayEditorRefusesMoreCellsThanTheLimit() {
        long p = server.alder().id();
        List<Map.Entry<String, String>> f = new ArrayList<>(List.of(entry("version", String.valueOf(server.version(p))),
                entry("action", "opening")));
        for (int i = 0; i <= Limits.MAX_CELLS_PER_REQUEST; i++) f.add(entry("cells", "0,0"));
        HttpResponse<String> r = server.post("/projects/" + p + "/levels/" + firstLevel(p).id() + "/bays", f);
        assertThat(r.statusCode()).isEqualTo(422);
        assertThat(r.body()).contains("at most " + Limits.MAX_CELLS_PER_REQUEST, "limit cells");
    }

    private static long freshProject(String job) {
        return server.store.projects().create(Editor.DEMO, new ProjectInfo(job, "Bounds " + job, "", "", "ASCE 7-16", UnitSystem.US, false, false)).id();
    }

    @Test
    void absurdSpacingsAreRefusedNamingTheField() throws Exception {
        long p = freshProject("B-SPACING");
        for (String s : List.of("1e-300", "1e6")) {
            HttpResponse<String> r = server.json("PUT", "/api/projects/" + p + "/grid", "{\"version\": " + server.version(p)
                    + ", \"x\": {\"names\": [\"1\", \"2\"], \"spacings\": [" + s + "]}, \"y\": {\"names\": [\"A\", \"B\"], \"spacings\": [20]}}");
            assertThat(r.statusCode()).as(s).isEqualTo(400);
            assertThat(json(r).get("field").asText()).startsWith("grid.x.spacings");
            assertThat(json(r).get("problem").asText()).contains("between 0.1 and 1000 ft");
        }
    }

    @Test
    void absurdElevationsAndSteepRoofsAreRefused() throws Exception {
        long p = server.alder().id();
        for (String e : List.of("1e308", "-1e308")) {
            HttpResponse<String> r = server.json("POST", "/api/projects/" + p + "/levels",
                    "{\"version\": " + server.version(p) + ", \"name\": \"High " + e + "\", \"elevation\": " + e + "}");
            assertThat(r.statusCode()).as(e).isEqualTo(400);
            assertThat(json(r).get("field").asText()).isEqualTo("elevation");
        }
        // 50 in/ft is past the engine's 24 in/ft: refused when entered, not when a sheet is calculated
        HttpResponse<String> r = server.json("POST", "/api/projects/" + p + "/levels", "{\"version\": " + server.version(p)
                + ", \"name\": \"Steep roof\", \"elevation\": 80, \"roof\": true, \"roofSlope\": 50}");
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(json(r).get("field").asText()).isEqualTo("roofSlope");
    }

    @Test
    void aNonIntegerVersionIsRefused() throws Exception {
        long p = server.alder().id();
        HttpResponse<String> r = server.json("POST", "/api/projects/" + p + "/levels",
                "{\"version\": " + server.version(p) + ".5, \"name\": \"Half\", \"elevation\": 40}");
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(json(r).get("field").asText()).isEqualTo("version");
    }

    @Test
    void anOverLongGridLineNameIsAFieldErrorNotAFault() throws Exception {
        long p = freshProject("B-NAME");
        String name = "L".repeat(Limits.MAX_LINE_NAME + 1);
        HttpResponse<String> r = server.json("PUT", "/api/projects/" + p + "/grid", "{\"version\": " + server.version(p)
                + ", \"x\": {\"names\": [\"1\", \"" + name + "\"], \"spacings\": [20]}, \"y\": {\"names\": [\"A\", \"B\"], \"spacings\": [20]}}");
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(json(r).get("field").asText()).isEqualTo("grid.x.names");
    }

    @Test
    void tooManyGridLinesAreRefusedNamingTheLimit() throws Exception {
        long p = freshProject("B-LINES");
        List<String> names = new ArrayList<>(), spacings = new ArrayList<>();
        for (int i = 0; i <= Limits.MAX_GRID_LINES; i++) {
            names.add("\"" + i + "\"");
            if (i > 0) spacings.add("10");
        }
        HttpResponse<String> r = server.json("PUT", "/api/projects/" + p + "/grid", "{\"version\": " + server.version(p)
                + ", \"x\": {\"names\": " + names + ", \"spacings\": " + spacings + "}, \"y\": {\"names\": [\"A\", \"B\"], \"spacings\": [20]}}");
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(json(r).get("problem").asText()).contains("at most " + Limits.MAX_GRID_LINES, "limit grid.x.names");
    }

    @Test
    void aProjectTakesNoMoreLevelsThanTheLimit() throws Exception {
        long p = freshProject("B-LEVELS");
        for (int i = 0; i < Limits.MAX_LEVELS; i++)
            server.store.levels().add(Editor.DEMO, p, server.version(p), new LevelInfo("L" + i, i * 10, false, Double.NaN));
        HttpResponse<String> r = server.json("POST", "/api/projects/" + p + "/levels",
                "{\"version\": " + server.version(p) + ", \"name\": \"One more\", \"elevation\": 5000}");
        assertThat(r.statusCode()).isEqualTo(400);
        assertThat(json(r).get("field").asText()).isEqualTo("levels");
        assertThat(json(r).get("problem").asText()).contains("at most " + Limits.MAX_LEVELS, "limit levels");
        assertThat(server.store.levels().findByProject(p)).hasSize(Limits.MAX_LEVELS);
    }

    @Test
    void concurrentCreatesOfOneJobNumberGiveOneCreatedAndTheRestConflicts() throws Exception {
        int n = 8;
        ExecutorService pool = Executors.newFixedThreadPool(n);
        try {
            List<Future<HttpResponse<String>>> answers = new ArrayList<>();
            for (int i = 0; i < n; i++)
                answers.add(pool.submit(() -> server.json("POST", "/api/projects",
                        "{\"jobNumber\": \"26-777\", \"name\": \"Race\", \"units\": \"US\"}")));
            List<Integer> codes = new ArrayList<>();
            for (Future<HttpResponse<String>> a : answers) codes.add(a.get().statusCode());
            assertThat(codes).containsOnly(201, 409);
            assertThat(codes.stream().filter(c -> c == 201).count()).isEqualTo(1);
        } finally {
            pool.shutdownNow();
        }
        assertThat(server.store.projects().findAll().stream().filter(x -> x.info().jobNumber().equals("26-777"))).hasSize(1);
    }

    @Test
    void concurrentFormCreatesOfOneJobNumberGiveOneRedirect() throws Exception {
        int n = 8;
        ExecutorService pool = Executors.newFixedThreadPool(n);
        try {
            List<Future<HttpResponse<String>>> answers = new ArrayList<>();
            for (int i = 0; i < n; i++)
                answers.add(pool.submit(() -> server.post("/projects", List.of(entry("jobNumber", "26-778"),
                        entry("name", "Race form"), entry("edition", "ASCE 7-16"), entry("units", "US")))));
            List<Integer> codes = new ArrayList<>();
            for (Future<HttpResponse<String>> a : answers) codes.add(a.get().statusCode());
            assertThat(codes).containsOnly(303, 409);
            assertThat(codes.stream().filter(c -> c == 303).count()).isEqualTo(1);
        } finally {
            pool.shutdownNow();
        }
    }

    @Test
    void concurrentCreatesOfOneOccupancyIdGiveOneCreatedAndTheRestConflicts() throws Exception {
        int n = 8;
        ExecutorService pool = Executors.newFixedThreadPool(n);
        try {
            List<Future<HttpResponse<String>>> answers = new ArrayList<>();
            for (int i = 0; i < n; i++)
                answers.add(pool.submit(() -> server.json("POST", "/api/occupancies", "{\"id\": \"race-room\", \"name\": \"Race room\","
                        + " \"units\": \"US\", \"uniform\": 100, \"contactSide\": 30, \"rule\": \"ORDINARY\"}")));
            List<Integer> codes = new ArrayList<>();
            for (Future<HttpResponse<String>> a : answers) codes.add(a.get().statusCode());
            assertThat(codes).containsOnly(201, 409);
            assertThat(codes.stream().filter(c -> c == 201).count()).isEqualTo(1);
        } finally {
            pool.shutdownNow();
        }
    }
}
