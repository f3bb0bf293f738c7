package com.baysheet.web;

import com.baysheet.framing.Derivation;
import com.baysheet.store.Database;
import com.baysheet.store.Store;
import io.javalin.Javalin;
import org.junit.jupiter.api.Test;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.time.Clock;
import java.util.UUID;

import static org.assertj.core.api.Assertions.assertThat;

/** {@code /health} says whether the database answers, not only whether the process does. */
class HealthTest {
    static String memUrl() {
        return "jdbc:h2:mem:h" + UUID.randomUUID().toString().replace("-", "")
                + ";MODE=PostgreSQL;DATABASE_TO_LOWER=TRUE;DEFAULT_NULL_ORDERING=HIGH;DB_CLOSE_DELAY=-1";
    }

    private static int head(Javalin app) throws Exception {
        HttpRequest req = HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + app.port() + "/health"))
                .method("HEAD", HttpRequest.BodyPublishers.noBody()).build();
        return HttpClient.newHttpClient().send(req, HttpResponse.BodyHandlers.discarding()).statusCode();
    }

    @Test
    void upWhileTheDatabaseAnswersAnd503WithTheDatabaseDownOnceItsPoolIsClosed() throws Exception {
        Database db = Database.open(memUrl());
        Store store = Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC());
        Javalin app = TestLogin.office(store, db, Clock.systemUTC()).server(null, false).start("127.0.0.1", 0);
        try {
            TestLogin.Client anyone = TestLogin.anonymous(app);
            HttpResponse<String> up = anyone.get("/health");
            assertThat(up.statusCode()).isEqualTo(200);
            assertThat(JsonBody.of(up).path("status").asText()).isEqualTo("up");
            assertThat(JsonBody.of(up).path("database").asText()).isEqualTo("up");
            assertThat(head(app)).as("HEAD, as a monitor may ask").isEqualTo(200);
            db.close();
            HttpResponse<String> down = anyone.get("/health");
            assertThat(down.statusCode()).isEqualTo(503);
            assertThat(JsonBody.of(down).path("database").asText()).isEqualTo("down");
            assertThat(JsonBody.of(down).path("status").asText()).isEqualTo("down");
            assertThat(head(app)).isEqualTo(503);
        } finally {
            app.stop();
            db.close();
        }
    }
}
