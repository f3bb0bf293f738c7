package com.baysheet.notice;

import org.slf4j.Logger;
import org.slf4j.LoggerFactory;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.Optional;
import java.util.concurrent.ArrayBlockingQueue;
import java.util.concurrent.Future;
import java.util.concurrent.RejectedExecutionException;
import java.util.concurrent.ThreadPoolExecutor;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.Consumer;
import java.util.function.Supplier;

/**
 * Sends the office's notices off the request threads, one at a time, in the order posted. The caller posts after its
 * transaction has committed, so a notice never tells of a step that was rolled back; {@link #post} returns at once and
 * never throws, so a mail server that is down, slow or refusing never holds up or fails the step. A send that fails is
 * logged and kept as the last failure (also handed to {@code failed}, which the office records for its
 * administration page); the settings are read when each notice is sent, so a change applies to the next one.
 */
public final class Notifier implements AutoCloseable {
    private static final Logger LOG = LoggerFactory.getLogger(Notifier.class);
    /** Notices waiting at most: a burst of batches; past it a notice is dropped and that is recorded as a failure. */
    static final int QUEUED = 200;

    /** A send that failed: which notice, why, and when. */
    public record Failure(String notice, String error, Instant at) {}

    private final Supplier<MailSettings> settings;
    private final Supplier<String> password;
    private final Clock clock;
    private final Consumer<Failure> failed;
    private final AtomicReference<Failure> last = new AtomicReference<>();
    private final ThreadPoolExecutor worker = new ThreadPoolExecutor(1, 1, 0, TimeUnit.MILLISECONDS,
            new ArrayBlockingQueue<>(QUEUED), r -> {
        Thread t = new Thread(r, "baysheet-notices");
        t.setDaemon(true);
        return t;
    });

    /**
     * @param settings the office's mail settings as they stand (read for each notice)
     * @param password the SMTP password, kept as the server's other secrets are (empty for none)
     * @param failed   told of each failed send, on the sending thread (the office stores it); must not throw
     */
    public Notifier(Supplier<MailSettings> settings, Supplier<String> password, Clock clock, Consumer<Failure> failed) {
        this.settings = settings;
        this.password = password;
        this.clock = clock;
        this.failed = failed;
    }

    /** Queues the notice and returns at once; nothing is sent while notices are off. */
    public void post(Notice n) {
        try {
            worker.execute(() -> send(n));
        } catch (RejectedExecutionException e) {
            fail(n, "not sent: " + QUEUED + " notices were already waiting (or the server is stopping)");
        }
    }

    /** Whether the server was given an SMTP password (what it is is never shown). */
    public boolean hasPassword() {
        String p = password.get();
        return p != null && !p.isEmpty();
    }

    /** The last send that failed since the server started, if any. */
    public Optional<Failure> lastFailure() { return Optional.ofNullable(last.get()); }

    /** Whether every notice posted so far has been dealt with (sent, skipped or failed) within this time. */
    public boolean idle(Duration within) {
        try {
            Future<?> marker = worker.submit(() -> { });
            marker.get(within.toMillis(), TimeUnit.MILLISECONDS);
            return true;
        } catch (Exception e) {
            return false;
        }
    }

    private void send(Notice n) {
        MailSettings s;
        try {
            s = settings.get();
        } catch (RuntimeException e) {
            fail(n, "the mail settings could not be read: " + e.getMessage());
            return;
        }
        if (!s.on()) return;
        try {
            Mailer.send(s, password.get(), n);
        } catch (Exception e) {
            fail(n, "through " + s.server() + ": " + reason(e));
        }
    }

    private void fail(Notice n, String error) {
        Failure f = new Failure(n.subject(), error, clock.instant());
        last.set(f);
        LOG.warn("e-mail notice \"{}\" {}", f.notice(), f.error());
        try {
            failed.accept(f);
        } catch (RuntimeException e) {
            LOG.warn("the failed notice could not be recorded: {}", e.toString());
        }
    }

    /** The exception and its causes in one line, without a stack trace: what the administrator reads. */
    static String reason(Throwable e) {
        StringBuilder b = new StringBuilder();
        for (Throwable t = e; t != null && b.length() < 500; t = t.getCause()) {
            if (b.length() > 0) b.append("; caused by ");
            b.append(t.getClass().getSimpleName());
            if (t.getMessage() != null) b.append(": ").append(t.getMessage().strip());
        }
        return b.length() > 500 ? b.substring(0, 500) + "…" : b.toString();
    }

    @Override
    public void close() {
        worker.shutdown();
    }
}
