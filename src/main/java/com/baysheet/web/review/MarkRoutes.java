package com.baysheet.web.review;

import com.baysheet.store.Store;
import com.baysheet.issue.SheetSubject;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import static com.baysheet.web.review.ReviewRoutes.MARK;
import static com.baysheet.web.review.ReviewRoutes.caller;

/** Renaming a typical member's mark (the firm's own scheme, "B1" to "B1A"): unique within the project. */
public record MarkRoutes(Store store) {
    public void install(RoutesConfig r) {
        r.post(MARK + "/rename", this::rename, Admit.PREPARER);
    }

    void rename(Context ctx) {
        SheetSubject.OfMark s = SheetContext.mark(store, ctx);
        store.marks().rename(s.ref().projectId(), s.sheet().mark().id(), ctx.formParam("mark"), caller(ctx));
        ctx.redirect(s.path(), HttpStatus.SEE_OTHER);
    }
}
