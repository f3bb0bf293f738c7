package com.baysheet.auth;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

class TokensTest {
    @Test
    void randomTokensAreLongAndDistinct() {
        assertThat(Tokens.random()).hasSize(43).matches("[A-Za-z0-9_-]+").isNotEqualTo(Tokens.random());
    }

    @Test
    void sha256OfAKnownText() {
        // FIPS 180-2, Appendix B.1: SHA-256("abc")
        assertThat(Tokens.sha256("abc")).isEqualTo("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    }

    @Test
    void comparesSecrets() {
        assertThat(Tokens.same("abc", "abc")).isTrue();
        assertThat(Tokens.same("abc", "abd")).isFalse();
        assertThat(Tokens.same(null, "abc")).isFalse();
    }
}
