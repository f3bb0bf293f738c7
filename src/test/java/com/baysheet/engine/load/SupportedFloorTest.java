package com.baysheet.engine.load;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.member.MemberCalculation;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** A column's floors supported are checked where they are given, and against the loads carried. */
class SupportedFloorTest {
    static final SupportedFloor L2 = new SupportedFloor("L2", MemberKind.CORNER_COLUMN_CANTILEVER, List.of(new AreaShare("office", 300)));

    static MemberInput column(int floors, List<SupportedFloor> list, double area) {
        return new MemberInput("C", MemberKind.EXTERIOR_COLUMN, new Support.Axial(), floors, List.of(),
                List.of(new AreaLoad("office", area, 50)), List.of(), 0, Double.NaN, Double.NaN, false, list);
    }

    @Test
    void aFloorTakesAColumnKindAndSomeArea() {
        assertThatThrownBy(() -> new SupportedFloor("L2", MemberKind.INTERIOR_BEAM, List.of(new AreaShare("office", 1))))
                .isInstanceOf(InputError.class).hasMessageContaining("kind");
        assertThatThrownBy(() -> new SupportedFloor("L2", MemberKind.INTERIOR_COLUMN, List.of()))
                .isInstanceOf(InputError.class).hasMessageContaining("areas");
        assertThatThrownBy(() -> new SupportedFloor(" ", MemberKind.INTERIOR_COLUMN, List.of(new AreaShare("office", 1))))
                .isInstanceOf(InputError.class).hasMessageContaining("name");
    }

    @Test
    void theFloorsListedMustMatchTheFloorsSupportedAndTheAreasCarried() {
        assertThatThrownBy(() -> column(2, List.of(L2), 300)).isInstanceOf(InputError.class).hasMessageContaining("floorsSupported");
        assertThatThrownBy(() -> column(2, List.of(L2, L2), 600)).isInstanceOf(InputError.class).hasMessageContaining("floors[1].name");
        assertThatThrownBy(() -> MemberCalculation.calculate(Fixtures.US, column(1, List.of(L2), 310)))
                .isInstanceOf(InputError.class).hasMessageContaining("floors").hasMessageContaining("add up");
        // an occupancy listed that the loads do not carry, and one carried that no floor lists: each named
        SupportedFloor mixed = new SupportedFloor("L2", MemberKind.EXTERIOR_COLUMN, List.of(new AreaShare("office", 300), new AreaShare("retail-upper", 100)));
        assertThatThrownBy(() -> MemberCalculation.calculate(Fixtures.US, column(1, List.of(mixed), 300)))
                .isInstanceOf(InputError.class).hasMessageContaining("retail-upper 100.0").hasMessageContaining("(0.0)");
        assertThatThrownBy(() -> MemberCalculation.calculate(Fixtures.US, new MemberInput("C", MemberKind.EXTERIOR_COLUMN, new Support.Axial(), 1,
                List.of(), List.of(new AreaLoad("office", 300, 50), new AreaLoad("school-classroom", 40, 50)), List.of(), 0, Double.NaN, Double.NaN, false, List.of(L2))))
                .isInstanceOf(InputError.class).hasMessageContaining("school-classroom 0.0").hasMessageContaining("(40.0)");
        assertThatThrownBy(() -> new MemberInput("B", MemberKind.INTERIOR_BEAM, new Support.Simple(10), 1,
                List.of(new AreaStrip("office", 5, 0, 10, 50)), List.of(), List.of(), 0, Double.NaN, Double.NaN, false, List.of(L2)))
                .isInstanceOf(InputError.class).hasMessageContaining("floors");
    }

    @Test
    void manyFloorsOfManyOccupanciesAddUpOccupancyByOccupancy() {
        // twelve floors, each of five occupancies, summed per occupancy against the loads carried
        List<String> uses = List.of("office", "school-classroom", "retail-upper", "residential-other", "storage-heavy");
        List<SupportedFloor> floors = new java.util.ArrayList<>();
        double[] carried = new double[uses.size()];
        for (int f = 0; f < 12; f++) {
            List<AreaShare> shares = new java.util.ArrayList<>();
            for (int u = 0; u < uses.size(); u++) {
                double a = 10 + 7 * f + 3 * u;
                shares.add(new AreaShare(uses.get(u), a));
                carried[u] += a;
            }
            floors.add(new SupportedFloor("L" + (f + 2), MemberKind.INTERIOR_COLUMN, shares));
        }
        List<AreaLoad> loads = new java.util.ArrayList<>();
        for (int u = 0; u < uses.size(); u++) loads.add(new AreaLoad(uses.get(u), carried[u], 50));
        MemberCalculation.calculate(Fixtures.US, new MemberInput("C", MemberKind.INTERIOR_COLUMN, new Support.Axial(), 12,
                List.of(), loads, List.of(), 0, Double.NaN, Double.NaN, false, floors));
        // the last occupancy off by one square foot is refused by its name
        List<AreaLoad> off = new java.util.ArrayList<>(loads);
        off.set(4, new AreaLoad("storage-heavy", carried[4] + 1, 50));
        assertThatThrownBy(() -> MemberCalculation.calculate(Fixtures.US, new MemberInput("C", MemberKind.INTERIOR_COLUMN, new Support.Axial(), 12,
                List.of(), off, List.of(), 0, Double.NaN, Double.NaN, false, floors)))
                .isInstanceOf(InputError.class).hasMessageContaining("storage-heavy " + carried[4]);
    }
}
