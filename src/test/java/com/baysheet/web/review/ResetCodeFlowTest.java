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

import static com.baysheet.web.review.Pages.first;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * The reset over HTTP: the administrator's page shows a one-time code and no password; the person, not logged in,
 * uses it to choose their own password; the administrator can log in as them with nothing they saw.
 */
class ResetCodeFlowTest {
    @RegisterExtension
    static final ReviewServer server = ReviewServer.perClass();

    private static Client anonymousWithFormToken() {
        Client c = TestLogin.anonymous(server.app);
        assertThat(c.get("/account/reset").statusCode()).isEqualTo(200);
        c.csrf = c.cookie("bs_form");
        return c;
    }

    @Test
    void theAdministratorMakesACodeAndThePersonChoosesTheirOwnPassword() {
        Client admin = server.as("ada", Role.ADMINISTRATOR);
        long id = TestLogin.user(server.office, "rita", Role.CHECKER).id();
        assertThat(admin.post("/admin/users/" + id + "/password", List.of()).statusCode()).as("no confirm, no code").isEqualTo(400);
        HttpResponse<String> made = admin.post("/admin/users/" + id + "/password", List.of(Map.entry("confirm", "reset")));
        assertThat(made.statusCode()).isEqualTo(200);
        assertThat(Html.shown(made.body())).contains("One-time reset code for rita");
        assertThat(Html.all(made.body(), "input[type=password]")).as("no password field on the page").isEmpty();
        String code = Html.text(made.body(), "code");
        assertThat(code).matches("[2-9A-Z-]{24}");

        Client stranger = anonymousWithFormToken();
        List<Map.Entry<String, String>> asAda = List.of(Map.entry("username", "rita"), Map.entry("password", code));
        assertThat(stranger.post("/login", asAda).statusCode()).as("the code is no password").isEqualTo(401);

        Client rita = anonymousWithFormToken();
        HttpResponse<String> set = rita.post("/account/reset", List.of(Map.entry("username", "rita"), Map.entry("code", code),
                Map.entry("newPassword", "rita chose this herself"), Map.entry("confirmPassword", "rita chose this herself")));
        assertThat(set.statusCode()).isEqualTo(303);
        HttpResponse<String> again = stranger.post("/account/reset", List.of(Map.entry("username", "rita"), Map.entry("code", code),
                Map.entry("newPassword", "the admin wants in 9"), Map.entry("confirmPassword", "the admin wants in 9")));
        assertThat(again.statusCode()).as("used once already").isEqualTo(400);
        assertThat(again.body()).contains("is not a valid reset code");

        HttpResponse<String> in = rita.post("/login", List.of(Map.entry("username", "rita"), Map.entry("password", "rita chose this herself")));
        assertThat(in.statusCode()).isEqualTo(200);
        assertThat(in.body()).contains("A password reset code was made for you by ada", "to set a new password");
        assertThat(anonymousWithFormToken().post("/account/reset", List.of()).statusCode()).isEqualTo(400);
    }
}
