package com.baysheet.web;

import com.baysheet.auth.Role;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import io.javalin.http.HandlerType;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import java.util.TreeSet;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The OpenAPI description the server serves lists every API route of its own router (read here from the router,
 * not from the description's code), each with a written summary, who may call it and its path parameters; it is
 * served to the office (a login or an API token), not to strangers.
 */
class ApiDescriptionTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    private static final ObjectMapper JSON = new ObjectMapper();
    private static final Set<HandlerType> METHODS = Set.of(HandlerType.GET, HandlerType.POST, HandlerType.PUT,
            HandlerType.PATCH, HandlerType.DELETE);

    /** "METHOD /path" of every route under /api, straight from the router. */
    private static Set<String> apiRoutes() {
        Set<String> out = new TreeSet<>();
        server.app.unsafe.internalRouter.allHttpHandlers().stream().map(p -> p.endpoint)
                .filter(e -> METHODS.contains(e.method) && e.path.startsWith("/api/"))
                .forEach(e -> out.add(e.method.name() + " " + e.path));
        return out;
    }

    @Test
    void theDocumentParsesAndListsEveryApiRouteWithASummary() throws Exception {
        HttpResponse<String> r = server.get(ApiDescription.PATH);
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(r.headers().firstValue("Content-Type").orElse("")).startsWith("application/json");
        JsonNode doc = JSON.readTree(r.body());
        assertThat(doc.path("openapi").asText()).startsWith("3.");
        assertThat(doc.at("/components/securitySchemes/apiToken/scheme").asText()).isEqualTo("bearer");

        Set<String> routes = apiRoutes();
        assertThat(routes).as("the router's API routes").hasSizeGreaterThan(30).contains("GET " + ApiDescription.PATH);
        List<String> missing = new ArrayList<>(), unsummarised = new ArrayList<>();
        for (String route : routes) {
            String method = route.substring(0, route.indexOf(' ')), path = route.substring(route.indexOf(' ') + 1);
            JsonNode op = doc.path("paths").path(path).path(method.toLowerCase(Locale.ROOT));
            if (op.isMissingNode()) missing.add(route);
            else if (op.path("summary").asText().equals(route) || op.path("summary").asText().isBlank()) unsummarised.add(route);
            else {
                assertThat(op.path("description").asText()).as(route).startsWith("Who may call it: ").doesNotContain("nobody");
                for (String param : path.split("/"))
                    if (param.startsWith("{")) {
                        String name = param.substring(1, param.length() - 1);
                        assertThat(op.path("parameters").findValuesAsText("name")).as(route).contains(name);
                    }
            }
        }
        assertThat(missing).as("routes missing from the description").isEmpty();
        assertThat(unsummarised).as("routes without a summary in " + ApiDescription.SUMMARIES).isEmpty();
        // and nothing described that the router does not have (a summary left behind by a removed route)
        JsonNode summaries = ApiDescription.summaries().path("routes");
        List<String> stale = new ArrayList<>();
        summaries.fieldNames().forEachRemaining(k -> { if (!routes.contains(k)) stale.add(k); });
        assertThat(stale).as("summaries of routes that no longer exist").isEmpty();
        assertThat(summaries.size()).as("one summary a route").isEqualTo(routes.size());
        Set<String> described = new TreeSet<>();
        doc.path("paths").properties().forEach(p -> p.getValue().fieldNames().forEachRemaining(m -> described.add(m.toUpperCase(Locale.ROOT) + " " + p.getKey())));
        assertThat(described).isEqualTo(routes);
    }

    @Test
    void whoMayCallEachRouteFollowsItsDeclaredRoles() throws Exception {
        JsonNode paths = JSON.readTree(server.get(ApiDescription.PATH).body()).path("paths");
        assertThat(paths.at("/~1api~1projects/get/description").asText()).contains("any signed-in member");
        assertThat(paths.at("/~1api~1projects/post/description").asText()).contains("engineers and checkers");
        assertThat(paths.at("/~1api~1projects/post/responses").has("409")).isTrue();
    }

    @Test
    void servedToTheOfficeNotToStrangers() throws Exception {
        HttpResponse<String> anon = TestLogin.anonymous(server.app).get(ApiDescription.PATH);
        assertThat(anon.statusCode()).isEqualTo(401);
        TestLogin.Client chk = TestLogin.as(server.app, server.office, "descchk", Role.CHECKER);
        String token = Html.text(chk.post("/account/tokens", List.of(Map.entry("name", "docs"))).body(), "#token-value");
        HttpResponse<String> r = HttpClient.newHttpClient().send(HttpRequest.newBuilder(URI.create(server.base() + ApiDescription.PATH))
                .header("Authorization", "Bearer " + token).build(), HttpResponse.BodyHandlers.ofString());
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(JSON.readTree(r.body()).path("paths").has("/api/projects")).isTrue();
    }
}
