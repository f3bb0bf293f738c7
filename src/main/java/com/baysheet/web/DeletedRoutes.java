package com.baysheet.web;

import com.baysheet.store.DeletedItems;
import com.baysheet.store.Store;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;

import java.util.HashMap;
import java.util.Map;

/**
 * The administrator's list of what was deleted in the last 30 days ({@link DeletedItems}), each with a button that
 * restores it; a restore the model refuses (a level of that name or elevation exists now) is shown above the list.
 */
record DeletedRoutes(Store store) {
    void install(RoutesConfig r) {
        r.get("/admin/deleted", ctx -> render(ctx, Form.filled(Map.of())), Admit.ADMINISTRATOR);
        r.post("/admin/deleted/{item}/restore", this::restore, Admit.ADMINISTRATOR);
    }

    void restore(Context ctx) {
        long item = Ids.item(ctx);
        Form form = Form.of(ctx);
        form.attempt(() -> store.deleted().restore(Editors.of(ctx), item))
                .ifPresentOrElse(label -> Pages.seeOther(ctx, Saved.RESTORED.after("/admin/deleted")),
                        () -> render(ctx.status(form.stale() ? 409 : 422), form));
    }

    private void render(Context ctx, Form form) {
        Map<String, Object> m = new HashMap<>();
        m.put("items", store.deleted().list());
        m.put("days", DeletedItems.KEPT.toDays());
        m.put("form", form);
        ctx.render("auth/deleted", m);
    }
}
