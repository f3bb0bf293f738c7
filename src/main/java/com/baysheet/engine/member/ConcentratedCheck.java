package com.baysheet.engine.member;

import com.baysheet.engine.Tolerances;
import com.baysheet.engine.beam.BeamActions;
import com.baysheet.engine.beam.BeamLoads;
import com.baysheet.engine.beam.BeamSolver;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.CalcContext;

import java.util.Collection;

/**
 * Places a concentrated load, spread over its contact length, along a member for the largest effect
 * (ASCE 7-16 4.4). Where statics gives the worst position outright it is used (one solve): every effect on a simple
 * span and a cantilever, and on an overhanging beam wherever the patch fits the span it acts on; otherwise a bounded
 * scan of positions, then a golden-section refinement around the best one.
 *
 * <p>Floor and roof concentrated loads are checked apart: a floor occupancy's load against the reduced
 * floor load L, a roof row's (Table 4.3-1, roofs subject to maintenance workers) against the roof live load Lr,
 * each never added to the uniform load it is compared with, and each staying in its own load combination slot.
 */
final class ConcentratedCheck {
    private ConcentratedCheck() {}

    /** Coarse positions scanned along the member. */
    static final int SCAN_POSITIONS = 41;
    /** Golden-section steps around the best coarse position (they stop early at {@link Tolerances#LOAD_POSITION}). */
    static final int REFINE_STEPS = 40;

    enum Effect { MAX_MOMENT, MIN_MOMENT, SHEAR, LEFT_REACTION, RIGHT_REACTION }

    /** Record keys of one check: the floor check against L, or the roof check against Lr. */
    record Keys(String load, String step, String governs, String design, String concentrated, String live) {}

    static final Keys FLOOR = new Keys("P_c", "Lc", "gov", "Ldes", "concentrated load", "live load");
    static final Keys ROOF = new Keys("P_c,r", "Lrc", "Lrgov", "Lrdes", "concentrated roof load", "roof live load");

    /** The occupancy with the largest concentrated load among {@code ids}, or null where none has one. */
    static Occupancy largest(CalcContext ctx, Collection<String> ids) {
        Occupancy worst = null;
        for (String id : ids) {
            Occupancy o = ctx.catalogue().get(id);
            if (o.concentrated(ctx.system()) > 0 && (worst == null || o.concentrated(ctx.system()) > worst.concentrated(ctx.system())))
                worst = o;
        }
        return worst;
    }

    /** The largest effect (signed for moments) and the centre position of the load that gives it. */
    record Placement(double effect, double at) {}

    static Placement place(Support support, double load, double side, Effect effect) {
        double length = support.length();
        double patch = Math.min(side, length);
        double lo = patch / 2, hi = length - patch / 2;
        if (hi - lo <= Tolerances.LOAD_POSITION * length) return new Placement(value(support, load, patch, lo, effect), lo);
        double known = worstPosition(support, lo, hi, effect);
        if (!Double.isNaN(known)) return new Placement(value(support, load, patch, known, effect), known);
        return scan(support, load, patch, lo, hi, effect);
    }

    /**
     * The centre position of the worst placement where statics fixes it, NaN where it must be searched.
     * Reactions are linear in the position (R_A = P(ℓ − x)/ℓ, R_B = Px/ℓ), so they peak at an end of the range.
     * On a simple span the largest shear is the larger reaction and the largest moment, concave in x and
     * symmetric, peaks with the load centred (Pℓ/4 − Pc/8). On a cantilever the shear is P wherever the load
     * is, and the fixed-end moment −Px peaks at the free end. Ties keep the first position, as the scan does.
     *
     * <p>A beam overhanging its right support (back span ℓ, overhang a, patch c): load on the overhang only bends
     * the back span the other way, so the largest sagging moment is the simple span's, the patch centred on the back
     * span (where it fits there, c ≤ ℓ). The hogging moment at the support, −(P/c)∫(s − ℓ) over the patch's part on
     * the overhang, is largest with the patch against the tip, wherever c falls; no section is more hogged than the
     * support. With the patch wholly on the overhang (c ≤ a) the shear beside the support is P wherever it stands,
     * and the back span's, R_A = P(x − ℓ)/ℓ, grows towards the tip; a patch reaching into the back span gives less
     * than P on either side (where c ≤ ℓ as well): so the tip. Other overhangs (a patch longer than the overhang or the
     * back span) are scanned.
     */
    static double worstPosition(Support s, double lo, double hi, Effect e) {
        if (e == Effect.LEFT_REACTION) return lo;
        if (e == Effect.RIGHT_REACTION) return s instanceof Support.Cantilever ? lo : hi;
        if (s instanceof Support.Simple) return e == Effect.MAX_MOMENT ? (lo + hi) / 2 : lo;
        if (s instanceof Support.Cantilever) return e == Effect.MIN_MOMENT ? hi : lo;
        if (s instanceof Support.Overhang o) {
            double patch = 2 * lo; // lo is half the patch
            if (e == Effect.MIN_MOMENT) return hi;
            if (e == Effect.MAX_MOMENT && patch <= o.span()) return o.span() / 2;
            if (e == Effect.SHEAR && patch <= o.overhang() && patch <= o.span()) return hi;
        }
        return Double.NaN;
    }

    private static Placement scan(Support support, double load, double patch, double lo, double hi, Effect effect) {
        double length = support.length();
        double step = (hi - lo) / (SCAN_POSITIONS - 1);
        double bestAt = lo, best = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < SCAN_POSITIONS; i++) {
            double x = lo + i * step;
            double v = score(support, load, patch, x, effect);
            if (v > best) { best = v; bestAt = x; }
        }
        double a = Math.max(lo, bestAt - step), b = Math.min(hi, bestAt + step);
        double g = (Math.sqrt(5) - 1) / 2;
        double c = b - g * (b - a), d = a + g * (b - a);
        double fc = score(support, load, patch, c, effect), fd = score(support, load, patch, d, effect);
        for (int i = 0; i < REFINE_STEPS && b - a > Tolerances.LOAD_POSITION * length; i++) {
            if (fc >= fd) { b = d; d = c; fd = fc; c = b - g * (b - a); fc = score(support, load, patch, c, effect); }
            else { a = c; c = d; fc = fd; d = a + g * (b - a); fd = score(support, load, patch, d, effect); }
        }
        double x = fc >= fd ? c : d;
        double fx = Math.max(fc, fd);
        if (fx < best) x = bestAt;
        return new Placement(value(support, load, patch, x, effect), x);
    }

    /** The quantity maximised: moments by sign, shear and reactions by magnitude. */
    private static double score(Support s, double load, double patch, double x, Effect e) {
        double v = value(s, load, patch, x, e);
        return e == Effect.MIN_MOMENT ? -v : Math.abs(v);
    }

    static double value(Support s, double load, double patch, double x, Effect e) {
        BeamLoads l = new BeamLoads().distributed(load / patch, x - patch / 2, x + patch / 2);
        BeamActions a = BeamSolver.solve(s, l, Double.NaN);
        return switch (e) {
            case MAX_MOMENT -> a.maxMoment();
            case MIN_MOMENT -> a.minMoment();
            case SHEAR -> a.maxShear();
            case LEFT_REACTION -> a.left();
            case RIGHT_REACTION -> a.right();
        };
    }
}
