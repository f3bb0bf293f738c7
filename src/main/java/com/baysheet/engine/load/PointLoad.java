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
 * @param label for a load applied to the member (a rooftop unit, a tank) rather than a carried member's reaction:
 *              what it is and how it reached this member, printed with it; "" for a reaction
 */
public record PointLoad(double x, double dead, List<LiveShare> live, List<AreaShare> areas, double snow, String label) {
    public PointLoad {
        Check.nonNegative("x", x);
        Check.nonNegative("dead", dead);
        live = List.copyOf(live);
        areas = List.copyOf(areas);
        Check.nonNegative("snow", snow);
        label = label == null ? "" : label.strip();
    }

    /** A carried member's reaction. */
    public PointLoad(double x, double dead, List<LiveShare> live, List<AreaShare> areas, double snow) { this(x, dead, live, areas, snow, ""); }

    /** A carried member's reaction, no snow. */
    public PointLoad(double x, double dead, List<LiveShare> live, List<AreaShare> areas) { this(x, dead, live, areas, 0, ""); }

    /**
     * A load applied to the member: dead, and live of {@code liveOccupancy} never reduced (no tributary area), with what
     * it is and how it got here.
     */
    public static PointLoad applied(String label, double x, double dead, double live, String liveOccupancy) {
        Check.text("pointLoad.label", label);
        List<LiveShare> l = live > 0 ? List.of(new LiveShare(Check.text("pointLoad.liveOccupancy", liveOccupancy), false, true, live)) : List.of();
        return new PointLoad(x, dead, l, List.of(), 0, label);
    }

    public boolean applied() { return !label.isEmpty(); }

    public double liveTotal() {
        double s = 0;
        for (LiveShare l : live) s += l.amount();
        return s;
    }
}
