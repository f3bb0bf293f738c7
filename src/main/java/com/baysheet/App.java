package com.baysheet;

import com.baysheet.cli.CalcCommand;
import com.baysheet.framing.Derivation;
import com.baysheet.store.Database;
import com.baysheet.store.Demo;
import com.baysheet.store.Store;
import com.baysheet.web.Server;
import com.baysheet.web.ServerOptions;
import com.baysheet.web.review.Signoff;
import io.javalin.Javalin;
import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

import java.io.IOException;
import java.nio.file.Files;
import java.time.Clock;
import java.util.Arrays;

/** Entry point: {@code calc ...} runs the command-line calculation; anything else starts the office server. */
public final class App {
    private static final Logger LOG = LoggerFactory.getLogger(App.class);

    private App() {}

    public static void main(String[] args) throws IOException {
        if (args.length > 0 && args[0].equals("calc"))
            System.exit(CalcCommand.run(Arrays.copyOfRange(args, 1, args.length), System.in, System.out, System.err));
        ServerOptions options;
        try {
            options = ServerOptions.parse(args, System.getenv());
        } catch (ServerOptions.BadOption e) {
            System.err.println("baysheet: " + e.getMessage());
            System.exit(2);
            return;
        }
        try {
            start(options);
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

    /** Opens (and migrates) the database, loads the demo if asked, and starts serving. */
    static Javalin start(ServerOptions o) throws IOException {
        if (o.embedded()) Files.createDirectories(o.dataDir());
        Database db = Database.open(o.dbUrl());
        Store store = Store.on(db.dataSource(), Derivation::derive, Clock.systemUTC());
        if (o.demo()) {
            int loaded = Demo.loadIfEmpty(store).size();
            LOG.info(loaded > 0 ? "demo: loaded " + loaded + " projects" : "demo: database has projects already, nothing loaded");
        }
        Javalin app = Server.create(store, Signoff.on(store, db.dataSource())::install, o.trustedProxy()).start(o.bind(), o.port());
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            app.stop();
            db.close();
        }));
        LOG.info("Baysheet serving http://{}:{}/ (database {})", o.bind().equals("0.0.0.0") ? "localhost" : o.bind(),
                app.port(), o.embedded() ? o.dataDir() : "by JDBC URL");
        return app;
    }
}
