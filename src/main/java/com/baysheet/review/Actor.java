package com.baysheet.review;

import com.baysheet.auth.Role;
import com.baysheet.auth.User;

/** Who is acting on a sheet: enough of the user for the rules and for the title block. */
public record Actor(long userId, String initials, Role role) {
    public Actor {
        if (initials == null || initials.isBlank()) throw new IllegalArgumentException("initials: an actor has initials");
        if (role == null) throw new IllegalArgumentException("role: an actor has a role");
    }

    public static Actor of(User u) {
        return new Actor(u.id(), u.initials(), u.role());
    }
}
