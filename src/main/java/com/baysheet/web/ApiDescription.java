package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.web.auth.Admit;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import io.javalin.Javalin;
import io.javalin.config.RoutesConfig;
import io.javalin.http.HandlerType;
import io.javalin.router.Endpoint;
import io.javalin.security.RouteRole;
import io.javalin.security.Roles;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * {@code GET /api/openapi.json}: an OpenAPI description of the API, made from the server's own route table
 * (so no route can be left out of it or described after it is gone) and the summaries in
 * {@code api/openapi-summaries.json}, one per route ({@code "GET /api/projects"}; an object adds query parameters
 * and what the body holds), beside the version of the OpenAPI format it is written in. Who may call each route comes from the roles the route declares. docs/api.md is the
 * full reference; this is the machine-readable outline of the same paths.
 * Served to the signed-in office (a login or an API token), like every other API read: it reveals no data, but a
 * stranger learns no paths from this server.
 */
public final class ApiDescription {
    public static final String PATH = "/api/openapi.json";
    static final String SUMMARIES = "/api/openapi-summaries.json";
    private static final Set<HandlerType> METHODS = Set.of(HandlerType.GET, HandlerType.POST, HandlerType.PUT,
            HandlerType.PATCH, HandlerType.DELETE);
    private static final Pattern PATH_PARAM = Pattern.compile("\\{([^}/]+)}");
    private static final JsonNodeFactory F = JsonNodeFactory.instance;

    private volatile Javalin app;
    private volatile String document;

    /** The server whose routes are described; set once it is created (the routes are read at the first request). */
    void describe(Javalin server) {
        this.app = server;
    }

    void install(RoutesConfig r) {
        r.get(PATH, ctx -> ctx.status(200).contentType("application/json; charset=utf-8").result(document()), Admit.OFFICE);
    }

    private String document() {
        String d = document;
        if (d == null) document = d = RecordJson.write(of(routes(app), summaries()));
        return d;
    }

    /** The API routes of a server, from its router, in path order. */
    static List<Endpoint> routes(Javalin server) {
        return server.unsafe.internalRouter.allHttpHandlers().stream().map(p -> p.endpoint)
                .filter(e -> METHODS.contains(e.method) && (e.path.equals("/api") || e.path.startsWith("/api/")))
                .sorted(Comparator.comparing((Endpoint e) -> e.path).thenComparing(e -> e.method.name())).toList();
    }

    static JsonNode summaries() {
        try (InputStream in = ApiDescription.class.getResourceAsStream(SUMMARIES)) {
            if (in == null) throw new IllegalStateException(SUMMARIES + " is missing from the classpath");
            return RecordJson.mapper().readTree(in);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * The OpenAPI document of these routes with the summaries of {@code described} ({@code openapi}: the version of
     * the OpenAPI format written; {@code routes}: a summary per route; a route with none is named by its method and path).
     */
    static ObjectNode of(List<Endpoint> routes, JsonNode described) {
        JsonNode summaries = described.path("routes");
        ObjectNode doc = F.objectNode();
        doc.put("openapi", described.path("openapi").asText());
        doc.putObject("info").put("title", "Baysheet API").put("version", "1")
                .put("description", "The office's projects, models and calculation results as JSON; see docs/api.md. "
                        + "Results must be checked by a licensed engineer, and the locally adopted building code governs.");
        doc.putArray("servers").addObject().put("url", "/");
        ObjectNode components = doc.putObject("components");
        ObjectNode schemes = components.putObject("securitySchemes");
        schemes.putObject("apiToken").put("type", "http").put("scheme", "bearer")
                .put("description", "A personal API token made on /account/tokens; it acts with its owner's role. No form token is needed.");
        schemes.putObject("session").put("type", "apiKey").put("in", "cookie").put("name", "bs_session")
                .put("description", "A browser login; changes then also need the session's form token in the X-CSRF-Token header.");
        components.putObject("schemas").putObject("Error").put("type", "object").putObject("properties")
                .set("status", F.objectNode().put("type", "integer"));
        ((ObjectNode) components.get("schemas").get("Error").get("properties")).set("error", F.objectNode().put("type", "string"));
        ArrayNode security = doc.putArray("security");
        security.addObject().putArray("apiToken");
        security.addObject().putArray("session");
        ObjectNode paths = doc.putObject("paths");
        for (Endpoint e : routes) {
            ObjectNode item = paths.has(e.path) ? (ObjectNode) paths.get(e.path) : paths.putObject(e.path);
            item.set(e.method.name().toLowerCase(Locale.ROOT), operation(e, summaries.get(e.method.name() + " " + e.path)));
        }
        return doc;
    }

    private static ObjectNode operation(Endpoint e, JsonNode said) {
        String method = e.method.name();
        ObjectNode op = F.objectNode();
        op.put("summary", said == null ? method + " " + e.path : said.isTextual() ? said.asText() : said.path("summary").asText());
        op.put("operationId", (method.toLowerCase(Locale.ROOT) + e.path.replaceAll("[^A-Za-z0-9]+", "_")).replaceAll("_+$", ""));
        op.put("description", "Who may call it: " + who(e) + ".");
        ArrayNode params = F.arrayNode();
        Matcher m = PATH_PARAM.matcher(e.path);
        while (m.find()) params.addObject().put("name", m.group(1)).put("in", "path").put("required", true)
                .set("schema", F.objectNode().put("type", "string"));
        if (said != null && said.has("query")) said.get("query").properties().forEach(q -> params.addObject().put("name", q.getKey())
                .put("in", "query").put("description", q.getValue().asText()).set("schema", F.objectNode().put("type", "string")));
        if (!params.isEmpty()) op.set("parameters", params);
        boolean change = !method.equals("GET");
        if (change && said != null && said.has("body")) {
            ObjectNode body = op.putObject("requestBody").put("required", true).put("description", said.get("body").asText());
            body.putObject("content").putObject(said.path("bodyType").asText("application/json")).putObject("schema").put("type", "object");
        }
        ObjectNode responses = op.putObject("responses");
        responses.putObject(change ? "2XX" : "200").put("description", change ? "Done: the saved state, as docs/api.md gives it" : "The JSON asked for");
        error(responses, "400", "A value refused, naming the field");
        error(responses, "401", "No login, or an API token that is not valid");
        error(responses, "403", "A role that may not" + (change ? ", or (with a login) a missing form token" : ""));
        error(responses, "404", "An unknown project, level, member or other id");
        if (change) error(responses, "409", "Based on a version since changed, or a name already taken");
        return op;
    }

    private static void error(ObjectNode responses, String status, String description) {
        responses.putObject(status).put("description", description).putObject("content").putObject("application/json")
                .putObject("schema").put("$ref", "#/components/schemas/Error");
    }

    private static String who(Endpoint e) {
        Roles r = e.metadata(Roles.class);
        Set<RouteRole> roles = r == null ? Set.of() : r.getRoles();
        if (roles.contains(Admit.OPEN) || roles.contains(Admit.ANYONE)) return "anyone";
        if (roles.contains(Admit.OFFICE) || roles.contains(Admit.ACCOUNT)) return "any signed-in member of the office";
        if (roles.contains(Admit.PREPARER)) return "engineers and checkers";
        if (roles.contains(Admit.ADMINISTRATOR)) return "the administrator";
        return "nobody";
    }
}
