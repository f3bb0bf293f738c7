package com.baysheet.engine.member;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.code.ReductionRule;
import com.baysheet.engine.load.AreaLoad;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static com.baysheet.engine.Fixtures.US;
import static com.baysheet.engine.Fixtures.calc;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Roof members: which roof rows take 4.8.2 (ordinary roofs, L0 = 20 psf, only) and the 300 lb concentrated
 * load of Table 4.3-1 for roofs subject to maintenance workers, checked by 4.4 against the uniform roof load.
 */
class RoofMemberTest {
    /** A firm's own 30 psf roof row, entered with the ROOF rule (as the occupancy page and the CLI allow). */
    static final CalcContext FIRM = US.withCatalogue(OccupancyCatalogue.builtIn()
            .with(OccupancyCatalogue.custom("roof-30", "Firm roof, 30 psf", UnitSystem.US, 30, 0, 30, ReductionRule.ROOF, false)));

    static MemberInput roofBeam(double span, double width, String occupancy, double slope) {
        return Fixtures.beam(new Support.Simple(span), List.of(new AreaStrip(occupancy, width, 0, span, 15)), List.of(), slope, Double.NaN);
    }

    @Test
    void firmsThirtyPsfRoofIsNeitherReducedNorCappedAtTwentyPsf() {
        // 30 ft × 20 ft = 600 ft² and 12 in/ft would give R1 = R2 = 0.6 on an ordinary roof (4.8.2); this row is not one:
        // Lr = L0 = 30 psf, w = 30 × 20 = 600 plf, M = wℓ²/8 = 600 × 900 / 8 = 67,500 lb·ft (AISC Table 3-23, case 1)
        CalcRecord r = calc(FIRM, roofBeam(30, 20, "roof-30", 12));
        assertThat(r.result("Lr.M+")).isCloseTo(600 * 900 / 8.0, within(1e-6));
        assertThat(r.notes()).anyMatch(n -> n.level() == Note.Level.INFO && n.text().contains("not reduced")
                && n.clause().ref().equals("4.8.2, Eq. 4.8-1"));
        assertThat(Fixtures.hasStep(r, "R1")).isFalse();
    }

    @Test
    void nonOrdinaryRoofNeedsNoSlope() {
        CalcRecord r = calc(FIRM, roofBeam(30, 20, "roof-30", Double.NaN));
        assertThat(r.result("Lr.RA")).isCloseTo(600 * 15, within(1e-6));
    }

    @Test
    void firmRowOfTwentyPsfIsAnOrdinaryRoofAndIsReduced() {
        // entered in SI as 0.96 kN/m² (the code's printed value of 20 psf): 20.05 psf in a US project, still ordinary
        CalcContext ctx = US.withCatalogue(OccupancyCatalogue.builtIn()
                .with(OccupancyCatalogue.custom("roof-si", "Firm roof", UnitSystem.SI, 0.96, 0, 762, ReductionRule.ROOF, false)));
        CalcRecord r = calc(ctx, roofBeam(30, 20, "roof-si", 12));
        // 4.8.2: R1 = R2 = 0.6, 20.05 × 0.36 = 7.2 psf, raised to the 12 psf lower bound
        assertThat(r.result("Lr.M+")).isCloseTo(12 * 20 * 900 / 8.0, within(1e-6));
    }

    @Test
    void mixedRoofTakesR1FromTheOrdinaryRoofAreaOnly() {
        // ordinary roof 10 ft wide over 30 ft = 300 ft² (R1 = 1.2 − 0.001 × 300 = 0.9); the 30 psf row's 300 ft² does not
        // count towards A_T of 4.8.2 (as the reducible area of mixed floors, common practice): Lr = 20 × 0.9 = 18 psf
        MemberInput in = Fixtures.beam(new Support.Simple(30), List.of(new AreaStrip("roof-ordinary", 10, 0, 30, 15),
                new AreaStrip("roof-30", 10, 0, 30, 15)), List.of(), 0, Double.NaN);
        CalcRecord r = calc(FIRM, in);
        assertThat(Fixtures.step(r, "R1")).isCloseTo(0.9, within(1e-12));
        assertThat(r.result("Lr.M+")).isCloseTo((18 * 10 + 30 * 10) * 900 / 8.0, within(1e-6));
    }

