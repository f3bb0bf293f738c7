package com.baysheet.store.auth;

import com.baysheet.auth.LoginThrottle;
import com.baysheet.store.Duplicate;
import com.baysheet.store.Sql;

import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.statement.Update;

import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

/**
 * The throttle's counters per username and per client address, in the database so that every server
 * sees the same counts. An attempt is counted before its password is checked, under a row lock, so no
 * number of concurrent guesses slips past the count: a right password then takes its count back.
 */
public final class LoginFailures {
    /** What the counters allow: an attempt, or a wait; and the refusals of a wait that just ended (for the audit). */
    public record Gate(Optional<Instant> waitUntil, int endedEpisodeUser, int endedEpisodeAddress) {}

    /** A username that must wait now, with its failed and refused attempts since its last login. */
    public record Waiting(int attempts, Instant until) {}

    private static final String USER = "u", ADDRESS = "a";

    private final Sql sql;

    public LoginFailures(Sql sql) {
        this.sql = sql;
    }

    /** Counts an attempt, or refuses it while a wait runs (counting the refusal, not lengthening the wait). */
    public Gate claim(String username, String address, Instant now, LoginThrottle t) {
        String u = clip(username), a = clip(address);
        ensure(USER, u, now);
        ensure(ADDRESS, a, now);
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                // locked in one order (address, then user) by every transaction, so two attempts cannot deadlock
                Row ra = lock(h, ADDRESS, a, now, t), ru = lock(h, USER, u, now, t);
                Instant until = ra.waitUntil.isAfter(ru.waitUntil) ? ra.waitUntil : ru.waitUntil;
                if (until.isAfter(now)) {
                    update(h, "refused = refused + 1, attempts = attempts + 1", ADDRESS, a).execute();
                    update(h, "refused = refused + 1, attempts = attempts + 1", USER, u).execute();
                    return new Gate(Optional.of(until), 0, 0);
                }
                failed(h, ADDRESS, a, now, now.plus(t.waitForAddress(ra.failures + 1)));
                failed(h, USER, u, now, now.plus(t.waitForUser(ru.failures + 1)));
                return new Gate(Optional.empty(), ru.refused, ra.refused);
            }
        });
    }

    /**
     * A right password: the user's count is cleared and the address's takes this attempt back. A wait that the
     * address's count started only while right logins were still being checked (many people behind one address
     * logging in at once) ends with them: it stays only while the failures left are past the free ones.
     * @return the failed and refused attempts on the username before this login
     */
    public int succeeded(String username, String address, LoginThrottle t) {
        String u = clip(username), a = clip(address);
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                update(h, "failures = failures - 1, attempts = attempts - 1, wait_until = CASE WHEN failures - 1 < :free "
                        + "THEN last_failure ELSE wait_until END", ADDRESS, a).bind("free", t.freeFailuresPerAddress()).execute();
                int before = attempts(h, u).map(n -> n - 1).orElse(0);
                h.createUpdate("DELETE FROM login_attempt WHERE kind = :kind AND subject = :subject").bind("kind", USER)
                        .bind("subject", u).execute();
                return Math.max(0, before);
            }
        });
    }

    /**
     * The administrator lifts a username's wait; its attempts are kept, so the user still hears of them at
     * their next login. Returns those attempts.
     */
    public int unlock(String username, Instant now) {
        String u = clip(username);
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                int n = attempts(h, u).orElse(0);
                update(h, "failures = 0, refused = 0, wait_until = :until", USER, u).bind("until", Sql.stampOf(now)).execute();
                return n;
            }
        });
    }

    /** Usernames waiting now, for the users page. */
    public Map<String, Waiting> waiting(Instant now) {
        return sql.tx(c -> {
            Map<String, Waiting> out = new HashMap<>();
            try (Handle h = Sql.on(c)) {
                h.createQuery("SELECT subject, attempts, wait_until FROM login_attempt WHERE kind = :kind AND wait_until > :now")
                        .bind("kind", USER).bind("now", Sql.stampOf(now))
                        .map((rs, ctx) -> Map.entry(rs.getString(1), new Waiting(rs.getInt(2), rs.getObject(3, OffsetDateTime.class).toInstant())))
                        .forEach(e -> out.put(e.getKey(), e.getValue()));
            }
            return out;
        });
    }

    /** The counts before the attempt; a count untouched for the throttle's forget time starts again. */
    private record Row(int failures, int refused, Instant waitUntil) {}

    private record Stored(int failures, int refused, Instant lastFailure, Instant waitUntil) {}

    private static Row lock(Handle h, String kind, String subject, Instant now, LoginThrottle t) throws SQLException {
        Stored s = h.createQuery("SELECT failures, refused, last_failure, wait_until FROM login_attempt "
                        + "WHERE kind = :kind AND subject = :subject FOR UPDATE").bind("kind", kind).bind("subject", subject)
                .map((rs, ctx) -> new Stored(rs.getInt(1), rs.getInt(2), rs.getObject(3, OffsetDateTime.class).toInstant(),
                        rs.getObject(4, OffsetDateTime.class).toInstant()))
                .findFirst().orElseThrow(() -> new SQLException("no login_attempt row for " + kind + " " + subject + " to lock"));
        if (!s.lastFailure.plus(t.forgetAfter()).isBefore(now) || s.waitUntil.isAfter(now)) return new Row(s.failures, s.refused, s.waitUntil);
        update(h, "failures = 0, refused = 0, attempts = 0", kind, subject).execute();
        return new Row(0, 0, now);
    }

    /** The username's attempts, its row locked until the transaction ends; empty if it has none. */
    private static Optional<Integer> attempts(Handle h, String username) {
        return h.createQuery("SELECT attempts FROM login_attempt WHERE kind = :kind AND subject = :subject FOR UPDATE")
                .bind("kind", USER).bind("subject", username).mapTo(Integer.class).findFirst();
    }

    /** Drops the counts nobody has touched for the forget time (typed usernames that are nobody's, old addresses). */
    public void prune(Instant now, LoginThrottle t) {
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createUpdate("DELETE FROM login_attempt WHERE last_failure < :forgotten AND wait_until < :now")
                        .bind("forgotten", Sql.stampOf(now.minus(t.forgetAfter()))).bind("now", Sql.stampOf(now)).execute();
            }
        });
    }

    /** A failed attempt counted, and the wait it starts. */
    private static void failed(Handle h, String kind, String subject, Instant now, Instant waitUntil) {
        update(h, "failures = failures + 1, attempts = attempts + 1, refused = 0, last_failure = :last, wait_until = :until",
                kind, subject).bind("last", Sql.stampOf(now)).bind("until", Sql.stampOf(waitUntil)).execute();
    }

    /** An update of one counter row; the caller binds any further names in {@code set} and runs it. */
    private static Update update(Handle h, String set, String kind, String subject) {
        return h.createUpdate("UPDATE login_attempt SET " + set + " WHERE kind = :kind AND subject = :subject")
                .bind("kind", kind).bind("subject", subject);
    }

    /** Makes the row to lock; two attempts making it at once both go on (the second insert loses, harmlessly). */
    private void ensure(String kind, String subject, Instant now) {
        try {
            sql.tx(c -> {
                try (Handle h = Sql.on(c)) {
                    if (h.createQuery("SELECT 1 FROM login_attempt WHERE kind = :kind AND subject = :subject").bind("kind", kind)
                            .bind("subject", subject).mapTo(Integer.class).findFirst().isPresent()) return 0;
                    return h.createUpdate("INSERT INTO login_attempt (kind, subject, failures, refused, attempts, last_failure, "
                                    + "wait_until) VALUES (:kind, :subject, 0, 0, 0, :now, :now)").bind("kind", kind)
                            .bind("subject", subject).bind("now", Sql.stampOf(now)).execute();
                }
            });
        } catch (Duplicate raced) {
            // another attempt made the row first: it is there to lock
        }
    }

    /** What was typed may be anything; it is counted trimmed to the column. */
    static String clip(String s) {
        String t = s == null ? "" : s.strip();
        return t.length() > 64 ? t.substring(0, 64) : t;
    }
}
