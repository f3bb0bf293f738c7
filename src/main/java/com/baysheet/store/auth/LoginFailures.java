package com.baysheet.store.auth;

import com.baysheet.auth.LoginThrottle;
import com.baysheet.store.Duplicate;
import com.baysheet.store.Sql;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.HashMap;
import java.util.Map;
import java.util.Optional;

import static com.baysheet.store.auth.SessionStore.at;

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
            // locked in one order (address, then user) by every transaction, so two attempts cannot deadlock
            Row ra = lock(c, ADDRESS, a, now, t), ru = lock(c, USER, u, now, t);
            Instant until = ra.waitUntil.isAfter(ru.waitUntil) ? ra.waitUntil : ru.waitUntil;
            if (until.isAfter(now)) {
                update(c, "refused = refused + 1, attempts = attempts + 1", ADDRESS, a, null);
                update(c, "refused = refused + 1, attempts = attempts + 1", USER, u, null);
                return new Gate(Optional.of(until), 0, 0);
            }
            update(c, "failures = failures + 1, attempts = attempts + 1, refused = 0, last_failure = ?, wait_until = ?",
                    ADDRESS, a, new Instant[]{now, now.plus(t.waitForAddress(ra.failures + 1))});
            update(c, "failures = failures + 1, attempts = attempts + 1, refused = 0, last_failure = ?, wait_until = ?",
                    USER, u, new Instant[]{now, now.plus(t.waitForUser(ru.failures + 1))});
            return new Gate(Optional.empty(), ru.refused, ra.refused);
        });
    }

    /**
     * A right password: the user's count is cleared and the address's takes this attempt back.
     * @return the failed and refused attempts on the username before this login
     */
    public int succeeded(String username, String address) {
        String u = clip(username), a = clip(address);
        return sql.tx(c -> {
            update(c, "failures = failures - 1, attempts = attempts - 1", ADDRESS, a, null);
            int before = 0;
            try (PreparedStatement ps = c.prepareStatement("SELECT attempts FROM login_attempt WHERE kind = ? AND subject = ? FOR UPDATE")) {
                ps.setString(1, USER);
                ps.setString(2, u);
                try (ResultSet rs = ps.executeQuery()) {
                    if (rs.next()) before = rs.getInt(1) - 1;
                }
            }
            delete(c, u);
            return Math.max(0, before);
        });
    }

    /**
     * The administrator lifts a username's wait; its attempts are kept, so the user still hears of them at
     * their next login. Returns those attempts.
     */
    public int unlock(String username, Instant now) {
        String u = clip(username);
        return sql.tx(c -> {
            int n = 0;
            try (PreparedStatement ps = c.prepareStatement("SELECT attempts FROM login_attempt WHERE kind = ? AND subject = ? FOR UPDATE")) {
                ps.setString(1, USER);
                ps.setString(2, u);
                try (ResultSet rs = ps.executeQuery()) {
                    if (rs.next()) n = rs.getInt(1);
                }
            }
            update(c, "failures = 0, refused = 0, wait_until = ?", USER, u, new Instant[]{now});
            return n;
        });
    }

    /** Usernames waiting now, for the users page. */
    public Map<String, Waiting> waiting(Instant now) {
        return sql.tx(c -> {
            Map<String, Waiting> out = new HashMap<>();
            try (PreparedStatement ps = c.prepareStatement(
                    "SELECT subject, attempts, wait_until FROM login_attempt WHERE kind = ? AND wait_until > ?")) {
                ps.setString(1, USER);
                ps.setObject(2, at(now));
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) out.put(rs.getString(1), new Waiting(rs.getInt(2), rs.getObject(3, OffsetDateTime.class).toInstant()));
                }
            }
            return out;
        });
    }

    /** The counts before the attempt; a count untouched for the throttle's forget time starts again. */
    private record Row(int failures, int refused, Instant waitUntil) {}

    private static Row lock(Connection c, String kind, String subject, Instant now, LoginThrottle t) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(
                "SELECT failures, refused, last_failure, wait_until FROM login_attempt WHERE kind = ? AND subject = ? FOR UPDATE")) {
            ps.setString(1, kind);
            ps.setString(2, subject);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                Instant last = rs.getObject(3, OffsetDateTime.class).toInstant();
                Instant until = rs.getObject(4, OffsetDateTime.class).toInstant();
                if (!last.plus(t.forgetAfter()).isBefore(now) || until.isAfter(now)) return new Row(rs.getInt(1), rs.getInt(2), until);
            }
        }
        update(c, "failures = 0, refused = 0, attempts = 0", kind, subject, null);
        return new Row(0, 0, now);
    }

    /** Drops the counts nobody has touched for the forget time (typed usernames that are nobody's, old addresses). */
    public void prune(Instant now, LoginThrottle t) {
        sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement("DELETE FROM login_attempt WHERE last_failure < ? AND wait_until < ?")) {
                ps.setObject(1, at(now.minus(t.forgetAfter())));
                ps.setObject(2, at(now));
                return ps.executeUpdate();
            }
        });
    }

    private static void update(Connection c, String set, String kind, String subject, Instant[] times) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE login_attempt SET " + set + " WHERE kind = ? AND subject = ?")) {
            int i = 1;
            if (times != null) for (Instant t : times) ps.setObject(i++, at(t));
            ps.setString(i++, kind);
            ps.setString(i, subject);
            ps.executeUpdate();
        }
    }

    private static void delete(Connection c, String username) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("DELETE FROM login_attempt WHERE kind = ? AND subject = ?")) {
            ps.setString(1, USER);
            ps.setString(2, username);
            ps.executeUpdate();
        }
    }

    /** Makes the row to lock; two attempts making it at once both go on (the second insert loses, harmlessly). */
    private void ensure(String kind, String subject, Instant now) {
        try {
            sql.tx(c -> {
                try (PreparedStatement q = c.prepareStatement("SELECT 1 FROM login_attempt WHERE kind = ? AND subject = ?")) {
                    q.setString(1, kind);
                    q.setString(2, subject);
                    try (ResultSet rs = q.executeQuery()) {
                        if (rs.next()) return 0;
                    }
                }
                try (PreparedStatement ps = c.prepareStatement("INSERT INTO login_attempt (kind, subject, failures, refused, "
                        + "attempts, last_failure, wait_until) VALUES (?, ?, 0, 0, 0, ?, ?)")) {
                    ps.setString(1, kind);
                    ps.setString(2, subject);
                    ps.setObject(3, at(now));
                    ps.setObject(4, at(now));
                    return ps.executeUpdate();
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
