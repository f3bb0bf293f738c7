package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every route of the office, for anonymous and each role: let through (whatever the handler then says),
 * sent to log in, or refused for the role. Review actions are refused for a role by the review rules with
 * the same 403; other rule refusals (wrong state: 409) count as let through.
 */
class AccessMatrixTest {
    enum Out { PASS, LOGIN, FORBID }

    record Route(String method, String path, List<Map.Entry<String, String>> form, Out anon, Out eng, Out chk, Out adm) {}

    static final Out P = Out.PASS, L = Out.LOGIN, F = Out.FORBID;
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();
    static Client anon, eng, chk, adm;

    @BeforeAll
    static void start() {
        anon = TestLogin.anonymous(server.app);
        eng = server.as("eve", Role.ENGINEER);
        chk = server.as("carl", Role.CHECKER);
        adm = server.as("admin", Role.ADMINISTRATOR);
    }

    static List<Route> routes() {
        long p = server.project();
        String s = server.sheetPath();
        String k = "/review/projects/" + p + "/packages/project";
        List<Map.Entry<String, String>> v0 = List.of(Map.entry("version", "0"));
        List<Map.Entry<String, String>> none = List.of();
        return List.of(
                new Route("GET", "/health", none, P, P, P, P),
                new Route("GET", "/login", none, P, P, P, P),
                new Route("GET", "/projects", none, L, P, P, P),
                new Route("GET", "/projects/" + p, none, L, P, P, P),
                new Route("GET", "/projects/" + p + "/members", none, L, P, P, P),
                new Route("GET", "/projects/" + p + "/plan", none, L, P, P, P),
                new Route("GET", "/occupancies", none, L, P, P, P),
                new Route("GET", "/api/projects", none, L, P, P, P),
                new Route("POST", "/projects", List.of(Map.entry("jobNumber", "")), L, P, P, F),
                new Route("POST", "/occupancies", List.of(Map.entry("id", "")), L, P, P, F),
                new Route("POST", "/api/projects", none, L, P, P, F),
                new Route("GET", "/review/projects/" + p, none, L, P, P, P),
                new Route("GET", s, none, L, P, P, P),
                new Route("GET", s + "/compare", none, L, P, P, P),
                new Route("GET", s + "/checking.pdf", none, L, P, P, P),
                new Route("POST", s + "/resubmit", v0, L, P, P, F),
                new Route("POST", s + "/return", v0, L, F, P, F),
                new Route("POST", s + "/approve", v0, L, F, P, F),
                new Route("POST", s + "/issue", v0, L, P, P, F),
                new Route("POST", s + "/markups", List.of(Map.entry("target", "sheet"), Map.entry("text", "x")), L, F, P, F),
                new Route("GET", k, none, L, P, P, P),
                new Route("GET", k + "/compare", none, L, P, P, P),
                new Route("POST", k + "/resubmit", v0, L, P, P, F),
                new Route("POST", k + "/return", v0, L, F, P, F),
                new Route("POST", k + "/approve", v0, L, F, P, F),
                new Route("POST", k + "/issue", v0, L, P, P, F),
                new Route("POST", k + "/markups", List.of(Map.entry("target", "sheet"), Map.entry("text", "x")), L, F, P, F),
                new Route("GET", "/review/revisions/999999/issued.pdf", none, L, P, P, P),
                new Route("GET", "/verify", none, L, P, P, P),
                new Route("POST", "/verify", none, L, P, P, P),
                new Route("GET", "/account/password", none, L, P, P, P),
                new Route("POST", "/account/password", List.of(Map.entry("currentPassword", "wrong")), L, P, P, P),
                new Route("GET", "/admin/users", none, L, F, F, P),
                new Route("POST", "/admin/users", List.of(Map.entry("username", "")), L, F, F, P),
                new Route("GET", "/admin/firm", none, L, F, F, P),
                new Route("POST", "/admin/firm", List.of(Map.entry("firmName", "")), L, F, F, P),
                new Route("GET", "/admin/audit", none, L, F, F, P),
                new Route("GET", "/admin/audit.csv", none, L, F, F, P));
    }

    @Test
    void everyRouteForEveryRoleAndAnonymous() {
        List<String> wrong = new ArrayList<>();
        for (Route r : routes()) {
            check(wrong, r, "anonymous", anon, r.anon());
            check(wrong, r, "engineer", eng, r.eng());
            check(wrong, r, "checker", chk, r.chk());
            check(wrong, r, "administrator", adm, r.adm());
        }
        assertThat(wrong).isEmpty();
    }

