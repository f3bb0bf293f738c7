package com.baysheet.engine.snow;

import com.baysheet.engine.Check;

import java.util.List;

/**
 * A roof step found in the model and the member's strips that its drift may load.
 *
 * @param where the step as the sheet names it ("grid line B, 2-3, 12.0 ft high")
 */
public record StepDrift(RoofStep step, String where, List<DriftStrip> strips) {
    public StepDrift {
        Check.present("step", step);
        where = Check.text("drift.where", where).strip();
        strips = List.copyOf(strips);
    }
}
