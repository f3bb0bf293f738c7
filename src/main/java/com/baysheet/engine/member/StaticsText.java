package com.baysheet.engine.member;

import com.baysheet.engine.Tolerances;
import com.baysheet.engine.beam.BeamLoads;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.Unit;
import com.baysheet.engine.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * The substituted values of the statics steps, written from the very loads the solver was given (so the text
 * cannot disagree with the result): the total load as a sum, a simple span under one uniform load by its
 * closed forms (R = wℓ/2, V = wℓ/2, M = wℓ²/8), any other two-support member's reactions by the sum of
 * moments about the other support, a cantilever's reaction and fixed-end moment by the sums. Numbers are in
 * the sheet's force and length units (w in kip/ft or kN/m, ℓ and x in ft or m, P in kip or kN), three
 * significant figures; loads over the same stretch (an occupancy and its partition allowance) are added first.
 */
final class StaticsText {
    private StaticsText() {}

    /** One load as written: a uniform load w over [a, b], or a point load P at a = b. */
    private record Part(boolean point, double w, double a, double b) {
        double load() { return point ? w : w * (b - a); }
        double centroid() { return (a + b) / 2; }
    }

    static String total(RecordBuilder rec, BeamLoads loads) {
        if (!rec.writesText()) return "";
        List<Part> parts = parts(loads);
        if (parts.isEmpty()) return "0";
        List<String> terms = new ArrayList<>();
        for (Part p : parts) terms.add(p.point ? force(rec, p.w) : line(rec, p.w) + " × " + length(rec, p.b - p.a));
        return String.join(" + ", terms);
    }

    /** Whether a simple span carries one uniform load over its whole length and nothing else. */
    static boolean simpleUniform(Support s, BeamLoads loads) {
        if (!(s instanceof Support.Simple)) return false;
        List<Part> parts = parts(loads);
        if (parts.size() != 1 || parts.get(0).point) return false;
        double tol = Tolerances.FULL_SPAN * s.span();
        return Math.abs(parts.get(0).a) <= tol && Math.abs(parts.get(0).b - s.span()) <= tol;
    }

    /** R = wℓ/2, V = wℓ/2 or M = wℓ²/8 with the numbers, for a {@link #simpleUniform} member. */
    static String closedForm(RecordBuilder rec, BendingActions.Effect e, Support s, BeamLoads loads) {
        if (!rec.writesText()) return "";
        Part p = parts(loads).get(0);
        String w = line(rec, p.w), l = length(rec, s.span());
        return e == BendingActions.Effect.MPOS ? w + " × " + l + "² / 8" : w + " × " + l + " / 2";
    }

    /**
     * A reaction by the sum of moments about the other support: R_A = Σ load × (ℓ − x) / ℓ, R_B = Σ load × x / ℓ,
     * x the centroid of each load from A; a cantilever's reaction is the total load.
     */
    static String reaction(RecordBuilder rec, BendingActions.Effect e, Support s, BeamLoads loads) {
        if (!rec.writesText()) return "";
        if (s instanceof Support.Cantilever) return total(rec, loads);
        List<Part> parts = parts(loads);
        if (parts.isEmpty()) return "0";
        List<String> terms = new ArrayList<>();
        for (Part p : parts) {
            double arm = e == BendingActions.Effect.RA ? s.span() - p.centroid() : p.centroid();
            terms.add(load(rec, p) + " × " + signed(length(rec, arm), arm));
        }
        return "(" + String.join(" + ", terms) + ") / " + length(rec, s.span());
    }

    /** A cantilever's fixed-end moment, −Σ load × x with x from the fixed end. */
    static String fixedMoment(RecordBuilder rec, BeamLoads loads) {
        if (!rec.writesText()) return "";
        List<String> terms = new ArrayList<>();
        for (Part p : parts(loads)) terms.add(load(rec, p) + " × " + length(rec, p.centroid()));
        return terms.isEmpty() ? "0" : "−(" + String.join(" + ", terms) + ")";
    }

    private static String load(RecordBuilder rec, Part p) {
        return p.point ? force(rec, p.w) : line(rec, p.w) + " × " + length(rec, p.b - p.a);
    }

    /** The loads, those over the same stretch or at the same point added together, in the order given. */
    private static List<Part> parts(BeamLoads loads) {
        List<Part> out = new ArrayList<>();
        for (int i = 0; i < loads.distributedCount(); i++) add(out, new Part(false, loads.w(i), loads.a(i), loads.b(i)));
        for (int i = 0; i < loads.pointCount(); i++) add(out, new Part(true, loads.p(i), loads.x(i), loads.x(i)));
        return out;
    }

    private static void add(List<Part> out, Part p) {
        for (int k = 0; k < out.size(); k++) {
            Part q = out.get(k);
            if (q.point == p.point && q.a == p.a && q.b == p.b) { out.set(k, new Part(p.point, q.w + p.w, p.a, p.b)); return; }
        }
        out.add(p);
    }

    private static String line(RecordBuilder rec, double w) {
        Unit u = rec.system() == UnitSystem.US ? Unit.KLF : Unit.KN_PER_M;
        return signed(Display.sig3(u.fromBase(w)), w);
    }

    private static String force(RecordBuilder rec, double p) { return signed(rec.num(p, Quantity.FORCE), p); }

    private static String length(RecordBuilder rec, double x) { return rec.num(x, Quantity.LENGTH); }

    private static String signed(String shown, double v) { return v < 0 ? "(" + shown + ")" : shown; }
}
