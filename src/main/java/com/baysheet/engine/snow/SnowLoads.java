package com.baysheet.engine.snow;

/**
 * The roof snow loads of one roof, in psf (US) or kN/m² (SI). Three separate load cases:
 * <ul>
 *   <li>balanced: {@link #balanced} = p_s plus the rain-on-snow surcharge where it applies;</li>
 *   <li>minimum: {@link #minimum} p_m on low-slope roofs, a uniform case on its own, never combined with drifts
 *       (0 with {@code minimumApplies} false on steeper roofs);</li>
 *   <li>drift: p_s plus the {@link #drift} surcharge (no rain-on-snow with it).</li>
 * </ul>
 *
 * @param slopeDeg the roof slope in degrees
 */
public record SnowLoads(double flat, double slopeDeg, double slopeFactor, double sloped, double rainOnSnow,
                        double balanced, double minimum, boolean minimumApplies, DriftSurcharge drift) {
    public SnowLoads {
        for (double v : new double[]{flat, slopeDeg, slopeFactor, sloped, rainOnSnow, balanced, minimum})
            if (!Double.isFinite(v) || v < 0) throw new IllegalArgumentException("snow loads must be finite and not negative");
        if (drift == null) drift = DriftSurcharge.NONE;
    }

    /** The larger uniform case, balanced or minimum, for a member where drifts do not reach. */
    public double uniform() { return Math.max(balanced, minimum); }

    /** The drift case at distance x from the step: p_s plus the surcharge there. */
    public double driftCaseAt(double x) { return sloped + drift.at(x); }
}
