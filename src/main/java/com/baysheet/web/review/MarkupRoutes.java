package com.baysheet.web.review;

import com.baysheet.issue.SheetSubject;
import com.baysheet.store.NotFound;
import com.baysheet.store.Store;
import com.baysheet.store.review.ReviewMarkups;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import static com.baysheet.web.review.ReviewRoutes.SHEETS;
import static com.baysheet.web.review.ReviewRoutes.caller;
import static com.baysheet.web.review.ReviewRoutes.version;

/**
 * Markups on a sheet or a package: add one on an input, a step or the whole sheet (on a package: one of its
 * sheets, or the package as a whole); reply; resolve or reopen.
 */
public record MarkupRoutes(Store store, ReviewMarkups markups) {
    public void install(RoutesConfig r) {
        for (String base : SHEETS) {
            r.post(base + "/markups", this::add, Admit.PREPARER);
            r.post(base + "/markups/{markup}/reply", this::reply, Admit.PREPARER);
            r.post(base + "/markups/{markup}/resolve", ctx -> resolve(ctx, true), Admit.PREPARER);
            r.post(base + "/markups/{markup}/reopen", ctx -> resolve(ctx, false), Admit.PREPARER);
        }
    }

    void add(Context ctx) {
        SheetSubject s = SheetContext.of(store, ctx);
        long id = markups.add(s.ref(), caller(ctx), ctx.formParam("target"), ctx.formParam("text"));
        ctx.redirect(s.path() + "#markup-" + id, HttpStatus.SEE_OTHER);
    }

    void reply(Context ctx) {
        SheetSubject s = SheetContext.of(store, ctx);
        markups.reply(s.ref(), markup(ctx), caller(ctx), ctx.formParam("text"));
        ctx.redirect(s.path() + "#markup-" + markup(ctx), HttpStatus.SEE_OTHER);
    }

    void resolve(Context ctx, boolean resolved) {
        SheetSubject s = SheetContext.of(store, ctx);
        markups.resolve(s.ref(), markup(ctx), version(ctx), caller(ctx), resolved);
        ctx.redirect(s.path() + "#markup-" + markup(ctx), HttpStatus.SEE_OTHER);
    }

    private static long markup(Context ctx) {
        String text = ctx.pathParam("markup");
        try {
            return Long.parseLong(text);
        } catch (NumberFormatException e) {
            throw new NotFound("markup", text);
        }
    }
}
