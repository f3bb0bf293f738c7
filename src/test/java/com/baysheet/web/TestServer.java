package com.baysheet.web;

import com.baysheet.auth.Role;
import com.baysheet.store.Database;
import com.baysheet.store.Demo;
import com.baysheet.project.Project;
import com.baysheet.store.Results;
import com.baysheet.store.Store;
import io.javalin.Javalin;
import org.junit.jupiter.api.extension.AfterAllCallback;
import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

import java.net.http.HttpResponse;
import java.time.Clock;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.UUID;

/**
 * The office's own server ({@link Office}, access check and all) on a random port over a fresh H2 memory
 * database with the demo loaded, and a client for it logged in as an engineer (who may prepare): its posts
 * carry the form token as a browser's do.
 * {@code new TestServer()} starts one at once; as a JUnit extension ({@code @RegisterExtension static final
 * TestServer server = TestServer.perClass();}) it starts before a class's first test and stops after its last.
 */
final class TestServer implements AutoCloseable, BeforeAllCallback, AfterAllCallback {
    Database db;
    Store store;
    Office office;
    Javalin app;
    List<Project> demo;
    /** The engineer every request of {@link #get}, {@link #post} and {@link #json} is sent as. */
    TestLogin.Client engineer;

    TestServer() { start(); }

    private TestServer(boolean later) {}

    /** A server for one test class, started by JUnit. */
    static TestServer perClass() { return new TestServer(true); }

    @Override
    public void beforeAll(ExtensionContext c) { if (app == null) start(); }

    @Override
    public void afterAll(ExtensionContext c) { close(); }

    private void start() {
        db = Database.open("jdbc:h2:mem:w" + UUID.randomUUID().toString().replace("-", "")
                + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;DB_CLOSE_DELAY=-1");
        Clock clock = Clock.systemUTC();
        // the derivation App wires: a change derives again only what it touches
        store = Store.on(db.dataSource(), new com.baysheet.framing.Rederivation()::derive, clock);
        demo = Demo.loadIfEmpty(store);
        office = TestLogin.office(store, db, clock);
        app = office.server(null, false).start("127.0.0.1", 0);
        engineer = TestLogin.as(app, office, "tess", Role.ENGINEER);
    }

    /** The demo's office building, the project most page tests work on. */
    Project alder() { return demo.get(0); }

    long alderId() { return alder().id(); }

    /** The office building's calculated results, as its pages read them. */
    Results.Computed alderResults() { return store.results().of(alderId()); }

    Project deck() { return demo.get(1); }

    long version(long projectId) { return store.projects().find(projectId).version(); }

    /** The id of the project's level of this name. */
    long levelId(long projectId, String name) {
        return store.levels().findByProject(projectId).stream().filter(l -> l.name().equals(name))
                .findFirst().map(com.baysheet.project.StoredLevel::id).orElseThrow();
    }

    /** A page under one of a project's levels, the level given by name: {@code "/projects/1/levels/3/" + page}. */
    String levelPage(long projectId, String level, String page) {
        return "/projects/" + projectId + "/levels/" + levelId(projectId, level) + "/" + page;
    }

    /** A model form's fields led by the project's current version, as every model form sends them; open to more. */
    @SafeVarargs
    final List<Map.Entry<String, String>> versioned(long projectId, Map.Entry<String, String>... fields) {
        List<Map.Entry<String, String>> f = new ArrayList<>();
        f.add(Map.entry("version", String.valueOf(version(projectId))));
        f.addAll(List.of(fields));
        return f;
    }

    HttpResponse<String> get(String path) {
        return engineer.get(path);
    }

    /** Posts a form; pairs keep their order and may repeat a name (checkboxes). */
    HttpResponse<String> post(String path, List<Map.Entry<String, String>> fields) {
        return engineer.post(path, fields);
    }

    HttpResponse<String> json(String method, String path, String json) {
        return engineer.json(method, path, json);
    }

    /** The server's address, for a request the helpers here do not build (a multipart upload). */
    String base() { return "http://127.0.0.1:" + app.port(); }

    @Override
    public void close() {
        app.stop();
        db.close();
    }
}
