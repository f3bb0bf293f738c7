package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Quantity;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The tributary area reduction of NBC 2020 4.1.5.8 (SI): the live load due to use and occupancy times
 * 0.5 + √(20/A) where the member supports more than 80 m² of assembly use designed for 4.8 kPa or more, storage,
 * manufacturing, retail, garages or footbridges (group "large"), and times 0.3 + √(9.8/B) where it supports more than
 * 20 m² of any other use (group "other"). Each factor is 1 at its own threshold. Sentence numbers uncertain, as data.
 *
 * <p>Our choices (printed on the record): each group's factor comes from that group's own tributary area, summed over
 * the floors supported (the smaller area and so the larger factor, where uses are mixed); an occupancy the data set
 * does not list takes the "large" rule (the lesser reduction); a row the catalogue refuses to reduce is not reduced,
 * and an assembly row below 4.8 kPa is not reduced.
 */
final class NbcReduction implements FloorReductionMethod {
    private static final List<String> GROUPS = List.of("large", "other");
    private final MethodData data;

    NbcReduction(MethodData data) { this.data = data; }

    @Override
    public String id() { return data.id(); }

    @Override
    public String title(CalcContext ctx) { return data.title(); }

    @Override
    public com.baysheet.engine.record.Clause clause(CalcContext ctx) { return data.clause("tributary"); }

    @Override
    public LiveFactors reduce(CalcContext ctx, MemberKind kind, Map<String, Double> areas, List<SupportedFloor> byFloor,
                              int floors, double span, RecordBuilder rec) {
        MethodSteps.chosen(ctx, data, "tributary", rec);
        double total = MethodSteps.total(areas, "B", data.clause("tributary"), rec);
        if (floors > 1)
            rec.info("B is the sum of the tributary areas over the " + floors + " floors supported (common practice).", data.clause("tributary"));
        Map<String, String> group = new LinkedHashMap<>();
        Map<String, Double> groupArea = new LinkedHashMap<>();
        double reducible = 0;
        for (var e : areas.entrySet()) {
            String g = group(ctx, ctx.catalogue().get(e.getKey()), rec);
            group.put(e.getKey(), g);
            if (g.isEmpty()) continue;
            groupArea.merge(g, e.getValue(), Double::sum);
            reducible += e.getValue();
        }
        if (groupArea.size() > 1 || (reducible > 0 && reducible < total))
            rec.info("Mixed uses: each rule's factor comes from the tributary area of its own uses; the loads no rule reduces are "
                    + "added unreduced (our choice).", data.clause("tributary"));
        Map<String, Double> groupFactor = new LinkedHashMap<>();
        for (String g : GROUPS) if (groupArea.containsKey(g)) groupFactor.put(g, factor(g, groupArea.get(g), groupArea.size() > 1, rec));

        Map<String, Double> bySource = new LinkedHashMap<>(), factors = new LinkedHashMap<>();
        Map<String, Boolean> counted = new LinkedHashMap<>();
        for (String id : areas.keySet()) {
            Occupancy o = ctx.catalogue().get(id);
            String g = group.get(id);
            double f = g.isEmpty() ? 1 : groupFactor.get(g);
            bySource.put(id, f);
            factors.put(id, f);
            counted.put(id, !g.isEmpty());
            MethodSteps.load(ctx, o, f, data.clause("tributary." + (g.isEmpty() ? "large" : g)), rec);
            MethodSteps.partition(ctx, o, f, bySource, rec);
        }
        double influence = groupArea.values().stream().mapToDouble(Double::doubleValue).max().orElse(0);
        return new LiveFactors(bySource, total, reducible, influence, 1, MethodSteps.effective(ctx, areas, factors, counted));
    }

    private double factor(String g, double b, boolean mixed, RecordBuilder rec) {
        double threshold = data.constant(g + ".threshold"), base = data.constant(g + ".base"), coef = data.constant(g + ".coef");
        String symbol = mixed ? "B_" + g : "B";
        if (b <= threshold) {
            rec.info(symbol + " = " + rec.show(b, Quantity.AREA) + " is not more than " + rec.show(threshold, Quantity.AREA) + ": no reduction.",
                    data.clause("tributary." + g));
            return 1;
        }
        return rec.step("f_" + g, "Tributary area factor, " + (g.equals("large") ? "assembly, storage, manufacturing, retail, garages" : "other uses"),
                "f = " + rec.plain(base) + " + √(" + rec.plain(coef) + "/" + symbol + ")",
                rec.plain(base) + " + √(" + rec.plain(coef) + "/" + rec.num(b, Quantity.AREA) + ")",
                Math.min(1, base + Math.sqrt(coef / b)), Quantity.RATIO, data.clause("tributary." + g));
    }

    /** The occupancy's rule, "" where it is not reduced (with the reason on the record). */
    private String group(CalcContext ctx, Occupancy o, RecordBuilder rec) {
        if (MethodSteps.refusedByCatalogue(o)) {
            MethodSteps.notReduced(o, "the catalogue does not permit reduction (kept under every method)", data.clause("tributary"), rec);
            return "";
        }
        double min = data.constant("assembly.minLoad");
        if (o.assembly() && o.uniform(ctx.system()) < min) {
            MethodSteps.notReduced(o, "assembly use designed for less than " + rec.show(min, Quantity.PRESSURE), data.clause("tributary.large"), rec);
            return "";
        }
        if (!data.lists(o.id()))
            rec.caution(o.name() + " is not sorted by the data set: it takes the rule for more than "
                    + rec.show(data.constant("large.threshold"), Quantity.AREA) + " (the lesser reduction).", data.clause("tributary.large"));
        return data.category(o.id());
    }
}
