package com.baysheet.project;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.units.UnitSystem;

/**
 * One of the firm's own occupancies, entered in one unit system: L0 in psf or kPa, the concentrated load
 * in lb or kN (0 for none) on a square contact area of side {@code contactSide} in inches or mm.
 */
public record FirmOccupancy(String id, String name, UnitSystem units, double uniform, double concentrated,
                            double contactSide, ReductionRule rule, boolean assembly) {
    public FirmOccupancy {
        id = Check.text("id", id).strip().toLowerCase();
        if (!id.matches("[a-z0-9][a-z0-9-]{0,59}"))
            throw new InputError("id", id, "use lower-case letters, digits and dashes, at most 60");
        name = Check.text("name", name).strip();
        // firm_occupancy.name is VARCHAR(200): longer is a field error, not a database fault
        if (name.length() > 200) throw new InputError("name", name.length() + " characters", "must be at most 200 characters");
        Check.present("units", units);
        Check.positive("uniform", uniform);
        Check.nonNegative("concentrated", concentrated);
        Check.positive("contactSide", contactSide);
        Check.present("rule", rule);
    }

    public Occupancy occupancy() {
        return OccupancyCatalogue.custom(id, name, units, uniform, concentrated, contactSide, rule, assembly);
    }
}
