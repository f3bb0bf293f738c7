package com.baysheet.engine.member;

import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** ASCE 7-16 2.3.1 and 2.4.1 with S in the "(Lr or S or R)" terms, from memory (REFERENCES.md); R is not computed. */
class SnowCombinationsTest {
    final RecordBuilder rec = new RecordBuilder("T", "ASCE 7-16", UnitSystem.US);

    LoadCombinations.Governing lrfd(double d, double l, double lr, double s, boolean half) {
        return LoadCombinations.govern(true, "U", new LoadCombinations.Unfactored("moment", d, l, lr, s, half, Quantity.MOMENT, Clause.NONE, Clause.NONE), rec);
    }

    LoadCombinations.Governing asd(double d, double l, double lr, double s) {
        return LoadCombinations.govern(false, "A", new LoadCombinations.Unfactored("moment", d, l, lr, s, false, Quantity.MOMENT, Clause.NONE, Clause.NONE), rec);
    }

    @Test
    void snowTakesTheRoofTermOfCombinationThreeWithHalfL() {
        // ASCE 7-16 2.3.1 combination 3: 1.2D + 1.6(Lr or S or R) + (L or 0.5W); no wind, so L, and 0.5 L by Exception 1
        // D = 100, L = 20, Lr = 10, S = 100: 1.2 × 100 + 1.6 × 100 + 0.5 × 20 = 290
        // (combination 2 with S: 1.2 × 100 + 1.6 × 20 + 0.5 × 100 = 202; combination 3 with Lr: 120 + 16 + 10 = 146)
        var g = lrfd(100, 20, 10, 100, true);
        assertThat(g.value()).isCloseTo(290, within(1e-9));
        assertThat(g.combination().name()).isEqualTo("LRFD 3");
        assertThat(g.roofTerm()).isEqualTo("S");
        assertThat(g.label()).isEqualTo("LRFD 3: 1.2D + 1.6S + 0.5L");
        assertThat(rec.build().step("U").formula()).isEqualTo("1.2D + 1.6S + 0.5L");
    }

    @Test
    void combinationThreeTakesFullLWhereTheExceptionIsClosed() {
        // ASCE 7-16 2.3.1 combination 3 without Exception 1 (a garage, say): 1.2 × 100 + 1.6 × 100 + 1.0 × 20 = 300
        var g = lrfd(100, 20, 10, 100, false);
        assertThat(g.value()).isCloseTo(300, within(1e-9));
        assertThat(g.label()).isEqualTo("LRFD 3: 1.2D + 1.6S + L");
    }

    @Test
    void snowTakesTheHalfFactorInCombinationTwo() {
        // ASCE 7-16 2.3.1 combination 2: 1.2D + 1.6L + 0.5(Lr or S or R)
        // D = 100, L = 100, Lr = 10, S = 30: 120 + 160 + 0.5 × 30 = 295 (combination 3 with S: 120 + 48 + 50 = 218)
        var g = lrfd(100, 100, 10, 30, false);
        assertThat(g.value()).isCloseTo(295, within(1e-9));
        assertThat(g.label()).isEqualTo("LRFD 2: 1.2D + 1.6L + 0.5S");
    }

    @Test
    void roofLiveLoadIsNamedWhereItExceedsSnow() {
        // D = 100, L = 0, Lr = 20, S = 15: combination 3 with Lr, 120 + 1.6 × 20 = 152 over 120 + 24 = 144
        var g = lrfd(100, 0, 20, 15, true);
        assertThat(g.value()).isCloseTo(152, within(1e-9));
        assertThat(g.roofTerm()).isEqualTo("Lr");
        assertThat(g.label()).isEqualTo("LRFD 3: 1.2D + 1.6Lr"); // no L on the member: left out of the label
    }

    @Test
    void serviceCombinationFourTakesThreeQuartersOfSnow() {
        // ASCE 7-16 2.4.1 combination 4: D + 0.75L + 0.75(Lr or S or R)
        // D = 100, L = 60, Lr = 0, S = 50: 100 + 45 + 37.5 = 182.5 (D + L = 160, D + S = 150)
        var g = asd(100, 60, 0, 50);
        assertThat(g.value()).isCloseTo(182.5, within(1e-9));
        assertThat(g.label()).isEqualTo("ASD 4: D + 0.75L + 0.75S");
    }

    @Test
    void serviceCombinationThreeTakesSnowAlone() {
        // ASCE 7-16 2.4.1 combination 3: D + (Lr or S or R); D = 100, L = 0, S = 40: 140
        var g = asd(100, 0, 10, 40);
        assertThat(g.value()).isCloseTo(140, within(1e-9));
        assertThat(g.label()).isEqualTo("ASD 3: D + S");
    }

    @Test
    void withoutSnowTheCombinationsAreThoseOfDLAndLr() {
        var g = LoadCombinations.govern(true, "U", new LoadCombinations.Unfactored("moment", 100, 100, 10, false, Quantity.MOMENT, Clause.NONE, Clause.NONE), rec);
        assertThat(g.label()).isEqualTo("LRFD 2");
        assertThat(rec.build().step("U").formula()).isEqualTo("1.20D + 1.60L + 0.500Lr");
    }
}
