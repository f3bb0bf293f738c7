package com.baysheet.engine.member;

import com.baysheet.engine.Tolerances;
import com.baysheet.engine.beam.BeamLoads;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.AreaLoad;
import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.LineLoad;
import com.baysheet.engine.load.LiveShare;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.reduction.PartitionAllowance;
import com.baysheet.engine.reduction.SupportedDead;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * A member's loads sorted by source: the dead load, and the unreduced live load of each source (an
 * occupancy, or the partition allowance on it), with the tributary area of each occupancy.
 * Axial members keep their loads as point loads at x = 0. Line loads are dead, and live under their own
 * source ("office#line") which no reduction factor reaches.
 */
final class LoadBook {
    final BeamLoads dead = new BeamLoads();
    /** The roof snow load S, unfactored and not reduced: on the strips (see {@link #snowOnStrips}) and in point loads. */
    final BeamLoads snow = new BeamLoads();
    /** The drift surcharge on the member as the load diagram draws it (linear loads). */
    final java.util.List<com.baysheet.engine.record.Sketch.Drift> driftSketch = new java.util.ArrayList<>();
    final Map<String, BeamLoads> live = new LinkedHashMap<>();
    final Map<String, Double> floorAreas = new LinkedHashMap<>();
    final Map<String, Double> roofAreas = new LinkedHashMap<>();
    /** Area of each occupancy apportioned to the left and right ends by the lever rule (half-way rule). */
    final Map<String, Double> leftAreas = new LinkedHashMap<>();
    final Map<String, Double> rightAreas = new LinkedHashMap<>();
    /** The dead load the tributary area brings (strips, areas, carried reactions with area), for D/L0 rules. */
    SupportedDead supportedDead = SupportedDead.NONE;
    private final CalcContext ctx;
    private final MemberInput in;

    private LoadBook(CalcContext ctx, MemberInput in) { this.ctx = ctx; this.in = in; }

    static LoadBook of(CalcContext ctx, MemberInput in) {
        LoadBook b = new LoadBook(ctx, in);
        double length = in.support().length();
        if (in.kind().isColumn()) b.dead.point(in.selfWeight() * in.columnHeight(), 0);
        else if (in.selfWeight() > 0) b.dead.distributed(in.selfWeight(), 0, length);
        for (int i = 0; i < in.lineLoads().size(); i++) {
            LineLoad l = in.lineLoads().get(i);
            b.dead.distributed(l.dead(), l.from(), l.to());
            if (l.live() > 0) {
                b.occupancy("lineLoads[" + i + "].liveOccupancy", l.liveOccupancy());
                // no tributary area: the live part is never reduced and adds to no A_T (our choice, stated on the sheet)
                b.source(l.liveOccupancy() + LiveShare.LINE).distributed(l.live(), l.from(), l.to());
            }
        }
        for (int i = 0; i < in.strips().size(); i++) {
            AreaStrip s = in.strips().get(i);
            Occupancy o = b.occupancy("strips[" + i + "].occupancy", s.occupancy());
            b.dead.distributed(s.deadPressure() * s.width(), s.from(), s.to());
            b.source(o.id()).distributed(o.uniform(ctx.system()) * s.width(), s.from(), s.to());
            if (b.partitioned(o)) b.source(o.id() + "#partitions").distributed(b.partition() * s.width(), s.from(), s.to());
            b.area(o, s.area(), (s.from() + s.to()) / 2);
            b.supportedDead = b.supportedDead.plus(s.deadPressure() * s.area(), s.area());
        }
        for (int i = 0; i < in.areas().size(); i++) {
            AreaLoad a = in.areas().get(i);
            Occupancy o = b.occupancy("areas[" + i + "].occupancy", a.occupancy());
            b.dead.point(a.deadPressure() * a.area(), 0);
            b.source(o.id()).point(o.uniform(ctx.system()) * a.area(), 0);
            if (b.partitioned(o)) b.source(o.id() + "#partitions").point(b.partition() * a.area(), 0);
            b.area(o, a.area(), 0);
            b.supportedDead = b.supportedDead.plus(a.deadPressure() * a.area(), a.area());
        }
        for (int i = 0; i < in.pointLoads().size(); i++) {
            PointLoad p = in.pointLoads().get(i);
            double x = in.kind().isColumn() ? 0 : p.x();
            b.dead.point(p.dead(), x);
            for (LiveShare l : p.live()) {
                b.occupancy("pointLoads[" + i + "].live.occupancy", l.occupancy());
                b.source(l.source()).point(l.amount(), x);
            }
            if (p.snow() > 0) b.snow.point(p.snow(), x);
            for (AreaShare a : p.areas()) b.area(b.occupancy("pointLoads[" + i + "].areas.occupancy", a.occupancy()), a.area(), x);
            double brought = 0;
            for (AreaShare a : p.areas()) brought += a.area();
            if (brought > 0) b.supportedDead = b.supportedDead.plus(p.dead(), brought);
        }
        b.checkFloors();
        return b;
    }

