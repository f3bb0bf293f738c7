package com.baysheet.engine.snow;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.engine.snow.SnowFixtures.Run;
import com.baysheet.engine.units.Convert;
import com.baysheet.engine.units.Quantity;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static com.baysheet.engine.snow.SnowFixtures.*;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Drifts on lower roofs, ASCE 7-16 7.7.1 (REFERENCES.md, from memory). Every case: p_g 30 psf, C_e = C_t = I_s = 1.0,
 * flat lower roof, so p_s = 21.0 psf, γ = 0.13 × 30 + 14 = 17.9 pcf, h_b = 21.0 / 17.9 = 1.1732 ft.
 * Drift height 0.43 ∛ℓ ∜(30 + 10) − 1.5 with ∜40 = 2.51487: ℓ 100 ft → 0.43 × 4.64159 × 2.51487 − 1.5 = 3.51938 ft;
 * ℓ 50 ft → 0.43 × 3.68403 × 2.51487 − 1.5 = 2.48388 ft; ℓ 20 ft → 0.43 × 2.71442 × 2.51487 − 1.5 = 1.43535 ft;
 * ℓ 300 ft → 0.43 × 6.69433 × 2.51487 − 1.5 = 5.73920 ft.
 */
class SnowDriftTest {
    static final double TOL = 1e-4;

    Run drift(double height, double upper, double lower) {
        return run(US, unit(30), flat().withStep(new RoofStep(height, upper, lower)));
    }

    @Test
    void densityByEq7_7_1AndItsCap() {
        assertThat(drift(10, 100, 50).step("γ")).isCloseTo(17.9, within(1e-12));                  // 0.13 × 30 + 14
        Run heavy = run(US, unit(150), flat().withStep(new RoofStep(20, 100, 50)));
        assertThat(heavy.step("γ")).isEqualTo(30);                                                 // 0.13 × 150 + 14 = 33.5 → 30 pcf
        Run si = run(SI, unit(1.44), flat().withStep(new RoofStep(3, 30, 15)));
        assertThat(si.step("γ")).isCloseTo(0.426 * 1.44 + 2.2, within(1e-12));                     // SI form, from memory: 2.813 kN/m³
    }

    @Test
    void leewardDriftFromTheUpperRoof() {
        Run r = drift(10, 100, 50);
        assertThat(r.step("hb")).isCloseTo(1.17318, within(TOL));
        assertThat(r.step("hc")).isCloseTo(10 - 1.17318, within(TOL));                           // 8.82682 ft
        assertThat(r.step("hd,lee")).isCloseTo(3.51938, within(TOL));                             // Fig. 7.6-1, ℓ_u 100 ft
        assertThat(r.step("hd,wind")).isCloseTo(0.75 * 2.48388, within(TOL));                     // 1.86291 ft
        DriftSurcharge d = r.loads().drift();
        assertThat(d.windward()).isFalse();
        assertThat(d.height()).isCloseTo(3.51938, within(TOL));                                   // h_d ≤ h_c
        assertThat(d.width()).isCloseTo(4 * 3.51938, within(TOL));                                // w = 4 h_d = 14.0775 ft
        assertThat(d.peak()).isCloseTo(3.51938 * 17.9, within(1e-3));                             // p_d = h_d γ = 63.0 psf
        assertThat(d.at(d.width() / 2)).isCloseTo(d.peak() / 2, within(1e-9));                    // triangular
        assertThat(d.resultant()).isCloseTo(d.peak() * d.width() / 2, within(1e-9));              // ½ p_d w = 443 plf
        assertThat(r.record().result("snow.drift.max")).isCloseTo(21 + 62.9969, within(1e-3));
    }

    @Test
    void windwardDriftGovernsWhereTheLowerRoofIsLong() {
        Run r = drift(20, 20, 300);
        assertThat(r.step("hd,lee")).isCloseTo(1.43535, within(TOL));
        assertThat(r.step("hd,wind")).isCloseTo(0.75 * 5.73920, within(TOL));                     // 4.30440 ft
        assertThat(r.loads().drift().windward()).isTrue();
        assertThat(r.loads().drift().height()).isCloseTo(4.30440, within(TOL));
        assertThat(r.loads().drift().width()).isCloseTo(4 * 4.30440, within(TOL));
    }

    @Test
    void upperRoofShorterThanTwentyFeetIsTakenAsTwenty() {
        // Fig. 7.6-1: ℓ_u not less than 20 ft (from memory)
        assertThat(drift(10, 8, 50).step("hd,lee")).isCloseTo(1.43535, within(TOL));
    }

