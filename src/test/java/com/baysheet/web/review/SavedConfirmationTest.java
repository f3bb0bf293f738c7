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

/** Every settings save redirects (post-redirect-get) to a page that says it was saved. */
class SavedConfirmationTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    /** The page the save redirected to, as the browser then fetches it. */
    static String followed(Client c, HttpResponse<String> r) {
        assertThat(r.statusCode()).as("a save redirects").isEqualTo(303);
        return Html.shown(c.get(r.headers().firstValue("Location").orElseThrow()).body());
    }

    @Test
    void projectSettings() {
        Client eng = server.as("eve", Role.ENGINEER);
        long p = server.project();
        String path = "/projects/" + p + "/settings";
        String form = eng.get(path).body();
        var info = server.store.projects().find(p).info();
        HttpResponse<String> r = eng.post(path, List.of(Map.entry("version", Pages.version(form, path)),
                Map.entry("jobNumber", info.jobNumber()), Map.entry("name", info.name() + " (renamed)"),
                Map.entry("address", info.address()), Map.entry("client", info.client()), Map.entry("edition", info.edition()),
                Map.entry("units", info.units().name())));
        assertThat(followed(eng, r)).contains("Saved: project settings.", info.name() + " (renamed)");
        assertThat(eng.get("/projects/" + p).body()).doesNotContain("Saved:");
    }

    @Test
    void passwordChange() {
        TestLogin.user(server.office, "pat", Role.ENGINEER);
        Client pat = server.as("pat", Role.ENGINEER);
        HttpResponse<String> r = pat.post("/account/password", List.of(Map.entry("currentPassword", TestLogin.PASSWORD),
                Map.entry("newPassword", "a new password 456"), Map.entry("confirmPassword", "a new password 456")));
        assertThat(followed(pat, r)).contains("Saved: your new password.");
        HttpResponse<String> wrong = pat.post("/account/password", List.of(Map.entry("currentPassword", "not it at all"),
                Map.entry("newPassword", "another password 789"), Map.entry("confirmPassword", "another password 789")));
        assertThat(wrong.statusCode()).isEqualTo(400);
        assertThat(wrong.body()).doesNotContain("Saved:");
    }

    @Test
    void userAdministration() {
        Client admin = server.as("admin", Role.ADMINISTRATOR);
        HttpResponse<String> added = admin.post("/admin/users", List.of(Map.entry("username", "quinn"), Map.entry("fullName", "Quinn Ray"),
                Map.entry("initials", "QR"), Map.entry("role", "engineer")));
        assertThat(added.statusCode()).as("the set-up code is shown on this response, not after a redirect").isEqualTo(200);
        assertThat(added.body()).contains("one-time set-up code for").doesNotContain("Saved:");
        long id = server.office.accounts().users().findByUsername("quinn").orElseThrow().user().id();
        assertThat(followed(admin, admin.post("/admin/users/" + id + "/role", List.of(Map.entry("role", "checker")))))
                .contains("Saved: user account.");
        assertThat(followed(admin, admin.post("/admin/users/" + id + "/active", List.of(Map.entry("active", "false")))))
                .contains("Saved: user account.");
        assertThat(admin.post("/admin/users/" + id + "/password", List.of(Map.entry("confirm", "reset"))).body())
                .contains("One-time reset code for").doesNotContain("Saved:");
        assertThat(admin.get("/admin/users").body()).doesNotContain("Saved:");
    }
}
