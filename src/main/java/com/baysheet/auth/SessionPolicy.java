package com.baysheet.auth;

import java.time.Duration;
import java.time.Instant;

/**
 * How long a login lasts: it lapses after {@code idle} without a request, and in any case {@code absolute}
 * after the login, however busy the user. Each request slides the idle expiry forward, never past the cap.
 */
public record SessionPolicy(Duration idle, Duration absolute) {
    /** A working day at a desk: two idle hours, twelve hours at most. */
    public static final SessionPolicy OFFICE = new SessionPolicy(Duration.ofHours(2), Duration.ofHours(12));

    public SessionPolicy {
        if (idle == null || idle.isNegative() || idle.isZero())
            throw new IllegalArgumentException("idle: must be a positive duration (got " + idle + ")");
        if (absolute == null || absolute.compareTo(idle) < 0)
            throw new IllegalArgumentException("absolute: must be at least the idle time " + idle + " (got " + absolute + ")");
    }

    /** When a session created at {@code created} and last used at {@code now} expires. */
    public Instant expiresAt(Instant created, Instant now) {
        Instant slid = now.plus(idle);
        Instant cap = created.plus(absolute);
        return slid.isBefore(cap) ? slid : cap;
    }
}
