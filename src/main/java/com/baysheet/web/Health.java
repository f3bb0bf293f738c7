package com.baysheet.web;

import com.baysheet.store.Database;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import javax.sql.DataSource;
import java.util.Map;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.TimeUnit;

/**
 * {@code GET /health}: whether the server can do its work, not merely whether the process answers. The
 * database answers a {@code SELECT 1} within a few seconds: 200 {@code {"status":"up","database":"up"}};
 * otherwise (closed, unreachable, every connection held past the wait) 503 with {@code "database":"down"},
 * so a monitor or proxy sees an office that cannot save.
 */
public final class Health {
    static final int TIMEOUT_SECONDS = 3;

    private final DataSource ds;
    // one daemon thread: a hung connection attempt cannot hold a request thread past the timeout
    private final ExecutorService probe = Executors.newSingleThreadExecutor(r -> {
        Thread t = new Thread(r, "baysheet-health");
        t.setDaemon(true);
        return t;
    });

    public Health(DataSource ds) {
        this.ds = ds;
    }

    public void install(RoutesConfig r) {
        r.get("/health", this::answer, Admit.OPEN);
        // a monitor may ask with HEAD: the same check, the status alone
        r.head("/health", this::answer, Admit.OPEN);
    }

    void answer(Context ctx) {
        boolean up = databaseUp();
        ctx.status(up ? HttpStatus.OK : HttpStatus.SERVICE_UNAVAILABLE);
        ctx.json(Map.of("status", up ? "up" : "down", "database", up ? "up" : "down"));
    }

    boolean databaseUp() {
        CompletableFuture<Boolean> f = CompletableFuture.supplyAsync(() -> Database.answers(ds, TIMEOUT_SECONDS), probe);
        try {
            return f.get(TIMEOUT_SECONDS, TimeUnit.SECONDS);
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return false;
        } catch (Exception e) {
            f.cancel(true);
            return false;
        }
    }
}
