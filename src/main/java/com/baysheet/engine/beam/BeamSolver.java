package com.baysheet.engine.beam;

import com.baysheet.engine.InputError;
import com.baysheet.engine.Tolerances;
import com.baysheet.engine.load.Support;

import java.util.Arrays;

/**
 * Statics of a statically determinate member (simple span, overhang, cantilever) under distributed and
 * point loads. Exact: between load changes the shear is linear and the moment quadratic, so extremes are
 * found at the changes or where the shear crosses zero. Deflection integrates M/EI exactly per segment
 * (quartic within a segment); its extreme is found where the slope vanishes, by bisection.
 */
public final class BeamSolver {
    private BeamSolver() {}

    /** Sub-intervals searched per segment for a zero slope, and bisection steps on each. */
    static final int SLOPE_SAMPLES = 8;
    static final int BISECTIONS = 60;

    public static BeamActions solve(Support support, BeamLoads loads, double stiffness) {
        if (support instanceof Support.Axial)
            throw new IllegalArgumentException("axial members have no bending actions");
        double length = support.length();
        boolean cantilever = support instanceof Support.Cantilever;
        double span = cantilever ? 0 : support.span();
        checkWithin(loads, length);

        double total = loads.total();
        double first = loads.momentAboutStart();
        double right = cantilever ? 0 : first / span;
        double left = cantilever ? total : total - right;
        double fixed = cantilever ? -first : 0;

        double[] xs = events(loads, length, span, cantilever);
        int n = xs.length;
        // state at the start of each segment, kept for the deflection pass (none without a stiffness)
        boolean deflect = !Double.isNaN(stiffness);
        double[] mStart = deflect ? new double[n] : null, vStart = deflect ? new double[n] : null, wSeg = deflect ? new double[n] : null;
        double v = 0, m = fixed;
        double maxV = 0, maxVAt = 0, maxM = Double.NEGATIVE_INFINITY, maxMAt = 0, minM = Double.POSITIVE_INFINITY, minMAt = 0;
        double tol = Tolerances.SAME_POSITION * length;
        for (int i = 0; i < n; i++) {
            double xi = xs[i];
            if (Math.abs(xi) <= tol) v += left;
            if (!cantilever && Math.abs(xi - span) <= tol) v += right;
            v -= pointsAt(loads, xi, tol);
            double w = intensityAfter(loads, xi, tol);
            if (Math.abs(v) > Math.abs(maxV)) { maxV = v; maxVAt = xi; }
            if (m > maxM) { maxM = m; maxMAt = xi; }
            if (m < minM) { minM = m; minMAt = xi; }
            if (deflect) { mStart[i] = m; vStart[i] = v; wSeg[i] = w; }
            if (i == n - 1) break;
            double s = xs[i + 1] - xi;
            if (w > 0 && v > 0 && v / w < s) {
                double t = v / w, mm = m + v * v / (2 * w);
                if (mm > maxM) { maxM = mm; maxMAt = xi + t; }
            } else if (w < 0 && v < 0 && v / w < s) {
                double t = v / w, mm = m + v * v / (2 * w);
                if (mm < minM) { minM = mm; minMAt = xi + t; }
            }
            m = m + v * s - w * s * s / 2;
            v = v - w * s;
            if (Math.abs(v) > Math.abs(maxV)) { maxV = v; maxVAt = xs[i + 1]; }
        }
        if (Math.abs(maxM) < Tolerances.ZERO_MOMENT * Math.max(1, Math.abs(total) * length)) maxM = 0;
        if (Math.abs(minM) < Tolerances.ZERO_MOMENT * Math.max(1, Math.abs(total) * length)) minM = 0;

        double dMax = Double.NaN, dAt = Double.NaN, tip = Double.NaN;
        if (deflect) {
            double[] d = deflection(xs, mStart, vStart, wSeg, span, cantilever, stiffness);
            dMax = d[0]; dAt = d[1]; tip = d[2];
        }
        return new BeamActions(left, right, fixed, maxV, maxVAt, maxM, maxMAt, minM, minMAt, dMax, dAt, tip);
    }

    private static void checkWithin(BeamLoads loads, double length) {
        double tol = Tolerances.SAME_POSITION * length;
        for (int i = 0; i < loads.pointCount(); i++)
            if (loads.x(i) < -tol || loads.x(i) > length + tol)
                throw new InputError("pointLoads[" + i + "].x", loads.x(i), "lies off the member (length " + length + ")");
        for (int i = 0; i < loads.distributedCount(); i++)
            if (loads.a(i) < -tol || loads.b(i) > length + tol)
                throw new InputError("distributed[" + i + "]", loads.a(i) + ".." + loads.b(i), "lies off the member (length " + length + ")");
    }

