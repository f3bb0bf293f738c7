package com.baysheet.engine.member;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Note;
import org.junit.jupiter.api.Test;

import java.util.List;

import static com.baysheet.engine.Fixtures.US;
import static com.baysheet.engine.Fixtures.calc;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Least reactions of an overhanging beam: ASCE 7-16 4.3.3 partial loading, 2.3.1 combination 2 and 2.4.1
 * combination 2 (clause numbers from memory, REFERENCES.md).
 */
class MinimumReactionsTest {
    /** 10 ft back span + 8 ft overhang, a 10 ft strip of 15 psf dead and 50 psf office live, no partitions, no self weight. */
    static CalcRecord overhang(DesignOptions options, String occupancy, double width) {
        return calc(US.withOptions(options), Fixtures.beam(new Support.Overhang(10, 8),
                List.of(new AreaStrip(occupancy, width, 0, 18, 15)), List.of(), Double.NaN, Double.NaN));
    }

    @Test
    void liveLoadOnTheOverhangOnlyLiftsTheBackSpanSupport() {
        CalcRecord r = overhang(DesignOptions.DEFAULT, "office", 10);
        // Hand calculation. w_D = 15 × 10 = 150 plf over 18 ft: R_A,D = w(ℓ² − a²)/2ℓ = 150 × (100 − 64)/20 = 270 lb.
        // w_L = 50 × 10 = 500 plf on the overhang only (4.3.3), unreduced (K_LL A_T = 2 × 180 = 360 < 400 anyway):
        // R_A,L = −w a²/2ℓ = −500 × 64/20 = −1,600 lb.
        // 2.3.1 combination 2: R_A = 1.2 × 270 − 1.6 × 1600 = −2,236 lb. 2.4.1 combination 2: 270 − 1600 = −1,330 lb.
        assertThat(r.result("D.RA")).isCloseTo(270, within(1e-9));
        assertThat(r.result("L0.RA,min")).isCloseTo(-1600, within(1e-9));
        assertThat(r.result("LRFD.RA,min")).isCloseTo(-2236, within(1e-9));
        assertThat(r.entry("LRFD.RA,min").shown()).isEqualTo("-2.24 kip");
        assertThat(r.entry("LRFD.RA,min").label()).endsWith("(LRFD 2)");
        assertThat(r.step("LRFD.RA,min").clause().ref()).isEqualTo("2.3.1, combination 2");
        assertThat(r.step("LRFD.RA,min").substituted()).isEqualTo("1.2 × 0.270 + 1.6 × (-1.60)");
        assertThat(r.result("ASD.RA,min")).isCloseTo(-1330, within(1e-9));
        assertThat(r.entry("ASD.RA,min").label()).endsWith("(ASD 2)");
        assertThat(r.step("R_A,min.L0").substituted()).isEqualTo("live load on the overhang only");
        // the maximum reaction is still the gravity design value
        assertThat(r.result("LRFD.RA")).isGreaterThan(0);
    }

    @Test
    void theSupportNextToTheOverhangKeepsItsFactoredDeadReaction() {
        CalcRecord r = overhang(DesignOptions.DEFAULT, "office", 10);
        // R_B,D = w(ℓ + a)²/2ℓ = 150 × 324/20 = 2,430 lb; no live pattern lowers R_B, so the least is with no live load:
        // 1.2 × 2430 = 2,916 lb factored (combination 2 with L = 0 is below 1.4D), 2,430 lb service
        assertThat(r.result("L0.RB,min")).isEqualTo(0);
        assertThat(r.result("LRFD.RB,min")).isCloseTo(2916, within(1e-9));
        assertThat(r.result("ASD.RB,min")).isCloseTo(2430, within(1e-9));
    }

    @Test
    void upliftIsACautionNamingTheSupportAndTheSupportingMember() {
        CalcRecord r = overhang(DesignOptions.DEFAULT, "office", 10);
        List<Note> uplift = r.notes().stream().filter(n -> n.text().startsWith("Uplift")).toList();
        assertThat(uplift).hasSize(1);
        assertThat(uplift.get(0).level()).isEqualTo(Note.Level.CAUTION);
        assertThat(uplift.get(0).text()).contains("support A (x = 0)").contains("-2.24 kip factored (LRFD 2)")
                .contains("-1.33 kip service (ASD 2)").contains("supporting member").contains("gravity maxima only");
        assertThat(r.notes()).anyMatch(n -> n.level() == Note.Level.INFO && n.text().startsWith(
                "Minimum reactions from 1.2D + 1.6L with live load on the overhang only (2.3.1, combination 2)"));
        assertThat(r.notes()).noneMatch(n -> n.text().contains("firm practice"));
    }

    @Test
    void noCautionWhereTheDeadLoadHoldsTheBackSpanDown() {
        // 20 ft + 2 ft, 100 psf dead, 10 ft: R_A,D = 1000 × (400 − 4)/40 = 9,900 lb. Uniform live on the overhang:
        // −500 × 4/40 = −50 lb; the 2,000 lb concentrated load on its 2.5 ft square at the tip (centre x = 20.75 ft):
        // 2000 × (20 − 20.75)/20 = −75 lb governs. 1.2 × 9900 − 1.6 × 75 = 11,760 lb
        CalcRecord r = calc(US, Fixtures.beam(new Support.Overhang(20, 2), List.of(new AreaStrip("office", 10, 0, 22, 100)),
                List.of(), Double.NaN, Double.NaN));
        assertThat(r.result("L0.RA,min")).isCloseTo(-75, within(1e-9));
        assertThat(r.result("LRFD.RA,min")).isCloseTo(1.2 * 9900 - 1.6 * 75, within(1e-6));
        assertThat(r.notes()).noneMatch(n -> n.text().startsWith("Uplift"));
    }

