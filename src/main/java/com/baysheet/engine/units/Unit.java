package com.baysheet.engine.units;

/**
 * Units shown on sheets. {@code perBase} converts a value in its system's base unit to this unit
 * (for example lb to kip is 0.001). Base units are listed in {@link UnitSystem}.
 */
public enum Unit {
    NONE("", 1),
    FT("ft", 1), M("m", 1),
    IN("in", 12), MM("mm", 1000),
    SQFT("ft²", 1), SQM("m²", 1),
    PSF("psf", 1), KPA("kPa", 1),
    PLF("plf", 1), KLF("klf", 0.001), KN_PER_M("kN/m", 1),
    LB("lb", 1), KIP("kip", 0.001), KN("kN", 1),
    LB_FT("lb·ft", 1), KIP_FT("kip·ft", 0.001), KN_M("kN·m", 1),
    LB_FT2("lb·ft²", 1), KIP_IN2("kip·in²", 144.0 / 1000.0), KN_M2("kN·m²", 1),
    IN_PER_FT("in/ft", 1), PERCENT("%", 1),
    PCF("pcf", 1), KN_PER_M3("kN/m³", 1), DEG("°", 1);

    private final String symbol;
    private final double perBase;

    Unit(String symbol, double perBase) {
        this.symbol = symbol;
        this.perBase = perBase;
    }

    public String symbol() { return symbol; }

    /** Converts a value in the system base unit to this unit. */
    public double fromBase(double base) { return base * perBase; }

    /** Converts a value in this unit to the system base unit. */
    public double toBase(double shown) { return shown / perBase; }
}
