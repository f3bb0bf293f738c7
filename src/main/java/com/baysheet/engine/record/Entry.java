package com.baysheet.engine.record;

/**
 * A named value on a record (an input or a result): {@code value} at full precision in the system base unit
 * {@code unit} (lb, lb·ft, ft, lb·ft²; kN, kN·m, m, kN·m²), and {@code shown}, the text a sheet prints, in
 * {@code shownUnit} (kip, kip·ft, in, kip·in²; kN, kN·m, mm). A text entry (the edition, the member kind) has
 * NaN for its value and both units blank.
 */
public record Entry(String key, String label, double value, String unit, String shown, String shownUnit) {
    /** An entry with no unit: a ratio, a count, or text alone. */
    public static Entry unitless(String key, String label, double value, String shown) {
        return new Entry(key, label, value, "", shown, "");
    }
}
