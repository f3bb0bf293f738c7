package com.baysheet.engine.member;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.load.AreaLoad;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static com.baysheet.engine.Fixtures.US;
import static com.baysheet.engine.Fixtures.calc;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

class MemberCalculationTest {
    @Test
    void interiorOfficeBeamIsReducedByEq4_7_1AndSolvedAsASimpleSpan() {
        // 30 ft span, 10 ft tributary width: A_T 300 ft², K_LL 2 (Table 4.7-1), f = 0.25 + 15/sqrt(600) (Eq. 4.7-1);
        // simple beam, uniform load (AISC Table 3-23): M = wℓ²/8, R = wℓ/2
        CalcRecord r = calc(US, Fixtures.beam(MemberKind.INTERIOR_BEAM, 30, "office", 10, 15));
        double f = 0.25 + 15 / Math.sqrt(600), w = 50 * 10 * f;
        assertThat(r.result("L.M+")).isCloseTo(w * 900 / 8, within(1e-6));
        assertThat(r.result("L.RA")).isCloseTo(w * 15, within(1e-6));
        assertThat(r.result("L0.M+")).isCloseTo(500 * 900 / 8.0, within(1e-6));
        assertThat(r.result("D.RA")).isCloseTo(150 * 15, within(1e-9));
        // LRFD 2: 1.2D + 1.6L governs an office floor beam
        assertThat(r.result("LRFD.M+")).isCloseTo(1.2 * 150 * 900 / 8 + 1.6 * w * 900 / 8, within(1e-6));
        assertThat(r.governing()).contains("LRFD.M+");
    }

    @Test
    void hibbelerExample1_2ColumnLoad() {
        // Hibbeler, Structural Analysis, Example 1.2 (from memory): 29.55 psf on A_T 484 ft² of the second floor
        CalcRecord r = calc(US, Fixtures.column(MemberKind.INTERIOR_COLUMN, 1, Double.NaN, new AreaLoad("office", 484, 0)));
        assertThat(r.result("L.P")).isCloseTo(484 * 50 * (0.25 + 15.0 / 44), within(1e-6));
        assertThat(r.result("L.P") / 484).isCloseTo(29.55, within(0.005));
        assertThat(r.result("L0.P")).isEqualTo(484 * 50);
    }

    @Test
    void heavyStorageColumnOverThreeFloorsTakesTheTwentyPercentRule() {
        // ASCE 7-16 4.7.3: K_LL 4 × 3 × 300 ft² = 3600 ft² gives 0.5 by Eq. 4.7-1; heavy loads stop at 0.8
        CalcRecord r = calc(US, Fixtures.column(MemberKind.INTERIOR_COLUMN, 3, Double.NaN, new AreaLoad("storage-heavy", 900, 80)));
        assertThat(r.result("L.P")).isCloseTo(0.8 * 250 * 900, within(1e-6));
        assertThat(r.notes()).anyMatch(n -> n.clause().ref().equals("Commentary C4.7"));
        // heavy loads over 100 psf: no 0.5 L exception, so LRFD 2 with 1.6 L
        assertThat(r.result("LRFD.P")).isCloseTo(1.2 * 80 * 900 + 1.6 * 0.8 * 250 * 900, within(1e-6));
    }

