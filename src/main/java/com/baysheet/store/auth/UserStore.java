package com.baysheet.store.auth;

import com.baysheet.auth.NewUser;
import com.baysheet.auth.Role;
import com.baysheet.auth.User;
import com.baysheet.engine.InputError;
import com.baysheet.store.NotFound;
import com.baysheet.store.Sql;
import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Optional;

/** Users and their password hashes. Users are made inactive, never deleted. */
public final class UserStore {
    private static final String COLUMNS = "id, username, full_name, initials, role, active, password_hash, must_change_password";
    /** {@link #COLUMNS} of a query where the user table is {@code u}, in the order {@link #read(ResultSet, int)} reads them. */
    static final String COLUMNS_OF_U = "u." + COLUMNS.replace(", ", ", u.");

    /** A user with the stored hash, for checking a login, and whether someone else set that password. */
    public record WithHash(User user, String passwordHash, boolean mustChangePassword) {}

    private final Sql sql;

    public UserStore(Sql sql) {
        this.sql = sql;
    }

    public long count() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT COUNT(*) FROM app_user").mapTo(Long.class).one();
            }
        });
    }

    public User create(NewUser u, String passwordHash) {
        return create(u, passwordHash, false);
    }

    /** @param mustChange the password was set by someone else, to be changed at the next login */
    public User create(NewUser u, String passwordHash, boolean mustChange) {
        return sql.tx(c -> {
            User made = insert(c, u, passwordHash, sql.stamp());
            if (mustChange) setPassword(c, made.id(), passwordHash, true);
            return made;
        });
    }

    /** The firm's name as its sheets print it: a password may not be that. */
    public String firmName() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT firm_name FROM firm_setting WHERE id = 1").map((rs, ctx) -> rs.getString(1))
                        .findFirst().orElse("");
            }
        });
    }

    /**
     * Creates the first administrator, once: the set-up flag flips in the same transaction, so a second
     * set-up (or two at once) finds it closed and creates nobody.
     */
    public Optional<User> createFirstAdministrator(NewUser u, String passwordHash) {
        if (u.role() != Role.ADMINISTRATOR) throw new IllegalArgumentException("role: the first user is the administrator");
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                if (h.createUpdate("UPDATE firm_setting SET setup_done = TRUE, version = version + 1 WHERE id = 1 AND setup_done = FALSE")
                        .execute() == 0) return Optional.empty();
            }
            return Optional.of(insert(c, u, passwordHash, sql.stamp()));
        });
    }

    public boolean setupDone() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT setup_done FROM firm_setting WHERE id = 1").map((rs, ctx) -> rs.getBoolean(1))
                        .findFirst().orElse(false);
            }
        });
    }

    public Optional<WithHash> findByUsername(String username) {
        return sql.tx(c -> one(c, "username", username));
    }

    public WithHash findById(long id) {
        return sql.tx(c -> one(c, "id", id)).orElseThrow(() -> new NotFound("user", id));
    }

    public User find(long id) {
        return sql.tx(c -> one(c, "id", id)).map(WithHash::user).orElseThrow(() -> new NotFound("user", id));
    }

    public List<User> findAll() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT " + COLUMNS + " FROM app_user ORDER BY username").map((rs, ctx) -> read(rs, 1).user()).list();
            }
        });
    }

    /** @param mustChange true when someone other than the user set it (the administrator) */
    public void setPassword(long id, String passwordHash, boolean mustChange) {
        sql.tx(c -> {
            setPassword(c, id, passwordHash, mustChange);
            return null;
        });
    }

    static void setPassword(Connection c, long id, String hash, boolean mustChange) {
        try (Handle h = Sql.on(c)) {
            if (h.createUpdate("UPDATE app_user SET password_hash = :hash, must_change_password = :mustChange, "
                    + "version = version + 1 WHERE id = :id").bind("hash", hash).bind("mustChange", mustChange).bind("id", id)
                    .execute() == 0) throw new NotFound("user", id);
        }
    }

    /** Whether the user's password was set by someone else and must be changed before going on. */
    public boolean mustChangePassword(long id) {
        return sql.tx(c -> one(c, "id", id)).map(WithHash::mustChangePassword).orElse(false);
    }

    public void setRole(long id, Role role) {
        update(id, "role", role.name());
    }

    public void setActive(long id, boolean active) {
        update(id, "active", active);
    }

    /** Sets one column of a user's row; {@code column} is one of ours, never typed by anyone. */
    private void update(long id, String column, Object v) {
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                if (h.createUpdate("UPDATE app_user SET " + column + " = :value, version = version + 1 WHERE id = :id")
                        .bind("value", v).bind("id", id).execute() == 0) throw new NotFound("user", id);
                return null;
            }
        });
    }

    private static User insert(Connection c, NewUser u, String hash, OffsetDateTime at) {
        if (one(c, "username", u.username()).isPresent())
            throw new InputError("username", "\"" + u.username() + "\"", "is taken by another user");
        try (Handle h = Sql.on(c)) {
            long id = h.createUpdate("INSERT INTO app_user (username, full_name, initials, role, password_hash, active, version, "
                            + "created_at) VALUES (:username, :fullName, :initials, :role, :hash, TRUE, 1, :at)")
                    .bind("username", u.username()).bind("fullName", u.fullName()).bind("initials", u.initials())
                    .bind("role", u.role().name()).bind("hash", hash).bind("at", Sql.stampOf(at.toInstant()))
                    .executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
            return new User(id, u.username(), u.fullName(), u.initials(), u.role(), true);
        }
    }

    /** The user whose {@code column} (id or username, ours, never typed by anyone) holds {@code value}. */
    static Optional<WithHash> one(Connection c, String column, Object value) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT " + COLUMNS + " FROM app_user WHERE " + column + " = :value").bind("value", value)
                    .map((rs, ctx) -> read(rs, 1)).findFirst();
        }
    }

    /** A user read from the columns of {@link #COLUMNS} (or {@link #COLUMNS_OF_U}) from {@code first} on. */
    static WithHash read(ResultSet rs, int first) throws SQLException {
        User u = new User(rs.getLong(first), rs.getString(first + 1), rs.getString(first + 2), rs.getString(first + 3),
                Role.valueOf(rs.getString(first + 4)), rs.getBoolean(first + 5));
        return new WithHash(u, rs.getString(first + 6), rs.getBoolean(first + 7));
    }

}
