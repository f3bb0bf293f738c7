package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Quantity;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The basic floor live load reduction of ASCE 7 (7-16 numbering): Eq. 4.7-1 with the 400 ft² threshold and
 * the 0.50/0.40 limits (4.7.2), heavy loads and garages (4.7.3, 4.7.4), assembly uses (4.7.5), the one-way
 * slab cap (4.7.6), and the partition allowance (4.3.2) as its own source.
 *
 * <p>Mixed occupancy (common practice, no code clause): one factor from K_LL times the reducible area; it
 * reduces the reducible loads only; the others add unreduced. A column whose K_LL differs from floor to floor
 * takes the influence area Σ K_LL,i × (reducible A_T,i) over its floors ({@link InfluenceArea}).
 */
final class Asce7BasicReduction implements FloorReductionMethod {
    @Override
    public String id() { return "asce7-basic"; }

    @Override
    public LiveFactors reduce(CalcContext ctx, MemberKind kind, Map<String, Double> areas, List<SupportedFloor> byFloor,
                              int floors, double span, RecordBuilder rec) {
        Edition ed = ctx.edition();
        boolean perFloor = SupportedFloor.kllVaries(ed, kind, byFloor);
        double kll = perFloor ? InfluenceArea.floorFactors(ctx, kind, byFloor, rec)
                : rec.step("K_LL", rec.writesText() ? "Live load element factor, " + kind.title().toLowerCase() : "", "K_LL",
                "Table value", ed.kll(kind), Quantity.RATIO, ed.clause("reduction.kll"));

        double total = 0, reducible = 0;
        StringBuilder sum = rec.writesText() ? new StringBuilder() : null;
        for (Map.Entry<String, Double> e : areas.entrySet()) {
            Occupancy o = ctx.catalogue().get(e.getKey());
            double a = e.getValue();
            total += a;
            if (sum != null) {
                if (sum.length() > 0) sum.append(" + ");
                sum.append(rec.num(a, Quantity.AREA));
            }
            if (reducible(effectiveRule(ctx, o, rec), floors)) reducible += a;
        }
        rec.step("A_T", "Floor tributary area", "A_T = Σ A_i", sum == null ? "" : sum.toString(), total, Quantity.AREA,
                ed.clause("reduction.basic"));
        if (areas.size() > 1)
            rec.info("Mixed occupancy: one factor from K_LL times the reducible tributary area reduces the reducible "
                    + "loads only; the others are added unreduced (common practice, no code clause).", ed.clause("reduction.basic"));
        if (floors > 1)
            rec.info("A_T is the sum of the tributary areas over the " + floors + " floors supported.", ed.clause("reduction.multifloor"));

        if (kind == MemberKind.ONE_WAY_SLAB && reducible > 0) {
            double cap = ed.constant("oneway.areaFactor") * span * span;
            if (reducible > cap) {
                reducible = rec.step("A_T,slab", "One-way slab: tributary area capped", "A_T ≤ 1.5 ℓ²",
                        "1.5 × " + rec.num(span, Quantity.LENGTH) + "²", cap, Quantity.AREA, ed.clause("reduction.oneway"));
            }
        }

        double factor = 1, influence = 0;
        if (reducible > 0) {
            influence = perFloor
                    ? InfluenceArea.perFloor(ctx, byFloor, o -> reducible(effectiveRule(ctx, o, null), floors), reducible < total, rec)
                    : InfluenceArea.single(ctx, kll, reducible, total, rec);
            factor = basicFactor(ctx, influence, floors, rec);
        }

        Map<String, Double> bySource = new LinkedHashMap<>();
        for (String id : areas.keySet()) {
            Occupancy o = ctx.catalogue().get(id);
            double f = occupancyFactor(ctx, o, effectiveRule(ctx, o, null), floors, factor, rec);
            bySource.put(id, f);
            double l0 = o.uniform(ctx.system());
            boolean text = rec.writesText();
            rec.step("L[" + id + "]", text ? "Design uniform live load, " + o.name() : "", "L = L0 × f",
                    text ? rec.num(l0, Quantity.PRESSURE) + " × " + rec.fmt(f) : "", l0 * f, Quantity.PRESSURE,
                    ed.clause("reduction.eq"));
            partition(ctx, o, f, bySource, rec);
        }
        return new LiveFactors(bySource, total, reducible, influence, kll, factor);
    }

