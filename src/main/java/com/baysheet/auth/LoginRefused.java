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

    public static LoginRefused throttled(Instant until) {
        return new LoginRefused("Too many failed logins: wait a few minutes and try again.", until);
    }

    public Optional<Instant> retryAfter() { return Optional.ofNullable(retryAfter); }
}
