package com.baysheet.engine.units;

/** The kinds of quantity on a sheet, with the unit each is shown in for each system. */
public enum Quantity {
    RATIO(Unit.NONE, Unit.NONE),
    LENGTH(Unit.FT, Unit.M),
    SMALL_LENGTH(Unit.IN, Unit.MM),
    AREA(Unit.SQFT, Unit.SQM),
    PRESSURE(Unit.PSF, Unit.KPA),
    LINE_LOAD(Unit.PLF, Unit.KN_PER_M),
    FORCE(Unit.KIP, Unit.KN),
    MOMENT(Unit.KIP_FT, Unit.KN_M),
    STIFFNESS(Unit.KIP_IN2, Unit.KN_M2),
    SLOPE(Unit.IN_PER_FT, Unit.PERCENT),
    /** Snow density (ASCE 7 Chapter 7). */
    DENSITY(Unit.PCF, Unit.KN_PER_M3),
    /** A roof slope in degrees, as the snow chapter states its limits. */
    ANGLE(Unit.DEG, Unit.DEG);

    private final Unit us;
    private final Unit si;

    Quantity(Unit us, Unit si) {
        this.us = us;
        this.si = si;
    }

    public Unit unit(UnitSystem system) { return system == UnitSystem.US ? us : si; }
}
