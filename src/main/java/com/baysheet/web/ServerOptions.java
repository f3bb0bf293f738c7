package com.baysheet.web;

import com.baysheet.store.Database;

import java.nio.file.Path;
import java.util.Map;

/**
 * How the server runs, from flags, else environment variables, else defaults:
 * {@code --port N} (BAYSHEET_PORT, 7070), {@code --bind ADDR} (BAYSHEET_BIND, all interfaces),
 * {@code --data DIR} (BAYSHEET_DATA, ./baysheet-data), {@code --db-url JDBC_URL} (BAYSHEET_DB_URL, the H2
 * file database under the data directory), {@code --demo} (BAYSHEET_DEMO=true: load the demo projects
 * into an empty database), {@code --trusted-proxy ADDR} (BAYSHEET_TRUSTED_PROXY, none: the one address whose
 * X-Forwarded-For is believed for the client's address; from anyone else the header is ignored).
 */
public record ServerOptions(int port, String bind, Path dataDir, String dbUrl, boolean demo, String trustedProxy) {
    /** A flag the server cannot use; the message is one line for the terminal. */
    public static final class BadOption extends Exception {
        public BadOption(String message) { super(message); }
    }

    public static final String USAGE = "usage: baysheet [--port N] [--bind ADDR] [--data DIR] [--db-url JDBC_URL] [--demo] [--trusted-proxy ADDR] | calc FILE";

    public static ServerOptions parse(String[] args, Map<String, String> env) throws BadOption {
        String port = env.getOrDefault("BAYSHEET_PORT", "7070");
        String bind = env.getOrDefault("BAYSHEET_BIND", "0.0.0.0");
        String data = env.getOrDefault("BAYSHEET_DATA", "baysheet-data");
        String url = env.get("BAYSHEET_DB_URL");
        boolean demo = "true".equalsIgnoreCase(env.getOrDefault("BAYSHEET_DEMO", "false"));
        String proxy = env.get("BAYSHEET_TRUSTED_PROXY");
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--port" -> port = value(args, ++i, "--port");
                case "--bind" -> bind = value(args, ++i, "--bind");
                case "--data" -> data = value(args, ++i, "--data");
                case "--db-url" -> url = value(args, ++i, "--db-url");
                case "--demo" -> demo = true;
                case "--trusted-proxy" -> proxy = value(args, ++i, "--trusted-proxy");
                default -> throw new BadOption("unknown option " + args[i] + "; " + USAGE);
            }
        }
        Path dir = Path.of(data).toAbsolutePath().normalize();
        if (url != null && !url.startsWith("jdbc:")) throw new BadOption("--db-url must be a JDBC URL (jdbc:...), got " + url);
        if (proxy != null && !proxy.strip().matches("[0-9A-Fa-f.:]+"))
            throw new BadOption("--trusted-proxy must be an IP address (the proxy's, as the server sees it), got " + proxy);
        return new ServerOptions(port(port), bind, dir, url == null ? Database.h2Url(dir) : url, demo,
                proxy == null || proxy.isBlank() ? null : proxy.strip());
    }

    /** Whether the database is the embedded file under the data directory (which must then exist). */
    public boolean embedded() { return dbUrl.startsWith("jdbc:h2:file:"); }

    private static int port(String text) throws BadOption {
        try {
            int p = Integer.parseInt(text);
            if (p >= 0 && p <= 65535) return p;
        } catch (NumberFormatException e) {
            // reported below
        }
        throw new BadOption("--port must be a whole number from 0 to 65535, got " + text);
    }

    private static String value(String[] args, int i, String flag) throws BadOption {
        if (i >= args.length || args[i].startsWith("--")) throw new BadOption(flag + " needs a value; " + USAGE);
        return args[i];
    }
}
