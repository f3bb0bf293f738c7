package com.baysheet.sheet;

import com.baysheet.engine.code.Edition;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;

/** The cover's line on roof snow: the project's snow inputs with their tables, or that there is none. */
final class SnowCriteria {
    private SnowCriteria() {}

    static String line(CalcContext ctx) {
        SnowSite s = ctx.snow();
        if (s == null) return "Roof snow: none (the project gives no ground snow load)";
        Edition ed = ctx.edition();
        String ce = s.exposure().fromTable()
                ? "terrain " + s.exposure().terrain() + ", " + s.exposure().shelter().name().toLowerCase() + " exposed (C_e, " + ed.clause("snow.exposure").ref() + ")"
                : "C_e = " + Display.sig3(s.exposure().given()) + " given";
        String ct = s.thermal().fromTable()
                ? s.thermal().condition().name().toLowerCase().replace('_', ' ') + " (C_t, " + ed.clause("snow.thermal").ref() + ")"
                : "C_t = " + Display.sig3(s.thermal().given()) + " given";
        String is = s.importance().fromTable()
                ? "risk category " + s.importance().category() + " (I_s, " + ed.clause("snow.importance").ref() + ")"
                : "I_s = " + Display.sig3(s.importance().given()) + " given";
        return "Roof snow: p_g = " + Display.of(s.groundLoad(), Quantity.PRESSURE, ctx.system()) + " (project input, "
                + ed.clause("snow.ground").ref() + "); " + ce + "; " + ct + "; " + is + "; on every roof level, balanced or minimum "
                + "p_m, whichever is larger (" + ed.clause("snow.minimum").ref() + "), not reduced, S in place of Lr where it governs ("
                + ed.clause("combo.lrfd").ref() + ", " + ed.clause("combo.asd").ref() + "). Drifts, unbalanced and sliding snow are not "
                + "computed: each member's sheet says where they may apply";
    }
}
