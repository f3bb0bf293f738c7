package com.baysheet.framing;

import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.List;

/**
 * Where the drift surcharges of a level lie on plan, for drawing: each wall found at a roof step (see {@link RoofSteps})
 * with the bands of the lower roof it loads, from the wall to the drift's extent: one along the wall's own length and
 * one per bay past each free end of the wall, where the drift is carried on for its width (see {@link WallEnds}).
 */
public final class DriftZones {
    private DriftZones() {}

    /**
     * @param area  the loaded band on plan (ft or m), one side on the wall
     * @param wall  the wall's line on plan
     * @param label what the plan prints: "drift h_d 1.86 ft, w 7.44 ft, p_d 33.3 psf"
     */
    public record Zone(PlanRect area, PlanLine wall, String label) {}

    /** The drift zones on the named level (none where it is no lower roof, or the project has no snow site). */
    public static List<Zone> of(Building b, String levelName) {
        Level level = b.levels().stream().filter(l -> l.name().equals(levelName)).findFirst().orElse(null);
        if (level == null || b.context().snow() == null) return List.of();
        double top = b.levels().stream().mapToDouble(Level::elevation).max().orElse(level.elevation());
        LevelPlan plan = new LevelPlan("", level, b.grid(), level.elevation() < top);
        List<Zone> out = new ArrayList<>();
        var sys = b.context().system();
        for (RoofSteps.Wall w : RoofSteps.of(b.context(), plan, b.levels()).walls) {
            PlanLine wall = w.alongX() ? new PlanLine(w.start(), w.at(), w.end(), w.at()) : new PlanLine(w.at(), w.start(), w.at(), w.end());
            String label = "drift at " + w.line() + " (" + w.between() + "): h_d " + Display.of(w.drift().height(), Quantity.LENGTH, sys)
                    + ", w " + Display.of(w.drift().width(), Quantity.LENGTH, sys) + ", p_d " + Display.of(w.drift().peak(), Quantity.PRESSURE, sys);
            for (RoofSteps.Reach r : w.reaches()) {
                double far = w.at() + w.toward() * r.depth();
                PlanRect area = w.alongX() ? new PlanRect(r.from(), Math.min(w.at(), far), r.to(), Math.max(w.at(), far))
                        : new PlanRect(Math.min(w.at(), far), r.from(), Math.max(w.at(), far), r.to());
                out.add(new Zone(area, wall, r.pastEnd() ? label + ", carried past the end of the wall" : label));
            }
        }
        return out;
    }
}
