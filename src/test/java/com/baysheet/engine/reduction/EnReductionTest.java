package com.baysheet.engine.reduction;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * EN 1991-1-1 6.3.1.2 with the recommended values, and the UK National Annex (from memory). Hand calculations beside
 * each case: α_A = 5/7 ψ0 + A0/A ≤ 1.0 (A0 = 10 m², ≥ 0.6 for C and D), α_n = (2 + (n − 2) ψ0)/n, ψ0 = 0.7 for A to D.
 */
class EnReductionTest {
    static final double TOL = 1e-9;
    final MethodCase en = new MethodCase("en1991-recommended", UnitSystem.SI);
    final MethodCase uk = new MethodCase("en1991-uk-na", UnitSystem.SI);

    @Test
    void officeBeamFollowsEq6_1() {
        // EN 1991-1-1 Eq. 6.1, category B, A = 30 m²: 5/7 × 0.7 + 10/30 = 0.8333
        assertThat(en.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "office", 30).of("office")).isCloseTo(0.5 + 10.0 / 30, within(TOL));
        assertThat(en.record().step("α_A[office]").clause().label()).isEqualTo("EN 1991-1-1 6.3.1.2(10), Eq. 6.1");
        assertThat(en.record().step("ψ0[office]").clause().label()).isEqualTo("EN 1990 Table A1.1");
    }

    @Test
    void areaFactorIsCappedAtOne() {
        // A = 20 m²: 0.5 + 0.5 = 1.0 exactly; A = 10 m²: 1.5, capped to 1.0
        assertThat(en.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "office", 20).of("office")).isCloseTo(1.0, within(TOL));
        assertThat(en.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "office", 10).of("office")).isEqualTo(1.0);
    }

    @Test
    void categoriesCAndDStopAtSixTenths() {
        // retail, category D, A = 200 m²: 0.5 + 0.05 = 0.55, raised to 0.6
        assertThat(en.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "retail-upper", 200).of("retail-upper")).isCloseTo(0.6, within(TOL));
        // office, category B, A = 200 m²: 0.55 stays
        assertThat(en.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "office", 200).of("office")).isCloseTo(0.55, within(TOL));
    }

    @Test
    void storageGaragesAndUnmappedRowsAreNotReduced() {
        assertThat(en.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "storage-heavy", 200).of("storage-heavy")).isEqualTo(1.0);
        assertThat(en.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "garage-passenger", 200).of("garage-passenger")).isEqualTo(1.0);
        assertThat(en.record().notes()).anyMatch(n -> n.text().contains("category F"));
    }

    @Test
    void theCataloguesRefusalIsKept() {
        // assembly is category C in EN, but the catalogue does not reduce it: kept (conservative)
        assertThat(en.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "assembly-other", 200).of("assembly-other")).isEqualTo(1.0);
    }

    @Test
    void columnOverFiveStoreysTakesTheLesserOfAlphaAAndAlphaN() {
        // Eq. 6.2, n = 5: (2 + 3 × 0.7)/5 = 0.82; α_A from one storey, 150/5 = 30 m²: 0.8333; not combined: 0.82
        LiveFactors f = en.reduce(MemberKind.INTERIOR_COLUMN, 5, 0, 0, "office", 150);
        assertThat(Fixtures.step(en.record(), "α_n[office]")).isCloseTo(0.82, within(TOL));
        assertThat(Fixtures.step(en.record(), "A_storey")).isCloseTo(30, within(TOL));
        assertThat(f.of("office")).isCloseTo(0.82, within(TOL));
        assertThat(en.record().notes()).anyMatch(n -> n.level() == Note.Level.CAUTION && n.clause().label().contains("3.3.1(2)P"));
    }

    @Test
    void twoStoreysTakeNoStoreyFactor() {
        // n = 2 is not more than 2: α_n = 1; α_A from 100/2 = 50 m²: 0.5 + 0.2 = 0.7
        assertThat(en.reduce(MemberKind.INTERIOR_COLUMN, 2, 0, 0, "office", 100).of("office")).isCloseTo(0.7, within(TOL));
    }

    @Test
    void storeysCountOnlyFloorsOfTheSameCategory() {
        // three listed floors, office on two of them: n = 2 for office, α_n = 1; least storey area 40 m²: 0.5 + 0.25 = 0.75
        List<SupportedFloor> floors = List.of(
                new SupportedFloor("L3", MemberKind.INTERIOR_COLUMN, List.of(new AreaShare("office", 40))),
                new SupportedFloor("L2", MemberKind.INTERIOR_COLUMN, List.of(new AreaShare("office", 60))),
                new SupportedFloor("L1", MemberKind.INTERIOR_COLUMN, List.of(new AreaShare("storage-light", 60))));
        LiveFactors f = en.reduce(MemberKind.INTERIOR_COLUMN, 3, 0, 0, floors, "office", 100, "storage-light", 60);
        assertThat(f.of("office")).isCloseTo(0.75, within(TOL));
        assertThat(f.of("storage-light")).isEqualTo(1.0);
    }

    @Test
    void ukAnnexAreaFactorIsLinearWithItsOwnFloor() {
        // UK NA (from memory): α_A = 1 − A/1000 ≥ 0.75; A = 100: 0.9; A = 400: 0.6 -> 0.75
        assertThat(uk.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "office", 100).of("office")).isCloseTo(0.9, within(TOL));
        assertThat(uk.reduce(MemberKind.INTERIOR_BEAM, 1, 0, 0, "office", 400).of("office")).isCloseTo(0.75, within(TOL));
        assertThat(uk.record().step("α_A[office]").clause().confidence()).isEqualTo("uncertain");
    }

    @Test
    void ukAnnexStoreyFactorSteps() {
        // UK NA (from memory): α_n = 1.1 − n/10 up to 5 storeys, 0.6 from 6 to 10, 0.5 over 10. The Concrete Centre's
        // Worked Examples to Eurocode 2 print α_n = 0.6 for their column (UK NA), the value of 6 to 10 storeys.
        // Storey area 10 m² keeps α_A = 0.99, so α_n governs.
        assertThat(uk.reduce(MemberKind.INTERIOR_COLUMN, 3, 0, 0, "office", 30).of("office")).isCloseTo(0.8, within(TOL));
        assertThat(uk.reduce(MemberKind.INTERIOR_COLUMN, 6, 0, 0, "office", 60).of("office")).isCloseTo(0.6, within(TOL));
        assertThat(uk.reduce(MemberKind.INTERIOR_COLUMN, 10, 0, 0, "office", 100).of("office")).isCloseTo(0.6, within(TOL));
        assertThat(uk.reduce(MemberKind.INTERIOR_COLUMN, 11, 0, 0, "office", 110).of("office")).isCloseTo(0.5, within(TOL));
    }
}
