package com.baysheet.web;

import com.baysheet.auth.User;
import com.baysheet.store.Editor;
import com.baysheet.store.auth.SignedIn;
import com.baysheet.web.auth.Access;
import io.javalin.http.Context;

/**
 * The logged-in user as the store's audit entry names them, with the address the request came from. A server
 * built without sign-off (the bare server of the page tests) has no user: its entries name nobody.
 */
public final class Editors {
    /** The username an entry carries when the server runs without sign-off. */
    static final String NOBODY = "(no sign-in)";

    private Editors() {}

    public static Editor of(Context ctx) {
        SignedIn s = ctx.attribute(Access.SIGNED_IN);
        if (s == null) return new Editor(null, NOBODY, ctx.ip());
        User u = s.user();
        return new Editor(u.id(), u.username(), ctx.ip());
    }
}
