package com.baysheet.sheet;

import com.baysheet.engine.member.LoadCombinations;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.SelfWeights;

import java.util.ArrayList;
import java.util.List;

/** Lines of the criteria page written from the engine's own data: the gravity combinations and the self weights. */
final class CriteriaLines {
    private CriteriaLines() {}

    /**
     * Each gravity combination the records choose from, factors as the engine holds them: "LRFD 2: 1.2D + 1.6L +
     * 0.5(Lr or S)" (S only where the project has a snow site); the L factor that may be 0.5 says so.
     */
    static List<String> combinations(CalcContext ctx) {
        String roof = ctx.snow() == null ? "Lr" : "(Lr or S)";
        List<String> out = new ArrayList<>();
        for (LoadCombinations.Combination c : LoadCombinations.GRAVITY) {
            StringBuilder s = new StringBuilder(c.name()).append(": ").append(factor(c.d())).append("D");
            String live = c.l() == 0 ? "" : " + " + factor(c.l()) + "L" + (c.halfL() ? " (0.5L where permitted: " + ctx.edition().clause("combo.halfL").ref() + ")" : "");
            String top = c.lr() == 0 ? "" : " + " + factor(c.lr()) + roof;
            s.append(c.lr() > c.l() ? top + live : live + top);
            out.add(s.toString());
        }
        return out;
    }

    /** The self weight of each role per length, or that none is included. */
    static List<String> selfWeights(SelfWeights w, UnitSystem sys) {
        if (w.none()) return List.of("Member self weight: not included (none set in the firm's settings); the dead loads given carry it");
        String roles = "Infill beams " + plf(w.infillBeam(), sys) + ", beams on grid lines " + plf(w.gridBeam(), sys)
                + ", girders " + plf(w.girder(), sys) + ", columns " + plf(w.column(), sys) + " (" + w.origin() + ")";
        if (w.members().isEmpty()) return List.of(roles);
        int n = w.members().size();
        return List.of(roles, "Own weight entered for " + n + (n == 1 ? " member" : " members") + " instead of its role's; each sheet says so");
    }

    private static String plf(double v, UnitSystem sys) {
        return v == 0 ? "not included" : Display.of(v, Quantity.LINE_LOAD, sys);
    }

    private static String factor(double f) { return f == 1 ? "" : Display.plain(f); }
}
