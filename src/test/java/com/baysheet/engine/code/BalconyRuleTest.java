package com.baysheet.engine.code;

import com.baysheet.engine.InputError;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * Balconies and decks, ASCE 7-16 Table 4.3-1 (from memory, REFERENCES.md): 1.5 × the live load of the area
 * served, need not exceed 100 psf (4.79 kN/m²). Each system from its own printed L0.
 */
class BalconyRuleTest {
    private static final OccupancyCatalogue CAT = OccupancyCatalogue.builtIn();

    @Test
    void theFactorAndCapAreData() {
        BalconyRule r = CAT.balconyRule();
        assertThat(r.factor()).isEqualTo(1.5);
        assertThat(r.capPsf()).isEqualTo(100.0);
        assertThat(r.capKPa()).isEqualTo(4.79);
        assertThat(r.confidence()).isEqualTo("memory");
    }

    // served L0 → balcony L0 = max(L0, min(1.5 L0, cap)), psf and kN/m²
    @ParameterizedTest(name = "{0}")
    @CsvSource({
            "office,              75,  3.6",    // 1.5 × 50 = 75; 1.5 × 2.40 = 3.60
            "residential-other,   60,  2.88",   // 1.5 × 40 = 60; 1.5 × 1.92 = 2.88
            "office-corridor,     100, 4.79",   // 1.5 × 80 = 120 → 100; 1.5 × 3.83 = 5.745 → 4.79
            "assembly-movable-seats, 100, 4.79", // 1.5 × 100 = 150 → 100, the served L0 itself
            "storage-heavy,       250, 11.97"}) // the cap would fall below the area served: kept at 250 (conservative choice)
    void balconyLoadIsOneAndAHalfTimesTheAreaServedCappedNeverBelowIt(String served, double psf, double kpa) {
        Occupancy b = CAT.get("balcony:" + served);
        assertThat(b.uniformPsf()).isCloseTo(psf, within(1e-9));
        assertThat(b.uniformKPa()).isCloseTo(kpa, within(1e-9));
        assertThat(b.serves()).isEqualTo(served);
        assertThat(b.isBalcony()).isTrue();
    }

    @Test
    void aBalconyKeepsTheConcentratedLoadAndAssemblyOfTheAreaServedAndIsNotReduced() {
        Occupancy b = CAT.get("balcony:office");
        assertThat(b.concentratedLb()).isEqualTo(2000.0);
        assertThat(b.concentrated(UnitSystem.SI)).isEqualTo(8.9);
        assertThat(b.contactSide(UnitSystem.US)).isEqualTo(2.5);
        assertThat(b.rule()).isEqualTo(ReductionRule.NOT_REDUCIBLE);
        assertThat(b.assembly()).isFalse();
        assertThat(CAT.get("balcony:assembly-movable-seats").assembly()).isTrue();
        assertThat(b.confidence()).isEqualTo("memory");
    }

    @Test
    void roofsGetNoBalconyAndTheDefaultFallsBackToTheRoofItself() {
        assertThat(CAT.contains("balcony:roof-ordinary")).isFalse();
        assertThat(CAT.balconyOf("roof-ordinary")).isEqualTo("roof-ordinary");
        assertThat(CAT.balconyOf("office")).isEqualTo("balcony:office");
    }

    @Test
    void balconiesAreFoundByIdButNotListedAmongTheRows() {
        assertThat(CAT.all()).noneMatch(Occupancy::isBalcony);
        assertThat(CAT.balconies()).allMatch(Occupancy::isBalcony)
                .hasSize((int) CAT.all().stream().filter(o -> !o.isRoof()).count());
    }

    @Test
    void aFirmRowGetsItsBalconyToo() {
        Occupancy lab = OccupancyCatalogue.custom("lab", "Firm lab", UnitSystem.US, 60, 1000, 30, ReductionRule.ORDINARY, false);
        Occupancy b = CAT.with(lab).get("balcony:lab");
        assertThat(b.uniformPsf()).isCloseTo(90.0, within(1e-9));
        assertThat(b.confidence()).isEqualTo("firm");
        assertThat(CAT.contains("balcony:lab")).isFalse();
    }

    @Test
    void aFactorBelowOneIsRefused() {
        assertThatThrownBy(() -> new BalconyRule(0.9, 100, 4.79, "memory")).isInstanceOf(InputError.class)
                .hasMessageContaining("balcony.factor");
    }
}
