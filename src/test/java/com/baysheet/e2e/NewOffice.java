package com.baysheet.e2e;

import org.openqa.selenium.WebElement;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A new, empty office made ready for an engineer through the pages: the administrator's one-time set-up, one
 * engineer added with a set-up code, the engineer choosing a password and logging in. Ends on the project list,
 * logged in as the engineer.
 */
final class NewOffice {
    private NewOffice() {}

    static void withEngineer(Page page, String setupCode, String adminPassword, String username, String fullName,
                             String initials, String password) {
        page.open("/");
        assertThat(page.path()).as("a new office starts at the one-time set-up").startsWith("/setup");
        WebElement setup = page.form("#setup-form");
        page.type(setup, "setupCode", setupCode);
        page.type(setup, "username", "admin");
        page.type(setup, "fullName", "Ada Byrne");
        page.type(setup, "initials", "AB");
        page.type(setup, "password", adminPassword);
        page.type(setup, "confirmPassword", adminPassword);
        page.press(setup, "Create the administrator");
        assertThat(page.path()).startsWith("/admin/users");

        WebElement add = page.form("#add-user");
        page.type(add, "username", username);
        page.type(add, "fullName", fullName);
        page.type(add, "initials", initials);
        page.choose(add, "role", "engineer");
        page.press(add, "Add user");
        String code = page.form("#setup-code code").getText().strip();
        page.press("Log out");

        page.open("/account/reset");
        WebElement reset = page.form("#reset-form");
        page.type(reset, "username", username);
        page.type(reset, "code", code);
        page.type(reset, "newPassword", password);
        page.type(reset, "confirmPassword", password);
        page.press(reset, "Set my password");
        assertThat(page.path()).startsWith("/login");

        WebElement login = page.form("#login-form");
        page.type(login, "username", username);
        page.type(login, "password", password);
        page.press(login, "Log in");
        page.follow("Continue");
        assertThat(page.path()).as("logged in as " + username).startsWith("/projects");
    }
}
