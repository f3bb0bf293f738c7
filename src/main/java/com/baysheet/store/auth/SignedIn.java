package com.baysheet.store.auth;

import com.baysheet.auth.User;

import java.time.Instant;
import java.util.List;

/**
 * A request's login: the user, the session's form token and when it lapses. {@code token} is the cookie
 * value, known only on the request that presented it (or on the login that created it).
 * {@code mustChangePassword}: the password was set by someone else; only the password change is open.
 * {@code notices}: what the person is told at this login (password reset codes made for them).
 */
public record SignedIn(User user, String token, String csrfToken, Instant expiresAt, int failedAttempts,
                       boolean mustChangePassword, List<String> notices) {
    public SignedIn {
        notices = notices == null ? List.of() : List.copyOf(notices);
    }

    public SignedIn(User user, String token, String csrfToken, Instant expiresAt, int failedAttempts, boolean mustChangePassword) {
        this(user, token, csrfToken, expiresAt, failedAttempts, mustChangePassword, List.of());
    }

    public SignedIn(User user, String token, String csrfToken, Instant expiresAt) {
        this(user, token, csrfToken, expiresAt, 0, false);
    }

    /** The same login, with what the person must be told at it. */
    public SignedIn withNotices(List<String> n) {
        return new SignedIn(user, token, csrfToken, expiresAt, failedAttempts, mustChangePassword, n);
    }

    /** The same login, telling how many failed or refused attempts were made on the username before it. */
    public SignedIn withFailedAttempts(int n) {
        return new SignedIn(user, token, csrfToken, expiresAt, n, mustChangePassword, notices);
    }

    /** The same login, whose password was set by someone else and must be changed before going on. */
    public SignedIn withMustChangePassword(boolean must) {
        return new SignedIn(user, token, csrfToken, expiresAt, failedAttempts, must, notices);
    }
}
