package com.baysheet.sheet;

import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.reduction.RoofLiveLoad;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.TreeSet;

/** The design criteria of a building as a cover prints them: edition, units, each occupancy used with its loads, options. */
final class Criteria {
    private Criteria() {}

    static DesignCriteria of(Building b) {
        CalcContext ctx = b.context();
        Map<String, TreeSet<Double>> dead = new LinkedHashMap<>();   // dead loads used with each occupancy
        for (Level l : b.levels())
            for (Bay bay : l.bays())
                if (!bay.opening()) {
                    dead.computeIfAbsent(bay.occupancy(), k -> new TreeSet<>()).add(bay.deadLoad());
                    // cantilever slabs carry their own occupancy (by default the balcony of the bay's)
                    if (!bay.cantilevers().isEmpty())
                        dead.computeIfAbsent(bay.cantileverUse(ctx.catalogue()), k -> new TreeSet<>()).add(bay.deadLoad());
                }
        List<DesignCriteria.LoadRow> rows = new ArrayList<>();
        for (Map.Entry<String, TreeSet<Double>> e : dead.entrySet()) {
            Occupancy o = ctx.catalogue().get(e.getKey());
            List<String> d = e.getValue().stream().map(v -> Display.of(v, Quantity.PRESSURE, ctx.system())).toList();
            rows.add(new DesignCriteria.LoadRow(o.name(), Display.of(o.uniform(ctx.system()), Quantity.PRESSURE, ctx.system()),
                    o.concentrated(ctx.system()) > 0 ? Display.of(o.concentrated(ctx.system()), Quantity.FORCE, ctx.system()) : "—",
                    String.join(", ", d), reduction(ctx, o)));
        }
        DesignOptions opt = ctx.options();
        List<String> options = new ArrayList<>(List.of(
                "Partition allowance: " + (!opt.partitionAllowance() ? "not included"
                        : opt.reducePartitions() ? "included, reduced with the live load" : "included, not reduced"),
                "Live load reduction: by occupancy, as listed below (" + ctx.edition().clause("reduction.kll").label() + " for K_LL)",
                "Load combinations: strength (LRFD) and allowable stress (ASD), gravity combinations only",
                "Minimum reactions of overhanging beams: " + (opt.upliftReducedDead()
                        ? "the code combinations, and also 0.9D + 1.6L (firm practice, not a " + ctx.edition().clause("combo.lrfd").ref() + " combination)"
                        : "the code combinations (" + ctx.edition().clause("combo.lrfd").ref() + ", " + ctx.edition().clause("combo.asd").ref() + ")")));
        if (ctx.floorMethod() != null)
            options.add(1, "Floor live load reduction by the project's chosen method: "
                    + com.baysheet.engine.reduction.FloorMethods.builtIn().get(ctx.floorMethod()).title()
                    + ", in place of the basic reduction listed below; loads and combinations stay " + ctx.edition().id());
        options.add(SnowCriteria.line(ctx));
        return new DesignCriteria(ctx.edition().id(), ctx.system() == com.baysheet.engine.units.UnitSystem.US
                ? "US customary (ft, psf, plf, kip, kip·ft)" : "SI (m, kPa, kN/m, kN, kN·m)", rows, options,
                CriteriaLines.combinations(ctx), CriteriaLines.selfWeights(b.selfWeights(), ctx.system()));
    }

    private static String reduction(CalcContext ctx, Occupancy o) {
        return switch (o.rule()) {
            case ORDINARY -> "reducible, " + ctx.edition().clause("reduction.basic").ref();
            case HEAVY -> "by at most 20 % on two or more floors, " + ctx.edition().clause("reduction.heavy").ref();
            case GARAGE -> "as heavy live loads, " + ctx.edition().clause("reduction.garage").ref();
            case NOT_REDUCIBLE -> o.isBalcony() ? "not reduced (conservative choice), " + ctx.edition().clause("loads.table").ref()
                    : "not reduced, " + ctx.edition().clause("reduction.assembly").ref();
            case ROOF -> RoofLiveLoad.isOrdinary(ctx, o) ? "roof live load by R1 and R2, " + ctx.edition().clause("roof.reduction").ref()
                    : "roof live load, not reduced (not an ordinary roof, " + ctx.edition().clause("roof.reduction").ref() + ")";
        };
    }
}
