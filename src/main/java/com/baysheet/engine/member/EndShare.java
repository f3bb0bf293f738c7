package com.baysheet.engine.member;

import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.LiveShare;
import com.baysheet.engine.load.PointLoad;

import java.util.List;

/**
 * What one end of a member hands to the member that carries it: its dead reaction, its unreduced live
 * reaction by source, and the tributary area that reaction represents. The carrying member reduces the
 * live load again with its own K_LL·A_T. The snow reaction S (lb or kN, unfactored) is handed on as it is: snow
 * is not reduced.
 */
public record EndShare(double dead, List<LiveShare> live, List<AreaShare> areas, double snow) {
    public EndShare {
        live = List.copyOf(live);
        areas = List.copyOf(areas);
    }

    /** No snow. */
    public EndShare(double dead, List<LiveShare> live, List<AreaShare> areas) { this(dead, live, areas, 0); }

    public PointLoad at(double x) { return new PointLoad(x, Math.max(0, dead), positive(live), areas, Math.max(0, snow)); }

    public double liveTotal() {
        double s = 0;
        for (LiveShare l : live) s += l.amount();
        return s;
    }

    public double area() {
        double s = 0;
        for (AreaShare a : areas) s += a.area();
        return s;
    }

    private static List<LiveShare> positive(List<LiveShare> l) {
        return l.stream().filter(s -> s.amount() > 0).toList();
    }
}
