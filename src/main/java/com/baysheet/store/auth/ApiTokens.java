package com.baysheet.store.auth;

import com.baysheet.auth.Role;
import com.baysheet.auth.Tokens;
import com.baysheet.auth.User;
import com.baysheet.engine.InputError;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.NotFound;
import com.baysheet.store.Sql;
import com.baysheet.store.review.AuditTrail;
import org.jdbi.v3.core.Handle;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Duration;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.temporal.ChronoUnit;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * Personal API tokens: a person makes one for a program that reads or changes the office's work in their name,
 * sees it once, and may revoke it (so may the administrator). A token carries no role of its own: each request
 * acts with its owner's role as it is then, and an inactive owner's tokens open nothing.
 * <p>
 * Only the SHA-256 of a token is stored. A slow salted hash (bcrypt, as for passwords) is not needed: a password
 * is chosen by a person from a small space that a copied hash can be searched through, while a token is 256
 * bits from {@link java.security.SecureRandom}, beyond any search however fast the hash. A plain digest can
 * also be looked up by index on every request, which a salted hash cannot.
 */
public final class ApiTokens {
    /** What every token starts with, so that one pasted in the wrong place is recognised for what it is. */
    public static final String PREFIX = "bst_";
    public static final int MAX_NAME = 60;
    /** More than anyone needs (one a script or machine); keeps the list and the table bounded. */
    public static final int MAX_PER_USER = 20;
    /** The last-used time is written at most this often per token: a busy script does not write on every read. */
    static final Duration USE_STAMP = Duration.ofMinutes(1);

    /** A token as listed to its owner and the administrator: never its value. {@code lastUsedAt} null if never used. */
    public record Listed(long id, long userId, String name, Instant createdAt, Instant lastUsedAt) {}

    /** A token just made: its value is shown this once and stored nowhere. */
    public record Issued(String token, String name) {}

    /** Whose a presented token is, as the owner's account stands now. */
    public record Holder(User user, boolean mustChangePassword) {}

    private final Sql sql;

    public ApiTokens(Sql sql) {
        this.sql = sql;
    }

