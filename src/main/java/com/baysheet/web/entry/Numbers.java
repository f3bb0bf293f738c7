package com.baysheet.web.entry;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Unsigned numbers as engineers write them: a decimal ({@code 6}, {@code 6.5}, {@code .5}), a fraction
 * ({@code 1/4}) or a whole number and a proper fraction ({@code 6 1/2}). Refusals are plain problems
 * (a denominator of 0, {@code 6 5/4}); the caller names the field.
 */
public final class Numbers {
    static final String DECIMAL = "\\d+(?:\\.\\d*)?|\\.\\d+";
    /** A decimal, a fraction, or a whole number and a fraction separated by spaces. */
    static final String NUMBER = "(?:\\d+\\s+)?\\d+/\\d+|" + DECIMAL;
    /** As {@link #NUMBER}, also with a dash between the whole number and the fraction (inches: 6-1/2"). */
    static final String INCHES = "(?:\\d+\\s*-\\s*|\\d+\\s+)?\\d+/\\d+|" + DECIMAL;

    private static final Pattern MIXED = Pattern.compile("(?:(\\d+)(?:\\s+|\\s*-\\s*))?(\\d+)/(\\d+)");
    private static final Pattern PLAIN = Pattern.compile(DECIMAL);

    private Numbers() {}

    /** The value of an unsigned number, or null when the text is not one; throws on a well-formed but absurd one. */
    public static Double read(String text) {
        String t = text.strip();
        if (PLAIN.matcher(t).matches()) return finite(Double.parseDouble(t), t);
        Matcher m = MIXED.matcher(t);
        if (!m.matches()) return null;
        double num = Double.parseDouble(m.group(2));
        double den = Double.parseDouble(m.group(3));
        if (den == 0) throw new IllegalArgumentException("a fraction cannot have a denominator of 0");
        if (m.group(1) == null) return finite(num / den, t);
        if (num >= den) throw new IllegalArgumentException(t + " has an improper fraction after the whole number");
        return finite(Double.parseDouble(m.group(1)) + num / den, t);
    }

    private static double finite(double v, String t) {
        if (!Double.isFinite(v)) throw new IllegalArgumentException(t + " is too large");
        return v;
    }
}
