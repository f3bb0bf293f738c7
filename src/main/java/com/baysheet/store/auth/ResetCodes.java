package com.baysheet.store.auth;

import com.baysheet.auth.Passwords;
import com.baysheet.auth.ResetCode;
import com.baysheet.auth.User;
import com.baysheet.engine.InputError;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.Sql;
import com.baysheet.store.review.AuditTrail;
import org.jdbi.v3.core.Handle;

import java.time.Clock;
import java.time.Duration;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.List;
import java.util.Locale;

/**
 * Password resets without the administrator ever knowing a password: the administrator makes a one-time code
 * for a person (random, kept only as its SHA-256, lapsing after {@link #LIFETIME}, a new one voiding the last),
 * hands it over, and the person uses it once, with their username, to choose their own password; their sessions
 * end. The code is no password: it opens no session, and once used or lapsed it is refused. At their next login
 * the person is told that a reset code was made for them, by whom, and whether and from where it was used.
 */
public final class ResetCodes {
    public static final Duration LIFETIME = Duration.ofHours(24);
    static final String REFUSED = "is not a valid reset code for this username, or it has lapsed or been used; "
            + "ask your administrator for a new one";

    /** A code just made: shown once to the administrator, never stored. */
    public record Issued(String code, User forUser, Instant expiresAt) {}

    private final Sql sql;
    private final UserStore users;
    private final Passwords passwords;
    private final Clock clock;

    public ResetCodes(Sql sql, UserStore users, Passwords passwords, Clock clock) {
        this.sql = sql;
        this.users = users;
        this.passwords = passwords;
        this.clock = clock;
    }

    public Issued make(User admin, long userId, String address) {
        User u = users.find(userId);
        String code = ResetCode.random();
        Instant now = now(), expires = now.plus(LIFETIME);
        sql.tx(c -> {
            // one live code per person: a new one voids any earlier one not yet used
            try (Handle h = Sql.on(c)) {
                h.createUpdate("UPDATE password_reset SET expires_at = :now WHERE user_id = :user AND used_at IS NULL "
                        + "AND expires_at > :now").bind("now", Sql.stampOf(now)).bind("user", u.id()).execute();
                h.createUpdate("INSERT INTO password_reset (code_hash, user_id, made_by, made_at, expires_at, told) "
                                + "VALUES (:hash, :user, :madeBy, :now, :expires, FALSE)").bind("hash", ResetCode.hash(code))
                        .bind("user", u.id()).bind("madeBy", admin.username()).bind("now", Sql.stampOf(now))
                        .bind("expires", Sql.stampOf(expires)).execute();
            }
            AuditTrail.append(c, AuditEvent.of(admin.id(), admin.username(), "reset code made", "user " + u.username(),
                    "one-time code valid until " + expires.truncatedTo(java.time.temporal.ChronoUnit.SECONDS)
                            + " (only its hash is kept); any earlier unused code voided", address), now);
            return null;
        });
        return new Issued(code, u, expires);
    }

    /**
     * The person sets their own password with the code. Every refusal of the code reads the same, so the form
     * tells nothing about which usernames exist or which codes were made.
     */
    public void use(String typedUsername, String code, String password, String confirm, String address) {
        String name = typedUsername == null ? "" : typedUsername.strip().toLowerCase(Locale.ROOT);
        if (ResetCode.normal(code).isEmpty()) throw new InputError("code", "(hidden)", "is required");
        if (password != null && !password.equals(confirm))
            throw new InputError("confirmPassword", "(hidden)", "does not match the new password");
        User u = users.findByUsername(name).map(UserStore.WithHash::user).filter(User::active)
                .orElseThrow(() -> new InputError("code", "(hidden)", REFUSED));
        String hash = passwords.hash(Passwords.acceptable("newPassword", password, u.username(), users.firmName()));
        Instant now = now();
        sql.tx(c -> {
            String madeBy;
            // the claim and the new password commit together: a code is spent exactly when it set a password
            try (Handle h = Sql.on(c)) {
                madeBy = h.createQuery("SELECT made_by FROM password_reset WHERE code_hash = :hash AND user_id = :user "
                                + "AND used_at IS NULL AND expires_at > :now FOR UPDATE").bind("hash", ResetCode.hash(code))
                        .bind("user", u.id()).bind("now", Sql.stampOf(now)).map((rs, ctx) -> rs.getString(1)).findFirst()
                        .orElseThrow(() -> new InputError("code", "(hidden)", REFUSED));
                if (h.createUpdate("UPDATE password_reset SET used_at = :now, used_from = :address, told = FALSE "
                                + "WHERE code_hash = :hash AND used_at IS NULL").bind("now", Sql.stampOf(now))
                        .bind("address", address).bind("hash", ResetCode.hash(code)).execute() != 1)
                    throw new InputError("code", "(hidden)", REFUSED);
            }
            UserStore.setPassword(c, u.id(), hash, false); // chosen by the person themselves
            try (Handle h = Sql.on(c)) {
                h.createUpdate("DELETE FROM user_session WHERE user_id = :user").bind("user", u.id()).execute();
            }
            AuditTrail.append(c, AuditEvent.of(u.id(), u.username(), "password reset", "user " + u.username(),
                    "chosen by the person with a one-time code made by " + madeBy, address), now);
            return null;
        });
    }

    /** What the person is told at login about resets made for them since they were last told; marks them told. */
    public List<String> notices(long userId) {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                List<String> out = h.createQuery("SELECT made_by, made_at, used_at, used_from FROM password_reset "
                                + "WHERE user_id = :user AND told = FALSE ORDER BY made_at").bind("user", userId)
                        .map((rs, ctx) -> notice(rs.getString(1), rs.getObject(2, OffsetDateTime.class),
                                rs.getObject(3, OffsetDateTime.class), rs.getString(4))).list();
                h.createUpdate("UPDATE password_reset SET told = TRUE WHERE user_id = :user AND told = FALSE").bind("user", userId)
                        .execute();
                return out;
            }
        });
    }

    private static String notice(String madeBy, OffsetDateTime madeAt, OffsetDateTime usedAt, String usedFrom) {
        String made = "A password reset code was made for you by " + madeBy + " on " + day(madeAt);
        return usedAt == null ? made + "; it has not been used."
                : made + " and used on " + day(usedAt) + " from " + usedFrom + " to set a new password.";
    }

    private static String day(OffsetDateTime t) {
        return t.toInstant().truncatedTo(java.time.temporal.ChronoUnit.MINUTES).toString().replace('T', ' ').replace("Z", " UTC");
    }

    private Instant now() {
        return clock.instant().truncatedTo(java.time.temporal.ChronoUnit.MILLIS);
    }
}
