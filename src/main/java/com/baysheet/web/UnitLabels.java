package com.baysheet.web;

import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

/**
 * The units a project's inputs are entered in (the base units of its system: ft or m, psf or kPa,
 * in/ft or %), for labels beside fields, and shown values.
 */
public record UnitLabels(UnitSystem system, String length, String area, String pressure, String slope, String force) {
    public static UnitLabels of(UnitSystem s) {
        return new UnitLabels(s, Quantity.LENGTH.unit(s).symbol(), Quantity.AREA.unit(s).symbol(),
                Quantity.PRESSURE.unit(s).symbol(), Quantity.SLOPE.unit(s).symbol(), Quantity.FORCE.unit(s).symbol());
    }

    public String length(double base) { return Display.of(base, Quantity.LENGTH, system); }

    public String area(double base) { return Display.of(base, Quantity.AREA, system); }

    public String force(double base) { return Display.of(base, Quantity.FORCE, system); }

    public String pressure(double base) { return Display.of(base, Quantity.PRESSURE, system); }

    /** The unit of a load per length (plf or kN/m). */
    public String perLength() { return Quantity.LINE_LOAD.unit(system).symbol(); }

    public String lineLoad(double base) { return Display.of(base, Quantity.LINE_LOAD, system); }

    public String number(double v) { return Display.sig3(v); }
}
