package com.baysheet.engine.code;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.units.UnitSystem;

import java.util.HashMap;
import java.util.Map;

/**
 * A code edition as data: its clause labels by key, the live load element factors of its Table 4.7-1,
 * its numeric constants (thresholds, limits, the coefficients of its equations) and the id of the floor
 * reduction method it uses. Editions and local amendments renumber clauses, so nothing here is in code.
 * Immutable; clause references and per-system constants are resolved once, since every member asks for them.
 */
public final class Edition {
    private final String id;
    private final String floorMethod;
    private final Map<String, String> clauses;
    private final Map<String, String> confidence;
    private final Map<MemberKind, Double> kll;
    private final Map<String, Double> constants;
    private final Map<String, Clause> resolved = new HashMap<>();
    private final Map<String, Double> us = new HashMap<>(), si = new HashMap<>();
    private final SnowData snow;

    public Edition(String id, String floorMethod, Map<String, String> clauses, Map<String, String> confidence,
                   Map<MemberKind, Double> kll, Map<String, Double> constants) {
        this(id, floorMethod, clauses, confidence, kll, constants, null);
    }

    /** @param snow the roof snow tables, or null where the edition carries none (its clauses and constants are in the maps) */
    public Edition(String id, String floorMethod, Map<String, String> clauses, Map<String, String> confidence,
                   Map<MemberKind, Double> kll, Map<String, Double> constants, SnowData snow) {
        this.id = id;
        this.snow = snow;
        this.floorMethod = floorMethod;
        this.clauses = Map.copyOf(clauses);
        this.confidence = Map.copyOf(confidence);
        this.kll = Map.copyOf(kll);
        this.constants = Map.copyOf(constants);
        for (MemberKind k : MemberKind.values())
            if (!kll.containsKey(k)) throw new IllegalStateException(id + ": no K_LL for " + k);
        clauses.forEach((key, ref) -> resolved.put(key, new Clause(id, ref, confidence.getOrDefault(key, "seen"))));
        constants.forEach((key, v) -> {
            if (key.endsWith(".us")) us.put(key.substring(0, key.length() - 3), v);
            else if (key.endsWith(".si")) si.put(key.substring(0, key.length() - 3), v);
        });
    }

    public String id() { return id; }

    public String floorMethod() { return floorMethod; }

    public Map<String, String> clauses() { return clauses; }

    public Map<String, String> confidence() { return confidence; }

    public Map<MemberKind, Double> kll() { return kll; }

    public Map<String, Double> constants() { return constants; }

    public Clause clause(String key) {
        Clause c = resolved.get(key);
        if (c == null) throw new IllegalStateException(id + ": no clause label for " + key);
        return c;
    }

    public double kll(MemberKind kind) { return kll.get(kind); }

    /** The roof snow tables (Chapter 7), empty where the edition has no snow block. */
    public java.util.Optional<SnowData> snow() { return java.util.Optional.ofNullable(snow); }

    public double constant(String key) {
        Double v = constants.get(key);
        if (v == null) throw new IllegalStateException(id + ": no constant " + key);
        return v;
    }

    /** A constant given per unit system (key.us or key.si in the data). */
    public double constant(String key, UnitSystem system) {
        Double v = (system == UnitSystem.US ? us : si).get(key);
        if (v == null) throw new IllegalStateException(id + ": no constant " + key + " for " + system);
        return v;
    }

    @Override
    public boolean equals(Object o) { return o instanceof Edition e && e.id.equals(id) && e.constants.equals(constants) && e.clauses.equals(clauses); }

    @Override
    public int hashCode() { return id.hashCode(); }

    @Override
    public String toString() { return id; }

    static InputError unknown(String id) {
        return new InputError("edition", id, "is not a known code edition (ASCE 7-16, ASCE 7-22, ASCE 7-10)");
    }
}
