package com.baysheet.store.auth;

import com.baysheet.store.Sql;

import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.Optional;

/** Logged-in sessions by the SHA-256 of their cookie value. */
public final class SessionStore {
    /** A session as stored: whose it is, its form token, and when it began and lapses. */
    public record StoredSession(String tokenHash, long userId, String csrfToken, Instant createdAt, Instant expiresAt) {}

    private final Sql sql;

    public SessionStore(Sql sql) {
        this.sql = sql;
    }

    public void create(StoredSession s) {
        sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement("INSERT INTO user_session (token_hash, user_id, csrf_token, "
                    + "created_at, expires_at) VALUES (?, ?, ?, ?, ?)")) {
                ps.setString(1, s.tokenHash());
                ps.setLong(2, s.userId());
                ps.setString(3, s.csrfToken());
                ps.setObject(4, at(s.createdAt()));
                ps.setObject(5, at(s.expiresAt()));
                return ps.executeUpdate();
            }
        });
    }

    public Optional<StoredSession> find(String tokenHash) {
        return sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT token_hash, user_id, csrf_token, created_at, expires_at "
                    + "FROM user_session WHERE token_hash = ?")) {
                ps.setString(1, tokenHash);
                try (ResultSet rs = ps.executeQuery()) {
                    if (!rs.next()) return Optional.empty();
                    return Optional.of(new StoredSession(rs.getString(1), rs.getLong(2), rs.getString(3),
                            rs.getObject(4, OffsetDateTime.class).toInstant(), rs.getObject(5, OffsetDateTime.class).toInstant()));
                }
            }
        });
    }

    public void extend(String tokenHash, Instant expiresAt) {
        run("UPDATE user_session SET expires_at = ? WHERE token_hash = ?", at(expiresAt), tokenHash);
    }

    public void delete(String tokenHash) {
        run("DELETE FROM user_session WHERE token_hash = ?", tokenHash);
    }

    /** Ends every session of a user but one (after a password change, the other browsers are logged out). */
    public void deleteOthers(long userId, String keepTokenHash) {
        run("DELETE FROM user_session WHERE user_id = ? AND token_hash <> ?", userId, keepTokenHash);
    }

    public void deleteAll(long userId) {
        run("DELETE FROM user_session WHERE user_id = ?", userId);
    }

    public void deleteExpired(Instant now) {
        run("DELETE FROM user_session WHERE expires_at <= ?", at(now));
    }

    private void run(String statement, Object... args) {
        sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement(statement)) {
                for (int i = 0; i < args.length; i++) ps.setObject(i + 1, args[i]);
                return ps.executeUpdate();
            }
        });
    }

    static OffsetDateTime at(Instant t) {
        return t.atOffset(ZoneOffset.UTC);
    }
}
