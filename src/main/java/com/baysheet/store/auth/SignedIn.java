package com.baysheet.store.auth;

import com.baysheet.auth.User;

import java.time.Instant;

/**
 * A request's login: the user, the session's form token and when it lapses. {@code token} is the cookie
 * value, known only on the request that presented it (or on the login that created it).
 */
public record SignedIn(User user, String token, String csrfToken, Instant expiresAt) {}
