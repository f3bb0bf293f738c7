package com.baysheet.project;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Side;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/** A cantilever slab given to several ticked bays lands only on those on that building edge (3 × 2 bays here). */
class EdgeCantileversTest {
    private static final Framing Y2 = new Framing(Direction.Y, 2);

    private static List<Cell> cells(int cols, int rows) {
        List<Cell> out = new ArrayList<>();
        for (int r = 0; r < rows; r++) for (int c = 0; c < cols; c++) out.add(new Cell(c, r));
        return out;
    }

    private static BayAssignment office(List<Cell> cells, Map<Side, Double> cantilevers) {
        return new BayAssignment(cells, false, "office", 65, Y2, cantilevers, null).cantileversOnEdges();
    }

    private static List<Cell> with(List<Bay> bays, Side side) {
        return bays.stream().filter(b -> b.cantilevers().containsKey(side)).map(b -> new Cell(b.col(), b.row())).toList();
    }

    @Test
    void aWholeFloorGetsItsNorthCantileverOnTheNorthRowOnlyAndEveryBayTheRest() {
        List<Bay> bays = office(cells(3, 2), Map.of(Side.NORTH, 6.0)).bays(List.of(), 3, 2);
        assertThat(bays).hasSize(6).allMatch(b -> b.occupancy().equals("office") && b.deadLoad() == 65 && b.framing().equals(Y2));
        assertThat(with(bays, Side.NORTH)).containsExactlyInAnyOrder(new Cell(0, 1), new Cell(1, 1), new Cell(2, 1));
    }

    @Test
    void eachSideLandsOnItsOwnEdge() {
        List<Bay> bays = office(cells(3, 2), Map.of(Side.EAST, 4.0, Side.SOUTH, 5.0)).bays(List.of(), 3, 2);
        assertThat(with(bays, Side.EAST)).containsExactlyInAnyOrder(new Cell(2, 0), new Cell(2, 1));
        assertThat(with(bays, Side.SOUTH)).containsExactlyInAnyOrder(new Cell(0, 0), new Cell(1, 0), new Cell(2, 0));
    }

    @Test
    void aBayAlreadyFramedBeyondTheTickedOnesIsNotTheEdgeButAnUnframedCellIs() {
        // the north row ticked alone: beyond (0,1) nothing (the grid's edge); the south row holds bays at (1,0) only
        List<Bay> held = List.of(Bay.floor(1, 0, "office", 65, Y2));
        List<Bay> bays = office(List.of(new Cell(0, 1), new Cell(1, 1), new Cell(2, 1)), Map.of(Side.SOUTH, 3.0)).bays(held, 3, 2);
        // (1,1) has a framed bay to its south; (0,1) and (2,1) have unframed cells there: the building's edge
        assertThat(with(bays, Side.SOUTH)).containsExactlyInAnyOrder(new Cell(0, 1), new Cell(2, 1));
    }

    @Test
    void anOpeningBeyondIsNotTheBuildingEdge() {
        List<Bay> held = List.of(Bay.opening(1, 1));
        List<Bay> bays = office(List.of(new Cell(0, 0), new Cell(1, 0), new Cell(2, 0)), Map.of(Side.NORTH, 6.0)).bays(held, 3, 2);
        // (0,0) and (2,0) have unframed cells to the north, (1,0) the stair opening: no slab into the stair
        assertThat(with(bays, Side.NORTH)).containsExactlyInAnyOrder(new Cell(0, 0), new Cell(2, 0));
    }

    @Test
    void whereNoTickedBayIsOnTheEdgeEveryOneGetsItAsAskedForTheModelToRefuse() {
        // the middle bays of a 3 × 3 grid ticked with the rest framed: none is on the north edge
        List<Bay> held = new ArrayList<>();
        for (Cell c : cells(3, 3)) held.add(Bay.floor(c.col(), c.row(), "office", 65, Y2));
        List<Bay> bays = office(List.of(new Cell(1, 1)), Map.of(Side.NORTH, 6.0)).bays(held, 3, 3);
        assertThat(with(bays, Side.NORTH)).containsExactly(new Cell(1, 1));
    }

    @Test
    void withoutTheShortcutEveryCellGetsTheSameBay() {
        List<Bay> bays = new BayAssignment(cells(3, 2), false, "office", 65, Y2, Map.of(Side.NORTH, 6.0)).bays(List.of(), 3, 2);
        assertThat(with(bays, Side.NORTH)).hasSize(6);
    }
}
