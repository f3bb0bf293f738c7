package com.baysheet.engine.snow;

import com.baysheet.engine.code.Edition;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Convert;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

/**
 * Drifts on a lower roof at a roof step (ASCE 7-16 7.7.1): density γ (Eq. 7.7-1), balanced height h_b = p_s / γ,
 * clear height h_c; no drift where h_c / h_b is below the edition's ratio; leeward drift from the upper roof
 * length, windward drift (a fraction of the height) from the lower roof length, the larger governing; width
 * 4 h_d, or 4 h_d² / h_c ≤ 8 h_c with h_d = h_c where the drift fills the step; surcharge peak h_d γ.
 * The drift height equation is in ft and psf: an SI project converts ℓ and p_g to US exactly and h_d back.
 */
final class SnowDrift {
    private SnowDrift() {}

    static DriftSurcharge calculate(Edition ed, UnitSystem sys, double pg, double ps, RoofStep step, RecordBuilder rec) {
        Clause drift = ed.clause("snow.drift");
        if (pg == 0) {
            rec.info("No ground snow load: no drift at the roof step.", drift);
            return DriftSurcharge.NONE;
        }
        double coef = ed.constant("snow.density.coef", sys), base = ed.constant("snow.density.base", sys), max = ed.constant("snow.density.max", sys);
        double gamma = rec.step("γ", "Snow density", "γ = " + rec.plain(coef) + " p_g + " + rec.plain(base) + " ≤ " + rec.plain(max),
                rec.plain(coef) + " × " + rec.num(pg, Quantity.PRESSURE) + " + " + rec.plain(base), Math.min(coef * pg + base, max),
                Quantity.DENSITY, ed.clause("snow.density"));
        double hb = rec.step("hb", "Height of the balanced snow on the lower roof", "h_b = p_s / γ",
                rec.num(ps, Quantity.PRESSURE) + " / " + rec.num(gamma, Quantity.DENSITY), ps / gamma, Quantity.LENGTH, drift);
        double hc = rec.step("hc", "Clear height from the top of the balanced snow to the upper roof", "h_c = H − h_b",
                rec.num(step.height(), Quantity.LENGTH) + " − " + rec.num(hb, Quantity.LENGTH), step.height() - hb, Quantity.LENGTH, drift);
        double minRatio = ed.constant("snow.drift.minRatio");
        if (hb > 0) {
            double ratio = rec.step("hc/hb", "Clear height over balanced height", "h_c / h_b",
                    rec.num(hc, Quantity.LENGTH) + " / " + rec.num(hb, Quantity.LENGTH), hc / hb, Quantity.RATIO, drift);
            if (ratio < minRatio) {
                rec.info("h_c / h_b = " + rec.fmt(ratio) + " is less than " + rec.plain(minRatio) + ": drift loads are not required.", drift);
                return DriftSurcharge.NONE;
            }
        } else rec.info("No balanced snow on the lower roof (p_s = 0): the drift is still worked out (conservative).", drift);

        if (sys == UnitSystem.SI)
            rec.info("Drift heights: the equation of " + ed.clause("snow.driftHeight").label() + " in ft and psf, with ℓ and p_g converted"
                    + " exactly (NIST SP 811) and h_d converted back to m.", ed.clause("snow.driftHeight"));
        double lee = height(ed, sys, "hd,lee", "Leeward drift height, from the upper roof length", step.upperLength(), pg, 1, rec);
        double windFactor = ed.constant("snow.drift.windward");
        double wind = height(ed, sys, "hd,wind", "Windward drift height, from the lower roof length", step.lowerLength(), pg, windFactor, rec);
        boolean windward = wind > lee;
        double hd0 = Math.max(lee, wind);
        double k = ed.constant("snow.drift.widthFactor"), kMax = ed.constant("snow.drift.maxWidthFactor");
        Clause shape = ed.clause("snow.driftShape");
        double hd, w;
        if (hd0 <= hc) {
            hd = rec.step("hd", "Drift height (" + (windward ? "windward" : "leeward") + " governs)", "h_d = max(h_d,lee, h_d,wind) ≤ h_c",
                    "max(" + rec.num(lee, Quantity.LENGTH) + ", " + rec.num(wind, Quantity.LENGTH) + ")", hd0, Quantity.LENGTH, shape);
            w = rec.step("w", "Drift width", "w = " + rec.plain(k) + " h_d", rec.plain(k) + " × " + rec.num(hd, Quantity.LENGTH),
                    k * hd, Quantity.LENGTH, shape);
        } else {
            hd = rec.step("hd", "Drift height, limited to the clear height", "h_d = h_c where max(h_d,lee, h_d,wind) > h_c",
                    rec.num(hd0, Quantity.LENGTH) + " > " + rec.num(hc, Quantity.LENGTH), hc, Quantity.LENGTH, shape);
            w = rec.step("w", "Drift width where the drift fills the step", "w = " + rec.plain(k) + " h_d² / h_c ≤ " + rec.plain(kMax) + " h_c",
                    rec.plain(k) + " × " + rec.num(hd0, Quantity.LENGTH) + "² / " + rec.num(hc, Quantity.LENGTH),
                    Math.min(k * hd0 * hd0 / hc, kMax * hc), Quantity.LENGTH, shape);
        }
        double pd = rec.step("pd", "Drift surcharge at the step", "p_d = h_d γ",
                rec.num(hd, Quantity.LENGTH) + " × " + rec.num(gamma, Quantity.DENSITY), hd * gamma, Quantity.PRESSURE, drift);
        DriftSurcharge d = new DriftSurcharge(true, gamma, hb, hc, hd, w, pd, step.lowerLength(), windward);
        if (w > step.lowerLength())
            rec.info("The drift width " + rec.show(w, Quantity.LENGTH) + " exceeds the lower roof length " + rec.show(step.lowerLength(), Quantity.LENGTH)
                    + ": the drift is cut off at the far edge, where the surcharge is " + rec.show(d.at(step.lowerLength()), Quantity.PRESSURE) + ".", shape);
        return d;
    }

