package com.baysheet.engine.snow;

/**
 * A drift surcharge on a lower roof, on top of the balanced snow load p_s: triangular, {@code peak} = h_d γ at
 * the step, falling linearly to 0 at {@code width} w from it, and cut off (not brought to 0) at the far edge of
 * the lower roof where w is longer. Project base units: psf, ft, pcf (US) or kN/m², m, kN/m³ (SI).
 * {@link #NONE} where there is no step or the code needs no drift.
 *
 * @param windward true where the windward drift governs the height
 */
public record DriftSurcharge(boolean required, double density, double balancedHeight, double clearHeight,
                             double height, double width, double peak, double lowerLength, boolean windward) {
    public static final DriftSurcharge NONE = new DriftSurcharge(false, 0, 0, 0, 0, 0, 0, 0, false);

    public DriftSurcharge {
        for (double v : new double[]{density, balancedHeight, height, width, peak, lowerLength})
            if (!Double.isFinite(v) || v < 0) throw new IllegalArgumentException("drift values must be finite and not negative");
        if (required && width <= 0) throw new IllegalArgumentException("a required drift has a width");
    }

    /**
     * The same drift (h_d, w, p_d) cut off at {@code edge} from the step instead of at the step's lower roof length:
     * where the lower roof has another depth across the step's line than at the wall (past a free end of the wall).
     */
    public DriftSurcharge cutAt(double edge) {
        if (!(edge > 0) || !Double.isFinite(edge)) throw new IllegalArgumentException("the lower roof's edge lies a finite distance past the step");
        return new DriftSurcharge(required, density, balancedHeight, clearHeight, height, width, peak, edge, windward);
    }

    /** Distance from the step over which the surcharge acts: w, or the lower roof length where shorter. */
    public double extent() { return required ? Math.min(width, lowerLength) : 0; }

    /** Surcharge intensity at distance x from the step (psf or kN/m²); 0 outside the drift. */
    public double at(double x) {
        if (!required || x < 0 || x > extent()) return 0;
        return peak * (1 - x / width);
    }

    /**
     * The surcharge integrated over a band from {@code from} to {@code to} (distances from the step): load per unit
     * length along the step (plf or kN/m), for a member strip parallel to the step.
     */
    public double over(double from, double to) {
        double a = Math.max(0, Math.min(from, to)), b = Math.min(extent(), Math.max(from, to));
        if (!required || b <= a) return 0;
        return (at(a) + at(b)) / 2 * (b - a);
    }

    /** The whole surcharge per unit length of step (plf or kN/m). */
    public double resultant() { return over(0, extent()); }
}
