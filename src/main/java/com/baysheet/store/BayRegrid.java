package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.project.StoredLevel;

import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.argument.Argument;
import org.jdbi.v3.core.statement.PreparedBatch;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.ResultSetMetaData;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;

/**
 * Carries every level's bays over a change of grid lines. A bay is keyed by the ids of the lines at its
 * south-west corner, so lines kept keep their bays. An inserted line splits each bay it crosses: both halves
 * keep the whole assignment, and a cantilever only on a side that still faces the edge. A removed line merges
 * the bays on either side when they agree (everything but the cantilevers on the two sides that meet); the
 * merged bay keeps the outer cantilevers. A removal that would merge bays that differ, or drop the bays of an
 * edge strip, is refused with the bays named by grid lines.
 *
 * <p>Rows are copied column by column as the table has them, so columns this class does not know (added by
 * later migrations) are split, compared and merged like the rest.
 */
final class BayRegrid {
    private static final List<String> KEY = List.of("level_id", "x_line", "y_line");
    private static final int MAX_NAMED = 6;

    private final Map<Long, String> levelNames = new LinkedHashMap<>();
    private final Map<Long, Map<List<Integer>, Map<String, Object>>> bays = new LinkedHashMap<>();
    private final Map<String, Integer> types = new LinkedHashMap<>();
    private final Map<Integer, String> names = new HashMap<>();

    private BayRegrid() {}

    static void apply(Connection c, long projectId, Grid before, Grid after) throws SQLException {
        if (before.x().ids().equals(after.x().ids()) && before.y().ids().equals(after.y().ids())) return;
        BayRegrid r = new BayRegrid();
        r.read(c, projectId);
        for (GridAxis a : List.of(before.x(), before.y(), after.x(), after.y()))
            for (int i = 0; i < a.lines(); i++) r.names.putIfAbsent(a.id(i), a.name(i));
        List<Integer> ys = new ArrayList<>(before.y().ids());
        List<Integer> xs = r.axis(0, new ArrayList<>(before.x().ids()), after.x().ids(), ys, "x", "west", "east");
        r.axis(1, ys, after.y().ids(), xs, "y", "south", "north");
        r.write(c);
    }

    /** Applies one axis's removals, then its insertions, to {@code lines} (changed in place, and returned). */
    private List<Integer> axis(int k, List<Integer> lines, List<Integer> target, List<Integer> across, String axis,
                               String lo, String hi) {
        for (int removed : List.copyOf(lines)) {
            if (target.contains(removed)) continue;
            remove(k, lines, across, removed, axis, lo, hi);
            lines.remove(Integer.valueOf(removed));
        }
        for (int n = 0; n < target.size(); n++) {
            int line = target.get(n);
            if (lines.contains(line)) continue;
            Integer prev = n == 0 ? null : target.get(n - 1);
            lines.add(prev == null ? 0 : lines.indexOf(prev) + 1, line);
            if (prev != null) split(k, prev, line, lo, hi);
        }
        return lines;
    }

    private void split(int k, int start, int inserted, String lo, String hi) {
        for (Map<List<Integer>, Map<String, Object>> level : bays.values()) {
            for (Map<String, Object> row : List.copyOf(level.values())) {
                if (!row.get(k == 0 ? "x_line" : "y_line").equals(start)) continue;
                Map<String, Object> half = new LinkedHashMap<>(row);
                half.put(k == 0 ? "x_line" : "y_line", inserted);
                half.put("cantilever_" + lo, null);
                row.put("cantilever_" + hi, null);
                level.put(key(half), half);
            }
        }
    }

    private void remove(int k, List<Integer> lines, List<Integer> across, int removed, String axis, String lo, String hi) {
        int at = lines.indexOf(removed);
        String line = names.get(removed);
        List<String> problems = new ArrayList<>();
        if (at == 0 || at == lines.size() - 1) {
            int strip = at == 0 ? removed : lines.get(at - 1);
            for (Map.Entry<Long, Map<List<Integer>, Map<String, Object>>> level : bays.entrySet())
                for (Map<String, Object> row : level.getValue().values())
                    if (row.get(k == 0 ? "x_line" : "y_line").equals(strip)) problems.add(level(level.getKey()) + name(row, lines, across, k));
            if (!problems.isEmpty())
                throw refused(axis, line, "grid line " + line + " is an edge of the grid and the bays " + list(problems)
                        + " would go with it: clear them in the bay editor first");
            return;
        }
        int left = lines.get(at - 1);
        for (Map.Entry<Long, Map<List<Integer>, Map<String, Object>>> level : bays.entrySet()) {
            Map<List<Integer>, Map<String, Object>> rows = level.getValue();
            for (int o = 0; o + 1 < across.size(); o++) {
                Map<String, Object> a = rows.get(at(k, left, across.get(o))), b = rows.get(at(k, removed, across.get(o)));
                if (a == null && b == null) continue;
                String differs = a == null || b == null ? (a == null ? first(b, lines, across, k) : first(a, lines, across, k)) + " is framed, the other not"
                        : difference(a, b, lo, hi);
                if (differs != null) {
                    Map<String, Object> any = a != null ? a : b;
                    problems.add(level(level.getKey()) + pair(any, left, removed, lines, across, k) + " (" + differs + ")");
                    continue;
                }
                a.put("cantilever_" + hi, b.get("cantilever_" + hi));
                rows.remove(key(b));
            }
        }
        if (!problems.isEmpty())
            throw refused(axis, line, "grid line " + line + " cannot be removed: the bays on either side differ: " + list(problems)
                    + ". Give each pair the same assignment (or clear both) in the bay editor, then remove the line");
    }

