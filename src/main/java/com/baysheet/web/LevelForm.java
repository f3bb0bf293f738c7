package com.baysheet.web;

import com.baysheet.engine.snow.Choices;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.units.Display;
import com.baysheet.framing.model.RoofSurface;
import com.baysheet.project.LevelInfo;
import com.baysheet.project.StoredLevel;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.web.entry.LengthField;

import java.util.HashMap;
import java.util.Map;

/**
 * A level as a form: name, elevation, roof and roof slope (required for a roof, ignored for a floor), and for a roof its
 * snow surface (shape, slippery, eave-to-ridge W).
 */
final class LevelForm {
    private LevelForm() {}

    static Map<String, String> values(StoredLevel l, long version) {
        Map<String, String> v = new HashMap<>(Map.of("version", String.valueOf(version), "name", l.name(),
                "elevation", Display.plain(l.info().elevation())));
        if (l.info().roof()) {
            v.put("roof", "on");
            v.put("roofSlope", Display.plain(l.info().roofSlope()));
            RoofSurface r = l.info().surface();
            v.put("roofShape", r.shape().name());
            if (r.slippery()) v.put("slippery", "on");
            if (!Double.isNaN(r.eaveToRidge())) v.put("eaveToRidge", Display.plain(r.eaveToRidge()));
        }
        return v;
    }

    /** Reads every field (recording all errors on the form at once); the record is checked again inside {@link Form#attempt}. */
    static Values read(Form f, UnitSystem units) {
        boolean roof = f.checked("roof");
        String name = f.text("name");
        // the level's own check of the name, run now so that its refusal shows beside the others
        f.check("name", () -> new LevelInfo(name, 0, false, Double.NaN));
        double elevation = f.length("elevation", LengthField.elevation("Elevation"), units);
        double slope = roof ? f.slope("roofSlope", "Roof slope", units) : Double.NaN;
        if (roof && !Double.isNaN(slope)) f.check("roofSlope", () -> new LevelInfo("slope", 0, true, slope));
        double w = roof ? f.optionalLength("eaveToRidge", LengthField.span("Eave to ridge"), units) : Double.NaN;
        String shape = f.text("roofShape");
        return new Values(name, elevation, roof, slope, shape.isEmpty() ? "MONOSLOPE" : shape, f.checked("slippery"), w);
    }

    /**
     * "And N more like it above" on the add-a-level form: how many (blank or 0 for none) and the storey height between
     * them; the count and height are checked again, with the project's caps, when the levels are added.
     */
    static Repeat repeat(Form f, UnitSystem units) {
        if (f.text("repeat").isEmpty() || f.text("repeat").equals("0")) return new Repeat(0, Double.NaN);
        int count = f.integer("repeat");
        if (count < 0) f.reject("repeat", "must be a count of levels, 1 or more (blank for none)");
        double height = f.length("repeatHeight", LengthField.span("Storey height"), units);
        Repeat r = new Repeat(count, height);
        if (count > 0 && !Double.isNaN(height)) f.check("repeat", r::rule);
        return r;
    }

    /** The levels to add above the new one; {@code count} 0 for none. */
    record Repeat(int count, double storeyHeight) {
        com.baysheet.store.TypicalRepeat rule() {
            return count == 0 ? null : new com.baysheet.store.TypicalRepeat(count, storeyHeight, "repeat", "repeatHeight");
        }
    }

    /** The roof's snow surface: shape (default monoslope), slippery (default not), W (blank: not given). */
    record Values(String name, double elevation, boolean roof, double roofSlope, String roofShape, boolean slippery, double eaveToRidge) {
        LevelInfo info() {
            RoofSurface s = roof ? new RoofSurface(Choices.parse(SnowRoof.Shape.class, "roofShape", roofShape), slippery, eaveToRidge)
                    : RoofSurface.DEFAULT;
            return new LevelInfo(name, elevation, roof, roofSlope, s);
        }
    }
}
