package com.baysheet.e2e;

import com.baysheet.auth.Role;
import com.baysheet.web.auth.Access;
import com.baysheet.web.auth.AccessRefused.Why;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.net.URLEncoder;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every route the server declares, requested from the shipped jar ({@code java -jar target/baysheet.jar --demo})
 * by each role and by nobody logged in, with every path parameter filled from the demo's own ids. Tests that
 * run from target/classes cannot see a file the jar leaves out (a template, a migration, a static file); this
 * one can. What each request must answer follows the roles the route declares, by the one rule of {@link Access#decide}:
 * <ul>
 *   <li>allowed reads (GET) render: 2xx (a read that redirects within the office is judged by the page it points
 *   to), and an HTML page carries the caution and no unresolved template text;</li>
 *   <li>allowed changes sent with the form token but without their fields are refused as input: 4xx;</li>
 *   <li>a role kept out gets 403; nobody logged in is sent to the login page (a GET) or gets 401;</li>
 *   <li>never a 5xx.</li>
 * </ul>
 */
class JarRoutesIT {
    /** Routes whose whole input is the form token: an empty post is a valid one, and is answered as done (303). */
    private static final Set<String> TAKE_NO_FIELDS = Set.of("POST /logout", "POST /admin/users/{user}/unlock");
    /** Thymeleaf that was not processed: an expression, a th: attribute, inlining, or a missing message. */
    private static final Pattern UNRESOLVED = Pattern.compile("[$*#@~]\\{|\\sth:[a-z-]+=|\\[\\[|\\[\\(|\\?\\?[\\w.-]+\\?\\?");
    private static final String CAUTION = "licensed engineer";

    @TempDir
    static Path dir;
    static DemoOffice office;
    static OfficeClient anonymous;

    @BeforeAll
    static void start() throws Exception {
        office = DemoOffice.start(dir.resolve("data")).withIds();
    }

    @AfterAll
    static void stop() throws Exception {
        if (office != null) office.close();
    }

    @Test
    void everyDeclaredRouteAnswersEveryRoleFromTheShippedJar() {
        List<RouteTable.Route> table = RouteTable.all();
        assertThat(table).as("the route table").hasSizeGreaterThan(50);
        assertThat(UNRESOLVED.matcher(readTemplate()).find()).as("the check for unprocessed template text finds it in a template").isTrue();
        List<String> faults = new ArrayList<>();
        Map<String, Set<RouteTable.Route>> requested = new LinkedHashMap<>();
        for (Role role : Role.values()) {
            Set<RouteTable.Route> done = requested.computeIfAbsent(role.label(), k -> new LinkedHashSet<>());
            // logging out ends the session: those routes come last, then the role logs in again
            for (RouteTable.Route r : table)
                if (!TAKE_NO_FIELDS.contains(r.toString()) && check(role, r, faults)) done.add(r);
            for (RouteTable.Route r : table)
                if (TAKE_NO_FIELDS.contains(r.toString()) && check(role, r, faults)) done.add(r);
            office.logInAgain(role);
        }
        anonymous = new OfficeClient(office.server.base());
        anonymous.get("/login"); // a visitor's form cookie and token, as a browser has from the login page
        Set<RouteTable.Route> byNobody = requested.computeIfAbsent("nobody", k -> new LinkedHashSet<>());
        for (RouteTable.Route r : table) if (check(null, r, faults)) byNobody.add(r);

        System.out.printf("jar routes: %d routes in the route table; requested %s; %d faults%n", table.size(),
                requested.entrySet().stream().map(e -> e.getValue().size() + " as " + e.getKey()).toList(), faults.size());
        assertThat(faults).as("answers from target/baysheet.jar that break the rules (server log: %s)", office.server.log)
                .isEmpty();
        requested.forEach((who, routes) -> assertThat(routes).as("routes requested as " + who)
                .hasSameSizeAs(table).containsExactlyInAnyOrderElementsOf(table));
    }

    /**
     * One request of one route, as this role (null: nobody logged in); what is wrong with the answer goes to
     * faults. False when the route could not be requested (a path parameter without a demo id).
     */
    private static boolean check(Role role, RouteTable.Route route, List<String> faults) {
        OfficeClient c = role == null ? anonymous : office.client(role);
        String path = fill(route.path(), faults);
        if (path == null) return false;
        HttpResponse<String> r = send(c, route, path);
        String shown = path;
        // a read that only points elsewhere in the office (/ to the projects) is judged by the page it points to
        if (route.reads() && (r.statusCode() == 302 || r.statusCode() == 303) && role != null
                && decide(route, role) == null && location(r).startsWith("/")) {
            shown = path + " -> " + location(r);
            r = c.get(location(r));
        }
        int s = r.statusCode();
        String who = role == null ? "nobody" : role.label();
        String problem = problem(route, path, role, r);
        if (problem != null)
            faults.add(who + ": " + route.method() + " " + shown + " answered " + s + ": " + problem + " | "
                    + abbreviated(r.body()));
        return true;
    }

    private static String problem(RouteTable.Route route, String path, Role role, HttpResponse<String> r) {
        int s = r.statusCode();
        if (s >= 500) return "a fault";
        String type = r.headers().firstValue("Content-Type").orElse("");
        if (type.startsWith("text/html")) {
            Matcher m = UNRESOLVED.matcher(r.body());
            if (m.find()) return "unresolved template text \"" + around(r.body(), m.start()) + "\"";
        }
        Why d = decide(route, role);
        boolean read = route.reads();
        if (d == null) {
            if (TAKE_NO_FIELDS.contains(route.toString())) return s == 303 ? null : "expected 303 for a request it takes as it is";
            if (read && (s < 200 || s > 299)) return "expected 2xx: an allowed page or read must render";
            if (read && type.startsWith("text/html") && !r.body().contains(CAUTION)) return "the page has no caution";
            if (!read && (s < 400 || s > 499)) return "expected 4xx for a change without its fields";
            return null;
        }
        return switch (d) {
            case FORBIDDEN -> s == 403 ? null : "expected 403 for this role";
            case LOGIN -> (read && !path.startsWith("/api/") ? s == 303 && location(r).startsWith("/login") : s == 401)
                    ? null : "expected to be sent to log in";
            case SET_UP -> "set-up is done; nothing should ask for it";
            case FORM_TOKEN, CHANGE_PASSWORD -> "the demo's people have their own passwords and send the form token";
            case TOKEN -> "no API token is sent here; the roles alone never refuse one";
        };
    }

    /** Why the route's declared roles keep this role out (null: nobody signed in), or null when they let it in. */
    private static Why decide(RouteTable.Route route, Role role) {
        return Access.decide(route.roles(), role, false, true).orElse(null);
    }

    /** A read as it is; a change with the form token but no fields (an empty form, or no JSON body under /api). */
    private static HttpResponse<String> send(OfficeClient c, RouteTable.Route route, String path) {
        if (route.reads()) return c.get(path);
        if (path.startsWith("/api/")) return c.json(route.method(), path, null);
        return c.form(path, Map.of());
    }

    /** The route's path with each parameter replaced by the demo's id for it; null (and a fault) for one it has none for. */
    private static String fill(String template, List<String> faults) {
        String path = template;
        for (String name : RouteTable.Route.parameters(template)) {
            String id = office.ids.get(name);
            if (id == null) {
                faults.add(template + ": no demo id for path parameter {" + name + "}; add one to DemoOffice");
                return null;
            }
            path = path.replace("{" + name + "}", URLEncoder.encode(id, StandardCharsets.UTF_8).replace("+", "%20"));
        }
        return path;
    }

    private static String readTemplate() {
        try {
            return Files.readString(Path.of("templates", "review", "package.html"));
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static String location(HttpResponse<String> r) { return r.headers().firstValue("Location").orElse(""); }

    private static String around(String body, int at) {
        return body.substring(Math.max(0, at - 40), Math.min(body.length(), at + 40)).replace('\n', ' ');
    }

    private static String abbreviated(String s) {
        String one = s.replaceAll("\\s+", " ");
        return one.length() > 200 ? one.substring(0, 200) + "..." : one;
    }
}
