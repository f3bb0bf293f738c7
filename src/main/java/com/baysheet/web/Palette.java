package com.baysheet.web;

import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.code.OccupancyCatalogue;

import java.util.ArrayList;
import java.util.List;

/** Fill colours for occupancies, fixed by catalogue order so that an occupancy looks the same on every page. */
final class Palette {
    /** Light tints that keep black text and member lines readable over them. */
    private static final String[] TINTS = {"#cfe3f5", "#f7dcb4", "#d5ecc8", "#f3c9c9", "#e2d5f0", "#f5efb8",
            "#c8ece8", "#eed3e6", "#dedede", "#f0e0cc", "#cde0d6", "#dfe8b8"};

    private final List<String> ids = new ArrayList<>();

    Palette(OccupancyCatalogue catalogue) {
        for (Occupancy o : catalogue.all()) ids.add(o.id());
    }

    String fill(String occupancy) {
        int i = ids.indexOf(occupancy);
        return i < 0 ? "#ffffff" : TINTS[i % TINTS.length];
    }
}
