package com.baysheet.web.review;

import com.baysheet.auth.Role;
import com.baysheet.web.Html;
import com.baysheet.web.TestLogin;
import com.baysheet.web.TestLogin.Client;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.net.http.HttpResponse;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Adding a person over HTTP: the administrator sets no password and sees a one-time set-up code once; nobody can
 * log in as the person until they use it to choose their own password; the audit trail keeps no secret.
 */
class AddedPersonTest {
    static final String OWN = "noor picked these words";

    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    private static Client atLogin() {
        Client c = TestLogin.anonymous(server.app);
        assertThat(c.get("/login").statusCode()).isEqualTo(200);
        c.csrf = c.cookie("bs_form");
        return c;
    }

    private static HttpResponse<String> add(Client admin, String username, String password) {
        return admin.post("/admin/users", List.of(Map.entry("username", username), Map.entry("fullName", "Noor Haddad"),
                Map.entry("initials", "NH"), Map.entry("role", "engineer"), Map.entry("password", password)));
    }

    @Test
    void theAddFormAsksNoPasswordAndTheCodeIsShownOnce() {
        Client admin = server.as("admin", Role.ADMINISTRATOR);
        String users = admin.get("/admin/users").body();
        assertThat(Html.all(users, "#add-user input[type=password]")).as("the administrator sets no password").isEmpty();
        assertThat(Html.text(users, "#add-user-hint")).contains("one-time set-up code");

        // a password posted along anyway (an old form, a script) is ignored, not set
        String posted = "the administrator's guess 1";
        HttpResponse<String> added = add(admin, "noor", posted);
        assertThat(added.statusCode()).isEqualTo(200);
        String code = Html.text(added.body(), "#setup-code code");
        assertThat(code).matches("[2-9A-HJKMNP-TV-Z]{4}(-[2-9A-HJKMNP-TV-Z]{4}){4}");
        assertThat(Html.shown(added.body())).contains("you never see", "noor");
        assertThat(Html.all(added.body(), "input[type=password]")).isEmpty();
        assertThat(admin.get("/admin/users").body()).as("shown once").doesNotContain(code);
        assertThat(Html.texts(admin.get("/admin/users").body(), "td")).contains("noor");

        // four guesses: the office throttle lets five fail before a wait
        for (String guess : List.of(posted, code, "", TestLogin.PASSWORD))
            assertThat(atLogin().post("/login", List.of(Map.entry("username", "noor"), Map.entry("password", guess)))
                    .statusCode()).as("no password logs in before the code: " + guess).isEqualTo(401);

        String audit = admin.get("/admin/audit").body();
        assertThat(Html.texts(audit, "td")).contains("user added", "reset code made");
        assertThat(audit).as("the audit trail keeps no secret").doesNotContain(code).doesNotContain(posted);
        assertThat(admin.get("/admin/audit.csv").body()).doesNotContain(code);

        Client noor = atLogin();
        HttpResponse<String> common = noor.post("/account/reset", List.of(Map.entry("username", "noor"), Map.entry("code", code),
                Map.entry("newPassword", "1234567890"), Map.entry("confirmPassword", "1234567890")));
        assertThat(common.statusCode()).as("the password policy applies").isEqualTo(400);
        assertThat(Html.shown(common.body())).contains("is one of the most common passwords");
        HttpResponse<String> set = noor.post("/account/reset", List.of(Map.entry("username", "noor"), Map.entry("code", code),
                Map.entry("newPassword", OWN), Map.entry("confirmPassword", OWN)));
        assertThat(set.statusCode()).as("a refused password spent no code").isEqualTo(303);
        HttpResponse<String> in = atLogin().post("/login", List.of(Map.entry("username", "noor"), Map.entry("password", OWN),
                Map.entry("next", "/projects")));
        assertThat(in.statusCode()).as("logged in, told of the code first").isEqualTo(200);
        assertThat(server.office.accounts().users().findByUsername("noor").orElseThrow().mustChangePassword())
                .as("chosen by the person: no forced change").isFalse();
    }

    @Test
    void aSecondCodeVoidsTheFirstAndTheLoginPageSaysWhatToDoWhenOneLapses() {
        Client admin = server.as("admin", Role.ADMINISTRATOR);
        String first = Html.text(add(admin, "omar", "").body(), "#setup-code code");
        long id = server.office.accounts().users().findByUsername("omar").orElseThrow().user().id();
        String second = Html.text(admin.post("/admin/users/" + id + "/password", List.of(Map.entry("confirm", "reset"))).body(), "code");
        assertThat(second).isNotEqualTo(first);
        HttpResponse<String> voided = atLogin().post("/account/reset", List.of(Map.entry("username", "omar"), Map.entry("code", first),
                Map.entry("newPassword", OWN), Map.entry("confirmPassword", OWN)));
        assertThat(voided.statusCode()).isEqualTo(400);
        assertThat(Html.shown(voided.body())).contains("ask your administrator for a new one");
        assertThat(atLogin().post("/account/reset", List.of(Map.entry("username", "omar"), Map.entry("code", second),
                Map.entry("newPassword", OWN), Map.entry("confirmPassword", OWN))).statusCode()).isEqualTo(303);
        assertThat(Html.text(atLogin().get("/login").body(), "#code-hint")).contains("lapsed", "ask your administrator for a new one");
    }

    @Test
    void aRefusedAddStoresNobodyAndShowsNoCode() {
        Client admin = server.as("admin", Role.ADMINISTRATOR);
        HttpResponse<String> bad = admin.post("/admin/users", List.of(Map.entry("username", "admin"), Map.entry("fullName", "Twin"),
                Map.entry("initials", "TW"), Map.entry("role", "engineer")));
        assertThat(bad.statusCode()).isEqualTo(400);
        assertThat(Html.all(bad.body(), "#setup-code")).isEmpty();
        assertThat(Html.shown(bad.body())).contains("is taken by another user");
    }
}