    /** Makes a token named {@code name} for {@code owner}; refuses a blank or long name, or one token too many. */
    public Issued make(User owner, String name, String address) {
        String n = name == null ? "" : name.strip();
        if (n.isEmpty()) throw new InputError("name", "(blank)", "is required: say what the token is for");
        if (n.length() > MAX_NAME) throw new InputError("name", n.length() + " characters", "must be at most " + MAX_NAME + " characters");
        String token = PREFIX + Tokens.random();
        Instant now = now();
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                // the owner's row is locked first, so two makes at once cannot both pass the count
                h.createQuery("SELECT id FROM app_user WHERE id = :user FOR UPDATE").bind("user", owner.id()).mapTo(Long.class)
                        .findOne().orElseThrow(() -> new NotFound("user", owner.id()));
                int held = h.createQuery("SELECT COUNT(*) FROM api_token WHERE user_id = :user").bind("user", owner.id())
                        .mapTo(Integer.class).one();
                if (held >= MAX_PER_USER)
                    throw new InputError("name", n, "cannot be added: you hold " + held + " tokens, the most allowed; revoke one first");
                h.createUpdate("INSERT INTO api_token (user_id, name, token_hash, created_at) VALUES (:user, :name, :hash, :at)")
                        .bind("user", owner.id()).bind("name", n).bind("hash", Tokens.sha256(token))
                        .bind("at", Sql.stampOf(now)).execute();
            }
            AuditTrail.append(c, AuditEvent.of(owner.id(), owner.username(), "API token made", "user " + owner.username(),
                    "named \"" + n + "\" (only its hash is kept)", address), now);
            return null;
        });
        return new Issued(token, n);
    }

    /** The tokens of one user, newest first. */
    public List<Listed> of(long userId) {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT id, user_id, name, created_at, last_used_at FROM api_token WHERE user_id = :user "
                        + "ORDER BY created_at DESC, id DESC").bind("user", userId).map((rs, ctx) -> listed(rs)).list();
            }
        });
    }

    /** Every user's tokens, by user id, for the administrator's users page (one read, however many users). */
    public Map<Long, List<Listed>> byUser() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT id, user_id, name, created_at, last_used_at FROM api_token ORDER BY user_id, created_at DESC, id DESC")
                        .map((rs, ctx) -> listed(rs)).list().stream()
                        .collect(Collectors.groupingBy(Listed::userId, LinkedHashMap::new, Collectors.toList()));
            }
        });
    }

    /**
     * Revokes token {@code tokenId} of {@code ownerId}, by {@code by} (the owner, or the administrator on the users
     * page: the caller's route decides which owner it may name). A token of someone else is not found.
     */
    public void revoke(User by, long ownerId, long tokenId, String address) {
        Instant now = now();
        sql.tx(c -> {
            String name, owner;
            try (Handle h = Sql.on(c)) {
                Optional<String[]> row = h.createQuery("SELECT t.name, u.username FROM api_token t JOIN app_user u ON u.id = t.user_id "
                                + "WHERE t.id = :id AND t.user_id = :owner").bind("id", tokenId).bind("owner", ownerId)
                        .map((rs, ctx) -> new String[] {rs.getString(1), rs.getString(2)}).findOne();
                if (row.isEmpty()) throw new NotFound("API token", tokenId);
                name = row.get()[0];
                owner = row.get()[1];
                h.createUpdate("DELETE FROM api_token WHERE id = :id").bind("id", tokenId).execute();
            }
            AuditTrail.append(c, AuditEvent.of(by.id(), by.username(), "API token revoked", "user " + owner,
                    "named \"" + name + "\"" + (by.id() == ownerId ? "" : ", by the administrator"), address), now);
            return null;
        });
    }

    /**
     * The owner of a presented token, if it is one of ours and its owner is active; stamps its last use. Empty for
     * anything else (unknown, revoked, an inactive owner), all alike, so a caller learns nothing of which.
     */
    public Optional<Holder> holder(String token) {
        if (token == null || !token.startsWith(PREFIX) || token.length() > 100) return Optional.empty();
        String hash = Tokens.sha256(token);
        Instant now = now();
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                Optional<Found> f = h.createQuery("SELECT t.id AS token_id, t.last_used_at, u.id, u.username, u.full_name, u.initials, "
                                + "u.role, u.active, u.must_change_password FROM api_token t JOIN app_user u ON u.id = t.user_id "
                                + "WHERE t.token_hash = :hash").bind("hash", hash).map((rs, ctx) -> found(rs)).findOne();
                if (f.isEmpty() || !f.get().holder().user().active()) return Optional.<Holder>empty();
                if (f.get().lastUsed() == null || !now.isBefore(f.get().lastUsed().plus(USE_STAMP)))
                    h.createUpdate("UPDATE api_token SET last_used_at = :at WHERE id = :id").bind("at", Sql.stampOf(now))
                            .bind("id", f.get().tokenId()).execute();
                return Optional.of(f.get().holder());
            }
        });
    }

    private record Found(long tokenId, Instant lastUsed, Holder holder) {}

    private static Found found(ResultSet rs) throws SQLException {
        User u = new User(rs.getLong("id"), rs.getString("username"), rs.getString("full_name"), rs.getString("initials"),
                Role.valueOf(rs.getString("role")), rs.getBoolean("active"));
        return new Found(rs.getLong("token_id"), instant(rs, "last_used_at"), new Holder(u, rs.getBoolean("must_change_password")));
    }

    private static Listed listed(ResultSet rs) throws SQLException {
        return new Listed(rs.getLong("id"), rs.getLong("user_id"), rs.getString("name"), instant(rs, "created_at"),
                instant(rs, "last_used_at"));
    }

    private static Instant instant(ResultSet rs, String column) throws SQLException {
        OffsetDateTime t = rs.getObject(column, OffsetDateTime.class);
        return t == null ? null : t.toInstant();
    }

    private Instant now() {
        return sql.now().truncatedTo(ChronoUnit.MILLIS);
    }
}