    @Test
    void girderReducesWithItsOwnAreaNotWithTheBeamsReducedReactions() {
        // common practice (REFERENCES.md): the girder's own K_LL A_T; each beam hands down its unreduced share
        MemberInput beamIn = Fixtures.beam(MemberKind.INTERIOR_BEAM, 30, "office", 10, 15);
        MemberResult beam = MemberCalculation.calculate(US, beamIn);
        EndShare end = beam.right();
        assertThat(end.liveTotal()).isCloseTo(50 * 10 * 15, within(1e-9));
        assertThat(end.area()).isCloseTo(150, within(1e-9));
        MemberInput girder = new MemberInput("G1", MemberKind.INTERIOR_BEAM, new Support.Simple(30), 1, List.of(), List.of(),
                List.of(end.at(10), end.at(20), beam.left().at(10), beam.left().at(20)), 0, Double.NaN, Double.NaN, false);
        CalcRecord g = calc(US, girder);
        double area = 600, f = 0.25 + 15 / Math.sqrt(2 * area);
        assertThat(Fixtures.step(g, "A_T")).isCloseTo(area, within(1e-9));
        assertThat(g.result("L.RA")).isCloseTo(f * 2 * 7500, within(1e-6));
        assertThat(g.result("L.M+")).isCloseTo(f * 15000 * 10, within(1e-6)); // two equal loads at third points: M = Pa
        assertThat(g.result("D.RA")).isCloseTo(2 * 2250, within(1e-9));
    }

    @Test
    void concentratedLoadGovernsAShortBeamAndIsNeverAddedToTheUniformLoad() {
        // 6 ft span, 2 ft width, office: uniform L M = 100 × 36/8 = 450 lb·ft; 2000 lb on 2.5 ft: 2000(12 − 2.5)/8
        CalcRecord r = calc(US, Fixtures.beam(MemberKind.INTERIOR_BEAM, 6, "office", 2, 10));
        double lc = 2000 * (2 * 6 - 2.5) / 8;
        assertThat(r.result("Lc.M+")).isCloseTo(lc, within(1e-6));
        assertThat(r.result("Ldes.M+")).isEqualTo(r.result("Lc.M+"));
        assertThat(r.entry("gov.M+").shown()).isEqualTo("concentrated");
        assertThat(r.result("LRFD.M+")).isCloseTo(1.2 * 20 * 36 / 8 + 1.6 * lc, within(1e-6));
    }

    @Test
    void overhangBeamConcentratedReactionsAreEachTheirOwn() {
        CalcRecord r = calc(US, Fixtures.beam(new Support.Overhang(20, 5), List.of(new AreaStrip("office", 1, 0, 25, 0)),
                List.of(), Double.NaN, Double.NaN));
        assertThat(r.result("Lc.RA")).isCloseTo(2000 * (1 - 2.5 / 40), within(1e-6));
        assertThat(r.result("Lc.RB")).isCloseTo(2000 * (25 - 1.25) / 20, within(1e-6));
    }

    @Test
    void overhangLiveLoadIsPatternedForTheWorstOfEachEffect() {
        // AISC Table 3-23 overhang example with w = 1 k/ft of dead load and an unreduced assembly live load
        CalcRecord r = calc(US, Fixtures.beam(new Support.Overhang(20, 5), List.of(new AreaStrip("assembly-other", 10, 0, 25, 100)),
                List.of(), Double.NaN, Double.NaN));
        assertThat(r.result("D.RA")).isCloseTo(9375, within(1e-6));
        assertThat(r.result("D.M+")).isCloseTo(43945.3125, within(1e-3));
        assertThat(r.result("D.M-")).isCloseTo(-12500, within(1e-6));
        assertThat(r.result("L.RA")).isCloseTo(10000, within(1e-6));   // back span only: wℓ/2
        assertThat(r.result("L.M+")).isCloseTo(50000, within(1e-6));   // back span only: wℓ²/8
        assertThat(r.result("L.M-")).isCloseTo(-12500, within(1e-6));
        assertThat(r.result("L.RB")).isCloseTo(15625, within(1e-6));   // both spans
    }

    @Test
    void roofBeamCarriesLrAndLrfdThreeGoverns() {
        // 4.8.2: A_T 200 ft² gives R1 = 1; slope 6 in/ft gives R2 = 0.9; Lr = 18 psf
        MemberInput in = Fixtures.beam(new Support.Simple(20), List.of(new AreaStrip("roof-ordinary", 10, 0, 20, 15)), List.of(), 6, Double.NaN);
        CalcRecord r = calc(US, in);
        double w = 18 * 10;
        assertThat(r.result("Lr.M+")).isCloseTo(w * 400 / 8, within(1e-6));
        assertThat(r.result("LRFD.M+")).isCloseTo(1.2 * 150 * 400 / 8 + 1.6 * w * 400 / 8, within(1e-6));
        assertThat(r.entry("LRFD.M+").label()).contains("LRFD 3");
    }

