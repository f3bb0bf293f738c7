package com.baysheet.framing;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;
import org.assertj.core.api.ThrowableAssert.ThrowingCallable;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

/** Bad models are refused with an input error whose field names the level, grid line or bay. */
class ModelCheckTest {
    private static final Grid GRID = Buildings.grid(new double[] {20, 25}, new double[] {22, 24});
    private static final Framing FRAMING = new Framing(Direction.X, 1);

    private static Bay office(int c, int r) { return Bay.floor(c, r, "office", 60, FRAMING); }

    private static List<Bay> all() { return Buildings.everyBay(GRID, ModelCheckTest::office); }

    private static InputError refused(ThrowingCallable call) {
        InputError e = catchThrowableOfType(InputError.class, call);
        assertThat(e).as("an InputError").isNotNull();
        return e;
    }

    private static InputError derive(Level... levels) {
        return refused(() -> Derivation.derive(Buildings.building(GRID, List.of(levels))));
    }

    @Test
    void gridLinesOutOfOrderAreRefusedNamingTheLine() {
        InputError e = refused(() -> GridAxis.ofPositions("x", List.of("1", "2", "3"), List.of(0.0, 30.0, 25.0)));
        assertThat(e.field()).isEqualTo("grid.x.positions[3]");
        assertThat(e.value()).isEqualTo("25.0");
    }

    @Test
    void twoGridLinesAtOnePositionAreRefusedNamingTheLine() {
        InputError e = refused(() -> GridAxis.ofPositions("y", List.of("A", "B", "C"), List.of(0.0, 20.0, 20.0)));
        assertThat(e.field()).isEqualTo("grid.y.positions[C]");
    }

    @Test
    void aGridLineNamedTwiceIsRefusedNamingIt() {
        InputError e = refused(() -> GridAxis.ofPositions("y", List.of("A", "B", "A"), List.of(0.0, 20.0, 40.0)));
        assertThat(e.field()).startsWith("grid.y.names");
        assertThat(e.field() + e.value()).contains("A");
    }

    @Test
    void zeroOrNegativeSpacingsAreRefusedNamingTheLinesEitherSide() {
        for (double s : new double[] {0, -5, Double.NaN}) {
            InputError e = refused(() -> new GridAxis("x", List.of("1", "2", "3"), List.of(20.0, s)));
            assertThat(e.field()).as("spacing %s", s).isEqualTo("grid.x.spacings[2-3]");
        }
    }

    @Test
    void aBayOutsideTheGridIsRefusedNamingTheLevelAndTheBay() {
        List<Bay> bays = new ArrayList<>(all());
        bays.add(office(2, 0));
        InputError e = derive(Level.floor("F2", 12, bays));
        assertThat(e.field()).isEqualTo("levels[F2].bays[2,0]");
    }

    @Test
    void aBayGivenTwiceIsRefusedNamingTheLevelAndTheBay() {
        List<Bay> bays = new ArrayList<>(all());
        bays.add(office(1, 0));
        InputError e = derive(Level.floor("F2", 12, bays));
        assertThat(e.field()).isEqualTo("levels[F2].bays[" + GRID.bayName(1, 0) + "]");
        assertThat(e.field()).contains("Y1-Y2/2-3");
    }

    @Test
    void aLevelWithNoFloorAtAllIsRefusedNamingTheLevel() {
        List<Bay> openings = Buildings.everyBay(GRID, Bay::opening);
        assertThat(derive(Level.floor("F2", 12, all()), Level.floor("F3", 24, openings)).field()).isEqualTo("levels[F3].bays");
        assertThat(derive(Level.floor("F4", 12, List.of())).field()).isEqualTo("levels[F4].bays");
    }

    @Test
    void aCantileverOverTheNextBayIsRefusedNamingTheBayAndTheSide() {
        List<Bay> bays = new ArrayList<>(all());
        bays.removeIf(b -> b.col() == 0 && b.row() == 0);
        bays.add(office(0, 0).withCantilever(Side.EAST, 5));
        InputError e = derive(Level.floor("F2", 12, bays));
        assertThat(e.field()).isEqualTo("levels[F2].bays[" + GRID.bayName(0, 0) + "].cantilevers.east");
    }

    @Test
    void aCantileverPastTheEdgeIsAccepted() {
        List<Bay> bays = new ArrayList<>(all());
        bays.removeIf(b -> b.col() == 0 && b.row() == 0);
        bays.add(office(0, 0).withCantilever(Side.WEST, 5).withCantilever(Side.SOUTH, 4));
        Derived d = Derivation.derive(Buildings.building(GRID, List.of(Level.floor("F2", 12, bays))));
        assertThat(d.members()).isNotEmpty();
    }

    @Test
    void anUnknownOccupancyIsRefusedNamingTheLevelAndTheBay() {
        List<Bay> bays = new ArrayList<>(all());
        bays.removeIf(b -> b.col() == 1 && b.row() == 1);
        bays.add(Bay.floor(1, 1, "ofice", 60, FRAMING));
        InputError e = derive(Level.floor("F2", 12, bays));
        assertThat(e.field()).isEqualTo("levels[F2].bays[" + GRID.bayName(1, 1) + "].occupancy");
        assertThat(e.value()).isEqualTo("ofice");
    }

    @Test
    void aRoofBayWithoutASlopeIsRefusedNamingTheLevel() {
        List<Bay> roof = Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "roof-ordinary", 20, FRAMING));
        InputError e = derive(Level.floor("F2", 12, all()), Level.floor("R", 24, roof));
        assertThat(e.field()).isEqualTo("levels[R].roofSlope");
        assertThat(e.getMessage()).contains(GRID.bayName(0, 0));
        InputError f = refused(() -> Level.roof("R", 24, Double.NaN, roof));
        assertThat(f.field()).isEqualTo("levels[R].roofSlope");
    }

    @Test
    void aNegativeBayIndexIsRefused() {
        assertThat(refused(() -> office(-1, 0)).field()).isEqualTo("bay.col");
    }
}
