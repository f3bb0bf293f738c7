package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Side;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;

import org.jdbi.v3.core.Handle;
import org.jdbi.v3.core.statement.PreparedBatch;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/** The bays of a level: the framed grid cells with their occupancy, dead load, framing, openings and cantilevers. */
public final class BayStore {
    private static final Side[] SIDES = {Side.NORTH, Side.SOUTH, Side.EAST, Side.WEST};

    private final ModelWrites writes;
    private final OccupancyStore occupancies;

    public BayStore(ModelWrites writes, OccupancyStore occupancies) {
        this.writes = writes;
        this.occupancies = occupancies;
    }

    public List<Bay> findByLevel(long projectId, long levelId) {
        return writes.sql().tx(c -> {
            // a linked level shows its typical's bays, which are its own in the derivation
            return findByLevel(c, TypicalLevels.baysOf(LevelStore.find(c, projectId, levelId)), GridStore.find(c, projectId));
        });
    }

    /** Gives every selected cell the assignment's bay, replacing what was there. */
    public void assign(Editor who, long projectId, long version, long levelId, BayAssignment a) {
        writes.bayChange(who, c -> BayText.assigned(c, projectId, levelId, a), projectId, version, levelId, false, assigning(projectId, levelId, a));
    }

    /**
     * Leaves the selected cells unframed at this level (no bay at all, unlike an opening). What they held is kept for
     * 30 days ({@link DeletedItems}, restorable into the same cells); issued sheets of the members that go are
     * withdrawn, not removed ({@link ModelWrites#removal}).
     */
    public void clear(Editor who, long projectId, long version, long levelId, List<Cell> cells) {
        writes.bayChange(who, c -> BayText.cleared(c, projectId, levelId, cells), projectId, version, levelId, true, c -> {
            keep(c, who, projectId, levelId, cells);
            return clearing(projectId, levelId, cells).run(c);
        });
    }

    private void keep(Connection c, Editor who, long projectId, long levelId, List<Cell> cells) throws SQLException {
        var level = LevelStore.find(c, projectId, levelId);
        var snapshot = BaySnapshots.of(c, projectId, level, cells);
        if (snapshot == null) return;
        List<String> names = new ArrayList<>();
        for (var b : snapshot.path("bays")) names.add(b.path("name").asText());
        var p = ProjectStore.find(c, projectId);
        String label = (names.size() == 1 ? "Bay " : "Bays ") + String.join(", ", names) + " of " + level.name() + ", "
                + p.info().jobNumber() + " " + p.info().name();
        DeletedItems.keep(c, new DeletedItem(0, projectId, p.info().jobNumber(), DeletedItem.BAYS, label,
                writes.membersOf(projectId, level.name(), new java.util.HashSet<>(names)), who.username(), writes.sql().now()), snapshot);
    }

    /** The issued sheets {@link #assign} would change, by name, found by trying it and saving nothing. */
    public List<String> touchedByAssign(long projectId, long version, long levelId, BayAssignment a) {
        return writes.touched(projectId, version, assigning(projectId, levelId, a));
    }

    /** The issued sheets {@link #clear} would change, by name, found by trying it and saving nothing. */
    public List<String> touchedByClear(long projectId, long version, long levelId, List<Cell> cells) {
        return writes.touched(projectId, version, clearing(projectId, levelId, cells));
    }

    private Sql.Work<Void> assigning(long projectId, long levelId, BayAssignment a) {
        return c -> {
            put(c, projectId, levelId, a);
            return null;
        };
    }

    /** The assignment's bays in place of what the cells held, in the caller's change. */
    static void put(Connection c, long projectId, long levelId, BayAssignment a) throws SQLException {
        Grid g = requireCells(c, projectId, levelId, a.cells());
        if (!a.opening() && !OccupancyStore.catalogue(c).contains(a.occupancy()))
            throw new InputError("occupancy", a.occupancy(), "is not in the occupancy catalogue");
        requireCantileverOccupancy(c, a);
        List<Bay> bays = placed(c, levelId, a, g);
        delete(c, levelId, a.cells(), g);
        insert(c, levelId, bays, g);
    }

    /** The bays an assignment puts in its cells on this level as it stands (cantilevers on the edge only, if asked). */
    static List<Bay> placed(Connection c, long levelId, BayAssignment a, Grid g) {
        return a.bays(a.onEdges() ? findByLevel(c, levelId, g) : List.of(), g.x().cells(), g.y().cells());
    }

    private Sql.Work<Void> clearing(long projectId, long levelId, List<Cell> cells) {
        return c -> {
            delete(c, levelId, cells, requireCells(c, projectId, levelId, cells));
            return null;
        };
    }

    /**
     * A level's bays with their cell indices in this grid (south row first); rows are keyed by the ids of the
     * lines at the bay's south-west corner.
     */
    static List<Bay> findByLevel(Connection c, long levelId, Grid g) {
        try (Handle h = Sql.on(c)) {
            Columns at = new Columns();
            List<Bay> out = new ArrayList<>(h.createQuery("SELECT * FROM bay WHERE level_id = :level").bind("level", levelId)
                    .map((rs, ctx) -> read(rs, at, g)).list());
            out.sort(Comparator.comparingInt(Bay::row).thenComparingInt(Bay::col));
            return out;
        }
    }

