package com.baysheet.engine.member;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.InputError;
import com.baysheet.engine.load.SnowOnRoof;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.snow.DriftStrip;
import com.baysheet.engine.snow.RoofStep;
import com.baysheet.engine.snow.StepDrift;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static com.baysheet.engine.member.MemberSnowTest.FLAT;
import static com.baysheet.engine.member.MemberSnowTest.calc;
import static com.baysheet.engine.member.MemberSnowTest.roofBeam;
import static com.baysheet.engine.member.MemberSnowTest.site;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * A drift strip's own cut-off (ASCE 7-16 7.7.1: the drift truncated at the far edge of the lower roof): past a free
 * end of a wall the lower roof may be deeper or shallower than ℓl beside the wall, and the strip carries the depth
 * there. The step: 12 ft high, ℓu = 30 ft, ℓl = 5 ft, p_g = 30 psf (leeward governs: h_d = 1.8601 ft, w = 7.4406 ft,
 * p_d = 33.297 psf, as in the framing's RoofDriftTest).
 */
class DriftCutOffTest {
    static final double HD = 0.43 * Math.cbrt(30) * Math.pow(40, 0.25) - 1.5, W = 4 * HD, PD = HD * 17.9;

    static CalcRecord beam(DriftStrip s) {
        StepDrift sd = new StepDrift(new RoofStep(12, 30, 5), "wall on grid line B", List.of(s), true);
        return calc(CalcContext.of(UnitSystem.US).withSnow(site(30)), roofBeam(new SnowOnRoof(FLAT.roof(), true, List.of(sd))));
    }

    @Test
    void aStripWithoutItsOwnCutOffIsCutAtTheStepsLowerRoofLength() {
        // a strip parallel to the step, 10 ft wide from the step, along the whole 30 ft beam: cut at ℓl = 5 ft
        double p5 = PD * (1 - 5 / W);
        assertThat(beam(new DriftStrip(true, 0, 30, 10, 0, 0)).result("snow.drift.load")).isCloseTo(30 * (PD + p5) / 2 * 5, within(1e-6));
    }

    @Test
    void aStripWhereTheLowerRoofIsDeeperCarriesTheDriftToW() {
        // the lower roof there runs 35 ft from the step's line: the whole drift, p_d w / 2 per ft
        CalcRecord r = beam(new DriftStrip(true, 0, 30, 10, 0, 0, 35));
        assertThat(r.result("snow.drift.load")).isCloseTo(30 * PD * W / 2, within(1e-6));
        assertThat(r.steps()).anySatisfy(s -> assertThat(s.description())
                .contains("the lower roof across this strip ends 35.0 ft from the step's line").contains("cut off at 7.44 ft"));
    }

    @Test
    void aStripWhereTheLowerRoofIsShallowerIsCutNearer() {
        // a beam running away from the step, 6 ft strip, d from 0 at x = 0 to 30 at x = 30; the lower roof there 3 ft deep
        double p3 = PD * (1 - 3 / W);
        assertThat(beam(new DriftStrip(false, 0, 30, 6, 0, 30, 3)).result("snow.drift.load")).isCloseTo(6 * (PD + p3) / 2 * 3, within(1e-6));
    }

    @Test
    void aNegativeOrEndlessCutOffIsRefusedNamingTheField() {
        assertThatThrownBy(() -> new DriftStrip(true, 0, 30, 10, 0, 0, -1)).isInstanceOf(InputError.class).hasMessageContaining("drift.cutOff");
        assertThatThrownBy(() -> new DriftStrip(true, 0, 30, 10, 0, 0, Double.POSITIVE_INFINITY)).isInstanceOf(InputError.class)
                .hasMessageContaining("drift.cutOff");
    }
}
