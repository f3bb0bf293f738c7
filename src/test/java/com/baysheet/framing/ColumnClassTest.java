package com.baysheet.framing;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

import static com.baysheet.framing.Buildings.US;
import static org.assertj.core.api.Assertions.assertThat;

/** Column and edge member classification on a 3 × 3-bay grid, against ASCE 7-16 Table 4.7-1. */
class ColumnClassTest {
    private static final Grid GRID = Buildings.grid(new double[] {20, 25, 30}, new double[] {22, 24, 26});
    private static final Framing FRAMING = new Framing(Direction.Y, 2);

    private static Derived derive(boolean southCantilever) {
        List<Bay> bays = Buildings.everyBay(GRID, (c, r) -> {
            Bay b = Bay.floor(c, r, "office", 60, FRAMING);
            return southCantilever && r == 0 ? b.withCantilever(Side.SOUTH, 6) : b;
        });
        return Derivation.derive(Buildings.building(GRID, List.of(Level.floor("F2", 12, bays))));
    }

    private static List<DerivedMember> columns(Derived d) {
        return d.members().stream().filter(m -> m.role() == MemberRole.COLUMN).toList();
    }

    private static String place(DerivedMember column) {
        String s = column.result().record().subject();
        return s.substring(s.lastIndexOf('(') + 1, s.lastIndexOf(')'));
    }

    private static double kll(DerivedMember m) { return US.edition().kll(m.kind()); }

    @Test
    void threeByThreeBaysHaveFourCornerEightEdgeAndFourInteriorColumns() {
        List<DerivedMember> cols = columns(derive(false));
        assertThat(cols).hasSize(16);
        Map<String, Long> byPlace = cols.stream().collect(Collectors.groupingBy(ColumnClassTest::place, Collectors.counting()));
        assertThat(byPlace).containsExactlyInAnyOrderEntriesOf(Map.of("corner", 4L, "edge", 8L, "interior", 4L));
        for (DerivedMember c : cols) {
            MemberKind expected = place(c).equals("interior") ? MemberKind.INTERIOR_COLUMN : MemberKind.EXTERIOR_COLUMN;
            assertThat(c.kind()).as(c.name()).isEqualTo(expected);
            assertThat(kll(c)).as(c.name()).isEqualTo(4.0); // Table 4.7-1: interior and exterior columns without cantilever slabs
            assertThat(c.result().record().step("K_LL").result()).isEqualTo(4.0);
        }
        // the corners are the four grid points at the ends of both axes
        for (DerivedMember c : cols)
            if (place(c).equals("corner")) assertThat(c.name()).containsAnyOf("Y1/1 ", "Y1/4 ", "Y4/1 ", "Y4/4 ");
    }

    @Test
    void aCantileverSlabAlongOneEdgeChangesThatEdgesColumnsAndEdgeBeams() {
        Derived d = derive(true);
        for (DerivedMember c : columns(d)) {
            boolean onSouth = c.name().startsWith("Column Y1/");
            String place = place(c);
            MemberKind expected = !onSouth ? (place.equals("interior") ? MemberKind.INTERIOR_COLUMN : MemberKind.EXTERIOR_COLUMN)
                    : place.equals("corner") ? MemberKind.CORNER_COLUMN_CANTILEVER : MemberKind.EDGE_COLUMN_CANTILEVER;
            assertThat(c.kind()).as(c.name()).isEqualTo(expected);
            // Table 4.7-1: edge columns with cantilever slabs 3, corner columns with cantilever slabs 2
            double k = expected == MemberKind.CORNER_COLUMN_CANTILEVER ? 2 : expected == MemberKind.EDGE_COLUMN_CANTILEVER ? 3 : 4;
            assertThat(kll(c)).as(c.name()).isEqualTo(k);
        }
        assertThat(columns(d).stream().filter(c -> c.kind() == MemberKind.CORNER_COLUMN_CANTILEVER)).hasSize(2);
        assertThat(columns(d).stream().filter(c -> c.kind() == MemberKind.EDGE_COLUMN_CANTILEVER)).hasSize(2);

        List<DerivedMember> south = d.members().stream()
                .filter(m -> m.role() != MemberRole.COLUMN && m.plan().y1() == 0 && m.plan().y2() == 0).toList();
        assertThat(south).hasSize(3);
        for (DerivedMember m : south) {
            assertThat(m.kind()).as(m.name()).isEqualTo(MemberKind.EDGE_BEAM_CANTILEVER);
            assertThat(kll(m)).isEqualTo(1.0); // Table 4.7-1: edge beams with cantilever slabs
            assertThat(m.result().record().step("K_LL").result()).isEqualTo(1.0);
        }
        // the other edges keep K_LL 2 (edge beams without cantilever slabs)
        d.members().stream().filter(m -> m.role() != MemberRole.COLUMN && m.plan().y1() == GRID.y().extent() && m.plan().y2() == GRID.y().extent())
                .forEach(m -> assertThat(m.kind()).as(m.name()).isEqualTo(MemberKind.EDGE_BEAM));
    }

    @Test
    void anOpeningTurnsTheColumnsAroundItIntoEdgeAndCornerColumns() {
        List<Bay> bays = Buildings.everyBay(GRID, (c, r) -> c == 1 && r == 1 ? Bay.opening(c, r) : Bay.floor(c, r, "office", 60, FRAMING));
        Derived d = Derivation.derive(Buildings.building(GRID, List.of(Level.floor("F2", 12, bays))));
        // each of the four columns at the opening has three floored bays around it: a re-entrant corner
        assertThat(columns(d).stream().filter(c -> place(c).equals("interior"))).isEmpty();
        assertThat(columns(d).stream().filter(c -> place(c).equals("corner"))).hasSize(8);
    }
}
