package com.baysheet.e2e;

import com.baysheet.auth.Role;
import net.jqwik.api.Arbitrary;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.Provide;
import net.jqwik.api.statistics.Statistics;
import net.jqwik.api.constraints.IntRange;
import net.jqwik.api.lifecycle.AfterContainer;
import net.jqwik.api.lifecycle.BeforeContainer;

import java.net.URLEncoder;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every form and API endpoint of the shipped jar (over the demo, as a process of its own) fed random and
 * extreme values (200 tries a group): the server never answers with a 5xx, and a refused request leaves the
 * project, its bays, the projects, the firm occupancies, users and firm settings exactly as they were
 * (compared through the API and the admin pages).
 */
class HostileInputPropertiesIT {
    static DemoOffice office;
    static OfficeClient engineer;
    static OfficeClient admin;
    static OfficeClient anonymous;
    static long project;
    static String level;
    static String member;
    static String mark;

    @BeforeContainer
    static void start() throws Exception {
        // jqwik has no @TempDir: the data directory goes under target/, as the crash test's does
        Path data = Files.createDirectories(Path.of("target", "e2e-data", "hostile-" + System.currentTimeMillis())).resolve("data");
        office = DemoOffice.start(data);
        engineer = office.client(Role.ENGINEER);
        admin = office.client(Role.ADMINISTRATOR);
        anonymous = new OfficeClient(office.server.base());
        anonymous.get("/login");
        project = office.project();
        level = DemoOffice.first(engineer, "/api/projects/" + project + "/levels", "id");
        member = DemoOffice.first(engineer, "/api/projects/" + project + "/members", "id");
        mark = DemoOffice.markOf(engineer, "/review/projects/" + project + "/members/" + member);
    }

    @AfterContainer
    static void stop() throws Exception {
        if (office != null) office.close();
    }

    // ---- the page forms ----

    /** A form: its path, and each field with a value the form accepts ("VERSION" for the project's version). */
    record FormCase(String name, OfficeClient who, String path, Map<String, String> valid) {}

    static List<FormCase> forms() {
        String p = "/projects/" + project;
        String l = p + "/levels/" + level;
        return List.of(
                new FormCase("new project", engineer, "/projects", fields("jobNumber", "F-1", "name", "Fuzz", "address", "",
                        "client", "", "edition", "ASCE 7-16", "units", "US", "partitionAllowance", "on")),
                new FormCase("settings", engineer, p + "/settings", fields("version", "VERSION", "jobNumber", "24-058",
                        "name", "Alder", "address", "", "client", "", "edition", "ASCE 7-16", "units", "US")),
                new FormCase("grid", engineer, p + "/grid", fields("version", "VERSION", "x.names", "1 2 3 4 5",
                        "x.spacings", "30 30 30 30", "y.names", "A B C D", "y.spacings", "25 25 25")),
                new FormCase("new level", engineer, p + "/levels", fields("version", "VERSION", "name", "Fuzz level",
                        "elevation", "140", "roof", "", "roofSlope", "")),
                new FormCase("edit level", engineer, l, fields("version", "VERSION", "name", "Level 1", "elevation", "0",
                        "roofSlope", "")),
                new FormCase("remove level", engineer, l + "/delete", fields("version", "-1", "confirm", "yes")),
                new FormCase("bays", engineer, l + "/bays", fields("version", "VERSION", "cells", "0,0", "action", "assign",
                        "occupancy", "office", "deadLoad", "60", "beams", "Y", "infillBeams", "2", "cantilevers.south", "",
                        "cantileverOccupancy", "")),
                new FormCase("firm occupancy", engineer, "/occupancies", fields("id", "fuzz-room", "name", "Fuzz room",
                        "units", "US", "uniform", "50", "concentrated", "0", "contactSide", "30", "rule", "ORDINARY")),
                new FormCase("markup", engineer, "/review/projects/" + project + "/marks/" + mark + "/markups",
                        fields("target", "sheet", "text", "Check this")),
                new FormCase("sheet action", engineer, "/review/projects/" + project + "/marks/" + mark + "/return",
                        fields("version", "0")),
                new FormCase("login", anonymous, "/login", fields("username", "nobody", "password", "wrong password", "next", "/projects")),
                new FormCase("one-time code", anonymous, "/account/reset", fields("username", "nobody", "code", "AAAA-BBBB",
                        "newPassword", "a long enough password", "confirmPassword", "a long enough password")),
                new FormCase("password", engineer, "/account/password", fields("currentPassword", "x",
                        "newPassword", "y", "confirmPassword", "z")),
                new FormCase("add user", admin, "/admin/users", fields("username", "fuzzuser", "fullName", "Fuzz User",
                        "initials", "FU", "role", "engineer")),
                new FormCase("user role", admin, "/admin/users/999999/role", fields("role", "checker")),
                new FormCase("firm settings", admin, "/admin/firm", fields("firmName", "Firm", "logoText", "F",
                        "defaultEdition", "ASCE 7-16", "version", "-1")),
                new FormCase("API token", engineer, "/account/tokens", fields("name", "fuzz script")),
                new FormCase("API token revoke", engineer, "/account/tokens/revoke", fields("token", "999999")));
    }

