package com.baysheet.web;

import com.baysheet.framing.Derivation;
import com.baysheet.store.Database;
import com.baysheet.store.Demo;
import com.baysheet.store.Project;
import com.baysheet.store.Store;
import io.javalin.Javalin;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.api.extension.AfterAllCallback;
import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

import java.io.IOException;
import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.util.List;
import java.util.Map;
import java.util.UUID;
import java.util.stream.Collectors;

/**
 * A real server on a random port over a fresh H2 memory database with the demo loaded, and a client for it.
 * {@code new TestServer()} starts one at once; as a JUnit extension ({@code @RegisterExtension static final
 * TestServer server = TestServer.perClass();}) it starts before a class's first test and stops after its last.
 */
final class TestServer implements AutoCloseable, BeforeAllCallback, AfterAllCallback {
    Database db;
    Store store;
    Javalin app;
    List<Project> demo;
    private final HttpClient client = HttpClient.newBuilder().followRedirects(HttpClient.Redirect.NEVER).build();

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
        store = Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC());
        demo = Demo.loadIfEmpty(store);
        app = Server.create(store).start("127.0.0.1", 0);
    }

    Project alder() { return demo.get(0); }

    Project deck() { return demo.get(1); }

    long version(long projectId) { return store.projects().find(projectId).version(); }

    /** The id of the project's level of this name. */
    long levelId(long projectId, String name) {
        return store.levels().findByProject(projectId).stream().filter(l -> l.name().equals(name))
                .findFirst().map(com.baysheet.store.StoredLevel::id).orElseThrow();
    }

    HttpResponse<String> get(String path) {
        return send(HttpRequest.newBuilder(uri(path)).GET().build());
    }

    /** Posts a form; pairs keep their order and may repeat a name (checkboxes). */
    HttpResponse<String> post(String path, List<Map.Entry<String, String>> fields) {
        String body = fields.stream().map(e -> enc(e.getKey()) + "=" + enc(e.getValue())).collect(Collectors.joining("&"));
        return send(HttpRequest.newBuilder(uri(path)).header("Content-Type", "application/x-www-form-urlencoded")
                .POST(HttpRequest.BodyPublishers.ofString(body)).build());
    }

    HttpResponse<String> json(String method, String path, String json) {
        return send(HttpRequest.newBuilder(uri(path)).header("Content-Type", "application/json")
                .method(method, json == null ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofString(json)).build());
    }

    /** The server's address, for a request the helpers here do not build (a multipart upload). */
    String base() { return "http://127.0.0.1:" + app.port(); }

    private URI uri(String path) { return URI.create("http://127.0.0.1:" + app.port() + path); }

    private HttpResponse<String> send(HttpRequest r) {
        try {
            return client.send(r, HttpResponse.BodyHandlers.ofString());
        } catch (IOException e) {
            throw new IllegalStateException(e);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new IllegalStateException(e);
        }
    }

    private static String enc(String s) { return URLEncoder.encode(s, StandardCharsets.UTF_8); }

    @Override
    public void close() {
        app.stop();
        db.close();
    }
}
