package com.baysheet.framing;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Column take-downs: cases worked by hand, a published example, and the rules of ASCE 7-16 4.7 and 4.8. */
class ColumnTakeDownTest {
    /** 3 × 3 bays of 25 ft (x) × 30 ft (y): the interior column at Y2/2 takes 25 × 30 = 750 ft² per floor. */
    private static final Grid GRID = Buildings.grid(new double[] {25, 25, 25}, new double[] {30, 30, 30});
    private static final Framing FRAMING = new Framing(Direction.X, 2);

    private static TakeDown interior(Grid g, List<Level> levels) {
        Derived d = Derivation.derive(Buildings.building(g, levels));
        return d.takeDowns().stream().filter(t -> t.gridPoint().equals("Y2/2")).findFirst().orElseThrow();
    }

    private static TakeDown interior(int floors, String use) {
        return interior(GRID, Buildings.floors(GRID, floors, use, 60, FRAMING));
    }

    @Test
    void fourLevelOfficeColumnWorkedByHand() {
        // ASCE 7-16 Eq. 4.7-1 with K_LL = 4 (interior column), A_T summed over the floors supported (Commentary C4.7):
        // F4: ΣA_T =  750, K_LL ΣA_T =  3000, f = 0.25 + 15/√3000  = 0.523861 (≥ 0.50, one floor);  L = 0.523861 × 37 500 = 19 644.8 lb
        // F3: ΣA_T = 1500, K_LL ΣA_T =  6000, f = 0.25 + 15/√6000  = 0.443649 (≥ 0.40);             L = 0.443649 × 75 000 = 33 273.7 lb
        // F2: ΣA_T = 2250, K_LL ΣA_T =  9000, f = 0.25 + 15/√9000  = 0.408114 (≥ 0.40);             L = 0.408114 × 112 500 = 45 912.8 lb
        // F1: ΣA_T = 3000, K_LL ΣA_T = 12000, f = 0.25 + 15/√12000 = 0.386931 < 0.40: the 0.40 limit governs; L = 0.40 × 150 000 = 60 000 lb
        // D = 60 psf × 3000 ft² = 180 000 lb; P_u = 1.2 × 180 000 + 1.6 × 60 000 = 312 000 lb; P_a = 180 000 + 60 000 = 240 000 lb
        TakeDown t = interior(4, "office");
        List<TakeDown.Row> rows = t.rows();
        assertThat(rows).extracting(TakeDown.Row::level).containsExactly("F4", "F3", "F2", "F1");
        assertThat(rows).extracting(TakeDown.Row::floorsSupported).containsExactly(1, 2, 3, 4);
        double[] area = {750, 1500, 2250, 3000}, f = {0.523861, 0.443649, 0.408114, 0.4}, live = {19_644.8, 33_273.7, 45_912.8, 60_000};
        for (int k = 0; k < 4; k++) {
            TakeDown.Row r = rows.get(k);
            assertThat(r.areaAtLevel()).isCloseTo(750.0, within(1e-9));
            assertThat(r.cumulativeArea()).isCloseTo(area[k], within(1e-9));
            assertThat(r.kll()).isEqualTo(4.0);
            assertThat(r.influenceArea()).isCloseTo(4 * area[k], within(1e-9));
            assertThat(r.factor()).as(r.level()).isCloseTo(f[k], within(1e-6));
            assertThat(r.liveUnreduced()).isCloseTo(50 * area[k], within(1e-6));
            assertThat(r.liveReduced()).as(r.level()).isCloseTo(live[k], within(0.1));
            assertThat(r.dead()).isCloseTo(60 * area[k], within(1e-6));
        }
        TakeDown.Row base = rows.get(3);
        assertThat(base.lrfd()).isCloseTo(312_000.0, within(1e-6));
        assertThat(base.lrfdCombination()).isEqualTo("LRFD 2");
        assertThat(base.asd()).isCloseTo(240_000.0, within(1e-6));
        assertThat(base.asdCombination()).isEqualTo("ASD 2");
        // the take-down's own record: one set of steps per level, with clause numbers
        assertThat(t.record().step("f@F1").result()).isEqualTo(base.factor());
        assertThat(t.record().step("f@F1").clause().ref()).isEqualTo("4.7.2, Eq. 4.7-1");
        assertThat(t.record().step("ΣA_T@F2").result()).isCloseTo(2250.0, within(1e-9));
        assertThat(t.record().result("LRFD.P")).isEqualTo(base.lrfd());
    }

