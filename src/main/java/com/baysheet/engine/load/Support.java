package com.baysheet.engine.load;

import com.baysheet.engine.Check;

/**
 * How a member is supported. Positions run from the left support (or the fixed end) in the system base
 * length. An overhang extends past the right support.
 */
public sealed interface Support {
    /** Total length carrying load. */
    double length();

    /** The length used for the one-way slab area cap (ASCE 7-16 4.7.6). */
    double span();

    /** Simple span between pinned supports at 0 and {@code span}. */
    record Simple(double span) implements Support {
        public Simple { Check.positive("span", span); }
        public double length() { return span; }
    }

    /** Supports at 0 and {@code span}, the member continuing {@code overhang} past the right support. */
    record Overhang(double span, double overhang) implements Support {
        public Overhang {
            Check.positive("span", span);
            Check.positive("overhang", overhang);
        }
        public double length() { return span + overhang; }
    }

    /** Fixed at 0, free at {@code length}. */
    record Cantilever(double length) implements Support {
        public Cantilever { Check.positive("length", length); }
        public double span() { return length; }
    }

    /** A column: loads are axial, positions do not matter. */
    record Axial() implements Support {
        public double length() { return 0; }
        public double span() { return 0; }
    }
}