    private static void check(List<String> wrong, Route r, String who, Client c, Out expected) {
        HttpResponse<String> res = r.method().equals("GET") ? c.get(r.path())
                : r.path().startsWith("/api/") ? c.json("POST", r.path(), "{}") : c.post(r.path(), r.form());
        Out got = outcome(res);
        if (got != expected)
            wrong.add(who + " " + r.method() + " " + r.path() + ": expected " + expected + ", got " + got + " (" + res.statusCode() + ")");
        if (res.statusCode() >= 500) wrong.add(who + " " + r.method() + " " + r.path() + ": a fault (" + res.statusCode() + ")");
    }

    static Out outcome(HttpResponse<String> res) {
        String location = res.headers().firstValue("Location").orElse("");
        if (res.statusCode() == 401 || location.startsWith("/login")) return Out.LOGIN;
        if (res.statusCode() == 403) return Out.FORBID;
        return Out.PASS;
    }

    @Test
    void aPathNoRouteMatchesIsAnOfficePageToStrangersAndNotFoundToTheOffice() {
        assertThat(anon.get("/no/such/page").headers().firstValue("Location")).hasValueSatisfying(l -> assertThat(l).startsWith("/login"));
        assertThat(anon.post("/no/such/page", List.of()).statusCode()).isEqualTo(401);
        assertThat(anon.json("POST", "/api/no/such", "{}").statusCode()).isEqualTo(401);
        assertThat(eng.get("/no/such/page").statusCode()).isEqualTo(404);
        assertThat(adm.json("GET", "/api/no/such", null).statusCode()).isEqualTo(404);
        // the static files are anyone's: a missing one is simply not there
        assertThat(anon.get("/static/no-such-file.css").statusCode()).isEqualTo(404);
        assertThat(anon.get("/static/baysheet.css").statusCode()).isEqualTo(200);
    }

    @Test
    void aPostWithoutTheFormTokenIsRefusedChangesNothingAndIsRecorded() {
        Client tokenless = server.as("otto", Role.ENGINEER);
        tokenless.csrf = null;
        long before = server.office.review().audit().count();
        HttpResponse<String> res = tokenless.post(server.sheetPath() + "/submit", List.of(Map.entry("version", "0")));
        assertThat(res.statusCode()).isEqualTo(403);
        assertThat(Html.shown(res.body())).contains("Reload the page");
        assertThat(tokenless.postRaw(server.sheetPath() + "/submit", List.of(Map.entry("version", "0"),
                Map.entry("_csrf", "A".repeat(43)))).statusCode()).isEqualTo(403);
        assertThat(tokenless.json("POST", "/api/projects", "{}").statusCode()).isEqualTo(403);
        assertThat(server.office.review().reviews().view(server.ref()).current().stored()).isFalse();
        // nothing changed: the only new entry records the refusal, the three within a minute as one
        assertThat(server.office.review().audit().count()).isEqualTo(before + 1);
        assertThat(server.office.review().audit().page(1, 0).get(0).action()).isEqualTo("form token refused");
    }

    @Test
    void everyPostFormOfAPageCarriesTheToken() {
        String html = chk.get("/projects/" + server.project() + "/settings").body();
        var forms = Html.all(html, "form[method=post]");
        assertThat(forms).isNotEmpty();
        // each post form carries the token once, as its own field (not merely somewhere on the page)
        assertThat(forms).allSatisfy(f -> assertThat(f.select("input[type=hidden][name=_csrf]").eachAttr("value")).containsExactly(chk.csrf));
    }

    @Test
    void theHeaderOffersEachRoleItsOwnLinks() {
        String e = eng.get("/projects/" + server.project()).body();
        assertThat(header(e)).contains("Log out", "Verify a PDF", "Sheets and check").doesNotContain("Audit trail");
        assertThat(header(adm.get("/projects").body())).contains("Audit trail", "Users");
        assertThat(header(TestLogin.anonymous(server.app).get("/login").body())).doesNotContain("Log out");
    }

    /** The links and buttons of the page header. */
    private static List<String> header(String html) {
        return Html.texts(html, "header a, header button");
    }
}
