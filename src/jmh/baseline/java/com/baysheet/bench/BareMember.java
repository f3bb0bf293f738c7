package com.baysheet.bench;

/**
 * The engine's formulas for the one-member benchmark written inline with plain doubles: no record, no step
 * objects, no keys, no catalogue look-ups. It measures the arithmetic the engine's numbers pass cannot avoid, so
 * that the engine's figure can be given as a ratio to it. It covers exactly the benchmark's member (a simple span
 * under one uniform strip of one floor occupancy, no self weight, no snow, no roof) and nothing else;
 * {@code BareMemberTest} checks its numbers against the engine's, so that it cannot drift from what it claims to measure.
 */
public final class BareMember {
    private BareMember() {}

    /** The benchmark member: an interior office beam, 30 ft simple span, 10 ft strip, 65 psf dead. */
    public static final double SPAN = 30, WIDTH = 10, DEAD = 65;

    /** The slots of {@link #calculate}'s output, by the engine's result key (step symbols for f and L). */
    public static final String[] KEYS = {
            "f", "L[office]",
            "D.RA", "D.RB", "D.V", "D.M+", "L0.RA", "L0.RB", "L0.V", "L0.M+", "L.RA", "L.RB", "L.V", "L.M+",
            "Lc.RA", "Lc.RB", "Lc.V", "Lc.M+", "Ldes.RA", "Ldes.RB", "Ldes.V", "Ldes.M+",
            "LRFD.RA", "LRFD.RB", "LRFD.V", "LRFD.M+", "ASD.RA", "ASD.RB", "ASD.V", "ASD.M+"};
    public static final int SLOTS = KEYS.length;

    /**
     * The member's numbers into {@code out} (slots as {@link #KEYS}). {@code l0}, {@code kll}, {@code p} and
     * {@code side} are the occupancy's and the edition's values (read once, as data), the rest the member's.
     */
    public static void calculate(double span, double width, double dead, double l0, double kll, double p, double side,
                                 double threshold, double limit, double[] out) {
        // ASCE 7-16 4.7.2, Eq. 4.7-1: reduction where K_LL·A_T ≥ 400 ft², not below 0.50 for one floor
        double at = width * span, kat = kll * at;
        double f = kat >= threshold ? Math.max(Math.min(1, 0.25 + 15 / Math.sqrt(kat)), limit) : 1;
        double wd = dead * width, wl0 = l0 * width, wl = wl0 * f;
        out[0] = f;
        out[1] = l0 * f;
        // simple span, uniform load: R = V = wℓ/2, M+ = wℓ²/8
        effects(wd, span, out, 2);
        effects(wl0, span, out, 6);
        effects(wl, span, out, 10);
        // ASCE 7-16 4.4: P on a side × side patch; reactions and shear with the patch at a support, M+ centred
        double c = Math.min(side, span);
        double r = p * (span - c / 2) / span;
        out[14] = r;
        out[15] = r;
        out[16] = r;
        out[17] = p * span / 4 - p * c / 8;
        for (int i = 0; i < 4; i++) {
            double l = out[10 + i], lc = out[14 + i];
            double design = Math.abs(lc) > Math.abs(l) ? lc : l;
            out[18 + i] = design;
            double d = out[2 + i];
            // ASCE 7-16 2.3.1 (0.5 L in combination 3 by Exception 1: L0 ≤ 100 psf, an office) and 2.4.1, no roof load
            double u = 1.4 * d;
            u = Math.max(u, 1.2 * d + 1.6 * design);
            u = Math.max(u, 1.2 * d + 0.5 * design);
            double a = d;
            a = Math.max(a, d + design);
            a = Math.max(a, d + 0.75 * design);
            out[22 + i] = u;
            out[26 + i] = a;
        }
    }

    private static void effects(double w, double span, double[] out, int at) {
        double r = w * span / 2;
        out[at] = r;
        out[at + 1] = r;
        out[at + 2] = r;
        out[at + 3] = w * span * span / 8;
    }
}
