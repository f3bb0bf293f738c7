package com.baysheet.web;

import com.baysheet.store.Store;
import io.javalin.Javalin;
import io.javalin.config.RoutesConfig;
import io.javalin.config.SizeUnit;
import io.javalin.http.staticfiles.Location;

import java.util.function.Consumer;

/**
 * The office server: static files, templates, the exception mapping, a before-filter stage, and the routes
 * of each feature. Features add routes in their own class; access control (login, roles, review) adds its
 * filter in {@link #filters}, which runs before every route.
 */
public final class Server {
    private Server() {}

    /** A configured server, not yet started: {@code start(host, port)} or {@code start(0)} for a random port. */
    public static Javalin create(Store store) {
        return create(store, null);
    }

    /** The same with access control (login, roles, the sheet check) installed ahead of every route. */
    public static Javalin create(Store store, Consumer<RoutesConfig> access) {
        return create(store, access, null);
    }

    /**
     * The same, believing X-Forwarded-For only on requests from {@code trustedProxy} (null: from nobody), so
     * the address the throttle counts and the audit trail records cannot be chosen by the client.
     */
    public static Javalin create(Store store, Consumer<RoutesConfig> access, String trustedProxy) {
        return create(store, access, trustedProxy, false);
    }

    /**
     * The same, {@code behindTls} when browsers reach it through an HTTPS proxy: cookies Secure and
     * Strict-Transport-Security on every response ({@link Headers}).
     */
    public static Javalin create(Store store, Consumer<RoutesConfig> access, String trustedProxy, boolean behindTls) {
        return Javalin.create(cfg -> {
            cfg.startup.showJavalinBanner = false;
            cfg.contextResolver.ip = ctx -> ClientAddress.of(ctx.req().getRemoteAddr(), ctx.header("X-Forwarded-For"), trustedProxy);
            // request-size limits: a form or JSON body is a few kilobytes (a 413 past 1 MB, before it is read
            // whole); the only upload is a PDF to verify, and no sheet or package comes near 50 MB
            cfg.http.maxRequestSize = 1_000_000L;
            cfg.jetty.multipartConfig.maxFileSize(50, SizeUnit.MB);
            cfg.jetty.multipartConfig.maxTotalRequestSize(51, SizeUnit.MB);
            cfg.fileRenderer(new Views());
            cfg.staticFiles.add(sf -> {
                sf.hostedPath = "/static";
                sf.directory = "/static";
                sf.location = Location.CLASSPATH;
            });
            // ahead of the access filter, which may halt a request with a redirect that needs them too
            cfg.routes.before(ctx -> Headers.apply(ctx, behindTls));
            cfg.routes.after(Headers::charset);
            if (access != null) access.accept(cfg.routes);
            filters(cfg.routes);
            Errors.install(cfg.routes);
            new ModelFileRoutes(store).install(cfg.routes);
            new ProjectRoutes(store).install(cfg.routes);
            new LevelRoutes(store).install(cfg.routes);
            new TypicalRoutes(store).install(cfg.routes);
            new UnitRoutes(store).install(cfg.routes);
            new BayRoutes(store).install(cfg.routes);
            new LineLoadRoutes(store).install(cfg.routes);
            new PlanRoutes(store).install(cfg.routes);
            new MemberRoutes(store).install(cfg.routes);
            new TakeDownRoutes(store).install(cfg.routes);
            new OccupancyRoutes(store).install(cfg.routes);
            new ApiRoutes(store).install(cfg.routes);
            new ApiTypicalRoutes(store).install(cfg.routes);
            new ApiResultRoutes(store).install(cfg.routes);
        });
    }

    /** Before-filters, in order. An access filter goes first here and may halt a request. */
    private static void filters(RoutesConfig routes) {
        // pages show live project state: never let a browser or proxy reuse an old copy
        routes.before(ctx -> {
            if (!ctx.path().startsWith("/static/")) ctx.header("Cache-Control", "no-store");
        });

        routes.before(Saved::onRequest);
    }
}
