package com.baysheet.engine.record;

/**
 * A clause reference as printed on a sheet: the code edition and its section, equation or table
 * number ("ASCE 7-16", "4.7.2, Eq. 4.7-1"). {@code confidence} says how the label was established
 * (seen, memory, uncertain) so that a sheet can flag labels a firm should confirm.
 */
public record Clause(String edition, String ref, String confidence) {
    public static final Clause NONE = new Clause("", "", "");

    public boolean isNone() { return ref.isEmpty(); }

    public String label() { return isNone() ? "" : edition + " " + ref; }

    @Override
    public String toString() { return label(); }
}
