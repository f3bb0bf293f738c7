package com.baysheet.web;

import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Side;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The bay editor's table: one row per row of bays, north at the top as on a plan, one cell per bay with
 * what it holds now and whether it is selected.
 */
record BayGridView(List<String> columns, List<Row> rows) {
    record Row(String name, int index, List<CellView> cells) {}

    record CellView(String key, String name, String label, String detail, String fill, boolean selected, Map<String, String> values) {}

    static BayGridView of(Grid g, List<Bay> bays, OccupancyCatalogue catalogue, Set<String> selected, UnitLabels units) {
        Map<String, Bay> byKey = new HashMap<>();
        for (Bay b : bays) byKey.put(b.col() + "," + b.row(), b);
        Palette palette = new Palette(catalogue);
        List<String> columns = new ArrayList<>();
        for (int c = 0; c < g.x().cells(); c++) columns.add(g.x().name(c) + "-" + g.x().name(c + 1));
        List<Row> rows = new ArrayList<>();
        for (int r = g.y().cells() - 1; r >= 0; r--) {
            List<CellView> cells = new ArrayList<>();
            for (int c = 0; c < g.x().cells(); c++) {
                String key = c + "," + r;
                cells.add(cell(key, g.bayName(c, r), byKey.get(key), catalogue, palette, selected.contains(key), units));
            }
            rows.add(new Row(g.y().name(r) + "-" + g.y().name(r + 1), r, cells));
        }
        return new BayGridView(columns, rows);
    }

    private static CellView cell(String key, String name, Bay b, OccupancyCatalogue cat, Palette palette, boolean selected,
                                 UnitLabels units) {
        if (b == null) return new CellView(key, name, "not framed", "", "#ffffff", selected, Map.of());
        if (b.opening()) return new CellView(key, name, "opening", "no floor", "#ffffff", selected, Map.of());
        String label = cat.contains(b.occupancy()) ? cat.get(b.occupancy()).name() : b.occupancy();
        StringBuilder detail = new StringBuilder("D " + units.pressure(b.deadLoad()) + " · beams "
                + b.framing().beams() + " × " + b.framing().infillBeams());
        for (Side s : Side.values())
            if (b.cantilevers().containsKey(s)) detail.append(" · cantilever ").append(s.name().toLowerCase());
        if (!b.cantilevers().isEmpty()) {
            String use = b.cantileverUse(cat);
            detail.append(" (").append(cat.contains(use) ? cat.get(use).name() : use).append(")");
        }
        return new CellView(key, name, label, detail.toString(), palette.fill(b.occupancy()), selected, BayForm.values(b));
    }
}
