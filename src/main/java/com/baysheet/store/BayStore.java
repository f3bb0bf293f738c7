package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Side;

import java.sql.Connection;
import java.sql.PreparedStatement;
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
        writes.change(who, c -> BayText.assigned(c, projectId, levelId, a), projectId, version, c -> {
            put(c, projectId, levelId, a);
            return null;
        });
    }

    /** The assignment's bays in place of what the cells held, in the caller's change. */
    static void put(Connection c, long projectId, long levelId, BayAssignment a) throws SQLException {
        Grid g = requireCells(c, projectId, levelId, a.cells());
        if (!a.opening() && !OccupancyStore.catalogue(c).contains(a.occupancy()))
            throw new InputError("occupancy", a.occupancy(), "is not in the occupancy catalogue");
        requireCantileverOccupancy(c, a);
        delete(c, levelId, a.cells(), g);
        insert(c, levelId, a, g);
    }

    /** Leaves the selected cells unframed at this level (no bay at all, unlike an opening). */
    public void clear(Editor who, long projectId, long version, long levelId, List<Cell> cells) {
        writes.change(who, c -> BayText.cleared(c, projectId, levelId, cells), projectId, version, c -> {
            delete(c, levelId, cells, requireCells(c, projectId, levelId, cells));
            return null;
        });
    }

    /**
     * A level's bays with their cell indices in this grid (south row first); rows are keyed by the ids of the
     * lines at the bay's south-west corner.
     */
    static List<Bay> findByLevel(Connection c, long levelId, Grid g) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("SELECT * FROM bay WHERE level_id = ?")) {
            ps.setLong(1, levelId);
            List<Bay> out = new ArrayList<>();
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) out.add(read(rs, g));
            }
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

    private static void delete(Connection c, long levelId, List<Cell> cells, Grid g) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("DELETE FROM bay WHERE level_id = ? AND x_line = ? AND y_line = ?")) {
            for (Cell cell : cells) {
                ps.setLong(1, levelId);
                ps.setInt(2, g.x().id(cell.col()));
                ps.setInt(3, g.y().id(cell.row()));
                ps.addBatch();
            }
            ps.executeBatch();
        }
    }

    private static void insert(Connection c, long levelId, BayAssignment a, Grid g) throws SQLException {
        try (PreparedStatement ps = c.prepareStatement("INSERT INTO bay (level_id, x_line, y_line, is_opening, "
                + "occupancy, dead_load, beam_direction, infill_beams, cantilever_north, cantilever_south, "
                + "cantilever_east, cantilever_west, cantilever_occupancy) VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)")) {
            for (Cell cell : a.cells()) {
                Bay b = a.bayAt(cell);
                ps.setLong(1, levelId);
                ps.setInt(2, g.x().id(b.col()));
                ps.setInt(3, g.y().id(b.row()));
                ps.setBoolean(4, b.opening());
                ps.setString(5, b.occupancy());
                Sql.setDouble(ps, 6, b.opening() ? null : b.deadLoad());
                ps.setString(7, b.opening() ? null : b.framing().beams().name());
                if (b.opening()) ps.setNull(8, java.sql.Types.INTEGER);
                else ps.setInt(8, b.framing().infillBeams());
                for (int i = 0; i < SIDES.length; i++) Sql.setDouble(ps, 9 + i, b.cantilevers().get(SIDES[i]));
                ps.setString(13, b.cantileverOccupancy());
                ps.addBatch();
            }
            ps.executeBatch();
        }
    }

    private static Bay read(ResultSet rs, Grid g) throws SQLException {
        int col = g.x().indexOf(rs.getInt("x_line"));
        int row = g.y().indexOf(rs.getInt("y_line"));
        // the grid store splits and merges bays with their lines, so this is a fault of ours, not the user's
        if (col < 0 || row < 0 || col >= g.x().cells() || row >= g.y().cells())
            throw new IllegalStateException("bay at grid line ids " + rs.getInt("x_line") + "x" + rs.getInt("y_line") + " lies outside the grid");
        if (rs.getBoolean("is_opening")) return Bay.opening(col, row);
        Map<Side, Double> cantilevers = new EnumMap<>(Side.class);
        for (Side s : SIDES) {
            double v = Sql.getDouble(rs, "cantilever_" + s.name().toLowerCase());
            if (!Double.isNaN(v)) cantilevers.put(s, v);
        }
        Framing f = new Framing(Direction.valueOf(rs.getString("beam_direction")), rs.getInt("infill_beams"));
        return new Bay(col, row, rs.getString("occupancy"), rs.getDouble("dead_load"), f, false, cantilevers,
                rs.getString("cantilever_occupancy"));
    }

    /** The cantilever slabs' occupancy, where one is given, must be in the catalogue (NULL: the default balcony). */
    private static void requireCantileverOccupancy(Connection c, BayAssignment a) throws SQLException {
        if (a.cantileverOccupancy() != null && !OccupancyStore.catalogue(c).contains(a.cantileverOccupancy()))
            throw new InputError("cantileverOccupancy", a.cantileverOccupancy(), "is not in the occupancy catalogue");
    }
}
