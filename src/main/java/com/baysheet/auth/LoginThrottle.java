package com.baysheet.auth;

import java.time.Duration;
import java.time.Instant;
import java.util.List;
import java.util.Optional;

/**
 * Slows guessing: after {@code maxFailures} failed logins within {@code window}, further attempts are
 * refused until the oldest of those failures leaves the window. Counted per username and, with a higher
 * limit, per network address (one machine trying many names).
 */
public record LoginThrottle(int maxFailures, int maxFailuresPerAddress, Duration window) {
    public static final LoginThrottle OFFICE = new LoginThrottle(5, 20, Duration.ofMinutes(15));

    public LoginThrottle {
        if (maxFailures < 1) throw new IllegalArgumentException("maxFailures: must be at least 1 (got " + maxFailures + ")");
        if (maxFailuresPerAddress < maxFailures)
            throw new IllegalArgumentException("maxFailuresPerAddress: must be at least maxFailures (got " + maxFailuresPerAddress + ")");
        if (window == null || window.isNegative() || window.isZero())
            throw new IllegalArgumentException("window: must be a positive duration (got " + window + ")");
    }

    /** Failures to look at: those since this instant. */
    public Instant since(Instant now) { return now.minus(window); }

    /**
     * Until when attempts are refused, given the failure times (any order) for one username and for one
     * address; empty when an attempt may go ahead.
     */
    public Optional<Instant> lockedUntil(List<Instant> byUsername, List<Instant> byAddress, Instant now) {
        Optional<Instant> a = until(byUsername, maxFailures, now);
        Optional<Instant> b = until(byAddress, maxFailuresPerAddress, now);
        if (a.isEmpty()) return b;
        if (b.isEmpty()) return a;
        return Optional.of(a.get().isAfter(b.get()) ? a.get() : b.get());
    }

    private Optional<Instant> until(List<Instant> failures, int max, Instant now) {
        List<Instant> recent = failures.stream().filter(t -> t.isAfter(since(now))).sorted().toList();
        if (recent.size() < max) return Optional.empty();
        // The attempt is allowed again once enough failures have aged out to leave max - 1 in the window.
        return Optional.of(recent.get(recent.size() - max).plus(window));
    }
}
