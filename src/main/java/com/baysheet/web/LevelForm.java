package com.baysheet.web;

import com.baysheet.engine.snow.Choices;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.units.Display;
import com.baysheet.framing.model.RoofSurface;
import com.baysheet.store.LevelInfo;
import com.baysheet.store.StoredLevel;

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

    /** Reads the numbers (recording errors on the form); the record's own checks run inside {@link Form#attempt}. */
    static Values read(Form f) {
        boolean roof = f.checked("roof");
        double elevation = f.number("elevation");
        double slope = roof ? f.number("roofSlope") : Double.NaN;
        double w = roof ? f.optionalNumber("eaveToRidge") : Double.NaN;
        String shape = f.text("roofShape");
        return new Values(f.text("name"), elevation, roof, slope, shape.isEmpty() ? "MONOSLOPE" : shape, f.checked("slippery"), w);
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
