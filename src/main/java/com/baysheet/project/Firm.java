package com.baysheet.project;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Editions;

/**
 * The firm as its sheets print it, the code edition new projects start with, and the members' self weight
 * by role that every project's framing carries (plf; SI projects take them converted to kN/m; 0: not included).
 */
public record Firm(String name, String logoText, String defaultEdition, double infillBeamWeight, double gridBeamWeight,
                   double girderWeight, double columnWeight, long version) {
    /** No self weight set. */
    public Firm(String name, String logoText, String defaultEdition, long version) {
        this(name, logoText, defaultEdition, 0, 0, 0, 0, version);
    }

    public Firm {
        Check.nonNegative("infillBeamWeight", infillBeamWeight);
        Check.nonNegative("gridBeamWeight", gridBeamWeight);
        Check.nonNegative("girderWeight", girderWeight);
        Check.nonNegative("columnWeight", columnWeight);
        name = limited("firmName", Check.text("firmName", name).strip(), 200);
        logoText = limited("logoText", logoText == null ? "" : logoText.strip(), 60);
        Check.text("defaultEdition", defaultEdition);
        Editions.builtIn().get(defaultEdition);
    }

    private static String limited(String field, String v, int max) {
        if (v.length() > max) throw new InputError(field, v.length() + " characters", "must be at most " + max + " characters");
        return v;
    }
}
