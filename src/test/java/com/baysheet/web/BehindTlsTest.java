package com.baysheet.web;

import com.baysheet.auth.Role;
import com.baysheet.framing.Derivation;
import com.baysheet.store.Database;
import com.baysheet.store.Store;
import io.javalin.Javalin;
import org.junit.jupiter.api.Test;

import java.net.URI;
import java.net.URLEncoder;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.charset.StandardCharsets;
import java.time.Clock;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * With {@code --behind-tls} the form and session cookies are Secure and every response asks for HTTPS
 * (Strict-Transport-Security); without it, over plain HTTP, neither (a Secure cookie would never come back).
 */
class BehindTlsTest {
    @Test
    void behindATlsProxyCookiesAreSecureAndResponsesCarryHsts() {
        Exchange e = loginOn(true);
        assertThat(e.page.headers().firstValue("Strict-Transport-Security")).hasValue("max-age=31536000");
        assertThat(e.login.headers().firstValue("Strict-Transport-Security")).hasValue("max-age=31536000");
        assertThat(cookie(e.page, "bs_form")).contains("; Secure").contains("HttpOnly");
        assertThat(cookie(e.login, "bs_session")).contains("; Secure").contains("HttpOnly");
    }

    @Test
    void overPlainHttpNeitherSecureCookiesNorHsts() {
        Exchange e = loginOn(false);
        assertThat(e.page.headers().firstValue("Strict-Transport-Security")).isEmpty();
        assertThat(e.login.headers().firstValue("Strict-Transport-Security")).isEmpty();
        assertThat(cookie(e.page, "bs_form")).doesNotContain("Secure");
        assertThat(cookie(e.login, "bs_session")).doesNotContain("Secure");
    }

    private record Exchange(HttpResponse<String> page, HttpResponse<String> login) {}

    /** The login page and a login through it, on a server started with or without the flag. */
    private static Exchange loginOn(boolean behindTls) {
        Database db = Database.open(HealthTest.memUrl());
        Store store = Store.on(db.dataSource(), Derivation::derive, java.time.Clock.systemUTC());
        Office s = TestLogin.office(store, db, Clock.systemUTC());
        Javalin app = s.server(null, behindTls).start("127.0.0.1", 0);
        try {
            TestLogin.user(s, "eve", Role.ENGINEER);
            TestLogin.Client b = TestLogin.anonymous(app);
            HttpResponse<String> page = b.get("/login");
            Matcher m = Pattern.compile("name=\"_csrf\" value=\"([A-Za-z0-9_-]+)\"").matcher(page.body());
            assertThat(m.find()).as("the login form's token").isTrue();
            // sent by hand: the test's cookie jar, like a browser, keeps a Secure cookie from plain http to itself
            String form = cookie(page, "bs_form").replaceAll(";.*", "");
            HttpResponse<String> in = send(HttpRequest.newBuilder(URI.create(b.base + "/login")).header("Cookie", form)
                    .header("Content-Type", "application/x-www-form-urlencoded")
                    .POST(HttpRequest.BodyPublishers.ofString("_csrf=" + m.group(1) + "&username=eve&password="
                            + URLEncoder.encode(TestLogin.PASSWORD, StandardCharsets.UTF_8))).build());
            assertThat(in.statusCode()).isEqualTo(303);
            return new Exchange(page, in);
        } finally {
            app.stop();
            db.close();
        }
    }

    private static HttpResponse<String> send(HttpRequest r) {
        try {
            return HttpClient.newHttpClient().send(r, HttpResponse.BodyHandlers.ofString());
        } catch (Exception e) {
            throw new IllegalStateException(e);
        }
    }

    private static String cookie(HttpResponse<String> r, String name) {
        return r.headers().allValues("Set-Cookie").stream().filter(c -> c.startsWith(name + "=")).findFirst()
                .orElseThrow(() -> new AssertionError("no " + name + " cookie in " + r.headers().map()));
    }
}
