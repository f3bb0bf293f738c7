package com.baysheet.store;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.project.LineLoadEntry;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;

/**
 * Where a line load lies, by stable grid line ids: the line it runs along on {@code axis} and the two lines
 * across it that bound it, {@code from} nearer the grid's origin than {@code to}.
 */
record LineRef(String axis, int line, int from, int to) {
    boolean onX() { return axis.equals("x"); }

    static LineRef of(ResultSet rs) throws SQLException {
        return new LineRef(rs.getString("axis"), rs.getInt("line_id"), rs.getInt("from_line_id"), rs.getInt("to_line_id"));
    }

    /**
     * The entry's lines found by name: {@code line} on one axis, {@code from} and {@code to} on the other. A name
     * on both axes needs the entry's axis; an unknown name is refused naming its field.
     */
    static LineRef resolve(Grid g, LineLoadEntry e) {
        List<GridAxis> axes = new ArrayList<>();
        for (GridAxis a : List.of(g.x(), g.y()))
            if ((e.axis() == null || e.axis().equals(a.axis())) && a.names().contains(e.line())) axes.add(a);
        if (axes.isEmpty())
            throw new InputError("line", e.line(), "is not a grid line" + (e.axis() == null ? "" : " along " + e.axis())
                    + " (x: " + String.join(", ", g.x().names()) + "; y: " + String.join(", ", g.y().names()) + ")");
        if (axes.size() > 1) throw new InputError("axis", e.line(), "names a line on both axes: give the axis, x or y");
        GridAxis own = axes.get(0), across = own == g.x() ? g.y() : g.x();
        int a = bound(across, "from", e.from(), e.line()), b = bound(across, "to", e.to(), e.line());
        return new LineRef(own.axis(), own.id(own.names().indexOf(e.line())), across.id(Math.min(a, b)), across.id(Math.max(a, b)));
    }

    /** The load on this grid by line positions; a line missing from the grid is a fault of ours (the grid store refuses it). */
    GridLineLoad onGrid(Grid g, String level, ResultSet rs) throws SQLException {
        GridAxis own = onX() ? g.x() : g.y(), across = onX() ? g.y() : g.x();
        int l = position(own, line), a = position(across, from), b = position(across, to);
        return new GridLineLoad(level, onX(), l, Math.min(a, b), Math.max(a, b), rs.getString("label"),
                rs.getDouble("dead_load"), rs.getDouble("live_load"), rs.getString("live_occupancy"),
                rs.getBoolean("partition_wall"));
    }

    String name(GridAxis a, int lineId) {
        return a.name(position(a, lineId));
    }

    private static int position(GridAxis a, int lineId) {
        int i = a.indexOf(lineId);
        if (i < 0) throw new IllegalStateException("line load on grid line id " + lineId + ", which is not in the grid along " + a.axis());
        return i;
    }

    private static int bound(GridAxis across, String field, String name, String line) {
        int i = across.names().indexOf(name);
        if (i < 0) throw new InputError(field, name, "is not a grid line crossing " + line + " (" + String.join(", ", across.names()) + ")");
        return i;
    }
}
