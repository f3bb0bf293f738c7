package com.baysheet.store.review;

import com.baysheet.notice.MailSettings;
import com.baysheet.notice.Notifier;
import com.baysheet.review.AuditEvent;
import com.baysheet.store.Sql;
import org.jdbi.v3.core.Handle;

import java.time.OffsetDateTime;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.stream.Collectors;

/**
 * The office's mail settings (one row, changed over the version the form was opened at, audited), the last notice
 * that failed to send, and the people's addresses notices go to. The SMTP password is never stored here.
 */
public final class MailStore {
    /** The settings as stored, the version the form changes them over, and the last failed send. */
    public record Stored(MailSettings settings, long version, Optional<Notifier.Failure> lastFailure) {}

    private final Sql sql;

    public MailStore(Sql sql) {
        this.sql = sql;
    }

    public Stored get() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT notices_on, host, port, security, username, from_address, office_address, "
                                + "last_failed_notice, last_failure, last_failed_at, version FROM mail_setting WHERE id = 1")
                        .map((rs, ctx) -> {
                            OffsetDateTime at = rs.getObject(10, OffsetDateTime.class);
                            Optional<Notifier.Failure> f = at == null ? Optional.empty()
                                    : Optional.of(new Notifier.Failure(rs.getString(8), rs.getString(9), at.toInstant()));
                            // stored rows were checked when saved: read them back as they are, without refusing one
                            return new Stored(new MailSettings(rs.getBoolean(1), rs.getString(2), rs.getInt(3),
                                    MailSettings.Security.valueOf(rs.getString(4)), rs.getString(5), rs.getString(6), rs.getString(7)),
                                    rs.getLong(11), f);
                        }).one();
            }
        });
    }

    public void save(MailSettings s, long version, AuditEvent event) {
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                int changed = h.createUpdate("UPDATE mail_setting SET notices_on = :on, host = :host, port = :port, security = :security, "
                                + "username = :username, from_address = :from, office_address = :office, version = version + 1 "
                                + "WHERE id = 1 AND version = :version")
                        .bind("on", s.on()).bind("host", s.host()).bind("port", s.port()).bind("security", s.security().name())
                        .bind("username", s.username()).bind("from", s.fromAddress()).bind("office", s.officeAddress())
                        .bind("version", version).execute();
                if (changed == 0) throw new ConcurrentChange("The mail settings");
            }
            AuditTrail.append(c, event, sql.now());
            return null;
        });
    }

    /** Keeps this failure as the last one (the earlier one is replaced: the audit trail is not for mail). */
    public void failed(Notifier.Failure f) {
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createUpdate("UPDATE mail_setting SET last_failed_notice = :notice, last_failure = :error, last_failed_at = :at WHERE id = 1")
                        .bind("notice", f.notice()).bind("error", f.error()).bind("at", Sql.stampOf(f.at())).execute();
            }
        });
    }

    /** Each person's address, by user id, for those who gave one. */
    public Map<Long, String> addresses() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT id, email FROM app_user WHERE email IS NOT NULL")
                        .map((rs, ctx) -> Map.entry(rs.getLong(1), rs.getString(2))).list().stream()
                        .collect(Collectors.toMap(Map.Entry::getKey, Map.Entry::getValue));
            }
        });
    }

    /** The addresses of the active checkers other than this person: who checks, approves and issues what they prepared. */
    public List<String> checkersOtherThan(long userId) {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT email FROM app_user WHERE role = 'CHECKER' AND active = TRUE AND email IS NOT NULL "
                                + "AND id <> :id ORDER BY username").bind("id", userId).mapTo(String.class).list();
            }
        });
    }

    /** Sets (or, with null, clears) a person's address, with its audit entry. */
    public void setAddress(long userId, String email, AuditEvent event) {
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                h.createUpdate("UPDATE app_user SET email = :email WHERE id = :id").bind("email", email).bind("id", userId).execute();
            }
            AuditTrail.append(c, event, sql.now());
            return null;
        });
    }
}