    /**
     * The floors listed must hold, occupancy by occupancy, exactly the floor areas the loads carry. A column low in a
     * tall stack lists every floor above it and carries few occupancies: the sums are kept in a few slots searched in
     * turn, unboxed, and added in the order the floors list them.
     */
    private void checkFloors() {
        if (in.floors().isEmpty()) return;
        String[] ids = new String[4];
        double[] sums = new double[4];
        int n = 0;
        for (int i = 0; i < in.floors().size(); i++) {
            var areas = in.floors().get(i).areas();
            for (int j = 0; j < areas.size(); j++) {
                // the field's name is written only for a refusal: a column low in a tall stack lists every floor above
                String id = areas.get(j).occupancy();
                Occupancy o = ctx.catalogue().contains(id) ? ctx.catalogue().get(id) : occupancy(floorField(i, j), id);
                if (o.isRoof()) throw new com.baysheet.engine.InputError(floorField(i, j), o.id(), "is a roof occupancy; a supported floor lists floor areas only");
                int k = slot(ids, n, o.id());
                if (k == n) {
                    if (n == ids.length) {
                        ids = java.util.Arrays.copyOf(ids, 2 * n);
                        sums = java.util.Arrays.copyOf(sums, 2 * n);
                    }
                    ids[n++] = o.id();
                }
                sums[k] += areas.get(j).area();
            }
        }
        // the occupancies the loads carry first, then those only listed: the refusal names the first that differs
        for (Map.Entry<String, Double> e : floorAreas.entrySet()) {
            int k = slot(ids, n, e.getKey());
            sameArea(e.getKey(), e.getValue(), k < n ? sums[k] : 0.0);
        }
        for (int k = 0; k < n; k++) if (!floorAreas.containsKey(ids[k])) sameArea(ids[k], 0.0, sums[k]);
    }

    /** Where {@code id} is among the first {@code n} of {@code ids}, or {@code n}. */
    private static int slot(String[] ids, int n, String id) {
        int k = 0;
        while (k < n && !ids[k].equals(id)) k++;
        return k;
    }

    private static void sameArea(String id, double carried, double given) {
        if (Math.abs(carried - given) > Tolerances.SAME_AREA * Math.max(1, Math.max(carried, given)))
            throw new com.baysheet.engine.InputError("floors", id + " " + given, "the floors listed must add up to the floor area of "
                    + id + " the member carries (" + carried + ")");
    }

    /** The uniform snow load (psf or kN/m²) on every strip of the member: a line load of pressure × width. */
    void snowOnStrips(double pressure) {
        for (AreaStrip s : in.strips()) snow.distributed(pressure * s.width(), s.from(), s.to());
    }

    boolean isRoofSource(String source) {
        return ctx.catalogue().get(occupancyOf(source)).isRoof();
    }

    static String occupancyOf(String source) {
        int k = source.indexOf('#');
        return k < 0 ? source : source.substring(0, k);
    }

    /**
     * The sum of each source's loads times its multiplier, for floor or roof sources; {@code factors} by source in the
     * order of {@link #live} (null: each 1).
     */
    BeamLoads combined(double[] factors, boolean roof) {
        if (factors != null && factors.length != live.size()) throw new IllegalStateException("a factor for each of " + live.keySet());
        BeamLoads out = new BeamLoads();
        int i = 0;
        for (BeamLoads l : live.values()) {
            if (roofSource[i] == roof) out.add(l, factors == null ? 1 : factors[i]);
            i++;
        }
        return out;
    }

    private static String floorField(int floor, int area) { return "floors[" + floor + "].areas[" + area + "].occupancy"; }

    private Occupancy occupancy(String field, String id) {
        if (!ctx.catalogue().contains(id))
            throw new com.baysheet.engine.InputError(field, id, "is not in the occupancy catalogue");
        return ctx.catalogue().get(id);
    }

    private boolean partitioned(Occupancy o) {
        return ctx.options().partitionAllowance() && !o.isRoof() && !o.isBalcony() && !PartitionAllowance.waived(ctx, o);
    }

    private double partition() { return ctx.constant("partition"); }

    /** Whether each source of {@link #live}, in its order, is a roof source (read once, when the source is first met). */
    private boolean[] roofSource = new boolean[4];

    private BeamLoads source(String key) {
        BeamLoads l = live.get(key);
        if (l == null) {
            if (live.size() == roofSource.length) roofSource = java.util.Arrays.copyOf(roofSource, roofSource.length * 2);
            roofSource[live.size()] = isRoofSource(key);
            live.put(key, l = new BeamLoads());
        }
        return l;
    }

    private void area(Occupancy o, double a, double centroid) {
        (o.isRoof() ? roofAreas : floorAreas).merge(o.id(), a, Double::sum);
        double toRight = 0;
        if (in.support() instanceof com.baysheet.engine.load.Support.Simple
                || in.support() instanceof com.baysheet.engine.load.Support.Overhang) {
            toRight = Math.min(1, centroid / in.support().span());
        }
        if (toRight < 1) leftAreas.merge(o.id(), a * (1 - toRight), Double::sum);
        if (toRight > 0) rightAreas.merge(o.id(), a * toRight, Double::sum);
    }
}
