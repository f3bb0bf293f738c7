package com.baysheet.engine.snow;

import com.baysheet.engine.Check;

/**
 * A project's snow inputs, in the project's base units.
 *
 * @param groundLoad ground snow load p_g, psf (US) or kN/m² (SI), from the map or the authority having
 *                   jurisdiction; a project input, never guessed. 0 or more, finite.
 */
public record SnowSite(double groundLoad, Exposure exposure, Thermal thermal, Importance importance) {
    public SnowSite {
        Check.nonNegative("groundSnowLoad", groundLoad);
        Check.present("exposure", exposure);
        Check.present("thermal", thermal);
        Check.present("importance", importance);
    }
}
