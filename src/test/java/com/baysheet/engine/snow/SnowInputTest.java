package com.baysheet.engine.snow;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Editions;
import org.assertj.core.api.ThrowableAssert.ThrowingCallable;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import static com.baysheet.engine.snow.SnowFixtures.*;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Refused snow input: an InputError naming the field and the value, never another exception. */
class SnowInputTest {
    static void refused(ThrowingCallable c, String field) {
        assertThatThrownBy(c).isInstanceOf(InputError.class).hasMessageStartingWith(field + ":")
                .satisfies(e -> assertThat(((InputError) e).field()).isEqualTo(field));
    }

    @ParameterizedTest(name = "p_g {0}")
    @ValueSource(doubles = {-1, -0.001, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY})
    void groundSnowLoadMustBeFiniteAndNotNegative(double pg) {
        refused(() -> unit(pg), "groundSnowLoad");
    }

    @ParameterizedTest(name = "factor {0}")
    @ValueSource(doubles = {0, -0.5, Double.NaN, Double.POSITIVE_INFINITY})
    void givenFactorsMustBePositiveAndFinite(double v) {
        refused(() -> Exposure.given(v), "exposureFactor");
        refused(() -> Thermal.given(v), "thermalFactor");
        refused(() -> Importance.given(v), "snowImportanceFactor");
    }

    @Test
    void aFactorIsEitherLookedUpOrGivenNotBoth() {
        refused(() -> new Exposure(Exposure.Terrain.B, Exposure.Shelter.FULLY, 0.9), "exposureFactor");
        refused(() -> new Exposure(Exposure.Terrain.B, null, Double.NaN), "exposure");
        refused(() -> new Thermal(null, Double.NaN), "thermalCondition");
        refused(() -> new Importance(null, Double.NaN), "riskCategory");
        refused(() -> new SnowSite(30, null, Thermal.of(Thermal.Condition.HEATED), Importance.of(Importance.RiskCategory.II)), "exposure");
    }

    @ParameterizedTest(name = "value {0}")
    @ValueSource(doubles = {-1, Double.NaN, Double.POSITIVE_INFINITY})
    void slopesAndLengthsMustBeFiniteAndNotNegative(double v) {
        refused(() -> SnowRoof.of(SnowRoof.Shape.MONOSLOPE, v, false, 20), "roofSlope");
        if (!Double.isNaN(v)) refused(() -> SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 1, false, v), "eaveToRidge"); // NaN: not given
        refused(() -> new RoofStep(v, 100, 50), "stepHeight");
        refused(() -> new RoofStep(10, v, 50), "upperRoofLength");
        refused(() -> new RoofStep(10, 100, v), "lowerRoofLength");
    }

    @Test
    void zeroLengthsAndShapeRefused() {
        refused(() -> SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 1, false, 0), "eaveToRidge");
        refused(() -> new RoofStep(0, 100, 50), "stepHeight");
        refused(() -> SnowRoof.of(null, 1, false, 20), "roofShape");
    }

    @Test
    void eaveToRidgeRequiredOnlyWhereRainOnSnowMayApplyToASlopedRoof() {
        refused(() -> run(US, unit(15), SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 1, false, Double.NaN)), "eaveToRidge");
        assertThat(run(US, unit(15), flat()).loads().rainOnSnow()).isEqualTo(5);                              // flat: below W/50 for any W
        assertThat(run(US, unit(30), SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 1, false, Double.NaN)).loads().rainOnSnow()).isZero();
    }

    @Test
    void asce7_22SnowIsRefusedUntilImplemented() {
        var ctx = US.withEdition(Editions.builtIn().get("ASCE 7-22"));
        assertThatThrownBy(() -> run(ctx, unit(30), flat())).isInstanceOf(InputError.class)
                .hasMessageStartingWith("edition:").hasMessageContaining("ASCE 7-22").hasMessageContaining("rewrote Chapter 7");
    }

    @Test
    void choicesParseByNameAndRefuseOthers() {
        assertThat(Choices.parse(Exposure.Terrain.class, "terrain", " above_tree_line ")).isEqualTo(Exposure.Terrain.ABOVE_TREE_LINE);
        assertThat(Choices.parse(Importance.RiskCategory.class, "riskCategory", "iv")).isEqualTo(Importance.RiskCategory.IV);
        assertThatThrownBy(() -> Choices.parse(Thermal.Condition.class, "thermalCondition", "TEPID"))
                .isInstanceOf(InputError.class).hasMessageContaining("thermalCondition").hasMessageContaining("TEPID").hasMessageContaining("FREEZER");
        refused(() -> Choices.parse(Exposure.Shelter.class, "exposure", null), "exposure");
    }
}
