package com.baysheet.e2e;

import com.baysheet.auth.Role;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Bodies far larger than any form or sheet, sent to the shipped jar over the demo: refused before they are
 * read whole (413), with nothing stored; bodies under the limit but larger than any real form are refused as
 * input, never as a fault.
 */
class OversizedBodyIT {
    @TempDir
    static Path dir;
    static DemoOffice office;
    static OfficeClient engineer;
    static long project;

    @BeforeAll
    static void start() throws Exception {
        office = DemoOffice.start(dir.resolve("data"));
        engineer = office.client(Role.ENGINEER);
        project = office.project();
    }

    @AfterAll
    static void stop() throws Exception {
        if (office != null) office.close();
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
