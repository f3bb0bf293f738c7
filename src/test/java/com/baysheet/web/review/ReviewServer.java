package com.baysheet.web.review;

import com.baysheet.store.Editor;

import com.baysheet.auth.Role;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.DerivedMember;
import com.baysheet.framing.model.Bay;
import com.baysheet.review.SheetRef;
import com.baysheet.review.store.TestClock;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;
import com.baysheet.store.Database;
import com.baysheet.store.Demo;
import com.baysheet.project.Project;
import com.baysheet.project.StoredLevel;
import com.baysheet.store.Store;
import com.baysheet.web.Office;
import com.baysheet.web.TestLogin;
import io.javalin.Javalin;
import org.junit.jupiter.api.extension.RegisterExtension;
import org.junit.jupiter.api.extension.AfterAllCallback;
import org.junit.jupiter.api.extension.BeforeAllCallback;
import org.junit.jupiter.api.extension.ExtensionContext;

import java.time.Instant;
import java.util.List;
import java.util.UUID;

/**
 * The office's own server ({@link Office}) on a random port, over a fresh H2 database with the demo loaded.
 * {@code new ReviewServer()} starts one at once; as a JUnit extension ({@code @RegisterExtension static final
 * ReviewServer server = ReviewServer.perClass();}) it starts before a class's first test and stops after its last.
 */
final class ReviewServer implements AutoCloseable, BeforeAllCallback, AfterAllCallback {
    Database db;
    Store store;
    List<Project> demo;
    final TestClock clock = new TestClock(Instant.now());
    Office office;
    Javalin app;

    ReviewServer() { start(); }

    private ReviewServer(boolean later) {}

    /** A server for one test class, started by JUnit. */
    static ReviewServer perClass() { return new ReviewServer(true); }

    @Override
    public void beforeAll(ExtensionContext c) { if (app == null) start(); }

    @Override
    public void afterAll(ExtensionContext c) { close(); }

    private void start() {
        db = Database.open("jdbc:h2:mem:v" + UUID.randomUUID().toString().replace("-", "")
                + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;DB_CLOSE_DELAY=-1");
        store = Store.on(db.dataSource(), Derivation::derive, clock);
        demo = Demo.loadIfEmpty(store);
        office = TestLogin.office(store, db, clock);
        app = office.server(null, false).start("127.0.0.1", 0);
    }

    TestLogin.Client as(String username, Role role) { return TestLogin.as(app, office, username, role); }

    long project() { return demo.get(0).id(); }

    /** A beam of the first demo project (its first derived member that is not a column). */
    DerivedMember member() {
        return store.results().of(project()).derived().members().stream()
                .filter(m -> !m.kind().name().contains("COLUMN")).findFirst().orElseThrow();
    }

    /** The mark the member carries now (its sheet is the unit of review). */
    com.baysheet.review.MarkSheets.MarkSheet mark() {
        var c = store.results().of(project());
        return store.marks().of(project(), c.derived()).ofMember(member().id()).orElseThrow();
    }

    SheetRef ref() { return mark().ref(project()); }

    String sheetPath() { return "/review/projects/" + project() + "/marks/" + mark().mark().id(); }

    /**
     * Adds this much dead load to every bay of the member's level: its inputs change. Bays alike are changed in one
     * save, as the bay editor does with several bays ticked.
     */
    void heavierFloor(double more) {
        long p = project();
        String level = member().level();
        StoredLevel l = store.levels().findByProject(p).stream().filter(x -> x.info().name().equals(level)).findFirst().orElseThrow();
        java.util.Map<List<Object>, List<Cell>> alike = new java.util.LinkedHashMap<>();
        for (Bay b : store.bays().findByLevel(p, l.id()))
            if (!b.opening())
                alike.computeIfAbsent(List.of(b.occupancy(), b.deadLoad(), b.framing(), b.cantilevers()), k -> new java.util.ArrayList<>())
                        .add(new Cell(b.col(), b.row()));
        for (var e : alike.entrySet()) {
            List<Object> k = e.getKey();
            @SuppressWarnings("unchecked")
            var cantilevers = (java.util.Map<com.baysheet.framing.model.Side, Double>) k.get(3);
            store.bays().assign(Editor.DEMO, p, store.projects().find(p).version(), l.id(), new BayAssignment(e.getValue(),
                    false, (String) k.get(0), (Double) k.get(1) + more, (com.baysheet.framing.model.Framing) k.get(2), cantilevers));
        }
    }

    @Override
    public void close() {
        app.stop();
        db.close();
    }
}
