package com.baysheet.engine.code;

/** Which reduction provision governs an occupancy's uniform live load. */
public enum ReductionRule {
    /** reducible by the basic method (ASCE 7-16 4.7.2) */
    ORDINARY,
    /** L0 over 100 psf: not reduced, except by at most 20 % for two or more floors (4.7.3) */
    HEAVY,
    /** passenger vehicle garages: as heavy loads (4.7.4) */
    GARAGE,
    /** assembly and other uses the code does not let reduce (4.7.5, Table 4.3-1) */
    NOT_REDUCIBLE,
    /** ordinary roofs: reduced by R1 and R2 (4.8.2) */
    ROOF;

    public static ReductionRule parse(String field, String text) {
        for (ReductionRule r : values()) if (r.name().equalsIgnoreCase(text)) return r;
        throw new com.baysheet.engine.InputError(field, text, "must be one of ORDINARY, HEAVY, GARAGE, NOT_REDUCIBLE, ROOF");
    }
}
