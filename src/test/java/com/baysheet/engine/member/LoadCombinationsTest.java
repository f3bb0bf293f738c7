package com.baysheet.engine.member;

import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** ASCE 7-16 2.3.1 (LRFD) and 2.4.1 (ASD) gravity combinations, from memory (REFERENCES.md). */
class LoadCombinationsTest {
    final RecordBuilder rec = new RecordBuilder("T", "ASCE 7-16", UnitSystem.US);

    LoadCombinations.Governing lrfd(double d, double l, double lr, boolean half) {
        return LoadCombinations.govern(true, "U", new LoadCombinations.Unfactored("moment", d, l, lr, half, Quantity.MOMENT, Clause.NONE, Clause.NONE), rec);
    }

    LoadCombinations.Governing asd(double d, double l, double lr) {
        return LoadCombinations.govern(false, "A", new LoadCombinations.Unfactored("moment", d, l, lr, false, Quantity.MOMENT, Clause.NONE, Clause.NONE), rec);
    }

    @Test
    void deadLoadAloneGovernsWithOnePointFour() {
        assertThat(lrfd(100, 5, 0, false).value()).isCloseTo(140, within(1e-12));
        assertThat(lrfd(100, 5, 0, false).combination().name()).isEqualTo("LRFD 1");
    }

    @Test
    void floorLiveLoadGovernsWithOnePointTwoDPlusOnePointSixL() {
        var g = lrfd(100, 100, 10, false);
        assertThat(g.value()).isCloseTo(1.2 * 100 + 1.6 * 100 + 0.5 * 10, within(1e-12));
        assertThat(g.combination().name()).isEqualTo("LRFD 2");
    }

    @Test
    void roofLiveLoadGovernsWithOnePointSixLrAndHalfLWherePermitted() {
        // 2.3.1 Exception 1: 0.5 L in combination 3 where L0 <= 100 psf, no garage or assembly
        assertThat(lrfd(100, 20, 100, true).value()).isCloseTo(1.2 * 100 + 0.5 * 20 + 1.6 * 100, within(1e-12));
        assertThat(lrfd(100, 20, 100, false).value()).isCloseTo(1.2 * 100 + 1.0 * 20 + 1.6 * 100, within(1e-12));
        assertThat(lrfd(100, 20, 100, true).combination().name()).isEqualTo("LRFD 3");
    }

    @Test
    void serviceCombinationsTakeTheLargest() {
        assertThat(asd(100, 50, 10).value()).isCloseTo(150, within(1e-12));
        assertThat(asd(100, 50, 60).value()).isCloseTo(100 + 0.75 * 50 + 0.75 * 60, within(1e-12));
        assertThat(asd(100, 0, 60).combination().name()).isEqualTo("ASD 3");
    }

    @Test
    void negativeMomentsGovernByMagnitude() {
        assertThat(lrfd(-100, -100, 0, false).value()).isCloseTo(-280, within(1e-12));
    }

    @Test
    void governingCombinationIsRecordedAsAStepWithItsFormula() {
        lrfd(100, 100, 0, false);
        var step = rec.build().step("U");
        assertThat(step.formula()).isEqualTo("1.20D + 1.60L + 0.500Lr");
        assertThat(step.description()).contains("LRFD 2 governs");
    }
}
