package com.baysheet.engine.units;

/**
 * The kinds of quantity on a sheet, with the unit each is shown in for each system and the system base unit
 * the engine works in (a deflection is computed in ft or m and shown in in or mm; EI in lb·ft², shown in
 * kip·in²).
 */
public enum Quantity {
    RATIO(Unit.NONE, Unit.NONE, Unit.NONE, Unit.NONE),
    LENGTH(Unit.FT, Unit.M, Unit.FT, Unit.M),
    SMALL_LENGTH(Unit.IN, Unit.MM, Unit.FT, Unit.M),
    AREA(Unit.SQFT, Unit.SQM, Unit.SQFT, Unit.SQM),
    PRESSURE(Unit.PSF, Unit.KPA, Unit.PSF, Unit.KPA),
    LINE_LOAD(Unit.PLF, Unit.KN_PER_M, Unit.PLF, Unit.KN_PER_M),
    FORCE(Unit.KIP, Unit.KN, Unit.LB, Unit.KN),
    MOMENT(Unit.KIP_FT, Unit.KN_M, Unit.LB_FT, Unit.KN_M),
    STIFFNESS(Unit.KIP_IN2, Unit.KN_M2, Unit.LB_FT2, Unit.KN_M2),
    SLOPE(Unit.IN_PER_FT, Unit.PERCENT, Unit.IN_PER_FT, Unit.PERCENT),
    /** Snow density (ASCE 7 Chapter 7). */
    DENSITY(Unit.PCF, Unit.KN_PER_M3, Unit.PCF, Unit.KN_PER_M3),
    /** A roof slope in degrees, as the snow chapter states its limits. */
    ANGLE(Unit.DEG, Unit.DEG, Unit.DEG, Unit.DEG);


    private final Unit us;
    private final Unit si;
    private final Unit usBase;
    private final Unit siBase;

    Quantity(Unit us, Unit si, Unit usBase, Unit siBase) {
        this.us = us;
        this.si = si;
        this.usBase = usBase;
        this.siBase = siBase;
    }

    /** The unit a value of this quantity is shown in on a sheet. */
    public Unit unit(UnitSystem system) { return system == UnitSystem.US ? us : si; }

    /** The system base unit the engine computes this quantity in (the unit of a record's {@code value}). */
    public Unit base(UnitSystem system) { return system == UnitSystem.US ? usBase : siBase; }

    /** The base unit of the quantity shown in {@code shown}, or null when no quantity is shown in it. */
    public static Unit baseOfShown(String shown, UnitSystem system) {
        for (Quantity q : values()) if (q.unit(system).symbol().equals(shown)) return q.base(system);
        return null;
    }
}
