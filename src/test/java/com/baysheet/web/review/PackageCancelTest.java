package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.store.PackageJob;
import com.baysheet.store.PackageJobStore;
import com.baysheet.store.Sql;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin.Client;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.BooleanNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.time.Duration;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Cancelling a package from its page: the job here is running on another server (its lease held well past the
 * test's fixed clock, so this server's worker leaves it alone); after the cancel that server's next heartbeat
 * finds it no longer its own.
 */
class PackageCancelTest {
    private static final String ELSEWHERE = "another-server";

    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    /** A job running on another server, as its claim leaves it. */
    private static long runningElsewhere() throws SQLException {
        try (Connection c = server.db.dataSource().getConnection();
             PreparedStatement ps = c.prepareStatement("INSERT INTO package_job (project_id, level_name, title, file_name, "
                     + "requested_by, state, lease_owner, lease_until, heartbeat_at, attempts, done_count, total_count, created_at) "
                     + "VALUES (?, '', 'Project package', 'X-Project package-checking-copy.pdf', 'pia', 'running', ?, ?, ?, 1, 2, 9, ?)",
                     new String[] {"id"})) {
            OffsetDateTime now = OffsetDateTime.ofInstant(server.clock.instant(), ZoneOffset.UTC);
            ps.setLong(1, server.project());
            ps.setString(2, ELSEWHERE);
            ps.setObject(3, now.plusHours(1));
            ps.setObject(4, now);
            ps.setObject(5, now);
            ps.executeUpdate();
            try (var keys = ps.getGeneratedKeys()) {
                keys.next();
                return keys.getLong(1);
            }
        }
    }

    private static PackageJobStore jobs() { return new PackageJobStore(new Sql(server.db.dataSource(), server.clock)); }

    @Test
    void aRunningPackageIsCancelledFromItsPageAndItsServerStopsAtTheNextHeartbeat() throws Exception {
        Client eng = server.as("pia", Role.ENGINEER);
        long id = runningElsewhere();
        String page = "/projects/" + server.project() + "/packages/" + id;

        String before = eng.get(page).body();
        assertThat(Html.text(before, "#package-done")).isEqualTo("2");
        assertThat(Html.one(before, "form#package-cancel").attr("action")).isEqualTo(page + "/cancel");
        assertThat(Html.one(before, "form#package-cancel input[name=cancel]").val()).isEqualTo("yes");

        HttpResponse<String> cancelled = eng.post(page + "/cancel", List.of(Map.entry("cancel", "yes")));
        assertThat(cancelled.statusCode()).isEqualTo(303);
        assertThat(cancelled.headers().firstValue("Location")).hasValue(page);

        String after = eng.get(page).body();
        assertThat(Html.text(after, "#package-cancelled")).startsWith("Cancelled");
        assertThat(Html.all(after, "form#package-cancel")).as("no cancel button on a finished job").isEmpty();
        JsonNode state = Pages.jobState(eng, page);
        assertThat(state.path("finished")).isEqualTo(BooleanNode.TRUE);
        assertThat(state.path("cancelled")).isEqualTo(BooleanNode.TRUE);
        assertThat(jobs().find(server.project(), id).orElseThrow().state()).isEqualTo(PackageJob.State.CANCELLED);
        assertThat(jobs().heartbeat(id, ELSEWHERE, Duration.ofSeconds(60), 3, 9)).as("the other server is told to stop").isFalse();
        assertThat(eng.get(page + "/file").statusCode()).as("nothing to download").isEqualTo(404);

        HttpResponse<String> again = eng.post(page + "/cancel", List.of(Map.entry("cancel", "yes")));
        assertThat(again.statusCode()).isEqualTo(400);
        assertThat(Html.shown(again.body())).contains("cancel", "finished already");
    }

    @Test
    void aCancelWithoutSayingYesIsRefusedNamingTheFieldAndCancelsNothing() throws Exception {
        Client eng = server.as("quin", Role.ENGINEER);
        long id = runningElsewhere();
        String page = "/projects/" + server.project() + "/packages/" + id;
        HttpResponse<String> bare = eng.post(page + "/cancel", List.of());
        assertThat(bare.statusCode()).isEqualTo(400);
        assertThat(Html.shown(bare.body())).contains("cancel", "yes");
        assertThat(jobs().find(server.project(), id).orElseThrow().state()).isEqualTo(PackageJob.State.RUNNING);

        assertThat(eng.post("/projects/" + server.project() + "/packages/999999/cancel", List.of(Map.entry("cancel", "yes")))
                .statusCode()).isEqualTo(404);
        Client admin = server.as("adele", Role.ADMINISTRATOR);
        assertThat(admin.post(page + "/cancel", List.of(Map.entry("cancel", "yes"))).statusCode()).isEqualTo(403);
        assertThat(jobs().find(server.project(), id).orElseThrow().state()).isEqualTo(PackageJob.State.RUNNING);
        assertThat(jobs().cancel(server.project(), id)).isTrue(); // out of the office's queue for the other tests
    }
}
