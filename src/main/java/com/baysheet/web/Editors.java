package com.baysheet.web;

import com.baysheet.auth.User;
import com.baysheet.store.Editor;
import com.baysheet.web.auth.Access;
import io.javalin.http.Context;

/**
 * The logged-in user as the store's audit entry names them, with the address the request came from. Only routes
 * that admit a signed-in user change the model, so there is always one; without it the request is sent to log in.
 */
public final class Editors {
    private Editors() {}

    public static Editor of(Context ctx) {
        User u = Access.user(ctx);
        return new Editor(u.id(), u.username(), ctx.ip());
    }
}
