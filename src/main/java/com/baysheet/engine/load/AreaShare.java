package com.baysheet.engine.load;

import com.baysheet.engine.Check;

/** Tributary area of one occupancy that a load represents (ft² or m²). */
public record AreaShare(String occupancy, double area) {
    public AreaShare {
        Check.text("occupancy", occupancy);
        Check.nonNegative("area", area);
    }
}