    /** factor × (0.43 ∛ℓ ∜(p_g + 10) − 1.5), ℓ not less than the edition's minimum length; the equation in ft and psf. */
    private static double height(Edition ed, UnitSystem sys, String symbol, String what, double length, double pg, double factor, RecordBuilder rec) {
        double c = ed.constant("snow.drift.coef"), add = ed.constant("snow.drift.pgAdd"), off = ed.constant("snow.drift.offset");
        double minFt = ed.constant("snow.drift.minLength");
        double lFt = Math.max(Convert.between(Quantity.LENGTH, length, sys, UnitSystem.US), minFt);
        double pgPsf = Convert.between(Quantity.PRESSURE, pg, sys, UnitSystem.US);
        double hFt = factor * Math.max(0, c * Math.cbrt(lFt) * Math.pow(pgPsf + add, 0.25) - off);
        double h = Convert.between(Quantity.LENGTH, hFt, UnitSystem.US, sys);
        String f = (factor == 1 ? "" : rec.plain(factor) + " × (") + rec.plain(c) + " ∛ℓ ∜(p_g + " + rec.plain(add) + ") − " + rec.plain(off)
                + (factor == 1 ? "" : ")") + ", ℓ in ft ≥ " + rec.plain(minFt) + ", p_g in psf";
        String sub = (factor == 1 ? "" : rec.plain(factor) + " × (") + rec.plain(c) + " × ∛" + rec.fmt(lFt) + " × ∜(" + rec.fmt(pgPsf) + " + "
                + rec.plain(add) + ") − " + rec.plain(off) + (factor == 1 ? "" : ")") + (sys == UnitSystem.SI ? " = " + rec.fmt(hFt) + " ft" : "");
        return rec.step(symbol, what, f, sub, h, Quantity.LENGTH, ed.clause("snow.driftHeight"));
    }
}
