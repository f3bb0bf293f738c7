package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;
import java.util.Map;

/** The floor reduction methods by the id an edition names. */
public final class ReductionMethods {
    private ReductionMethods() {}

    private static final Map<String, FloorReductionMethod> METHODS = Map.of(
            "asce7-basic", new Asce7BasicReduction());

    public static FloorReductionMethod forEdition(CalcContext ctx) {
        FloorReductionMethod m = METHODS.get(ctx.edition().floorMethod());
        if (m == null) throw new IllegalStateException("no floor reduction method " + ctx.edition().floorMethod());
        return m;
    }
}
