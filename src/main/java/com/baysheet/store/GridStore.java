package com.baysheet.store;

import com.baysheet.engine.units.Display;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

/**
 * A project's grid: named lines along x and along y with the spacing from each to the next. Every line has
 * a stable id (never reused within the project: the project row counts them out); bays and member ids
 * follow the ids, names are labels.
 */
public final class GridStore {
    private final ModelWrites writes;

    public GridStore(ModelWrites writes) {
        this.writes = writes;
    }

    public Grid find(long projectId) {
        return writes.sql().tx(c -> {
            ProjectStore.find(c, projectId);
            return find(c, projectId);
        });
    }

    /**
     * Replaces the grid, keeping each line's id where {@link LineMatch} finds the line again: bays split at an
     * inserted line and merge at a removed one ({@link BayRegrid}), or the change is refused naming the bays; a
     * line a line load runs along or ends at is not removed ({@link LineLoadStore#requireLines}).
     */
    public void save(Editor who, long projectId, long version, Grid grid) {
        writes.change(who, c -> "grid saved: " + describe(grid) + "; was: " + describe(find(c, projectId)), projectId, version, c -> {
            replace(c, projectId, grid);
            return null;
        });
    }

    /** The grid replaced as {@link #save} does, in the caller's change. */
    static void replace(Connection c, long projectId, Grid grid) throws SQLException {
        Grid before = find(c, projectId);
        Grid after = withIds(c, projectId, grid, LineMatch.ids(before.x(), grid.x()), LineMatch.ids(before.y(), grid.y()));
        LineLoadStore.requireLines(c, projectId, before, after);
        BayRegrid.apply(c, projectId, before, after);
        write(c, projectId, after);
    }

    /** The grid as a line of text: the line names with the spacings between them, x then y. */
    static String describe(Grid g) {
        return describe(g.x()) + "; " + describe(g.y());
    }

    private static String describe(GridAxis a) {
        StringBuilder b = new StringBuilder(a.axis()).append(": ").append(a.name(0));
        for (int i = 0; i < a.cells(); i++) b.append(" ").append(Display.plain(a.spacing(i))).append(" ").append(a.name(i + 1));
        return b.toString();
    }

    /** A new project's first grid: every line gets a fresh id. */
    static void create(Connection c, long projectId, Grid grid) throws SQLException {
        write(c, projectId, withIds(c, projectId, grid, fresh(grid.x()), fresh(grid.y())));
    }

    /**
     * A new project's first grid with the ids it carries (an imported model file keeps its lines' ids, and so its
     * member ids); the project's next id is past them. Ids must differ across both axes.
     */
    static void createAsGiven(Connection c, long projectId, Grid grid) throws SQLException {
        java.util.Set<Integer> all = new java.util.HashSet<>(grid.x().ids());
        for (int id : grid.y().ids())
            if (!all.add(id)) throw new com.baysheet.engine.InputError("grid.y.ids", id, "is also the id of a line along x");
        write(c, projectId, grid);
        try (PreparedStatement ps = c.prepareStatement("UPDATE project SET next_line_id = ? WHERE id = ?")) {
            ps.setInt(1, all.stream().mapToInt(Integer::intValue).max().orElse(0) + 1);
            ps.setLong(2, projectId);
            ps.executeUpdate();
        }
    }

    static Grid find(Connection c, long projectId) throws SQLException {
        return new Grid(axis(c, projectId, "x"), axis(c, projectId, "y"));
    }

    private static void write(Connection c, long projectId, Grid grid) throws SQLException {
        try (PreparedStatement del = c.prepareStatement("DELETE FROM grid_line WHERE project_id = ?")) {
            del.setLong(1, projectId);
            del.executeUpdate();
        }
        try (PreparedStatement ps = c.prepareStatement(
                "INSERT INTO grid_line (project_id, axis, seq, name, spacing_after, line_id) VALUES (?, ?, ?, ?, ?, ?)")) {
            for (GridAxis a : List.of(grid.x(), grid.y())) {
                for (int i = 0; i < a.lines(); i++) {
                    ps.setLong(1, projectId);
                    ps.setString(2, a.axis());
                    ps.setInt(3, i);
                    ps.setString(4, a.name(i));
                    Sql.setDouble(ps, 5, i < a.cells() ? a.spacing(i) : null);
                    ps.setInt(6, a.id(i));
                    ps.addBatch();
                }
            }
            ps.executeBatch();
        }
    }

    /** The grid with these ids, where {@link LineMatch#NEW} takes the project's next unused id. */
    private static Grid withIds(Connection c, long projectId, Grid g, List<Integer> xs, List<Integer> ys) throws SQLException {
        int next = nextLineId(c, projectId);
        List<Integer> x = new ArrayList<>(), y = new ArrayList<>();
        for (int id : xs) x.add(id == LineMatch.NEW ? next++ : id);
        for (int id : ys) y.add(id == LineMatch.NEW ? next++ : id);
        try (PreparedStatement ps = c.prepareStatement("UPDATE project SET next_line_id = ? WHERE id = ?")) {
            ps.setInt(1, next);
            ps.setLong(2, projectId);
            ps.executeUpdate();
        }
        return new Grid(g.x().withIds(x), g.y().withIds(y));
    }

    private static int nextLineId(Connection c, long projectId) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT next_line_id FROM project WHERE id = ?")) {
            ps.setLong(1, projectId);
            try (ResultSet rs = ps.executeQuery()) {
                if (!rs.next()) throw new NotFound("project", projectId);
                return rs.getInt(1);
            }
        }
    }

    private static List<Integer> fresh(GridAxis a) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < a.lines(); i++) out.add(LineMatch.NEW);
        return out;
    }

    private static GridAxis axis(Connection c, long projectId, String axis) throws SQLException {
        List<String> names = new ArrayList<>();
        List<Double> spacings = new ArrayList<>();
        List<Integer> ids = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement(
                "SELECT name, spacing_after, line_id FROM grid_line WHERE project_id = ? AND axis = ? ORDER BY seq")) {
            ps.setLong(1, projectId);
            ps.setString(2, axis);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    names.add(rs.getString(1));
                    double s = Sql.getDouble(rs, "spacing_after");
                    if (!Double.isNaN(s)) spacings.add(s);
                    ids.add(rs.getInt(3));
                }
            }
        }
        return new GridAxis(axis, names, spacings, ids);
    }
}
