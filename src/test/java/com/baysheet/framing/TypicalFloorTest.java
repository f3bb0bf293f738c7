package com.baysheet.framing;

import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A typical floor takes an earlier level's framing under its own names ({@link TypicalFloor}): what it gives must be
 * what framing the level afresh gives. The same building is derived twice, once with the typical floors' bays listed
 * in another order (a different {@link TypicalFloor.Shape}, so each of those levels is framed afresh, while the
 * framing, which reads bays by cell, is the same), and every member and take-down is compared.
 */
class TypicalFloorTest {
    private static final Grid GRID = Buildings.grid(new double[] {20, 24, 20}, new double[] {25, 30});

    @Test
    void aTypicalFloorIsWhatFramingItAfreshGives() {
        List<Level> levels = new ArrayList<>();
        for (int k = 1; k <= 4; k++) {
            List<Bay> bays = Buildings.everyBay(GRID, (c, r) -> {
                Bay b = Bay.floor(c, r, c == 1 ? "office-corridor" : "office", 55 + 5 * c, new Framing((c + r) % 2 == 0 ? Direction.X : Direction.Y, 2));
                return r == 0 ? b.withCantilever(Side.SOUTH, 5) : b;
            });
            levels.add(Level.floor("F" + k, 12.0 * k, bays));
        }
        levels.add(Level.roof("R", 60, 0.5, Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "roof-ordinary", 25, new Framing(Direction.X, 1)))));
        Building typical = Buildings.building(GRID, levels);
        List<Level> reordered = new ArrayList<>(levels);
        for (int k = 1; k < 4; k++) {
            Level l = levels.get(k);
            List<Bay> bays = new ArrayList<>(l.bays());
            Collections.reverse(bays);
            reordered.set(k, new Level(l.name(), l.elevation(), l.roof(), l.roofSlope(), bays, l.key(), l.surface()));
        }
        Building afresh = Buildings.building(GRID, reordered);
        assertThat(shape(typical, 1)).as("the floors above the first share its shape").isEqualTo(shape(typical, 0));
        assertThat(shape(afresh, 1)).as("reordered, they do not").isNotEqualTo(shape(afresh, 0));

        Derived a = Derivation.derive(typical), b = Derivation.derive(afresh);
        assertThat(a.members()).hasSameSizeAs(b.members());
        for (int k = 0; k < a.members().size(); k++) {
            DerivedMember x = a.members().get(k), y = b.members().get(k);
            assertThat(List.of(x.id(), x.name(), x.level(), x.role(), x.kind(), x.plan(), x.span(), x.tributaryWidth(), x.areas(),
                    x.directArea(), x.bays(), x.tributary()))
                    .as(y.id()).isEqualTo(List.of(y.id(), y.name(), y.level(), y.role(), y.kind(), y.plan(), y.span(), y.tributaryWidth(),
                            y.areas(), y.directArea(), y.bays(), y.tributary()));
            assertThat(x.result().record()).as(y.id()).isEqualTo(y.result().record());
            assertThat(x.result().left()).as(y.id()).isEqualTo(y.result().left());
            assertThat(x.result().right()).as(y.id()).isEqualTo(y.result().right());
        }
        assertThat(a.takeDowns()).hasSameSizeAs(b.takeDowns());
        for (int k = 0; k < a.takeDowns().size(); k++) {
            assertThat(a.takeDowns().get(k).rows()).isEqualTo(b.takeDowns().get(k).rows());
            assertThat(a.takeDowns().get(k).record()).isEqualTo(b.takeDowns().get(k).record());
        }
    }

    private static TypicalFloor.Shape shape(Building b, int level) {
        return TypicalFloor.Shape.of(new LevelPlan("L" + level, b.levels().get(level), b.grid(), true));
    }
}
