package com.baysheet.engine.record;

/**
 * The key of a result on a record: the load case or combination it belongs to ("D", "L0", "LRFD", "Ldes") and the
 * action ("M+", "RA,min", "Δ", "P"). The record keeps the text "LRFD.M+", the form the sheets, the API and the stored
 * revisions have always read; this type is how the engine builds and looks the text up, so that the writer and the
 * reader of a key cannot spell it two ways. A malformed key is a fault of ours, never of the input.
 */
public final class ResultKey {
    /** The action of a column's axial load. */
    public static final String AXIAL = "P";

    private final String loadCase;
    private final String action;
    /** Written once: the numbers are looked up by it for every member a building derives. */
    private final String text;

    public ResultKey(String loadCase, String action) {
        if (loadCase == null || loadCase.isBlank() || loadCase.contains("."))
            throw new IllegalArgumentException("loadCase: a result's load case is a name without a dot (got " + loadCase + ")");
        if (action == null || action.isBlank()) throw new IllegalArgumentException("action: a result names its action (got " + action + ")");
        this.loadCase = loadCase;
        this.action = action;
        this.text = loadCase + "." + action;
    }

    public static ResultKey of(String loadCase, String action) { return new ResultKey(loadCase, action); }

    /** A column's axial load P of one case: "D.P", "LRFD.P". */
    public static ResultKey axial(String loadCase) { return new ResultKey(loadCase, AXIAL); }

    /** The key as a record holds it: "LRFD.M+". */
    public static ResultKey parse(String text) {
        int dot = text == null ? -1 : text.indexOf('.');
        if (dot < 0) throw new IllegalArgumentException("key: a result key is case.action (got " + text + ")");
        return new ResultKey(text.substring(0, dot), text.substring(dot + 1));
    }

    public String loadCase() { return loadCase; }

    public String action() { return action; }

    /** "LRFD.M+". */
    public String text() { return text; }

    @Override
    public boolean equals(Object o) {
        return this == o || o instanceof ResultKey k && loadCase.equals(k.loadCase) && action.equals(k.action);
    }

    @Override
    public int hashCode() { return 31 * loadCase.hashCode() + action.hashCode(); }

    @Override
    public String toString() { return text; }
}
