package com.baysheet.web;

import com.baysheet.auth.User;
import com.baysheet.store.Editor;
import com.baysheet.web.auth.Access;
import io.javalin.http.Context;

/** The logged-in user as the store's audit entry names them, with the address the request came from. */
final class Editors {
    private Editors() {}

    static Editor of(Context ctx) {
        User u = Access.user(ctx);
        return new Editor(u.id(), u.username(), ctx.ip());
    }
}
