package com.baysheet.auth;

import java.time.Duration;

/**
 * Slows guessing without a lockout anyone can renew: the first {@code freeFailures} failed logins in a row
 * cost nothing; each further one makes the next attempt wait, starting at {@code firstWait} and doubling
 * with every failure, up to {@code maxWait}. Attempts made during a wait are refused (even with the right
 * password) and do not lengthen it. Counted per username and, with more free failures, per client address
 * (one machine trying many names). A count untouched for {@code forgetAfter} starts again from nothing.
 */
public record LoginThrottle(int freeFailures, int freeFailuresPerAddress, Duration firstWait, Duration maxWait,
                            Duration forgetAfter) {
    public static final LoginThrottle OFFICE = new LoginThrottle(5, 20, Duration.ofSeconds(30), Duration.ofMinutes(15),
            Duration.ofHours(24));

    public LoginThrottle {
        if (freeFailures < 1) throw new IllegalArgumentException("freeFailures: must be at least 1 (got " + freeFailures + ")");
        if (freeFailuresPerAddress < freeFailures)
            throw new IllegalArgumentException("freeFailuresPerAddress: must be at least freeFailures (got " + freeFailuresPerAddress + ")");
        positive("firstWait", firstWait);
        positive("maxWait", maxWait);
        positive("forgetAfter", forgetAfter);
        if (maxWait.compareTo(firstWait) < 0) throw new IllegalArgumentException("maxWait: must be at least firstWait (got " + maxWait + ")");
    }

    /** The wait a username must sit out after this many failures in a row. */
    public Duration waitForUser(int failures) { return waitAfter(failures, freeFailures); }

    /** The wait a client address must sit out after this many failures in a row. */
    public Duration waitForAddress(int failures) { return waitAfter(failures, freeFailuresPerAddress); }

    private Duration waitAfter(int failures, int free) {
        if (failures < free) return Duration.ZERO;
        int doublings = Math.min(failures - free, 30); // 2^30 × any wait is past every cap: no overflow
        Duration w = firstWait.multipliedBy(1L << doublings);
        return w.compareTo(maxWait) > 0 ? maxWait : w;
    }

    private static void positive(String field, Duration d) {
        if (d == null || d.isNegative() || d.isZero())
            throw new IllegalArgumentException(field + ": must be a positive duration (got " + d + ")");
    }
}
