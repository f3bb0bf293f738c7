package com.baysheet.engine.beam;

import java.util.Arrays;

/**
 * Downward loads on a member, kept as flat arrays because the engine builds and solves many small load sets:
 * distributed loads {@code w} over [a, b] (three numbers each, in one array) and point loads {@code p} at {@code x}
 * (two each). The arrays are made on the first load of their kind and grow as needed: most sets hold one load.
 */
public final class BeamLoads {
    private static final double[] NONE = new double[0];
    /** w, a, b of each distributed load; p, x of each point load. */
    private double[] d = NONE, pt = NONE;
    private int nd, np;

    public BeamLoads distributed(double intensity, double from, double to) {
        if (intensity == 0 || to <= from) return this;
        if (3 * nd == d.length) d = Arrays.copyOf(d, Math.max(3, 2 * d.length));
        int k = 3 * nd++;
        d[k] = intensity; d[k + 1] = from; d[k + 2] = to;
        return this;
    }

    public BeamLoads point(double load, double at) {
        if (load == 0) return this;
        if (2 * np == pt.length) pt = Arrays.copyOf(pt, Math.max(2, 2 * pt.length));
        int k = 2 * np++;
        pt[k] = load; pt[k + 1] = at;
        return this;
    }

    /** Adds {@code factor} times the loads of {@code other}. */
    public BeamLoads add(BeamLoads other, double factor) {
        for (int i = 0; i < other.nd; i++) distributed(other.w(i) * factor, other.a(i), other.b(i));
        for (int i = 0; i < other.np; i++) point(other.p(i) * factor, other.x(i));
        return this;
    }

    /** The part of these loads lying in [from, to]: distributed loads are cut, point loads kept by position. */
    public BeamLoads within(double from, double to) {
        BeamLoads out = new BeamLoads();
        for (int i = 0; i < nd; i++) out.distributed(w(i), Math.max(a(i), from), Math.min(b(i), to));
        for (int i = 0; i < np; i++) if (x(i) >= from && x(i) <= to) out.point(p(i), x(i));
        return out;
    }

    public double total() {
        double s = 0;
        for (int i = 0; i < nd; i++) s += w(i) * (b(i) - a(i));
        for (int i = 0; i < np; i++) s += p(i);
        return s;
    }

    /** First moment of the loads about x = 0. */
    public double momentAboutStart() {
        double s = 0;
        for (int i = 0; i < nd; i++) s += w(i) * (b(i) - a(i)) * (a(i) + b(i)) / 2;
        for (int i = 0; i < np; i++) s += p(i) * x(i);
        return s;
    }

    public boolean isEmpty() { return nd == 0 && np == 0; }

    public int distributedCount() { return nd; }
    public int pointCount() { return np; }
    public double w(int i) { return d[3 * i]; }
    public double a(int i) { return d[3 * i + 1]; }
    public double b(int i) { return d[3 * i + 2]; }
    public double p(int i) { return pt[2 * i]; }
    public double x(int i) { return pt[2 * i + 1]; }
}
