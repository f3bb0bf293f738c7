package com.baysheet;

import com.baysheet.store.Transfer;

import java.io.PrintStream;
import java.nio.file.Path;
import java.util.Map;

/**
 * {@code baysheet transfer --from DIR --to JDBC_URL}: copies the office in the H2 data directory DIR (no server
 * running on it) into a new, empty PostgreSQL database, verifies the copy and prints what each table carried. The
 * password may stay off the command line in BAYSHEET_DB_PASSWORD. Exit 0 done; 2 usage; 3 the source cannot be read
 * or is at another migration; 4 the target is unreachable or not empty; 5 the copy did not verify (nothing kept).
 */
public final class TransferCommand {
    public static final int OK = 0, USAGE = 2, SOURCE = 3, TARGET = 4, VERIFICATION = 5;
    static final String HELP = "usage: java -jar baysheet.jar transfer --from DATA_DIR --to jdbc:postgresql://HOST/DATABASE?user=NAME";

    private TransferCommand() {}

    /** @param args the arguments after {@code transfer} */
    public static int run(String[] args, Map<String, String> env, PrintStream out, PrintStream err) {
        String from = null, to = null;
        for (int i = 0; i < args.length; i++) {
            switch (args[i]) {
                case "--from", "--to" -> {
                    if (i + 1 == args.length || args[i + 1].startsWith("--")) return usage(err, args[i] + " needs a value");
                    if (args[i].equals("--from")) from = args[++i];
                    else to = args[++i];
                }
                default -> { return usage(err, "unknown argument " + args[i]); }
            }
        }
        if (from == null) return usage(err, "--from is missing: name the H2 data directory the server used");
        if (to == null) return usage(err, "--to is missing: name the PostgreSQL database by its JDBC URL");
        // the URL itself is not echoed: it may carry the password
        if (!to.startsWith("jdbc:postgresql:")) return usage(err, "--to must be a PostgreSQL JDBC URL (jdbc:postgresql://HOST/DATABASE)");
        String password = env.get("BAYSHEET_DB_PASSWORD");
        try {
            Transfer.Report r = Transfer.run(Path.of(from), to, password == null || password.isEmpty() ? null : password);
            out.println("transferred " + Path.of(from).toAbsolutePath().normalize() + " at migration " + r.version() + ":");
            for (Transfer.Table t : r.tables())
                out.printf("  %-24s %8d rows  (source %d)%n", t.name(), t.target(), t.source());
            out.println("verified: row counts of " + r.tables().size() + " tables, " + r.pdfsVerified() + " issued PDFs against their "
                    + "SHA-256, the audit chain (" + r.chain().entries() + " entries); " + r.identitiesAdvanced()
                    + " identity columns advanced past their largest id");
            return OK;
        } catch (Transfer.Refused e) {
            err.println("baysheet: transfer refused: " + e.getMessage().lines().findFirst().orElse(""));
            return switch (e.stop) {
                case SOURCE -> SOURCE;
                case TARGET -> TARGET;
                case VERIFICATION -> VERIFICATION;
            };
        } catch (RuntimeException e) {
            err.println("baysheet: transfer failed: " + String.valueOf(e.getMessage()).lines().findFirst().orElse(""));
            return TARGET;
        }
    }

    private static int usage(PrintStream err, String why) {
        err.println("baysheet: " + why);
        err.println(HELP);
        return USAGE;
    }
}
