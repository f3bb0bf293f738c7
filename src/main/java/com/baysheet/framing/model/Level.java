package com.baysheet.framing.model;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;

import java.util.List;

/**
 * A level of the building: name, elevation (ft or m), whether it is a roof, the roof slope for Lr
 * (in/ft or percent; NaN for a floor), and its bays. Grid cells without a bay are not framed at this level.
 *
 * @param key the level's stable key in member ids (the store gives "L" and the level's row id; null: the
 *            derivation numbers the level by its place in the building, "L0", "L1", ...). URL-safe.
 * @param surface a roof's shape, surface and W for its snow load ({@link RoofSurface#DEFAULT} on floors)
 */
public record Level(String name, double elevation, boolean roof, double roofSlope, List<Bay> bays, String key, RoofSurface surface) {
    public Level(String name, double elevation, boolean roof, double roofSlope, List<Bay> bays) {
        this(name, elevation, roof, roofSlope, bays, null);
    }

    public Level(String name, double elevation, boolean roof, double roofSlope, List<Bay> bays, String key) {
        this(name, elevation, roof, roofSlope, bays, key, RoofSurface.DEFAULT);
    }

    public Level {
        if (key != null && !key.matches("[A-Za-z0-9]+")) throw new InputError("level.key", key, "must be letters and digits");
        Check.text("level.name", name);
        Check.finite("level.elevation", elevation);
        // the field names the level, so that a form or the API can show the error beside it
        if (roof) Check.nonNegative("levels[" + name + "].roofSlope", roofSlope);
        bays = List.copyOf(bays);
        if (surface == null) surface = RoofSurface.DEFAULT;
    }

    public Level withKey(String levelKey) {
        return new Level(name, elevation, roof, roofSlope, bays, levelKey, surface);
    }

    public Level withSurface(RoofSurface s) {
        return new Level(name, elevation, roof, roofSlope, bays, key, s);
    }

    public static Level floor(String name, double elevation, List<Bay> bays) {
        return new Level(name, elevation, false, Double.NaN, bays);
    }

    public static Level roof(String name, double elevation, double slope, List<Bay> bays) {
        return new Level(name, elevation, true, slope, bays);
    }
}
