package com.baysheet.engine.snow;

import com.baysheet.engine.snow.SnowFixtures.Run;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static com.baysheet.engine.snow.SnowFixtures.*;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Balanced, minimum and rain-on-snow cases of ASCE 7-16 Chapter 7 (REFERENCES.md "Roof snow", from memory). */
class RoofSnowTest {
    static final double TOL = 1e-9;

    @Test
    void referenceCaseOfThirtyPsfGround() {
        // REFERENCES.md worked check (hand calculation): p_g 30 psf, C_e = C_t = I_s = 1.0, flat roof
        Run r = run(US, unit(30), flat());
        assertThat(r.step("Ce")).isEqualTo(1.0);                              // ASCE 7-16 Table 7.3-1, C partially exposed
        assertThat(r.step("Ct")).isEqualTo(1.0);                              // ASCE 7-16 Table 7.3-2, heated
        assertThat(r.step("Is")).isEqualTo(1.0);                              // ASCE 7-16 Table 1.5-2, risk category II
        assertThat(r.loads().flat()).isCloseTo(21.0, within(TOL));            // Eq. 7.3-1: 0.7 × 1 × 1 × 1 × 30 = 21.0 psf
        assertThat(r.loads().sloped()).isCloseTo(21.0, within(TOL));          // 7.4: C_s = 1 on a flat roof
        assertThat(r.loads().minimum()).isCloseTo(20.0, within(TOL));         // 7.3.4: p_g > 20 → p_m = 20 I_s = 20 psf
        assertThat(r.loads().rainOnSnow()).isZero();                          // 7.10: p_g > 20 psf, no surcharge
        assertThat(r.loads().uniform()).isCloseTo(21.0, within(TOL));         // max(21, 20)
        assertThat(r.record().result("snow.pm")).isCloseTo(20.0, within(TOL));
        assertThat(r.record().step("pf").clause().label()).isEqualTo("ASCE 7-16 7.3, Eq. 7.3-1");
        assertThat(r.record().step("pf").clause().confidence()).isEqualTo("memory");
    }

    @Test
    void flatRoofLoadMultipliesEveryFactor() {
        // Eq. 7.3-1: terrain B sheltered C_e 1.2, unheated C_t 1.2, category IV I_s 1.2: 0.7 × 1.2³ × 25 = 30.24 psf
        SnowSite s = new SnowSite(25, Exposure.of(Exposure.Terrain.B, Exposure.Shelter.SHELTERED),
                Thermal.of(Thermal.Condition.UNHEATED), Importance.of(Importance.RiskCategory.IV));
        assertThat(run(US, s, flat()).loads().flat()).isCloseTo(30.24, within(TOL));
        // factors given directly: 0.7 × 0.85 × 1.05 × 0.9 × 40 = 22.491 psf
        SnowSite g = new SnowSite(40, Exposure.given(0.85), Thermal.given(1.05), Importance.given(0.9));
        assertThat(run(US, g, flat()).loads().flat()).isCloseTo(22.491, within(TOL));
    }

    // ASCE 7-16 7.3.4: p_m = I_s p_g where p_g ≤ 20 psf, 20 I_s where p_g > 20 psf (SI 0.96 kN/m², from memory)
    @ParameterizedTest(name = "{0}: p_g {1}, risk {2} → p_m {3}")
    @CsvSource({
            "US, 15, III, 16.5",     // 1.1 × 15
            "US, 20, II, 20",        // at the limit: I_s p_g = 20
            "US, 20.5, I, 16",       // over the limit: 20 × 0.8
            "US, 40, IV, 24",        // 20 × 1.2
            "US, 0, II, 0",
            "SI, 0.5, II, 0.5",      // I_s p_g
            "SI, 0.96, III, 1.056",  // at the limit: 1.1 × 0.96
            "SI, 1.5, IV, 1.152"})   // 0.96 × 1.2
    void minimumSnowLoadBothBranches(UnitSystem sys, double pg, Importance.RiskCategory rc, double pm) {
        Run r = run(sys == UnitSystem.US ? US : SI, site(pg, Thermal.Condition.HEATED, rc), flat());
        assertThat(r.loads().minimumApplies()).isTrue();
        assertThat(r.loads().minimum()).isCloseTo(pm, within(TOL));
    }

