package com.baysheet.framing.model;

import com.baysheet.engine.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;

/**
 * The span of a bay's one-way slab, and the longest a layout may give before it is cautioned against. The slab spans
 * across the beams: beams along y are spaced along x, so the slab spans the bay's x width divided by (infill beams + 1),
 * and the other way for beams along x. The limit is common practice (15 ft, 4.5 m: data in framing/practice.json), not
 * a code provision.
 */
public final class SlabSpan {
    private static final double US_LIMIT;
    private static final double SI_LIMIT;

    static {
        try (InputStream in = SlabSpan.class.getResourceAsStream("/framing/practice.json")) {
            if (in == null) throw new IllegalStateException("missing resource framing/practice.json");
            JsonNode n = new ObjectMapper().readTree(in).path("oneWaySlabSpan");
            US_LIMIT = n.path("US").asDouble(Double.NaN);
            SI_LIMIT = n.path("SI").asDouble(Double.NaN);
            if (!(US_LIMIT > 0) || !(SI_LIMIT > 0)) throw new IllegalStateException("framing/practice.json: oneWaySlabSpan needs US and SI limits");
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private SlabSpan() {}

    /** The longest one-way slab span before a caution, ft or m (common practice). */
    public static double limit(UnitSystem units) {
        return units == UnitSystem.US ? US_LIMIT : SI_LIMIT;
    }

    /** The slab span of a framed bay in this grid, ft or m; NaN for an opening. */
    public static double of(Grid g, Bay b) {
        if (b.opening()) return Double.NaN;
        double across = b.framing().beams() == Direction.Y ? g.x().spacing(b.col()) : g.y().spacing(b.row());
        return across / (b.framing().infillBeams() + 1);
    }

    /** Whether the bay's slab spans farther than the limit. */
    public static boolean tooLong(Grid g, Bay b, UnitSystem units) {
        return of(g, b) > limit(units);
    }
}
