package com.baysheet.auth;

/**
 * A person who logs in. {@code initials} go on the title block as "checked by"; an inactive user can no
 * longer log in but stays named on the work and in the audit trail.
 */
public record User(long id, String username, String fullName, String initials, Role role, boolean active) {
    public User {
        if (username == null || fullName == null || initials == null || role == null)
            throw new IllegalArgumentException("a stored user has every field");
    }
}
