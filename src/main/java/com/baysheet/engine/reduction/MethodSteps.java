package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;

import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Quantity;

import java.util.Map;

/**
 * The steps every floor method other than the edition's own writes alike: the tributary area, the design load of
 * each occupancy, the partition allowance (the project's edition's rule), the effective factor, and the note that
 * says which method reduced the loads and that everything else stays the edition's.
 */
final class MethodSteps {
    private MethodSteps() {}

    /** The tributary area summed over the occupancies, written as one step. */
    static double total(Map<String, Double> areas, String symbol, Clause clause, RecordBuilder rec) {
        double total = 0;
        StringBuilder sum = new StringBuilder();
        for (double a : areas.values()) {
            total += a;
            if (sum.length() > 0) sum.append(" + ");
            sum.append(rec.num(a, Quantity.AREA));
        }
        return rec.step(symbol, "Floor tributary area", symbol + " = Σ A_i", sum.toString(), total, Quantity.AREA, clause);
    }

    /** Says which method reduced the floor live loads and what stays the project's edition's. */
    static void chosen(CalcContext ctx, MethodData d, String clauseKey, RecordBuilder rec) {
        rec.info("Floor live loads reduced by the project's chosen method, " + d.title() + ", instead of the " + ctx.edition().id()
                + " basic reduction; the uniform loads L0, the concentrated loads and the load combinations stay those of "
                + ctx.edition().id() + ".", d.clause(clauseKey));
    }

    /** The catalogue's own refusal is kept by every method (conservative): balconies, assembly, public rooms. */
    static boolean refusedByCatalogue(Occupancy o) {
        return o.rule() == ReductionRule.NOT_REDUCIBLE;
    }

    static void notReduced(Occupancy o, String why, Clause clause, RecordBuilder rec) {
        rec.info("Not reduced: " + o.name() + ", " + why + ".", clause);
    }

    /** The design uniform live load of one occupancy, L = L0 × f. */
    static void load(CalcContext ctx, Occupancy o, double f, Clause clause, RecordBuilder rec) {
        double l0 = o.uniform(ctx.system());
        rec.step("L[" + o.id() + "]", "Design uniform live load, " + o.name(), "L = L0 × f",
                rec.num(l0, Quantity.PRESSURE) + " × " + rec.fmt(f), l0 * f, Quantity.PRESSURE, clause);
    }

    /** The partition allowance of the project's edition, reduced with the live load only where the project says so. */
    static void partition(CalcContext ctx, Occupancy o, double f, Map<String, Double> bySource, RecordBuilder rec) {
        if (!ctx.options().partitionAllowance() || o.isBalcony()) return;
        Clause clause = ctx.edition().clause("partitions");
        if (PartitionAllowance.waived(ctx, o)) {
            rec.info("No partition allowance on " + o.name() + ": L0 is " + PartitionAllowance.wording(ctx) + " "
                    + rec.show(ctx.constant("partition.exempt"), Quantity.PRESSURE) + ".", clause);
            return;
        }
        boolean reduce = ctx.options().reducePartitions();
        double pf = reduce ? f : 1, p = ctx.constant("partition");
        bySource.put(o.id() + "#partitions", pf);
        rec.step("L_p[" + o.id() + "]", "Partition allowance, " + (reduce ? "reduced with the live load (project option)" : "not reduced (project option)"),
                reduce ? "L_p = " + rec.num(p, Quantity.PRESSURE) + " × f" : "L_p",
                reduce ? rec.num(p, Quantity.PRESSURE) + " × " + rec.fmt(pf) : rec.num(p, Quantity.PRESSURE), p * pf, Quantity.PRESSURE, clause);
    }

    /**
     * The factor the reducible loads take together: Σ f_i L0_i A_i / Σ L0_i A_i over the reducible occupancies (1 where
     * none is reducible). With one occupancy it is that occupancy's factor.
     */
    static double effective(CalcContext ctx, Map<String, Double> areas, Map<String, Double> factors, Map<String, Boolean> reducible) {
        double num = 0, den = 0;
        for (var e : areas.entrySet()) {
            if (!reducible.getOrDefault(e.getKey(), false)) continue;
            double w = ctx.catalogue().get(e.getKey()).uniform(ctx.system()) * e.getValue();
            num += factors.get(e.getKey()) * w;
            den += w;
        }
        return den > 0 ? num / den : 1;
    }
}
