package com.baysheet.framing;

import com.baysheet.engine.snow.RoofStep;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * Where a wall's drift lies on the lower roof: over the wall's own length, and past each free end of the wall.
 * <p>
 * ASCE 7-16 7.7.1 gives no rule at the ends of a wall. Snow drifting in the lee of the higher roof does not stop where
 * the wall stops, so stopping the surcharge there would under-load the lower roof's members just beyond each end.
 * <b>Our choice (common practice, conservative):</b> at each free end the drift continues along the wall's line for
 * the drift width w, with the wall's own h_d, w and p_d (p_d at the wall line, linear to 0 at w), over the lower
 * roof's exposed bays only: it stops at the first cell along the line that is not an exposed bay of this roof (the
 * roof's edge, an opening, a cell a higher level covers) and, across, at each cell its own cut-off: the run of exposed
 * bays from the wall line there, never beyond w (the drift truncated at the far edge of the lower roof there, ASCE 7-16
 * 7.7.1). The wall's own ℓl is not used past its end: where the lower roof beside the wall is shallower than w and the
 * roof beyond the end is deeper, the band between them is loaded. An end is not free where the wall continues along the same line into a wall
 * of the same step facing the same lower roof; an extension never runs into such a wall's own length (no drift counted
 * twice along one line). Where it runs past a wall of another step (another height or roof lengths) both drifts are
 * applied there, summed, as at a corner: conservative.
 */
final class WallEnds {
    /** A wall as found on the grid: the exposed cell it borders and the side of that cell it lies on. */
    record Placed(int col, int row, int dc, int dr, RoofSteps.Wall wall) {
        boolean alongX() { return dr != 0; }
    }

    private final LevelPlan plan;
    private final boolean[][] exposed;
    private final Map<String, RoofStep> steps = new HashMap<>();

    private WallEnds(LevelPlan plan, boolean[][] exposed, List<Placed> walls) {
        this.plan = plan;
        this.exposed = exposed;
        for (Placed p : walls) steps.put(key(p.col, p.row, p.dc, p.dr), p.wall.step());
    }

    /** Each wall with the rectangles of lower roof its drift loads: its own length first, then the end extensions. */
    static List<RoofSteps.Wall> reaches(LevelPlan plan, boolean[][] exposed, List<Placed> walls) {
        WallEnds ends = new WallEnds(plan, exposed, walls);
        List<RoofSteps.Wall> out = new ArrayList<>();
        for (Placed p : walls) {
            RoofSteps.Wall w = p.wall;
            List<RoofSteps.Reach> r = new ArrayList<>();
            r.add(new RoofSteps.Reach(w.start(), w.end(), w.drift().extent(), w.step().lowerLength(), false));
            r.addAll(ends.past(p, -1));
            r.addAll(ends.past(p, +1));
            out.add(w.withReaches(r));
        }
        return out;
    }

    /** The extension past the wall's end toward decreasing ({@code e} = −1) or increasing (+1) coordinate along it. */
    private List<RoofSteps.Reach> past(Placed p, int e) {
        RoofSteps.Wall w = p.wall;
        double limit = e > 0 ? w.end() + w.drift().width() : w.start() - w.drift().width();
        int cells = p.alongX() ? exposed.length : exposed[0].length;
        List<RoofSteps.Reach> out = new ArrayList<>();
        for (int k = 1; k <= cells; k++) {
            int c = p.alongX() ? p.col + e * k : p.col, r = p.alongX() ? p.row : p.row + e * k;
            if (!exposed(c, r) || w.step().equals(steps.get(key(c, r, p.dc, p.dr)))) break;
            double lo = p.alongX() ? plan.x(c) : plan.y(r), hi = p.alongX() ? plan.x(c + 1) : plan.y(r + 1);
            double from = e > 0 ? lo : Math.max(lo, limit), to = e > 0 ? Math.min(hi, limit) : hi;
            if (to <= from) break;
            // cut off where the lower roof ends across the line at this cell, not at the wall's own ℓl (ASCE 7-16 7.7.1)
            double edge = run(c, r, -p.dc, -p.dr);
            out.add(new RoofSteps.Reach(from, to, Math.min(w.drift().width(), edge), edge, true));
        }
        return out;
    }

    /** The run of exposed bays from cell (c, r) in the direction (dc, dr), across the wall's line (ft or m). */
    private double run(int c, int r, int dc, int dr) {
        double run = 0;
        for (int k = 0; exposed(c + k * dc, r + k * dr); k++)
            run += dc != 0 ? plan.grid.x().spacing(c + k * dc) : plan.grid.y().spacing(r + k * dr);
        return run;
    }

    private boolean exposed(int c, int r) {
        return c >= 0 && r >= 0 && c < exposed.length && r < exposed[0].length && exposed[c][r];
    }

    private static String key(int c, int r, int dc, int dr) { return c + "," + r + "," + dc + "," + dr; }
}
