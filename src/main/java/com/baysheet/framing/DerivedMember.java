package com.baysheet.framing;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.member.MemberResult;

import java.util.List;
import java.util.Map;

/**
 * A member derived from the bays: where it is, what it is (its Table 4.7-1 kind), its span, tributary width
 * and area by occupancy, the bays it serves, its tributary outline on plan, and the engine's result.
 *
 * @param span           ft or m (0 for a column)
 * @param tributaryWidth ft or m (0 for girders and columns)
 * @param id             opaque and URL-safe ([A-Za-z0-9-]): the level's key, then the kind and the stable ids of the
 *                       grid lines it starts from ("L12-c3x7" a column at x line 3 / y line 7, "-h"/"-v" a grid-line
 *                       member along x/y, "-bay3x7-b1" the first infill beam of the bay whose south-west corner is
 *                       there), so that inserting or removing a line elsewhere never changes it
 * @param areas          tributary area by occupancy id at this level (for a girder, including the areas its beams
 *                       deliver), ft² or m²
 * @param directArea     floor area that loads this member directly (slab strips), ft² or m²; 0 for columns
 */
public record DerivedMember(String id, String name, String level, MemberRole role, MemberKind kind, PlanLine plan,
                            double span, double tributaryWidth, Map<String, Double> areas, double directArea,
                            List<String> bays, List<PlanRect> tributary, MemberResult result) {
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
