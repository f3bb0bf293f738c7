package com.baysheet.auth;

import com.baysheet.engine.InputError;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class PasswordsTest {
    private final Passwords passwords = new Passwords(4);

    @Test
    void hashesAreSaltedBcryptAndVerify() {
        String a = passwords.hash("correct horse battery");
        String b = passwords.hash("correct horse battery");
        assertThat(a).startsWith("$2").isNotEqualTo(b).doesNotContain("correct");
        assertThat(passwords.matches("correct horse battery", a)).isTrue();
        assertThat(passwords.matches("correct horse batterz", a)).isFalse();
    }

    @Test
    void anUnknownUserNeverMatches() {
        assertThat(passwords.matches("anything at all", null)).isFalse();
        assertThat(passwords.matches(null, passwords.hash("correct horse battery"))).isFalse();
    }

    @Test
    void theDecoyAnUnknownUserIsCheckedAgainstCostsWhatAPasswordOfTheSameStrengthDoes() {
        // the kept decoy at the office strength is a real bcrypt hash of the decoy password, at that strength
        assertThat(new org.springframework.security.crypto.bcrypt.BCryptPasswordEncoder(Passwords.DEFAULT_STRENGTH)
                .matches(Passwords.DECOY_PASSWORD, Passwords.DECOY_AT_DEFAULT)).isTrue();
        assertThat(new Passwords(Passwords.DEFAULT_STRENGTH).decoyStrength()).isEqualTo(Passwords.DEFAULT_STRENGTH);
        assertThat(passwords.decoyStrength()).isEqualTo(4);
    }

    @Test
    void refusesShortAndOverlongPasswordsNamingTheField() {
        assertThatThrownBy(() -> Passwords.acceptable("newPassword", "short")).isInstanceOf(InputError.class)
                .hasMessageStartingWith("newPassword:").hasMessageContaining("at least 10");
        assertThatThrownBy(() -> Passwords.acceptable("newPassword", "x".repeat(73))).hasMessageContaining("72 bytes");
        assertThatThrownBy(() -> Passwords.acceptable("newPassword", "é".repeat(37))).as("74 bytes in UTF-8")
                .hasMessageContaining("72 bytes");
        assertThatThrownBy(() -> Passwords.acceptable("newPassword", " ".repeat(12))).hasMessageContaining("spaces");
        assertThat(Passwords.acceptable("p", "x".repeat(72))).hasSize(72);
    }

    @Test
    void aPasswordTooLongForBcryptNeverMatchesByItsPrefix() {
        String h = passwords.hash("y".repeat(72));
        assertThat(passwords.matches("y".repeat(72) + "extra", h)).isFalse();
    }

    @Test
    void refusesTheCommonestPasswordsWhateverTheirCase() {
        for (String common : new String[] {"1234567890", "Password123", "QWERTYUIOP", " iloveyou1 "})
            assertThatThrownBy(() -> Passwords.acceptable("password", common)).as(common).isInstanceOf(InputError.class)
                    .hasMessageStartingWith("password: is one of the most common passwords; choose another");
        assertThat(Passwords.acceptable("password", "tern street clinic roof")).isEqualTo("tern street clinic roof");
    }

    @Test
    void refusesTheUsernameAndTheFirmsName() {
        assertThatThrownBy(() -> Passwords.acceptable("newPassword", "Marisol.Quenby", "marisol.quenby", "Quenby Structures"))
                .isInstanceOf(InputError.class).hasMessageStartingWith("newPassword:").hasMessageContaining("username");
        assertThatThrownBy(() -> Passwords.acceptable("password", "quenbystructures", "mquenby", "Quenby Structures"))
                .isInstanceOf(InputError.class).hasMessageStartingWith("password:").hasMessageContaining("firm's name");
        assertThat(Passwords.acceptable("password", "quenby structures 7", "mquenby", "Quenby Structures"))
                .isEqualTo("quenby structures 7");
    }
}
