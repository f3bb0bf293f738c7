package com.baysheet.engine.load;

import com.baysheet.engine.Check;

/**
 * Area tributary to a column (or carried as an axial load): an occupancy over an area with its dead load.
 *
 * @param area         ft² or m²
 * @param deadPressure psf or kN/m²
 */
public record AreaLoad(String occupancy, double area, double deadPressure) {
    public AreaLoad {
        Check.text("occupancy", occupancy);
        Check.positive("area", area);
        Check.nonNegative("deadPressure", deadPressure);
    }
}
