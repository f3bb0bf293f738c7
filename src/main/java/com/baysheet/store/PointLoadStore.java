package com.baysheet.store;

import com.baysheet.project.StoredLevel;
import com.baysheet.project.LineLoadEntry;
import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridPointLoad;

import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.statement.StatementContext;
import org.jdbi.v3.core.statement.Update;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The point loads of a level, stored by the stable ids of their grid lines (as {@link LineLoadStore} stores line loads).
 * Adding one derives the building like every model change, so a load outside its bay or off its member is refused
 * and nothing is saved; the grid store refuses to remove a line a load is placed by ({@link #requireLines}).
 */
public final class PointLoadStore {
    private final ModelWrites writes;

    public PointLoadStore(ModelWrites writes) {
        this.writes = writes;
    }

    public List<StoredPointLoad> findByLevel(long projectId, long levelId) {
        return writes.sql().tx(c -> {
            LevelStore.find(c, projectId, levelId);
            return findByLevel(c, levelId, GridStore.find(c, projectId));
        });
    }

    public StoredPointLoad add(Editor who, long projectId, long version, long levelId, PointLoadEntry e) {
        try {
            long id = writes.change(who, "point load added: " + e.label(), projectId, version, c -> insert(c, projectId, levelId, e));
            return findByLevel(projectId, levelId).stream().filter(l -> l.id() == id).findFirst().orElseThrow();
        } catch (InputError err) {
            throw asEntryField(err, e);
        }
    }

    /** Deletes a point load, kept for 30 days ({@link DeletedItems}) whether the pages or the API delete it. */
    public void delete(Editor who, long projectId, long version, long levelId, long id) {
        writes.change(who, c -> "point load deleted: " + LoadSnapshots.pointLabel(c, projectId, levelId, id), projectId, version, c -> {
            LoadSnapshots.keep(c, who, projectId, LevelStore.find(c, projectId, levelId), LoadSnapshots.POINT,
                    LoadSnapshots.pointLabel(c, projectId, levelId, id), writes.sql().now());
            try (Handle h = Sql.on(c)) {
                h.createUpdate("DELETE FROM point_load WHERE id = :id AND level_id = :level").bind("id", id).bind("level", levelId).execute();
            }
            return id;
        });
    }

    static long insert(Connection c, long projectId, long levelId, PointLoadEntry e) throws SQLException {
        LevelStore.find(c, projectId, levelId);
        Grid g = GridStore.find(c, projectId);
        if (e.liveOccupancy() != null && !OccupancyStore.catalogue(c).contains(e.liveOccupancy()))
            throw new InputError("liveOccupancy", e.liveOccupancy(), "is not in the occupancy catalogue");
        for (StoredPointLoad other : findByLevel(c, levelId, g))
            if (other.label().equalsIgnoreCase(e.label()))
                throw new InputError("label", e.label(), "is already the label of a point load on this level");
        try (Handle h = Sql.on(c)) {
            Update u = h.createUpdate("INSERT INTO point_load (level_id, label, in_bay, bay_x_line_id, bay_y_line_id, axis, line_id, "
                    + "from_line_id, to_line_id, x_offset, y_offset, dead_load, live_load, live_occupancy) VALUES (:level, :label, "
                    + ":inBay, :bayX, :bayY, :axis, :line, :from, :to, :xOffset, :yOffset, :dead, :live, :liveOccupancy)")
                    .bind("level", levelId).bind("label", e.label()).bind("inBay", e.inBay())
                    .bind("dead", e.dead()).bind("live", e.live()).bind("liveOccupancy", e.liveOccupancy());
            return place(u, g, e).executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
        }
    }

    /** In a bay: its south-west corner and the offsets; on a line: the line, its two bounds and the distance. */
    private static Update place(Update u, Grid g, PointLoadEntry e) {
        if (e.inBay())
            return u.bind("bayX", g.x().id(corner(g.x(), "xLine", e.xLine()))).bind("bayY", g.y().id(corner(g.y(), "yLine", e.yLine())))
                    .bind("axis", (String) null).bind("line", (Integer) null).bind("from", (Integer) null).bind("to", (Integer) null)
                    .bind("xOffset", e.x()).bind("yOffset", e.y());
        LineRef ref = LineRef.resolve(g, new LineLoadEntry(e.axis(), e.line(), e.from(), e.to(), e.label(), 0, Double.NaN,
                Double.NaN, 1, "any", false));
        GridAxis across = ref.onX() ? g.y() : g.x();
        // kept as entered: the distance runs from the from line toward the to line
        return u.bind("bayX", (Integer) null).bind("bayY", (Integer) null).bind("axis", ref.axis()).bind("line", ref.line())
                .bind("from", across.id(across.names().indexOf(e.from()))).bind("to", across.id(across.names().indexOf(e.to())))
                .bind("xOffset", e.distance()).bind("yOffset", (Double) null);
    }

    /** A bay's west (or south) line by name: it must have a line after it, or there is no bay. */
    private static int corner(GridAxis a, String field, String name) {
        int i = a.names().indexOf(name);
        if (i < 0 || i >= a.cells())
            throw new InputError(field, name, "is not a grid line along " + a.axis() + " with a bay after it ("
                    + String.join(", ", a.names().subList(0, a.cells())) + ")");
        return i;
    }

    static List<StoredPointLoad> findByLevel(Connection c, long levelId, Grid g) throws SQLException {
        List<StoredPointLoad> out = new ArrayList<>();
        for (Row r : rows(c, levelId)) {
            GridPointLoad p = r.onGrid(g, "level");
            String where = p.inBay() ? "bay " + g.bayName(p.col(), p.row())
                    : "line " + (p.onXLine() ? g.x() : g.y()).name(p.line()) + ", from " + (p.onXLine() ? g.y() : g.x()).name(p.from())
                      + " toward " + (p.onXLine() ? g.y() : g.x()).name(p.to());
            out.add(new StoredPointLoad(r.id, levelId, p.label(), p.inBay(), where, p.inBay() ? p.x() : Double.NaN,
                    p.inBay() ? p.y() : Double.NaN, p.inBay() ? Double.NaN : p.distance(), p.dead(), p.live(), p.liveOccupancy()));
        }
        return out;
    }

    /** The building's point loads on these levels, by line position (levels named as the building names them). */
    static List<GridPointLoad> forBuilding(Connection c, Grid g, List<StoredLevel> levels) throws SQLException {
        List<GridPointLoad> out = new ArrayList<>();
        for (StoredLevel level : levels) for (Row r : rows(c, level.id())) out.add(r.onGrid(g, level.name()));
        return out;
    }

    /** Refuses a grid change that would remove a line a point load is placed by, naming the load. */
    static void requireLines(Connection c, long projectId, Grid before, Grid after) throws SQLException {
        List<Map.Entry<String, Row>> loads;
        try (Handle h = Sql.on(c)) {
            loads = h.createQuery("SELECT b.name AS level_name, p.* FROM point_load p JOIN building_level b ON b.id = p.level_id "
                            + "WHERE b.project_id = :project ORDER BY p.id")
                    .bind("project", projectId).map((rs, ctx) -> Map.entry(rs.getString("level_name"), Row.of(rs, ctx))).list();
        }
        for (Map.Entry<String, Row> placed : loads) {
            String load = "point load \"" + placed.getValue().label + "\" on " + placed.getKey();
            for (int[] ref : placed.getValue().lines()) {
                GridAxis a = ref[0] == 0 ? before.x() : before.y(), now = ref[0] == 0 ? after.x() : after.y();
                if (now.indexOf(ref[1]) < 0) {
                    String name = a.name(a.indexOf(ref[1]));
                    throw new InputError("grid." + a.axis() + ".names", name, "grid line " + name + " cannot be removed: the "
                            + load + " is placed by it. Delete that point load first (the level's point loads page)");
                }
            }
        }
    }

    private static List<Row> rows(Connection c, long levelId) throws SQLException {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT * FROM point_load WHERE level_id = :level ORDER BY id").bind("level", levelId)
                    .map(Row::of).list();
        }
    }

    /** A stored row, its lines by stable id. */
    private record Row(long id, String label, boolean inBay, int bayX, int bayY, String axis, int line, int from, int to,
                       double xOffset, double yOffset, double dead, double live, String liveOccupancy) {
        static Row of(ResultSet rs, StatementContext ctx) throws SQLException {
            return new Row(rs.getLong("id"), rs.getString("label"), rs.getBoolean("in_bay"), rs.getInt("bay_x_line_id"),
                    rs.getInt("bay_y_line_id"), rs.getString("axis"), rs.getInt("line_id"), rs.getInt("from_line_id"),
                    rs.getInt("to_line_id"), rs.getDouble("x_offset"), Sql.getDouble(rs, "y_offset"), rs.getDouble("dead_load"),
                    rs.getDouble("live_load"), rs.getString("live_occupancy"));
        }

        /** {axis (0 x, 1 y), line id} of every line the load is placed by. */
        List<int[]> lines() {
            if (inBay) return List.of(new int[] {0, bayX}, new int[] {1, bayY});
            boolean onX = axis.equals("x");
            return List.of(new int[] {onX ? 0 : 1, line}, new int[] {onX ? 1 : 0, from}, new int[] {onX ? 1 : 0, to});
        }

        GridPointLoad onGrid(Grid g, String level) {
            if (inBay) return GridPointLoad.inBay(level, label, position(g.x(), bayX), position(g.y(), bayY), xOffset, yOffset, dead, live, liveOccupancy);
            boolean onX = axis.equals("x");
            GridAxis own = onX ? g.x() : g.y(), across = onX ? g.y() : g.x();
            return GridPointLoad.onLine(level, label, onX, position(own, line), position(across, from), position(across, to), xOffset,
                    dead, live, liveOccupancy);
        }

        private static int position(GridAxis a, int lineId) {
            int i = a.indexOf(lineId);
            if (i < 0) throw new IllegalStateException("point load on grid line id " + lineId + ", which is not in the grid along " + a.axis());
            return i;
        }
    }

    /** The derivation names a refused load by its place in the building; the entry names its own fields. */
    static InputError asEntryField(InputError e, PointLoadEntry entry) {
        String f = e.field(), own = "pointLoads[" + entry.label() + "]";
        if (!f.contains(own)) return e;
        String rest = f.substring(f.indexOf(own) + own.length());
        String field = switch (rest) {
            case ".x" -> "x";
            case ".y" -> "y";
            case ".distance" -> "distance";
            case ".liveOccupancy" -> "liveOccupancy";
            case ".to" -> "to";
            case ".bay" -> "xLine";
            default -> entry.inBay() ? "xLine" : "line";
        };
        String problem = rest.equals(".level") ? "the level has no framed bays yet: frame the bays beneath the load first" : e.problem();
        return new InputError(field, e.value(), problem.replaceFirst(" \\(got .*\\)$", ""));
    }
}
