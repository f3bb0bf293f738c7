package com.baysheet.engine.load;

import com.baysheet.engine.Check;

import java.util.List;

/**
 * A concentrated load at {@code x} (a beam's reaction on a girder, a girder's on a column): its dead load,
 * its unreduced live load by source, and the tributary area it represents, which counts toward the
 * receiving member's own A_T.
 *
 * @param dead lb or kN
 */
public record PointLoad(double x, double dead, List<LiveShare> live, List<AreaShare> areas) {
    public PointLoad {
        Check.nonNegative("x", x);
        Check.nonNegative("dead", dead);
        live = List.copyOf(live);
        areas = List.copyOf(areas);
    }

    public double liveTotal() {
        double s = 0;
        for (LiveShare l : live) s += l.amount();
        return s;
    }
}
