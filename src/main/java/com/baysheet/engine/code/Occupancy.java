package com.baysheet.engine.code;

import com.baysheet.engine.Check;
import com.baysheet.engine.units.UnitSystem;

/**
 * One row of the occupancy catalogue: uniform live load L0 and the concentrated load with its square
 * contact area, each as printed in US and SI; the reduction rule; the clause key that explains a refused
 * reduction; whether it is an assembly use (no 0.5 L in the load combinations); how the row's numbers
 * are known (seen, memory, uncertain, or firm for a firm's own row); and, for a balcony or deck row derived
 * by {@link BalconyRule}, the id of the occupancy it serves ("" for every other row).
 *
 * @param uniformPsf       L0 in psf
 * @param uniformKPa       L0 in kN/m²
 * @param concentratedLb   concentrated load in lb, 0 where the table gives none
 * @param concentratedKN   concentrated load in kN
 * @param contactSideIn    side of the square contact area in inches
 * @param contactSideMm    side of the square contact area in mm
 */
public record Occupancy(String id, String name, double uniformPsf, double uniformKPa,
                        double concentratedLb, double concentratedKN, double contactSideIn, double contactSideMm,
                        ReductionRule rule, String ruleClause, boolean assembly, String confidence, String serves) {
    public Occupancy {
        Check.text("occupancy.id", id);
        Check.text("occupancy.name", name);
        Check.positive("occupancy.uniformPsf", uniformPsf);
        Check.positive("occupancy.uniformKPa", uniformKPa);
        Check.nonNegative("occupancy.concentratedLb", concentratedLb);
        Check.nonNegative("occupancy.concentratedKN", concentratedKN);
        Check.positive("occupancy.contactSideIn", contactSideIn);
        Check.positive("occupancy.contactSideMm", contactSideMm);
        Check.present("occupancy.rule", rule);
        if (ruleClause == null) ruleClause = "";
        if (confidence == null) confidence = "memory";
        if (serves == null) serves = "";
    }

    /** A row that serves no other occupancy (every row but the derived balconies). */
    public Occupancy(String id, String name, double uniformPsf, double uniformKPa, double concentratedLb, double concentratedKN,
                     double contactSideIn, double contactSideMm, ReductionRule rule, String ruleClause, boolean assembly,
                     String confidence) {
        this(id, name, uniformPsf, uniformKPa, concentratedLb, concentratedKN, contactSideIn, contactSideMm, rule, ruleClause,
                assembly, confidence, "");
    }

    /** L0 in the system base unit (psf or kPa), as printed for that system. */
    public double uniform(UnitSystem s) { return s == UnitSystem.US ? uniformPsf : uniformKPa; }

    /** The concentrated load in the system base unit (lb or kN). */
    public double concentrated(UnitSystem s) { return s == UnitSystem.US ? concentratedLb : concentratedKN; }

    /** The contact side in the system base length (ft or m). */
    public double contactSide(UnitSystem s) { return s == UnitSystem.US ? contactSideIn / 12.0 : contactSideMm / 1000.0; }

    public boolean isRoof() { return rule == ReductionRule.ROOF; }

    /** A balcony or deck row, derived from the occupancy it serves: no partition allowance on it. */
    public boolean isBalcony() { return !serves.isEmpty(); }
}