    @Test
    void publishedExampleInteriorColumnOfATwoStoreyOffice() {
        // Hibbeler, Structural Analysis, Example 1.2 (8th–10th eds.), from memory (REFERENCES.md): interior column,
        // two-storey office, 22 ft × 22 ft bays, A_T = 484 ft² per floor, K_LL = 4, reduced with the per-floor area
        // as the example does: L = 50 (0.25 + 15/√(4 × 484)) = 50 (0.25 + 15/44) = 29.55 psf.
        // The column below the upper floor supports that one floor with exactly that area.
        Grid g = Buildings.grid(new double[] {22, 22, 22}, new double[] {22, 22, 22});
        TakeDown t = interior(g, Buildings.floors(g, 2, "office", 0, FRAMING));
        TakeDown.Row upper = t.rows().get(0);
        assertThat(upper.floorsSupported()).isEqualTo(1);
        assertThat(upper.cumulativeArea()).isCloseTo(484.0, within(1e-9));
        assertThat(upper.liveReduced() / upper.cumulativeArea()).isCloseTo(29.55, within(0.01));
        // Below, this model sums the areas of both floors (Commentary C4.7): f = 0.25 + 15/√(4 × 968) = 0.491059,
        // where the example's per-floor reading would keep 0.590909.
        assertThat(t.rows().get(1).factor()).isCloseTo(0.491059, within(1e-6));
    }

    @Test
    void heavyLiveLoadIsUnreducedOnOneFloorAndAtMostTwentyPercentOffOnTwoOrMore() {
        // storage, heavy: 250 psf (Table 4.3-1); 4.7.3. One floor: L = L0. Two floors: f_eq = 0.443649 but at most 20 % off: 0.80.
        TakeDown t = interior(3, "storage-heavy");
        assertThat(t.rows().get(0).liveReduced()).isCloseTo(t.rows().get(0).liveUnreduced(), within(1e-6));
        for (TakeDown.Row r : t.rows().subList(1, 3))
            assertThat(r.liveReduced()).as(r.level()).isCloseTo(0.8 * r.liveUnreduced(), within(1e-6));
    }

    @Test
    void garageLiveLoadFollowsTheTwentyPercentRule() {
        // passenger vehicle garage 40 psf, 4.7.4: not reduced on one floor; 0.80 L0 on two or more
        TakeDown t = interior(2, "garage-passenger");
        assertThat(t.rows().get(0).liveReduced()).isCloseTo(40 * 750.0, within(1e-6));
        assertThat(t.rows().get(1).liveReduced()).isCloseTo(0.8 * 40 * 1500.0, within(1e-6));
        // no 0.5 L in LRFD 3 for garages (2.3.1 Exception 1): LRFD 2 governs with D + L only anyway; ASD 2
        assertThat(t.rows().get(1).lrfd()).isCloseTo(1.2 * 60 * 1500 + 1.6 * 0.8 * 40 * 1500, within(1e-6));
    }

    @Test
    void assemblyLiveLoadIsNeverReduced() {
        // assembly, movable seats, 100 psf: not reducible (4.7.5), however many floors
        for (TakeDown.Row r : interior(4, "assembly-movable-seats").rows())
            assertThat(r.liveReduced()).as(r.level()).isCloseTo(r.liveUnreduced(), within(1e-6));
    }

