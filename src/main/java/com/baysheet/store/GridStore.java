package com.baysheet.store;

import com.baysheet.engine.units.Display;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;

import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.statement.PreparedBatch;

import java.sql.Connection;
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
        PointLoadStore.requireLines(c, projectId, before, after);
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
    static void create(Connection c, long projectId, Grid grid) {
        write(c, projectId, withIds(c, projectId, grid, fresh(grid.x()), fresh(grid.y())));
    }

    /**
     * A new project's first grid with the ids it carries (an imported model file keeps its lines' ids, and so its
     * member ids); the project's next id is past them. Ids must differ across both axes.
     */
    static void createAsGiven(Connection c, long projectId, Grid grid) {
        java.util.Set<Integer> all = new java.util.HashSet<>(grid.x().ids());
        for (int id : grid.y().ids())
            if (!all.add(id)) throw new com.baysheet.engine.InputError("grid.y.ids", id, "is also the id of a line along x");
        write(c, projectId, grid);
        try (Handle h = Sql.on(c)) {
            h.createUpdate("UPDATE project SET next_line_id = :next WHERE id = :id")
                    .bind("next", all.stream().mapToInt(Integer::intValue).max().orElse(0) + 1).bind("id", projectId).execute();
        }
    }

    static Grid find(Connection c, long projectId) {
        try (Handle h = Sql.on(c)) {
            return new Grid(axis(h, projectId, "x"), axis(h, projectId, "y"));
        }
    }

    private static void write(Connection c, long projectId, Grid grid) {
        try (Handle h = Sql.on(c)) {
            h.createUpdate("DELETE FROM grid_line WHERE project_id = :project").bind("project", projectId).execute();
            PreparedBatch batch = h.prepareBatch("INSERT INTO grid_line (project_id, axis, seq, name, spacing_after, line_id) "
                    + "VALUES (:project, :axis, :seq, :name, :spacingAfter, :lineId)");
            for (GridAxis a : List.of(grid.x(), grid.y()))
                for (int i = 0; i < a.lines(); i++)
                    batch.bind("project", projectId).bind("axis", a.axis()).bind("seq", i).bind("name", a.name(i))
                            .bind("spacingAfter", i < a.cells() ? Sql.orNull(a.spacing(i)) : null).bind("lineId", a.id(i)).add();
            batch.execute();
        }
    }

    /** The grid with these ids, where {@link LineMatch#NEW} takes the project's next unused id. */
    private static Grid withIds(Connection c, long projectId, Grid g, List<Integer> xs, List<Integer> ys) {
        try (Handle h = Sql.on(c)) {
            int next = h.createQuery("SELECT next_line_id FROM project WHERE id = :id").bind("id", projectId)
                    .mapTo(Integer.class).findOne().orElseThrow(() -> new NotFound("project", projectId));
            List<Integer> x = new ArrayList<>(), y = new ArrayList<>();
            for (int id : xs) x.add(id == LineMatch.NEW ? next++ : id);
            for (int id : ys) y.add(id == LineMatch.NEW ? next++ : id);
            h.createUpdate("UPDATE project SET next_line_id = :next WHERE id = :id").bind("next", next).bind("id", projectId).execute();
            return new Grid(g.x().withIds(x), g.y().withIds(y));
        }
    }

    private static List<Integer> fresh(GridAxis a) {
        List<Integer> out = new ArrayList<>();
        for (int i = 0; i < a.lines(); i++) out.add(LineMatch.NEW);
        return out;
    }

    /** A grid line row: its name, the spacing to the next line (NaN for the last) and its stable id. */
    private record Line(String name, double spacingAfter, int id) {}

    private static GridAxis axis(Handle h, long projectId, String axis) {
        List<Line> lines = h.createQuery("SELECT name, spacing_after, line_id FROM grid_line WHERE project_id = :project AND axis = :axis ORDER BY seq")
                .bind("project", projectId).bind("axis", axis)
                .map((rs, ctx) -> new Line(rs.getString("name"), Sql.getDouble(rs, "spacing_after"), rs.getInt("line_id"))).list();
        List<String> names = new ArrayList<>();
        List<Double> spacings = new ArrayList<>();
        List<Integer> ids = new ArrayList<>();
        for (Line l : lines) {
            names.add(l.name());
            if (!Double.isNaN(l.spacingAfter())) spacings.add(l.spacingAfter());
            ids.add(l.id());
        }
        return new GridAxis(axis, names, spacings, ids);
    }
}
