package com.baysheet.web;

import com.baysheet.store.Database;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;

/**
 * How the server runs, from flags, else environment variables, else defaults:
 * {@code --port N} (BAYSHEET_PORT, 7070), {@code --bind ADDR} (BAYSHEET_BIND, 127.0.0.1: this machine only;
 * 0.0.0.0 for the office network), {@code --data DIR} (BAYSHEET_DATA, ./baysheet-data), {@code --db-url JDBC_URL}
 * (BAYSHEET_DB_URL, the H2 file database under the data directory), {@code --db-password-file FILE}
 * (BAYSHEET_DB_PASSWORD_FILE, or the password itself in BAYSHEET_DB_PASSWORD: kept off the command line, where
 * any user of the machine can read it), {@code --demo} (BAYSHEET_DEMO=true: load the demo projects into an
 * empty database), {@code --trusted-proxy ADDR} (BAYSHEET_TRUSTED_PROXY, none: the one address whose
 * X-Forwarded-For is believed for the client's address; from anyone else the header is ignored),
 * {@code --behind-tls} (BAYSHEET_BEHIND_TLS=true: browsers reach the server through an HTTPS proxy, so cookies
 * are Secure and responses ask for HTTPS from then on), {@code --signing-key FILE} (BAYSHEET_SIGNING_KEY; the PKCS#12
 * file whose key signs issued PDFs, which must exist; when none is named, {@code baysheet-signing.p12} beside the data
 * directory, generated on the first start), its password from {@code --signing-key-password-file FILE}
 * (BAYSHEET_SIGNING_KEY_PASSWORD_FILE) or BAYSHEET_SIGNING_KEY_PASSWORD, never the command line (none: an empty
 * password, the file protected by its owner-only permissions alone); the e-mail notices' SMTP password from
 * {@code --smtp-password-file FILE} (BAYSHEET_SMTP_PASSWORD_FILE) or BAYSHEET_SMTP_PASSWORD, the same way (none: empty).
 *
 * @param signingKeyNamed whether the office named its key file (then it must exist; else it is made when missing)
 */
