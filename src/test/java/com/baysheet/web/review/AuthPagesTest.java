package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.net.http.HttpResponse;
import java.time.Duration;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/** Set-up, login, logout, throttling and session expiry over real HTTP, as a browser does them. */
class AuthPagesTest {
    ReviewServer server;

    @BeforeEach
    void start() { server = new ReviewServer(); }

    @AfterEach
    void stop() { server.close(); }

    /** The form token the page put into its form, as a browser would post it back. */
    static String token(String html) { return Pages.token(html); }

    @Test
    void withNobodyYetEveryPageLeadsToTheOneTimeSetUp() {
        Client b = TestLogin.anonymous(server.app);
        assertThat(b.get("/projects").headers().firstValue("Location")).contains("/setup");
        assertThat(b.get("/login").headers().firstValue("Location")).contains("/setup");
        assertThat(b.get("/health").statusCode()).isEqualTo(200);
        String form = b.get("/setup").body();
        assertThat(Html.shown(form)).contains("no default password");
        assertThat(Html.field(form, "setupCode")).isEmpty();
        assertThat(form).doesNotContain(TestLogin.SETUP_CODE);
        HttpResponse<String> bad = b.postRaw("/setup", List.of(Map.entry("_csrf", token(form)),
                Map.entry("setupCode", TestLogin.SETUP_CODE), Map.entry("username", "ada"),
                Map.entry("fullName", "Ada"), Map.entry("initials", "AA"), Map.entry("password", "short"), Map.entry("confirmPassword", "short")));
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(Html.shown(bad.body())).contains("at least 10 characters");
        assertThat(Html.field(bad.body(), "username")).isEqualTo("ada");
        HttpResponse<String> ok = b.postRaw("/setup", List.of(Map.entry("_csrf", token(form)),
                Map.entry("setupCode", TestLogin.SETUP_CODE.toLowerCase()), Map.entry("username", "ada"),
                Map.entry("fullName", "Ada"), Map.entry("initials", "AA"), Map.entry("password", TestLogin.PASSWORD),
                Map.entry("confirmPassword", TestLogin.PASSWORD)));
        assertThat(ok.statusCode()).isEqualTo(303);
        assertThat(Html.texts(b.get("/admin/users").body(), "td")).contains("ada");
        Client other = TestLogin.anonymous(server.app);
        assertThat(other.get("/setup").headers().firstValue("Location")).as("set-up is closed")
                .hasValueSatisfying(l -> assertThat(l).startsWith("/login"));
        assertThat(server.office.accounts().users().count()).isEqualTo(1);
    }

    @Test
    void theSetUpRefusesAWrongOrMissingConsoleCodeAndStoresNobody() {
        Client b = TestLogin.anonymous(server.app);
        String form = b.get("/setup").body();
        for (String code : List.of("WRONG234", "")) {
            HttpResponse<String> r = b.postRaw("/setup", List.of(Map.entry("_csrf", token(form)), Map.entry("setupCode", code),
                    Map.entry("username", "mallory"), Map.entry("fullName", "Mallory"), Map.entry("initials", "MM"),
                    Map.entry("password", TestLogin.PASSWORD), Map.entry("confirmPassword", TestLogin.PASSWORD)));
            assertThat(r.statusCode()).as("code " + code).isEqualTo(400);
            assertThat(Html.shown(r.body())).contains("printed in the server's console");
            assertThat(Html.field(r.body(), "username")).isEqualTo("mallory");
            assertThat(r.body()).doesNotContain(TestLogin.SETUP_CODE);
            assertThat(r.headers().allValues("Set-Cookie")).noneSatisfy(c -> assertThat(c).startsWith("bs_session="));
        }
        assertThat(server.office.accounts().users().count()).as("nobody stored").isZero();
        assertThat(server.office.accounts().logins().setupDone()).isFalse();
    }

