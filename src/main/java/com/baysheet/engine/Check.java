package com.baysheet.engine;

/** Preconditions for engine entry points; each names the field and the refused value. */
public final class Check {
    private Check() {}

    public static double positive(String field, double v) {
        if (!Double.isFinite(v) || v <= 0) throw new InputError(field, v, "must be a finite number greater than 0");
        return v;
    }

    public static double nonNegative(String field, double v) {
        if (!Double.isFinite(v) || v < 0) throw new InputError(field, v, "must be a finite number, 0 or more");
        return v;
    }

    public static double finite(String field, double v) {
        if (!Double.isFinite(v)) throw new InputError(field, v, "must be a finite number");
        return v;
    }

    public static double within(String field, double v, double lo, double hi) {
        finite(field, v);
        if (v < lo || v > hi) throw new InputError(field, v, "must lie between " + lo + " and " + hi);
        return v;
    }

    public static int atLeast(String field, int v, int min) {
        if (v < min) throw new InputError(field, v, "must be at least " + min);
        return v;
    }

    public static <T> T present(String field, T v) {
        if (v == null) throw new InputError(field, "nothing", "is required");
        return v;
    }

    public static String text(String field, String v) {
        if (v == null || v.isBlank()) throw new InputError(field, "\"\"", "is required");
        return v;
    }
}
