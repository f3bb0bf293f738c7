package com.baysheet.project;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.framing.model.RoofSurface;

/**
 * A level as entered: name, elevation (ft or m, may be below grade), whether it is a roof, and the roof
 * slope for Lr (in/ft or percent; NaN for a floor), and a roof's shape, surface and W for its snow load (the
 * defaults on a floor).
 */
public record LevelInfo(String name, double elevation, boolean roof, double roofSlope, RoofSurface surface) {
    /** Monoslope, not slippery, no W. */
    public LevelInfo(String name, double elevation, boolean roof, double roofSlope) {
        this(name, elevation, roof, roofSlope, RoofSurface.DEFAULT);
    }

    /** A slope steeper than this (in/ft or %) is a typo rather than a roof; 4.8.2 stops mattering well before. */
    public static final double MAX_SLOPE = 100;

    public LevelInfo {
        name = Check.text("name", name).strip();
        if (name.length() > 60) throw new InputError("name", name.length() + " characters", "must be at most 60 characters");
        Check.finite("elevation", elevation);
        if (roof) Check.within("roofSlope", roofSlope, 0, MAX_SLOPE);
        else roofSlope = Double.NaN;
        if (surface == null || !roof) surface = RoofSurface.DEFAULT;
    }
}
