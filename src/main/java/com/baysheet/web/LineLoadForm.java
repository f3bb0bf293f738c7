package com.baysheet.web;

import com.baysheet.engine.InputError;
import com.baysheet.project.LineLoadEntry;

/**
 * Reads the line load form: the line and its bounds by grid line name, the dead load per length or, for
 * cladding, a weight per area and a height (the form's {@code deadBy} chooses), and an optional live load.
 * Every field is read before the entry is made, so every refusal shows at once.
 */
final class LineLoadForm {
    private LineLoadForm() {}

    /** The entry, or null after recording the form's errors. */
    static LineLoadEntry read(Form f) {
        boolean cladding = f.text("deadBy").equals("pressure");
        double dead = cladding ? Double.NaN : f.number("dead");
        double pressure = cladding ? f.number("deadPressure") : Double.NaN;
        double height = cladding ? f.number("height") : Double.NaN;
        double live = f.optionalNumber("live");
        String occupancy = f.text("liveOccupancy");
        if (!f.ok()) return null;
        try {
            return new LineLoadEntry(null, f.text("line"), f.text("from"), f.text("to"), f.text("label"), dead, pressure,
                    height, Double.isNaN(live) ? 0 : live, occupancy.isEmpty() ? null : occupancy, f.checked("partitionWall"));
        } catch (InputError e) {
            f.reject(e.field(), e.problem());
            return null;
        }
    }
}
