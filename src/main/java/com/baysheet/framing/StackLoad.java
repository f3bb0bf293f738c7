package com.baysheet.framing;

import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.LiveShare;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.member.EndShare;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Unreduced loads gathered at a column: dead, live by source and area by occupancy. Columns carry axial
 * load only, so everything arriving from above and at a level merges exactly into one load.
 */
final class StackLoad {
    double dead;
    /** Roof snow S, unfactored, never reduced. */
    double snow;
    final Map<String, Double> live = new LinkedHashMap<>();
    final Map<String, Double> areas = new LinkedHashMap<>();

    void add(EndShare s) {
        dead += s.dead();
        snow += s.snow();
        for (LiveShare l : s.live()) live.merge(l.source(), l.amount(), Double::sum);
        for (AreaShare a : s.areas()) areas.merge(a.occupancy(), a.area(), Double::sum);
    }

    void add(StackLoad o) {
        dead += o.dead;
        snow += o.snow;
        o.live.forEach((k, v) -> live.merge(k, v, Double::sum));
        o.areas.forEach((k, v) -> areas.merge(k, v, Double::sum));
    }

    boolean isEmpty() { return live.isEmpty() && areas.isEmpty() && dead == 0 && snow == 0; }

    double area() {
        double s = 0;
        for (double a : areas.values()) s += a;
        return s;
    }

    PointLoad asPointLoad() {
        List<LiveShare> l = new ArrayList<>();
        live.forEach((src, v) -> l.add(LiveShare.ofSource(src, Math.max(0, v))));
        List<AreaShare> a = new ArrayList<>();
        areas.forEach((id, v) -> a.add(new AreaShare(id, v)));
        return new PointLoad(0, Math.max(0, dead), l, a, Math.max(0, snow));
    }
}
