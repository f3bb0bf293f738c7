package com.baysheet.engine.member;

import com.baysheet.engine.beam.BeamLoads;
import com.baysheet.engine.code.Edition;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.record.Sketch;
import com.baysheet.engine.snow.DriftStrip;
import com.baysheet.engine.snow.DriftSurcharge;
import com.baysheet.engine.units.Quantity;

/**
 * Puts a drift surcharge (ASCE 7-16 7.7.1) on a member's strips as line loads, each step on the record:
 * a strip parallel to the step carries the surcharge integrated across its band, uniform along the member; a strip
 * running away from the step carries width × the surcharge at its distance, a triangle or trapezoid, put on the member
 * as {@link #PIECES} uniform pieces, each carrying the exact integral of the surcharge over its length (so the
 * drift's resultant is exact; the solver takes uniform loads only).
 */
final class MemberDrift {
    /** Uniform pieces a sloping drift load is cut into along a member. */
    static final int PIECES = 24;

    private MemberDrift() {}

    /** Adds the strip's drift to {@code snow}; returns the load added (lb or kN). */
    static double strip(Edition ed, DriftSurcharge step, DriftStrip s, String label, RecordBuilder rec, BeamLoads snow,
                        java.util.List<Sketch.Drift> sketch) {
        Clause c = ed.clause("snow.driftShape");
        DriftSurcharge d = s.on(step);   // cut off where the lower roof ends across this strip (past a wall's end: its own depth)
        double ext = d.extent();
        String cut = ext == step.extent() ? "" : "; the lower roof across this strip ends " + rec.show(d.lowerLength(), Quantity.LENGTH)
                + " from the step's line, so the drift here is cut off at " + rec.show(ext, Quantity.LENGTH) + " (min(w, that depth))";
        if (s.parallel()) {
            double a = s.nearFrom(), b = s.nearFrom() + s.width();
            double w = d.over(a, b);
            if (w <= 0) return 0;
            snow.distributed(w, s.from(), s.to());
            sketch.add(new Sketch.Drift(s.from(), s.to(), w, w));
            rec.step("w_S,drift" + label, "Drift surcharge on the strip " + rec.show(Math.max(0, a), Quantity.LENGTH) + " to "
                            + rec.show(Math.min(b, ext), Quantity.LENGTH) + " from the step (parallel to it), uniform along the member from x = "
                            + rec.show(s.from(), Quantity.LENGTH) + " to " + rec.show(s.to(), Quantity.LENGTH) + cut,
                    "w = (p(d₁) + p(d₂)) / 2 × (d₂ − d₁), p(d) = p_d (1 − d / w)",
                    "(" + rec.num(d.at(Math.max(0, a)), Quantity.PRESSURE) + " + " + rec.num(d.at(Math.min(b, ext)), Quantity.PRESSURE) + ") / 2 × "
                            + rec.num(Math.min(b, ext) - Math.max(0, a), Quantity.LENGTH), w, Quantity.LINE_LOAD, c);
            return w * s.length();
        }
        // the stretch of the member within the drift: d from 0 to the extent
        double k = (s.nearTo() - s.nearFrom()) / s.length();
        double t0 = s.from() + (0 - s.nearFrom()) / k, t1 = s.from() + (ext - s.nearFrom()) / k;
        double lo = Math.max(s.from(), Math.min(t0, t1)), hi = Math.min(s.to(), Math.max(t0, t1));
        if (hi <= lo) return 0;
        double total = 0, h = (hi - lo) / PIECES;
        for (int i = 0; i < PIECES; i++) {
            double ta = lo + i * h, tb = i == PIECES - 1 ? hi : ta + h;
            double load = s.width() * d.over(s.nearFrom() + k * (ta - s.from()), s.nearFrom() + k * (tb - s.from()));
            snow.distributed(load / (tb - ta), ta, tb);
            total += load;
        }
        double dLo = s.nearFrom() + k * (lo - s.from()), dHi = s.nearFrom() + k * (hi - s.from());
        double wLo = s.width() * d.at(dLo), wHi = s.width() * d.at(dHi);
        sketch.add(new Sketch.Drift(lo, hi, wLo, wHi));
        rec.step("W_S,drift" + label, "Drift surcharge on a strip " + rec.show(s.width(), Quantity.LENGTH) + " wide running away from the step: "
                        + (Math.min(wLo, wHi) <= 0 ? "triangular" : "trapezoidal") + " load from " + rec.show(wLo, Quantity.LINE_LOAD) + " at x = "
                        + rec.show(lo, Quantity.LENGTH) + " to " + rec.show(wHi, Quantity.LINE_LOAD) + " at x = " + rec.show(hi, Quantity.LENGTH)
                        + ", put on the member as " + PIECES + " uniform pieces, each the surcharge integrated over its length" + cut,
                "W = b (p(d₁) + p(d₂)) / 2 × |d₂ − d₁|",
                rec.num(s.width(), Quantity.LENGTH) + " × (" + rec.num(d.at(dLo), Quantity.PRESSURE) + " + " + rec.num(d.at(dHi), Quantity.PRESSURE)
                        + ") / 2 × " + rec.num(hi - lo, Quantity.LENGTH), total, Quantity.FORCE, c);
        return total;
    }
}
