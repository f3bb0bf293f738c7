package com.baysheet.framing.model;

import com.baysheet.engine.Check;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.OccupancyCatalogue;

import java.util.EnumMap;
import java.util.Map;

/**
 * One grid cell on a level: its occupancy (a catalogue id), its dead load, its framing, and optionally a
 * slab cantilever past the building edge on one or more sides. An opening has no floor at all.
 *
 * @param col         cell index along x (between x lines col and col + 1)
 * @param row         cell index along y
 * @param deadLoad    dead load of the floor construction, framing allowance and superimposed dead load, psf or kN/m²
 * @param cantilevers slab projection past the edge by side, ft or m
 * @param cantileverOccupancy the occupancy of all the bay's cantilever slabs, a catalogue id; null for the
 *                    default, the balcony or deck serving the bay's occupancy (see {@link #cantileverUse})
 */
public record Bay(int col, int row, String occupancy, double deadLoad, Framing framing, boolean opening,
                  Map<Side, Double> cantilevers, String cantileverOccupancy) {
    public Bay {
        if (col < 0) throw new InputError("bay.col", col, "must be 0 or more");
        if (row < 0) throw new InputError("bay.row", row, "must be 0 or more");
        cantilevers = cantilevers.isEmpty() ? Map.of() : Map.copyOf(new EnumMap<>(cantilevers));
        if (!opening) {
            Check.text("bay.occupancy", occupancy);
            Check.nonNegative("bay.deadLoad", deadLoad);
            Check.present("bay.framing", framing);
        } else if (!cantilevers.isEmpty()) {
            throw new InputError("bay.cantilevers", cantilevers.keySet(), "an opening carries no cantilever slab");
        }
        for (Map.Entry<Side, Double> c : cantilevers.entrySet())
            Check.positive("bay.cantilevers." + c.getKey().name().toLowerCase(), c.getValue());
        if (opening || (cantileverOccupancy != null && cantileverOccupancy.isBlank())) cantileverOccupancy = null;
    }

    /** A bay whose cantilever slabs, if any, carry the default: the balcony serving its occupancy. */
    public Bay(int col, int row, String occupancy, double deadLoad, Framing framing, boolean opening,
               Map<Side, Double> cantilevers) {
        this(col, row, occupancy, deadLoad, framing, opening, cantilevers, null);
    }

    /**
     * The occupancy id the cantilever slabs carry: the one given, or by default the balcony or deck row
     * serving the bay's occupancy (the conservative choice: 1.5 L0 of the area served), or the bay's own
     * occupancy where none derives (a roof overhang stays roof).
     */
    public String cantileverUse(OccupancyCatalogue catalogue) {
        return cantileverOccupancy != null ? cantileverOccupancy : catalogue.balconyOf(occupancy);
    }

    public Bay withCantileverOccupancy(String id) {
        return new Bay(col, row, occupancy, deadLoad, framing, opening, cantilevers, id);
    }

    public static Bay floor(int col, int row, String occupancy, double deadLoad, Framing framing) {
        return new Bay(col, row, occupancy, deadLoad, framing, false, Map.of());
    }

    public static Bay opening(int col, int row) {
        return new Bay(col, row, null, 0, null, true, Map.of());
    }

    public Bay withCantilever(Side side, double length) {
        Map<Side, Double> m = new EnumMap<>(Side.class);
        m.putAll(cantilevers);
        m.put(side, length);
        return new Bay(col, row, occupancy, deadLoad, framing, opening, m, cantileverOccupancy);
    }
}