    @Test
    void driftHeightCappedByTheClearHeightAndWidthByEightTimesIt() {
        // H 3 ft: h_c = 1.82682 < 3.51938; w = 4 × 3.51938² / 1.82682 = 27.12 > 8 h_c = 14.6145 → 14.6145 ft
        DriftSurcharge c = drift(3, 100, 50).loads().drift();
        assertThat(c.height()).isCloseTo(1.82682, within(TOL));
        assertThat(c.width()).isCloseTo(8 * 1.82682, within(TOL));
        assertThat(c.peak()).isCloseTo(1.82682 * 17.9, within(1e-3));
        // H 4 ft: h_c = 2.82682; w = 4 × 3.51938² / 2.82682 = 17.5265 < 8 h_c = 22.61
        DriftSurcharge d = drift(4, 100, 50).loads().drift();
        assertThat(d.height()).isCloseTo(2.82682, within(TOL));
        assertThat(d.width()).isCloseTo(4 * 3.51938 * 3.51938 / 2.82682, within(1e-3));
    }

    @Test
    void noDriftWhereTheClearHeightIsUnderAFifthOfTheBalancedHeight() {
        // 7.7.1: drift loads not required where h_c / h_b < 0.2; h_b = 1.17318 ft
        Run low = drift(1.4, 100, 50);                                                            // h_c 0.22682, ratio 0.1933
        assertThat(low.step("hc/hb")).isCloseTo(0.19333, within(TOL));
        assertThat(low.loads().drift().required()).isFalse();
        assertThat(low.loads().drift().at(0)).isZero();
        assertThat(low.hasStep("pd")).isFalse();
        Run just = drift(1.45, 100, 50);                                                          // ratio 0.236: required
        assertThat(just.loads().drift().required()).isTrue();
        assertThat(just.loads().drift().height()).isCloseTo(0.27682, within(TOL));                // capped at h_c
        assertThat(drift(0.5, 100, 50).loads().drift().required()).isFalse();                     // snow above the step
    }

    @Test
    void driftCutOffAtTheFarEdgeOfAShortLowerRoof() {
        // 7.7.1: w 14.0775 ft over a 10 ft lower roof: surcharge at the far edge 62.997 × (1 − 10/14.0775) = 18.245 psf
        DriftSurcharge d = drift(10, 100, 10).loads().drift();
        assertThat(d.extent()).isEqualTo(10);
        assertThat(d.at(10)).isCloseTo(62.9969 * (1 - 10 / 14.07752), within(1e-3));
        assertThat(d.at(10.5)).isZero();
        assertThat(d.resultant()).isCloseTo((62.9969 + d.at(10)) / 2 * 10, within(1e-2));
        assertThat(d.over(2, 4) + d.over(0, 2) + d.over(4, 10)).isCloseTo(d.resultant(), within(1e-9));
    }

    @Test
    void noGroundSnowNoDrift() {
        assertThat(run(US, unit(0), flat().withStep(new RoofStep(10, 100, 50))).loads().drift()).isEqualTo(DriftSurcharge.NONE);
    }

    @Test
    void siDriftHeightIsTheUsEquationConvertedExactly() {
        // our choice: 30.48 m and 1.43641 kN/m² are exactly 100 ft and 30 psf → h_d = 3.51938 ft = 1.07271 m
        double pg = Convert.toSi(Quantity.PRESSURE, 30), lu = Convert.toSi(Quantity.LENGTH, 100), lower = Convert.toSi(Quantity.LENGTH, 50);
        Run r = run(SI, unit(pg), flat().withStep(new RoofStep(Convert.toSi(Quantity.LENGTH, 10), lu, lower)));
        assertThat(r.step("hd,lee")).isCloseTo(3.51938 * 0.3048, within(1e-4));
    }

    @Test
    void recordCarriesEveryStepWithItsClauseAndWritesAsJson() throws Exception {
        Run r = drift(10, 100, 50);
        for (String sym : new String[]{"Ce", "Ct", "Is", "pf", "θ", "Cs", "ps", "pm", "Sb", "γ", "hb", "hc", "hc/hb", "hd,lee", "hd,wind", "hd", "w", "pd"})
            assertThat(r.record().step(sym).clause().isNone()).as(sym).isFalse();
        assertThat(r.record().step("γ").unit()).isEqualTo("pcf");
        assertThat(r.record().step("θ").unit()).isEqualTo("°");
        assertThat(r.record().step("hd").clause().ref()).isEqualTo("7.7.1, Fig. 7.7-1");
        String json = RecordJson.write(r.record());
        assertThat(json).doesNotContain("Infinity");
        // the drift surcharge is among the results as written, as a number and with the record's value
        List<JsonNode> pd = new ArrayList<>();
        for (JsonNode result : RecordJson.mapper().readTree(json).path("results"))
            if (result.path("key").asText().equals("snow.drift.pd")) pd.add(result);
        assertThat(pd).singleElement().satisfies(n -> {
            assertThat(n.path("value").isNumber()).as("p_d written as a number").isTrue();
            assertThat(n.path("value").asDouble()).isEqualTo(r.record().result("snow.drift.pd"));
        });
    }
}
