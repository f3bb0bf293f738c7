package com.baysheet.review;

import com.baysheet.auth.User;

/** Who asks for a review step and from where: the rules look at the actor, the audit trail at all of it. */
public record Caller(Actor actor, String username, String address) {
    public Caller {
        if (actor == null) throw new IllegalArgumentException("actor: required");
        username = username == null ? "" : username;
        address = address == null ? "" : address;
    }

    public static Caller of(User u, String address) {
        return new Caller(Actor.of(u), u.username(), address);
    }
}
