package com.baysheet.engine.snow;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Editions;
import com.baysheet.engine.code.SnowData;
import com.baysheet.engine.CalcContext;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.ValueSource;

import static com.baysheet.engine.snow.SnowFixtures.*;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The snow tables as data, every row, in both editions that carry them (REFERENCES.md "Roof snow", from memory). */
class SnowTablesTest {
    static SnowSite exposure(Exposure.Terrain t, Exposure.Shelter s) {
        return new SnowSite(30, Exposure.of(t, s), Thermal.of(Thermal.Condition.HEATED), Importance.of(Importance.RiskCategory.II));
    }

    // ASCE 7-16 Table 7.3-1 (ASCE 7-10 Table 7-2): C_e by terrain and exposure (fully / partially / sheltered)
    @ParameterizedTest(name = "{0}, {1}: C_e = {2}")
    @CsvSource({
            "B, FULLY, 0.9", "B, PARTIALLY, 1.0", "B, SHELTERED, 1.2",
            "C, FULLY, 0.9", "C, PARTIALLY, 1.0", "C, SHELTERED, 1.1",
            "D, FULLY, 0.8", "D, PARTIALLY, 0.9", "D, SHELTERED, 1.0",
            "ABOVE_TREE_LINE, FULLY, 0.7", "ABOVE_TREE_LINE, PARTIALLY, 0.8",
            "ALASKA_TREELESS, FULLY, 0.7", "ALASKA_TREELESS, PARTIALLY, 0.8"})
    void exposureFactorEveryCell(Exposure.Terrain t, Exposure.Shelter s, double ce) {
        for (CalcContext ctx : new CalcContext[]{US, US_7_10})
            assertThat(run(ctx, exposure(t, s), flat()).step("Ce")).as(ctx.edition().id()).isEqualTo(ce);
    }

    @ParameterizedTest(name = "{0}, sheltered: not applicable")
    @ValueSource(strings = {"ABOVE_TREE_LINE", "ALASKA_TREELESS"})
    void shelteredAboveTheTreeLineIsNotInTheTable(Exposure.Terrain t) {
        assertThatThrownBy(() -> run(US, exposure(t, Exposure.Shelter.SHELTERED), flat()))
                .isInstanceOf(InputError.class).hasMessageStartingWith("exposure:").hasMessageContaining("not applicable");
    }

    // ASCE 7-16 Table 7.3-2 (ASCE 7-10 Table 7-3): C_t
    @ParameterizedTest(name = "{0}: C_t = {1}")
    @CsvSource({"HEATED, 1.0", "COLD_VENTILATED, 1.1", "UNHEATED, 1.2", "FREEZER, 1.3", "GREENHOUSE, 0.85"})
    void thermalFactorEveryRow(Thermal.Condition t, double ct) {
        for (CalcContext ctx : new CalcContext[]{US, US_7_10})
            assertThat(run(ctx, site(30, t, Importance.RiskCategory.II), flat()).step("Ct")).isEqualTo(ct);
    }

    // ASCE 7-16 Table 1.5-2: I_s by risk category
    @ParameterizedTest(name = "risk category {0}: I_s = {1}")
    @CsvSource({"I, 0.8", "II, 1.0", "III, 1.1", "IV, 1.2"})
    void importanceFactorEveryRow(Importance.RiskCategory rc, double is) {
        for (CalcContext ctx : new CalcContext[]{US, US_7_10})
            assertThat(run(ctx, site(30, Thermal.Condition.HEATED, rc), flat()).step("Is")).isEqualTo(is);
    }

    @Test
    void slopeCurvesAreDataWarmestFirst() {
        // ASCE 7-16 Fig. 7.4-1 (from memory): C_t ≤ 1.0: 5° slippery / 30° other; 1.1: 10 / 37.5; ≥ 1.2: 15 / 45
        SnowData d = Editions.builtIn().get("ASCE 7-16").snow().orElseThrow();
        assertThat(d.curveFor(0.85).otherDeg()).isEqualTo(30);
        assertThat(d.curveFor(1.0).slipperyDeg()).isEqualTo(5);
        assertThat(d.curveFor(1.1).otherDeg()).isEqualTo(37.5);
        assertThat(d.curveFor(1.2).slipperyDeg()).isEqualTo(15);
        assertThat(d.curveFor(1.3).otherDeg()).isEqualTo(45);
    }

    @Test
    void snowClausesJoinTheEditionAndCarryConfidence() {
        var e16 = Editions.builtIn().get("ASCE 7-16");
        assertThat(e16.clause("snow.minimum").label()).isEqualTo("ASCE 7-16 7.3.4");
        assertThat(e16.clause("snow.flat").confidence()).isEqualTo("memory");
        assertThat(e16.constant("snow.flat.coef")).isEqualTo(0.7);                 // Eq. 7.3-1
        // the live-load clauses of the same edition are untouched by the snow block
        assertThat(e16.clause("reduction.eq").ref()).isEqualTo("4.7.2, Eq. 4.7-1");
        var e10 = Editions.builtIn().get("ASCE 7-10");
        assertThat(e10.clause("snow.thermal").ref()).isEqualTo("7.3.2, Table 7-3");
        assertThat(e10.clause("snow.rainOnSnow").confidence()).isEqualTo("uncertain");
    }
}
