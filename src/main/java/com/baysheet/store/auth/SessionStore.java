package com.baysheet.store.auth;

import com.baysheet.project.Firm;
import com.baysheet.store.Sql;
import com.baysheet.store.review.FirmStore;
import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.statement.Update;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.Optional;
import java.util.function.Function;

/** Logged-in sessions by the SHA-256 of their cookie value. */
public final class SessionStore {
    /** A session as stored: whose it is, its form token, and when it began and lapses. */
    public record StoredSession(String tokenHash, long userId, String csrfToken, Instant createdAt, Instant expiresAt) {}

    private final Sql sql;

    public SessionStore(Sql sql) {
        this.sql = sql;
    }

    public void create(StoredSession s) {
        run("INSERT INTO user_session (token_hash, user_id, csrf_token, created_at, expires_at) "
                + "VALUES (:hash, :user, :csrf, :createdAt, :expiresAt)", u -> u.bind("hash", s.tokenHash())
                .bind("user", s.userId()).bind("csrf", s.csrfToken()).bind("createdAt", Sql.stampOf(s.createdAt()))
                .bind("expiresAt", Sql.stampOf(s.expiresAt())));
    }

    public Optional<StoredSession> find(String tokenHash) {
        return sql.tx(c -> find(c, tokenHash));
    }

    /**
     * A session, its user's row and the firm's settings (null where their row is absent), read by one statement:
     * every page request asks for all three.
     */
    record WithUser(StoredSession session, UserStore.WithHash user, Firm firm) {}

    Optional<WithUser> findWithUser(String tokenHash) {
        // one statement, plain JDBC: every page request runs it, and a second statement and the mapping layer
        // were half its cost
        return sql.readOne(c -> {
            try (PreparedStatement st = c.prepareStatement("SELECT s.token_hash, s.user_id, s.csrf_token, s.created_at, s.expires_at, "
                    + UserStore.COLUMNS_OF_U + ", " + FirmStore.COLUMNS_OF_F + " FROM user_session s JOIN app_user u ON u.id = s.user_id "
                    + "LEFT JOIN firm_setting f ON f.id = 1 WHERE s.token_hash = ?")) {
                st.setString(1, tokenHash);
                try (ResultSet rs = st.executeQuery()) {
                    if (!rs.next()) return Optional.<WithUser>empty();
                    StoredSession s = new StoredSession(rs.getString(1), rs.getLong(2), rs.getString(3),
                            rs.getObject(4, OffsetDateTime.class).toInstant(), rs.getObject(5, OffsetDateTime.class).toInstant());
                    return Optional.of(new WithUser(s, UserStore.read(rs, 6), FirmStore.read(rs, 14)));
                }
            }
        });
    }

    private static Optional<StoredSession> find(Connection c, String tokenHash) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT token_hash, user_id, csrf_token, created_at, expires_at FROM user_session "
                            + "WHERE token_hash = :hash").bind("hash", tokenHash)
                    .map((rs, ctx) -> new StoredSession(rs.getString(1), rs.getLong(2), rs.getString(3),
                            rs.getObject(4, OffsetDateTime.class).toInstant(), rs.getObject(5, OffsetDateTime.class).toInstant()))
                    .findFirst();
        }
    }

    public void extend(String tokenHash, Instant expiresAt) {
        run("UPDATE user_session SET expires_at = :expiresAt WHERE token_hash = :hash",
                u -> u.bind("expiresAt", Sql.stampOf(expiresAt)).bind("hash", tokenHash));
    }

    public void delete(String tokenHash) {
        run("DELETE FROM user_session WHERE token_hash = :hash", u -> u.bind("hash", tokenHash));
    }

    /** Ends every session of a user but one (after a password change, the other browsers are logged out). */
    public void deleteOthers(long userId, String keepTokenHash) {
        run("DELETE FROM user_session WHERE user_id = :user AND token_hash <> :keep",
                u -> u.bind("user", userId).bind("keep", keepTokenHash));
    }

    public void deleteAll(long userId) {
        run("DELETE FROM user_session WHERE user_id = :user", u -> u.bind("user", userId));
    }

    public void deleteExpired(Instant now) {
        run("DELETE FROM user_session WHERE expires_at <= :now", u -> u.bind("now", Sql.stampOf(now)));
    }

    /** One statement in a transaction of its own, its values bound by name. */
    private void run(String statement, Function<Update, Update> binds) {
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return binds.apply(h.createUpdate(statement)).execute();
            }
        });
    }
}
