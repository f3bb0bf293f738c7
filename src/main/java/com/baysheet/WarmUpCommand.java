package com.baysheet;

import com.baysheet.web.ServerOptions;

import java.io.IOException;
import java.io.PrintStream;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.Comparator;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;

/**
 * {@code warm-up}: starts the server on the demo in a throw-away directory, asks it for its first pages, stops it and
 * removes the directory. Run under {@code -XX:ArchiveClassesAtExit=FILE}, it leaves the JVM an archive of every
 * class a start loads (class data sharing, JDK 13 and later), which a server started with
 * {@code -XX:SharedArchiveFile=FILE} maps instead of loading the classes again: a shorter start. An archive that no
 * longer matches the jar or the JDK is ignored by the JVM (the start is then as slow as without it, never wrong), so
 * it is made again after each upgrade (docs/deploy.md).
 */
public final class WarmUpCommand {
    /** The pages asked for: those a stranger may open, which load the web layer, the templates and the store. */
    private static final List<String> PAGES = List.of("/health", "/setup", "/login", "/verify", "/static/baysheet.css");

    private WarmUpCommand() {}

    public static int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length > 0) {
            err.println("baysheet warm-up: takes no arguments (run it as java -XX:ArchiveClassesAtExit=FILE -jar baysheet.jar warm-up)");
            return 2;
        }
        Path dir;
        try {
            dir = Files.createTempDirectory("baysheet-warm-up");
        } catch (IOException e) {
            err.println("baysheet warm-up: no temporary directory: " + e.getMessage());
            return 1;
        }
        try {
            // the signing key is made beside the data directory, so inside the throw-away one
            ServerOptions o = ServerOptions.parse(new String[] {"--demo", "--bind", "127.0.0.1", "--port", "0",
                    "--data", dir.resolve("data").toString()}, Map.of());
            try (App.Running running = App.start(o, line -> {})) {
                HttpClient http = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(10)).build();
                for (String page : PAGES) {
                    HttpResponse<Void> r = http.send(HttpRequest.newBuilder(URI.create("http://127.0.0.1:" + running.app().port() + page))
                            .timeout(Duration.ofSeconds(60)).build(), HttpResponse.BodyHandlers.discarding());
                    if (r.statusCode() >= 500) {
                        err.println("baysheet warm-up: " + page + " answered " + r.statusCode());
                        return 1;
                    }
                }
            }
            out.println("warm-up done: " + PAGES.size() + " pages served by a server on the demo, since stopped");
            return 0;
        } catch (IOException | ServerOptions.BadOption | RuntimeException e) {
            err.println("baysheet warm-up: " + e.getMessage());
            return 1;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            return 1;
        } finally {
            removeAll(dir);
        }
    }

    private static void removeAll(Path dir) {
        try (Stream<Path> s = Files.walk(dir)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            // a leftover temporary directory is the operating system's to clear
        }
    }
}