    @Test
    void roofLiveLoadStaysLrAndDoesNotCountAsAFloor() {
        // Roof over two office floors: roof-ordinary L0 = 20 psf, slope 1/4 in/ft (F ≤ 4: R2 = 1), A_T = 750 ft² ≥ 600: R1 = 0.6,
        // Lr = 20 × 0.6 × 1 = 12 psf (4.8.2, Eq. 4.8-1) → P_Lr = 12 × 750 = 9000 lb at every level below the roof.
        List<Level> levels = new ArrayList<>(Buildings.floors(GRID, 2, "office", 60, FRAMING));
        levels.add(Level.roof("R", 36, 0.25, Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "roof-ordinary", 20, FRAMING))));
        TakeDown t = interior(GRID, levels);
        assertThat(t.rows()).extracting(TakeDown.Row::level).containsExactly("R", "F2", "F1");
        assertThat(t.rows()).extracting(TakeDown.Row::floorsSupported).containsExactly(0, 1, 2);
        TakeDown.Row roof = t.rows().get(0), f2 = t.rows().get(1), f1 = t.rows().get(2);
        assertThat(roof.liveUnreduced()).isEqualTo(0.0);
        assertThat(roof.cumulativeArea()).isEqualTo(0.0);
        assertThat(roof.areaAtLevel()).isCloseTo(750.0, within(1e-9));
        for (TakeDown.Row r : t.rows()) assertThat(r.roofLive()).as(r.level()).isCloseTo(9000.0, within(1e-6));
        // F2: the floor below the roof is the column's first floor: A_T = 750 ft², f = 0.523861
        assertThat(f2.cumulativeArea()).isCloseTo(750.0, within(1e-9));
        assertThat(f2.factor()).isCloseTo(0.523861, within(1e-6));
        assertThat(f2.liveReduced()).isCloseTo(0.523861 * 37_500, within(0.1));
        // roof row: D = 20 × 750 = 15 000 lb; 1.2D + 1.6Lr = 32 400 lb governs over 1.4D = 21 000 lb (LRFD 3)
        assertThat(roof.lrfd()).isCloseTo(1.2 * 15_000 + 1.6 * 9000, within(1e-6));
        assertThat(roof.lrfdCombination()).isEqualTo("LRFD 3");
        // F1: D = 15 000 + 2 × 45 000 = 105 000 lb; L = 0.443649 × 75 000 = 33 273.7 lb;
        // LRFD 2 = 1.2 × 105 000 + 1.6 × 33 273.7 + 0.5 × 9000 = 183 737.9 lb; ASD 4 = 105 000 + 0.75 × (33 273.7 + 9000) = 136 705.3 lb < ASD 2 = 138 273.7 lb
        assertThat(f1.dead()).isCloseTo(105_000.0, within(1e-6));
        assertThat(f1.lrfd()).isCloseTo(183_737.9, within(0.2));
        assertThat(f1.lrfdCombination()).isEqualTo("LRFD 2");
        assertThat(f1.asd()).isCloseTo(138_273.7, within(0.2));
        assertThat(f1.asdCombination()).isEqualTo("ASD 2");
    }

    @Test
    void mixedFloorsReduceTheOrdinaryLoadAndCarryTheAssemblyLoadUnreduced() {
        // F1 assembly (100 psf, not reducible), F2 office. At F1: ΣA_T counts both floors, but only the office
        // area is reducible: K_LL A_T,r = 4 × 750 = 3000, f = 0.523861 floored at 0.40 → office 0.523861 × 37 500;
        // assembly 100 × 750 = 75 000 unreduced (common practice for mixed occupancy, REFERENCES.md).
        List<Level> levels = List.of(
                Level.floor("F1", 12, Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "assembly-movable-seats", 60, FRAMING))),
                Level.floor("F2", 24, Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "office", 60, FRAMING))));
        TakeDown.Row f1 = interior(GRID, levels).rows().get(1);
        assertThat(f1.floorsSupported()).isEqualTo(2);
        assertThat(f1.cumulativeArea()).isCloseTo(1500.0, within(1e-9));
        assertThat(f1.liveReduced()).isCloseTo(0.523861 * 37_500 + 75_000, within(0.1));
    }

    @Test
    void columnsCarryOnThroughALevelWithAnOpeningAroundThem() {
        // F2 has the four bays around Y2/2 open: the column there carries F3 down, and F2 adds nothing
        List<Level> levels = new ArrayList<>();
        levels.add(Level.floor("F1", 12, Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "office", 60, FRAMING))));
        levels.add(Level.floor("F2", 24, Buildings.everyBay(GRID, (c, r) -> c <= 1 && r <= 1 ? Bay.opening(c, r) : Bay.floor(c, r, "office", 60, FRAMING))));
        levels.add(Level.floor("F3", 36, Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "office", 60, FRAMING))));
        TakeDown t = interior(GRID, levels);
        assertThat(t.rows()).extracting(TakeDown.Row::level).containsExactly("F3", "F2", "F1");
        assertThat(t.rows()).extracting(TakeDown.Row::floorsSupported).containsExactly(1, 1, 2);
        assertThat(t.rows().get(1).areaAtLevel()).isEqualTo(0.0);
        assertThat(t.rows().get(1).liveReduced()).isCloseTo(t.rows().get(0).liveReduced(), within(1e-9));
        assertThat(t.rows().get(2).cumulativeArea()).isCloseTo(1500.0, within(1e-9));
    }

    @Test
    void theColumnKindFollowsItsLevel() {
        Derived d = Derivation.derive(Buildings.building(GRID, Buildings.floors(GRID, 2, "office", 60, FRAMING)));
        assertThat(d.members().stream().filter(m -> m.role() == MemberRole.COLUMN && m.name().startsWith("Column Y2/2 ")))
                .extracting(DerivedMember::kind).containsOnly(MemberKind.INTERIOR_COLUMN);
    }
}
