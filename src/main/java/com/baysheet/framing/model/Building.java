package com.baysheet.framing.model;

import com.baysheet.engine.Check;
import com.baysheet.engine.reduction.CalcContext;

import java.util.List;

/**
 * The framing model of a building: the calculation setting (edition, units, catalogue, options), the grid
 * and the levels. Validation of the whole (bays inside the grid, edges, occupancies) is done by
 * {@link com.baysheet.framing.ModelCheck} when members are derived.
 */
public record Building(String name, CalcContext context, Grid grid, List<Level> levels) {
    public Building {
        Check.text("building.name", name);
        Check.present("building.context", context);
        Check.present("building.grid", grid);
        levels = List.copyOf(levels);
    }
}
