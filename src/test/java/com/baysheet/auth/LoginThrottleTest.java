package com.baysheet.auth;

import org.junit.jupiter.api.Test;

import java.time.Duration;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class LoginThrottleTest {
    private final LoginThrottle throttle = new LoginThrottle(3, 5, Duration.ofSeconds(30), Duration.ofMinutes(15), Duration.ofHours(24));

    @Test
    void theFirstFailuresCostNothing() {
        assertThat(throttle.waitForUser(1)).isZero();
        assertThat(throttle.waitForUser(2)).isZero();
        assertThat(throttle.waitForAddress(4)).isZero();
    }

    @Test
    void eachFurtherFailureDoublesTheWaitUpToTheCap() {
        assertThat(throttle.waitForUser(3)).isEqualTo(Duration.ofSeconds(30));
        assertThat(throttle.waitForUser(4)).isEqualTo(Duration.ofSeconds(60));
        assertThat(throttle.waitForUser(5)).isEqualTo(Duration.ofSeconds(120));
        assertThat(throttle.waitForUser(9)).isEqualTo(Duration.ofMinutes(15)); // 30 s × 64 = 32 min, capped
        assertThat(throttle.waitForUser(Integer.MAX_VALUE)).isEqualTo(Duration.ofMinutes(15));
        assertThat(throttle.waitForAddress(5)).isEqualTo(Duration.ofSeconds(30));
    }

    @Test
    void refusesNonsense() {
        assertThatThrownBy(() -> new LoginThrottle(0, 5, Duration.ofSeconds(1), Duration.ofSeconds(2), Duration.ofHours(1)))
                .hasMessageStartingWith("freeFailures:");
        assertThatThrownBy(() -> new LoginThrottle(3, 2, Duration.ofSeconds(1), Duration.ofSeconds(2), Duration.ofHours(1)))
                .hasMessageStartingWith("freeFailuresPerAddress:");
        assertThatThrownBy(() -> new LoginThrottle(3, 5, Duration.ofSeconds(3), Duration.ofSeconds(2), Duration.ofHours(1)))
                .hasMessageStartingWith("maxWait:");
    }
}