    /** The factor of Eq. 4.7-1 with its threshold and lower limit, from the influence area {@code kat}. */
    private double basicFactor(CalcContext ctx, double kat, int floors, RecordBuilder rec) {
        Edition ed = ctx.edition();
        double threshold = ctx.constant("threshold");
        if (kat < threshold) {
            rec.info("K_LL·A_T = " + rec.show(kat, Quantity.AREA) + " is below " + rec.show(threshold, Quantity.AREA)
                    + ": no reduction.", ed.clause("reduction.basic"));
            return 1;
        }
        double base = ed.constant("reduction.base"), coef = ctx.constant("reduction.coef");
        boolean text = rec.writesText();
        double eq = rec.step("f_eq", "Reduction factor", text ? "f = " + rec.plain(base) + " + " + rec.plain(coef) + "/√(K_LL·A_T)" : "",
                text ? rec.plain(base) + " + " + rec.plain(coef) + "/√" + rec.num(kat, Quantity.AREA) : "", Math.min(1, base + coef / Math.sqrt(kat)),
                Quantity.RATIO, ed.clause("reduction.eq"));
        double limit = ed.constant(floors == 1 ? "limit.oneFloor" : "limit.multiFloor");
        double f = rec.step("f", text ? "Reduction factor with its lower limit (" + (floors == 1 ? "one floor" : "two or more floors") + ")" : "",
                text ? "f = max(f_eq, " + rec.plain(limit) + ")" : "", text ? "max(" + rec.fmt(eq) + ", " + rec.fmt(limit) + ")" : "",
                Math.max(eq, limit), Quantity.RATIO, ed.clause("reduction.basic"));
        if (eq < limit)
            rec.info("Lower limit governs: L not less than " + rec.fmt(limit) + " L0.", ed.clause("reduction.basic"));
        return f;
    }

    private double occupancyFactor(CalcContext ctx, Occupancy o, ReductionRule rule, int floors, double factor,
                                   RecordBuilder rec) {
        Edition ed = ctx.edition();
        return switch (rule) {
            case ORDINARY -> factor;
            case HEAVY, GARAGE -> {
                String clause = rule == ReductionRule.HEAVY ? "reduction.heavy" : "reduction.garage";
                String what = rule == ReductionRule.HEAVY ? "live load over " + rec.show(ctx.constant("heavy.threshold"), Quantity.PRESSURE) : "passenger vehicle garage";
                if (floors == 1) {
                    rec.info("Not reduced: " + o.name() + " (" + what + ") on a member supporting one floor.", ed.clause(clause));
                    yield 1;
                }
                double min = ed.constant("heavy.minFactor");
                double f = Math.max(min, factor);
                rec.step("f[" + o.id() + "]", "Reduction limited to 20 %: " + what, "f = max(" + rec.plain(min) + ", f)",
                        "max(" + rec.fmt(min) + ", " + rec.fmt(factor) + ")", f, Quantity.RATIO, ed.clause(clause));
                yield f;
            }
            case NOT_REDUCIBLE -> {
                String why = o.isBalcony() ? "balcony or deck, not reduced by choice (see the balcony note)"
                        : o.assembly() ? "assembly use" : "the code does not permit reduction";
                rec.info("Not reduced: " + o.name() + ", " + why + ", " + ed.clause(o.ruleClause().isEmpty() ? "loads.table" : o.ruleClause()).label() + ".",
                        ed.clause(o.ruleClause().isEmpty() ? "loads.table" : o.ruleClause()));
                yield 1;
            }
            case ROOF -> throw new IllegalStateException("roof occupancy " + o.id() + " reached the floor reduction");
        };
    }

    private void partition(CalcContext ctx, Occupancy o, double f, Map<String, Double> bySource, RecordBuilder rec) {
        if (!ctx.options().partitionAllowance() || o.isBalcony()) return; // balconies: see BalconyNote
        Edition ed = ctx.edition();
        double exempt = ctx.constant("partition.exempt");
        if (PartitionAllowance.waived(ctx, o)) { // at or over the threshold, by edition
            rec.info("No partition allowance on " + o.name() + ": L0 is " + PartitionAllowance.wording(ctx) + " "
                    + rec.show(exempt, Quantity.PRESSURE) + ".", ed.clause("partitions"));
            return;
        }
        boolean reduce = ctx.options().reducePartitions();
        double pf = reduce ? f : 1;
        bySource.put(o.id() + "#partitions", pf);
        double p = ctx.constant("partition");
        rec.step("L_p[" + o.id() + "]", "Partition allowance, " + (reduce ? "reduced with the live load (project option)" : "not reduced (project option)"),
                reduce ? "L_p = " + rec.num(p, Quantity.PRESSURE) + " × f" : "L_p", reduce ? rec.num(p, Quantity.PRESSURE) + " × " + rec.fmt(pf) : rec.num(p, Quantity.PRESSURE),
                p * pf, Quantity.PRESSURE, ed.clause("partitions"));
    }

    /** An ordinary row over the heavy threshold (a firm's own row, say) is treated as heavy. */
    static ReductionRule effectiveRule(CalcContext ctx, Occupancy o, RecordBuilder rec) {
        if (o.rule() == ReductionRule.ORDINARY && o.uniform(ctx.system()) > ctx.constant("heavy.threshold")) {
            if (rec != null)
                rec.caution(o.name() + ": L0 over " + rec.show(ctx.constant("heavy.threshold"), Quantity.PRESSURE)
                        + ", treated as a heavy live load.", ctx.edition().clause("reduction.heavy"));
            return ReductionRule.HEAVY;
        }
        return o.rule();
    }

    private static boolean reducible(ReductionRule rule, int floors) {
        return switch (rule) {
            case ORDINARY -> true;
            case HEAVY, GARAGE -> floors > 1;
            case NOT_REDUCIBLE, ROOF -> false;
        };
    }
}
