package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Function;

/**
 * The floor reduction methods: the edition's own by the id the edition names, and the other methods a project may
 * choose, one implementation per method bound to each of its data sets ({@link FloorMethods}).
 */
public final class ReductionMethods {
    private ReductionMethods() {}

    private static final Map<String, FloorReductionMethod> METHODS = Map.of(
            "asce7-basic", new Asce7BasicReduction());

    /** Implementations of the other methods by the id their data sets name. */
    private static final Map<String, Function<MethodData, FloorReductionMethod>> ALTERNATIVES = Map.of(
            "ibc-alternative", IbcAlternativeReduction::new,
            "en1991", EnReduction::new,
            "nbc", NbcReduction::new);

    private static final Map<String, FloorReductionMethod> BY_DATA = bind();

    public static FloorReductionMethod forEdition(CalcContext ctx) {
        FloorReductionMethod m = METHODS.get(ctx.edition().floorMethod());
        if (m == null) throw new IllegalStateException("no floor reduction method " + ctx.edition().floorMethod());
        return m;
    }

    /** The project's method: the one it chose, or its edition's own. */
    public static FloorReductionMethod of(CalcContext ctx) {
        return ctx.floorMethod() == null ? forEdition(ctx) : BY_DATA.get(ctx.floorMethod());
    }

    /**
     * Every method a project of this unit system may choose, keyed by the id a project stores ("" for the edition's
     * own, first), each with the context that selects it.
     */
    public static Map<String, CalcContext> applicable(CalcContext ctx) {
        Map<String, CalcContext> out = new LinkedHashMap<>();
        out.put("", ctx.withFloorMethod(null));
        for (MethodData d : FloorMethods.builtIn().forUnits(ctx.system())) out.put(d.id(), ctx.withFloorMethod(d.id()));
        return out;
    }

    /** The ids of the applicable methods other than the project's own. */
    public static List<String> others(CalcContext ctx) {
        List<String> out = new ArrayList<>();
        String own = ctx.floorMethod() == null ? "" : ctx.floorMethod();
        for (String id : applicable(ctx).keySet()) if (!id.equals(own)) out.add(id);
        return out;
    }

    private static Map<String, FloorReductionMethod> bind() {
        Map<String, FloorReductionMethod> out = new LinkedHashMap<>();
        for (MethodData d : FloorMethods.builtIn().all()) {
            var make = ALTERNATIVES.get(d.method());
            if (make == null) throw new IllegalStateException("floor method " + d.id() + " names no implementation " + d.method());
            out.put(d.id(), make.apply(d));
        }
        return out;
    }
}
