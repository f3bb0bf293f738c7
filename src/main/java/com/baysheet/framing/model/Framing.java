package com.baysheet.framing.model;

import com.baysheet.engine.Check;

/**
 * A bay's framing layout: infill beams spanning in {@code beams} direction between girders on the grid
 * lines, {@code infillBeams} of them equally spaced between the two grid-line members parallel to them
 * (0: the slab spans directly between the grid-line members).
 */
public record Framing(Direction beams, int infillBeams) {
    /** A bound that keeps a typo (1000 beams) from looking like a design. */
    public static final int MAX_INFILL_BEAMS = 20;

    public Framing {
        Check.present("framing.beams", beams);
        if (infillBeams < 0 || infillBeams > MAX_INFILL_BEAMS)
            throw new com.baysheet.engine.InputError("framing.infillBeams", infillBeams, "must be from 0 to " + MAX_INFILL_BEAMS);
    }
}
