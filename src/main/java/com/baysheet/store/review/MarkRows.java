package com.baysheet.store.review;

import com.baysheet.review.Mark;
import com.baysheet.store.Sql;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.sql.Types;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/** Rows of member_mark and member_mark_location, on the caller's connection. */
final class MarkRows {
    private MarkRows() {}

    static List<Mark> all(Connection c, long projectId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT id, prefix, seq_no, mark_text, calc_sha256, origin_id, active "
                + "FROM member_mark WHERE project_id = ? ORDER BY prefix, seq_no")) {
            ps.setLong(1, projectId);
            List<Mark> out = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    long origin = rs.getLong("origin_id");
                    Long o = rs.wasNull() ? null : origin;
                    out.add(new Mark(rs.getLong("id"), rs.getString("prefix"), rs.getInt("seq_no"), rs.getString("mark_text"),
                            rs.getString("calc_sha256"), o, rs.getBoolean("active")));
                }
            }
            return out;
        }
    }

    /** Each member id of the project and the id of the mark it carries. */
    static Map<String, Long> carried(Connection c, long projectId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT member_id, mark_id FROM member_mark_location WHERE project_id = ?")) {
            ps.setLong(1, projectId);
            Map<String, Long> out = new HashMap<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) out.put(rs.getString(1), rs.getLong(2));
            }
            return out;
        }
    }

    static long insert(Connection c, long projectId, Mark m, Instant at) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO member_mark (project_id, prefix, seq_no, mark_text, calc_sha256, "
                + "origin_id, active, created_at) VALUES (?, ?, ?, ?, ?, ?, ?, ?)", Statement.RETURN_GENERATED_KEYS)) {
            ps.setLong(1, projectId);
            ps.setString(2, m.prefix());
            ps.setInt(3, m.seq());
            ps.setString(4, m.text());
            ps.setString(5, m.calc());
            if (m.originId() == null) ps.setNull(6, Types.BIGINT);
            else ps.setLong(6, m.originId());
            ps.setBoolean(7, m.active());
            ps.setObject(8, Sql.stamp(at));
            ps.executeUpdate();
            try (ResultSet keys = ps.getGeneratedKeys()) {
                keys.next();
                return keys.getLong(1);
            }
        }
    }

    /** Writes the calculation a mark now stands for and whether it is carried. */
    static void update(Connection c, Mark m) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE member_mark SET calc_sha256 = ?, active = ? WHERE id = ?")) {
            ps.setString(1, m.calc());
            ps.setBoolean(2, m.active());
            ps.setLong(3, m.id());
            ps.executeUpdate();
        }
    }

    static void rename(Connection c, long markId, String text) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("UPDATE member_mark SET mark_text = ? WHERE id = ?")) {
            ps.setString(1, text);
            ps.setLong(2, markId);
            ps.executeUpdate();
        }
    }

    /** Replaces the project's member → mark rows. */
    static void locate(Connection c, long projectId, Map<String, Long> carried) throws SQLException {
        try (PreparedStatement del = c.prepareStatement("DELETE FROM member_mark_location WHERE project_id = ?")) {
            del.setLong(1, projectId);
            del.executeUpdate();
        }
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO member_mark_location (project_id, member_id, mark_id) VALUES (?, ?, ?)")) {
            for (var e : carried.entrySet()) {
                ps.setLong(1, projectId);
                ps.setString(2, e.getKey());
                ps.setLong(3, e.getValue());
                ps.addBatch();
            }
            ps.executeBatch();
        }
    }
}
