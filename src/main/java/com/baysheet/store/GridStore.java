package com.baysheet.store;

import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

/** A project's grid: named lines along x and along y with the spacing from each to the next. */
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

    /** Replaces the grid; refused when bays of some level would fall outside it. */
    public void save(long projectId, long version, Grid grid) {
        writes.change(projectId, version, c -> {
            write(c, projectId, grid);
            return null;
        });
    }

    static Grid find(Connection c, long projectId) throws SQLException {
        return new Grid(axis(c, projectId, "x"), axis(c, projectId, "y"));
    }

    static void write(Connection c, long projectId, Grid grid) throws SQLException {
        try (PreparedStatement del = c.prepareStatement("DELETE FROM grid_line WHERE project_id = ?")) {
            del.setLong(1, projectId);
            del.executeUpdate();
        }
        try (PreparedStatement ps = c.prepareStatement(
                "INSERT INTO grid_line (project_id, axis, seq, name, spacing_after) VALUES (?, ?, ?, ?, ?)")) {
            for (GridAxis a : List.of(grid.x(), grid.y())) {
                for (int i = 0; i < a.lines(); i++) {
                    ps.setLong(1, projectId);
                    ps.setString(2, a.axis());
                    ps.setInt(3, i);
                    ps.setString(4, a.name(i));
                    Sql.setDouble(ps, 5, i < a.cells() ? a.spacing(i) : null);
                    ps.addBatch();
                }
            }
            ps.executeBatch();
        }
    }

    private static GridAxis axis(Connection c, long projectId, String axis) throws SQLException {
        List<String> names = new ArrayList<>();
        List<Double> spacings = new ArrayList<>();
        try (PreparedStatement ps = c.prepareStatement(
                "SELECT name, spacing_after FROM grid_line WHERE project_id = ? AND axis = ? ORDER BY seq")) {
            ps.setLong(1, projectId);
            ps.setString(2, axis);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    names.add(rs.getString(1));
                    double s = Sql.getDouble(rs, "spacing_after");
                    if (!Double.isNaN(s)) spacings.add(s);
                }
            }
        }
        return new GridAxis(axis, names, spacings);
    }
}
