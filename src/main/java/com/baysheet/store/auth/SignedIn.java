package com.baysheet.store.auth;

import com.baysheet.auth.User;

import java.time.Instant;

/**
 * A request's login: the user, the session's form token and when it lapses. {@code token} is the cookie
 * value, known only on the request that presented it (or on the login that created it).
 * {@code mustChangePassword}: the password was set by someone else; only the password change is open.
 */
public record SignedIn(User user, String token, String csrfToken, Instant expiresAt, int failedAttempts,
                       boolean mustChangePassword) {
    public SignedIn(User user, String token, String csrfToken, Instant expiresAt) {
        this(user, token, csrfToken, expiresAt, 0, false);
    }

    /** The same login, telling how many failed or refused attempts were made on the username before it. */
    public SignedIn withFailedAttempts(int n) {
        return new SignedIn(user, token, csrfToken, expiresAt, n, mustChangePassword);
    }

    /** The same login, whose password was set by someone else and must be changed before going on. */
    public SignedIn withMustChangePassword(boolean must) {
        return new SignedIn(user, token, csrfToken, expiresAt, failedAttempts, must);
    }
}
