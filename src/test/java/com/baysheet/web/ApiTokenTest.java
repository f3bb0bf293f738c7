package com.baysheet.web;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.auth.User;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.jsoup.nodes.Element;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Personal API tokens end to end over the office's own server: made on one's account page and shown once, kept
 * only as a hash, opening the API (and nothing else) with the owner's role as it stands, with no form token, and
 * refused with a JSON 401 once revoked or once the owner is made inactive.
 */
class ApiTokenTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    private static final ObjectMapper JSON = new ObjectMapper();
    /** A client with no cookie jar: only the Authorization header says who is asking. */
    private static final HttpClient BARE = HttpClient.newBuilder().followRedirects(HttpClient.Redirect.NEVER).build();

    /** Makes a token on the account page of {@code who}, as a browser would, and reads it off the page. */
    private static String make(TestLogin.Client who, String name) {
        HttpResponse<String> made = who.post("/account/tokens", List.of(Map.entry("name", name)));
        assertThat(made.statusCode()).as(made.body()).isEqualTo(200);
        String token = Html.text(made.body(), "#token-value");
        assertThat(token).startsWith("bst_").hasSizeGreaterThan(40);
        return token;
    }

    private static HttpResponse<String> bearer(String token, String method, String path, String json) {
        HttpRequest.Builder b = HttpRequest.newBuilder(URI.create(server.base() + path)).header("Authorization", "Bearer " + token)
                .method(method, json == null ? HttpRequest.BodyPublishers.noBody() : HttpRequest.BodyPublishers.ofString(json));
        if (json != null) b.header("Content-Type", "application/json");
        try {
            return BARE.send(b.build(), HttpResponse.BodyHandlers.ofString());
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    private static String newProject(String job) {
        return "{\"jobNumber\": \"" + job + "\", \"name\": \"Token test " + job + "\", \"units\": \"US\"}";
    }

    private static void assertRefused401(HttpResponse<String> r) throws Exception {
        assertThat(r.statusCode()).as(r.body()).isEqualTo(401);
        assertThat(r.headers().firstValue("Content-Type").orElse("")).startsWith("application/json");
        assertThat(JSON.readTree(r.body()).path("error").asText()).contains("API token");
        assertThat(r.headers().firstValue("WWW-Authenticate").orElse("")).startsWith("Bearer");
    }

    @Test
    void aTokenOpensTheApiWithItsOwnersRoleAndNeedsNoFormToken() throws Exception {
        TestLogin.Client eng = TestLogin.as(server.app, server.office, "tokeng", Role.ENGINEER);
        String token = make(eng, "take-off script");

        HttpResponse<String> read = bearer(token, "GET", "/api/projects", null);
        assertThat(read.statusCode()).as(read.body()).isEqualTo(200);
        assertThat(JSON.readTree(read.body()).isArray()).isTrue();
        HttpResponse<String> created = bearer(token, "POST", "/api/projects", newProject("TOK-1"));
        assertThat(created.statusCode()).as(created.body()).isEqualTo(201);
        assertThat(JSON.readTree(created.body()).path("info").path("jobNumber").asText()).isEqualTo("TOK-1");

        // the same change from a cookie login without the form token is still refused: the exemption is the token's
        TestLogin.Client noFormToken = TestLogin.as(server.app, server.office, "tokeng", Role.ENGINEER);
        noFormToken.csrf = null;
        assertThat(noFormToken.json("POST", "/api/projects", newProject("TOK-2")).statusCode()).isEqualTo(403);

        // the role is the owner's as it is at each request: made administrator, the token no longer prepares
        User admin = TestLogin.user(server.office, "admin", Role.ADMINISTRATOR);
        server.office.accounts().admin().setRole(admin, eng.user.id(), Role.ADMINISTRATOR, "127.0.0.1");
        try {
            assertThat(bearer(token, "POST", "/api/projects", newProject("TOK-3")).statusCode()).isEqualTo(403);
            assertThat(bearer(token, "GET", "/api/projects", null).statusCode()).isEqualTo(200);
        } finally {
            server.office.accounts().admin().setRole(admin, eng.user.id(), Role.ENGINEER, "127.0.0.1");
        }

        // listed on the account page by name, with a last-used time, and never by value (a role change ended the session)
        String page = TestLogin.as(server.app, server.office, "tokeng", Role.ENGINEER).get("/account/tokens").body();
        assertThat(Html.texts(page, "#tokens .token-name")).contains("take-off script");
        assertThat(Html.all(page, "#token-value")).isEmpty();
        assertThat(Html.parse(page).text()).doesNotContain(token);
        assertThat(Html.all(page, "#tokens td").eachText()).doesNotContain("never");
    }

    @Test
    void aRevokedTokenIsRefusedWithAJson401AndTheRefusalIsAudited() throws Exception {
        TestLogin.Client chk = TestLogin.as(server.app, server.office, "tokchk", Role.CHECKER);
        String token = make(chk, "nightly export");
        assertThat(bearer(token, "GET", "/api/projects", null).statusCode()).isEqualTo(200);

        Element revoke = Html.one(chk.get("/account/tokens").body(), "#tokens form input[name=token]");
        HttpResponse<String> done = chk.post("/account/tokens/revoke", List.of(Map.entry("token", revoke.attr("value"))));
        assertThat(done.statusCode()).isEqualTo(303);
        assertRefused401(bearer(token, "GET", "/api/projects", null));
        assertThat(Html.all(chk.get("/account/tokens").body(), "#tokens")).isEmpty();
        assertThat(count("SELECT COUNT(*) FROM audit_event WHERE action = 'API token refused'")).isPositive();
        assertThat(count("SELECT COUNT(*) FROM audit_event WHERE action = 'API token revoked' AND actor_username = 'tokchk'")).isEqualTo(1);
    }

    @Test
    void anInactiveOwnersTokenOpensNothingAndTheAdministratorCanRevokeAnyonesToken() throws Exception {
        TestLogin.Client gone = TestLogin.as(server.app, server.office, "tokgone", Role.ENGINEER);
        String token = make(gone, "laptop");
        String other = make(gone, "desktop");
        User admin = TestLogin.user(server.office, "admin", Role.ADMINISTRATOR);
        server.office.accounts().admin().setActive(admin, gone.user.id(), false, "127.0.0.1");
        assertRefused401(bearer(token, "GET", "/api/projects", null));
        server.office.accounts().admin().setActive(admin, gone.user.id(), true, "127.0.0.1");
        assertThat(bearer(token, "GET", "/api/projects", null).statusCode()).isEqualTo(200);

        TestLogin.Client adm = TestLogin.as(server.app, server.office, "admin", Role.ADMINISTRATOR);
        String users = adm.get("/admin/users").body();
        Element row = Html.all(users, "#users tbody tr").stream().filter(r -> r.child(0).text().equals("tokgone")).findFirst().orElseThrow();
        Element laptop = row.select(".api-tokens form").stream().filter(f -> f.text().contains("laptop")).findFirst().orElseThrow();
        HttpResponse<String> revoked = adm.post(laptop.attr("action"), List.of(Map.entry("token", laptop.selectFirst("input[name=token]").attr("value"))));
        assertThat(revoked.statusCode()).isEqualTo(303);
        assertRefused401(bearer(token, "GET", "/api/projects", null));
        assertThat(bearer(other, "GET", "/api/projects", null).statusCode()).as("the other token stands").isEqualTo(200);

        // a user cannot revoke someone else's token from their own page: it is not found among theirs
        TestLogin.Client eng = TestLogin.as(server.app, server.office, "tokeng2", Role.ENGINEER);
        long otherId = server.office.accounts().tokens().of(gone.user.id()).get(0).id();
        assertThat(eng.post("/account/tokens/revoke", List.of(Map.entry("token", String.valueOf(otherId)))).statusCode()).isEqualTo(404);
        assertThat(bearer(other, "GET", "/api/projects", null).statusCode()).isEqualTo(200);
    }

    @Test
    void aTokenNeverOpensAPage() throws Exception {
        TestLogin.Client eng = TestLogin.as(server.app, server.office, "tokpage", Role.ENGINEER);
        String token = make(eng, "pages?");
        for (String page : List.of("/projects", "/projects/" + server.alderId(), "/account/tokens", "/admin/users")) {
            HttpResponse<String> r = bearer(token, "GET", page, null);
            assertThat(r.statusCode()).as(page).isEqualTo(401);
            assertThat(Html.text(r.body(), "main")).as(page).contains("opens only the API");
        }
        // nor a form post, which would otherwise skip its form token
        HttpResponse<String> post = bearer(token, "POST", "/account/tokens", null);
        assertThat(post.statusCode()).isEqualTo(401);
        assertThat(server.office.accounts().tokens().of(eng.user.id())).hasSize(1);
    }

    @Test
    void badTokensAreA401NeverA500() throws Exception {
        for (String bad : List.of("", "bst_", "bst_not-a-token", "x".repeat(5000), "bst_%%%%;--", "' OR 1=1 --")) {
            assertRefused401(bearer(bad, "GET", "/api/projects", null));
            assertRefused401(bearer(bad, "POST", "/api/projects", newProject("BAD")));
        }
        // another scheme is not ours: it is ignored, and with no login that is the usual 401
        HttpRequest basic = HttpRequest.newBuilder(URI.create(server.base() + "/api/projects")).header("Authorization", "Basic YTpi").build();
        assertThat(BARE.send(basic, HttpResponse.BodyHandlers.ofString()).statusCode()).isEqualTo(401);
    }

    @Test
    void theTokenIsStoredOnlyAsItsHashAndNamesAreChecked() throws Exception {
        TestLogin.Client eng = TestLogin.as(server.app, server.office, "tokhash", Role.ENGINEER);
        String token = make(eng, "hash check");
        List<String> cells = new ArrayList<>();
        try (Connection c = server.db.dataSource().getConnection();
             PreparedStatement ps = c.prepareStatement("SELECT * FROM api_token WHERE user_id = ?")) {
            ps.setLong(1, eng.user.id());
            try (ResultSet rs = ps.executeQuery()) {
                ResultSetMetaData md = rs.getMetaData();
                while (rs.next()) for (int i = 1; i <= md.getColumnCount(); i++) cells.add(String.valueOf(rs.getObject(i)));
            }
        }
        assertThat(cells).contains(Tokens.sha256(token), "hash check");
        assertThat(cells).noneMatch(v -> v.contains(token) || v.contains(token.substring(4)));

        HttpResponse<String> blank = eng.post("/account/tokens", List.of(Map.entry("name", "  ")));
        assertThat(blank.statusCode()).isEqualTo(400);
        assertThat(Html.all(blank.body(), "#token-value")).isEmpty();
        assertThat(Html.parse(blank.body()).text()).contains("say what the token is for");
        HttpResponse<String> noId = eng.post("/account/tokens/revoke", List.of(Map.entry("token", "first")));
        assertThat(noId.statusCode()).isEqualTo(400);
    }

    private static long count(String sql) throws Exception {
        try (Connection c = server.db.dataSource().getConnection(); PreparedStatement ps = c.prepareStatement(sql);
             ResultSet rs = ps.executeQuery()) {
            rs.next();
            return rs.getLong(1);
        }
    }
}