    private static Grid requireCells(Connection c, long projectId, long levelId, List<Cell> cells) throws SQLException {
        TypicalLevels.requireOwnBays(c, projectId, levelId);
        if (cells.isEmpty()) throw new InputError("cells", "none", "select at least one bay");
        Grid g = GridStore.find(c, projectId);
        for (Cell cell : cells)
            if (cell.col() >= g.x().cells() || cell.row() >= g.y().cells())
                throw new InputError("cells", cell.key(), "is outside the grid (" + g.x().cells() + " × " + g.y().cells() + " bays)");
        return g;
    }

    private static void delete(Connection c, long levelId, List<Cell> cells, Grid g) {
        try (Handle h = Sql.on(c)) {
            PreparedBatch batch = h.prepareBatch("DELETE FROM bay WHERE level_id = :level AND x_line = :xLine AND y_line = :yLine");
            for (Cell cell : cells)
                batch.bind("level", levelId).bind("xLine", g.x().id(cell.col())).bind("yLine", g.y().id(cell.row())).add();
            batch.execute();
        }
    }

    static void insert(Connection c, long levelId, List<Bay> bays, Grid g) {
        try (Handle h = Sql.on(c)) {
            PreparedBatch batch = h.prepareBatch("INSERT INTO bay (level_id, x_line, y_line, is_opening, occupancy, dead_load, "
                    + "beam_direction, infill_beams, cantilever_north, cantilever_south, cantilever_east, cantilever_west, "
                    + "cantilever_occupancy) VALUES (:level, :xLine, :yLine, :opening, :occupancy, :deadLoad, :beams, :infillBeams, "
                    + ":cantilever_north, :cantilever_south, :cantilever_east, :cantilever_west, :cantileverOccupancy)");
            for (Bay b : bays) {
                batch.bind("level", levelId).bind("xLine", g.x().id(b.col())).bind("yLine", g.y().id(b.row()))
                        .bind("opening", b.opening()).bind("occupancy", b.occupancy())
                        .bind("deadLoad", b.opening() ? null : Sql.orNull(b.deadLoad()))
                        .bind("beams", b.opening() ? null : b.framing().beams().name())
                        .bind("infillBeams", b.opening() ? null : (Integer) b.framing().infillBeams())
                        .bind("cantileverOccupancy", b.cantileverOccupancy());
                for (Side side : SIDES) batch.bind(cantileverColumn(side), Sql.orNull(b.cantilevers().get(side)));
                batch.add();
            }
            batch.execute();
        }
    }

    /** The column (and bind name) of a side's cantilever: cantilever_north, ... */
    private static String cantileverColumn(Side s) {
        return "cantilever_" + s.name().toLowerCase();
    }

    /**
     * The bay columns' places in a result, found on its first row: a tall building reads thousands of bays a save, and
     * finding a column by its name costs as much as reading it.
     */
    private static final class Columns {
        int xLine, yLine, opening, beams, infill, occupancy, dead, cantileverOccupancy;
        final int[] cantilever = new int[SIDES.length];
        boolean found;

        void find(ResultSet rs) throws SQLException {
            xLine = rs.findColumn("x_line");
            yLine = rs.findColumn("y_line");
            opening = rs.findColumn("is_opening");
            beams = rs.findColumn("beam_direction");
            infill = rs.findColumn("infill_beams");
            occupancy = rs.findColumn("occupancy");
            dead = rs.findColumn("dead_load");
            cantileverOccupancy = rs.findColumn("cantilever_occupancy");
            for (int k = 0; k < SIDES.length; k++) cantilever[k] = rs.findColumn(cantileverColumn(SIDES[k]));
            found = true;
        }
    }

    private static Bay read(ResultSet rs, Columns at, Grid g) throws SQLException {
        if (!at.found) at.find(rs);
        int col = g.x().indexOf(rs.getInt(at.xLine));
        int row = g.y().indexOf(rs.getInt(at.yLine));
        // the grid store splits and merges bays with their lines, so this is a fault of ours, not the user's
        if (col < 0 || row < 0 || col >= g.x().cells() || row >= g.y().cells())
            throw new IllegalStateException("bay at grid line ids " + rs.getInt(at.xLine) + "x" + rs.getInt(at.yLine) + " lies outside the grid");
        if (rs.getBoolean(at.opening)) return Bay.opening(col, row);
        Map<Side, Double> cantilevers = new EnumMap<>(Side.class);
        for (int k = 0; k < SIDES.length; k++) {
            double v = rs.getDouble(at.cantilever[k]);
            if (!rs.wasNull()) cantilevers.put(SIDES[k], v);
        }
        Framing f = new Framing(Direction.valueOf(rs.getString(at.beams)), rs.getInt(at.infill));
        return new Bay(col, row, rs.getString(at.occupancy), rs.getDouble(at.dead), f, false, cantilevers, rs.getString(at.cantileverOccupancy));
    }

    /** The cantilever slabs' occupancy, where one is given, must be in the catalogue (NULL: the default balcony). */
    private static void requireCantileverOccupancy(Connection c, BayAssignment a) throws SQLException {
        if (a.cantileverOccupancy() != null && !OccupancyStore.catalogue(c).contains(a.cantileverOccupancy()))
            throw new InputError("cantileverOccupancy", a.cantileverOccupancy(), "is not in the occupancy catalogue");
    }
}
