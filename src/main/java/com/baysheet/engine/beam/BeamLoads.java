package com.baysheet.engine.beam;

import java.util.Arrays;

/**
 * Downward loads on a member, kept as flat arrays because the concentrated-load scan solves thousands of
 * load sets: distributed loads {@code w} over [a, b] and point loads {@code p} at {@code x}.
 */
public final class BeamLoads {
    private double[] w = new double[4], a = new double[4], b = new double[4];
    private double[] p = new double[4], x = new double[4];
    private int nd, np;

    public BeamLoads distributed(double intensity, double from, double to) {
        if (intensity == 0 || to <= from) return this;
        if (nd == w.length) { w = grow(w); a = grow(a); b = grow(b); }
        w[nd] = intensity; a[nd] = from; b[nd] = to; nd++;
        return this;
    }

    public BeamLoads point(double load, double at) {
        if (load == 0) return this;
        if (np == p.length) { p = grow(p); x = grow(x); }
        p[np] = load; x[np] = at; np++;
        return this;
    }

    /** Adds {@code factor} times the loads of {@code other}. */
    public BeamLoads add(BeamLoads other, double factor) {
        for (int i = 0; i < other.nd; i++) distributed(other.w[i] * factor, other.a[i], other.b[i]);
        for (int i = 0; i < other.np; i++) point(other.p[i] * factor, other.x[i]);
        return this;
    }

    /** The part of these loads lying in [from, to]: distributed loads are cut, point loads kept by position. */
    public BeamLoads within(double from, double to) {
        BeamLoads out = new BeamLoads();
        for (int i = 0; i < nd; i++) out.distributed(w[i], Math.max(a[i], from), Math.min(b[i], to));
        for (int i = 0; i < np; i++) if (x[i] >= from && x[i] <= to) out.point(p[i], x[i]);
        return out;
    }

    public double total() {
        double s = 0;
        for (int i = 0; i < nd; i++) s += w[i] * (b[i] - a[i]);
        for (int i = 0; i < np; i++) s += p[i];
        return s;
    }

    /** First moment of the loads about x = 0. */
    public double momentAboutStart() {
        double s = 0;
        for (int i = 0; i < nd; i++) s += w[i] * (b[i] - a[i]) * (a[i] + b[i]) / 2;
        for (int i = 0; i < np; i++) s += p[i] * x[i];
        return s;
    }

    public boolean isEmpty() { return nd == 0 && np == 0; }

    public int distributedCount() { return nd; }
    public int pointCount() { return np; }
    public double w(int i) { return w[i]; }
    public double a(int i) { return a[i]; }
    public double b(int i) { return b[i]; }
    public double p(int i) { return p[i]; }
    public double x(int i) { return x[i]; }

    private static double[] grow(double[] v) { return Arrays.copyOf(v, v.length * 2); }
}
