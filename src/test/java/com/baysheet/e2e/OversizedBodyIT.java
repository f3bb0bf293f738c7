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
        // the upload goes out whole while the server may already have answered and closed: a refusal shows as a
        // 4xx or, when the close wins the race, as the connection ended under the client; never as a fault, and
        // the server answers the next request as before
        int status;
        try {
            status = engineer.upload("/verify", "pdf", "huge.pdf", new byte[60 * 1024 * 1024]).statusCode();
        } catch (java.io.UncheckedIOException closedUnderTheClient) {
            status = 413;
        }
        assertThat(status).isBetween(400, 499);
        assertThat(engineer.get("/api/projects/" + project).statusCode()).isEqualTo(200);
    }

    @Test
    void aBodyDeclaredLargerThanAnyUploadIsRefusedUnread() throws Exception {
        // 80 MB declared, a few bytes sent: the server answers from the length alone, before reading the body
        try (java.net.Socket s = new java.net.Socket("127.0.0.1", office.server.port)) {
            s.setSoTimeout(10_000);
            var out = s.getOutputStream();
            out.write(("POST /verify HTTP/1.1\r\nHost: 127.0.0.1\r\nContent-Type: multipart/form-data; boundary=x\r\n"
                    + "Content-Length: " + (80L * 1024 * 1024) + "\r\n\r\n--x\r\n").getBytes(java.nio.charset.StandardCharsets.US_ASCII));
            out.flush();
            String status = new java.io.BufferedReader(new java.io.InputStreamReader(s.getInputStream(),
                    java.nio.charset.StandardCharsets.US_ASCII)).readLine();
            assertThat(status).startsWith("HTTP/1.1 413");
        }
    }
}
