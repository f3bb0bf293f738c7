package com.baysheet.engine.snow;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.code.SnowData;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

/**
 * Roof snow loads of ASCE 7-16 Chapter 7 (and ASCE 7-10, the same equations with its own labels): the flat roof
 * load p_f = 0.7 C_e C_t I_s p_g (Eq. 7.3-1), the sloped roof load p_s = C_s p_f (7.4), the minimum load p_m for
 * low-slope roofs (7.3.4) as its own case, the rain-on-snow surcharge (7.10) on the balanced case, and the drift
 * surcharge at a roof step (7.7.1). Partial loading (7.5), unbalanced loads (7.6) and sliding snow (7.9) are not
 * computed: the record carries a caution where they may govern. Every number comes from the edition's data.
 */
public final class RoofSnow {
    private RoofSnow() {}

    /**
     * @return the snow loads in the project's base units (psf or kN/m²), each step written into {@code rec}
     * @throws InputError where the edition has no snow calculation (ASCE 7-22) or an input is refused
     */
    public static SnowLoads calculate(CalcContext ctx, SnowSite site, SnowRoof roof, RecordBuilder rec) {
        Check.present("snow", site);
        Check.present("roof", roof);
        Edition ed = ctx.edition();
        SnowData data = data(ed);
        UnitSystem sys = ctx.system();
        double pg = site.groundLoad();
        rec.input("snow.pg", "Ground snow load p_g", pg, Quantity.PRESSURE);
        rec.inputText("snow.surface", "Roof surface", roof.slippery() ? "unobstructed slippery" : "other");
        rec.input("snow.slope", "Roof slope", roof.slope(), Quantity.SLOPE);
        rec.info("p_g is the project's value from the ground snow map or the authority having jurisdiction; it is not looked up.", ed.clause("snow.ground"));

        double ce = SnowFactors.exposure(ed, data, site.exposure(), rec);
        double ct = SnowFactors.thermal(ed, data, site.thermal(), rec);
        double is = SnowFactors.importance(ed, data, site.importance(), rec);
        double k = ed.constant("snow.flat.coef");
        double pf = rec.step("pf", "Flat roof snow load", "p_f = " + rec.plain(k) + " C_e C_t I_s p_g",
                rec.plain(k) + " × " + rec.fmt(ce) + " × " + rec.fmt(ct) + " × " + rec.fmt(is) + " × " + rec.num(pg, Quantity.PRESSURE),
                k * ce * ct * is * pg, Quantity.PRESSURE, ed.clause("snow.flat"));
        double deg = SnowFactors.slopeDegrees(ed, sys, roof.slope(), rec);
        double cs = SnowFactors.slopeFactor(ed, data, ct, roof.slippery(), deg, rec);
        double ps = rec.step("ps", "Sloped roof (balanced) snow load", "p_s = C_s p_f",
                rec.fmt(cs) + " × " + rec.num(pf, Quantity.PRESSURE), cs * pf, Quantity.PRESSURE, ed.clause("snow.sloped"));

        double minSlope = ed.constant("snow.minimum.maxSlope");
        boolean minApplies = deg < minSlope;
        double pm = minApplies ? minimum(ctx, pg, is, rec) : 0;
        if (!minApplies) rec.info("Slope " + rec.show(deg, Quantity.ANGLE) + " is not below " + rec.plain(minSlope)
                + "°: no minimum snow load.", ed.clause("snow.minimum"));
        double pr = RainOnSnow.surcharge(ctx, pg, deg, roof.eaveToRidge(), rec);
        double bal = rec.step("Sb", "Balanced snow load case", pr > 0 ? "p_s + rain-on-snow" : "p_s",
                pr > 0 ? rec.num(ps, Quantity.PRESSURE) + " + " + rec.num(pr, Quantity.PRESSURE) : rec.num(ps, Quantity.PRESSURE),
                ps + pr, Quantity.PRESSURE, pr > 0 ? ed.clause("snow.rainOnSnow") : ed.clause("snow.sloped"));

        DriftSurcharge drift = roof.roofStep().map(s -> SnowDrift.calculate(ed, sys, pg, ps, s, rec)).orElse(DriftSurcharge.NONE);
        SnowLoads loads = new SnowLoads(pf, deg, cs, ps, pr, bal, pm, minApplies, drift);
        SnowNotes.write(ctx, site, roof, loads, rec);
        results(loads, rec);
        return loads;
    }

