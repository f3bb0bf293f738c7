package com.baysheet.web;

import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.Side;
import com.baysheet.framing.model.SlabSpan;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;

/**
 * The bay editor's table, drawn to scale (each column as wide as its spacing, each row as tall, one scale both ways):
 * one row per row of bays, north at the top as on a plan, one cell per bay with what it holds now (occupancy, dead
 * load, framing and the slab span it gives, cantilevers with their lengths, the line loads along its edges), a
 * caution where the slab spans farther than common practice takes, and whether it is selected.
 */
record BayGridView(List<String> columns, List<String> widths, List<Row> rows, List<String> cautions) {
    /** The table's scale: at least this wide (rem), and the narrowest bay at least so wide, unless that is past MAX_REM. */
    private static final double WIDTH_REM = 56, NARROWEST_REM = 5.5, MAX_REM = 110;

    record Row(String name, int index, String height, List<CellView> cells) {}

    record CellView(String key, String name, String label, String detail, String loads, String fill, boolean selected,
                    boolean longSlab, Map<String, String> values) {}

    static BayGridView of(Grid g, List<Bay> bays, List<GridLineLoad> loads, OccupancyCatalogue catalogue, Set<String> selected,
                          UnitLabels units) {
        Map<String, Bay> byKey = new HashMap<>();
        for (Bay b : bays) byKey.put(b.col() + "," + b.row(), b);
        Palette palette = new Palette(catalogue);
        double scale = scale(g);
        List<String> columns = new ArrayList<>(), widths = new ArrayList<>();
        for (int c = 0; c < g.x().cells(); c++) {
            columns.add(g.x().name(c) + "-" + g.x().name(c + 1));
            widths.add(rem(g.x().spacing(c) * scale));
        }
        List<Row> rows = new ArrayList<>();
        List<String> cautions = new ArrayList<>();
        for (int r = g.y().cells() - 1; r >= 0; r--) {
            List<CellView> cells = new ArrayList<>();
            for (int c = 0; c < g.x().cells(); c++) {
                String key = c + "," + r;
                Bay b = byKey.get(key);
                CellView v = cell(key, g, c, r, b, loads, catalogue, palette, selected.contains(key), units);
                if (v.longSlab()) cautions.add(v.name() + ": the slab spans " + units.length(SlabSpan.of(g, b)));
                cells.add(v);
            }
            rows.add(new Row(g.y().name(r) + "-" + g.y().name(r + 1), r, rem(g.y().spacing(r) * scale), cells));
        }
        return new BayGridView(columns, widths, rows, cautions);
    }

    /** rem per ft or m: the whole grid about WIDTH_REM wide, the narrowest bay readable, the grid no wider than MAX_REM. */
    private static double scale(Grid g) {
        double narrowest = Double.MAX_VALUE;
        for (int c = 0; c < g.x().cells(); c++) narrowest = Math.min(narrowest, g.x().spacing(c));
        for (int r = 0; r < g.y().cells(); r++) narrowest = Math.min(narrowest, g.y().spacing(r));
        double s = Math.max(WIDTH_REM / g.x().extent(), NARROWEST_REM / narrowest);
        return Math.min(s, MAX_REM / Math.max(g.x().extent(), g.y().extent()));
    }

    private static String rem(double v) { return String.format(Locale.ROOT, "%.2frem", v); }

    private static CellView cell(String key, Grid g, int c, int r, Bay b, List<GridLineLoad> loads, OccupancyCatalogue cat,
                                 Palette palette, boolean selected, UnitLabels units) {
        String name = g.bayName(c, r), edgeLoads = loads(g, c, r, loads, units);
        if (b == null) return new CellView(key, name, "not framed", "", edgeLoads, "#ffffff", selected, false, Map.of());
        if (b.opening()) return new CellView(key, name, "opening", "no floor", edgeLoads, "#ffffff", selected, false, Map.of());
        String label = cat.contains(b.occupancy()) ? cat.get(b.occupancy()).name() : b.occupancy();
        StringBuilder detail = new StringBuilder("D " + units.pressure(b.deadLoad()) + " · beams "
                + b.framing().beams() + " × " + b.framing().infillBeams() + " · slab span " + units.length(SlabSpan.of(g, b)));
        for (Side s : Side.values())
            if (b.cantilevers().containsKey(s))
                detail.append(" · cantilever ").append(s.name().toLowerCase()).append(" ").append(units.length(b.cantilevers().get(s)));
        if (!b.cantilevers().isEmpty()) {
            String use = b.cantileverUse(cat);
            detail.append(" (").append(cat.contains(use) ? cat.get(use).name() : use).append(")");
        }
        return new CellView(key, name, label, detail.toString(), edgeLoads, palette.fill(b.occupancy()), selected,
                SlabSpan.tooLong(g, b, units.system()), BayForm.values(b));
    }

    /** The line loads along the cell's edges: "South cladding (south edge, D 195 plf)". */
    private static String loads(Grid g, int c, int r, List<GridLineLoad> loads, UnitLabels units) {
        List<String> out = new ArrayList<>();
        for (GridLineLoad l : loads) {
            int along = l.onXLine() ? r : c, first = l.onXLine() ? c : r;
            if (along < l.from() || along >= l.to()) continue;
            String edge = l.line() == first ? (l.onXLine() ? "west" : "south") : l.line() == first + 1 ? (l.onXLine() ? "east" : "north") : null;
            if (edge == null) continue;
            out.add(l.label() + " (" + edge + " edge, D " + units.lineLoad(l.dead()) + (l.live() > 0 ? ", L " + units.lineLoad(l.live()) : "") + ")");
        }
        return String.join("; ", out);
    }
}
