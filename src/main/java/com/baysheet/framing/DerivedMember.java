package com.baysheet.framing;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.member.MemberResult;

import java.util.List;
import java.util.Map;

/**
 * A member derived from the bays: where it is, what it is (its Table 4.7-1 kind), its span, tributary width
 * and area by occupancy, the bays it serves, its tributary outline on plan, and the engine's result.
 *
 * @param id             stable within a model, e.g. "L2:B-C/1-2:b1" or "L2:C/2"
 * @param span           ft or m (0 for a column)
 * @param tributaryWidth ft or m (0 for girders and columns)
 * @param areas          tributary area by occupancy id at this level, ft² or m²
 */
public record DerivedMember(String id, String name, String level, MemberRole role, MemberKind kind, PlanLine plan,
                            double span, double tributaryWidth, Map<String, Double> areas, List<String> bays,
                            List<PlanRect> tributary, MemberResult result) {
    public DerivedMember {
        areas = Map.copyOf(areas);
        bays = List.copyOf(bays);
        tributary = List.copyOf(tributary);
    }

    public double tributaryArea() {
        double s = 0;
        for (double a : areas.values()) s += a;
        return s;
    }
}
