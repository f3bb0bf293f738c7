package com.baysheet.auth;

import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.time.Instant;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class SessionPolicyTest {
    private static final Instant LOGIN = Instant.parse("2026-03-02T08:00:00Z");
    private final SessionPolicy policy = new SessionPolicy(Duration.ofHours(2), Duration.ofHours(12));

    @Test
    void eachRequestSlidesTheIdleExpiry() {
        assertThat(policy.expiresAt(LOGIN, LOGIN)).isEqualTo(LOGIN.plus(Duration.ofHours(2)));
        assertThat(policy.expiresAt(LOGIN, LOGIN.plus(Duration.ofHours(3)))).isEqualTo(LOGIN.plus(Duration.ofHours(5)));
    }

    @Test
    void neverPastTheCap() {
        assertThat(policy.expiresAt(LOGIN, LOGIN.plus(Duration.ofHours(11)))).isEqualTo(LOGIN.plus(Duration.ofHours(12)));
    }

    @Test
    void refusesNonsense() {
        assertThatThrownBy(() -> new SessionPolicy(Duration.ZERO, Duration.ofHours(1))).hasMessageStartingWith("idle:");
        assertThatThrownBy(() -> new SessionPolicy(Duration.ofHours(2), Duration.ofHours(1))).hasMessageStartingWith("absolute:");
    }
}
