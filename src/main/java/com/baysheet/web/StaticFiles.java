package com.baysheet.web;

import com.baysheet.auth.Tokens;
import com.baysheet.web.auth.Admit;
import io.javalin.config.RoutesConfig;
import io.javalin.http.Context;
import io.javalin.http.HttpStatus;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import java.util.regex.Pattern;

/**
 * {@code GET /static/NAME}: the stylesheet and page scripts of {@code static/}, read from the jar once each and kept,
 * with a strong ETag so that a browser asking again with {@code If-None-Match} is told 304. A route of our own rather
 * than the web server's resource handler, which mounts the whole jar (some 21,000 entries) as a file system at start,
 * about a fifth of a second of it, to serve four small files. Only a plain file name with a known type is looked up,
 * and only a file that exists is kept, so no request can grow what is kept; anything else is a 404.
 */
final class StaticFiles {
    private static final Pattern NAME = Pattern.compile("[a-z0-9][a-z0-9-]*\\.(css|js)");
    private static final Map<String, String> TYPES = Map.of("css", "text/css; charset=utf-8", "js", "text/javascript; charset=utf-8");

    /** A file as served: its bytes, type and tag. */
    record File(byte[] bytes, String type, String etag) {}

    private final Map<String, File> kept = new ConcurrentHashMap<>();

    void install(RoutesConfig r) {
        r.get("/static/{name}", ctx -> serve(ctx, true), Admit.OPEN);
        r.head("/static/{name}", ctx -> serve(ctx, false), Admit.OPEN);
    }

    private void serve(Context ctx, boolean body) {
        File f = file(ctx.pathParam("name"));
        if (f == null) {
            ctx.status(HttpStatus.NOT_FOUND); // answered as any unknown path (Office's 404 handler)
            return;
        }
        ctx.header("Cache-Control", "max-age=0");
        ctx.header("ETag", f.etag());
        if (PageCache.matches(ctx.header("If-None-Match"), f.etag())) {
            ctx.status(HttpStatus.NOT_MODIFIED);
            return;
        }
        ctx.contentType(f.type());
        if (body) ctx.result(f.bytes());
        else ctx.header("Content-Length", Integer.toString(f.bytes().length));
    }

    /** The file of that name under static/, or null where the name is not one or there is none. */
    File file(String name) {
        if (name == null || !NAME.matcher(name).matches()) return null;
        File f = kept.get(name);
        if (f != null) return f;
        try (InputStream in = StaticFiles.class.getClassLoader().getResourceAsStream("static/" + name)) {
            if (in == null) return null;
            byte[] bytes = in.readAllBytes();
            f = new File(bytes, TYPES.get(name.substring(name.lastIndexOf('.') + 1)), tag(bytes));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        kept.putIfAbsent(name, f);
        return f;
    }

    private static String tag(byte[] bytes) {
        return "\"" + Tokens.sha256(bytes).substring(0, 24) + "\"";
    }
}
