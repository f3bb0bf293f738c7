package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;

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
 * The IBC alternative uniform live load reduction (IBC 2021 1607.12.2; IBC 2015 1607.10.2): R = 0.08 (A − 150) %
 * (SI 0.861 (A − 13.94)) on members supporting more than 150 ft², not more than 40 % for horizontal members, 60 % for
 * vertical members, nor 23.1 (1 + D/L0) % (IBC 2018 Eqs. 16-31, 16-32); L = L0 (1 − R/100). L0 over 100 psf and
 * passenger vehicle garages only on members supporting two or more floors, by at most 20 %; one-way slabs take
 * A ≤ 0.5 ℓ²; assembly rows are not reduced (the load table's limitation, Table 1607.1). Clause labels and constants
 * are the data set's.
 *
 * <p>Our choices (each printed on the record): A is the reducible area (mixed occupancy, common practice) summed over
 * every floor supported; R is worked out per occupancy, since 23.1 (1 + D/L0) depends on its L0; D is the dead load the
 * tributary area brings per unit area ({@link SupportedDead}); the 20 % of heavy loads and garages is also held to the
 * R that the equation and its limits give, never more.
 */
final class IbcAlternativeReduction implements FloorReductionMethod {
    private final MethodData data;

    IbcAlternativeReduction(MethodData data) { this.data = data; }

    @Override
    public String id() { return data.id(); }

    @Override
    public String title(CalcContext ctx) { return data.title(); }

    @Override
    public com.baysheet.engine.record.Clause clause(CalcContext ctx) { return data.clause("alt.eq"); }

    /** Without the dead load: D = 0, the least R the dead load cap allows (conservative). */
    @Override
    public LiveFactors reduce(CalcContext ctx, MemberKind kind, Map<String, Double> areas, List<SupportedFloor> byFloor,
                              int floors, double span, RecordBuilder rec) {
        return reduce(ctx, kind, areas, byFloor, floors, span, SupportedDead.NONE, rec);
    }

    @Override
    public LiveFactors reduce(CalcContext ctx, MemberKind kind, Map<String, Double> areas, List<SupportedFloor> byFloor,
                              int floors, double span, SupportedDead dead, RecordBuilder rec) {
        var sys = ctx.system();
        MethodSteps.chosen(ctx, data, "alt", rec);
        double total = MethodSteps.total(areas, "A", data.clause("alt.eq"), rec);
        if (areas.size() > 1)
            rec.info("Mixed occupancy: A is the reducible area; R is worked out for each occupancy (its own L0 in "
                    + "23.1 (1 + D/L0)) and reduces the reducible loads only; the others are added unreduced (common practice).", data.clause("alt.eq"));
        if (floors > 1)
            rec.info("A is the sum of the floor areas over the " + floors + " floors supported (common practice).", data.clause("alt.eq"));

        Map<String, ReductionRule> rules = new LinkedHashMap<>();
        double reducible = 0;
        for (var e : areas.entrySet()) {
            ReductionRule r = rule(ctx, ctx.catalogue().get(e.getKey()), rec);
            rules.put(e.getKey(), r);
            if (reducible(r, floors)) reducible += e.getValue();
        }
        if (kind == MemberKind.ONE_WAY_SLAB && reducible > 0) {
            double cap = data.constant("oneway.areaFactor") * span * span;
            if (reducible > cap)
                reducible = rec.step("A,slab", "One-way slab: area capped", "A ≤ " + rec.plain(data.constant("oneway.areaFactor")) + " ℓ²",
                        rec.plain(data.constant("oneway.areaFactor")) + " × " + rec.num(span, Quantity.LENGTH) + "²", cap, Quantity.AREA, data.clause("alt.oneway"));
        }

        double rEq = 0, rMax = 0, d = 0;
        if (reducible > 0) {
            rEq = equation(ctx, reducible, reducible < total, rec);
            if (rEq > 0) {
                boolean vertical = kind.isColumn();
                rMax = rec.step("R_max", "Largest reduction, " + (vertical ? "vertical member" : "horizontal member"), "R_max",
                        "Clause value", data.constant(vertical ? "r.maxVertical" : "r.maxHorizontal"), Quantity.RATIO, data.clause("alt.eq"));
                d = deadLoad(dead, rec);
            }
        }

        Map<String, Double> bySource = new LinkedHashMap<>(), factors = new LinkedHashMap<>();
        Map<String, Boolean> counted = new LinkedHashMap<>();
        for (String id : areas.keySet()) {
            Occupancy o = ctx.catalogue().get(id);
            double f = factor(ctx, o, rules.get(id), floors, rEq, rMax, d, rec);
            bySource.put(id, f);
            factors.put(id, f);
            counted.put(id, reducible(rules.get(id), floors));
            MethodSteps.load(ctx, o, f, data.clause("alt.eq"), rec);
            MethodSteps.partition(ctx, o, f, bySource, rec);
        }
        double effective = MethodSteps.effective(ctx, areas, factors, counted);
        return new LiveFactors(bySource, total, reducible, reducible > 0 ? reducible : 0, 1, effective);
    }

    /** R = c (A − A_min) in percent, 0 where A is not more than A_min. */
    private double equation(CalcContext ctx, double a, boolean mixed, RecordBuilder rec) {
        double coef = data.constant("r.coef", ctx.system()), min = data.constant("r.threshold", ctx.system());
        if (a <= min) {
            rec.info("A = " + rec.show(a, Quantity.AREA) + " is not more than " + rec.show(min, Quantity.AREA) + ": no reduction.", data.clause("alt.eq"));
            return 0;
        }
        String area = mixed ? "A_r" : "A";
        return rec.step("R_eq", "Reduction, percent", "R = " + rec.plain(coef) + " (" + area + " − " + rec.plain(min) + ")",
                rec.plain(coef) + " × (" + rec.num(a, Quantity.AREA) + " − " + rec.plain(min) + ")", coef * (a - min), Quantity.RATIO, data.clause("alt.eq"));
    }

    private double deadLoad(SupportedDead dead, RecordBuilder rec) {
        if (dead.area() <= 0) {
            rec.caution("No dead load came with the tributary area: D is taken as 0 (the least reduction the dead load "
                    + "cap allows).", data.clause("alt.eq"));
            return 0;
        }
        rec.info("D is the dead load the tributary area brings per unit area: the floor dead load of the strips and areas and "
                + "the dead load of the carried members' reactions (their own weight and any line loads on them) over the area "
                + "they bring, roofs included; this member's own weight and line loads on it are left out (our choice). "
                + "Confirm D where heavy walls or equipment are carried.", data.clause("alt.eq"));
        return rec.step("D", "Dead load per unit area supported", "D = ΣD / ΣA",
                rec.show(dead.load(), Quantity.FORCE) + " / " + rec.show(dead.area(), Quantity.AREA), dead.pressure(), Quantity.PRESSURE, data.clause("alt.eq"));
    }

    private double factor(CalcContext ctx, Occupancy o, ReductionRule rule, int floors, double rEq, double rMax, double d, RecordBuilder rec) {
        switch (rule) {
            case NOT_REDUCIBLE -> {
                String why = o.assembly() ? "assembly use (Group A; the load table's limitation, kept for every assembly row)" : o.isBalcony() ? "balcony or deck, not reduced by choice (see the balcony note)"
                        : "the catalogue does not permit reduction";
                MethodSteps.notReduced(o, why, data.clause(o.assembly() ? "alt.assembly" : "alt"), rec);
                return 1;
            }
            case HEAVY, GARAGE -> {
                String clause = rule == ReductionRule.HEAVY ? "alt.heavy" : "alt.garage";
                if (floors == 1) {
                    MethodSteps.notReduced(o, (rule == ReductionRule.HEAVY ? "live load over "
                            + rec.show(data.constant("heavy.threshold", ctx.system()), Quantity.PRESSURE) : "passenger vehicle garage")
                            + ", on a member supporting one floor", data.clause(clause), rec);
                    return 1;
                }
                double cap = data.constant("heavy.maxReduction"), r = Math.min(cap, Math.min(rEq, rMax));
                rec.step("R[" + o.id() + "]", "Reduction, percent, at most " + rec.plain(cap) + " % (two or more floors; held to the "
                                + "equation's R, our choice)", "R = min(" + rec.plain(cap) + ", R_eq, R_max)",
                        "min(" + rec.plain(cap) + ", " + rec.fmt(rEq) + ", " + rec.fmt(rMax) + ")", r, Quantity.RATIO, data.clause(clause));
                return 1 - r / 100;
            }
            case ORDINARY -> {
                if (rEq <= 0) return 1;
                double l0 = o.uniform(ctx.system()), coef = data.constant("r.deadCoef");
                double rDead = coef * (1 + d / l0);
                double r = Math.min(rEq, Math.min(rMax, rDead));
                rec.step("R[" + o.id() + "]", "Reduction, percent, " + o.name(), "R = min(R_eq, R_max, " + rec.plain(coef) + " (1 + D/L0))",
                        "min(" + rec.fmt(rEq) + ", " + rec.fmt(rMax) + ", " + rec.plain(coef) + " × (1 + " + rec.num(d, Quantity.PRESSURE)
                                + "/" + rec.num(l0, Quantity.PRESSURE) + "))", r, Quantity.RATIO, data.clause("alt.dead"));
                return 1 - r / 100;
            }
            default -> throw new IllegalStateException("roof occupancy " + o.id() + " reached the floor reduction");
        }
    }

    /** Group A: never; an ordinary row over the 100 psf threshold is heavy (a firm's own row, say). */
    private ReductionRule rule(CalcContext ctx, Occupancy o, RecordBuilder rec) {
        if (o.assembly()) return ReductionRule.NOT_REDUCIBLE;
        double heavy = data.constant("heavy.threshold", ctx.system());
        if (o.rule() == ReductionRule.ORDINARY && o.uniform(ctx.system()) > heavy) {
            rec.caution(o.name() + ": L0 over " + rec.show(heavy, Quantity.PRESSURE) + ", treated as a heavy live load.", data.clause("alt.heavy"));
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
