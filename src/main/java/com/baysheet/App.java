package com.baysheet;

import com.baysheet.cli.CalcCommand;
import com.baysheet.framing.Rederivation;
import com.baysheet.sheet.signing.OfficeKey;
import com.baysheet.sheet.signing.PdfSigner;
import com.baysheet.store.BackupPort;
import com.baysheet.store.Database;
import com.baysheet.store.Demo;
import com.baysheet.store.Sql;
import com.baysheet.store.Store;
import com.baysheet.store.review.FirmStore;
import com.baysheet.web.Office;
import com.baysheet.web.ServerOptions;
import io.javalin.Javalin;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

import java.io.IOException;
import java.nio.file.Files;
import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.time.Clock;
import java.util.Arrays;
import java.util.function.Consumer;

/**
 * Entry point: {@code calc ...} runs the command-line calculation, {@code backup ...} and {@code restore ...} copy the
 * embedded database out and back, {@code transfer ...} moves an H2 office onto PostgreSQL, {@code warm-up} makes a start's
 * class archive (see {@link WarmUpCommand}); anything else starts the office server.
 */
public final class App {
    /** Made at first use, not when App loads: slf4j-simple reads its level once, and a command may lower it first. */
    private static final class Log {
        static final Logger LOG = LoggerFactory.getLogger(App.class);
    }

    private App() {}

    public static void main(String[] args) throws IOException {
        if (args.length > 0 && args[0].equals("calc"))
            System.exit(CalcCommand.run(Arrays.copyOfRange(args, 1, args.length), System.in, System.out, System.err));
        if (args.length > 0 && (args[0].equals("backup") || args[0].equals("restore")))
            System.exit(BackupCommand.run(args[0].equals("restore"), Arrays.copyOfRange(args, 1, args.length), System.getenv(),
                    System.out, System.err));
        if (args.length > 0 && args[0].equals("transfer")) {
            // the command's own lines are its answer: the pool's and the migrations' progress would bury them
            System.setProperty("org.slf4j.simpleLogger.defaultLogLevel", "warn");
            System.exit(TransferCommand.run(Arrays.copyOfRange(args, 1, args.length), System.getenv(), System.out, System.err));
        }
        if (args.length > 0 && args[0].equals("warm-up")) {
            System.setProperty("org.slf4j.simpleLogger.defaultLogLevel", "warn");
            System.exit(WarmUpCommand.run(Arrays.copyOfRange(args, 1, args.length), System.out, System.err));
        }
        ServerOptions options;
        try {
            options = ServerOptions.parse(args, System.getenv());
        } catch (ServerOptions.BadOption e) {
            System.err.println("baysheet: " + e.getMessage());
            System.exit(2);
            return;
        }
        try {
            Running running = start(options, Log.LOG::info);
            Runtime.getRuntime().addShutdownHook(new Thread(running::close));
        } catch (RuntimeException e) {
            // a database that is locked by another server, unreachable or refusing the login: say so in one line
            System.err.println("baysheet: could not start: " + rootCause(e));
            System.exit(1);
        }
    }

