package com.baysheet.store.review;

import com.baysheet.review.AuditChain;
import com.baysheet.review.AuditEvent;
import com.baysheet.review.ChainCheck;
import com.baysheet.store.Sql;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * The append-only audit trail, hash-chained ({@link AuditChain}). There is deliberately no method that changes
 * or removes an entry; an action and its entry are written in one transaction where the action is ours. Every
 * append locks the chain's head row, so entries join the chain one at a time in id order, and moves the head
 * in the same transaction.
 */
public final class AuditTrail {
    /** Rows fetched at a time while streaming (PostgreSQL holds a cursor open only with a fetch size). */
    private static final int FETCH = 500;
    private static final String COLUMNS = "id, occurred_at, actor_id, actor_username, action, subject, detail, address, entry_hash";

    /** The newest entry's id and hash as the head row holds them. */
    public record Head(long id, String hash) {
        /** As an issued PDF prints it. */
        public String printed() { return "entry " + id + ", SHA-256 " + hash; }
    }

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
    public static AuditEvent append(Connection c, AuditEvent e, Instant at) throws SQLException {
        Head head = lockHead(c);
        Instant stamped = at.truncatedTo(AuditChain.PRECISION);
        try (Handle h = Sql.on(c)) {
            // the time is bound exactly as it is hashed: truncated to the chain's precision, in UTC
            long id = h.createUpdate("INSERT INTO audit_event (occurred_at, actor_id, actor_username, action, subject, detail, "
                            + "address) VALUES (:at, :actor, :username, :action, :subject, :detail, :address)")
                    .bind("at", Sql.stampOf(stamped)).bind("actor", e.actorId()).bind("username", e.actorUsername())
                    .bind("action", e.action()).bind("subject", e.subject()).bind("detail", e.detail())
                    .bind("address", e.address()).executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
            AuditEvent stored = e.stored(id, stamped, null);
            String hash = AuditChain.link(head.hash(), stored);
            h.createUpdate("UPDATE audit_event SET entry_hash = :hash WHERE id = :id").bind("hash", hash).bind("id", id).execute();
            h.createUpdate("UPDATE audit_chain SET head_id = :id, head_hash = :hash WHERE id = 1").bind("id", id).bind("hash", hash)
                    .execute();
            return stored.stored(id, stamped, hash);
        }
    }

    /** The chain's head now, as the head row holds it (what an issued PDF quotes). */
    public Head head() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT head_id, head_hash FROM audit_chain WHERE id = 1")
                        .map((rs, ctx) -> new Head(rs.getLong(1), rs.getString(2))).one();
            }
        });
    }

    /**
     * Recomputes the chain over every entry in id order and compares each stored hash and, at the end, the head
     * row: reports the first entry that differs (changed, or the one after an entry taken out) or a cut end.
     */
    public ChainCheck verify() {
        Head head = head();
        long[] n = {0};
        long[] lastId = {0};
        String[] expected = {AuditChain.GENESIS};
        ChainCheck[] broken = {null};
        forEach(e -> {
            if (broken[0] != null) return;
            n[0]++;
            String h = AuditChain.link(expected[0], e);
            if (!h.equals(e.hash())) {
                broken[0] = ChainCheck.broken(n[0], head.id(), head.hash(), e.id(), "entry " + e.id()
                        + " does not match its hash: it, or an entry before it, was changed or removed");
                return;
            }
            expected[0] = h;
            lastId[0] = e.id();
        });
        if (broken[0] != null) return broken[0];
        if (lastId[0] != head.id() || !expected[0].equals(head.hash()))
            return ChainCheck.broken(n[0], head.id(), head.hash(), lastId[0], "the chain ends at entry " + lastId[0]
                    + " but its head names entry " + head.id() + ": entries were removed from the end, or the head was changed");
        return ChainCheck.holds(n[0], head.id(), head.hash());
    }

    /** Newest first, a page at a time. */
    public List<AuditEvent> page(int limit, int offset) {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT " + COLUMNS + " FROM audit_event ORDER BY id DESC LIMIT :limit OFFSET :offset")
                        .bind("limit", limit).bind("offset", offset).map((rs, ctx) -> read(rs)).list();
            }
        });
    }

    /** Everything, oldest first, for tests; the export streams with {@link #forEach}. */
    public List<AuditEvent> all() {
        List<AuditEvent> out = new ArrayList<>();
        forEach(out::add);
        return out;
    }

    /** Every entry oldest first, one at a time, never the whole trail in memory (the CSV export, verification). */
    public void forEach(Consumer<AuditEvent> each) {
        sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                // mapped row by row as the cursor moves: the trail is never held whole
                h.createQuery("SELECT " + COLUMNS + " FROM audit_event ORDER BY id").setFetchSize(FETCH)
                        .map((rs, ctx) -> read(rs)).forEach(each);
            }
            return null;
        });
    }

    public long count() {
        return sql.tx(c -> {
            try (Handle h = Sql.on(c)) {
                return h.createQuery("SELECT COUNT(*) FROM audit_event").mapTo(Long.class).one();
            }
        });
    }

    private static Head lockHead(Connection c) throws SQLException {
        try (Handle h = Sql.on(c)) {
            Optional<Head> head = h.createQuery("SELECT head_id, head_hash FROM audit_chain WHERE id = 1 FOR UPDATE")
                    .map((rs, ctx) -> new Head(rs.getLong(1), rs.getString(2))).findOne();
            if (head.isEmpty()) throw new SQLException("the audit chain has no head row (migration V116 not applied)");
            return head.get();
        }
    }

    private static AuditEvent read(ResultSet rs) throws SQLException {
        long actor = rs.getLong("actor_id");
        Long actorId = rs.wasNull() ? null : actor;
        Instant at = rs.getObject("occurred_at", OffsetDateTime.class).toInstant();
        return new AuditEvent(rs.getLong("id"), at, actorId, rs.getString("actor_username"), rs.getString("action"),
                rs.getString("subject"), rs.getString("detail"), rs.getString("address"), rs.getString("entry_hash"));
    }
}
