package com.baysheet.web;

import com.baysheet.engine.InputError;
import com.baysheet.store.TooBusy;
import com.baysheet.store.Duplicate;
import com.baysheet.store.NotFound;
import com.baysheet.store.StaleVersion;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;
import org.eclipse.jetty.http.HttpException;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

import java.util.Map;
import java.util.UUID;

/**
 * Every exception mapped to a response, in this one place: an unknown id is a 404 page, a user's mistake
 * a 400 with the field, a stale version a 409, and anything else a plain fault page with a reference to
 * the log. No stack trace reaches a user. Under /api the same answers come as JSON.
 */
final class Errors {
    private static final Logger LOG = LoggerFactory.getLogger(Errors.class);

    /** An error of the API: what went wrong, and for a user's mistake the field and the value refused. */
    record ApiError(int status, String error, String field, String value, String problem) {}

    /** Marks a response this class has written, so the 404 stage does not write it again. */
    private static final String ANSWERED = "baysheet.error-answered";

    private Errors() {}

    static void install(RoutesConfig routes) {
        routes.exception(NotFound.class, (e, ctx) -> notFound(ctx, e.getMessage()));
        routes.exception(InputError.class, (e, ctx) -> respond(ctx, 400, "errors/bad-input",
                new ApiError(400, e.getMessage(), e.field(), e.value(), e.problem())));
        routes.exception(Duplicate.class, (e, ctx) -> respond(ctx, 409, "errors/bad-input",
                new ApiError(409, e.getMessage(), e.field(), e.value(), e.problem())));
        routes.exception(com.baysheet.store.Archived.class, (e, ctx) -> respond(ctx, 409, "errors/bad-input",
                new ApiError(409, e.getMessage(), "project", "archived", e.getMessage())));
        routes.exception(TooBusy.class, (e, ctx) -> {
            ctx.header("Retry-After", String.valueOf(e.retryAfterSeconds()));
            respond(ctx, 429, "errors/bad-input", new ApiError(429, e.getMessage(), e.limit(), null, e.getMessage()));
        });
        routes.exception(StaleVersion.class, (e, ctx) -> respond(ctx, 409, "errors/conflict",
                new ApiError(409, e.getMessage(), "version", String.valueOf(e.given()), "stale version; now " + e.current())));
        routes.exception(Exception.class, (e, ctx) -> {
            int unreadable = unreadable(e);
            if (unreadable > 0) {
                respond(ctx, unreadable, "errors/bad-input", new ApiError(unreadable, unreadable == 413
                        ? "the request is larger than any form or sheet this server takes" : "the request could not be read",
                        null, null, null));
                return;
            }
            String ref = UUID.randomUUID().toString().substring(0, 8);
            LOG.error("fault {} on {} {}", ref, ctx.method(), ctx.path(), e);
            respond(ctx, 500, "errors/fault", new ApiError(500, "internal fault, reference " + ref, null, null, null));
        });
    }

    /** Whether this class has answered the request already (a 404 for an unknown id, say). */
    static boolean answered(Context ctx) {
        return ctx.attribute(ANSWERED) != null;
    }

    /**
     * The 4xx status of a request Jetty could not read (a body past the size limits, a broken form or
     * multipart body), found anywhere in the cause chain (the innermost, most specific one); 0 for anything else.
     */
    private static int unreadable(Throwable e) {
        int code = 0;
        for (Throwable t = e; t != null && t.getCause() != t; t = t.getCause())
            if (t instanceof HttpException h && h.getCode() >= 400 && h.getCode() < 500) code = h.getCode();
        return code;
    }

    static void notFound(Context ctx, String message) {
        respond(ctx, 404, "errors/not-found", new ApiError(404, message, null, null, null));
    }

    private static void respond(Context ctx, int status, String template, ApiError body) {
        ctx.attribute(ANSWERED, true);
        if (ctx.path().startsWith("/api/") || ctx.path().equals("/api")) {
            Json.send(ctx, status, body);
        } else {
            ctx.status(HttpStatus.forStatus(status));
            ctx.render(template, Map.of("error", body));
        }
    }
}
