package com.baysheet.engine.units;

/**
 * The unit system a project is calculated in. Each system has base units in which the engine works:
 * US: ft, ft², psf, plf, lb, lb·ft; SI: m, m², kN/m² (kPa), kN/m, kN, kN·m.
 * The code's SI equations (with their rounded constants) are used for SI projects, the US equations for US.
 */
public enum UnitSystem {
    US, SI;

    public static UnitSystem parse(String field, String text) {
        for (UnitSystem s : values()) if (s.name().equalsIgnoreCase(text)) return s;
        throw new com.baysheet.engine.InputError(field, text, "must be US or SI");
    }
}
