package com.baysheet.web.review;

import com.baysheet.web.JsonBody;
import com.baysheet.auth.NewUser;
import com.baysheet.auth.Role;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;

import static com.baysheet.web.review.AuthPagesTest.token;
import static org.assertj.core.api.Assertions.assertThat;

/** A password someone else saw (a demo account's, printed in the console) is changed by its owner before anything else, over real HTTP. */
class ForcedPasswordChangeTest {
    static final String STARTING = "starting words 2026";
    static final String OWN = "my own quiet phrase";
    ReviewServer server;

    @BeforeEach
    void start() { server = new ReviewServer(); }

    @AfterEach
    void stop() { server.close(); }

    @Test
    void aDemoAccountChangesThePasswordPrintedInTheConsoleBeforeReachingAnyPage() {
        Client admin = TestLogin.as(server.app, server.office, "admin", Role.ADMINISTRATOR);
        assertThat(admin.get("/projects").statusCode()).as("the administrator's own password is not flagged").isEqualTo(200);
        // the one kind of account whose password someone else saw: --demo prints it in the console
        assertThat(server.office.accounts().admin().addDemo(new NewUser("eve", "Eve", "EV", Role.ENGINEER), STARTING)).isPresent();

        Client eve = TestLogin.anonymous(server.app);
        HttpResponse<String> in = eve.postRaw("/login", List.of(Map.entry("_csrf", token(eve.get("/login").body())),
                Map.entry("username", "eve"), Map.entry("password", STARTING), Map.entry("next", "/occupancies")));
        assertThat(in.headers().firstValue("Location")).hasValue("/account/password");
        for (String page : List.of("/projects", "/occupancies", "/review", "/"))
            assertThat(eve.get(page).headers().firstValue("Location")).as(page).hasValue("/account/password");
        HttpResponse<String> api = eve.get("/api/projects");
        assertThat(api.statusCode()).isEqualTo(403);
        assertThat(JsonBody.of(api).path("error").asText()).contains("choose your own password before going on");
        assertThat(eve.get("/static/app.css").statusCode()).as("static files").isNotEqualTo(303);
        String form = eve.get("/account/password").body();
        assertThat(Html.text(form, "#must-change")).contains("choose your own password before going on");

        HttpResponse<String> refused = eve.postRaw("/account/password", List.of(Map.entry("_csrf", token(form)),
                Map.entry("currentPassword", STARTING), Map.entry("newPassword", "eve"), Map.entry("confirmPassword", "eve")));
        assertThat(refused.statusCode()).isEqualTo(400);
        assertThat(eve.get("/projects").statusCode()).as("still sent to the change").isEqualTo(303);
        HttpResponse<String> changed = eve.postRaw("/account/password", List.of(Map.entry("_csrf", token(form)),
                Map.entry("currentPassword", STARTING), Map.entry("newPassword", OWN), Map.entry("confirmPassword", OWN)));
        assertThat(changed.statusCode()).isEqualTo(303);
        assertThat(eve.get("/projects").statusCode()).isEqualTo(200);
        assertThat(eve.get("/api/projects").statusCode()).isEqualTo(200);
        assertThat(eve.get("/account/password").body()).doesNotContain("id=\"must-change\"");
    }
}
