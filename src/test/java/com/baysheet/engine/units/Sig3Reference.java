package com.baysheet.engine.units;

/**
 * The shown-number formatting as it was written first (log10, pow and string concatenation on every call), kept
 * unchanged as the reference that {@link Display}'s faster writing is tested against: every record's text depends on
 * the two agreeing character for character.
 */
final class Sig3Reference {
    private Sig3Reference() {}

    private static final int FIGURES = 3;

    public static String sig3(double v) {
        if (Double.isNaN(v)) return "NaN";
        if (Double.isInfinite(v)) return v > 0 ? "∞" : "-∞";
        if (v == 0) return "0";
        double a = Math.abs(v);
        int exp = (int) Math.floor(Math.log10(a));
        int decimals = FIGURES - 1 - exp;
        double scale = Math.pow(10, decimals);
        double rounded = Math.round(a * scale) / scale;
        // rounding can carry into the next decade (9.996 -> 10.0): recompute the decimals
        if (rounded >= Math.pow(10, exp + 1)) {
            decimals--;
            scale = Math.pow(10, decimals);
            rounded = Math.round(a * scale) / scale;
        }
        String body = decimals > 0 ? fixed(rounded, decimals) : Long.toString(Math.round(rounded));
        return v < 0 ? "-" + body : body;
    }

    /** A constant of an equation as printed: no trailing zeros (15, 4.57, 0.25). */
    public static String plain(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) return Long.toString((long) v);
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    /** A value in the system base unit shown in the sheet unit of its quantity, with the symbol. */
    public static String of(double base, Quantity q, UnitSystem system) {
        Unit u = q.unit(system);
        String n = sig3(u.fromBase(base));
        return u.symbol().isEmpty() ? n : n + " " + u.symbol();
    }

    private static String fixed(double v, int decimals) {
        long whole = (long) Math.floor(v);
        long frac = Math.round((v - whole) * Math.pow(10, decimals));
        long limit = (long) Math.pow(10, decimals);
        if (frac >= limit) { whole++; frac -= limit; }
        StringBuilder f = new StringBuilder(Long.toString(frac));
        while (f.length() < decimals) f.insert(0, '0');
        return whole + "." + f;
    }
}
