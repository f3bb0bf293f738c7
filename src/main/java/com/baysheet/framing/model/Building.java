package com.baysheet.framing.model;

import com.baysheet.engine.Check;
import com.baysheet.engine.CalcContext;

import java.util.List;

/**
 * The framing model of a building: the calculation setting (edition, units, catalogue, options), the grid,
 * the levels, the members' self weights by role and the line loads on grid lines and the point loads. Validation of the whole
 * (bays inside the grid, edges, occupancies, a member beneath every line load) is done by
 * {@link com.baysheet.framing.ModelCheck} and the derivation.
 */
public record Building(String name, CalcContext context, Grid grid, List<Level> levels, SelfWeights selfWeights,
                       List<GridLineLoad> lineLoads, List<GridPointLoad> pointLoads) {
    public Building {
        Check.text("building.name", name);
        Check.present("building.context", context);
        Check.present("building.grid", grid);
        levels = List.copyOf(levels);
        Check.present("building.selfWeights", selfWeights);
        lineLoads = List.copyOf(lineLoads);
        pointLoads = List.copyOf(pointLoads);
    }

    /** No point loads. */
    public Building(String name, CalcContext context, Grid grid, List<Level> levels, SelfWeights selfWeights,
                    List<GridLineLoad> lineLoads) {
        this(name, context, grid, levels, selfWeights, lineLoads, List.of());
    }

    /** No self weight set, no line loads. */
    public Building(String name, CalcContext context, Grid grid, List<Level> levels) {
        this(name, context, grid, levels, SelfWeights.NONE, List.of(), List.of());
    }

    public Building withSelfWeights(SelfWeights w) { return new Building(name, context, grid, levels, w, lineLoads, pointLoads); }

    public Building withLineLoads(List<GridLineLoad> l) { return new Building(name, context, grid, levels, selfWeights, l, pointLoads); }

    public Building withPointLoads(List<GridPointLoad> p) { return new Building(name, context, grid, levels, selfWeights, lineLoads, p); }
}