    @Test
    void onARoofSheetR1AndR2AreOnlyTheRoofFactorsAndTheReactionsAreRaRb() {
        // 4.8.2, Eq. 4.8-1 uses R1, R2 for the roof factors; the reactions are R_A (x = 0) and R_B (x = span)
        MemberInput in = Fixtures.beam(new Support.Simple(20), List.of(new AreaStrip("roof-ordinary", 10, 0, 20, 15)), List.of(), 6, Double.NaN);
        CalcRecord r = calc(US, in);
        assertThat(r.steps()).filteredOn(s -> s.symbol().matches("R[12](\\..*)?")).extracting(s -> s.symbol())
                .containsExactly("R1", "R2");
        assertThat(r.results()).noneMatch(e -> e.key().matches(".*\\.R[12]"));
        // simple beam, uniform load: R = wℓ/2 = 18 psf × 10 ft × 20 ft / 2 = 1,800 lb at each support
        assertThat(r.result("Lr.RA")).isCloseTo(1800, within(1e-6));
        assertThat(r.result("Lr.RB")).isCloseTo(1800, within(1e-6));
        assertThat(r.step("R_A.Lr").description()).contains("R_A");
        assertThat(r.governing()).contains("LRFD.RA", "LRFD.RB");
    }

    @Test
    void halfLiveLoadInLrfdThreeOnlyWherePermitted() {
        AreaLoad roof = new AreaLoad("roof-ordinary", 400, 20);
        CalcRecord office = calc(US, Fixtures.column(MemberKind.INTERIOR_COLUMN, 1, 0, new AreaLoad("office", 100, 0), roof));
        assertThat(office.notes()).anyMatch(n -> n.clause().ref().equals("2.3.1, Exception 1"));
        CalcRecord assembly = calc(US, Fixtures.column(MemberKind.INTERIOR_COLUMN, 1, 0, new AreaLoad("assembly-fixed-seats", 100, 0), roof));
        assertThat(assembly.notes()).noneMatch(n -> n.clause().ref().equals("2.3.1, Exception 1"));
    }

    @Test
    void partitionAllowanceAddsFifteenPsfUnreducedByDefault() {
        CalcRecord without = calc(US, Fixtures.beam(MemberKind.INTERIOR_BEAM, 30, "office", 10, 15));
        CalcRecord with = calc(US.withOptions(new DesignOptions(true, false)), Fixtures.beam(MemberKind.INTERIOR_BEAM, 30, "office", 10, 15));
        assertThat(with.result("L.RA") - without.result("L.RA")).isCloseTo(15 * 10 * 15, within(1e-6));
        assertThat(with.inputs()).anyMatch(e -> e.key().equals("partitions") && e.shown().equals("included, not reduced"));
    }

    @Test
    void endSharesHandDownUnreducedLoadsAndTheWholeArea() {
        MemberResult r = MemberCalculation.calculate(US, Fixtures.beam(new Support.Overhang(20, 5),
                List.of(new AreaStrip("office", 8, 0, 25, 20)), List.of(), Double.NaN, Double.NaN));
        assertThat(r.left().dead() + r.right().dead()).isCloseTo(160 * 25, within(1e-9));
        assertThat(r.left().liveTotal() + r.right().liveTotal()).isCloseTo(400 * 25, within(1e-9));
        assertThat(r.left().area() + r.right().area()).isCloseTo(200, within(1e-9));
        MemberResult col = MemberCalculation.calculate(US, Fixtures.column(MemberKind.INTERIOR_COLUMN, 1, Double.NaN, new AreaLoad("office", 100, 10)));
        assertThat(col.right()).isNull();
        assertThat(col.left().dead()).isEqualTo(1000);
    }

