package com.baysheet.store.review;

import com.baysheet.review.Actor;
import com.baysheet.review.MarkupNote;
import com.baysheet.review.MarkupTarget;
import com.baysheet.store.Sql;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
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

    static long add(Connection c, long revisionId, MarkupTarget target, Actor a, String text, Instant at) {
        try (Handle h = Sql.on(c)) {
            return h.createUpdate("INSERT INTO markup (revision_id, target, author_id, author_initials, body, resolved, version, "
                            + "created_at) VALUES (:revision, :target, :author, :initials, :body, FALSE, 1, :at)")
                    .bind("revision", revisionId).bind("target", target.code()).bind("author", a.userId())
                    .bind("initials", a.initials()).bind("body", text).bind("at", Sql.stampOf(at))
                    .executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
        }
    }

    static void reply(Connection c, long markupId, Actor a, String text, Instant at) {
        try (Handle h = Sql.on(c)) {
            h.createUpdate("INSERT INTO markup_reply (markup_id, author_id, author_initials, body, created_at) "
                            + "VALUES (:markup, :author, :initials, :body, :at)")
                    .bind("markup", markupId).bind("author", a.userId()).bind("initials", a.initials()).bind("body", text)
                    .bind("at", Sql.stampOf(at)).execute();
        }
    }

    /** Resolves or reopens, if still at the version the user saw; false if someone changed it meanwhile. */
    static boolean setResolved(Connection c, long markupId, long version, boolean resolved) {
        try (Handle h = Sql.on(c)) {
            return h.createUpdate("UPDATE markup SET resolved = :resolved, version = version + 1 WHERE id = :id AND version = :version")
                    .bind("resolved", resolved).bind("id", markupId).bind("version", version).execute() == 1;
        }
    }

    static Optional<Found> find(Connection c, long markupId) {
        return query(c, "WHERE m.id = :id", markupId).stream().findFirst();
    }

    static List<MarkupNote> forRevision(Connection c, long revisionId) {
        return query(c, "WHERE m.revision_id = :id", revisionId).stream().map(Found::markup).toList();
    }

    static int openCount(Connection c, long revisionId) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT COUNT(*) FROM markup WHERE revision_id = :revision AND resolved = FALSE")
                    .bind("revision", revisionId).mapTo(Integer.class).one();
        }
    }

    /** The markups {@code where} picks (its one bind is {@code :id}), each with its replies in the order they were made. */
    private static List<Found> query(Connection c, String where, long id) {
        List<Row> rows;
        try (Handle h = Sql.on(c)) {
            rows = h.createQuery("SELECT m.id, m.revision_id, m.target, m.author_id, m.author_initials, "
                            + "m.body, m.resolved, m.version, r.author_id AS r_author, r.author_initials AS r_initials, r.body AS r_body "
                            + "FROM markup m LEFT JOIN markup_reply r ON r.markup_id = m.id " + where + " ORDER BY m.id, r.id")
                    .bind("id", id).map((rs, ctx) -> new Row(read(rs), rs.getString("r_body") == null ? null
                            : new MarkupNote.Reply(rs.getLong("r_author"), rs.getString("r_initials"), rs.getString("r_body"))))
                    .list();
        }
        Map<Long, Found> byId = new LinkedHashMap<>();
        Map<Long, List<MarkupNote.Reply>> replies = new LinkedHashMap<>();
        for (Row row : rows) {
            long m = row.found().markup().id();
            byId.putIfAbsent(m, row.found());
            List<MarkupNote.Reply> rl = replies.computeIfAbsent(m, k -> new ArrayList<>());
            if (row.reply() != null) rl.add(row.reply());
        }
        List<Found> out = new ArrayList<>();
        for (Found f : byId.values()) {
            MarkupNote m = f.markup();
            out.add(new Found(f.revisionId(), new MarkupNote(m.id(), m.target(), m.authorId(), m.authorInitials(), m.text(),
                    m.resolved(), replies.get(m.id()), m.version())));
        }
        return out;
    }

    /** One row of the markup and reply join: the markup, and its reply where the row has one. */
    private record Row(Found found, MarkupNote.Reply reply) {}

    private static Found read(ResultSet rs) throws SQLException {
        MarkupNote m = new MarkupNote(rs.getLong("id"), MarkupTarget.decode(rs.getString("target")), rs.getLong("author_id"),
                rs.getString("author_initials"), rs.getString("body"), rs.getBoolean("resolved"), List.of(),
                rs.getLong("version"));
        return new Found(rs.getLong("revision_id"), m);
    }
}
