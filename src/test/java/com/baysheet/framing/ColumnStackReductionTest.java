package com.baysheet.framing;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * A column's K_LL over a stack: the influence area of a column supporting several floors is the sum over those
 * floors of each floor's K_LL × A_T (common practice, from memory: ASCE 7-16 Commentary C4.7 defines the
 * influence area as K_LL A_T), and the take-down's statements follow from the numbers that gave f.
 */
class ColumnStackReductionTest {
    /** 3 × 3 bays of 30 ft: a corner column takes a 15 ft × 15 ft quarter bay, 225 ft², per floor. */
    private static final Grid GRID = Buildings.grid(new double[] {30, 30, 30}, new double[] {30, 30, 30});
    private static final Framing FRAMING = new Framing(Direction.X, 2);

    private static TakeDown stack(Building b, String point) {
        return Derivation.derive(b).takeDowns().stream().filter(t -> t.gridPoint().equals(point)).findFirst().orElseThrow();
    }

    /**
     * Office floors F1 to F3; on F3 only, the corner bay carries 6 ft cantilever slabs on its south and west sides,
     * enclosed office floor (not the default balcony load), so that only K_LL differs from floor to floor.
     */
    private static Building cantileverOnTheTopFloorOnly() {
        List<Level> levels = List.of(
                Level.floor("F1", 12, Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "office", 60, FRAMING))),
                Level.floor("F2", 24, Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "office", 60, FRAMING))),
                Level.floor("F3", 36, Buildings.everyBay(GRID, (c, r) -> c == 0 && r == 0
                        ? Bay.floor(c, r, "office", 60, FRAMING).withCantilever(Side.SOUTH, 6).withCantilever(Side.WEST, 6)
                                .withCantileverOccupancy("office")
                        : Bay.floor(c, r, "office", 60, FRAMING))));
        return Buildings.building(GRID, levels);
    }

    @Test
    void cornerColumnWithACantileverSlabOnTheUpperFloorOnlyTakesEachFloorsOwnKll() {
        // Hand calculation, office L0 = 50 psf (Table 4.3-1), ASCE 7-16 Eq. 4.7-1, Table 4.7-1 K_LL:
        // F3: quarter bay 15 × 15 = 225 ft² plus half of each 6 ft × 30 ft cantilever strip, 2 × 90 = 180 ft²: A_T = 405 ft²,
        //     corner column with cantilever slab, K_LL = 2. F2 and F1: 225 ft² each, corner column without one, K_LL = 4.
        // below F3: K_LL A_T = 2 × 405 = 810 ft²,             f = 0.25 + 15/√810  = 0.777046 (≥ 0.50); P_L = 0.777046 × 50 × 405 = 15 735.2 lb
        // below F2: Σ K_LL,i A_T,i = 810 + 4 × 225 = 1710 ft², f = 0.25 + 15/√1710 = 0.612738 (≥ 0.40); P_L = 0.612738 × 50 × 630 = 19 301.3 lb
        // below F1: Σ = 1710 + 900 = 2610 ft²,                f = 0.25 + 15/√2610 = 0.543610 (≥ 0.40); P_L = 0.543610 × 50 × 855 = 23 239.3 lb
        // (K_LL = 4 on the whole A_T below F2 gives 4 × 630 = 2520 ft², f = 0.548807, P_L = 17 287.4 lb: 10.4 % low.)
        TakeDown t = stack(cantileverOnTheTopFloorOnly(), "Y1/1");
        assertThat(t.rows()).extracting(TakeDown.Row::level).containsExactly("F3", "F2", "F1");
        double[] area = {405, 630, 855}, f = {0.777046, 0.612738, 0.543610}, live = {15_735.2, 19_301.3, 23_239.3};
        for (int k = 0; k < 3; k++) {
            TakeDown.Row r = t.rows().get(k);
            assertThat(r.cumulativeArea()).as(r.level()).isCloseTo(area[k], within(1e-9));
            assertThat(r.factor()).as(r.level()).isCloseTo(f[k], within(1e-6));
            assertThat(r.liveReduced()).as(r.level()).isCloseTo(live[k], within(0.1));
        }
        assertThat(t.rows()).extracting(TakeDown.Row::kll).containsExactly(2.0, 4.0, 4.0);
        assertThat(t.rows()).extracting(TakeDown.Row::influenceArea).containsExactly(810.0, 1710.0, 2610.0);
        // the take-down's record writes the sum out, floor by floor
        CalcRecord rec = t.record();
        assertThat(rec.step("K_LL·ΣA_T@F1").formula()).contains("Σ K_LL,i");
        assertThat(rec.step("K_LL·ΣA_T@F1").substituted()).isEqualTo("2.00 × 405 + 4.00 × 225 + 4.00 × 225");
        // and so does the column's own record
        CalcRecord column = Derivation.derive(cantileverOnTheTopFloorOnly()).members().stream()
                .filter(m -> m.name().equals("Column Y1/1 below F1")).findFirst().orElseThrow().result().record();
        assertThat(column.step("K_LL·A_T").substituted()).isEqualTo("2.00 × 405 + 4.00 × 225 + 4.00 × 225");
        assertThat(column.step("K_LL[F3]").result()).isEqualTo(2.0);
        assertThat(column.step("K_LL[F1]").result()).isEqualTo(4.0);
        assertThat(column.notes()).anyMatch(n -> n.text().contains("each floor with its own K_LL"));
    }

    @Test
    void theFactorOfAMixedOccupancyStackFollowsFromTheReducibleArea() {
        // F1 assembly (100 psf, not reducible, 4.7.5), F2 office; interior column Y2/2 of 30 ft bays, 900 ft² a floor.
        // Below F1: A_T supported 1800 ft², reducible A_T 900 ft² (the office): influence area = 4 × 900 = 3600 ft²
        // (not 4 × 1800 = 7200), f = 0.25 + 15/√3600 = 0.50, which is what the take-down must print beside f.
        List<Level> levels = List.of(
                Level.floor("F1", 12, Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "assembly-movable-seats", 60, FRAMING))),
                Level.floor("F2", 24, Buildings.everyBay(GRID, (c, r) -> Bay.floor(c, r, "office", 60, FRAMING))));
        TakeDown t = stack(Buildings.building(GRID, levels), "Y2/2");
        TakeDown.Row f1 = t.rows().get(1);
        assertThat(f1.cumulativeArea()).isCloseTo(1800.0, within(1e-9));
        assertThat(f1.reducibleArea()).isCloseTo(900.0, within(1e-9));
        assertThat(f1.influenceArea()).isCloseTo(3600.0, within(1e-9));
        assertThat(f1.factor()).isCloseTo(0.5, within(1e-12));
        CalcRecord rec = t.record();
        assertThat(rec.step("K_LL·ΣA_T@F1").result()).isCloseTo(3600.0, within(1e-9));
        assertThat(rec.step("A_T,r@F1").result()).isCloseTo(900.0, within(1e-9));
        assertThat(rec.notes()).anyMatch(n -> n.text().contains("reducible"));
    }

    @Test
    void anSiTakeDownPrintsTheSiConstantOfItsEdition() {
        // ASCE 7-16 Eq. 4.7-1 in SI: f = 0.25 + 4.57/√(K_LL A_T). 9 m bays, interior column: 81 m² a floor;
        // below F1 (two floors): 4 × 162 = 648 m², f = 0.25 + 4.57/√648 = 0.429527.
        Grid g = Buildings.grid(new double[] {9, 9, 9}, new double[] {9, 9, 9});
        Building b = new Building("si", CalcContext.of(UnitSystem.SI), g, Buildings.floors(g, 2, "office", 3, FRAMING));
        TakeDown t = stack(b, "Y2/2");
        assertThat(t.rows().get(1).factor()).isCloseTo(0.429527, within(1e-6));
        String formula = t.record().step("f@F1").formula();
        assertThat(formula).contains("4.57/√").doesNotContain("15/");
    }

    @Test
    void takeDownRecordLabelsTheAreaAtTheLevelApartFromTheCumulativeAreaSupported() {
        TakeDown t = stack(cantileverOnTheTopFloorOnly(), "Y1/1");
        var step = t.record().step("ΣA_T@F2");
        assertThat(step.description()).contains("A_T supported, cumulative");
        assertThat(step.substituted()).contains("405 + 225");
        assertThat(t.record().notes()).noneMatch(n -> n.text().contains("Eq. 4.7-1")); // the clause comes from the edition, beside the note
    }

    @Test
    void aColumnWhoseFloorsShareOneKllIsReducedAsBefore() {
        // every floor of an interior column has K_LL = 4: the record has the single K_LL step and K_LL × A_T
        Derived d = Derivation.derive(Buildings.building(GRID, Buildings.floors(GRID, 3, "office", 60, FRAMING)));
        CalcRecord column = d.members().stream().filter(m -> m.name().equals("Column Y2/2 below F1")).findFirst().orElseThrow().result().record();
        assertThat(column.step("K_LL").result()).isEqualTo(4.0);
        assertThat(column.step("K_LL·A_T").formula()).isEqualTo("K_LL × A_T");
        assertThat(column.step("K_LL·A_T").result()).isCloseTo(4 * 2700.0, within(1e-9));
        assertThat(d.members().stream().filter(m -> m.name().equals("Column Y2/2 below F1")).findFirst().orElseThrow().kind())
                .isEqualTo(MemberKind.INTERIOR_COLUMN);
    }
}
