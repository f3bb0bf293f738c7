package com.baysheet.framing.model;

import com.baysheet.engine.Check;

import java.util.List;

/**
 * A level of the building: name, elevation (ft or m), whether it is a roof, the roof slope for Lr
 * (in/ft or percent; NaN for a floor), and its bays. Grid cells without a bay are not framed at this level.
 */
public record Level(String name, double elevation, boolean roof, double roofSlope, List<Bay> bays) {
    public Level {
        Check.text("level.name", name);
        Check.finite("level.elevation", elevation);
        // the field names the level, so that a form or the API can show the error beside it
        if (roof) Check.nonNegative("levels[" + name + "].roofSlope", roofSlope);
        bays = List.copyOf(bays);
    }

    public static Level floor(String name, double elevation, List<Bay> bays) {
        return new Level(name, elevation, false, Double.NaN, bays);
    }

    public static Level roof(String name, double elevation, double slope, List<Bay> bays) {
        return new Level(name, elevation, true, slope, bays);
    }
}
