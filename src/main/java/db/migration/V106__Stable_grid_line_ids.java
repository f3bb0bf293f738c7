package db.migration;

import org.flywaydb.core.api.migration.BaseJavaMigration;
import org.flywaydb.core.api.migration.Context;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.OffsetDateTime;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Grid lines get stable ids; bays are keyed by the ids of the lines at their south-west corner instead of
 * by cell position; member sheets move from position-based member ids to the ids built from level and
 * line ids. Self-contained on purpose (plain JDBC, no application class), so that it reads the same
 * whatever the application becomes. Alters tables in place, so columns other migrations add to bay survive.
 *
 * <p>Old member ids were "L" + the level's place among the levels that had a floor (ordered by elevation,
 * then id) + "-c" / "-h" / "-v" + x line index + "x" + y line index, or "-bay" + x index + "x" + y index +
 * "-b" + beam number. Each is mapped with today's grid and levels, which is the member the sheet is shown
 * against today. A subject that names no line or level of today's model (its member had already gone) is
 * kept under "retired-" + the old id, so that no new member can ever take its history. Each move is
 * written to the audit trail.
 */
public class V106__Stable_grid_line_ids extends BaseJavaMigration {
    static final Pattern POINT = Pattern.compile("L(\\d+)-([chv])(\\d+)x(\\d+)");
    static final Pattern INFILL = Pattern.compile("L(\\d+)-bay(\\d+)x(\\d+)-b(\\d+)");
    static final String RETIRED = "retired-";

    @Override
    public void migrate(Context context) throws Exception {
        Connection c = context.getConnection();
        try (Statement s = c.createStatement()) {
            s.execute("ALTER TABLE grid_line ADD COLUMN line_id INT");
            s.execute("ALTER TABLE project ADD COLUMN next_line_id INT DEFAULT 1 NOT NULL");
        }
        Map<Long, Map<String, List<Integer>>> lines = numberLines(c);
        try (Statement s = c.createStatement()) {
            s.execute("ALTER TABLE grid_line ALTER COLUMN line_id SET NOT NULL");
            s.execute("ALTER TABLE grid_line ADD CONSTRAINT uq_grid_line_id UNIQUE (project_id, line_id)");
            s.execute("ALTER TABLE bay ADD COLUMN x_line INT");
            s.execute("ALTER TABLE bay ADD COLUMN y_line INT");
            for (String[] a : new String[][]{{"x", "col_index"}, {"y", "row_index"}})
                s.execute("UPDATE bay SET " + a[0] + "_line = (SELECT g.line_id FROM grid_line g JOIN building_level l "
                        + "ON g.project_id = l.project_id WHERE l.id = bay.level_id AND g.axis = '" + a[0]
                        + "' AND g.seq = bay." + a[1] + ")");
            s.execute("ALTER TABLE bay DROP CONSTRAINT pk_bay");
            s.execute("ALTER TABLE bay DROP COLUMN col_index");
            s.execute("ALTER TABLE bay DROP COLUMN row_index");
            s.execute("ALTER TABLE bay ALTER COLUMN x_line SET NOT NULL");
            s.execute("ALTER TABLE bay ALTER COLUMN y_line SET NOT NULL");
            s.execute("ALTER TABLE bay ADD CONSTRAINT pk_bay PRIMARY KEY (level_id, x_line, y_line)");
        }
        for (Map.Entry<Long, Map<String, List<Integer>>> p : lines.entrySet())
            rekeySheets(c, p.getKey(), framedLevels(c, p.getKey()), p.getValue());
    }

