package com.baysheet.engine.code;

import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.OptionalDouble;

/**
 * The roof snow tables of one edition (ASCE 7 Chapter 7), read from the {@code snow} block of editions.json.
 * Its clause labels and constants (keys {@code snow.*}) are merged into the edition's own, so they are read
 * like any other: {@code edition.clause("snow.flat")}, {@code edition.constant("snow.minimum.load", system)}.
 * An edition whose block says {@code unsupported} has no snow calculation; the reason is shown to the user.
 *
 * @param exposure    C_e by terrain key, then exposure key; an absent cell is "not applicable" in the table
 * @param thermal     C_t by thermal condition key
 * @param importance  I_s by risk category key
 * @param slopeCurves the curves of the roof slope factor figure, warmest first
 */
public record SnowData(String unsupported, Map<String, Map<String, Double>> exposure, Map<String, Double> thermal,
                       Map<String, Double> importance, List<SlopeCurve> slopeCurves) {

    /**
     * One curve of the slope factor figure: C_s = 1 up to the angle (degrees) for its surface, then linear to 0.
     * {@code ct} is the thermal factor the curve is drawn for.
     */
    public record SlopeCurve(double ct, double slipperyDeg, double otherDeg) {
        public double flatUpTo(boolean slippery) { return slippery ? slipperyDeg : otherDeg; }
    }

    public SnowData {
        exposure = Map.copyOf(exposure);
        thermal = Map.copyOf(thermal);
        importance = Map.copyOf(importance);
        slopeCurves = List.copyOf(slopeCurves);
        if (unsupported == null && (slopeCurves.isEmpty() || thermal.isEmpty() || importance.isEmpty()))
            throw new IllegalStateException("snow data without tables");
    }

    public static SnowData unsupported(String reason) {
        return new SnowData(reason, Map.of(), Map.of(), Map.of(), List.of());
    }

    public boolean supported() { return unsupported == null; }

    /** C_e from the exposure table, empty where the cell is not applicable or the keys are unknown. */
    public OptionalDouble exposure(String terrain, String shelter) {
        Double v = exposure.getOrDefault(terrain, Map.of()).get(shelter);
        return v == null ? OptionalDouble.empty() : OptionalDouble.of(v);
    }

    public Optional<Double> thermal(String condition) { return Optional.ofNullable(thermal.get(condition)); }

    public Optional<Double> importance(String category) { return Optional.ofNullable(importance.get(category)); }

    /** The curve for a thermal factor: the first drawn for a C_t at least as large (conservative between curves), else the coldest. */
    public SlopeCurve curveFor(double ct) {
        for (SlopeCurve c : slopeCurves) if (ct <= c.ct()) return c;
        return slopeCurves.get(slopeCurves.size() - 1);
    }

    /** The smallest value of a table, for telling a given factor that lies below every tabulated one. */
    public static double smallest(Map<String, Double> table) {
        return table.values().stream().mapToDouble(Double::doubleValue).min().orElse(Double.NaN);
    }

    public double smallestExposure() {
        return exposure.values().stream().flatMap(m -> m.values().stream()).mapToDouble(Double::doubleValue).min().orElse(Double.NaN);
    }
}
