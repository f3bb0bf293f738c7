package db.migration;

import org.flywaydb.core.api.migration.BaseJavaMigration;
import org.flywaydb.core.api.migration.Context;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.security.MessageDigest;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.Statement;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.temporal.ChronoUnit;
import java.util.HexFormat;

/**
 * The audit trail becomes a hash chain, and a password reset becomes a one-time code.
 *
 * <p>Each entry gets {@code entry_hash}, the SHA-256 of the previous entry's hash and the entry's canonical form
 * (see {@code review.AuditChain}, which this class copies on purpose: a migration uses no application class, and
 * {@code AuditChainMigrationTest} checks that the two agree). Genesis: the entries already present are chained
 * here, in id order, from a previous hash of 64 zeros, so an edit to any of them after this migration is
 * detected; what they said before it ran is vouched for by nothing but the database it came from.
 * {@code audit_chain} holds the head (last id and hash), which every append locks and moves, so that entries
 * cut from the end are detected too.
 *
 * <p>{@code password_reset} keeps only the SHA-256 of each code, who made it, when it lapses and when it was used.
 */
public class V116__Audit_chain_and_reset_codes extends BaseJavaMigration {
    static final String GENESIS = "0".repeat(64);
    private static final DateTimeFormatter AT = DateTimeFormatter.ofPattern("uuuu-MM-dd'T'HH:mm:ss.SSSSSS'Z'");

    @Override
    public void migrate(Context context) throws Exception {
        Connection c = context.getConnection();
        try (Statement s = c.createStatement()) {
            s.execute("ALTER TABLE audit_event ADD COLUMN entry_hash VARCHAR(64)");
            s.execute("CREATE TABLE audit_chain (id INT PRIMARY KEY CHECK (id = 1), head_id BIGINT NOT NULL, "
                    + "head_hash VARCHAR(64) NOT NULL, genesis_id BIGINT NOT NULL)");
            s.execute("CREATE TABLE password_reset ("
                    + "code_hash VARCHAR(64) PRIMARY KEY, "
                    + "user_id BIGINT NOT NULL, "
                    + "made_by VARCHAR(40) NOT NULL, "
                    + "made_at TIMESTAMP WITH TIME ZONE NOT NULL, "
                    + "expires_at TIMESTAMP WITH TIME ZONE NOT NULL, "
                    + "used_at TIMESTAMP WITH TIME ZONE, "
                    + "used_from VARCHAR(64), "
                    + "told BOOLEAN NOT NULL, "
                    + "CONSTRAINT fk_password_reset_user FOREIGN KEY (user_id) REFERENCES app_user (id) ON DELETE CASCADE)");
            s.execute("CREATE INDEX ix_password_reset_user ON password_reset (user_id)");
        }
        String prev = GENESIS;
        long last = 0;
        try (PreparedStatement q = c.prepareStatement("SELECT id, occurred_at, actor_id, actor_username, action, subject, "
                + "detail, address FROM audit_event ORDER BY id");
             PreparedStatement u = c.prepareStatement("UPDATE audit_event SET entry_hash = ? WHERE id = ?");
             ResultSet rs = q.executeQuery()) {
            while (rs.next()) {
                long id = rs.getLong(1);
                long actor = rs.getLong(3);
                String actorId = rs.wasNull() ? "" : Long.toString(actor);
                prev = link(prev, id, rs.getObject(2, OffsetDateTime.class), actorId, rs.getString(4), rs.getString(5),
                        rs.getString(6), rs.getString(7), rs.getString(8));
                u.setString(1, prev);
                u.setLong(2, id);
                u.executeUpdate();
                last = id;
            }
        }
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO audit_chain (id, head_id, head_hash, genesis_id) VALUES (1, ?, ?, ?)")) {
            ps.setLong(1, last);
            ps.setString(2, prev);
            ps.setLong(3, last);
            ps.executeUpdate();
        }
    }

    /** SHA-256 over the previous hash (64 hex digits) and the length-prefixed fields, in the order of {@code AuditChain}. */
    static String link(String prev, long id, OffsetDateTime at, String actorId, String... text) throws Exception {
        ByteArrayOutputStream b = new ByteArrayOutputStream();
        b.writeBytes(prev.getBytes(StandardCharsets.US_ASCII));
        field(b, "v1");
        field(b, Long.toString(id));
        field(b, AT.format(at.toInstant().truncatedTo(ChronoUnit.MICROS).atOffset(ZoneOffset.UTC)));
        field(b, actorId);
        for (String t : text) field(b, t == null ? "" : t);
        return HexFormat.of().formatHex(MessageDigest.getInstance("SHA-256").digest(b.toByteArray()));
    }

    private static void field(ByteArrayOutputStream b, String s) {
        byte[] v = s.getBytes(StandardCharsets.UTF_8);
        b.writeBytes((v.length + ":").getBytes(StandardCharsets.US_ASCII));
        b.writeBytes(v);
        b.write(';');
    }
}
