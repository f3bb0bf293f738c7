package com.baysheet.store.review;

import com.baysheet.review.Mark;
import com.baysheet.store.Sql;

import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.statement.PreparedBatch;

import java.sql.Connection;
import java.time.Instant;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Collection;
import java.util.function.Function;
import java.util.stream.Collectors;

/** Rows of member_mark and member_mark_location, on the caller's connection. */
final class MarkRows {
    private MarkRows() {}

    static List<Mark> all(Connection c, long projectId) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT id, prefix, seq_no, mark_text, calc_sha256, origin_id, active "
                            + "FROM member_mark WHERE project_id = :project ORDER BY prefix, seq_no")
                    .bind("project", projectId)
                    .map((rs, ctx) -> {
                        long origin = rs.getLong("origin_id");
                        Long o = rs.wasNull() ? null : origin;
                        return new Mark(rs.getLong("id"), rs.getString("prefix"), rs.getInt("seq_no"), rs.getString("mark_text"),
                                rs.getString("calc_sha256"), o, rs.getBoolean("active"));
                    })
                    .list();
        }
    }

    /** Each member id of the project and the id of the mark it carries. */
    static Map<String, Long> carried(Connection c, long projectId) {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT member_id, mark_id FROM member_mark_location WHERE project_id = :project")
                    .bind("project", projectId).map((rs, ctx) -> Map.entry(rs.getString(1), rs.getLong(2)))
                    .collect(Collectors.toMap(Map.Entry::getKey, Map.Entry::getValue));
        }
    }

    static long insert(Connection c, long projectId, Mark m, Instant at) {
        try (Handle h = Sql.on(c)) {
            return h.createUpdate("INSERT INTO member_mark (project_id, prefix, seq_no, mark_text, calc_sha256, origin_id, active, "
                            + "created_at) VALUES (:project, :prefix, :seq, :text, :calc, :origin, :active, :at)")
                    .bind("project", projectId).bind("prefix", m.prefix()).bind("seq", m.seq()).bind("text", m.text())
                    .bind("calc", m.calc()).bind("origin", m.originId()).bind("active", m.active()).bind("at", Sql.stampOf(at))
                    .executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
        }
    }

    /** Writes the calculation each mark now stands for and whether it is carried, in one batch. */
    static void update(Connection c, List<Mark> marks) {
        if (marks.isEmpty()) return;
        try (Handle h = Sql.on(c)) {
            PreparedBatch b = h.prepareBatch("UPDATE member_mark SET calc_sha256 = :calc, active = :active WHERE id = :id");
            for (Mark m : marks) b.bind("calc", m.calc()).bind("active", m.active()).bind("id", m.id()).add();
            b.execute();
        }
    }

    static void rename(Connection c, long markId, String text) {
        try (Handle h = Sql.on(c)) {
            h.createUpdate("UPDATE member_mark SET mark_text = :text WHERE id = :id").bind("text", text).bind("id", markId).execute();
        }
    }

    /**
     * Brings the rows of {@code members} from the mark each carried ({@code before}, as stored; null: no row) to the mark
     * it carries now ({@code after}; null: no row), writing only the rows that differ: an edit of one bay moves a few
     * members of a building of tens of thousands.
     */
    static void locate(Connection c, long projectId, Collection<String> members, Function<String, Long> before, Function<String, Long> after) {
        try (Handle h = Sql.on(c)) {
            PreparedBatch gone = h.prepareBatch("DELETE FROM member_mark_location WHERE project_id = :project AND member_id = :member");
            PreparedBatch shifted = h.prepareBatch("UPDATE member_mark_location SET mark_id = :mark WHERE project_id = :project AND member_id = :member");
            PreparedBatch added = h.prepareBatch("INSERT INTO member_mark_location (project_id, member_id, mark_id) VALUES (:project, :member, :mark)");
            for (String member : members) {
                Long was = before.apply(member), now = after.apply(member);
                if (Objects.equals(was, now)) continue;
                if (now == null) gone.bind("project", projectId).bind("member", member).add();
                else (was == null ? added : shifted).bind("project", projectId).bind("member", member).bind("mark", now).add();
            }
            for (PreparedBatch b : new PreparedBatch[]{gone, shifted, added}) if (b.size() > 0) b.execute();
        }
    }
}