    private static double[] events(BeamLoads loads, double length, double span, boolean cantilever) {
        double[] xs = new double[3 + loads.pointCount() + 2 * loads.distributedCount()];
        int k = 0;
        xs[k++] = 0;
        xs[k++] = length;
        if (!cantilever) xs[k++] = span;
        for (int i = 0; i < loads.pointCount(); i++) xs[k++] = loads.x(i);
        for (int i = 0; i < loads.distributedCount(); i++) { xs[k++] = loads.a(i); xs[k++] = loads.b(i); }
        Arrays.sort(xs, 0, k);
        double tol = Tolerances.SAME_POSITION * length;
        int u = 0;
        for (int i = 0; i < k; i++) if (u == 0 || xs[i] - xs[u - 1] > tol) xs[u++] = xs[i];
        return Arrays.copyOf(xs, u);
    }

    private static double pointsAt(BeamLoads loads, double x, double tol) {
        double s = 0;
        for (int i = 0; i < loads.pointCount(); i++) if (Math.abs(loads.x(i) - x) <= tol) s += loads.p(i);
        return s;
    }

    private static double intensityAfter(BeamLoads loads, double x, double tol) {
        double s = 0;
        for (int i = 0; i < loads.distributedCount(); i++)
            if (loads.a(i) <= x + tol && loads.b(i) > x + tol) s += loads.w(i);
        return s;
    }

    /**
     * Integrates u'' = M/EI from x = 0 with u(0) = 0 and an unknown slope, fixed by u(span) = 0 for two
     * supports or u'(0) = 0 for a cantilever. Returns {max downward deflection, its position, tip deflection}.
     */
    private static double[] deflection(double[] xs, double[] m, double[] v, double[] w, double span,
                                       boolean cantilever, double ei) {
        int n = xs.length;
        double[] th = new double[n], u = new double[n];
        for (int i = 0; i + 1 < n; i++) {
            double s = xs[i + 1] - xs[i];
            th[i + 1] = th[i] + slopeGain(m[i], v[i], w[i], s) / ei;
            u[i + 1] = u[i] + th[i] * s + rise(m[i], v[i], w[i], s) / ei;
        }
        double theta0 = 0;
        if (!cantilever) {
            int j = indexOf(xs, span);
            theta0 = -u[j] / span;
        }
        double best = 0, bestAt = 0;
        for (int i = 0; i < n; i++) {
            double d = -(u[i] + theta0 * xs[i]);
            if (Math.abs(d) > Math.abs(best)) { best = d; bestAt = xs[i]; }
            if (i + 1 == n) break;
            double s = xs[i + 1] - xs[i], h = s / SLOPE_SAMPLES;
            for (int k = 0; k < SLOPE_SAMPLES; k++) {
                double t0 = k * h, t1 = t0 + h;
                double f0 = th[i] + theta0 + slopeGain(m[i], v[i], w[i], t0) / ei;
                double f1 = th[i] + theta0 + slopeGain(m[i], v[i], w[i], t1) / ei;
                if (f0 * f1 > 0) continue;
                for (int it = 0; it < BISECTIONS; it++) {
                    double tm = (t0 + t1) / 2;
                    double fm = th[i] + theta0 + slopeGain(m[i], v[i], w[i], tm) / ei;
                    if (f0 * fm <= 0) { t1 = tm; } else { t0 = tm; f0 = fm; }
                }
                double t = (t0 + t1) / 2;
                double dd = -(u[i] + th[i] * t + rise(m[i], v[i], w[i], t) / ei + theta0 * (xs[i] + t));
                if (Math.abs(dd) > Math.abs(best)) { best = dd; bestAt = xs[i] + t; }
            }
        }
        double tip = -(u[n - 1] + theta0 * xs[n - 1]);
        return new double[] {best, bestAt, tip};
    }

    private static double slopeGain(double m, double v, double w, double t) {
        return m * t + v * t * t / 2 - w * t * t * t / 6;
    }

    private static double rise(double m, double v, double w, double t) {
        return m * t * t / 2 + v * t * t * t / 6 - w * t * t * t * t / 24;
    }

    private static int indexOf(double[] xs, double x) {
        int best = 0;
        for (int i = 1; i < xs.length; i++) if (Math.abs(xs[i] - x) < Math.abs(xs[best] - x)) best = i;
        return best;
    }
}
