package com.baysheet.engine.code;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.Clause;

import java.util.Map;

/**
 * A code edition as data: its clause labels by key, the live load element factors of its Table 4.7-1,
 * its numeric constants (thresholds, limits, the coefficients of its equations) and the id of the floor
 * reduction method it uses. Editions and local amendments renumber clauses, so nothing here is in code.
 */
public record Edition(String id, String floorMethod, Map<String, String> clauses, Map<String, String> confidence,
                      Map<MemberKind, Double> kll, Map<String, Double> constants) {
    public Edition {
        clauses = Map.copyOf(clauses);
        confidence = Map.copyOf(confidence);
        kll = Map.copyOf(kll);
        constants = Map.copyOf(constants);
        for (MemberKind k : MemberKind.values())
            if (!kll.containsKey(k)) throw new IllegalStateException(id + ": no K_LL for " + k);
    }

    public Clause clause(String key) {
        String ref = clauses.get(key);
        if (ref == null) throw new IllegalStateException(id + ": no clause label for " + key);
        return new Clause(id, ref, confidence.getOrDefault(key, "seen"));
    }

    public double kll(MemberKind kind) { return kll.get(kind); }

    public double constant(String key) {
        Double v = constants.get(key);
        if (v == null) throw new IllegalStateException(id + ": no constant " + key);
        return v;
    }

    static InputError unknown(String id) {
        return new InputError("edition", id, "is not a known code edition (ASCE 7-16, ASCE 7-22, ASCE 7-10)");
    }
}
