package com.baysheet.engine.code;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

/**
 * Balconies and decks: 1.5 times the live load of the area served, not required to exceed 100 psf
 * (4.79 kN/m²) (ASCE 7-16 Table 4.3-1, ASCE 7-10 Table 4-1, from memory). The factor, the caps and their
 * confidence are data (the "balcony" block of engine/occupancies.json). Each catalogue row that is not a
 * roof gets a derived balcony row {@code balcony:ID}; the choices below are explained in docs/engine.md.
 *
 * @param factor  multiplier on the served L0 (1.5)
 * @param capPsf  the value the balcony load need not exceed, psf
 * @param capKPa  the same in kN/m², as printed
 */
public record BalconyRule(double factor, double capPsf, double capKPa, String confidence) {
    public static final String PREFIX = "balcony:";

    public BalconyRule {
        Check.positive("balcony.factor", factor);
        if (factor < 1) throw new InputError("balcony.factor", factor, "must be at least 1: a balcony carries no less than the area it serves");
        Check.positive("balcony.capPsf", capPsf);
        Check.positive("balcony.capKPa", capKPa);
        Check.text("balcony.confidence", confidence);
    }

    /** The id of the balcony row serving an occupancy. */
    public static String idFor(String servedId) { return PREFIX + servedId; }

    /**
     * The balcony row serving {@code o}, or null where none derives: roof rows (a roof overhang stays roof)
     * and balcony rows themselves. L0 = min(factor × L0, cap) but never below the served L0 (conservative
     * choice: the cap only relieves areas served at under the cap); each unit system from its own printed L0.
     * The concentrated load and contact area are those of the area served; not reduced (conservative
     * choice); an assembly use where the area served is one.
     */
    public Occupancy serving(Occupancy o) {
        if (o.isRoof() || o.isBalcony()) return null;
        double psf = Math.max(o.uniformPsf(), Math.min(factor * o.uniformPsf(), capPsf));
        double kpa = Math.max(o.uniformKPa(), Math.min(factor * o.uniformKPa(), capKPa));
        return new Occupancy(idFor(o.id()), "Balcony or deck serving " + o.name(), psf, kpa, o.concentratedLb(),
                o.concentratedKN(), o.contactSideIn(), o.contactSideMm(), ReductionRule.NOT_REDUCIBLE, "loads.table",
                o.assembly(), weaker(o.confidence(), confidence), o.id());
    }

    /** A derived row is known no better than the rule or the row it comes from; a firm's row stays the firm's. */
    private static String weaker(String served, String rule) {
        if (served.equals("firm") || served.equals("uncertain")) return served;
        if (rule.equals("uncertain") || rule.equals("memory")) return rule;
        return served;
    }
}
