package com.baysheet.engine.snow;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.Quantity;

/**
 * The rain-on-snow surcharge (ASCE 7-16 7.10): a fixed load added to the balanced case where 0 < p_g ≤ the
 * edition's limit and the slope in degrees is less than W / 50 (W in ft; SI W / 15.2, W in m).
 */
final class RainOnSnow {
    private RainOnSnow() {}

    static double surcharge(CalcContext ctx, double pg, double deg, double eaveToRidge, RecordBuilder rec) {
        Edition ed = ctx.edition();
        Clause c = ed.clause("snow.rainOnSnow");
        double pgMax = ctx.constant("snow.ros.pgMax"), load = ctx.constant("snow.ros.load"), div = ctx.constant("snow.ros.divisor");
        if (pg <= 0 || pg > pgMax) {
            rec.info("No rain-on-snow surcharge: it applies only where 0 < p_g ≤ " + rec.show(pgMax, Quantity.PRESSURE) + ".", c);
            return 0;
        }
        if (deg > 0 && Double.isNaN(eaveToRidge))
            throw new InputError("eaveToRidge", "nothing", "is required on a sloped roof where 0 < p_g ≤ "
                    + rec.show(pgMax, Quantity.PRESSURE) + " (rain-on-snow, " + c.label() + ")");
        // a flat roof is below W / 50 for any W > 0, so W is not needed there
        double limit = Double.isNaN(eaveToRidge) ? Double.POSITIVE_INFINITY : eaveToRidge / div;
        if (!(deg < limit)) {
            rec.info("No rain-on-snow surcharge: the slope " + rec.show(deg, Quantity.ANGLE) + " is not less than W / " + rec.plain(div)
                    + " = " + rec.show(limit, Quantity.ANGLE) + ".", c);
            return 0;
        }
        String sub = Double.isNaN(eaveToRidge) ? "flat roof" : rec.fmt(deg) + "° < " + rec.num(eaveToRidge, Quantity.LENGTH) + " / " + rec.plain(div);
        double pr = rec.step("pr", "Rain-on-snow surcharge, balanced case only", "where 0 < p_g ≤ " + rec.show(pgMax, Quantity.PRESSURE)
                + " and θ < W / " + rec.plain(div), sub, load, Quantity.PRESSURE, c);
        rec.info("The rain-on-snow surcharge is added to the balanced case only, not to the drift, sliding, unbalanced, minimum or partial cases.", c);
        return pr;
    }
}
