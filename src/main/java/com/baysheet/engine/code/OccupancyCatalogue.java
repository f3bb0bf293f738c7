package com.baysheet.engine.code;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.units.Convert;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.util.Collection;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The occupancy catalogue: the built-in rows of engine/occupancies.json plus a firm's own rows, and the
 * balcony rows derived from every non-roof row ({@link BalconyRule}; found by id, not listed in {@link #all}).
 * Immutable; {@link #with} returns a new catalogue.
 */
public final class OccupancyCatalogue {
    private static final OccupancyCatalogue BUILT_IN = load("/engine/occupancies.json");

    private final Map<String, Occupancy> byId;
    private final BalconyRule balcony;
    private final Map<String, Occupancy> balconies = new LinkedHashMap<>();

    private OccupancyCatalogue(Map<String, Occupancy> byId, BalconyRule balcony) {
        this.byId = Map.copyOf(byId);
        this.order = byId.keySet().toArray(String[]::new);
        this.balcony = balcony;
        for (String id : order) {
            Occupancy b = balcony.serving(byId.get(id));
            if (b != null) balconies.put(b.id(), b);
        }
    }

    private final String[] order;

    public static OccupancyCatalogue builtIn() { return BUILT_IN; }

    public Occupancy get(String id) {
        // an immutable map throws on a null key: a missing id is the user's error, not ours
        Occupancy o = id == null ? null : byId.getOrDefault(id, balconies.get(id));
        if (o == null) throw new InputError("occupancy", id, "is not in the occupancy catalogue");
        return o;
    }

    public boolean contains(String id) { return id != null && (byId.containsKey(id) || balconies.containsKey(id)); }

    /** The derived balcony and deck rows, one for each non-roof row, in catalogue order. */
    public Collection<Occupancy> balconies() { return List.copyOf(balconies.values()); }

    public BalconyRule balconyRule() { return balcony; }

    /** Equal rows in the same order with the same balcony rule (the store reads a firm's catalogue afresh on every load). */
    @Override
    public boolean equals(Object o) {
        return o == this || o instanceof OccupancyCatalogue c && c.byId.equals(byId) && java.util.Arrays.equals(c.order, order)
                && c.balcony.equals(balcony);
    }

    @Override
    public int hashCode() { return byId.hashCode(); }

    /** The balcony row serving an occupancy, or the occupancy itself where none derives (a roof). */
    public String balconyOf(String servedId) {
        String id = BalconyRule.idFor(servedId);
        return balconies.containsKey(id) ? id : servedId;
    }

    public Collection<Occupancy> all() {
        return java.util.Arrays.stream(order).map(byId::get).toList();
    }

    /** This catalogue with one more (or a replaced) row. */
    public OccupancyCatalogue with(Occupancy o) {
        Map<String, Occupancy> m = new LinkedHashMap<>();
        for (String id : order) m.put(id, byId.get(id));
        m.put(o.id(), o);
        return new OccupancyCatalogue(m, balcony);
    }

    /**
     * A firm's own occupancy, given in one unit system; the other system's values are the exact
     * conversion (NIST SP 811), since no code prints them.
     *
     * @param uniform       L0 in psf (US) or kN/m² (SI)
     * @param concentrated  lb (US) or kN (SI), 0 for none
     * @param contactSide   side of the square contact area in in (US) or mm (SI)
     */
    public static Occupancy custom(String id, String name, UnitSystem system, double uniform, double concentrated,
                                   double contactSide, ReductionRule rule, boolean assembly) {
        Check.positive("uniform", uniform);
        Check.nonNegative("concentrated", concentrated);
        Check.positive("contactSide", contactSide);
        Check.present("rule", rule);
        Check.present("units", system);
        boolean us = system == UnitSystem.US;
        double psf = us ? uniform : Convert.toUs(Quantity.PRESSURE, uniform);
        double kpa = us ? Convert.toSi(Quantity.PRESSURE, uniform) : uniform;
        double lb = us ? concentrated : Convert.toUs(Quantity.FORCE, concentrated);
        double kn = us ? Convert.toSi(Quantity.FORCE, concentrated) : concentrated;
        double in = us ? contactSide : contactSide / 25.4;
        double mm = us ? contactSide * 25.4 : contactSide;
        String clause = switch (rule) {
            case HEAVY -> "reduction.heavy";
            case GARAGE -> "reduction.garage";
            case NOT_REDUCIBLE -> assembly ? "reduction.assembly" : "loads.table";
            case ROOF -> "roof.reduction";
            case ORDINARY -> "";
        };
        return new Occupancy(id, name, psf, kpa, lb, kn, in, mm, rule, clause, assembly, "firm");
    }

    private static BalconyRule balconyRule(JsonNode b) {
        if (b == null) throw new IllegalStateException("occupancies.json has no balcony block");
        return new BalconyRule(b.get("factor").asDouble(), b.get("capPsf").asDouble(), b.get("capKPa").asDouble(),
                b.get("confidence").asText());
    }

    static OccupancyCatalogue load(String resource) {
        try (InputStream in = OccupancyCatalogue.class.getResourceAsStream(resource)) {
            if (in == null) throw new IllegalStateException("missing resource " + resource);
            JsonNode root = new ObjectMapper().readTree(in);
            Map<String, Occupancy> m = new LinkedHashMap<>();
            for (JsonNode r : root.get("occupancies")) {
                Occupancy o = new Occupancy(r.get("id").asText(), r.get("name").asText(),
                        r.get("uniformPsf").asDouble(), r.get("uniformKPa").asDouble(),
                        r.get("concentratedLb").asDouble(), r.get("concentratedKN").asDouble(),
                        r.get("contactSideIn").asDouble(), r.get("contactSideMm").asDouble(),
                        ReductionRule.valueOf(r.get("rule").asText()), r.get("ruleClause").asText(),
                        r.get("assembly").asBoolean(), r.get("confidence").asText());
                m.put(o.id(), o);
            }
            return new OccupancyCatalogue(m, balconyRule(root.get("balcony")));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
