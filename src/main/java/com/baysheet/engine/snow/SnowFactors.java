package com.baysheet.engine.snow;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.code.SnowData;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

/** The factors of the flat and sloped roof snow loads, each written as a step: C_e, C_t, I_s, θ and C_s. */
final class SnowFactors {
    private SnowFactors() {}

    static double exposure(Edition ed, SnowData data, Exposure e, RecordBuilder rec) {
        Clause c = ed.clause("snow.exposure");
        if (!e.fromTable()) return given(rec, "Ce", "Exposure factor", e.given(), data.smallestExposure(), c);
        double ce = data.exposure(e.terrain().name(), e.shelter().name()).orElseThrow(() -> new InputError("exposure",
                e.shelter(), "has no exposure factor for terrain " + e.terrain() + " in " + c.label() + " (not applicable)"));
        return rec.step("Ce", "Exposure factor, terrain " + e.terrain() + ", " + e.shelter().name().toLowerCase() + " exposed",
                "C_e from the table", e.terrain() + ", " + e.shelter(), ce, Quantity.RATIO, c);
    }

    static double thermal(Edition ed, SnowData data, Thermal t, RecordBuilder rec) {
        Clause c = ed.clause("snow.thermal");
        if (!t.fromTable()) return given(rec, "Ct", "Thermal factor", t.given(), SnowData.smallest(data.thermal()), c);
        double ct = data.thermal(t.condition().name()).orElseThrow(() -> new InputError("thermalCondition", t.condition(),
                "is not a row of " + c.label()));
        return rec.step("Ct", "Thermal factor, " + t.condition().name().toLowerCase().replace('_', ' '), "C_t from the table",
                t.condition().name(), ct, Quantity.RATIO, c);
    }

    static double importance(Edition ed, SnowData data, Importance i, RecordBuilder rec) {
        Clause c = ed.clause("snow.importance");
        if (!i.fromTable()) return given(rec, "Is", "Snow importance factor", i.given(), SnowData.smallest(data.importance()), c);
        double is = data.importance(i.category().name()).orElseThrow(() -> new InputError("riskCategory", i.category(),
                "is not a row of " + c.label()));
        return rec.step("Is", "Snow importance factor, risk category " + i.category(), "I_s from the table",
                "risk category " + i.category(), is, Quantity.RATIO, c);
    }

    private static double given(RecordBuilder rec, String symbol, String what, double v, double smallest, Clause c) {
        rec.step(symbol, what + ", given by the engineer", symbol + " given", rec.fmt(v), v, Quantity.RATIO, c);
        if (v < smallest)
            rec.caution(what + " " + rec.fmt(v) + " is below every value of " + c.label() + " (smallest " + rec.fmt(smallest)
                    + "); confirm it against the adopted code.", c);
        return v;
    }

    /** The slope in degrees from rise in in/ft (US) or percent (SI). */
    static double slopeDegrees(Edition ed, UnitSystem system, double slope, RecordBuilder rec) {
        double run = system == UnitSystem.US ? 12 : 100; // rise per 12 in of run, or per 100 of run
        double deg = Math.toDegrees(Math.atan(slope / run));
        return rec.step("θ", "Roof slope in degrees", "θ = atan(rise / " + rec.plain(run) + ")",
                "atan(" + rec.num(slope, Quantity.SLOPE) + " / " + rec.plain(run) + ")", deg, Quantity.ANGLE, ed.clause("snow.slopeFactor"));
    }

    /** The roof slope factor C_s: 1 up to the curve's angle, then linear to 0 at the zero angle. */
    static double slopeFactor(Edition ed, SnowData data, double ct, boolean slippery, double deg, RecordBuilder rec) {
        SnowData.SlopeCurve curve = data.curveFor(ct);
        double flat = curve.flatUpTo(slippery), zero = ed.constant("snow.slope.zeroAt");
        double cs;
        String sub;
        if (deg <= flat) { cs = 1; sub = "θ ≤ " + rec.plain(flat) + "°"; }
        else if (deg >= zero) { cs = 0; sub = "θ ≥ " + rec.plain(zero) + "°"; }
        else { cs = (zero - deg) / (zero - flat); sub = "(" + rec.plain(zero) + " − " + rec.fmt(deg) + ") / (" + rec.plain(zero) + " − " + rec.plain(flat) + ")"; }
        String surface = slippery ? "unobstructed slippery surface" : "other surface";
        boolean warm = curve.equals(data.slopeCurves().get(0)), coldest = curve.equals(data.curveFor(Double.MAX_VALUE));
        String which = (warm ? "warm roof" : "cold roof, curve for C_t " + (coldest ? "≥ " : "= ") + rec.fmt(curve.ct())) + ", " + surface;
        if (!warm && ct < curve.ct())
            rec.info("C_t of " + rec.fmt(ct) + " lies between the curves of " + ed.clause("snow.slopeFactor").label()
                    + ": the curve for C_t = " + rec.fmt(curve.ct()) + " is used (the larger C_s).", ed.clause("snow.slopeFactor"));
        return rec.step("Cs", "Roof slope factor, " + which, "C_s = 1 for θ ≤ " + rec.plain(flat) + "°, linear to 0 at " + rec.plain(zero) + "°",
                sub, cs, Quantity.RATIO, ed.clause("snow.slopeFactor"));
    }
}
