package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.util.LinkedHashMap;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** ASCE 7-16 4.7 floor live load reduction, through the method the edition names. */
class Asce7BasicReductionTest {
    static final double TOL = 1e-9;
    RecordBuilder rec = new RecordBuilder("T", "ASCE 7-16", UnitSystem.US);

    LiveFactors reduce(CalcContext ctx, MemberKind kind, int floors, double span, Object... idAndArea) {
        Map<String, Double> areas = new LinkedHashMap<>();
        for (int i = 0; i < idAndArea.length; i += 2) areas.put((String) idAndArea[i], ((Number) idAndArea[i + 1]).doubleValue());
        rec = new RecordBuilder("T", ctx.edition().id(), ctx.system());
        return ReductionMethods.forEdition(ctx).reduce(ctx, kind, areas, floors, span, rec);
    }

    LiveFactors reduce(MemberKind kind, int floors, Object... idAndArea) { return reduce(Fixtures.US, kind, floors, 0, idAndArea); }

    CalcRecord record() { return rec.build(); }

    @Test
    void reducedLoadFollowsEq4_7_1() {
        // ASCE 7-16 Eq. 4.7-1: interior beam K_LL 2, A_T 500 ft²: f = 0.25 + 15/sqrt(1000)
        LiveFactors f = reduce(MemberKind.INTERIOR_BEAM, 1, "office", 500);
        assertThat(f.of("office")).isCloseTo(0.25 + 15 / Math.sqrt(1000), within(TOL));
        assertThat(Fixtures.step(record(), "L[office]")).isCloseTo(50 * (0.25 + 15 / Math.sqrt(1000)), within(1e-9));
        assertThat(f.kll()).isEqualTo(2);
    }

    @Test
    void hibbelerExample1_2InteriorColumnOfTwoStoreyOffice() {
        // Hibbeler, Structural Analysis, Example 1.2 (from memory): A_T 484 ft², K_LL 4, L = 50 (0.25 + 15/44) = 29.55 psf
        reduce(MemberKind.INTERIOR_COLUMN, 1, "office", 484);
        assertThat(Fixtures.step(record(), "L[office]")).isCloseTo(29.55, within(0.005));
    }

    @Test
    void noReductionJustBelowFourHundredSquareFeet() {
        // ASCE 7-16 4.7.2: K_LL A_T below 400 ft²: L = L0
        assertThat(reduce(MemberKind.INTERIOR_BEAM, 1, "office", 199.999).of("office")).isEqualTo(1);
        assertThat(Fixtures.hasStep(record(), "f_eq")).isFalse();
    }

    @Test
    void exactlyFourHundredSquareFeetGivesFactorOne() {
        // 0.25 + 15/sqrt(400) = 1: the threshold is continuous
        assertThat(reduce(MemberKind.INTERIOR_BEAM, 1, "office", 200).of("office")).isCloseTo(1, within(TOL));
        assertThat(Fixtures.hasStep(record(), "f_eq")).isTrue();
    }

    // ASCE 7-16 4.7.2: 0.25 + 15/sqrt(3600) = 0.5 (one-floor limit starts to bind); 0.25 + 15/sqrt(10000) = 0.4
    @ParameterizedTest(name = "K_LL·A_T {1} ft², {0} floor(s): f = {2}")
    @CsvSource({"1, 3600, 0.5", "1, 4000, 0.5", "1, 10000, 0.5", "2, 3600, 0.5", "2, 10000, 0.4", "2, 40000, 0.4",
            "3, 4900, 0.4642857142857143", "1, 1600, 0.625"})
    void lowerLimitsOfSection4_7_2(int floors, double kat, double expected) {
        assertThat(reduce(MemberKind.INTERIOR_COLUMN, floors, "office", kat / 4).of("office")).isCloseTo(expected, within(TOL));
    }

    @Test
    void reductionNeverBelowFiftyPercentForOneFloor() {
        assertThat(reduce(MemberKind.INTERIOR_COLUMN, 1, "office", 1e6).of("office")).isEqualTo(0.5);
        assertThat(record().notes()).anyMatch(n -> n.text().startsWith("Lower limit governs"));
    }

    @Test
    void reductionNeverBelowFortyPercentForTwoFloors() {
        assertThat(reduce(MemberKind.INTERIOR_COLUMN, 2, "office", 1e6).of("office")).isEqualTo(0.4);
    }

