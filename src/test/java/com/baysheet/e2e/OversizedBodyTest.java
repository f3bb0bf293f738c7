package com.baysheet.e2e;

import com.baysheet.auth.Role;
import com.baysheet.framing.Derivation;
import com.baysheet.store.Database;
import com.baysheet.store.Demo;
import com.baysheet.store.Store;
import com.baysheet.web.Server;
import com.baysheet.web.TestLogin;
import com.baysheet.web.review.Signoff;
import io.javalin.Javalin;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;

import java.net.http.HttpResponse;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import java.util.UUID;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Bodies far larger than any form or sheet: refused before they are read whole (413), with nothing
 * stored; bodies under the limit but larger than any real form are refused as input, never as a fault.
 */
class OversizedBodyTest {
    static Database db;
    static Javalin app;
    static TestLogin.Client engineer;
    static long project;

    @BeforeAll
    static void start() {
        db = Database.open("jdbc:h2:mem:big" + UUID.randomUUID().toString().replace("-", "")
                + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;DB_CLOSE_DELAY=-1");
        Store store = Store.on(db.dataSource(), Derivation::derive);
        project = Demo.loadIfEmpty(store).get(0).id();
        Signoff signoff = TestLogin.signoff(store, db, Clock.systemUTC());
        app = Server.create(store, signoff::install).start("127.0.0.1", 0);
        engineer = TestLogin.as(app, signoff, "erin", Role.ENGINEER);
    }

    @AfterAll
    static void stop() {
        app.stop();
        db.close();
    }

    @Test
    void aThreeMegabyteJsonBodyIsRefusedWithNothingStored() {
        String before = engineer.get("/api/projects").body();
        String body = "{\"jobNumber\": \"BIG\", \"name\": \"" + "x".repeat(3_000_000) + "\", \"units\": \"US\"}";
        HttpResponse<String> r = engineer.json("POST", "/api/projects", body);
        assertThat(r.statusCode()).isEqualTo(413);
        assertThat(engineer.get("/api/projects").body()).isEqualTo(before);
    }

    @Test
    void aThreeMegabyteFormIsRefusedWithNothingStored() {
        String before = engineer.get("/api/projects/" + project).body();
        HttpResponse<String> r = engineer.post("/projects/" + project + "/levels", List.of(Map.entry("version", "1"),
                Map.entry("name", "y".repeat(3_000_000)), Map.entry("elevation", "200")));
        assertThat(r.statusCode()).isEqualTo(413);
        assertThat(engineer.get("/api/projects/" + project).body()).isEqualTo(before);
    }

    @Test
    void formsOfHalfAMegabyteAreInputErrorsNotFaults() {
        String before = engineer.get("/api/projects/" + project).body();
        String big = "z".repeat(500_000);
        for (String path : List.of("/projects/" + project + "/levels", "/projects/" + project + "/settings",
                "/account/password", "/occupancies", "/projects")) {
            HttpResponse<String> r = engineer.post(path, List.of(Map.entry("name", big), Map.entry("newPassword", big)));
            assertThat(r.statusCode()).as(path + ": " + r.body().substring(0, Math.min(300, r.body().length())))
                    .isBetween(400, 499);
        }
        assertThat(engineer.get("/api/projects/" + project).body()).isEqualTo(before);
    }

    @Test
    void anUploadLargerThanAnySheetIsRefused() {
        HttpResponse<String> r = engineer.upload("/verify", "pdf", "huge.pdf", new byte[80 * 1024 * 1024]);
        assertThat(r.statusCode()).as(r.body().substring(0, Math.min(300, r.body().length()))).isBetween(400, 499);
    }
}