    @Property(tries = 200)
    void formsRefuseHostileValuesWithoutFaultOrChange(@ForAll @IntRange(min = 0, max = 17) int which,
                                                      @ForAll("hostileFields") List<String> hostile, @ForAll int mask) {
        FormCase f = forms().get(which);
        Snapshot before = Snapshot.take();
        List<Map.Entry<String, String>> sent = new ArrayList<>();
        int i = 0;
        for (Map.Entry<String, String> e : f.valid().entrySet()) {
            boolean bad = (mask >> (i % 31) & 1) == 1;
            String v = bad ? hostile.get(i % hostile.size()) : e.getValue().replace("VERSION", String.valueOf(before.version));
            sent.add(Map.entry(e.getKey(), v));
            i++;
        }
        HttpResponse<String> r;
        try {
            r = f.who().post(f.path(), sent);
        } catch (java.io.UncheckedIOException closed) {
            // a body past the server's request-size limit is refused before it is read: the server answers 413 and
            // closes, and a client still sending may see only the closed connection. That is a refusal too.
            assertThat(encodedLength(sent)).as(f.name() + ": connection closed on a body under the limit").isGreaterThan(REQUEST_LIMIT);
            assertThat(Snapshot.take()).as(f.name() + " was refused (closed) but changed data").isEqualTo(before);
            return;
        }
        check(f.name(), r, before);
    }

    /** The server's request-size limit (Server: cfg.http.maxRequestSize). */
    private static final long REQUEST_LIMIT = 1_000_000L;

    /** At least the length of the urlencoded form (encoding only lengthens). */
    private static long encodedLength(List<Map.Entry<String, String>> form) {
        long n = 0;
        for (Map.Entry<String, String> e : form) n += e.getKey().length() + e.getValue().getBytes(java.nio.charset.StandardCharsets.UTF_8).length + 2;
        return n;
    }

    // ---- the JSON API ----

    record ApiCase(String name, String method, String path, Map<String, String> valid) {}

    static List<ApiCase> apis() {
        String p = "/api/projects/" + project;
        String l = p + "/levels/" + level;
        return List.of(
                new ApiCase("create project", "POST", "/api/projects", fields("jobNumber", "\"F-2\"", "name", "\"Fuzz\"",
                        "units", "\"US\"", "edition", "\"ASCE 7-16\"", "partitionAllowance", "true", "reducePartitions", "false")),
                new ApiCase("update project", "PUT", p, fields("version", "VERSION", "jobNumber", "\"24-058\"", "name", "\"Alder\"",
                        "units", "\"US\"")),
                new ApiCase("grid", "PUT", p + "/grid", fields("version", "VERSION",
                        "x", "{\"names\": [\"1\", \"2\", \"3\", \"4\", \"5\"], \"spacings\": [30, 30, 30, 30]}",
                        "y", "{\"names\": [\"A\", \"B\", \"C\", \"D\"], \"spacings\": [25, 25, 25]}")),
                new ApiCase("create level", "POST", p + "/levels", fields("version", "VERSION", "name", "\"Fuzz API level\"",
                        "elevation", "150", "roof", "false", "roofSlope", "null")),
                new ApiCase("update level", "PUT", l, fields("version", "VERSION", "name", "\"Level 1\"", "elevation", "0")),
                new ApiCase("assign bays", "POST", l + "/bays", fields("version", "VERSION", "cells", "[[0,0]]",
                        "occupancy", "\"office\"", "deadLoad", "60", "beams", "\"Y\"", "infillBeams", "2",
                        "cantilevers", "{\"south\": 0}", "cantileverOccupancy", "null")),
                new ApiCase("clear bays", "POST", l + "/bays/clear", fields("version", "-1", "cells", "[[0,0]]")),
                new ApiCase("firm occupancy", "POST", "/api/occupancies", fields("id", "\"fuzz-api-room\"", "name", "\"Fuzz\"",
                        "units", "\"US\"", "uniform", "50", "concentrated", "0", "contactSide", "30", "rule", "\"ORDINARY\"",
                        "assembly", "false")));
    }