    @Test
    void roofConcentratedLoadGovernsAShortRoofBeam() {
        // 6 ft span, 2 ft wide, flat: A_T 12 ft², R1 = R2 = 1, Lr = 20 psf, w = 40 plf: M = wℓ²/8 = 180 lb·ft.
        // Table 4.3-1 (from memory): 300 lb on 2.5 ft (4.4 default contact area), centred: M = Pℓ/4 − Pc/8
        // = 450 − 93.75 = 356.25 lb·ft; reaction with the patch at the support: R = P (ℓ − c/2)/ℓ = 300 × 4.75/6 = 237.5 lb.
        CalcRecord r = calc(US, roofBeam(6, 2, "roof-ordinary", 0));
        assertThat(r.result("Lr.M+")).isCloseTo(180, within(1e-9));
        assertThat(r.result("Lrc.M+")).isCloseTo(356.25, within(1e-6));
        assertThat(r.result("Lrc.RA")).isCloseTo(237.5, within(1e-6));
        assertThat(r.result("Lrdes.M+")).isCloseTo(356.25, within(1e-6));
        assertThat(r.entry("Lrgov.M+").shown()).isEqualTo("concentrated");
        // ASCE 7-16 2.3.1, LRFD 3: 1.2D + 1.6Lr; D = 15 psf × 2 ft = 30 plf, M_D = 30 × 36/8 = 135 lb·ft
        assertThat(r.result("LRFD.M+")).isCloseTo(1.2 * 135 + 1.6 * 356.25, within(1e-6));
    }

    @Test
    void uniformRoofLoadGovernsAnOrdinaryRafter() {
        // 24 ft × 16 ft = 384 ft²: R1 = 1.2 − 0.384 = 0.816; 6 in/ft: R2 = 0.9; Lr = 20 × 0.816 × 0.9 = 14.688 psf,
        // M = 14.688 × 16 × 24²/8 = 16,920.6 lb·ft against 300 × 24/4 − 300 × 2.5/8 = 1,706.25 lb·ft
        CalcRecord r = calc(US, roofBeam(24, 16, "roof-ordinary", 6));
        double m = 14.688 * 16 * 576 / 8;
        assertThat(r.result("Lr.M+")).isCloseTo(m, within(1e-6));
        assertThat(r.result("Lrc.M+")).isCloseTo(1706.25, within(1e-6));
        assertThat(r.result("Lrdes.M+")).isCloseTo(m, within(1e-6));
        assertThat(r.entry("Lrgov.M+").shown()).isEqualTo("uniform");
        assertThat(r.result("LRFD.M+")).isCloseTo(1.2 * 15 * 16 * 576 / 8 + 1.6 * m, within(1e-6));
    }

    @Test
    void roofConcentratedLoadIsCheckedOnASmallRoofColumn() {
        // 10 ft² of flat roof: Lr = 20 psf × 10 = 200 lb < 300 lb, so the concentrated load governs the roof live load
        CalcRecord r = calc(US, Fixtures.column(MemberKind.INTERIOR_COLUMN, 1, 0, new AreaLoad("roof-ordinary", 10, 15)));
        assertThat(r.result("Lr.P")).isCloseTo(200, within(1e-9));
        assertThat(r.result("Lrdes.P")).isCloseTo(300, within(1e-9));
        assertThat(r.result("LRFD.P")).isCloseTo(1.2 * 150 + 1.6 * 300, within(1e-9));
    }

    @Test
    void siRoofConcentratedLoadIsOnePointThreeThreeKilonewtons() {
        // 1.8 m span: M = Pℓ/4 − Pc/8 = 1.33 × 1.8/4 − 1.33 × 0.762/8 = 0.5985 − 0.12668 = 0.47182 kN·m
        CalcRecord r = calc(Fixtures.SI, Fixtures.beam(new Support.Simple(1.8), List.of(new AreaStrip("roof-ordinary", 0.6, 0, 1.8, 0.7)),
                List.of(), 0, Double.NaN));
        assertThat(r.result("Lrc.M+")).isCloseTo(1.33 * 1.8 / 4 - 1.33 * 0.762 / 8, within(1e-9));
    }
}
