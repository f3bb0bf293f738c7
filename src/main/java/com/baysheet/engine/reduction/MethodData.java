package com.baysheet.engine.reduction;

import com.baysheet.engine.record.Clause;
import com.baysheet.engine.units.UnitSystem;

import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * One data set of a floor live load reduction method other than the edition's own (the {@code floorMethods} block of
 * editions.json): the implementation it names, the standard printed before its clause labels, the unit systems it is
 * written for, its clauses with their confidence, its constants, and the category (or group) of each occupancy where
 * the method sorts uses. Immutable.
 *
 * @param id       the data set's id, as a project stores it ("ibc-2021-alternative")
 * @param method   the implementation's id ("ibc-alternative", "en1991", "nbc")
 * @param standard printed before each clause label ("IBC 2021")
 * @param title    the method's name on the sheet
 */
public record MethodData(String id, String method, String standard, String title, Set<UnitSystem> units,
                         Map<String, Clause> clauses, Map<String, Double> constants, Map<String, String> categories,
                         Set<String> reducible, Set<String> floorCategories) {
    public MethodData {
        units = Set.copyOf(units);
        clauses = Map.copyOf(clauses);
        constants = Map.copyOf(constants);
        categories = Map.copyOf(categories);
        reducible = Set.copyOf(reducible);
        floorCategories = Set.copyOf(floorCategories);
        if (units.isEmpty()) throw new IllegalStateException(id + ": a floor method names the unit systems it is written for");
    }

    /** Builds the clause references: each label printed after the standard (or the one the data names for that clause). */
    static MethodData of(String id, String method, String standard, String title, List<UnitSystem> units,
                         Map<String, String> refs, Map<String, String> standards, Map<String, String> confidence,
                         Map<String, Double> constants, Map<String, String> categories, Set<String> reducible,
                         Set<String> floorCategories) {
        Map<String, Clause> clauses = new HashMap<>();
        refs.forEach((key, ref) -> clauses.put(key, new Clause(standards.getOrDefault(key, standard), ref,
                confidence.getOrDefault(key, "uncertain"))));
        return new MethodData(id, method, standard, title, Set.copyOf(units), clauses, constants, categories, reducible, floorCategories);
    }

    public boolean supports(UnitSystem system) { return units.contains(system); }

    /** The one unit system the method is written for ("SI"), or "" where it serves both. */
    public String onlyFor() { return units.size() == 1 ? units.iterator().next().name() : ""; }

    public Clause clause(String key) {
        Clause c = clauses.get(key);
        if (c == null) throw new IllegalStateException(id + ": no clause label for " + key);
        return c;
    }

    public double constant(String key) {
        Double v = constants.get(key);
        if (v == null) throw new IllegalStateException(id + ": no constant " + key);
        return v;
    }

    /** A constant given per unit system (key.us or key.si in the data). */
    public double constant(String key, UnitSystem system) {
        return constant(key + (system == UnitSystem.US ? ".us" : ".si"));
    }

    /** The category or group of an occupancy id; the data's default where it lists none ("" for none). */
    public String category(String occupancy) {
        String c = categories.get(occupancy);
        return c != null ? c : categories.getOrDefault("default", "");
    }

    /** Whether the data lists this occupancy (a firm's own row is not listed and takes the default). */
    public boolean lists(String occupancy) { return categories.containsKey(occupancy); }
}