public record ServerOptions(int port, String bind, Path dataDir, String dbUrl, String dbPassword, boolean demo,
                            String trustedProxy, boolean behindTls, Path signingKey, boolean signingKeyNamed,
                            String signingKeyPassword, String smtpPassword) {
    /** The key file made on the first start when none is named: beside the data directory, never in it. */
    public static final String DEFAULT_SIGNING_KEY = "baysheet-signing.p12";

    /** A flag the server cannot use; the message is one line for the terminal. */
    public static final class BadOption extends Exception {
        public BadOption(String message) { super(message); }
    }

    public static final String USAGE = "usage: baysheet [--port N] [--bind ADDR] [--data DIR] [--db-url JDBC_URL] "
            + "[--db-password-file FILE] [--demo] [--trusted-proxy ADDR] [--behind-tls] [--signing-key FILE] "
            + "[--signing-key-password-file FILE] [--smtp-password-file FILE] | calc FILE";

    public static ServerOptions parse(String[] args, Map<String, String> env) throws BadOption {
        String port = env.getOrDefault("BAYSHEET_PORT", "7070");
        String bind = env.getOrDefault("BAYSHEET_BIND", "127.0.0.1");
        String data = env.getOrDefault("BAYSHEET_DATA", "baysheet-data");
        String url = env.get("BAYSHEET_DB_URL");
        String passwordFile = env.get("BAYSHEET_DB_PASSWORD_FILE");
        boolean demo = "true".equalsIgnoreCase(env.getOrDefault("BAYSHEET_DEMO", "false"));
        String proxy = env.get("BAYSHEET_TRUSTED_PROXY");
        boolean tls = "true".equalsIgnoreCase(env.getOrDefault("BAYSHEET_BEHIND_TLS", "false"));
        String key = env.get("BAYSHEET_SIGNING_KEY");
        String keyPasswordFile = env.get("BAYSHEET_SIGNING_KEY_PASSWORD_FILE");
        String smtpPasswordFile = env.get("BAYSHEET_SMTP_PASSWORD_FILE");
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--port" -> port = value(args, ++i, "--port");
                case "--bind" -> bind = value(args, ++i, "--bind");
                case "--data" -> data = value(args, ++i, "--data");
                case "--db-url" -> url = value(args, ++i, "--db-url");
                case "--db-password-file" -> passwordFile = value(args, ++i, "--db-password-file");
                case "--demo" -> demo = true;
                case "--trusted-proxy" -> proxy = value(args, ++i, "--trusted-proxy");
                case "--behind-tls" -> tls = true;
                case "--signing-key" -> key = value(args, ++i, "--signing-key");
                case "--signing-key-password-file" -> keyPasswordFile = value(args, ++i, "--signing-key-password-file");
                case "--smtp-password-file" -> smtpPasswordFile = value(args, ++i, "--smtp-password-file");
                default -> throw new BadOption("unknown option " + args[i] + "; " + USAGE);
            }
        }
        Path dir = Path.of(data).toAbsolutePath().normalize();
        if (url != null && !url.startsWith("jdbc:")) throw new BadOption("--db-url must be a JDBC URL (jdbc:...), got " + url);
        if (proxy != null && !proxy.strip().matches("[0-9A-Fa-f.:]+"))
            throw new BadOption("--trusted-proxy must be an IP address (the proxy's, as the server sees it), got " + proxy);
        String password = passwordFile != null ? readPassword(passwordFile, "--db-password-file") : env.get("BAYSHEET_DB_PASSWORD");
        boolean named = key != null && !key.isBlank();
        Path keyFile = named ? Path.of(key).toAbsolutePath().normalize() : dir.resolveSibling(DEFAULT_SIGNING_KEY);
        String keyPassword = keyPasswordFile != null ? readPassword(keyPasswordFile, "--signing-key-password-file")
                : env.getOrDefault("BAYSHEET_SIGNING_KEY_PASSWORD", "");
        String smtpPassword = smtpPasswordFile != null ? readPassword(smtpPasswordFile, "--smtp-password-file")
                : env.getOrDefault("BAYSHEET_SMTP_PASSWORD", "");
        return new ServerOptions(port(port), bind, dir, url == null ? Database.h2Url(dir) : url,
                password == null || password.isEmpty() ? null : password, demo,
                proxy == null || proxy.isBlank() ? null : proxy.strip(), tls, keyFile, named, keyPassword, smtpPassword);
    }

    /** Whether the database is the embedded file under the data directory (which must then exist). */
    public boolean embedded() { return dbUrl.startsWith("jdbc:h2:file:"); }

    /** Never the password: these options may be logged or shown in a stack trace. */
    @Override
    public String toString() {
        return "ServerOptions[port=" + port + ", bind=" + bind + ", dataDir=" + dataDir + ", dbUrl=" + (embedded() ? dbUrl : "(given)")
                + ", dbPassword=" + (dbPassword == null ? "none" : "(hidden)") + ", demo=" + demo + ", trustedProxy=" + trustedProxy
                + ", behindTls=" + behindTls + ", signingKey=" + signingKey + ", signingKeyPassword="
                + (signingKeyPassword.isEmpty() ? "none" : "(hidden)") + ", smtpPassword=" + (smtpPassword.isEmpty() ? "none" : "(hidden)") + "]";
    }

    /** The file's first line (a trailing newline, as an editor leaves it, is not part of the password). */
    private static String readPassword(String file, String flag) throws BadOption {
        try {
            String text = Files.readString(Path.of(file), StandardCharsets.UTF_8);
            int end = text.indexOf('\n');
            String line = end < 0 ? text : text.substring(0, end);
            if (line.endsWith("\r")) line = line.substring(0, line.length() - 1);
            if (line.isEmpty()) throw new BadOption(flag + " " + file + " is empty: its first line is the password");
            return line;
        } catch (IOException e) {
            throw new BadOption(flag + " " + file + " cannot be read: " + e.getMessage());
        }
    }

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
