package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;

import static java.util.Map.entry;
import static org.assertj.core.api.Assertions.assertThat;

/** Headers on every response, the redirect after login, query numbers out of range, and the unlock on the users page. */
class HardeningTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    private static void hasSecurityHeaders(HttpResponse<?> r) {
        assertThat(r.headers().firstValue("X-Content-Type-Options")).contains("nosniff");
        assertThat(r.headers().firstValue("X-Frame-Options")).contains("DENY");
        assertThat(r.headers().firstValue("Content-Security-Policy").orElseThrow())
                .contains("default-src 'self'", "script-src 'self'", "frame-ancestors 'none'").doesNotContain("script-src 'self' 'unsafe-inline'");
    }

    /** A browser at the login page: it holds the page's form token, as the login form posts it. */
    private static TestLogin.Client atLogin() {
        TestLogin.Client c = TestLogin.anonymous(server.app);
        c.csrf = Pages.token(c.get("/login").body());
        return c;
    }

    @Test
    void everyResponseCarriesTheSecurityHeadersAndHtmlSaysUtf8() {
        TestLogin.Client anon = TestLogin.anonymous(server.app);
        TestLogin.Client eng = server.as("hdr-eng", Role.ENGINEER);
        for (HttpResponse<String> r : List.of(anon.get("/login"), anon.get("/projects"), eng.get("/projects"),
                eng.get("/projects/999999"), eng.get("/static/baysheet.css"), eng.get("/api/projects")))
            hasSecurityHeaders(r);
        assertThat(eng.get("/projects").headers().firstValue("Content-Type").orElseThrow().toLowerCase()).contains("text/html", "charset=utf-8");
    }

    @Test
    void noTemplateHasAnInlineScript() throws Exception {
        try (var files = java.nio.file.Files.walk(java.nio.file.Path.of("templates"))) {
            for (var f : files.filter(p -> p.toString().endsWith(".html")).toList()) {
                String html = java.nio.file.Files.readString(f);
                assertThat(html.replaceAll("<script[^>]*src=[^>]*>\\s*</script>", "")).as(f.toString()).doesNotContain("<script", " onclick=", " onload=");
            }
        }
    }

    @Test
    void aLoginOnlyReturnsToOurOwnPages() {
        TestLogin.user(server.office, "hop", Role.ENGINEER);
        for (String next : List.of("/\t/evil.example", "//evil.example", "/\\evil.example", "https://evil.example",
                "/login", "/%09/evil.example", "/projects//evil.example", "javascript:alert(1)")) {
            HttpResponse<String> r = atLogin().post("/login",
                    List.of(entry("username", "hop"), entry("password", TestLogin.PASSWORD), entry("next", next)));
            assertThat(r.statusCode()).as(next).isEqualTo(303);
            assertThat(r.headers().firstValue("Location")).as(next).contains("/");
        }
        HttpResponse<String> ok = atLogin().post("/login",
                List.of(entry("username", "hop"), entry("password", TestLogin.PASSWORD), entry("next", "/projects/1?x=2")));
        assertThat(ok.headers().firstValue("Location")).contains("/projects/1?x=2");
    }

    @Test
    void anOverflowingPageNumberIsABadRequest() {
        TestLogin.Client admin = server.as("admin", Role.ADMINISTRATOR);
        for (String page : List.of("99999999999999999999", "-1", "2147483647", "x"))
            assertThat(admin.get("/admin/audit?page=" + page).statusCode()).as(page).isEqualTo(400);
        assertThat(admin.get("/admin/audit?page=0").statusCode()).isEqualTo(200);
    }

    @Test
    void theAdministratorSeesAWaitingUserAndUnlocksThem() {
        TestLogin.user(server.office, "guessed", Role.ENGINEER);
        for (int i = 0; i < 7; i++)
            atLogin().post("/login", List.of(entry("username", "guessed"), entry("password", "wrong guess " + i)));
        HttpResponse<String> refused = atLogin().post("/login",
                List.of(entry("username", "guessed"), entry("password", TestLogin.PASSWORD)));
        assertThat(refused.statusCode()).isEqualTo(429);
        assertThat(Html.shown(refused.body())).contains("try again in");
        TestLogin.Client admin = server.as("admin", Role.ADMINISTRATOR);
        String users = admin.get("/admin/users").body();
        assertThat(Html.shown(users)).contains("waiting until");
        assertThat(Html.texts(users, "form button")).contains("Unlock");
        long id = server.office.accounts().users().findByUsername("guessed").orElseThrow().user().id();
        assertThat(admin.post("/admin/users/" + id + "/unlock", List.of()).statusCode()).isEqualTo(303);
        HttpResponse<String> in = atLogin().post("/login",
                List.of(entry("username", "guessed"), entry("password", TestLogin.PASSWORD), entry("next", "/projects")));
        assertThat(in.statusCode()).isEqualTo(200);
        assertThat(Html.text(in.body(), "#failed-attempts")).contains("failed attempts to log in as you");
    }
}
