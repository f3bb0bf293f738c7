package com.baysheet.store;

import com.baysheet.review.Caller;

/**
 * Who changes a project, as its audit entry names them: the user's id and username and the address the
 * request came from. The demo loader writes as {@link #DEMO}, no user at all.
 */
public record Editor(Long userId, String username, String address) {
    public static final Editor DEMO = new Editor(null, "demo", "");

    public Editor {
        if (username == null || username.isBlank()) throw new IllegalArgumentException("username: an editor has a name");
        address = address == null ? "" : address;
    }

    public static Editor of(Caller c) {
        return new Editor(c.actor().userId(), c.username(), c.address());
    }
}
