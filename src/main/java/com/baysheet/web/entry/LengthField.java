package com.baysheet.web.entry;

import com.baysheet.engine.units.Unit;

import java.util.Objects;

/**
 * What one length field accepts: its label for messages, whether it may be negative, and the unit of the
 * value it yields in each system (a bare number is read in that same unit: ft or in, m or mm).
 *
 * @param signed whether the value may be below zero (an elevation); an unsigned field also takes
 *               {@code 25-6} for 25'-6", which on a signed field could be misread as a subtraction
 * @param us     FT or IN
 * @param si     M or MM
 */
public record LengthField(String label, boolean signed, Unit us, Unit si) {
    public LengthField {
        Objects.requireNonNull(label, "label");
        if (us != Unit.FT && us != Unit.IN) throw new IllegalArgumentException("US length unit must be ft or in: " + us);
        if (si != Unit.M && si != Unit.MM) throw new IllegalArgumentException("SI length unit must be m or mm: " + si);
    }

    /** A span, spacing or projection: greater than 0, in ft or m. */
    public static LengthField span(String label) { return new LengthField(label, false, Unit.FT, Unit.M); }

    /** An elevation: any sign, in ft or m. */
    public static LengthField elevation(String label) { return new LengthField(label, true, Unit.FT, Unit.M); }

    /** A small dimension (the side of a contact area): greater than 0, in in or mm. */
    public static LengthField small(String label) { return new LengthField(label, false, Unit.IN, Unit.MM); }
}
