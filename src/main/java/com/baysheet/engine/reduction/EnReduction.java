package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Quantity;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The reduction factors of EN 1991-1-1 6.3.1.2: α_A for the loaded area (Eq. 6.1, α_A = 5/7 ψ0 + A0/A ≤ 1.0, not below
 * 0.6 for categories C and D) and α_n for columns and walls over n storeys of the same category (Eq. 6.2,
 * α_n = (2 + (n − 2) ψ0)/n for n > 2), with ψ0 of EN 1990 Table A1.1 by category. Both are nationally determined:
 * the data set gives the recommended forms ({@code area.form}, {@code storeys.form} 0) or a national annex's linear
 * and stepped forms (1). On columns α_A and α_n are not taken together: the lesser factor is used
 * ({@code combine.lesser} 1), or their product where a data set allows it (0).
 *
 * <p>Our choices (printed on the record): the use category of each occupancy is the data set's mapping from the
 * catalogue; categories E and F, an occupancy with no category and a row the catalogue refuses to reduce are not
 * reduced; α_A on a column takes one storey's area (the least storey's reducible area, or A/n where the floors are not
 * listed), never the sum over the storeys.
 */
final class EnReduction implements FloorReductionMethod {
    private final MethodData data;

    EnReduction(MethodData data) { this.data = data; }

    @Override
    public String id() { return data.id(); }

    @Override
    public String title(CalcContext ctx) { return data.title(); }

    @Override
    public com.baysheet.engine.record.Clause clause(CalcContext ctx) { return data.clause("area"); }

    @Override
    public LiveFactors reduce(CalcContext ctx, MemberKind kind, Map<String, Double> areas, List<SupportedFloor> byFloor,
                              int floors, double span, RecordBuilder rec) {
        MethodSteps.chosen(ctx, data, "area", rec);
        rec.caution("The use categories of " + data.clause("categories").label() + " are mapped by Baysheet from the catalogue's "
                + "occupancies (residential A, offices B, assembly, schools and corridors C, retail D, storage and industry E, "
                + "garages F); confirm each. L0 stays the catalogue's value, not the characteristic load of the category.", data.clause("categories"));
        double total = MethodSteps.total(areas, "A", data.clause("area"), rec);
        Map<String, String> category = new LinkedHashMap<>();
        double reducible = 0;
        for (var e : areas.entrySet()) {
            Occupancy o = ctx.catalogue().get(e.getKey());
            String c = reducibleCategory(o, rec);
            category.put(e.getKey(), c);
            if (!c.isEmpty()) reducible += e.getValue();
        }
        boolean column = kind.isColumn();
        double areaForFactor = 0;
        if (reducible > 0) {
            areaForFactor = column && floors > 1 ? storeyArea(ctx, byFloor, category, reducible, floors, rec) : reducible;
            if (reducible < total)
                rec.info("Mixed occupancy: A is the area of the reducible categories; the others are added unreduced (common practice).", data.clause("area"));
        }

        Map<String, Double> bySource = new LinkedHashMap<>(), factors = new LinkedHashMap<>();
        Map<String, Boolean> counted = new LinkedHashMap<>();
        boolean storeysUsed = false;
        for (String id : areas.keySet()) {
            Occupancy o = ctx.catalogue().get(id);
            String c = category.get(id);
            double f = 1;
            if (!c.isEmpty()) {
                double psi = data.constant("psi0." + c);
                if (data.constant("area.form") == 0)
                    rec.step("ψ0[" + id + "]", "Combination factor, category " + c, "ψ0", "Table value", psi, Quantity.RATIO, data.clause("psi0"));
                double aA = areaFactor(o, c, psi, areaForFactor, rec);
                f = aA;
                if (column) {
                    int n = storeys(ctx, byFloor, c, floors);
                    double aN = storeyFactor(o, psi, n, rec);
                    f = combine(o, aA, aN, rec);
                    storeysUsed |= aN < 1;
                }
            }
            bySource.put(id, f);
            factors.put(id, f);
            counted.put(id, !c.isEmpty());
            MethodSteps.load(ctx, o, f, data.clause("area"), rec);
            MethodSteps.partition(ctx, o, f, bySource, rec);
        }
        if (storeysUsed)
            rec.caution("Where the imposed load is an accompanying action, only one of ψ and α_n may be applied; the project's "
                    + ctx.edition().id() + " combinations are used as they are: check any combination that also scales L.", data.clause("accompanying"));
        double effective = MethodSteps.effective(ctx, areas, factors, counted);
        return new LiveFactors(bySource, total, reducible, areaForFactor, 1, effective);
    }

    /** The occupancy's category where it may be reduced, "" where not (with the reason on the record). */
    private String reducibleCategory(Occupancy o, RecordBuilder rec) {
        if (MethodSteps.refusedByCatalogue(o)) {
            MethodSteps.notReduced(o, "the catalogue does not permit reduction (kept under every method)", data.clause("categories"), rec);
            return "";
        }
        String c = data.category(o.id());
        if (c.isEmpty()) {
            rec.caution(o.name() + " has no use category in the data set: not reduced.", data.clause("categories"));
            return "";
        }
        if (!data.reducible().contains(c)) {
            MethodSteps.notReduced(o, "category " + c, data.clause("area"), rec);
            return "";
        }
        return c;
    }

