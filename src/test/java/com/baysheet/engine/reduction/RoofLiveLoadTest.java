package com.baysheet.engine.reduction;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.Fixtures;
import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.code.OccupancyCatalogue;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.RecordBuilder;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** ASCE 7-16 4.8.2, Eq. 4.8-1: Lr = L0 R1 R2 with 12 <= Lr <= 20 psf (REFERENCES.md, memory). */
class RoofLiveLoadTest {
    static final Occupancy ROOF = OccupancyCatalogue.builtIn().get("roof-ordinary");
    CalcRecord last;

    double factor(CalcContext ctx, double area, double slope) {
        RecordBuilder rec = new RecordBuilder("R", ctx.edition().id(), ctx.system());
        double f = RoofLiveLoad.factor(ctx, ROOF, area, slope, rec);
        last = rec.build();
        return f;
    }

    // R1 = 1 for A_T <= 200 ft², 1.2 − 0.001 A_T between, 0.6 for A_T >= 600
    @ParameterizedTest(name = "A_T {0} ft²: R1 = {1}")
    @CsvSource({"100, 1", "200, 1", "200.5, 0.9995", "400, 0.8", "599, 0.601", "600, 0.6", "5000, 0.6"})
    void tributaryAreaFactorR1(double area, double r1) {
        factor(Fixtures.US, area, 0);
        assertThat(Fixtures.step(last, "R1")).isCloseTo(r1, within(1e-12));
    }

    // R2 = 1 for F <= 4, 1.2 − 0.05 F between, 0.6 for F >= 12 (F in in/ft)
    @ParameterizedTest(name = "F {0}: R2 = {1}")
    @CsvSource({"0, 1", "4, 1", "4.5, 0.975", "8, 0.8", "12, 0.6", "20, 0.6"})
    void slopeFactorR2(double slope, double r2) {
        factor(Fixtures.US, 100, slope);
        assertThat(Fixtures.step(last, "R2")).isCloseTo(r2, within(1e-12));
    }

    @Test
    void roofLiveLoadIsTheProductWithinItsBounds() {
        assertThat(factor(Fixtures.US, 400, 8) * 20).isCloseTo(20 * 0.8 * 0.8, within(1e-9));
        assertThat(Fixtures.step(last, "Lr")).isCloseTo(12.8, within(1e-9));
    }

    @Test
    void lowerBoundOfTwelvePsfGoverns() {
        // 20 × 0.6 × 0.6 = 7.2 psf, raised to 12 psf
        assertThat(factor(Fixtures.US, 600, 12) * 20).isCloseTo(12, within(1e-12));
        assertThat(last.notes()).anyMatch(n -> n.text().startsWith("Lower bound governs"));
    }

    @Test
    void siUsesItsOwnPrintedConstants() {
        // SI: R1 = 1.2 − 0.011 A_T between 18.58 and 55.74 m²; F = 0.12 × slope in percent
        factor(Fixtures.SI, 30, 50);
        assertThat(Fixtures.step(last, "R1")).isCloseTo(1.2 - 0.011 * 30, within(1e-12));
        assertThat(Fixtures.step(last, "F")).isCloseTo(6, within(1e-12));
        assertThat(Fixtures.step(last, "R2")).isCloseTo(0.9, within(1e-12));
        assertThat(Fixtures.step(last, "Lr")).isCloseTo(0.96 * 0.87 * 0.9, within(1e-3));
    }

    @Test
    void siAreaThresholdsAndBounds() {
        factor(Fixtures.SI, 18.58, 0);
        assertThat(Fixtures.step(last, "R1")).isEqualTo(1);
        factor(Fixtures.SI, 55.74, 100);
        assertThat(Fixtures.step(last, "R1")).isEqualTo(0.6);
        assertThat(Fixtures.step(last, "R2")).isEqualTo(0.6);
        assertThat(Fixtures.step(last, "Lr")).isEqualTo(0.58);
    }

    @Test
    void slopeOutOfRangeIsRefusedNamingTheField() {
        assertThatThrownBy(() -> factor(Fixtures.US, 300, 25)).isInstanceOf(InputError.class)
                .hasMessageContaining("roofSlope").hasMessageContaining("25");
        assertThatThrownBy(() -> factor(Fixtures.SI, 30, 201)).isInstanceOf(InputError.class).hasMessageContaining("roofSlope");
        assertThatThrownBy(() -> factor(Fixtures.US, 300, -1)).isInstanceOf(InputError.class).hasMessageContaining("roofSlope");
        assertThatThrownBy(() -> factor(Fixtures.US, 300, Double.POSITIVE_INFINITY)).isInstanceOf(InputError.class);
    }

    @Test
    void roofRowOtherThanTheOrdinaryTwentyPsfIsNeitherReducedNorBounded() {
        // 4.8.2 covers ordinary flat, pitched and curved roofs (L0 = 20 psf, Table 4.3-1) only: a 30 psf row keeps L0
        Occupancy firm = OccupancyCatalogue.custom("roof-30", "Firm roof", com.baysheet.engine.units.UnitSystem.US, 30, 0, 30,
                com.baysheet.engine.code.ReductionRule.ROOF, false);
        RecordBuilder rec = new RecordBuilder("R", "ASCE 7-16", com.baysheet.engine.units.UnitSystem.US);
        assertThat(RoofLiveLoad.factor(Fixtures.US, firm, 600, 12, rec)).isEqualTo(1);
        assertThat(RoofLiveLoad.isOrdinary(Fixtures.US, firm)).isFalse();
        assertThat(RoofLiveLoad.isOrdinary(Fixtures.US, ROOF)).isTrue();
        assertThat(RoofLiveLoad.isOrdinary(Fixtures.SI, ROOF)).isTrue();
        assertThat(Fixtures.step(rec.build(), "Lr[roof-30]")).isEqualTo(30);
    }

    @Test
    void roofRowBelowTheOrdinaryLoadCarriesACaution() {
        Occupancy low = OccupancyCatalogue.custom("roof-10", "Firm canopy", com.baysheet.engine.units.UnitSystem.US, 10, 0, 30,
                com.baysheet.engine.code.ReductionRule.ROOF, false);
        RecordBuilder rec = new RecordBuilder("R", "ASCE 7-16", com.baysheet.engine.units.UnitSystem.US);
        assertThat(RoofLiveLoad.factor(Fixtures.US, low, 100, Double.NaN, rec)).isEqualTo(1);
        assertThat(rec.build().notes()).anyMatch(n -> n.level() == com.baysheet.engine.record.Note.Level.CAUTION
                && n.text().contains("below"));
    }

    @Test
    void missingSlopeIsRefusedWhereARoofLoadActs() {
        assertThatThrownBy(() -> factor(Fixtures.US, 300, Double.NaN)).isInstanceOf(InputError.class)
                .hasMessageContaining("roofSlope").hasMessageContaining("required");
    }
}
