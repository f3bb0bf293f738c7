package com.baysheet.store.review;

import com.baysheet.review.AuditEvent;
import com.baysheet.store.Sql;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;

/**
 * The append-only audit trail. There is deliberately no method that changes or removes an entry; an
 * action and its entry are written in one transaction where the action is ours.
 */
public final class AuditTrail {
    private final Sql sql;

    public AuditTrail(Sql sql) {
        this.sql = sql;
    }

    public void append(AuditEvent e) {
        sql.tx(c -> {
            append(c, e, sql.now());
            return null;
        });
    }

    /** Appends within the caller's transaction, so the entry stands or falls with the action it records. */
    public static void append(Connection c, AuditEvent e, Instant at) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO audit_event (occurred_at, actor_id, actor_username, "
                + "action, subject, detail, address) VALUES (?, ?, ?, ?, ?, ?, ?)")) {
            ps.setObject(1, Sql.stamp(at));
            if (e.actorId() == null) ps.setNull(2, Types.BIGINT);
            else ps.setLong(2, e.actorId());
            ps.setString(3, e.actorUsername());
            ps.setString(4, e.action());
            ps.setString(5, e.subject());
            ps.setString(6, e.detail());
            ps.setString(7, e.address());
            ps.executeUpdate();
        }
    }

    /** Newest first, a page at a time. */
    public List<AuditEvent> page(int limit, int offset) {
        return query("SELECT * FROM audit_event ORDER BY id DESC LIMIT ? OFFSET ?", limit, offset);
    }

    /** Everything, oldest first, for the CSV export. */
    public List<AuditEvent> all() {
        return query("SELECT * FROM audit_event ORDER BY id");
    }

    public long count() {
        return sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement("SELECT COUNT(*) FROM audit_event"); ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getLong(1);
            }
        });
    }

    private List<AuditEvent> query(String q, Object... args) {
        return sql.tx(c -> {
            try (PreparedStatement ps = c.prepareStatement(q)) {
                for (int i = 0; i < args.length; i++) ps.setObject(i + 1, args[i]);
                List<AuditEvent> out = new ArrayList<>();
                try (ResultSet rs = ps.executeQuery()) {
                    while (rs.next()) out.add(read(rs));
                }
                return out;
            }
        });
    }

    private static AuditEvent read(ResultSet rs) throws SQLException {
        long actor = rs.getLong("actor_id");
        Long actorId = rs.wasNull() ? null : actor;
        Instant at = rs.getObject("occurred_at", OffsetDateTime.class).toInstant();
        return new AuditEvent(rs.getLong("id"), at, actorId, rs.getString("actor_username"), rs.getString("action"),
                rs.getString("subject"), rs.getString("detail"), rs.getString("address"));
    }
}
