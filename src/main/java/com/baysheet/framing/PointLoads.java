package com.baysheet.framing;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.GridPointLoad;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Puts a level's point loads on its members by statics. A load on a grid-line member stays on it, at its distance.
 * A load in a bay lies between two of the lines parallel to the bay's beams (its edge members and infill beams, a
 * beam spacing s apart): it is shared between those two by the lever rule across the spacing, the nearer taking
 * 1 − u/s where u is its distance from that line (all of it where it lies on a beam), and each share acts on its
 * beam as a concentrated load at the load's distance along the beams. The beams hand it to the girders and columns
 * through their reactions only. A load outside its bay or off its member is refused, naming the field.
 */
final class PointLoads {
    /** Relative tolerance for a load lying exactly on a beam line or a bay's edge. */
    static final double ON_LINE = 1e-9;

    private PointLoads() {}

    static void check(LevelPlan plan, GridPointLoad p, OccupancyCatalogue catalogue) {
        String field = field(plan, p);
        if (p.liveOccupancy() != null && !catalogue.contains(p.liveOccupancy()))
            throw new InputError(field + ".liveOccupancy", p.liveOccupancy(), "is not in the occupancy catalogue");
        if (!p.inBay()) return;
        if (p.col() >= plan.xCells() || p.row() >= plan.yCells())
            throw new InputError(field + ".bay", p.col() + "," + p.row(), "lies outside the grid");
        String bay = plan.grid.bayName(p.col(), p.row());
        if (plan.floored(p.col(), p.row()) == null)
            throw new InputError(field + ".bay", bay, "is not a framed bay at " + plan.level.name());
        double wx = plan.x(p.col() + 1) - plan.x(p.col()), wy = plan.y(p.row() + 1) - plan.y(p.row());
        if (p.x() > wx * (1 + ON_LINE)) throw new InputError(field + ".x", p.x(), "lies outside bay " + bay + " (" + wx + " wide along x)");
        if (p.y() > wy * (1 + ON_LINE)) throw new InputError(field + ".y", p.y(), "lies outside bay " + bay + " (" + wy + " deep along y)");
    }

    /**
     * The shares of the bay's point loads on the lines parallel to its beams: index 0 the edge member at the low side,
     * 1..n the infill beams, n + 1 the edge member at the high side; x along the beams from the bay's west or south side.
     */
    static Map<Integer, List<PointLoad>> inBay(LevelPlan plan, Bay b, List<GridPointLoad> loads, UnitSystem sys) {
        Map<Integer, List<PointLoad>> out = new HashMap<>();
        boolean alongX = b.framing().beams() == Direction.X;
        int n = b.framing().infillBeams();
        double width = alongX ? plan.y(b.row() + 1) - plan.y(b.row()) : plan.x(b.col() + 1) - plan.x(b.col());
        double s = width / (n + 1);
        for (GridPointLoad p : loads) {
            if (!p.inBay() || p.col() != b.col() || p.row() != b.row()) continue;
            double u = Math.min(alongX ? p.y() : p.x(), width), along = alongX ? p.x() : p.y();
            int k = Math.min(n, (int) Math.floor(u / s));
            double frac = (u - k * s) / s;
            if (frac < ON_LINE) frac = 0;
            if (frac > 1 - ON_LINE) { k++; frac = 0; }
            share(out, k, 1 - frac, p, along, u - k * s, s, sys);
            if (frac > 0) share(out, k + 1, frac, p, along, (k + 1) * s - u, s, sys);
        }
        return out;
    }

    private static void share(Map<Integer, List<PointLoad>> out, int line, double f, GridPointLoad p, double along, double lever,
                              double s, UnitSystem sys) {
        String how = f == 1 ? p.label() + " (in the bay, on this member)"
                : p.label() + ": " + Display.sig3(f) + " of it by the lever rule, " + Display.of(lever, Quantity.LENGTH, sys)
                  + " from this member across the spacing s = " + Display.of(s, Quantity.LENGTH, sys)
                  + " (share = 1 − u/s)";
        out.computeIfAbsent(line, k -> new ArrayList<>()).add(PointLoad.applied(how, along, f * p.dead(), f * p.live(), p.liveOccupancy()));
    }

    /** A load on a grid line: onto the member of the segment it lies in. */
    static void onLine(LevelPlan plan, GridPointLoad p, Segment[][] alongX, Segment[][] alongY) {
        GridAxis own = p.onXLine() ? plan.grid.x() : plan.grid.y(), across = p.onXLine() ? plan.grid.y() : plan.grid.x();
        String field = field(plan, p);
        if (p.line() >= own.lines()) throw new InputError(field + ".line", p.line(), "lies outside the grid (" + own.lines() + " lines)");
        if (Math.max(p.from(), p.to()) >= across.lines()) throw new InputError(field + ".to", p.to(), "lies outside the grid");
        double a = across.position(p.from()), b = across.position(p.to());
        if (p.distance() > Math.abs(b - a) * (1 + ON_LINE))
            throw new InputError(field + ".distance", p.distance(), "lies past grid line " + across.name(p.to()) + " ("
                    + Math.abs(b - a) + " from " + across.name(p.from()) + ")");
        double at = a + Math.signum(b - a) * Math.min(p.distance(), Math.abs(b - a));
        int k = 0;
        while (k < across.cells() - 1 && across.position(k + 1) < at) k++;
        Segment s = p.onXLine() ? alongY[p.line()][k] : alongX[k][p.line()];
        String line = own.name(p.line());
        if (!s.loaded())
            throw new InputError(field + ".line", line, "no member at " + plan.level.name() + " along " + line + "/"
                    + across.name(k) + "-" + across.name(k + 1) + " to carry the point load \"" + p.label() + "\"");
        double x = Math.max(0, Math.min(s.length, at - across.position(k)));
        s.applied.add(PointLoad.applied(p.label() + " (on this member)", x, p.dead(), p.live(), p.liveOccupancy()));
    }

    private static String field(LevelPlan plan, GridPointLoad p) {
        return "levels[" + plan.level.name() + "].pointLoads[" + p.label() + "]";
    }
}
