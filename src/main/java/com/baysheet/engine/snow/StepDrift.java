package com.baysheet.engine.snow;

import com.baysheet.engine.Check;

import java.util.List;

/**
 * A roof step found in the model and the member's strips that its drift may load.
 *
 * @param where    the step as the sheet names it ("grid line B, 2-3, 12.0 ft high")
 * @param pastEnds some of the strips lie past a free end of the wall, where the drift is carried on for the drift width
 *                 w with the profile it has at the wall (our choice, common practice: the code gives no rule at the
 *                 ends of a wall; the record says so)
 */
public record StepDrift(RoofStep step, String where, List<DriftStrip> strips, boolean pastEnds) {
    public StepDrift {
        Check.present("step", step);
        where = Check.text("drift.where", where).strip();
        strips = List.copyOf(strips);
    }

    /** Strips along the wall's own length only. */
    public StepDrift(RoofStep step, String where, List<DriftStrip> strips) { this(step, where, strips, false); }
}
