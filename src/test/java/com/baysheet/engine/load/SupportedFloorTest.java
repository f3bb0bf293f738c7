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
        assertThatThrownBy(() -> new MemberInput("B", MemberKind.INTERIOR_BEAM, new Support.Simple(10), 1,
                List.of(new AreaStrip("office", 5, 0, 10, 50)), List.of(), List.of(), 0, Double.NaN, Double.NaN, false, List.of(L2)))
                .isInstanceOf(InputError.class).hasMessageContaining("floors");
    }
}
