package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.project.LineLoadEntry;
import com.baysheet.project.StoredLevel;
import com.baysheet.project.StoredLineLoad;

import org.jdbi.v3.core.Handle;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

/**
 * The line loads of a level, stored by the stable ids of their grid lines. Adding one derives the building
 * like every model change, so a load with no member beneath it is refused and nothing is saved; the grid
 * store refuses to remove a line a load runs along or ends at ({@link #requireLines}).
 */
public final class LineLoadStore {
    private final ModelWrites writes;

    public LineLoadStore(ModelWrites writes) {
        this.writes = writes;
    }

    public List<StoredLineLoad> findByLevel(long projectId, long levelId) {
        return writes.sql().tx(c -> {
            LevelStore.find(c, projectId, levelId);
            return findByLevel(c, levelId, GridStore.find(c, projectId));
        });
    }

    public StoredLineLoad add(Editor who, long projectId, long version, long levelId, LineLoadEntry e) {
        try {
            long id = change(who, "line load added: " + e.label(), projectId, version, c -> insert(c, projectId, levelId, e));
            return findByLevel(projectId, levelId).stream().filter(l -> l.id() == id).findFirst().orElseThrow();
        } catch (InputError err) {
            throw LineLoadRefusal.asEntryField(err, e.label());
        }
    }

    /** Deletes a line load, kept for 30 days ({@link DeletedItems}) whether the pages or the API delete it. */
    public void delete(Editor who, long projectId, long version, long levelId, long id) {
        writes.change(who, c -> "line load deleted: " + LoadSnapshots.lineLabel(c, projectId, levelId, id), projectId, version, c -> {
            LoadSnapshots.keep(c, who, projectId, LevelStore.find(c, projectId, levelId), LoadSnapshots.LINE,
                    LoadSnapshots.lineLabel(c, projectId, levelId, id), writes.sql().now());
            try (Handle h = Sql.on(c)) {
                h.createUpdate("DELETE FROM line_load WHERE id = :id AND level_id = :level").bind("id", id).bind("level", levelId).execute();
            }
            return id;
        });
    }

    /** The one place this store changes the model (the project's version is claimed there). */
    private <T> T change(Editor who, String action, long projectId, long version, Sql.Work<T> work) {
        return writes.change(who, action, projectId, version, work);
    }

    static long insert(Connection c, long projectId, long levelId, LineLoadEntry e) throws SQLException {
        LevelStore.find(c, projectId, levelId);
        Grid g = GridStore.find(c, projectId);
        LineRef ref = LineRef.resolve(g, e);
        // checked here as well as by the derivation: an unknown id must not reach the column (80 characters)
        if (e.liveOccupancy() != null && !OccupancyStore.catalogue(c).contains(e.liveOccupancy()))
            throw new InputError("liveOccupancy", e.liveOccupancy(), "is not in the occupancy catalogue");
        for (StoredLineLoad other : findByLevel(c, levelId, g))
            if (other.label().equalsIgnoreCase(e.label()))
                throw new InputError("label", e.label(), "is already the label of a line load on this level");
        try (Handle h = Sql.on(c)) {
            return h.createUpdate("INSERT INTO line_load (level_id, axis, line_id, from_line_id, to_line_id, label, dead_load, "
                            + "dead_pressure, height, live_load, live_occupancy, partition_wall) VALUES (:level, :axis, :line, :from, "
                            + ":to, :label, :dead, :deadPressure, :height, :live, :liveOccupancy, :partitionWall)")
                    .bind("level", levelId).bind("axis", ref.axis()).bind("line", ref.line()).bind("from", ref.from())
                    .bind("to", ref.to()).bind("label", e.label()).bind("dead", e.deadLoad())
                    .bind("deadPressure", Sql.orNull(e.deadPressure())).bind("height", Sql.orNull(e.height()))
                    .bind("live", e.live()).bind("liveOccupancy", e.liveOccupancy()).bind("partitionWall", e.partitionWall())
                    .executeAndReturnGeneratedKeys("id").mapTo(Long.class).one();
        }
    }

    static List<StoredLineLoad> findByLevel(Connection c, long levelId, Grid g) throws SQLException {
        try (Handle h = Sql.on(c)) {
            return h.createQuery("SELECT * FROM line_load WHERE level_id = :level ORDER BY id").bind("level", levelId)
                    .map((rs, ctx) -> read(rs, g)).list();
        }
    }

    /** The building's line loads on these levels, by line position (levels named as the building names them). */
    static List<GridLineLoad> forBuilding(Connection c, Grid g, List<StoredLevel> levels) throws SQLException {
        List<GridLineLoad> out = new ArrayList<>();
        try (Handle h = Sql.on(c)) {
            for (StoredLevel level : levels)
                out.addAll(h.createQuery("SELECT * FROM line_load WHERE level_id = :level ORDER BY id").bind("level", level.id())
                        .map((rs, ctx) -> LineRef.of(rs).onGrid(g, level.name(), rs)).list());
        }
        return out;
    }

    /**
     * Refuses a grid change that would remove a line a load runs along or ends at, naming the load: the
     * engineer deletes the load first, so nothing is dropped silently.
     */
    static void requireLines(Connection c, long projectId, Grid before, Grid after) throws SQLException {
        List<Placed> loads;
        try (Handle h = Sql.on(c)) {
            loads = h.createQuery("SELECT b.name AS level_name, ll.label, ll.axis, ll.line_id, ll.from_line_id, ll.to_line_id "
                            + "FROM line_load ll JOIN building_level b ON b.id = ll.level_id WHERE b.project_id = :project ORDER BY ll.id")
                    .bind("project", projectId).map((rs, ctx) -> new Placed(rs.getString("level_name"), rs.getString("label"), LineRef.of(rs)))
                    .list();
        }
        for (Placed p : loads) {
            boolean onX = p.ref().onX();
            GridAxis own = onX ? before.x() : before.y(), across = onX ? before.y() : before.x();
            GridAxis ownAfter = onX ? after.x() : after.y(), acrossAfter = onX ? after.y() : after.x();
            String where = "line load \"" + p.label() + "\" on " + p.level();
            if (ownAfter.indexOf(p.ref().line()) < 0) throw kept(own, p.ref().line(), "runs along it", where);
            for (int end : List.of(p.ref().from(), p.ref().to()))
                if (acrossAfter.indexOf(end) < 0) throw kept(across, end, "ends at it", where);
        }
    }

    /** A stored load by the lines it lies on, with its level's name. */
    private record Placed(String level, String label, LineRef ref) {}

    private static InputError kept(GridAxis a, int lineId, String how, String load) {
        String name = a.name(a.indexOf(lineId));
        return new InputError("grid." + a.axis() + ".names", name, "grid line " + name + " cannot be removed: the "
                + load + " " + how + ". Delete that line load first (the level's line loads page)");
    }

    private static StoredLineLoad read(ResultSet rs, Grid g) throws SQLException {
        LineRef ref = LineRef.of(rs);
        GridAxis own = ref.onX() ? g.x() : g.y(), across = ref.onX() ? g.y() : g.x();
        return new StoredLineLoad(rs.getLong("id"), rs.getLong("level_id"), ref.axis(), ref.name(own, ref.line()),
                ref.name(across, ref.from()), ref.name(across, ref.to()), rs.getString("label"), rs.getDouble("dead_load"),
                Sql.getDouble(rs, "dead_pressure"), Sql.getDouble(rs, "height"), rs.getDouble("live_load"),
                rs.getString("live_occupancy"), rs.getBoolean("partition_wall"));
    }
}
