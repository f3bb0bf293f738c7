package com.baysheet.web;

import com.baysheet.engine.InputError;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.store.PointLoadEntry;
import com.baysheet.web.entry.LengthField;
import com.baysheet.engine.units.Unit;

/**
 * Reads the point load form: in a bay (the lines at its west and south sides and the offsets from that corner) or on a
 * grid-line member (the line, the crossing lines and the distance from the first), as the form's {@code placeBy}
 * chooses; offsets as engineers write lengths (25'-6", 7.5 m); a dead and an optional live load with its occupancy.
 * Every field is read before the entry is made, so every refusal shows at once.
 */
final class PointLoadForm {
    private PointLoadForm() {}

    /** An offset may be 0 (at the bay's corner, at the member's end); a negative one is refused by the entry. */
    private static LengthField offset(String label) { return new LengthField(label, true, Unit.FT, Unit.M); }

    /** The entry, or null after recording the form's errors. */
    static PointLoadEntry read(Form f, UnitSystem units) {
        boolean inBay = !f.text("placeBy").equals("member");
        double x = inBay ? f.length("x", offset("Offset x from the bay's west side"), units) : Double.NaN;
        double y = inBay ? f.length("y", offset("Offset y from the bay's south side"), units) : Double.NaN;
        double distance = inBay ? Double.NaN : f.length("distance", offset("Distance from the first line"), units);
        double dead = f.optionalNumber("dead");
        double live = f.optionalNumber("live");
        String occupancy = f.text("liveOccupancy");
        if (!f.ok()) return null;
        try {
            double d = Double.isNaN(dead) ? 0 : dead, l = Double.isNaN(live) ? 0 : live;
            String occ = occupancy.isEmpty() ? null : occupancy;
            return inBay ? PointLoadEntry.inBay(f.text("label"), f.text("xLine"), f.text("yLine"), x, y, d, l, occ)
                    : PointLoadEntry.onMember(f.text("label"), null, f.text("line"), f.text("from"), f.text("to"), distance, d, l, occ);
        } catch (InputError e) {
            f.reject(e.field(), e.problem());
            return null;
        }
    }
}