    @Test
    void minimumAppliesOnlyBelowFifteenDegreesAndIsItsOwnCase() {
        // 7.3.4: low-slope roofs below 15°; 3 in/ft is 14.04°, 4 in/ft is 18.43°
        SnowRoof low = SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 3, false, 30), steep = SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 4, false, 30);
        assertThat(run(US, unit(30), low).loads().minimumApplies()).isTrue();
        Run s = run(US, unit(30), steep);
        assertThat(s.loads().minimumApplies()).isFalse();
        assertThat(s.loads().minimum()).isZero();
        assertThat(s.hasStep("pm")).isFalse();
        assertThat(Double.isNaN(s.record().result("snow.pm"))).isTrue();
        // p_m larger than the balanced load: p_g 30, C_e 0.8 (D fully): p_f = 0.7 × 0.8 × 30 = 16.8 < p_m = 20, uniform = 20
        SnowSite exposed = new SnowSite(30, Exposure.of(Exposure.Terrain.D, Exposure.Shelter.FULLY), Thermal.of(Thermal.Condition.HEATED),
                Importance.of(Importance.RiskCategory.II));
        Run e = run(US, exposed, flat().withStep(new RoofStep(10, 100, 50)));
        assertThat(e.loads().balanced()).isCloseTo(16.8, within(TOL));
        assertThat(e.loads().uniform()).isCloseTo(20, within(TOL));
        // the drift case rides on p_s, never on p_m: 16.8 + p_d at the step
        assertThat(e.loads().driftCaseAt(0)).isCloseTo(16.8 + e.loads().drift().peak(), within(TOL));
    }

    // ASCE 7-16 Fig. 7.4-1 (from memory): C_s = 1 up to the curve's angle, linear to 0 at 70°
    @ParameterizedTest(name = "{0}, slippery {1}, {2}° → C_s {3}")
    @CsvSource({
            "HEATED, false, 30, 1", "HEATED, false, 50, 0.5", "HEATED, false, 70, 0", "HEATED, false, 80, 0", "HEATED, false, 20, 1",
            "HEATED, true, 5, 1", "HEATED, true, 37.5, 0.5", "HEATED, true, 70, 0",
            "GREENHOUSE, false, 50, 0.5",                                           // C_t 0.85: the warm curve
            "COLD_VENTILATED, false, 37.5, 1", "COLD_VENTILATED, false, 53.75, 0.5", "COLD_VENTILATED, false, 70, 0",
            "COLD_VENTILATED, true, 10, 1", "COLD_VENTILATED, true, 40, 0.5", "COLD_VENTILATED, true, 70, 0",
            "UNHEATED, false, 45, 1", "UNHEATED, false, 57.5, 0.5", "UNHEATED, false, 70, 0",
            "UNHEATED, true, 15, 1", "UNHEATED, true, 42.5, 0.5", "UNHEATED, true, 70, 0",
            "FREEZER, false, 45, 1", "FREEZER, true, 42.5, 0.5"})                    // C_t 1.3: the C_t ≥ 1.2 curves
    void slopeFactorAtTheBreakpoints(Thermal.Condition t, boolean slippery, double deg, double cs) {
        for (UnitSystem sys : UnitSystem.values()) {
            SnowRoof roof = SnowRoof.of(SnowRoof.Shape.MONOSLOPE, rise(sys, deg), slippery, 1000);
            Run r = run(sys == UnitSystem.US ? US : SI, site(sys == UnitSystem.US ? 30 : 1.44, t, Importance.RiskCategory.II), roof);
            assertThat(r.step("θ")).isCloseTo(deg, within(1e-9));
            assertThat(r.loads().slopeFactor()).as(sys.name()).isCloseTo(cs, within(1e-9));
            assertThat(r.loads().sloped()).isCloseTo(cs * r.loads().flat(), within(1e-9)); // 7.4, Eq. 7.4-1: p_s = C_s p_f
        }
    }

    @Test
    void givenThermalFactorBetweenCurvesTakesTheColderCurve() {
        // our choice (docs/engine.md): C_t 1.05 uses the C_t = 1.1 curve; at 35°: 1.0 there against (70 − 35)/40 = 0.875 warm
        SnowSite s = new SnowSite(30, Exposure.given(1.0), Thermal.given(1.05), Importance.given(1.0));
        Run r = run(US, s, SnowRoof.of(SnowRoof.Shape.MONOSLOPE, rise(UnitSystem.US, 35), false, 100));
        assertThat(r.loads().slopeFactor()).isEqualTo(1.0);
        assertThat(r.record().notes()).anyMatch(n -> n.text().contains("lies between the curves"));
    }

    @Test
    void rainOnSnowOnBothSidesOfItsLimits() {
        // ASCE 7-16 7.10 (from memory): +5 psf where 0 < p_g ≤ 20 psf and θ < W/50; W = 100 ft → 2°
        assertThat(run(US, unit(20), flat()).loads().rainOnSnow()).isEqualTo(5);          // at p_g = 20, flat: applies
        assertThat(run(US, unit(20), flat()).loads().balanced()).isCloseTo(14 + 5, within(TOL)); // 0.7 × 20 + 5
        assertThat(run(US, unit(20.01), flat()).loads().rainOnSnow()).isZero();          // above 20 psf
        assertThat(run(US, unit(0), flat()).loads().rainOnSnow()).isZero();              // p_g = 0: none
        assertThat(run(US, unit(15), SnowRoof.of(SnowRoof.Shape.MONOSLOPE, rise(UnitSystem.US, 1.9), false, 100)).loads().rainOnSnow()).isEqualTo(5);
        assertThat(run(US, unit(15), SnowRoof.of(SnowRoof.Shape.MONOSLOPE, rise(UnitSystem.US, 2.1), false, 100)).loads().rainOnSnow()).isZero();
        // SI: 0.24 kN/m² where p_g ≤ 0.96 and θ < W/15.2; W = 30 m → 1.97°
        assertThat(run(SI, unit(0.96), SnowRoof.of(SnowRoof.Shape.MONOSLOPE, rise(UnitSystem.SI, 1.9), false, 30)).loads().rainOnSnow()).isEqualTo(0.24);
        assertThat(run(SI, unit(0.96), SnowRoof.of(SnowRoof.Shape.MONOSLOPE, rise(UnitSystem.SI, 2.0), false, 30)).loads().rainOnSnow()).isZero();
        assertThat(run(SI, unit(0.97), flat()).loads().rainOnSnow()).isZero();
    }

    @Test
    void rainOnSnowStaysOffTheDriftAndMinimumCases() {
        // 7.10: balanced case only. p_g 15 flat: p_s = 10.5, balanced 15.5, p_m = 15, drift case on 10.5
        Run r = run(US, unit(15), flat().withStep(new RoofStep(8, 60, 40)));
        assertThat(r.loads().balanced()).isCloseTo(15.5, within(TOL));
        assertThat(r.loads().minimum()).isCloseTo(15, within(TOL));
        assertThat(r.loads().driftCaseAt(0)).isCloseTo(10.5 + r.loads().drift().peak(), within(TOL));
        assertThat(r.step("hb")).isCloseTo(10.5 / (0.13 * 15 + 14), within(TOL)); // h_b from p_s, without the surcharge
    }

    @Test
    void cautionsNameTheProvisionsNotComputed() {
        // 7.6.1 unbalanced loads for hip and gable roofs between 2.38° and 30.2° (from memory); 7.5 unless simple spans
        SnowRoof gable = SnowRoof.of(SnowRoof.Shape.HIP_OR_GABLE, 4, false, 20);         // 18.4°
        Run g = run(US, unit(30), gable);
        assertThat(g.caution("7.6.1")).isTrue();
        assertThat(g.caution("7.5")).isTrue();
        assertThat(run(US, unit(30), gable.withSimpleSpans(true)).caution("7.5")).isFalse();
        assertThat(run(US, unit(30), SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 4, false, 20)).caution("7.6.1")).isFalse();
        assertThat(run(US, unit(30), SnowRoof.of(SnowRoof.Shape.HIP_OR_GABLE, 8, false, 20)).caution("7.6.1")).isFalse(); // 33.7°
        assertThat(run(US, unit(30), SnowRoof.of(SnowRoof.Shape.HIP_OR_GABLE, 0.25, false, 20)).caution("7.6.1")).isFalse(); // 1.19°
        // sliding (7.9) with a step; ponding (7.11) below 1/4 in/ft; the 7-10 labels come from its own data
        assertThat(run(US, unit(30), flat().withStep(new RoofStep(10, 100, 50))).caution("7.9")).isTrue();
        assertThat(run(US, unit(30), flat()).caution("7.11")).isTrue();
        assertThat(run(US_7_10, unit(30), flat()).record().step("Ce").clause().ref()).isEqualTo("7.3.1, Table 7-2");
    }

    @Test
    void largeGroundLoadIsAllowedWithACaution() {
        // our threshold (editions.json snow.pg.caution): 100 psf, 4.79 kN/m²
        assertThat(run(US, unit(100), flat()).caution("7.2")).isFalse();
        Run r = run(US, unit(150), flat());
        assertThat(r.caution("7.2")).isTrue();
        assertThat(r.loads().flat()).isCloseTo(105, within(TOL)); // 0.7 × 150
        assertThat(run(SI, unit(30), flat()).caution("7.2")).isTrue(); // 30 typed as kN/m²: a unit slip
    }

    @Test
    void directFactorBelowEveryTableValueCarriesACaution() {
        SnowSite s = new SnowSite(30, Exposure.given(0.6), Thermal.given(1.0), Importance.given(1.0));
        assertThat(run(US, s, flat()).caution("7.3.1, Table 7.3-1")).isTrue();
        assertThat(run(US, unit(30), flat()).caution("7.3.1, Table 7.3-1")).isFalse();
    }
}
