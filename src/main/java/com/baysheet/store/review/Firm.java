package com.baysheet.store.review;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Editions;

/** The firm as its sheets print it, and the code edition new projects start with. */
public record Firm(String name, String logoText, String defaultEdition, long version) {
    public Firm {
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
