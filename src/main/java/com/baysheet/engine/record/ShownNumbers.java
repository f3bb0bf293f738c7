package com.baysheet.engine.record;

import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

/**
 * The shown text of one record's numbers, each written once. A beam's record shows about 175 numbers of which about
 * 50 differ (the span, the loads and the factors recur in every substitution), and writing one is most of the cost of
 * a record; {@link Display} is a pure function of its arguments, so a repeat takes the string already written.
 * Keyed by the value's bits and what it is shown as (a plain three-figure number, or a quantity in this record's unit
 * system); a small open-addressed table that stops taking new numbers when three quarters full.
 */
final class ShownNumbers {
    private static final int SIZE = 128, MASK = SIZE - 1, FULL = SIZE * 3 / 4;
    /** The tag of a plain three-figure number; a quantity's is its ordinal plus one. */
    private static final int PLAIN = 0;

    private final UnitSystem system;
    private final long[] bits = new long[SIZE];
    private final int[] tags = new int[SIZE];
    private final String[] shown = new String[SIZE];
    private int count;

    ShownNumbers(UnitSystem system) { this.system = system; }

    /** {@link Display#sig3}. */
    String sig3(double v) {
        long b = Double.doubleToRawLongBits(v);
        int i = find(b, PLAIN);
        return shown[i] != null ? shown[i] : keep(i, b, PLAIN, Display.sig3(v));
    }

    /** {@link Display#of} in this record's unit system. */
    String of(double base, Quantity q) {
        long b = Double.doubleToRawLongBits(base);
        int tag = q.ordinal() + 1;
        int i = find(b, tag);
        return shown[i] != null ? shown[i] : keep(i, b, tag, Display.of(base, q, system));
    }

    /** The slot holding this key, or the empty slot where it would go. */
    private int find(long b, int tag) {
        long h = (b ^ (b >>> 29) ^ ((long) tag << 53)) * 0x9E3779B97F4A7C15L;
        int i = (int) (h >>> 57) & MASK;
        while (shown[i] != null && (bits[i] != b || tags[i] != tag)) i = (i + 1) & MASK;
        return i;
    }

    private String keep(int i, long b, int tag, String s) {
        if (count < FULL) {
            bits[i] = b;
            tags[i] = tag;
            shown[i] = s;
            count++;
        }
        return s;
    }
}