    /** What two bays disagree on, or null when they may become one bay. */
    private String difference(Map<String, Object> a, Map<String, Object> b, String lo, String hi) {
        for (String col : types.keySet()) {
            if (KEY.contains(col) || col.equals("cantilever_" + lo) || col.equals("cantilever_" + hi)) continue;
            if (!Objects.equals(a.get(col), b.get(col))) return label(col) + " " + show(a.get(col)) + " / " + show(b.get(col));
        }
        if (a.get("cantilever_" + hi) != null || b.get("cantilever_" + lo) != null) return "a cantilever between them";
        return null;
    }

    private void read(Connection c, long projectId) throws SQLException {
        for (StoredLevel l : LevelStore.findByProject(c, projectId)) {
            levelNames.put(l.id(), l.name());
            Map<List<Integer>, Map<String, Object>> rows = new LinkedHashMap<>();
            try (Handle h = Sql.on(c)) {
                // the whole result set, with its column types, even where the level has no bays
                h.createQuery("SELECT * FROM bay WHERE level_id = :level").bind("level", l.id()).scanResultSet((result, ctx) -> {
                    ResultSet rs = result.get();
                    ResultSetMetaData md = rs.getMetaData();
                    for (int i = 1; i <= md.getColumnCount(); i++) types.put(md.getColumnLabel(i).toLowerCase(), md.getColumnType(i));
                    while (rs.next()) {
                        Map<String, Object> row = new LinkedHashMap<>();
                        for (int i = 1; i <= md.getColumnCount(); i++) row.put(md.getColumnLabel(i).toLowerCase(), rs.getObject(i));
                        row.put("x_line", rs.getInt("x_line"));
                        row.put("y_line", rs.getInt("y_line"));
                        rows.put(key(row), row);
                    }
                    return rows;
                });
            }
            bays.put(l.id(), rows);
        }
    }

    /** Every level's bays written back, each column bound by its own name as it was read (a NULL with the column's type). */
    private void write(Connection c) throws SQLException {
        if (types.isEmpty()) return;
        List<String> cols = List.copyOf(types.keySet());
        try (Handle h = Sql.on(c)) {
            PreparedBatch ins = h.prepareBatch("INSERT INTO bay (" + String.join(", ", cols) + ") VALUES ("
                    + String.join(", ", cols.stream().map(col -> ":" + col).toList()) + ")");
            for (Map.Entry<Long, Map<List<Integer>, Map<String, Object>>> level : bays.entrySet()) {
                h.createUpdate("DELETE FROM bay WHERE level_id = :level").bind("level", level.getKey()).execute();
                for (Map<String, Object> row : level.getValue().values()) {
                    for (String col : cols) ins.bind(col, column(row.get(col), types.get(col)));
                    ins.add();
                }
            }
            if (ins.size() > 0) ins.execute();
        }
    }

    private static Argument column(Object v, int type) {
        return v == null ? (position, statement, ctx) -> statement.setNull(position, type)
                : (position, statement, ctx) -> statement.setObject(position, v);
    }

    private static List<Integer> key(Map<String, Object> row) {
        return List.of((Integer) row.get("x_line"), (Integer) row.get("y_line"));
    }

    private static List<Integer> at(int k, int line, int other) {
        return k == 0 ? List.of(line, other) : List.of(other, line);
    }

    private String level(long id) { return "on " + levelNames.get(id) + " "; }

    /** A bay's name in the trade's form, "A-B/1-2" (y lines, then x lines), from the lines as they stand. */
    private String name(Map<String, Object> row, List<Integer> lines, List<Integer> across, int k) {
        int x = (Integer) row.get("x_line"), y = (Integer) row.get("y_line");
        List<Integer> xs = k == 0 ? lines : across, ys = k == 0 ? across : lines;
        return span(ys, y) + "/" + span(xs, x);
    }

    private String first(Map<String, Object> row, List<Integer> lines, List<Integer> across, int k) {
        return name(row, lines, across, k);
    }

    /** "A-B/1-2 and A-B/2-3": the two bays a removed line would merge. */
    private String pair(Map<String, Object> row, int left, int removed, List<Integer> lines, List<Integer> across, int k) {
        Map<String, Object> a = new HashMap<>(row), b = new HashMap<>(row);
        a.put(k == 0 ? "x_line" : "y_line", left);
        b.put(k == 0 ? "x_line" : "y_line", removed);
        return name(a, lines, across, k) + " and " + name(b, lines, across, k);
    }

    private String span(List<Integer> lines, int start) {
        int i = lines.indexOf(start);
        return names.get(start) + "-" + (i >= 0 && i + 1 < lines.size() ? names.get(lines.get(i + 1)) : "?");
    }

    private static String list(List<String> bays) {
        List<String> shown = bays.size() > MAX_NAMED ? bays.subList(0, MAX_NAMED) : bays;
        return String.join("; ", shown) + (bays.size() > MAX_NAMED ? " and " + (bays.size() - MAX_NAMED) + " more" : "");
    }

    private static String label(String column) {
        return switch (column) {
            case "is_opening" -> "opening";
            case "beam_direction" -> "infill beam direction";
            default -> column.replace('_', ' ');
        };
    }

    private static String show(Object v) {
        return v == null ? "none" : v instanceof Double d ? com.baysheet.engine.units.Display.plain(d) : String.valueOf(v);
    }

    private static InputError refused(String axis, String line, String problem) {
        return new InputError("grid." + axis + ".names", line, problem);
    }
}