    @Test
    void deflectionOfTheReducedLiveLoadIsFiveWlFourOver384EI() {
        double ei = 1000.0 * 1000 / 144 * 29000 * 800 / 1000; // E 29,000 ksi, I 800 in⁴ in lb·ft²
        MemberInput in = Fixtures.beam(new Support.Simple(30), List.of(new AreaStrip("office", 10, 0, 30, 15)), List.of(), Double.NaN, ei);
        CalcRecord r = calc(US, in);
        double w = 500 * (0.25 + 15 / Math.sqrt(600));
        assertThat(r.result("L.Δ")).isCloseTo(5 * w * Math.pow(30, 4) / (384 * ei), within(1e-12));
        assertThat(r.entry("L.Δ").unit()).isEqualTo("ft"); // computed in ft ...
        assertThat(r.entry("L.Δ").shownUnit()).isEqualTo("in"); // ... shown in in
    }

    @Test
    void everyRecordCarriesTheReviewCautionAndFlagsFirmAndUncertainRows() {
        OccupancyCatalogue c = OccupancyCatalogue.builtIn()
                .with(OccupancyCatalogue.custom("lab", "Firm lab", UnitSystem.US, 75, 0, 30, ReductionRule.ORDINARY, false));
        CalcRecord r = calc(US.withCatalogue(c), Fixtures.beam(MemberKind.INTERIOR_BEAM, 20, "lab", 10, 15));
        assertThat(r.notes()).anyMatch(n -> n.level() == Note.Level.CAUTION && n.text().contains("firm's own catalogue"));
        assertThat(r.notes().get(r.notes().size() - 1).text()).isEqualTo(Cautions.REVIEW);
        CalcRecord stage = calc(US, Fixtures.beam(MemberKind.INTERIOR_BEAM, 20, "stage", 10, 15));
        assertThat(stage.notes()).anyMatch(n -> n.text().contains("uncertain"));
    }

    @Test
    void unknownOccupancyIsRefusedNamingItsField() {
        assertThatThrownBy(() -> calc(US, Fixtures.beam(MemberKind.INTERIOR_BEAM, 20, "ballroom", 10, 15)))
                .isInstanceOf(InputError.class).hasMessageContaining("strips[0].occupancy").hasMessageContaining("ballroom");
    }

    @Test
    void roofWithoutASlopeOrWithOneOutOfRangeIsRefused() {
        List<AreaStrip> roof = List.of(new AreaStrip("roof-ordinary", 10, 0, 20, 15));
        assertThatThrownBy(() -> calc(US, Fixtures.beam(new Support.Simple(20), roof, List.of(), Double.NaN, Double.NaN)))
                .isInstanceOf(InputError.class).hasMessageContaining("roofSlope");
        assertThatThrownBy(() -> calc(US, Fixtures.beam(new Support.Simple(20), roof, List.of(), 30, Double.NaN)))
                .isInstanceOf(InputError.class).hasMessageContaining("roofSlope").hasMessageContaining("30");
    }

    @Test
    void siOfficeBeamFollowsTheSiEquation() {
        // ASCE 7-16 Eq. 4.7-1 (SI): 9 m span, 3 m width: A_T 27 m², K_LL 2: f = 0.25 + 4.57/sqrt(54)
        CalcRecord r = calc(Fixtures.SI, Fixtures.beam(MemberKind.INTERIOR_BEAM, 9, "office", 3, 0.7));
        double w = 2.40 * 3 * (0.25 + 4.57 / Math.sqrt(54));
        assertThat(r.result("L.M+")).isCloseTo(w * 81 / 8, within(1e-3));
        assertThat(r.entry("L.M+").unit()).isEqualTo("kN·m");
        assertThat(r.entry("L.M+").shownUnit()).isEqualTo("kN·m");
    }
}
