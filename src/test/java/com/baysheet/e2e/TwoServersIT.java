package com.baysheet.e2e;

import com.baysheet.web.Html;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.MethodOrderer;
import org.junit.jupiter.api.Order;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.TestInstance;
import org.junit.jupiter.api.TestMethodOrder;
import org.jsoup.nodes.Document;

import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.util.HexFormat;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Two shipped servers on one PostgreSQL database ({@link TwoServers}), as an office runs them behind a proxy: a save
 * on one is seen by the other at its next request (its derived results too, though each server caches them); 20
 * saves at once across both, each with the version it read, lose nothing and refuse every stale one with a 409
 * ({@link RacingSaves}); and a package job whose server stops holding its lease is taken up and finished by the
 * other once the lease runs out ({@value #LEASE_SECONDS} s here), the PDF downloaded from the survivor. The last
 * kills server A, so it runs last.
 */
@TestInstance(TestInstance.Lifecycle.PER_CLASS)
@TestMethodOrder(MethodOrderer.OrderAnnotation.class)
class TwoServersIT {
    static final int LEASE_SECONDS = 3;
    private static final ObjectMapper JSON = new ObjectMapper();

    private TwoServers office;

    @BeforeAll
    void start() throws Exception {
        String url = TwoServers.serverUrl();
        Path dir = Files.createDirectories(Path.of("target", "two-servers", "run-" + System.currentTimeMillis()));
        office = TwoServers.start(dir, url, List.of("-D" + "baysheet.packageLeaseSeconds=" + LEASE_SECONDS));
    }

    @AfterAll
    void stop() throws Exception {
        if (office != null) office.close();
    }

    @Test
    @Order(1)
    void aSaveOnOneServerIsSeenByTheOtherAtItsNextRequest() throws Exception {
        long project = projectByJob(office.engineerB, "24-058");
        String p = "/api/projects/" + project;
        // B derives the model and keeps it in its cache, keyed by the version it reads from the database
        String beforeOnB = OfficeClient.expect(office.engineerB.get(p + "/members"), 200).body();
        JsonNode model = JSON.readTree(OfficeClient.expect(office.engineerB.get(p), 200).body());
        long version = model.path("project").path("version").asLong();
        long level = model.path("levels").get(0).path("id").asLong();

        HttpResponse<String> saved = OfficeClient.expect(office.engineerA.json("POST", p + "/levels/" + level + "/point-loads",
                "{\"version\": " + version + ", \"label\": \"Seen on both servers\", \"xLine\": \"2\", \"yLine\": \"A\", "
                        + "\"x\": 5, \"y\": 4, \"dead\": 60, \"live\": 0}"), 201);
        assertThat(JSON.readTree(saved.body()).path("version").asLong()).isEqualTo(version + 1);

        JsonNode onB = JSON.readTree(OfficeClient.expect(office.engineerB.get(p), 200).body());
        assertThat(onB.path("project").path("version").asLong()).as("B reads the version A's save made").isEqualTo(version + 1);
        JsonNode loads = JSON.readTree(OfficeClient.expect(office.engineerB.get(p + "/levels/" + level + "/point-loads"), 200).body());
        assertThat(loads.findValuesAsText("label")).contains("Seen on both servers");
        String afterOnB = OfficeClient.expect(office.engineerB.get(p + "/members"), 200).body();
        String afterOnA = OfficeClient.expect(office.engineerA.get(p + "/members"), 200).body();
        assertThat(afterOnB).as("B's derived members after A's save (not its cached ones)").isNotEqualTo(beforeOnB)
                .isEqualTo(afterOnA);
        // and on a page: the level's point loads as B renders them
        String list = OfficeClient.expect(office.engineerB.get("/projects/" + project + "/levels/" + level + "/point-loads"), 200).body();
        assertThat(Html.texts(list, "td")).contains("Seen on both servers");
    }

    @Test
    @Order(2)
    void twentyConcurrentSavesAcrossBothLoseNothingAndRefuseEveryStaleOne() throws Exception {
        HttpResponse<String> made = OfficeClient.expect(office.engineerA.json("POST", "/api/projects",
                "{\"jobNumber\": \"TWO-RACE\", \"name\": \"Saved from two servers at once\", \"units\": \"US\"}"), 201);
        long project = JSON.readTree(made.body()).path("id").asLong();
        RacingSaves race = RacingSaves.run(project, office.engineerA, office.engineerB, 10);
        race.check(office.engineerB, office.adminB);
        System.out.printf("two servers: %d saves accepted, %d refused as stale (409), none otherwise%n",
                race.accepted().size(), race.refusedVersions().size());
    }

    @Test
    @Order(3)
    void aPackageWhoseServerStopsIsFinishedByTheOtherWhenTheLeaseRunsOut() throws Exception {
        long project = projectByJob(office.engineerA, "24-031"); // the demo's largest: four levels
        PackageTakeover.Outcome t = new PackageTakeover(office).run(project);
        String progress = "/projects/" + project + "/packages/" + t.job();
        assertThat(t.attempts()).as("claimed twice: by A, then by B").isEqualTo(2);

        JsonNode state = JSON.readTree(OfficeClient.expect(office.engineerB.get(progress + "?format=json"), 200).body());
        assertThat(state.path("finished").asBoolean()).isTrue();
        assertThat(state.path("cancelled").asBoolean()).isFalse();
        assertThat(state.path("error").asText()).isEmpty();
        assertThat(state.path("done").asInt()).isEqualTo(state.path("total").asInt()).isPositive();

        Document page = Html.parse(OfficeClient.expect(office.engineerB.get(progress), 200).body());
        assertThat(page.select("#package-state .error")).as("B's package page shows no failure").isEmpty();
        String href = page.selectFirst("#package-download").attr("href");
        String shown = page.selectFirst("#package-state code").text();
        HttpResponse<byte[]> pdf = office.engineerB.getBytes(href);
        assertThat(pdf.statusCode()).isEqualTo(200);
        assertThat(pdf.headers().firstValue("Content-Type").orElse("")).startsWith("application/pdf");
        assertThat(new String(pdf.body(), 0, 5, java.nio.charset.StandardCharsets.US_ASCII)).isEqualTo("%PDF-");
        String sha = HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(pdf.body()));
        assertThat(sha).as("the PDF B serves is the one whose hash B's page shows").isEqualTo(shown)
                .isEqualTo(pdf.headers().firstValue("X-Content-SHA256").orElse(""));
        System.out.printf("two servers: package job %s claimed by A (pid %d), A stopped holding its lease and killed, "
                + "claimed by B after the lease ran out (attempt %d) and finished, %d sheets, %d bytes%n",
                t.job(), office.a.process.pid(), t.attempts(), state.path("total").asInt(), pdf.body().length);
    }

    /** The id of the demo project of this job number, as the API lists it. */
    private static long projectByJob(OfficeClient c, String jobNumber) throws Exception {
        for (JsonNode p : JSON.readTree(OfficeClient.expect(c.get("/api/projects"), 200).body()))
            if (p.path("info").path("jobNumber").asText().equals(jobNumber)) return p.path("id").asLong();
        throw new IllegalStateException("the demo has no project " + jobNumber);
    }

}