    private static String rootCause(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) t = t.getCause();
        return t.getMessage() == null ? t.toString() : t.getMessage();
    }

    /** A started server and its database, which stopping closes. */
    record Running(Javalin app, Database db, Office office, BackupPort backupPort) implements AutoCloseable {
        @Override
        public void close() {
            app.stop();
            if (backupPort != null) backupPort.close();
            db.close();
        }
    }

    /**
     * Opens (and migrates) the database, loads the demo if asked, and starts serving. {@code console} takes
     * the lines meant for whoever started the server (the set-up code, the demo accounts' passwords).
     */
    static Running start(ServerOptions o, Consumer<String> console) throws IOException {
        // a named key is read first: one that cannot be read stops the start, saying why, before the database is opened
        OfficeKey named = o.signingKeyNamed() ? OfficeKey.read(o.signingKey(), o.signingKeyPassword().toCharArray()) : null;
        // the office's own key, when it is there already, is read while the database opens and migrates: a first read
        // loads the key store's cryptography, about a third of a second of a start
        CompletableFuture<OfficeKey> early = named == null && Files.isRegularFile(o.signingKey())
                ? CompletableFuture.supplyAsync(() -> OfficeKey.read(o.signingKey(), o.signingKeyPassword().toCharArray())) : null;
        if (o.embedded()) Database.prepareDataDir(o.dataDir());
        Database db = Database.open(o.dbUrl(), o.dbPassword());
        if (o.embedded()) Database.restrictFiles(o.dataDir());
        // one clock for the whole office: the store stamps its rows in UTC from it, sheets are dated in its zone
        Clock clock = Clock.systemDefaultZone();
        // a change derives again only the levels it touches (framing.Rederivation), equal to deriving the whole building
        Store store = Store.on(db.dataSource(), new Rederivation()::derive, clock);
        OfficeKey key;
        try {
            key = named != null ? named : early != null ? joined(early) : madeOrRead(o, db, clock, console);
        } catch (RuntimeException e) {
            db.close();
            throw e;
        }
        console.accept("signing issued PDFs with " + o.signingKey() + ", certificate " + key.subject()
                + ", SHA-256 fingerprint " + key.fingerprint());
        Office office = Office.on(store, db.dataSource(), clock, new PdfSigner(key), o.smtpPassword());
        // deleted items are kept 30 days: those past it go at start, as whenever the administrator's list is read
        int purged = store.deleted().purge();
        if (purged > 0) Log.LOG.info("deleted items past 30 days purged: " + purged);
        if (o.demo()) {
            int loaded = Demo.loadIfEmpty(store).size();
            Log.LOG.info(loaded > 0 ? "demo: loaded " + loaded + " projects" : "demo: database has projects already, nothing loaded");
            DemoAccounts.add(office.accounts().admin(), console);
        }
        // the listener through which `baysheet backup` copies the database while this server holds its file
        BackupPort port = o.embedded() ? BackupPort.open(o.dataDir()) : null;
        Javalin app = office.server(o.trustedProxy(), o.behindTls()).start(o.bind(), o.port());
        Running running = new Running(app, db, office, port);
        console.accept("listening on " + o.bind() + ":" + app.port() + (o.bind().equals("127.0.0.1") || o.bind().equals("localhost")
                ? " (this machine only; --bind 0.0.0.0 for the office network)" : " (the office network)") + ", database "
                + (o.embedded() ? o.dataDir() : "by JDBC URL") + (o.behindTls() ? ", behind a TLS proxy" : ""));
        if (!office.accounts().logins().setupDone())
            console.accept("set-up code: " + office.setupCode().code() + " (asked for once, by the set-up page at /setup, "
                    + "to make the first administrator)");
        return running;
    }

    /** The key read beside the start, or the reason it could not be, as reading it in line would have thrown it. */
    private static OfficeKey joined(CompletableFuture<OfficeKey> key) {
        try {
            return key.join();
        } catch (CompletionException e) {
            if (e.getCause() instanceof RuntimeException r) throw r;
            throw e;
        }
    }

    /**
     * The key file beside the data directory, made there on the first start, its certificate naming the firm as set
     * then; the console says when it was made, for a copy to be kept apart from the database backups.
     */
    private static OfficeKey madeOrRead(ServerOptions o, Database db, Clock clock, Consumer<String> console) {
        boolean made = !java.nio.file.Files.exists(o.signingKey());
        OfficeKey key = OfficeKey.readOrCreate(o.signingKey(), o.signingKeyPassword().toCharArray(),
                new FirmStore(new Sql(db.dataSource(), clock)).get().name(), clock);
        if (made) console.accept("signing key made at " + o.signingKey() + ": keep a copy of it apart from the database backups");
        return key;
    }
}
