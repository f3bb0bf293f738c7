package com.baysheet.engine.load;

import com.baysheet.engine.Check;

import java.util.List;

/**
 * A concentrated load at {@code x} (a beam's reaction on a girder, a girder's on a column): its dead load,
 * its unreduced live load by source, and the tributary area it represents, which counts toward the
 * receiving member's own A_T.
 *
 * @param dead lb or kN
 * @param snow the roof snow load S it carries, lb or kN, unfactored and never reduced (0 for none)
 */
public record PointLoad(double x, double dead, List<LiveShare> live, List<AreaShare> areas, double snow) {
    public PointLoad {
        Check.nonNegative("x", x);
        Check.nonNegative("dead", dead);
        live = List.copyOf(live);
        areas = List.copyOf(areas);
        Check.nonNegative("snow", snow);
    }

    /** No snow. */
    public PointLoad(double x, double dead, List<LiveShare> live, List<AreaShare> areas) { this(x, dead, live, areas, 0); }

    public double liveTotal() {
        double s = 0;
        for (LiveShare l : live) s += l.amount();
        return s;
    }
}