    @Test
    void heavyLoadOnOneFloorIsNotReduced() {
        // ASCE 7-16 4.7.3: L0 over 100 psf, one floor: not reduced
        assertThat(reduce(MemberKind.INTERIOR_COLUMN, 1, "storage-heavy", 2000).of("storage-heavy")).isEqualTo(1);
        assertThat(record().notes()).anyMatch(n -> n.clause().ref().equals("4.7.3"));
    }

    // ASCE 7-16 4.7.3: two or more floors, at most 20 %, and not below the 4.7.2 value: max(0.8, f)
    @ParameterizedTest(name = "{0} at K_LL·A_T {1}: f = {2}")
    @CsvSource({"storage-heavy, 10000, 0.8", "storage-heavy, 1000, 0.8", "storage-heavy, 600, 0.8623724356957945",
            "wholesale, 900, 0.8", "garage-passenger, 10000, 0.8", "garage-passenger, 300, 1"})
    void twentyPercentRuleForTwoFloors(String id, double kat, double expected) {
        assertThat(reduce(MemberKind.INTERIOR_COLUMN, 2, id, kat / 4).of(id)).isCloseTo(expected, within(TOL));
    }

    @Test
    void passengerGarageOnOneFloorIsNotReducedAndCitesSection4_7_4() {
        assertThat(reduce(MemberKind.INTERIOR_BEAM, 1, "garage-passenger", 5000).of("garage-passenger")).isEqualTo(1);
        assertThat(record().notes()).anyMatch(n -> n.clause().ref().equals("4.7.4"));
    }

    @Test
    void assemblyIsNotReducibleAndItsNoteCitesSection4_7_5() {
        assertThat(reduce(MemberKind.INTERIOR_COLUMN, 3, "assembly-movable-seats", 5000).of("assembly-movable-seats")).isEqualTo(1);
        assertThat(record().notes()).filteredOn(n -> n.text().startsWith("Not reduced"))
                .singleElement().satisfies(n -> assertThat(n.text()).contains("4.7.5"));
        assertThat(Fixtures.hasStep(record(), "f_eq")).isFalse();
    }

    @Test
    void oneWaySlabAreaIsCappedAtOneAndAHalfSpanSquared() {
        // ASCE 7-16 4.7.6: A_T <= 1.5 ℓ²; span 20 ft caps 1000 ft² at 600 ft² (K_LL 1)
        LiveFactors slab = reduce(Fixtures.US, MemberKind.ONE_WAY_SLAB, 1, 20, "office", 1000);
        assertThat(Fixtures.step(record(), "A_T,slab")).isEqualTo(600);
        assertThat(slab.of("office")).isCloseTo(0.25 + 15 / Math.sqrt(600), within(TOL));
        LiveFactors twoWay = reduce(Fixtures.US, MemberKind.TWO_WAY_SLAB, 1, 20, "office", 1000);
        assertThat(twoWay.of("office")).isCloseTo(0.25 + 15 / Math.sqrt(1000), within(TOL));
    }

    @Test
    void oneWaySlabBelowTheCapKeepsItsArea() {
        reduce(Fixtures.US, MemberKind.ONE_WAY_SLAB, 1, 20, "office", 500);
        assertThat(Fixtures.hasStep(record(), "A_T,slab")).isFalse();
    }

    @Test
    void mixedOccupancyReducesOnlyTheReducibleLoadsWithTheReducibleArea() {
        // common practice (no code clause): f from K_LL × reducible area; the assembly load adds unreduced
        LiveFactors f = reduce(MemberKind.INTERIOR_BEAM, 1, "office", 300, "assembly-other", 200);
        assertThat(f.tributaryArea()).isEqualTo(500);
        assertThat(f.reducibleArea()).isEqualTo(300);
        assertThat(f.of("office")).isCloseTo(0.25 + 15 / Math.sqrt(600), within(TOL));
        assertThat(f.of("assembly-other")).isEqualTo(1);
        assertThat(record().notes()).anyMatch(n -> n.text().startsWith("Mixed occupancy"));
    }

