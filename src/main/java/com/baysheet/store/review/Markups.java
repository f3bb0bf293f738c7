package com.baysheet.store.review;

import com.baysheet.review.Actor;
import com.baysheet.review.MarkupNote;
import com.baysheet.review.MarkupTarget;
import com.baysheet.store.Sql;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/** Rows of markup and markup_reply, on the caller's connection. */
final class Markups {
    /** A markup with the revision it belongs to. */
    record Found(long revisionId, MarkupNote markup) {}

    private Markups() {}

    static long add(Connection c, long revisionId, MarkupTarget target, Actor a, String text, Instant at) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO markup (revision_id, target, author_id, author_initials, "
                + "body, resolved, version, created_at) VALUES (?, ?, ?, ?, ?, FALSE, 1, ?)", Statement.RETURN_GENERATED_KEYS)) {
            ps.setLong(1, revisionId);
            ps.setString(2, target.code());
            ps.setLong(3, a.userId());
            ps.setString(4, a.initials());
            ps.setString(5, text);
            ps.setObject(6, Sql.stamp(at));
            ps.executeUpdate();
            try (ResultSet keys = ps.getGeneratedKeys()) {
                keys.next();
                return keys.getLong(1);
            }
        }
    }

    static void reply(Connection c, long markupId, Actor a, String text, Instant at) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO markup_reply (markup_id, author_id, author_initials, body, "
                + "created_at) VALUES (?, ?, ?, ?, ?)")) {
            ps.setLong(1, markupId);
            ps.setLong(2, a.userId());
            ps.setString(3, a.initials());
            ps.setString(4, text);
            ps.setObject(5, Sql.stamp(at));
            ps.executeUpdate();
        }
    }

    /** Resolves or reopens, if still at the version the user saw; false if someone changed it meanwhile. */
    static boolean setResolved(Connection c, long markupId, long version, boolean resolved) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement(
                "UPDATE markup SET resolved = ?, version = version + 1 WHERE id = ? AND version = ?")) {
            ps.setBoolean(1, resolved);
            ps.setLong(2, markupId);
            ps.setLong(3, version);
            return ps.executeUpdate() == 1;
        }
    }

    static Optional<Found> find(Connection c, long markupId) throws SQLException {
        List<Found> l = query(c, "WHERE m.id = ?", markupId);
        return l.stream().findFirst();
    }

    static List<MarkupNote> forRevision(Connection c, long revisionId) throws SQLException {
        return query(c, "WHERE m.revision_id = ?", revisionId).stream().map(Found::markup).toList();
    }

    static int openCount(Connection c, long revisionId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT COUNT(*) FROM markup WHERE revision_id = ? AND resolved = FALSE")) {
            ps.setLong(1, revisionId);
            try (ResultSet rs = ps.executeQuery()) {
                rs.next();
                return rs.getInt(1);
            }
        }
    }

    private static List<Found> query(Connection c, String where, long arg) throws SQLException {
        Map<Long, Found> byId = new LinkedHashMap<>();
        Map<Long, List<MarkupNote.Reply>> replies = new LinkedHashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT m.id, m.revision_id, m.target, m.author_id, m.author_initials, "
                + "m.body, m.resolved, m.version, r.author_id AS r_author, r.author_initials AS r_initials, r.body AS r_body "
                + "FROM markup m LEFT JOIN markup_reply r ON r.markup_id = m.id " + where + " ORDER BY m.id, r.id")) {
            ps.setLong(1, arg);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    long id = rs.getLong("id");
                    if (!byId.containsKey(id)) byId.put(id, read(rs));
                    List<MarkupNote.Reply> rl = replies.computeIfAbsent(id, k -> new ArrayList<>());
                    if (rs.getString("r_body") != null)
                        rl.add(new MarkupNote.Reply(rs.getLong("r_author"), rs.getString("r_initials"), rs.getString("r_body")));
                }
            }
        }
        List<Found> out = new ArrayList<>();
        for (Found f : byId.values()) {
            MarkupNote m = f.markup();
            out.add(new Found(f.revisionId(), new MarkupNote(m.id(), m.target(), m.authorId(), m.authorInitials(), m.text(),
                    m.resolved(), replies.get(m.id()), m.version())));
        }
        return out;
    }

    private static Found read(ResultSet rs) throws SQLException {
        MarkupNote m = new MarkupNote(rs.getLong("id"), MarkupTarget.decode(rs.getString("target")), rs.getLong("author_id"),
                rs.getString("author_initials"), rs.getString("body"), rs.getBoolean("resolved"), List.of(),
                rs.getLong("version"));
        return new Found(rs.getLong("revision_id"), m);
    }
}
