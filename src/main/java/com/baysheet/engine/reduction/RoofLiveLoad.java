package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.InputError;
import com.baysheet.engine.Tolerances;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

/**
 * Roof live load of ASCE 7-16 4.8.2, Eq. 4.8-1: Lr = L0 R1 R2 within its bounds, R1 from the tributary area,
 * R2 from the slope. Kept apart from the floor reduction (it is Lr in the load combinations).
 *
 * <p>4.8.2 and its bounds cover the ordinary flat, pitched and curved roof only, whose L0 (20 psf, 0.96 kN/m²)
 * is the edition constant {@code roof.ordinary}. A roof row with another L0 (a firm's 30 psf roof, say) is
 * "ordinary" by its value, not by a flag, so that an existing firm row needs no new field and a 30 psf row
 * can never be reduced or capped at 20 psf: it keeps L0, with a note.
 */
public final class RoofLiveLoad {
    private RoofLiveLoad() {}

    /** Largest slope accepted: 24 in/ft (about 63°) or 200 %. */
    public static final double MAX_SLOPE_US = 24, MAX_SLOPE_SI = 200;

    /**
     * @param area  roof tributary area, ft² or m²
     * @param slope rise in in/ft (US) or percent (SI)
     * @return the multiplier Lr / L0
     */
    public static double factor(CalcContext ctx, Occupancy roof, double area, double slope, RecordBuilder rec) {
        Edition ed = ctx.edition();
        if (!isOrdinary(ctx, roof)) return unreduced(ctx, roof, rec);
        if (Double.isNaN(slope)) throw new InputError("roofSlope", "nothing", "is required where a roof live load acts");
        double max = ctx.system() == UnitSystem.US ? MAX_SLOPE_US : MAX_SLOPE_SI;
        if (!Double.isFinite(slope) || slope < 0 || slope > max)
            throw new InputError("roofSlope", slope, "must lie between 0 and " + Display.plain(max) + " " + Quantity.SLOPE.unit(ctx.system()).symbol());

        double low = ctx.constant("r1.low"), high = ctx.constant("r1.high");
        double base = ed.constant("r1.base"), coef = ctx.constant("r1.coef"), r1min = ed.constant("r1.min");
        String r1Sub;
        double r1;
        if (area <= low) { r1 = 1; r1Sub = "A_T ≤ " + rec.num(low, Quantity.AREA); }
        else if (area >= high) { r1 = r1min; r1Sub = "A_T ≥ " + rec.num(high, Quantity.AREA); }
        else { r1 = base - coef * area; r1Sub = rec.plain(base) + " − " + rec.plain(coef) + " × " + rec.num(area, Quantity.AREA); }
        rec.step("R1", "Roof tributary area factor", "R1 = " + rec.plain(base) + " − " + rec.plain(coef) + " A_T, " + rec.fmt(r1min) + " ≤ R1 ≤ 1",
                r1Sub, r1, Quantity.RATIO, ed.clause("roof.reduction"));

        double f = slope;
        if (ctx.system() == UnitSystem.SI) {
            double k = ed.constant("r2.siPercentToF");
            f = rec.step("F", "Slope factor F from the slope in percent", "F = " + rec.plain(k) + " × slope", rec.plain(k) + " × " + rec.fmt(slope),
                    k * slope, Quantity.RATIO, ed.clause("roof.reduction"));
        }
        double fLow = ed.constant("r2.low"), fHigh = ed.constant("r2.high");
        double b2 = ed.constant("r2.base"), c2 = ed.constant("r2.coef"), r2min = ed.constant("r2.min");
        double r2;
        String r2Sub;
        if (f <= fLow) { r2 = 1; r2Sub = "F ≤ " + rec.plain(fLow); }
        else if (f >= fHigh) { r2 = r2min; r2Sub = "F ≥ " + rec.plain(fHigh); }
        else { r2 = b2 - c2 * f; r2Sub = rec.plain(b2) + " − " + rec.plain(c2) + " × " + rec.fmt(f); }
        rec.step("R2", "Roof slope factor", "R2 = " + rec.plain(b2) + " − " + rec.plain(c2) + " F, " + rec.fmt(r2min) + " ≤ R2 ≤ 1",
                r2Sub, r2, Quantity.RATIO, ed.clause("roof.reduction"));

        double l0 = roof.uniform(ctx.system());
        double lo = ctx.constant("roof.min"), hi = ctx.constant("roof.max");
        double raw = l0 * r1 * r2;
        double lr = Math.min(hi, Math.max(lo, raw));
        rec.step("Lr", "Roof live load", "Lr = L0 R1 R2, " + rec.num(lo, Quantity.PRESSURE) + " ≤ Lr ≤ " + rec.num(hi, Quantity.PRESSURE),
                rec.num(l0, Quantity.PRESSURE) + " × " + rec.fmt(r1) + " × " + rec.fmt(r2), lr, Quantity.PRESSURE,
                ed.clause("roof.reduction"));
        if (raw < lo) rec.info("Lower bound governs: Lr not less than " + rec.show(lo, Quantity.PRESSURE) + ".", ed.clause("roof.reduction"));
        return lr / l0;
    }

    /** A roof row (rule ROOF) is the ordinary roof of 4.8.2 where its L0 is the edition's ordinary roof load. */
    public static boolean isOrdinary(CalcContext ctx, Occupancy o) {
        double ordinary = ctx.constant("roof.ordinary");
        return o.isRoof() && Math.abs(o.uniform(ctx.system()) - ordinary) <= Tolerances.ORDINARY_ROOF * ordinary;
    }

    /** Any other roof row: no R1, R2 or bounds; Lr = L0. Below the ordinary roof load the firm must confirm its row. */
    private static double unreduced(CalcContext ctx, Occupancy roof, RecordBuilder rec) {
        Edition ed = ctx.edition();
        double l0 = roof.uniform(ctx.system()), ordinary = ctx.constant("roof.ordinary");
        rec.step("Lr[" + roof.id() + "]", "Roof live load, " + roof.name() + ", not reduced", "Lr = L0",
                rec.num(l0, Quantity.PRESSURE), l0, Quantity.PRESSURE, ed.clause("loads.table"));
        rec.info(roof.name() + ": not reduced and not bounded; R1, R2 and the bounds of " + ed.clause("roof.reduction").label()
                + " apply to ordinary flat, pitched and curved roofs (L0 = " + rec.show(ordinary, Quantity.PRESSURE) + ") only.",
                ed.clause("roof.reduction"));
        if (l0 < ordinary * (1 - Tolerances.ORDINARY_ROOF))
            rec.caution(roof.name() + ": L0 of " + rec.show(l0, Quantity.PRESSURE) + " is below the ordinary roof live load of "
                    + rec.show(ordinary, Quantity.PRESSURE) + " (" + ed.clause("loads.table").label() + "); confirm the row against the adopted code.",
                    ed.clause("loads.table"));
        return 1;
    }
}