    /** Numbers each project's lines 1, 2, ... (x lines first, in order) and sets the project's counter past them. */
    private static Map<Long, Map<String, List<Integer>>> numberLines(Connection c) throws SQLException {
        Map<Long, Map<String, List<Integer>>> out = new LinkedHashMap<>();
        List<Object[]> rows = new ArrayList<>();
        try (Statement s = c.createStatement();
             ResultSet rs = s.executeQuery("SELECT project_id, axis, seq FROM grid_line ORDER BY project_id, axis, seq")) {
            while (rs.next()) rows.add(new Object[]{rs.getLong(1), rs.getString(2), rs.getInt(3)});
        }
        try (PreparedStatement ps = c.prepareStatement("UPDATE grid_line SET line_id = ? WHERE project_id = ? AND axis = ? AND seq = ?")) {
            for (Object[] r : rows) {
                Map<String, List<Integer>> axes = out.computeIfAbsent((Long) r[0], k -> new HashMap<>());
                int id = axes.values().stream().mapToInt(List::size).sum() + 1;
                axes.computeIfAbsent((String) r[1], k -> new ArrayList<>()).add(id);
                ps.setInt(1, id);
                ps.setLong(2, (Long) r[0]);
                ps.setString(3, (String) r[1]);
                ps.setInt(4, (Integer) r[2]);
                ps.addBatch();
            }
            ps.executeBatch();
        }
        try (PreparedStatement ps = c.prepareStatement("UPDATE project SET next_line_id = ? WHERE id = ?")) {
            for (Map.Entry<Long, Map<String, List<Integer>>> p : out.entrySet()) {
                ps.setInt(1, p.getValue().values().stream().mapToInt(List::size).sum() + 1);
                ps.setLong(2, p.getKey());
                ps.addBatch();
            }
            ps.executeBatch();
        }
        return out;
    }

    /** The ids of the levels the old derivation numbered 0, 1, ...: those with a floor, by elevation then id. */
    private static List<Long> framedLevels(Connection c, long projectId) throws SQLException {
        List<Long> out = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT l.id FROM building_level l WHERE l.project_id = ? AND EXISTS "
                + "(SELECT 1 FROM bay b WHERE b.level_id = l.id AND b.is_opening = FALSE) ORDER BY l.elevation, l.id")) {
            ps.setLong(1, projectId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) out.add(rs.getLong(1));
            }
        }
        return out;
    }

    private static void rekeySheets(Connection c, long projectId, List<Long> levels, Map<String, List<Integer>> lines)
            throws SQLException {
        Map<Long, String[]> moves = new LinkedHashMap<>();
        try (PreparedStatement ps = c.prepareStatement("SELECT id, subject FROM review_sheet WHERE project_id = ? ORDER BY id")) {
            ps.setLong(1, projectId);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    String old = rs.getString(2), now = newSubject(old, levels, lines);
                    if (!now.equals(old)) moves.put(rs.getLong(1), new String[]{old, now});
                }
            }
        }
        if (moves.isEmpty()) return;
        // two passes: a new subject may be some other sheet's old one until that sheet has moved too
        try (PreparedStatement tmp = c.prepareStatement("UPDATE review_sheet SET subject = ? WHERE id = ?");
             PreparedStatement fin = c.prepareStatement("UPDATE review_sheet SET subject = ? WHERE id = ?")) {
            for (Map.Entry<Long, String[]> m : moves.entrySet()) {
                tmp.setString(1, "moving-" + m.getKey());
                tmp.setLong(2, m.getKey());
                tmp.addBatch();
                fin.setString(1, m.getValue()[1]);
                fin.setLong(2, m.getKey());
                fin.addBatch();
            }
            tmp.executeBatch();
            fin.executeBatch();
        }
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO audit_event (occurred_at, actor_id, actor_username, "
                + "action, subject, detail, address) VALUES (?, NULL, 'migration', 'sheet re-keyed', ?, ?, '')")) {
            for (String[] m : moves.values()) {
                ps.setObject(1, OffsetDateTime.now());
                ps.setString(2, "project " + projectId + " member " + m[1]);
                ps.setString(3, "was member " + m[0] + ": member ids are made of level and grid line ids since V106");
                ps.addBatch();
            }
            ps.executeBatch();
        }
    }

    /** The subject under the new ids; a package's or any other subject not in the old member form is kept. */
    static String newSubject(String old, List<Long> levels, Map<String, List<Integer>> lines) {
        Matcher p = POINT.matcher(old), b = INFILL.matcher(old);
        Matcher m = p.matches() ? p : b.matches() ? b : null;
        if (m == null) return old;
        Long level = at(levels, m.group(1));
        Integer x = at(lines.getOrDefault("x", List.of()), m == p ? m.group(3) : m.group(2));
        Integer y = at(lines.getOrDefault("y", List.of()), m == p ? m.group(4) : m.group(3));
        if (level == null || x == null || y == null) return RETIRED + old;
        return m == p ? "L" + level + "-" + m.group(2) + x + "x" + y : "L" + level + "-bay" + x + "x" + y + "-b" + m.group(4);
    }

    private static <T> T at(List<T> list, String index) {
        try {
            int i = Integer.parseInt(index);
            return i < list.size() ? list.get(i) : null;
        } catch (NumberFormatException e) {
            return null; // too many digits: no such position
        }
    }
}