    @Test
    void firmOptionAlsoTakesNinetyPercentOfTheDeadLoadAndSaysSo() {
        CalcRecord r = overhang(new DesignOptions(false, false, true), "office", 10);
        // firm practice, not a 2.3.1 combination: 0.9 × 270 − 1.6 × 1600 = −2,317 lb
        assertThat(r.result("LRFD.RA,min")).isCloseTo(-2317, within(1e-9));
        assertThat(r.entry("LRFD.RA,min").label()).endsWith("(firm 0.9D)");
        assertThat(r.step("LRFD.RA,min").clause().isNone()).isTrue();
        assertThat(r.notes()).anyMatch(n -> n.text().startsWith(
                "Minimum reactions from 1.2D + 1.6L with live load on the overhang only (2.3.1, combination 2); "
                        + "also 0.9D + 1.6L (firm practice, not a 2.3.1 combination)"));
        assertThat(r.result("ASD.RA,min")).isCloseTo(-1330, within(1e-9));   // ASD unchanged
    }

    @Test
    void concentratedLoadAtTheTipGovernsANarrowStrip() {
        CalcRecord r = overhang(DesignOptions.DEFAULT, "office", 2);
        // 4.4: 2,000 lb on a 30 in (2.5 ft) square centred 1.25 ft from the tip, x = 16.75 ft:
        // R_A = 2000 × (10 − 16.75)/10 = −1,350 lb, against the uniform −100 × 64/20 = −320 lb
        assertThat(r.result("L0.RA,min")).isCloseTo(-1350, within(1e-9));
        assertThat(r.step("R_A,min.L0").substituted()).contains("concentrated load");
        // w_D = 15 × 2 = 30 plf: R_A,D = 30 × (100 − 64)/20 = 54 lb; 1.2 × 54 − 1.6 × 1350 = −2,095.2 lb
        assertThat(r.result("LRFD.RA,min")).isCloseTo(1.2 * 54 - 1.6 * 1350, within(1e-9));
    }

    @Test
    void simpleSpansAndCantileversReportNoMinimum() {
        CalcRecord simple = calc(US, Fixtures.beam(com.baysheet.engine.code.MemberKind.INTERIOR_BEAM, 20, "office", 10, 15));
        CalcRecord cantilever = calc(US, Fixtures.beam(new Support.Cantilever(6), List.of(new AreaStrip("office", 10, 0, 6, 15)),
                List.of(), Double.NaN, Double.NaN));
        assertThat(simple.results()).noneMatch(e -> e.key().endsWith(",min"));
        assertThat(cantilever.results()).noneMatch(e -> e.key().endsWith(",min"));
    }

    @Test
    void roofLiveLoadOnTheOverhangEntersCombinationThree() {
        // roof-ordinary L0 = 20 psf unreduced on the overhang: R_A,Lr = −200 × 64/20 = −640 lb; R_A,D = 270 lb.
        // 2.3.1 combination 3: 1.2 × 270 + 1.6 × (−640) = −700 lb (combination 2: 1.2 × 270 + 0.5 × (−640) = 4 lb)
        CalcRecord r = calc(US, Fixtures.beam(new Support.Overhang(10, 8), List.of(new AreaStrip("roof-ordinary", 10, 0, 18, 15)),
                List.of(), 0.25, Double.NaN));
        assertThat(r.result("Lr0.RA,min")).isCloseTo(-640, within(1e-9));
        assertThat(r.result("LRFD.RA,min")).isCloseTo(-700, within(1e-9));
        assertThat(r.entry("LRFD.RA,min").label()).endsWith("(LRFD 3)");
        assertThat(r.notes()).anyMatch(n -> n.text().startsWith("Minimum reactions from 1.2D + 1.6Lr with live load on the overhang only (2.3.1, combination 3)"));
    }

    @Test
    void theRoofConcentratedLoadAtTheOverhangTipCanLiftTheBackSpan() {
        // Hand calculation. A 1 ft wide roof joist, 10 ft back span + 2 ft overhang, 5 psf dead, ordinary roof, flat.
        // R_A,D = w(ℓ² − a²)/2ℓ = 5 × (100 − 4)/20 = 24 lb. Uniform Lr (20 psf, A_T 12 ft², R1 = R2 = 1) on the overhang
        // only: R_A = −20 × 4/20 = −4 lb, so 1.2D + 1.6Lr = 28.8 − 6.4 = 22.4 lb, no uplift. The 300 lb roof concentrated
        // load (Table 4.3-1, from memory) on its 2.5 ft square at the tip, centred 10.75 ft from A: by statics
        // R_A = −300 × 0.75/10 = −22.5 lb, and 2.3.1 combination 3 gives 1.2 × 24 + 1.6 × (−22.5) = −7.2 lb: uplift.
        CalcRecord r = calc(US, Fixtures.beam(new Support.Overhang(10, 2), List.of(new AreaStrip("roof-ordinary", 1, 0, 12, 5)),
                List.of(), 0, Double.NaN));
        assertThat(r.result("D.RA")).isCloseTo(24, within(1e-9));
        assertThat(r.result("Lr0.RA,min")).isCloseTo(-22.5, within(1e-9));
        assertThat(r.step("R_A,min.Lr0").substituted()).contains("roof concentrated load").contains("overhang tip");
        assertThat(r.result("LRFD.RA,min")).isCloseTo(-7.2, within(1e-9));
        assertThat(r.notes()).anyMatch(n -> n.level() == Note.Level.CAUTION && n.text().startsWith("Uplift at support A"));
    }
}