    @Property(tries = 200)
    void apiRefusesHostileValuesWithoutFaultOrChange(@ForAll @IntRange(min = 0, max = 7) int which,
                                                     @ForAll("hostileJson") List<String> hostile, @ForAll int mask,
                                                     @ForAll @IntRange(min = 0, max = 9) int shape) {
        ApiCase a = apis().get(which);
        Snapshot before = Snapshot.take();
        String body;
        if (shape == 0) {
            body = hostile.get(0).startsWith("\"") ? hostile.get(0).substring(1, Math.max(1, hostile.get(0).length() - 1)) : hostile.get(0);
        } else {
            StringBuilder b = new StringBuilder("{");
            int i = 0;
            for (Map.Entry<String, String> e : a.valid().entrySet()) {
                boolean bad = (mask >> (i % 31) & 1) == 1;
                String v = bad ? hostile.get(i % hostile.size()) : e.getValue().replace("VERSION", String.valueOf(before.version));
                b.append(i == 0 ? "" : ", ").append('"').append(e.getKey()).append("\": ").append(v);
                i++;
            }
            body = b.append('}').toString();
        }
        check(a.name(), engineer.json(a.method(), a.path(), body), before);
    }

    @Property(tries = 200)
    void hostilePathsAndQueriesNeverFault(@ForAll @IntRange(min = 0, max = 11) int which, @ForAll("hostileText") String h) {
        String e = URLEncoder.encode(h.length() > 2000 ? h.substring(0, 2000) : h, StandardCharsets.UTF_8);
        String p = "/projects/" + project;
        String sheet = "/review/projects/" + project + "/marks/" + mark;
        String path = List.of("/projects/" + e, p + "/members/" + e, p + "/members?level=" + e + "&role=" + e + "&kind=" + e,
                "/api/projects/" + project + "/members/" + e + "/record", p + "/takedowns/" + e, p + "/plan?level=" + e,
                sheet + "/compare?from=" + e + "&to=" + e, "/review/revisions/" + e + "/issued.pdf", "/admin/audit?page=" + e,
                "/api/projects/" + project + "/levels/" + level + "?version=" + e, "/review/projects/" + e,
                "/api/projects/" + project + "/takedowns/" + e).get(which);
        Snapshot before = Snapshot.take();
        HttpResponse<String> r = which == 9 ? engineer.json("DELETE", path, null) : (which == 8 ? admin : engineer).get(path);
        check(path, r, before);
    }

    // ---- helpers ----

    @Provide
    Arbitrary<List<String>> hostileFields() { return Hostile.text().list().ofMinSize(1).ofMaxSize(8); }

    @Provide
    Arbitrary<List<String>> hostileJson() { return Hostile.jsonValue().list().ofMinSize(1).ofMaxSize(8); }

    @Provide
    Arbitrary<String> hostileText() { return Hostile.text(); }

    static void check(String what, HttpResponse<String> r, Snapshot before) {
        Statistics.label("status").collect(r.statusCode());
        assertThat(r.statusCode()).as(what + " answered " + r.statusCode() + ": " + abbreviated(r.body())).isLessThan(500);
        if (r.statusCode() >= 400) assertThat(Snapshot.take()).as(what + " was refused (" + r.statusCode() + ") but changed data")
                .isEqualTo(before);
    }

    private static String abbreviated(String s) { return s.length() > 300 ? s.substring(0, 300) + "..." : s; }

    static Map<String, String> fields(String... pairs) {
        Map<String, String> m = new LinkedHashMap<>();
        for (int i = 0; i < pairs.length; i += 2) m.put(pairs[i], pairs[i + 1]);
        return m;
    }

    /** What a refused request must not change, read back as users see it. */
    record Snapshot(long version, String projectJson, String bays, String projects, String occupancies, String users, String firm) {
        static Snapshot take() {
            String p = engineer.get("/api/projects/" + HostileInputPropertiesIT.project).body();
            long version = Long.parseLong(p.replaceAll("(?s).*?\"version\" ?: ?(\\d+).*", "$1"));
            return new Snapshot(version, p, engineer.get("/api/projects/" + HostileInputPropertiesIT.project + "/levels/" + level + "/bays").body(),
                    engineer.get("/api/projects").body(), engineer.get("/api/occupancies").body(),
                    admin.get("/admin/users").body(), admin.get("/admin/firm").body());
        }
    }
}
