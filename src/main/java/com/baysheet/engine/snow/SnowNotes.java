package com.baysheet.engine.snow;

import com.baysheet.engine.code.Edition;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.Quantity;

/**
 * The cautions of a snow record: the provisions Baysheet does not compute, named where they may govern, so that
 * the checking engineer (and every member the snow load is carried onto) reads them.
 */
final class SnowNotes {
    private SnowNotes() {}

    static void write(CalcContext ctx, SnowSite site, SnowRoof roof, SnowLoads loads, RecordBuilder rec) {
        Edition ed = ctx.edition();
        double deg = loads.slopeDeg();
        double pgCaution = ctx.constant("snow.pg.caution");
        if (site.groundLoad() > pgCaution)
            rec.caution("Ground snow load " + rec.show(site.groundLoad(), Quantity.PRESSURE) + " is above " + rec.show(pgCaution, Quantity.PRESSURE)
                    + " (a check of ours, not a code limit): confirm the value and its units; where the map calls for a site-specific"
                    + " case study, the study governs.", ed.clause("snow.ground"));
        if (!roof.simpleSpans()) {
            Clause c = ed.clause("snow.partial");
            rec.caution("Partial loading (" + c.label() + ") is not computed: on continuous or cantilevered members, and wherever removing"
                    + " snow from part of the roof raises an effect, investigate the balanced load on some spans with half of it on the others.", c);
        }
        double lo = ed.constant("snow.unbalanced.minSlope"), hi = ed.constant("snow.unbalanced.maxSlope");
        if (roof.shape() == SnowRoof.Shape.HIP_OR_GABLE && deg >= lo && deg <= hi) {
            Clause c = ed.clause("snow.unbalanced");
            rec.caution("Unbalanced snow loads (" + c.label() + ") are not computed: a hip or gable roof of " + rec.show(deg, Quantity.ANGLE)
                    + " lies within " + rec.plain(lo) + "° to " + rec.plain(hi) + "°, where they apply; investigate them.", c);
        }
        if (roof.step() != null)
            rec.caution("Sliding snow from the upper roof (" + ed.clause("snow.sliding").label() + ") and drifts from a separate adjacent"
                    + " structure (" + ed.clause("snow.adjacent").label() + ") are not computed: add them where the upper roof slopes toward"
                    + " this one or the structures are apart.", ed.clause("snow.sliding"));
        if (roof.slippery() && loads.slopeFactor() < 1)
            rec.caution("The slippery-surface curve of " + ed.clause("snow.slopeFactor").label() + " needs a surface that is unobstructed and"
                    + " lets snow slide off the eaves, and on warm roofs the thermal resistance of " + ed.clause("snow.slippery").label()
                    + "; confirm them.", ed.clause("snow.slippery"));
        double ponding = ed.constant("snow.ponding.maxSlope");
        if (deg < ponding)
            rec.caution("Slope below " + rec.plain(ponding) + "°: ponding instability under snow and meltwater (" + ed.clause("snow.ponding").label()
                    + ") is not checked here; investigate the roof deflections.", ed.clause("snow.ponding"));
    }
}
