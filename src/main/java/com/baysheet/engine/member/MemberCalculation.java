package com.baysheet.engine.member;

import com.baysheet.engine.beam.BeamActions;
import com.baysheet.engine.beam.BeamLoads;
import com.baysheet.engine.beam.BeamSolver;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.LiveShare;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.reduction.LiveFactors;
import com.baysheet.engine.reduction.ReductionMethods;
import com.baysheet.engine.reduction.RoofLiveLoad;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * One member, from its input to its calculation record: live loads from the catalogue, the floor
 * reduction and roof live load, the roof snow load S, the member actions for D, L, Lr and S, the concentrated-load check, and the
 * gravity load combinations. The entry point of the engine.
 */
public final class MemberCalculation {
    private MemberCalculation() {}

    /** Validates the input and calculates the member; the record's text is written when first read. */
    public static MemberResult calculate(CalcContext ctx, MemberInput in) {
        RecordBuilder rec = RecordBuilder.numbersOnly(in.subject(), ctx.edition().id(), ctx.system());
        Outcome o = run(ctx, in, rec);
        return new MemberResult(rec.numbers(), o.left, o.right, o.reduction, () -> {
                    RecordBuilder text = new RecordBuilder(in.subject(), ctx.edition().id(), ctx.system());
                    run(ctx, in, text);
                    return text.build();
                }, () -> MethodComparison.of(ctx, in));
    }

    private record Outcome(EndShare left, EndShare right, LiveFactors reduction) {}

    /** Runs the calculation into {@code rec}; the end shares only in the numbers pass (null when writing text). */
    private static Outcome run(CalcContext ctx, MemberInput in, RecordBuilder rec) {
        LoadBook book = LoadBook.of(ctx, in);
        Inputs.record(ctx, in, book, rec);
        OwnWeight.record(ctx, in, rec);
        boolean snow = MemberSnow.record(ctx, in, book, rec);
        OpenToSky.record(ctx, in, rec);
        LiveFactors[] reduction = new LiveFactors[1];
        double[] factors = factors(ctx, in, book, rec, reduction);
        BeamLoads floor0 = book.combined(null, false), floor = book.combined(factors, false);
        BeamLoads roof0 = book.combined(null, true), roof = book.combined(factors, true);
        boolean halfL = halfLAllowed(ctx, book);
        if (in.kind().isColumn()) AxialActions.record(ctx, in, book, floor0, floor, roof0, roof, halfL, snow, rec);
        else BendingActions.record(ctx, in, book, floor0, floor, roof0, roof, halfL, snow, rec);
        if (rec.writesText()) { // the sketch and the notes are for reading
            rec.sketch(Sketches.of(in.support(), book.dead, new BeamLoads().add(floor, 1).add(roof, 1), book.driftSketch));
            BalconyNote.record(ctx, book, rec);
            Cautions.standard(ctx, book, rec);
        }
        if (rec.writesText()) return null; // the end shares and the reduction are the numbers pass's, already kept
        return new Outcome(share(ctx, in, book, true), in.kind().isColumn()
                || in.support() instanceof Support.Cantilever ? null : share(ctx, in, book, false), reduction[0]);
    }

