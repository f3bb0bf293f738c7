package com.baysheet.project;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Limits;
import com.baysheet.framing.model.Side;

import java.util.List;
import java.util.Map;

/**
 * One action of the bay editor: the selected cells all get the same bay (occupancy, dead load in psf or kPa,
 * framing, cantilevers in ft or m, the cantilever slabs' occupancy or null for the default balcony), or all
 * become an opening. With {@code onEdges} (the bay editor's Apply) a cantilever lands only on the cells on that
 * building edge ({@link EdgeCantilevers}).
 */
public record BayAssignment(List<Cell> cells, boolean opening, String occupancy, double deadLoad, Framing framing,
                            Map<Side, Double> cantilevers, String cantileverOccupancy, boolean onEdges) {
    public BayAssignment {
        // a cell named twice is one cell (else the second insert breaks the bay's key)
        cells = List.copyOf(new java.util.LinkedHashSet<>(cells));
        Limits.count("cells", cells.size(), Limits.MAX_CELLS_PER_REQUEST, "cells in one request");
        if (cells.isEmpty()) throw new InputError("cells", "none", "select at least one bay");
        cantilevers = Map.copyOf(cantilevers);
        if (opening || (cantileverOccupancy != null && cantileverOccupancy.isBlank())) cantileverOccupancy = null;
        bayAt(cells.get(0), opening, occupancy, deadLoad, framing, cantilevers, cantileverOccupancy);
    }

    /** Every cell gets the same bay, cantilevers and all. */
    public BayAssignment(List<Cell> cells, boolean opening, String occupancy, double deadLoad, Framing framing,
                         Map<Side, Double> cantilevers, String cantileverOccupancy) {
        this(cells, opening, occupancy, deadLoad, framing, cantilevers, cantileverOccupancy, false);
    }

    /** The same assignment, its cantilevers landing only on the cells on that building edge. */
    public BayAssignment cantileversOnEdges() {
        return new BayAssignment(cells, opening, occupancy, deadLoad, framing, cantilevers, cantileverOccupancy, true);
    }

    /** The bays it puts in its cells, given what the level holds now (needed only for {@code onEdges}). */
    public List<Bay> bays(List<Bay> held, int cols, int rows) {
        if (!onEdges) return cells.stream().map(this::bayAt).toList();
        return EdgeCantilevers.place(this, held, cols, rows);
    }

    /** An assignment whose cantilever slabs carry the default, the balcony serving the bay's occupancy. */
    public BayAssignment(List<Cell> cells, boolean opening, String occupancy, double deadLoad, Framing framing,
                         Map<Side, Double> cantilevers) {
        this(cells, opening, occupancy, deadLoad, framing, cantilevers, null);
    }

    public static BayAssignment opening(List<Cell> cells) {
        return new BayAssignment(cells, true, null, 0, null, Map.of());
    }

    public Bay bayAt(Cell cell) {
        return bayAt(cell, opening, occupancy, deadLoad, framing, cantilevers, cantileverOccupancy);
    }

    private static Bay bayAt(Cell cell, boolean opening, String occupancy, double deadLoad, Framing framing,
                             Map<Side, Double> cantilevers, String cantileverOccupancy) {
        return opening ? Bay.opening(cell.col(), cell.row())
                : new Bay(cell.col(), cell.row(), occupancy, deadLoad, framing, false, cantilevers, cantileverOccupancy);
    }
}
