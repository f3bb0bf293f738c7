package com.baysheet.store;

import com.baysheet.engine.units.Display;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.project.BayAssignment;
import com.baysheet.project.Cell;

import java.sql.Connection;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.function.Function;
import java.util.stream.Collectors;

/** Bay changes as the audit trail records them: the cells by their grid lines ("1-2/A-B"), each bay in short. */
final class BayText {
    private BayText() {}

    /** "bays assigned on Level 2: 1-2/A-B, 2-3/A-B: office, dead 50, beams X + 2; was: 1-2/A-B unframed, ..." */
    static String assigned(Connection c, long projectId, long levelId, BayAssignment a) throws SQLException {
        Grid g = GridStore.find(c, projectId);
        String now = a.opening() ? "opening" : bay(a.bayAt(a.cells().get(0))) + onEdges(c, levelId, a, g);
        return "bays assigned on " + LevelStore.find(c, projectId, levelId).name() + ": " + cells(g, a.cells()) + ": " + now
                + "; was: " + before(c, levelId, g, a.cells()) + TypicalLevels.alsoText(c, projectId, levelId);
    }

    /** " (cantilevers only on the building edge: none on 1-2/A-B, ...)" where the edge rule left some bays without. */
    private static String onEdges(Connection c, long levelId, BayAssignment a, Grid g) {
        if (!a.onEdges() || a.cantilevers().isEmpty()) return "";
        List<String> without = new ArrayList<>();
        for (Bay b : BayStore.placed(c, levelId, a, g))
            if (b.cantilevers().size() < a.cantilevers().size()) without.add(cell(g, new Cell(b.col(), b.row())));
        return without.isEmpty() ? "" : " (cantilevers only on the building edge: not all of them on " + String.join(", ", without) + ")";
    }

    static String cleared(Connection c, long projectId, long levelId, List<Cell> cells) throws SQLException {
        Grid g = GridStore.find(c, projectId);
        return "bays cleared on " + LevelStore.find(c, projectId, levelId).name() + ": " + cells(g, cells)
                + "; was: " + before(c, levelId, g, cells) + TypicalLevels.alsoText(c, projectId, levelId);
    }

    private static String before(Connection c, long levelId, Grid g, List<Cell> cells) throws SQLException {
        Map<String, Bay> held = BayStore.findByLevel(c, levelId, g).stream()
                .collect(Collectors.toMap(b -> new Cell(b.col(), b.row()).key(), Function.identity()));
        List<String> out = new ArrayList<>();
        for (Cell cell : cells) {
            Bay b = held.get(cell.key());
            out.add(cell(g, cell) + " " + (b == null ? "unframed" : b.opening() ? "opening" : bay(b)));
        }
        return String.join(", ", out);
    }

    private static String bay(Bay b) {
        String s = b.occupancy() + ", dead " + Display.plain(b.deadLoad()) + ", beams " + b.framing().beams()
                + " + " + b.framing().infillBeams();
        if (!b.cantilevers().isEmpty()) s += ", cantilevers " + b.cantilevers().entrySet().stream()
                .map(e -> e.getKey().name().toLowerCase() + " " + Display.plain(e.getValue())).sorted().collect(Collectors.joining(" "));
        return s;
    }

    private static String cells(Grid g, List<Cell> cells) {
        return cells.stream().map(c -> cell(g, c)).collect(Collectors.joining(", "));
    }

    /** A cell by the lines around it; a cell outside the grid (refused later) by its indices. */
    private static String cell(Grid g, Cell c) {
        if (c.col() >= g.x().cells() || c.row() >= g.y().cells()) return c.key();
        return g.x().name(c.col()) + "-" + g.x().name(c.col() + 1) + "/" + g.y().name(c.row()) + "-" + g.y().name(c.row() + 1);
    }
}
