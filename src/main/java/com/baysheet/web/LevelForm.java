package com.baysheet.web;

import com.baysheet.engine.units.Display;
import com.baysheet.store.LevelInfo;
import com.baysheet.store.StoredLevel;

import java.util.HashMap;
import java.util.Map;

/** A level as a form: name, elevation, roof and roof slope (required for a roof, ignored for a floor). */
final class LevelForm {
    private LevelForm() {}

    static Map<String, String> values(StoredLevel l, long version) {
        Map<String, String> v = new HashMap<>(Map.of("version", String.valueOf(version), "name", l.name(),
                "elevation", Display.plain(l.info().elevation())));
        if (l.info().roof()) {
            v.put("roof", "on");
            v.put("roofSlope", Display.plain(l.info().roofSlope()));
        }
        return v;
    }

    /** Reads the numbers (recording errors on the form); the record's own checks run inside {@link Form#attempt}. */
    static Values read(Form f) {
        boolean roof = f.checked("roof");
        double elevation = f.number("elevation");
        double slope = roof ? f.number("roofSlope") : Double.NaN;
        return new Values(f.text("name"), elevation, roof, slope);
    }

    record Values(String name, double elevation, boolean roof, double roofSlope) {
        LevelInfo info() { return new LevelInfo(name, elevation, roof, roofSlope); }
    }
}
