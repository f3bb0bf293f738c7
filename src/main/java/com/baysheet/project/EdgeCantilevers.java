package com.baysheet.project;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Side;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * The bay editor's shortcut for a cantilever slab given to several ticked bays at once: each side's cantilever lands
 * only on the ticked bays on that building edge, those whose neighbour across the side is outside the grid or an
 * unframed cell once the apply is done; the other ticked bays get the rest of the assignment without it. An opening
 * across the side is not the building edge (a whole-floor balcony does not project into a stair). Where no ticked
 * bay is on that edge, the cantilever goes to every ticked bay as asked, and the model's own check refuses one over
 * the next bay ({@code framing.ModelCheck}): the shortcut never creates a cantilever the model would refuse.
 */
public final class EdgeCantilevers {
    private EdgeCantilevers() {}

    /** The bays the assignment puts in its cells, given what the level holds now and the grid's size in cells. */
    public static List<Bay> place(BayAssignment a, List<Bay> held, int cols, int rows) {
        List<Bay> out = new ArrayList<>();
        if (a.opening() || a.cantilevers().isEmpty()) {
            for (Cell c : a.cells()) out.add(a.bayAt(c));
            return out;
        }
        Map<Side, Set<Cell>> onEdge = onEdge(a, held, cols, rows);
        for (Cell c : a.cells()) {
            Map<Side, Double> mine = new EnumMap<>(Side.class);
            a.cantilevers().forEach((side, len) -> {
                Set<Cell> edge = onEdge.get(side);
                if (edge.isEmpty() || edge.contains(c)) mine.put(side, len);
            });
            out.add(new Bay(c.col(), c.row(), a.occupancy(), a.deadLoad(), a.framing(), false, mine, a.cantileverOccupancy()));
        }
        return out;
    }

    /** For each side with a cantilever, the ticked cells on that building edge. */
    private static Map<Side, Set<Cell>> onEdge(BayAssignment a, List<Bay> held, int cols, int rows) {
        Set<Cell> ticked = new HashSet<>(a.cells());
        Set<Cell> occupied = new HashSet<>();
        for (Bay b : held) occupied.add(new Cell(b.col(), b.row()));
        Map<Side, Set<Cell>> out = new EnumMap<>(Side.class);
        for (Side side : a.cantilevers().keySet()) {
            Set<Cell> edge = new HashSet<>();
            for (Cell c : a.cells()) {
                int col = c.col() + (side == Side.EAST ? 1 : side == Side.WEST ? -1 : 0);
                int row = c.row() + (side == Side.NORTH ? 1 : side == Side.SOUTH ? -1 : 0);
                boolean outside = col < 0 || row < 0 || col >= cols || row >= rows;
                if (outside || !ticked.contains(new Cell(col, row)) && !occupied.contains(new Cell(col, row))) edge.add(c);
            }
            out.put(side, edge);
        }
        return out;
    }
}
