package com.baysheet.engine.units;

/**
 * Exact conversion factors, US base unit to SI base unit (NIST SP 811 Appendix B.8, from
 * ft = 0.3048 m, lb = 0.45359237 kg and g = 9.80665 m/s², all exact). SI base units here are
 * kN rather than N, so force factors carry 1/1000.
 */
public final class Convert {
    private Convert() {}

    public static final double M_PER_FT = 0.3048;
    public static final double SQM_PER_SQFT = M_PER_FT * M_PER_FT;           // 0.09290304
    public static final double N_PER_LBF = 0.45359237 * 9.80665;              // 4.4482216152605
    public static final double KN_PER_LB = N_PER_LBF / 1000.0;
    public static final double KPA_PER_PSF = KN_PER_LB / SQM_PER_SQFT;        // 0.047880259 kPa
    public static final double KN_PER_M_PER_PLF = KN_PER_LB / M_PER_FT;       // 0.014593903 kN/m
    public static final double KNM_PER_LBFT = KN_PER_LB * M_PER_FT;           // 0.0013558179 kN·m
    public static final double KNM2_PER_LBFT2 = KN_PER_LB * SQM_PER_SQFT;
    public static final double KNM3_PER_PCF = KN_PER_LB / (M_PER_FT * M_PER_FT * M_PER_FT); // 0.157087464 kN/m³

    /** Converts a value of the given kind from the US base unit to the SI base unit. */
    public static double toSi(Quantity q, double us) {
        return us * factor(q);
    }

    /** Converts a value of the given kind from the SI base unit to the US base unit. */
    public static double toUs(Quantity q, double si) {
        return si / factor(q);
    }

    /** Converts between systems; identity when both are the same. */
    public static double between(Quantity q, double v, UnitSystem from, UnitSystem to) {
        if (from == to) return v;
        return from == UnitSystem.US ? toSi(q, v) : toUs(q, v);
    }

    private static double factor(Quantity q) {
        return switch (q) {
            case RATIO -> 1;
            case LENGTH, SMALL_LENGTH -> M_PER_FT;
            case AREA -> SQM_PER_SQFT;
            case PRESSURE -> KPA_PER_PSF;
            case LINE_LOAD -> KN_PER_M_PER_PLF;
            case FORCE -> KN_PER_LB;
            case MOMENT -> KNM_PER_LBFT;
            case STIFFNESS -> KNM2_PER_LBFT2;
            // roof slope: rise in inches per foot (US) against percent (SI): 1 in/ft = 100/12 %
            case SLOPE -> 100.0 / 12.0;
            case DENSITY -> KNM3_PER_PCF;
            case ANGLE -> 1;
        };
    }
}