    /**
     * Multipliers on every live source, in the order of {@code book.live}: floor reduction for floor sources, Lr/L0 for
     * roof sources, 1 for the rest (a line load's live, never reduced, or a partition share handed down with the option now off).
     */
    private static double[] factors(CalcContext ctx, MemberInput in, LoadBook book, RecordBuilder rec, LiveFactors[] reduction) {
        Map<String, Double> floor = Map.of(), roofs = Map.of();
        if (!book.floorAreas.isEmpty()) {
            if (in.onRoof())
                rec.info("Occupiable roof: its live load follows the floor rules.", ctx.edition().clause("roof.occupiable"));
            LiveFactors lf = ReductionMethods.of(ctx).reduce(ctx, in.kind(), book.floorAreas, in.floors(),
                    in.floorsSupported(), in.support().span(), book.supportedDead, rec);
            floor = lf.bySource();
            reduction[0] = lf;
            if (!in.kind().isColumn() && carriesDeliveredArea(in))
                rec.info("A_T includes the tributary areas delivered by the members this one carries, each counted once, "
                        + "and its live load is reduced with its own " + (ctx.floorMethod() == null ? "K_LL·A_T" : "tributary area")
                        + ", not taken from their reduced reactions (common practice).", ctx.edition().clause("reduction.basic"));
        }
        if (!book.roofAreas.isEmpty()) {
            // A_T of 4.8.2 is the ordinary roof area: other roof rows are not reduced and must not lower R1
            // (as the reducible area of mixed floors, common practice)
            double area = 0;
            for (var e : book.roofAreas.entrySet())
                if (RoofLiveLoad.isOrdinary(ctx, ctx.catalogue().get(e.getKey()))) area += e.getValue();
            if (area > 0 && book.roofAreas.size() > 1 && area < book.roofAreas.values().stream().mapToDouble(Double::doubleValue).sum())
                rec.info("Mixed roof: R1 comes from the ordinary roof area only; the other roof loads are added unreduced "
                        + "(common practice, no code clause).", ctx.edition().clause("roof.reduction"));
            roofs = new HashMap<>();
            for (String id : book.roofAreas.keySet()) {
                Occupancy o = ctx.catalogue().get(id);
                roofs.put(id, RoofLiveLoad.factor(ctx, o, area, in.roofSlope(), rec));
            }
        }
        double[] f = new double[book.live.size()];
        int i = 0;
        for (String source : book.live.keySet()) {
            Double v = roofs.get(source);
            if (v == null) v = floor.get(source);
            f[i++] = v == null ? 1 : v;
        }
        return f;
    }

    /** A girder's point loads (the beams it carries) bring their tributary areas with them. */
    private static boolean carriesDeliveredArea(MemberInput in) {
        for (var p : in.pointLoads()) if (!p.areas().isEmpty()) return true;
        return false;
    }

    /** ASCE 7-16 2.3.1 Exception 1: 0.5 L where every L0 is at most 100 psf, except garages and assembly. */
    private static boolean halfLAllowed(CalcContext ctx, LoadBook book) {
        if (book.floorAreas.isEmpty()) return false;
        for (String id : book.floorAreas.keySet()) {
            Occupancy o = ctx.catalogue().get(id);
            if (o.uniform(ctx.system()) > ctx.constant("halfL.maxL0") || o.rule() == ReductionRule.GARAGE || o.assembly())
                return false;
        }
        return true;
    }

    /** The unreduced end share handed to the carrying member, by the lever rule. */
    private static EndShare share(CalcContext ctx, MemberInput in, LoadBook book, boolean left) {
        Support s = in.support();
        double dead = end(s, book.dead, left);
        List<LiveShare> live = new ArrayList<>();
        for (Map.Entry<String, BeamLoads> e : book.live.entrySet()) {
            String src = e.getKey();
            live.add(LiveShare.ofSource(src, Math.max(0, end(s, e.getValue(), left))));
        }
        List<AreaShare> areas = new ArrayList<>();
        (left ? book.leftAreas : book.rightAreas).forEach((id, a) -> areas.add(new AreaShare(id, a)));
        return new EndShare(dead, live, areas, book.snow.isEmpty() ? 0 : Math.max(0, end(s, book.snow, left)));
    }

    private static double end(Support s, BeamLoads loads, boolean left) {
        double total = loads.total();
        if (s instanceof Support.Axial || s instanceof Support.Cantilever) return left ? total : 0;
        double right = loads.momentAboutStart() / s.span();
        return left ? total - right : right;
    }

    static BeamActions solve(Support s, BeamLoads l, double ei) { return BeamSolver.solve(s, l, ei); }
}
