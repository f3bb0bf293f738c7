package com.baysheet.engine.reduction;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * NBC 2020 4.1.5.8 tributary area factors (from memory; sentence numbers uncertain), hand calculations beside each:
 * 0.5 + √(20/A) over 80 m² of storage, manufacturing, retail, garages (and assembly of 4.8 kPa or more); 0.3 + √(9.8/B)
 * over 20 m² of other uses. Each factor is 1 at its threshold, which is how the pairing is checked.
 */
class NbcReductionTest {
    static final double TOL = 1e-9;
    final MethodCase nbc = new MethodCase("nbc-2020", UnitSystem.SI);

    @Test
    void officeColumnOf100SquareMetres() {
        // 0.3 + √(9.8/100) = 0.3 + 0.31305 = 0.61305
        assertThat(nbc.reduce(MemberKind.INTERIOR_COLUMN, 2, 0, 0, "office", 100).of("office")).isCloseTo(0.3 + Math.sqrt(0.098), within(TOL));
        assertThat(nbc.record().step("f_other").clause().label()).isEqualTo("NBC 2020 4.1.5.8(3)");
    }

    @Test
    void retailAndStorageTakeTheLargeAreaRule() {
        // 0.5 + √(20/100) = 0.94721; storage 500 m²: 0.5 + √0.04 = 0.70
        assertThat(nbc.reduce(MemberKind.INTERIOR_COLUMN, 1, 0, 0, "retail-first", 100).of("retail-first")).isCloseTo(0.5 + Math.sqrt(0.2), within(TOL));
        assertThat(nbc.reduce(MemberKind.INTERIOR_COLUMN, 1, 0, 0, "storage-heavy", 500).of("storage-heavy")).isCloseTo(0.70, within(TOL));
    }

    @Test
    void eachFactorIsOneAtItsOwnThreshold() {
        assertThat(nbc.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "office", 20).of("office")).isEqualTo(1.0);
        assertThat(nbc.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "retail-first", 80).of("retail-first")).isEqualTo(1.0);
        // just above each threshold the factor is just below 1: continuity
        assertThat(nbc.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "office", 20.001).of("office")).isCloseTo(1.0, within(1e-4)).isLessThan(1.0);
        assertThat(nbc.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "retail-first", 80.001).of("retail-first")).isCloseTo(1.0, within(1e-4)).isLessThan(1.0);
    }

    @Test
    void mixedUsesTakeEachRuleFromItsOwnArea() {
        // office 50 m²: 0.3 + √(9.8/50) = 0.74272; retail 100 m²: 0.94721; assembly added unreduced
        LiveFactors f = nbc.reduce(MemberKind.INTERIOR_COLUMN, 1, 0, 0, "office", 50, "retail-first", 100, "assembly-other", 30);
        assertThat(f.of("office")).isCloseTo(0.3 + Math.sqrt(9.8 / 50), within(TOL));
        assertThat(f.of("retail-first")).isCloseTo(0.5 + Math.sqrt(0.2), within(TOL));
        assertThat(f.of("assembly-other")).isEqualTo(1.0);
        assertThat(Fixtures.hasStep(nbc.record(), "f_large")).isTrue();
    }
}
