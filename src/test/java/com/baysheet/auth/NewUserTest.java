package com.baysheet.auth;

import com.baysheet.engine.InputError;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class NewUserTest {
    @Test
    void normalizesUsernameAndInitials() {
        NewUser u = new NewUser(" JSmith ", " Jo Smith ", "js", Role.CHECKER);
        assertThat(u.username()).isEqualTo("jsmith");
        assertThat(u.fullName()).isEqualTo("Jo Smith");
        assertThat(u.initials()).isEqualTo("JS");
    }

    @Test
    void namesTheFieldOfEachMistake() {
        assertThatThrownBy(() -> new NewUser("a", "Jo", "JS", Role.ENGINEER)).isInstanceOf(InputError.class)
                .hasMessageStartingWith("username:");
        assertThatThrownBy(() -> new NewUser("jo'; DROP TABLE app_user; --", "Jo", "JS", Role.ENGINEER))
                .hasMessageStartingWith("username:");
        assertThatThrownBy(() -> new NewUser("jo", " ", "JS", Role.ENGINEER)).hasMessageStartingWith("fullName:");
        assertThatThrownBy(() -> new NewUser("jo", "x".repeat(101), "JS", Role.ENGINEER)).hasMessageStartingWith("fullName:");
        assertThatThrownBy(() -> new NewUser("jo", "Jo", "J5", Role.ENGINEER)).hasMessageStartingWith("initials:");
        assertThatThrownBy(() -> new NewUser("jo", "Jo", "ABCDE", Role.ENGINEER)).hasMessageStartingWith("initials:");
        assertThatThrownBy(() -> new NewUser("jo", "Jo", "JS", null)).hasMessageStartingWith("role:");
    }

    @Test
    void rolesParseFromTheirLabels() {
        assertThat(Role.parse("role", "Checker")).isEqualTo(Role.CHECKER);
        assertThatThrownBy(() -> Role.parse("role", "owner")).hasMessageStartingWith("role:");
        assertThat(Role.ADMINISTRATOR.mayPrepare()).isFalse();
        assertThat(Role.ENGINEER.mayCheck()).isFalse();
        assertThat(Role.CHECKER.mayPrepare()).isTrue();
    }
}