    private double areaFactor(Occupancy o, String c, double psi, double a, RecordBuilder rec) {
        String id = o.id();
        if (data.constant("area.form") == 1) {
            double base = data.constant("area.linearBase"), per = data.constant("area.linearPer"), min = data.constant("area.linearMin");
            return rec.step("α_A[" + id + "]", "Reduction factor for the loaded area", "α_A = " + rec.plain(base) + " − A/" + rec.plain(per) + " ≥ " + rec.plain(min),
                    rec.plain(base) + " − " + rec.num(a, Quantity.AREA) + "/" + rec.plain(per), Math.min(1, Math.max(min, base - a / per)), Quantity.RATIO, data.clause("area"));
        }
        double num = data.constant("area.psiNum"), den = data.constant("area.psiDen"), a0 = data.constant("area.a0");
        boolean floor = data.floorCategories().contains(c);
        double min = floor ? data.constant("area.minCD") : 0;
        double v = Math.min(1, Math.max(min, num / den * psi + a0 / a));
        return rec.step("α_A[" + id + "]", "Reduction factor for the loaded area" + (floor ? ", at least " + rec.plain(min) + " for category " + c : ""),
                "α_A = " + rec.plain(num) + "/" + rec.plain(den) + " ψ0 + A0/A ≤ 1.0" + (floor ? ", ≥ " + rec.plain(min) : ""),
                rec.plain(num) + "/" + rec.plain(den) + " × " + rec.fmt(psi) + " + " + rec.plain(a0) + "/" + rec.num(a, Quantity.AREA), v, Quantity.RATIO, data.clause("area"));
    }

    private double storeyFactor(Occupancy o, double psi, int n, RecordBuilder rec) {
        String id = o.id();
        if (data.constant("storeys.form") == 1) {
            double base = data.constant("storeys.linearBase"), per = data.constant("storeys.linearPer");
            double upTo = data.constant("storeys.linearUpTo"), midUpTo = data.constant("storeys.midUpTo");
            double v = n <= upTo ? base - n / per : n <= midUpTo ? data.constant("storeys.midValue") : data.constant("storeys.highValue");
            String formula = n <= upTo ? "α_n = " + rec.plain(base) + " − n/" + rec.plain(per) : "α_n for n over " + rec.plain(n <= midUpTo ? upTo : midUpTo);
            return rec.step("α_n[" + id + "]", "Reduction factor for " + n + " storeys", formula, "n = " + n, Math.min(1, v), Quantity.RATIO, data.clause("storeys"));
        }
        double above = data.constant("storeys.above");
        if (n <= above) {
            rec.info("α_n = 1: " + n + " storeys, not more than " + rec.plain(above) + ".", data.clause("storeys"));
            return 1;
        }
        return rec.step("α_n[" + id + "]", "Reduction factor for " + n + " storeys", "α_n = (2 + (n − 2) ψ0)/n",
                "(2 + (" + n + " − 2) × " + rec.fmt(psi) + ")/" + n, Math.min(1, (2 + (n - 2) * psi) / n), Quantity.RATIO, data.clause("storeys"));
    }

    private double combine(Occupancy o, double aA, double aN, RecordBuilder rec) {
        boolean lesser = data.constant("combine.lesser") == 1;
        return rec.step("f[" + o.id() + "]", lesser ? "α_A and α_n not taken together: the lesser" : "α_A and α_n taken together",
                lesser ? "f = min(α_A, α_n)" : "f = α_A × α_n", (lesser ? "min(" + rec.fmt(aA) + ", " : rec.fmt(aA) + " × (") + rec.fmt(aN) + ")",
                lesser ? Math.min(aA, aN) : aA * aN, Quantity.RATIO, data.clause("combine"));
    }

    /** Storeys of this category the column supports: the listed floors that carry it, else every floor. */
    private int storeys(CalcContext ctx, List<SupportedFloor> byFloor, String c, int floors) {
        if (byFloor.isEmpty()) return floors;
        int n = 0;
        for (SupportedFloor f : byFloor)
            for (AreaShare s : f.areas())
                if (c.equals(data.category(s.occupancy())) && !MethodSteps.refusedByCatalogue(ctx.catalogue().get(s.occupancy()))) { n++; break; }
        return Math.max(1, n);
    }

    /** One storey's reducible area for α_A on a column: the least over the listed floors, or A/n. */
    private double storeyArea(CalcContext ctx, List<SupportedFloor> byFloor, Map<String, String> category, double reducible, int floors, RecordBuilder rec) {
        double least = Double.POSITIVE_INFINITY;
        for (SupportedFloor f : byFloor) {
            double a = 0;
            for (AreaShare s : f.areas()) if (!category.getOrDefault(s.occupancy(), "").isEmpty()) a += s.area();
            if (a > 0) least = Math.min(least, a);
        }
        if (least < Double.POSITIVE_INFINITY)
            return rec.step("A_storey", "Loaded area of one storey for α_A: the least over the floors (our choice)", "A = min A_i",
                    "floor by floor", least, Quantity.AREA, data.clause("area"));
        return rec.step("A_storey", "Loaded area of one storey for α_A: A/n (our choice)", "A = A_T/n",
                rec.num(reducible, Quantity.AREA) + "/" + floors, reducible / floors, Quantity.AREA, data.clause("area"));
    }
}
