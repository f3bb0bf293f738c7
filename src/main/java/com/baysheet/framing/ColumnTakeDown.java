package com.baysheet.framing;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.member.MemberResult;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.ResultKey;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.reduction.LiveFactors;
import com.baysheet.framing.model.SelfWeights;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.Map;
import java.util.List;

/**
 * Takes one column stack down the building, top level first. At each level the column below it carries
 * everything at and above that level, merged unreduced, and the engine reduces it with the column's own
 * cumulative A_T over the floors supported (never from reduced reactions), each floor with the K_LL of the
 * column's place on that floor (its influence area is Σ K_LL,i A_T,i). Roof live load stays Lr.
 */
final class ColumnTakeDown {
    // the keys each row reads, built once
    private static final ResultKey DEAD = ResultKey.axial("D"), LIVE_UNREDUCED = ResultKey.axial("L0"), LIVE = ResultKey.axial("L"),
            ROOF_LIVE = ResultKey.axial("Lr"), SNOW = ResultKey.axial("S"), LRFD = ResultKey.axial("LRFD"), ASD = ResultKey.axial("ASD");
    private final CalcContext ctx;
    private final MemberCache cache;
    private final List<LevelPlan> plans;        // top down
    private final List<LevelFraming> framings;  // same order

    private final SelfWeights weights;
    /** Every storey taken down so far, by the storey above it and what it reads at its level (see {@link ColumnStorey}). */
    private final Map<ColumnStorey.Key, ColumnStorey> storeys = new HashMap<>();
    private String columnOrigin;

    ColumnTakeDown(CalcContext ctx, MemberCache cache, List<LevelPlan> plans, List<LevelFraming> framings, SelfWeights weights) {
        this.ctx = ctx;
        this.weights = weights;
        this.cache = cache;
        this.plans = plans;
        this.framings = framings;
    }

    /** The stack at grid point (i, j), or null where no level frames into it. Adds each level's column to {@code out}. */
    TakeDown stack(int i, int j, List<DerivedMember> out) {
        String point = plans.get(0).grid.pointName(i, j);
        StackLoad total = new StackLoad();
        List<TakeDown.Row> rows = new ArrayList<>();
        List<MemberResult> records = new ArrayList<>();
        List<SupportedFloor> supported = new ArrayList<>();
        int floors = 0;
        double slope = Double.NaN, floorArea = 0;
        ColumnClass cls = null;
        boolean cant = false;
        List<String> open = new ArrayList<>();   // the floor levels' open bays carried so far, as the records name them
        ColumnStorey above = null;
        for (int k = 0; k < plans.size(); k++) {
            LevelPlan p = plans.get(k);
            var shares = framings.get(k).atPoint[i][j];
            if (shares == null && total.isEmpty()) continue;
            StackLoad here = new StackLoad();
            if (shares != null) shares.forEach(here::add);
            double areaHere = here.area(), floorHere = floorArea(here);
            if (floorHere > 0) floors++;
            floorArea += floorHere;
            if (areaHere - floorHere > 0) slope = Double.isNaN(slope) ? p.level.roofSlope() : Math.min(slope, p.level.roofSlope());
            ColumnClass place = null;
            boolean cantHere = false;
            if (p.flooredAround(i, j) > 0) { cls = place = ColumnClass.at(p, i, j); cant = cantHere = ColumnClass.cantileverTouches(p, i, j); }
            total.add(here);
            MemberKind kind = cls.kind(cant);
            if (floorHere > 0) supported.add(new SupportedFloor(p.level.name(), kind, floorShares(here)));
            List<String> around = bays(p, i, j);
            List<String> openHere = shares != null ? framings.get(k).openAmong(around) : List.of();
            open.addAll(openHere);
            String name = "Column " + point + " below " + p.level.name(), subject = name + " (" + cls.label() + ")";
            String id = p.id + "-c" + p.at(i, j), origin = origin(id);
            double perLength = weights.of(id, weights.column()), height = storeyBelow(k), own = perLength * height;
            var key = new ColumnStorey.Key(above, shares, p.level.roofSlope(), p.level.name(), place, cantHere, openHere, perLength, origin, height);
            ColumnStorey storey = storeys.get(key);
            MemberResult res;
            TakeDown.Row row;
            if (storey == null) {
                // one input, built under the cache's neutral subject (each copy of an input copies its list of floors)
                MemberInput in = new MemberInput(MemberCache.NEUTRAL, kind, new Support.Axial(), Math.max(1, floors), List.of(),
                        List.of(), List.of(total.asPointLoad()), perLength, slope, Double.NaN, false, supported, origin, height,
                        List.of(), null, open);
                MemberResult neutral = cache.neutral(in);
                res = neutral.withSubject(subject);
                total.dead += own; // the column below this level weighs on every level beneath it
                here.dead += own;
                row = row(p, id, res, areaHere, floorArea, kind, floors, here.dead, own);
                storeys.put(key, storey = new ColumnStorey(neutral, row));
            } else { // the same storey as one taken down before: the same input, so the same result and row
                res = storey.neutral.withSubject(subject);
                total.dead += own;
                here.dead += own;
                row = storey.rowOf(id);
            }
            above = storey;
            out.add(new DerivedMember(id, name, p.level.name(), MemberRole.COLUMN, kind,
                    new PlanLine(p.x(i), p.y(j), p.x(i), p.y(j)), 0, 0, here.areas, 0, around, outline(p, i, j), res));
            rows.add(row);
            records.add(res);
        }
        if (rows.isEmpty()) return null;
        CalcContext c = ctx; // the writer keeps only what it needs, not this take-down's working state
        List<String> openAll = List.copyOf(open);
        return new TakeDown("c" + plans.get(0).at(i, j), point, rows,
                () -> TakeDownRecord.write(c, point, rows, records, openAll));
    }