    /**
     * The drift surcharge at one more roof step of the same lower roof (7.7.1), each step written into {@code rec}:
     * for a member near two steps, after {@link #calculate} has written the roof's own snow loads.
     *
     * @param ps the lower roof's sloped roof snow load p_s (psf or kN/m²), without rain-on-snow
     */
    public static DriftSurcharge drift(CalcContext ctx, SnowSite site, double ps, RoofStep step, RecordBuilder rec) {
        Check.present("snow", site);
        Check.present("step", step);
        data(ctx.edition());
        return SnowDrift.calculate(ctx.edition(), ctx.system(), site.groundLoad(), ps, step, rec);
    }

    /** The edition's snow data; an edition without it (or marked unsupported) is refused with the reason from the data. */
    static SnowData data(Edition ed) {
        SnowData d = ed.snow().orElseThrow(() -> new InputError("edition", ed.id(), "has no roof snow calculation in Baysheet"));
        if (!d.supported()) throw new InputError("edition", ed.id(), d.unsupported());
        return d;
    }

    /** 7.3.4: p_m = I_s p_g where p_g is at most the limit, else I_s times the fixed load. */
    private static double minimum(CalcContext ctx, double pg, double is, RecordBuilder rec) {
        Edition ed = ctx.edition();
        double limit = ctx.constant("snow.minimum.pgLimit"), load = ctx.constant("snow.minimum.load");
        Clause c = ed.clause("snow.minimum");
        String lim = rec.show(limit, Quantity.PRESSURE);
        double pm = rec.step("pm", "Minimum snow load for a low-slope roof, a separate uniform case",
                pg <= limit ? "p_m = I_s p_g where p_g ≤ " + lim : "p_m = " + rec.plain(load) + " I_s where p_g > " + lim,
                pg <= limit ? rec.fmt(is) + " × " + rec.num(pg, Quantity.PRESSURE) : rec.num(load, Quantity.PRESSURE) + " × " + rec.fmt(is),
                pg <= limit ? is * pg : load * is, Quantity.PRESSURE, c);
        rec.info("p_m is a separate uniform load case: it is not combined with drift, sliding, unbalanced or partial loads.", c);
        return pm;
    }

    private static void results(SnowLoads l, RecordBuilder rec) {
        rec.result("snow.pf", "Flat roof snow load p_f", l.flat(), Quantity.PRESSURE)
           .result("snow.ps", "Sloped roof snow load p_s", l.sloped(), Quantity.PRESSURE)
           .result("snow.rainOnSnow", "Rain-on-snow surcharge (balanced case only)", l.rainOnSnow(), Quantity.PRESSURE)
           .result("snow.balanced", "Balanced snow load case", l.balanced(), Quantity.PRESSURE);
        if (l.minimumApplies()) rec.result("snow.pm", "Minimum snow load case p_m", l.minimum(), Quantity.PRESSURE);
        rec.result("snow.uniform", "Uniform snow load, larger of the balanced and minimum cases", l.uniform(), Quantity.PRESSURE);
        DriftSurcharge d = l.drift();
        if (d.required()) {
            rec.result("snow.drift.hd", "Drift height h_d", d.height(), Quantity.LENGTH)
               .result("snow.drift.w", "Drift width w", d.width(), Quantity.LENGTH)
               .result("snow.drift.pd", "Drift surcharge at the step p_d (on top of p_s)", d.peak(), Quantity.PRESSURE)
               .result("snow.drift.max", "Drift case at the step, p_s + p_d", l.driftCaseAt(0), Quantity.PRESSURE);
        }
    }
}
