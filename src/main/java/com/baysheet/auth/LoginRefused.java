package com.baysheet.auth;

import java.time.Instant;
import java.util.Optional;

/**
 * A login that did not succeed. The message never says whether the username exists; a throttled attempt
 * says when to try again.
 */
public final class LoginRefused extends RuntimeException {
    private final Instant retryAfter;

    private LoginRefused(String message, Instant retryAfter) {
        super(message);
        this.retryAfter = retryAfter;
    }

    public static LoginRefused badCredentials() {
        return new LoginRefused("That username and password do not match an active user.", null);
    }

    /** Refused during a wait, even with the right password: says how long is left, by the store's clock. */
    public static LoginRefused throttled(Instant until, Instant now) {
        long s = Math.max(1, (java.time.Duration.between(now, until).toMillis() + 999) / 1000);
        return new LoginRefused("Too many failed logins: try again in " + s + " s.", until);
    }

    public Optional<Instant> retryAfter() { return Optional.ofNullable(retryAfter); }
}