    /** {@link SelfWeights#originOf} a column: the role's origin, written once, where none was entered for the column. */
    private String origin(String id) {
        if (weights.members().containsKey(id)) return weights.originOf(id, "columns");
        if (columnOrigin == null) columnOrigin = weights.originOf(id, "columns");
        return columnOrigin;
    }

    /**
     * The length of column below level k: down to the next level below, or from the lowest level down to
     * elevation 0, the base (none where the lowest level is at or below 0: a slab on grade has no column below).
     */
    private double storeyBelow(int k) {
        double top = plans.get(k).level.elevation();
        return k + 1 < plans.size() ? top - plans.get(k + 1).level.elevation() : Math.max(0, top);
    }

    /** This level's row: the reduction's areas and factor as the column's own record states them. */
    private TakeDown.Row row(LevelPlan p, String id, MemberResult r, double areaHere, double cumArea, MemberKind kind,
                             int floors, double deadHere, double selfWeight) {
        var lf = r.floorReduction();
        double reducible = lf.map(LiveFactors::reducibleArea).orElse(0.0), influence = lf.map(LiveFactors::influenceArea).orElse(0.0);
        return new TakeDown.Row(p.level.name(), id, areaHere, cumArea, reducible, ctx.edition().kll(kind), influence, floors,
                lf.map(LiveFactors::factor).orElse(1.0),
                deadHere, selfWeight, r.value(DEAD), r.value(LIVE_UNREDUCED), r.value(LIVE),
                r.value(ROOF_LIVE), snowOf(r), r.value(LRFD), combo(r, LRFD), r.value(ASD), combo(r, ASD));
    }

    /** The column's unfactored S (0 where it carries no snow). */
    private static double snowOf(MemberResult r) {
        double s = r.value(SNOW);
        return Double.isNaN(s) ? 0 : s;
    }

    /** The floor (not roof) areas of one level, by occupancy. */
    private List<AreaShare> floorShares(StackLoad s) {
        List<AreaShare> out = new ArrayList<>();
        for (var e : s.areas.entrySet()) if (!ctx.catalogue().get(e.getKey()).isRoof()) out.add(new AreaShare(e.getKey(), e.getValue()));
        return out;
    }

    private double floorArea(StackLoad s) {
        double a = 0;
        for (var e : s.areas.entrySet()) if (!ctx.catalogue().get(e.getKey()).isRoof()) a += e.getValue();
        return a;
    }

    private static String combo(MemberResult r, ResultKey key) {
        String label = r.label(key);
        int a = label.lastIndexOf('('), b = label.lastIndexOf(')');
        return a >= 0 && b > a ? label.substring(a + 1, b) : "";
    }

    static List<String> bays(LevelPlan p, int i, int j) {
        List<String> out = new ArrayList<>();
        for (int di = -1; di <= 0; di++)
            for (int dj = -1; dj <= 0; dj++)
                if (p.floored(i + di, j + dj) != null) out.add(p.bayName(i + di, j + dj));
        return out;
    }

    /** The quarter of each floored bay nearest the column (the half-way rule on plan). */
    private static List<PlanRect> outline(LevelPlan p, int i, int j) {
        List<PlanRect> out = new ArrayList<>(4);
        for (int di = -1; di <= 0; di++)
            for (int dj = -1; dj <= 0; dj++) {
                int c = i + di, r = j + dj;
                if (p.floored(c, r) == null) continue;
                double mx = (p.x(c) + p.x(c + 1)) / 2, my = (p.y(r) + p.y(r + 1)) / 2;
                out.add(new PlanRect(Math.min(p.x(i), mx), Math.min(p.y(j), my), Math.max(p.x(i), mx), Math.max(p.y(j), my)));
            }
        return out;
    }
}
