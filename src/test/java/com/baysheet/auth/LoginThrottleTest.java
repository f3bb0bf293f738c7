package com.baysheet.auth;

import org.junit.jupiter.api.Test;

import java.time.Duration;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class LoginThrottleTest {
    private static final Instant NOW = Instant.parse("2026-03-02T08:00:00Z");
    private final LoginThrottle throttle = new LoginThrottle(3, 5, Duration.ofMinutes(15));

    @Test
    void allowsUpToTheLimitLessOne() {
        assertThat(throttle.lockedUntil(minutesAgo(1, 2), List.of(), NOW)).isEmpty();
    }

    @Test
    void locksAtTheLimitUntilTheOldestFailureAgesOut() {
        assertThat(throttle.lockedUntil(minutesAgo(1, 2, 10), List.of(), NOW)).contains(NOW.plus(Duration.ofMinutes(5)));
    }

    @Test
    void failuresOutsideTheWindowDoNotCount() {
        assertThat(throttle.lockedUntil(minutesAgo(1, 2, 16, 30), List.of(), NOW)).isEmpty();
    }

    @Test
    void oneAddressTryingManyNamesIsLockedToo() {
        assertThat(throttle.lockedUntil(List.of(), minutesAgo(1, 2, 3, 4), NOW)).isEmpty();
        assertThat(throttle.lockedUntil(List.of(), minutesAgo(1, 2, 3, 4, 5), NOW)).contains(NOW.plus(Duration.ofMinutes(10)));
    }

    @Test
    void theLaterOfTwoLocksHolds() {
        assertThat(throttle.lockedUntil(minutesAgo(1, 2, 3), minutesAgo(1, 2, 3, 4, 14), NOW))
                .contains(NOW.plus(Duration.ofMinutes(12)));
    }

    private static List<Instant> minutesAgo(int... m) {
        List<Instant> out = new ArrayList<>();
        for (int x : m) out.add(NOW.minus(Duration.ofMinutes(x)));
        return out;
    }
}
