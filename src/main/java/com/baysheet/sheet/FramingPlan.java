package com.baysheet.sheet;

import com.baysheet.engine.InputError;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.MemberRole;

import java.util.List;

/**
 * One level's framing plan as a sheet draws it, in the project's base length (ft or m), plan north up: the
 * grid lines with their names (dimensioned between them), the framed bays with their occupancy, the openings,
 * the cantilever slabs, every member with its label, the line loads and any point loads with the text that
 * states them. Kept free of the framing model so that the sheet only draws what it is given.
 */
public record FramingPlan(String level, UnitSystem system, List<KeyPlan.GridLine> gridLines, List<Bay> bays,
                          List<KeyPlan.Rect> openings, List<Cantilever> cantilevers, List<Member> members,
                          List<LoadLine> lineLoads, List<LoadPoint> pointLoads) {
    public FramingPlan {
        if (level == null || level.isBlank()) throw new InputError("plan.level", "\"\"", "a framing plan needs its level");
        if (system == null) throw new InputError("plan.system", "none", "a framing plan needs its unit system");
        gridLines = List.copyOf(gridLines);
        if (gridLines.stream().noneMatch(KeyPlan.GridLine::alongX) || gridLines.stream().allMatch(KeyPlan.GridLine::alongX))
            throw new InputError("plan.gridLines", gridLines.size(), "a framing plan needs grid lines along both axes");
        bays = List.copyOf(bays);
        openings = List.copyOf(openings);
        cantilevers = List.copyOf(cantilevers);
        members = List.copyOf(members);
        lineLoads = List.copyOf(lineLoads);
        pointLoads = List.copyOf(pointLoads);
    }

    /** Whether the grid is at least as wide (x) as it is deep (y): such a plan is drawn on a landscape sheet. */
    public boolean wide() {
        double x0 = Double.MAX_VALUE, x1 = -Double.MAX_VALUE, y0 = Double.MAX_VALUE, y1 = -Double.MAX_VALUE;
        for (KeyPlan.GridLine g : gridLines) {
            if (g.alongX()) { x0 = Math.min(x0, g.position()); x1 = Math.max(x1, g.position()); }
            else { y0 = Math.min(y0, g.position()); y1 = Math.max(y1, g.position()); }
        }
        return x1 - x0 >= y1 - y0;
    }

    /** A framed bay and the name of its occupancy (the legend's swatch). */
    public record Bay(KeyPlan.Rect rect, String occupancy) {}

    /** A slab past the edge, with its projection as the sheet prints it. */
    public record Cantilever(KeyPlan.Rect rect, double projection) {}

    /** A member on plan: its line (a point for a column), its role (the pen) and its label. */
    public record Member(KeyPlan.Line line, MemberRole role, String label) {}

    /** A line load along part of a grid line, and the text that states it ("Cladding D 250 plf"). */
    public record LoadLine(KeyPlan.Line line, String text) {}

    /** A point load on plan and the text that states it. */
    public record LoadPoint(double x, double y, String text) {}
}