    @Test
    void partitionAllowanceIsItsOwnSourceNotReducedByDefault() {
        CalcContext ctx = Fixtures.US.withOptions(new DesignOptions(true, false));
        LiveFactors f = reduce(ctx, MemberKind.INTERIOR_BEAM, 1, 0, "office", 500);
        assertThat(f.of("office#partitions")).isEqualTo(1);
        assertThat(Fixtures.step(record(), "L_p[office]")).isEqualTo(15); // ASCE 7-16 4.3.2: 15 psf
    }

    @Test
    void partitionAllowanceReducedWithTheLiveLoadWhenTheProjectSaysSo() {
        CalcContext ctx = Fixtures.US.withOptions(new DesignOptions(true, true));
        LiveFactors f = reduce(ctx, MemberKind.INTERIOR_BEAM, 1, 0, "office", 500);
        assertThat(f.of("office#partitions")).isEqualTo(f.of("office")).isLessThan(1);
    }

    @Test
    void partitionAllowanceOffAddsNoSource() {
        assertThat(reduce(MemberKind.INTERIOR_BEAM, 1, "office", 500).bySource()).containsOnlyKeys("office");
    }

    @Test
    void noPartitionAllowanceWhereL0IsAtLeastEightyPsf() {
        // ASCE 7-16 4.3.2: not required where L0 >= 80 psf; office corridors are exactly 80
        CalcContext ctx = Fixtures.US.withOptions(new DesignOptions(true, false));
        LiveFactors f = reduce(ctx, MemberKind.INTERIOR_BEAM, 1, 0, "office-corridor", 500, "office", 100);
        assertThat(f.bySource()).containsKey("office#partitions").doesNotContainKey("office-corridor#partitions");
        assertThat(record().notes()).anyMatch(n -> n.text().startsWith("No partition allowance") && n.clause().ref().equals("4.3.2"));
    }

    @Test
    void firmsCustomOrdinaryOccupancyIsReduced() {
        OccupancyCatalogue c = OccupancyCatalogue.builtIn()
                .with(OccupancyCatalogue.custom("archive", "Archive", UnitSystem.US, 90, 0, 30, ReductionRule.ORDINARY, false));
        LiveFactors f = reduce(Fixtures.US.withCatalogue(c), MemberKind.INTERIOR_BEAM, 1, 0, "archive", 500);
        assertThat(f.of("archive")).isCloseTo(0.25 + 15 / Math.sqrt(1000), within(TOL));
    }

    @Test
    void ordinaryCustomRowOverOneHundredPsfIsTreatedAsHeavy() {
        OccupancyCatalogue c = OccupancyCatalogue.builtIn()
                .with(OccupancyCatalogue.custom("press", "Press room", UnitSystem.US, 120, 0, 30, ReductionRule.ORDINARY, false));
        CalcContext ctx = Fixtures.US.withCatalogue(c);
        assertThat(reduce(ctx, MemberKind.INTERIOR_COLUMN, 1, 0, "press", 2500).of("press")).isEqualTo(1);
        assertThat(record().notes()).anyMatch(n -> n.level() == Note.Level.CAUTION && n.text().contains("treated as a heavy"));
        assertThat(reduce(ctx, MemberKind.INTERIOR_COLUMN, 2, 0, "press", 2500).of("press")).isEqualTo(0.8);
    }

    @Test
    void siFactorAtThirtySevenPointOneSixSquareMetresIsItsOwnEquation() {
        // ASCE 7-16 Eq. 4.7-1 (SI): 0.25 + 4.57/sqrt(37.16) = 0.99968, not 1 (the SI constants are rounded)
        LiveFactors f = reduce(Fixtures.SI, MemberKind.INTERIOR_BEAM, 1, 0, "office", 18.58);
        assertThat(f.of("office")).isCloseTo(0.99968, within(1e-5));
        assertThat(reduce(Fixtures.SI, MemberKind.INTERIOR_BEAM, 1, 0, "office", 18.579).of("office")).isEqualTo(1);
    }

    @Test
    void siReductionUsesTheFourPointFiveSevenCoefficient() {
        LiveFactors f = reduce(Fixtures.SI, MemberKind.INTERIOR_COLUMN, 1, 0, "office", 50);
        assertThat(f.of("office")).isCloseTo(0.25 + 4.57 / Math.sqrt(200), within(1e-3));
        assertThat(Fixtures.step(record(), "L[office]")).isCloseTo(2.40 * (0.25 + 4.57 / Math.sqrt(200)), within(1e-3));
    }
}