    @Test
    void loggingInThroughTheFormRenewsTheSessionAndLoggingOutEndsIt() {
        TestLogin.user(server.office, "eve", Role.ENGINEER);
        Client b = TestLogin.anonymous(server.app);
        HttpResponse<String> page = b.get("/login");
        assertThat(page.headers().allValues("Set-Cookie")).anySatisfy(c -> assertThat(c).startsWith("bs_form=")
                .contains("HttpOnly").contains("SameSite=Lax"));
        assertThat(b.postRaw("/login", List.of(Map.entry("username", "eve"), Map.entry("password", TestLogin.PASSWORD)))
                .statusCode()).as("no form token").isEqualTo(403);
        HttpResponse<String> wrong = b.postRaw("/login", List.of(Map.entry("_csrf", token(page.body())),
                Map.entry("username", "eve"), Map.entry("password", "not the password")));
        assertThat(wrong.statusCode()).isEqualTo(401);
        assertThat(Html.shown(wrong.body())).contains("do not match");
        assertThat(Html.field(wrong.body(), "username")).isEqualTo("eve");
        HttpResponse<String> in = b.postRaw("/login", List.of(Map.entry("_csrf", token(page.body())),
                Map.entry("username", "eve"), Map.entry("password", TestLogin.PASSWORD), Map.entry("next", "/occupancies")));
        // the wrong password before it is told, with the way on to where the user was going
        assertThat(in.statusCode()).isEqualTo(200);
        assertThat(Html.text(in.body(), "#failed-attempts")).startsWith("1 failed attempts");
        assertThat(Html.text(in.body(), "#failed-attempts > span")).isEqualTo("1");
        assertThat(Html.text(in.body(), "#failed-attempts + p a[href=/occupancies]")).isEqualTo("Continue");
        assertThat(in.headers().allValues("Set-Cookie")).anySatisfy(c -> assertThat(c).startsWith("bs_session=")
                .contains("HttpOnly").contains("SameSite=Lax"));
        String first = b.cookie("bs_session");
        assertThat(b.get("/projects").statusCode()).isEqualTo(200);
        String html = b.get("/account/password").body();
        b.postRaw("/login", List.of(Map.entry("_csrf", token(html)), Map.entry("username", "eve"), Map.entry("password", TestLogin.PASSWORD)));
        assertThat(b.cookie("bs_session")).as("a new session at each login").isNotEqualTo(first);
        assertThat(server.office.accounts().logins().session(first)).isEmpty();
        html = b.get("/account/password").body();
        assertThat(b.postRaw("/logout", List.of(Map.entry("_csrf", token(html)))).statusCode()).isEqualTo(303);
        assertThat(b.get("/projects").headers().firstValue("Location")).hasValueSatisfying(l -> assertThat(l).startsWith("/login"));
    }

    @Test
    void anIdleSessionExpiresAndTheNextPageAsksForLoginAgain() {
        Client eng = server.as("eve", Role.ENGINEER);
        assertThat(eng.get("/projects").statusCode()).isEqualTo(200);
        server.clock.advance(Duration.ofMinutes(90));
        assertThat(eng.get("/projects").statusCode()).as("used within the idle time").isEqualTo(200);
        server.clock.advance(Duration.ofHours(2).plusMinutes(1));
        assertThat(eng.get("/projects").headers().firstValue("Location")).hasValueSatisfying(l -> assertThat(l).startsWith("/login?next="));
    }

    @Test
    void repeatedFailedLoginsAreThrottledAndRecorded() {
        TestLogin.user(server.office, "eve", Role.ENGINEER);
        Client b = TestLogin.anonymous(server.app);
        String t = token(b.get("/login").body());
        int last = 0;
        for (int i = 0; i < 6; i++)
            last = b.postRaw("/login", List.of(Map.entry("_csrf", t), Map.entry("username", "eve"), Map.entry("password", "guess " + i)))
                    .statusCode();
        assertThat(last).isEqualTo(429);
        assertThat(b.postRaw("/login", List.of(Map.entry("_csrf", t), Map.entry("username", "eve"),
                Map.entry("password", TestLogin.PASSWORD))).statusCode()).isEqualTo(429);
        String audit = server.as("admin", Role.ADMINISTRATOR).get("/admin/audit").body();
        assertThat(Html.texts(audit, "td")).contains("login failed", "login throttled");
    }

    @Test
    void hostileTextIsStoredAsTypedAndShownEscaped() {
        Client adm = server.as("admin", Role.ADMINISTRATOR);
        String sql = "x'); DROP TABLE app_user; --";
        String script = "<img src=x onerror=alert(1)>";
        String firm = adm.get("/admin/firm").body();
        adm.post("/admin/firm", List.of(Map.entry("firmName", sql + script), Map.entry("logoText", sql),
                Map.entry("defaultEdition", "ASCE 7-16"), Map.entry("version", Pages.version(firm, "/admin/firm"))));
        assertThat(server.office.review().firm().get().name()).isEqualTo(sql + script);
        adm.post("/admin/users", List.of(Map.entry("username", "eve"), Map.entry("fullName", script + sql),
                Map.entry("initials", "EV"), Map.entry("role", "engineer")));
        String users = adm.get("/admin/users").body();
        // shown as the text it is, never an element of the page
        assertThat(Html.shown(users)).contains("<img src=x onerror=alert(1)>");
        assertThat(Html.all(users, "img")).isEmpty();
        assertThat(users).doesNotContain(script);
        assertThat(server.office.accounts().users().count()).isEqualTo(2);
        Client anon = TestLogin.anonymous(server.app);
        String t = token(anon.get("/login").body());
        assertThat(anon.postRaw("/login", List.of(Map.entry("_csrf", t), Map.entry("username", "admin' --"),
                Map.entry("password", "' OR '1'='1"))).statusCode()).isEqualTo(401);
        String audit = adm.get("/admin/audit").body();
        assertThat(Html.texts(audit, "td")).anyMatch(cell -> cell.contains("admin' --"));
        assertThat(Html.all(audit, "img")).isEmpty();
        assertThat(audit).doesNotContain("<img src=x");
    }
}
