package com.baysheet.store.auth;

import com.baysheet.store.Sql;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;

import static com.baysheet.store.auth.SessionStore.at;

/** Failed logins, kept for the throttle window (the audit trail keeps them for good). */
public final class LoginFailures {
    private final Sql sql;

    public LoginFailures(Sql sql) {
        this.sql = sql;
    }

    public void record(String username, String address, Instant when) {
        sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement(
                    "INSERT INTO login_failure (username, address, failed_at) VALUES (?, ?, ?)")) {
                ps.setString(1, clip(username, 40));
                ps.setString(2, clip(address, 64));
                ps.setObject(3, at(when));
                return ps.executeUpdate();
            }
        });
    }

    public List<Instant> byUsername(String username, Instant since) {
        return times("username", clip(username, 40), since);
    }

    public List<Instant> byAddress(String address, Instant since) {
        return times("address", clip(address, 64), since);
    }

    /** A successful login clears the user's count; old rows of everyone are dropped on the way. */
    public void clear(String username, Instant olderThan) {
        sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement("DELETE FROM login_failure WHERE username = ? OR failed_at < ?")) {
                ps.setString(1, clip(username, 40));
                ps.setObject(2, at(olderThan));
                return ps.executeUpdate();
            }
        });
    }

    private List<Instant> times(String column, String v, Instant since) {
        return sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement(
                    "SELECT failed_at FROM login_failure WHERE " + column + " = ? AND failed_at > ?")) {
                ps.setString(1, v);
                ps.setObject(2, at(since));
                List<Instant> out = new ArrayList<>();
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) out.add(rs.getObject(1, OffsetDateTime.class).toInstant());
                }
                return out;
            }
        });
    }

    /** What was typed may be anything; it is stored trimmed to the column (the throttle counts it as typed). */
    static String clip(String s, int max) {
        String t = s == null ? "" : s.strip();
        return t.length() > max ? t.substring(0, max) : t;
    }
}
