package com.baysheet.web.review;

import com.baysheet.auth.Tokens;
import com.baysheet.issue.Batch;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * The outcome of a batch, held briefly so that the post can redirect (post-redirect-get) and the queue page show
 * it once: under a random key, for the user who ran it, for {@link #KEEP}, the {@link #MAX_HELD} latest at most. What
 * was done is also in the audit trail, one entry per sheet; this is only the answer to the person who asked. A
 * server that no longer holds it (restarted, or another server behind the same proxy) says so.
 */
public final class BatchResults {
    static final Duration KEEP = Duration.ofMinutes(30);
    static final int MAX_HELD = 200;

    public record Held(long userId, Batch.Kind kind, List<Batch.Outcome> outcomes, Instant at) {
        public long done() { return outcomes.stream().filter(Batch.Outcome::done).count(); }

        public long refused() { return outcomes.size() - done(); }
    }

    private final Clock clock;
    private final Map<String, Held> held = new LinkedHashMap<>(16, 0.75f, false) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<String, Held> eldest) { return size() > MAX_HELD; }
    };

    BatchResults(Clock clock) {
        this.clock = clock;
    }

    synchronized String keep(long userId, Batch.Kind kind, List<Batch.Outcome> outcomes) {
        String key = Tokens.random();
        held.put(key, new Held(userId, kind, List.copyOf(outcomes), clock.instant()));
        return key;
    }

    /** The batch under this key, if this user ran it and it is still held. */
    synchronized Optional<Held> find(String key, long userId) {
        Held h = key == null ? null : held.get(key);
        if (h == null || h.userId() != userId || clock.instant().isAfter(h.at().plus(KEEP))) return Optional.empty();
        return Optional.of(h);
    }
}
