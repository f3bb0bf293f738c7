package com.baysheet.e2e;

import com.baysheet.auth.Role;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.io.IOException;
import java.net.http.HttpResponse;
import java.nio.file.Path;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * The shipped jar over the demo, set up as an office would be on its first day: the administrator through
 * the one-time set-up page (with the code the server printed in its console), an engineer and a checker added on the users page, each logged in with a
 * client of their own. Then one sheet goes through the check (submitted, marked up, resolved, approved,
 * issued) and a package is rendered, so that every kind of id a route takes exists: {@link #ids} holds one
 * value for each path parameter, read from the demo's own pages and API.
 */
final class DemoOffice implements AutoCloseable {
    static final String PASSWORD = "walk every route 31";
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final long PACKAGE_WAIT_MS = 180_000;

    final ChildServer server;
    final Map<Role, OfficeClient> clients = new EnumMap<>(Role.class);
    final Map<Role, String> usernames = Map.of(Role.ADMINISTRATOR, "admin", Role.ENGINEER, "erin", Role.CHECKER, "chris");
    /** Path parameter name to the value that fills it. */
    final Map<String, String> ids = new LinkedHashMap<>();

    private DemoOffice(ChildServer server) {
        this.server = server;
    }

    /** The jar over the demo on this (new) data directory, with the three users set up and logged in. */
    static DemoOffice start(Path data) throws Exception {
        DemoOffice o = new DemoOffice(ChildServer.start(data, true));
        o.setUp(o::setUpUsers);
        return o;
    }

    /** And one id for every path parameter, making the sheet, markup, revision and package that carry them. */
    DemoOffice withIds() throws Exception {
        setUp(this::collectIds);
        return this;
    }

    /** The id of the first demo project, as the API lists them. */
    long project() throws IOException {
        return Long.parseLong(first(client(Role.ENGINEER), "/api/projects", "id"));
    }

    private void setUp(Step step) throws Exception {
        try {
            step.run();
        } catch (Exception | AssertionError e) {
            close();
            throw new IllegalStateException("setting up the demo office failed; server log:\n" + server.logText(), e);
        }
    }

    private interface Step {
        void run() throws Exception;
    }

    OfficeClient client(Role role) { return clients.get(role); }

    /** Logs this role in again (after a route that ends the session, such as logging out). */
    void logInAgain(Role role) {
        clients.put(role, new OfficeClient(server.base()).logIn(usernames.get(role), PASSWORD));
    }

    private void setUpUsers() throws InterruptedException {
        OfficeClient admin = new OfficeClient(server.base()).setUp(usernames.get(Role.ADMINISTRATOR), PASSWORD, server.setupCode());
        admin.addUser(usernames.get(Role.ENGINEER), "engineer", PASSWORD);
        admin.addUser(usernames.get(Role.CHECKER), "checker", PASSWORD);
        clients.put(Role.ADMINISTRATOR, admin);
        logInAgain(Role.ENGINEER);
        logInAgain(Role.CHECKER);
    }

    private void collectIds() throws Exception {
        OfficeClient eng = client(Role.ENGINEER);
        OfficeClient chk = client(Role.CHECKER);
        String project = first(eng, "/api/projects", "id");
        ids.put("project", project);
        String p = "/projects/" + project;
        // one level with a load of each kind, so that a load's pages under its level (its delete confirmation) render:
        // the first level with a line load, given a point load in a bay where it has none
        String level = levelWith(eng, "/api" + p, "line-loads");
        ids.put("level", level);
        String loads = "/api" + p + "/levels/" + level;
        ids.put("lineLoad", first(eng, loads + "/line-loads", "id"));
        ids.put("occupancy", first(eng, "/api/occupancies", "id"));
        if (JSON.readTree(OfficeClient.expect(eng.get(loads + "/point-loads"), 200).body()).isEmpty()) {
            long version = JSON.readTree(OfficeClient.expect(eng.get("/api" + p), 200).body()).path("project").path("version").asLong();
            OfficeClient.expect(eng.json("POST", loads + "/point-loads", "{\"version\": " + version + ", \"label\": \"Route walk unit\", "
                    + "\"xLine\": \"1\", \"yLine\": \"A\", \"x\": 5, \"y\": 5, \"dead\": 500, \"live\": 0}"), 201);
        }
        ids.put("pointLoad", first(eng, loads + "/point-loads", "id"));
        String member = first(eng, "/api" + p + "/members", "id");
        ids.put("member", member);
        ids.put("stack", first(eng, "/api" + p + "/takedowns", "id"));
        ids.put("package", find(eng.get("/review" + p).body(), "/review" + p + "/packages/([A-Za-z0-9_.~-]+)\"", "package"));
        // the stylesheet, which every page links
        ids.put("name", "baysheet.css");
        // the demo keeps no deleted item: an id that names none, so restoring it is answered 404 (a 4xx, never a fault)
        ids.put("item", "999999");
        ids.put("user", find(client(Role.ADMINISTRATOR).get("/admin/users").body(),
                "<td>" + usernames.get(Role.ADMINISTRATOR) + "</td>.*?/admin/users/(\\d+)/role", "the administrator's user id"));

        // one mark sheet through the whole check: submitted, marked up, resolved, approved and issued (the member's
        // old sheet address leads to the sheet of the mark it carries)
        String mark = markOf(eng, "/review" + p + "/members/" + member);
        ids.put("mark", mark);
        String sheet = "/review" + p + "/marks/" + mark;
        act(eng, sheet, "submit");
        HttpResponse<String> added = OfficeClient.expect(chk.form(sheet + "/markups",
                Map.of("target", "sheet", "text", "Walking every route: a markup to resolve.")), 303);
        String markup = find(added.headers().firstValue("Location").orElse(""), "#markup-(\\d+)", "markup id");
        ids.put("markup", markup);
        String page = chk.get(sheet).body();
        OfficeClient.expect(chk.form(sheet + "/markups/" + markup + "/resolve", Map.of("version",
                formVersion(page, sheet + "/markups/" + markup + "/resolve"))), 303);
        act(chk, sheet, "approve");
        act(chk, sheet, "issue");
        ids.put("revision", find(chk.get(sheet).body(), "/review/revisions/(\\d+)/issued\\.pdf", "issued revision"));

        // a package rendered to the end, so that its progress page and its file exist: the form's last scope,
        // one level (quicker than the whole project's)
        Matcher scopes = Pattern.compile("name=\"scope\" value=\"([^\"]+)\"").matcher(eng.get(p + "/packages").body());
        String scope = "project";
        while (scopes.find()) scope = scopes.group(1);
        HttpResponse<String> started = OfficeClient.expect(eng.form(p + "/packages", Map.of("scope", scope)), 303);
        String job = find(started.headers().firstValue("Location").orElse(""), "/packages/([^/?#]+)$", "package job");
        ids.put("job", job);
        awaitPackage(eng, p + "/packages/" + job + "?format=json");
    }

    /** Posts a lifecycle action with the sheet version its page shows, as the button does (an issue says what it changes). */
    private static void act(OfficeClient c, String sheet, String action) {
        String page = c.get(sheet).body();
        String version = formVersion(page, sheet + "/" + action);
        OfficeClient.expect(c.form(sheet + "/" + action, action.equals("issue")
                ? Map.of("version", version, "description", "First issue") : Map.of("version", version)), 303);
    }

    /** The id of the mark a member carries, from where its old sheet address leads. */
    static String markOf(OfficeClient c, String memberSheet) {
        HttpResponse<String> r = OfficeClient.expect(c.get(memberSheet), 303);
        return find(r.headers().firstValue("Location").orElse(""), "/marks/(\\d+)$", "mark of " + memberSheet);
    }

    /** The hidden version field of the form posting to this action (after the form token the page adds). */
    private static String formVersion(String page, String action) {
        return find(page, "action=\"" + Pattern.quote(action) + "\"[^>]*>(?:\\s*<input[^>]*>)*?"
                + "\\s*<input type=\"hidden\" name=\"version\" value=\"(\\d+)\"", "version of the form " + action);
    }

    private static void awaitPackage(OfficeClient c, String progress) throws Exception {
        long deadline = System.currentTimeMillis() + PACKAGE_WAIT_MS;
        while (System.currentTimeMillis() < deadline) {
            JsonNode s = JSON.readTree(OfficeClient.expect(c.get(progress), 200).body());
            if (!s.path("error").asText().isEmpty()) throw new IllegalStateException("package failed: " + s);
            if (s.path("finished").asBoolean()) return;
            Thread.sleep(250);
        }
        throw new IllegalStateException("the package was not rendered within " + PACKAGE_WAIT_MS + " ms");
    }

    /** A field of the first element of the JSON list at this path. */
    /** The demo's first line load (or point load: {@code kind}), on whichever level carries one. */
    /** The id of the project's first level that holds a load of this kind. */
    private static String levelWith(OfficeClient c, String project, String kind) throws IOException {
        for (JsonNode level : JSON.readTree(OfficeClient.expect(c.get(project + "/levels"), 200).body())) {
            JsonNode loads = JSON.readTree(OfficeClient.expect(c.get(project + "/levels/" + level.path("id").asText() + "/" + kind), 200).body());
            if (!loads.isEmpty()) return level.path("id").asText();
        }
        throw new IllegalStateException(project + " has no " + kind + " in the demo");
    }

    static String first(OfficeClient c, String path, String field) throws IOException {
        JsonNode list = JSON.readTree(OfficeClient.expect(c.get(path), 200).body());
        if (!list.isArray() || list.isEmpty()) throw new IllegalStateException(path + " lists nothing in the demo");
        return list.get(0).path(field).asText();
    }

    private static String find(String text, String regex, String what) {
        Matcher m = Pattern.compile(regex, Pattern.DOTALL).matcher(text);
        if (!m.find()) {
            Path copy = Path.of("target", "e2e-screenshots", "demo-office-" + what.replaceAll("[^A-Za-z0-9]+", "-") + ".txt");
            try {
                java.nio.file.Files.createDirectories(copy.getParent());
                java.nio.file.Files.writeString(copy, text);
            } catch (IOException e) {
                // the message below still says what was looked for
            }
            throw new IllegalStateException("no " + what + " found (" + regex + "); the text searched is in " + copy);
        }
        return m.group(1);
    }

    @Override
    public void close() throws InterruptedException {
        server.close();
    }
}
