package com.baysheet.engine.units;

/**
 * Three significant figures, the usual precision of a calculation sheet. Full precision stays in the
 * record's numbers; only the shown text is rounded. Whole numbers of four or more digits are rounded
 * to three significant figures too (12,345 lb shows as 12300).
 *
 * <p>A record shows a few hundred numbers, so the digits are written straight into one buffer rather than through
 * string concatenation; the rounding arithmetic is the same double arithmetic as it always was (only {@code Math.pow}
 * of 10 to a small whole power is read from a table, which the Java specification makes exact either way). The
 * property test {@code DisplayProperties} holds every method to the original writing, character for character.
 */
public final class Display {
    private Display() {}

    private static final int FIGURES = 3;

    /** 10^0 to 10^22, every one exactly representable, as Math.pow returns them for whole powers. */
    private static final double[] POW10 = {1e0, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13,
            1e14, 1e15, 1e16, 1e17, 1e18, 1e19, 1e20, 1e21, 1e22};
    /** Beyond 18 decimals the fraction no longer fits a long as written: such tiny values take the original path. */
    private static final int MAX_DECIMALS = 18;
    /** " " and each unit's symbol, by {@link Unit#ordinal}; null where the symbol is empty. */
    private static final char[][] SUFFIX = new char[Unit.values().length][];

    static {
        for (Unit u : Unit.values()) if (!u.symbol().isEmpty()) SUFFIX[u.ordinal()] = (" " + u.symbol()).toCharArray();
    }

    public static String sig3(double v) { return sig3(v, null); }

    /** A value in the system base unit shown in the sheet unit of its quantity, with the symbol. */
    public static String of(double base, Quantity q, UnitSystem system) {
        Unit u = q.unit(system);
        return sig3(u.fromBase(base), SUFFIX[u.ordinal()]);
    }

    /** A constant of an equation as printed: no trailing zeros (15, 4.57, 0.25). */
    public static String plain(double v) {
        if (v == Math.rint(v) && Math.abs(v) < 1e15) return Long.toString((long) v);
        // BigDecimal.valueOf reads Double.toString: a plain decimal ending in a non-zero digit is already stripped
        String s = Double.toString(v);
        if (s.indexOf('E') < 0 && s.charAt(s.length() - 1) != '0' && Double.isFinite(v)) return s;
        return java.math.BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    /** Three figures, followed by {@code suffix} when it is not null. */
    private static String sig3(double v, char[] suffix) {
        if (Double.isNaN(v) || Double.isInfinite(v) || v == 0) return join(shownSpecial(v), suffix);
        double a = Math.abs(v);
        int exp = decade(a);
        int decimals = FIGURES - 1 - exp;
        double scale = pow10(decimals);
        double rounded = Math.round(a * scale) / scale;
        // rounding can carry into the next decade (9.996 -> 10.0): recompute the decimals
        if (rounded >= pow10(exp + 1)) {
            decimals--;
            scale = pow10(decimals);
            rounded = Math.round(a * scale) / scale;
        }
        if (decimals > MAX_DECIMALS) {
            String body = fixedOriginal(rounded, decimals);
            return join(v < 0 ? "-" + body : body, suffix);
        }
        long whole, frac = 0;
        if (decimals > 0) {
            whole = (long) Math.floor(rounded);
            frac = Math.round((rounded - whole) * pow10(decimals));
            long limit = (long) pow10(decimals);
            if (frac >= limit) { whole++; frac -= limit; }
        } else {
            whole = Math.round(rounded);
        }
        return write(v < 0, whole, frac, Math.max(decimals, 0), suffix);
    }

    private static String shownSpecial(double v) {
        if (Double.isNaN(v)) return "NaN";
        if (Double.isInfinite(v)) return v > 0 ? "∞" : "-∞";
        return "0";
    }

    private static String join(String shown, char[] suffix) {
        return suffix == null ? shown : shown + new String(suffix);
    }

    /** 10^-22 to 10^22 as the double literals, for finding a value's decade by comparison. */
    private static final double[] DECADE = new double[45];

    static {
        for (int n = -22; n <= 22; n++) DECADE[n + 22] = Double.parseDouble("1e" + n);
    }

    /**
     * floor(log10(a)) as Math.log10 gives it. Found by comparison with the powers of ten; only within a relative
     * 1e-13 of a power (where log10's last bit decides, and 10^n for n < 0 is itself not exact) is log10 asked.
     */
    private static int decade(double a) {
        if (!(a >= 1e-21 && a < 1e21)) return (int) Math.floor(Math.log10(a));
        int n = (int) Math.floor((Math.getExponent(a) + 1) * 0.30102999566398120) - 1; // at or below the decade
        while (DECADE[n + 23] <= a) n++;
        double low = DECADE[n + 22], high = DECADE[n + 23];
        if (a < low * (1 + 1e-13) || a > high * (1 - 1e-13)) return (int) Math.floor(Math.log10(a));
        return n;
    }

    private static double pow10(int n) { return n >= 0 && n < POW10.length ? POW10[n] : Math.pow(10, n); }

    /** "-whole.frac" with {@code frac} zero-padded to {@code decimals} digits (none when 0), then the suffix. */
    private static String write(boolean negative, long whole, long frac, int decimals, char[] suffix) {
        int tail = suffix == null ? 0 : suffix.length;
        char[] b = new char[(negative ? 1 : 0) + length(whole) + (decimals > 0 ? decimals + 1 : 0) + tail];
        int end = b.length - tail, i = end;
        if (tail > 0) System.arraycopy(suffix, 0, b, end, tail);
        if (decimals > 0) {
            i = digits(b, i, frac, decimals);
            b[--i] = '.';
        }
        i = digits(b, i, whole, 1);
        if (negative) b[--i] = '-';
        return new String(b); // compacted to Latin-1 where every character allows
    }

    /** The number of decimal digits of {@code n} (not negative). */
    private static int length(long n) {
        int d = 1;
        for (long p = 10; d < 19 && n >= p; p *= 10) d++;
        return d;
    }

    /**
     * Writes {@code n} (not negative) right to left ending before {@code end}, at least {@code width} digits with
     * leading zeros; returns where it starts. In int arithmetic while the value fits, as a long division costs far more.
     */
    private static int digits(char[] b, int end, long n, int width) {
        int i = end;
        while (n > Integer.MAX_VALUE) { b[--i] = (char) ('0' + n % 10); n /= 10; }
        int m = (int) n;
        do { int q = m / 10; b[--i] = (char) ('0' + (m - q * 10)); m = q; } while (m > 0);
        while (end - i < width) b[--i] = '0';
        return i;
    }

    /** The original writing of the fixed digits, for more decimals than a long holds. */
    private static String fixedOriginal(double v, int decimals) {
        long whole = (long) Math.floor(v);
        long frac = Math.round((v - whole) * Math.pow(10, decimals));
        long limit = (long) Math.pow(10, decimals);
        if (frac >= limit) { whole++; frac -= limit; }
        StringBuilder f = new StringBuilder(Long.toString(frac));
        while (f.length() < decimals) f.insert(0, '0');
        return whole + "." + f;
    }
}
