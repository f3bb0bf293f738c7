package com.baysheet.e2e;

import java.io.IOException;
import java.net.ServerSocket;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Duration;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.concurrent.TimeUnit;

/**
 * The office server as shipped: the shaded jar ({@code java -jar target/baysheet.jar}) as a process of its own
 * on a free loopback port over its own data directory, so that what the tests reach is what an office runs
 * (every template and resource as packaged), and so that it can be killed as a machine dies. These tests run
 * under Failsafe after {@code package}; without the jar they fail saying so.
 */
final class ChildServer implements AutoCloseable {
    private static final Duration STARTUP = Duration.ofSeconds(90);

    final Process process;
    final int port;
    final Path log;

    private ChildServer(Process process, int port, Path log) {
        this.process = process;
        this.port = port;
        this.log = log;
    }

    /** The jar that {@code package} built: Failsafe passes its path; run by hand, target/baysheet.jar. */
    static Path jar() {
        Path jar = Path.of(System.getProperty("baysheet.jar", "target/baysheet.jar")).toAbsolutePath();
        if (!Files.isRegularFile(jar))
            throw new IllegalStateException(jar + " is missing: the end-to-end tests run against the shaded jar, "
                    + "after package (mvn -B -ntp verify, or mvn -B -ntp verify -DskipTests -Dit.test=NameIT)");
        return jar;
    }

    /** Starts the server on this data directory and waits until its health check answers. */
    static ChildServer start(Path dataDir, boolean demo) throws IOException, InterruptedException {
        return start(dataDir, demo, List.of(), List.of(), Map.of());
    }

    /**
     * The same with JVM options ({@code -Dname=value}) before {@code -jar}, server options after the usual ones
     * (such as {@code --db-url}), and environment variables added to this process's (such as the database password).
     */
    static ChildServer start(Path dataDir, boolean demo, List<String> jvmOptions, List<String> options, Map<String, String> env)
            throws IOException, InterruptedException {
        int port = freePort();
        Path log = dataDir.resolveSibling(dataDir.getFileName() + "-server-" + System.nanoTime() + ".log");
        List<String> cmd = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(), "-Xmx512m"));
        cmd.addAll(jvmOptions);
        cmd.addAll(List.of("-jar", jar().toString(),
                "--port", String.valueOf(port), "--bind", "127.0.0.1", "--data", dataDir.toString()));
        cmd.addAll(options);
        if (demo) cmd.add("--demo");
        ProcessBuilder b = new ProcessBuilder(cmd).redirectErrorStream(true).redirectOutput(log.toFile());
        b.environment().putAll(env);
        Process p = b.start();
        ChildServer s = new ChildServer(p, port, log);
        s.awaitHealthy();
        return s;
    }

    String base() { return "http://127.0.0.1:" + port; }

    private static final java.util.regex.Pattern SETUP_CODE = java.util.regex.Pattern.compile("set-up code: ([A-Z0-9]{8})");

    /**
     * The one-time set-up code this server printed in its console (here, its log file), as the person who
     * started it reads it; the line follows the health check's first answer closely, so it is waited for.
     */
    String setupCode() throws InterruptedException {
        long deadline = System.nanoTime() + Duration.ofSeconds(30).toNanos();
        while (System.nanoTime() < deadline) {
            java.util.regex.Matcher m = SETUP_CODE.matcher(logText());
            if (m.find()) return m.group(1);
            Thread.sleep(50);
        }
        throw new IllegalStateException("the server printed no set-up code:\n" + logText());
    }

    /** SIGKILL: no shutdown hook runs, nothing is flushed or closed. */
    void kill() throws InterruptedException {
        process.destroyForcibly();
        process.waitFor(30, TimeUnit.SECONDS);
    }

    /** SIGTERM: the server's shutdown hook stops it and closes the database. */
    @Override
    public void close() throws InterruptedException {
        if (!process.isAlive()) return;
        process.destroy();
        if (!process.waitFor(30, TimeUnit.SECONDS)) kill();
    }

    String logText() {
        try {
            return Files.readString(log);
        } catch (IOException e) {
            return "(no log: " + e + ")";
        }
    }

    /**
     * Waits until /health on the port answers 200 and this process's console says it listens on that port. The port
     * was free when {@link #freePort} closed it, but the server binds it only after opening and migrating the
     * database (seconds on a loaded machine), and in that window another process on the machine may take it: then
     * the answer would come from a stranger, and a test would read another server's data as this one's. One
     * listener per port, so the line in this process's own log makes the answer this process's.
     */
    private void awaitHealthy() throws InterruptedException {
        HttpClient c = HttpClient.newBuilder().connectTimeout(Duration.ofSeconds(2)).build();
        long deadline = System.nanoTime() + STARTUP.toNanos();
        String bound = "listening on 127.0.0.1:" + port + " ";
        while (System.nanoTime() < deadline) {
            if (!process.isAlive()) throw new IllegalStateException("server exited with " + process.exitValue() + ":\n" + logText());
            try {
                HttpResponse<String> r = c.send(HttpRequest.newBuilder(URI.create(base() + "/health")).timeout(Duration.ofSeconds(5)).build(),
                        HttpResponse.BodyHandlers.ofString());
                if (r.statusCode() == 200 && logText().contains(bound)) return;
            } catch (IOException e) {
                // not listening yet
            }
            Thread.sleep(100);
        }
        process.destroyForcibly();
        throw new IllegalStateException("server did not answer /health within " + STARTUP + ":\n" + logText());
    }

    private static int freePort() throws IOException {
        try (ServerSocket s = new ServerSocket(0)) {
            return s.getLocalPort();
        }
    }
}
