package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Drifts on a lower roof at a step found in the model (ASCE 7-16 7.7.1), checked against a hand calculation.
 *
 * Two 30 ft × 30 ft bays; the low roof (elevation 12 ft) has the west bay exposed, the high roof (24 ft) covers the
 * east bay: a wall on x line 2, 12 ft high, 30 ft long, the lower roof to its west. p_g = 30 psf, C_e = C_t = I_s = 1,
 * 0.25 in/ft: p_f = 0.7 × 30 = 21.0 psf = p_s (Eq. 7.3-1, C_s = 1), p_m = 20 psf, so S_u = 21.0 psf.
 * γ = 0.13 × 30 + 14 = 17.9 pcf (Eq. 7.7-1); h_b = 21.0 / 17.9 = 1.1732 ft; h_c = 12 − 1.1732 = 10.827 ft.
 * Leeward, ℓu = 30 ft: h_d = 0.43 ∛30 ∜(30 + 10) − 1.5 = 1.8601 ft; windward 0.75 × 1.8601 (ℓl = 30 ft) is less.
 * w = 4 h_d = 7.4406 ft; p_d = 1.8601 × 17.9 = 33.297 psf. Per foot of wall p_d w / 2 = 123.87 plf; over 30 ft
 * 3716.2 lb.
 */
class RoofDriftTest {
    static final double HD = 0.43 * Math.cbrt(30) * Math.pow(40, 0.25) - 1.5;
    static final double GAMMA = 0.13 * 30 + 14;
    static final double PD = HD * GAMMA, W = 4 * HD;

    static Derived twoRoofs(Direction beams, int infill) {
        Grid g = Buildings.grid(new double[] {30, 30}, new double[] {30});
        Framing f = new Framing(beams, infill);
        Level low = Level.roof("Low roof", 12, 0.25, List.of(Bay.floor(0, 0, "roof-ordinary", 20, f)));
        Level high = Level.roof("High roof", 24, 0.25, List.of(Bay.floor(1, 0, "roof-ordinary", 20, f)));
        return Derivation.derive(SnowTakeDownProperties.building(g, List.of(low, high), 30));
    }

    static DerivedMember member(Derived d, String name, String level) {
        return d.members().stream().filter(m -> m.name().equals(name) && m.level().equals(level)).findFirst().orElseThrow();
    }

    @Test
    void theDriftOfTheHandCalculation() {
        assertThat(HD).isCloseTo(1.8601, within(1e-4));
        CalcRecord r = member(twoRoofs(Direction.X, 1), "Beam Y1-Y2/1-2 #1", "Low roof").result().record();
        assertThat(r.step("γ").result()).isCloseTo(17.9, within(1e-9));
        assertThat(r.step("hc").result()).isCloseTo(12 - 21.0 / 17.9, within(1e-9));
        assertThat(r.result("snow.drift.hd")).isCloseTo(HD, within(1e-9));
        assertThat(r.result("snow.drift.w")).isCloseTo(W, within(1e-9));
        assertThat(r.result("snow.drift.pd")).isCloseTo(PD, within(1e-9));
    }

    @Test
    void beamsRunningAwayFromTheStepCarryATriangle() {
        // infill beam at 15 ft spacing: 15 × p_d w / 2 = 1858.1 lb over the last 7.44 ft of its 30 ft span (toward x = 30)
        Derived d = twoRoofs(Direction.X, 1);
        CalcRecord beam = member(d, "Beam Y1-Y2/1-2 #1", "Low roof").result().record();
        double drift = 15 * PD * W / 2;
        assertThat(drift).isCloseTo(1858.1, within(0.1));
        assertThat(beam.result("snow.drift.load")).isCloseTo(drift, within(1e-6));
        // AISC Manual Table 3-23 (load increasing uniformly to one end) on the stretch: the resultant acts w/3 from the
        // step, so R at the far end = W (w/3) / ℓ; the snow of S_u is 21 × 15 × 30 / 2 = 4725 lb each end
        double rFar = drift * (W / 3) / 30;
        assertThat(beam.result("S.RA")).isCloseTo(4725 + rFar, within(1e-3 * rFar));
        assertThat(beam.result("S.RB")).isCloseTo(4725 + drift - rFar, within(1e-3 * rFar));
        // the edge beams on lines Y1 and Y2 take half a spacing each: 929.0 lb
        assertThat(member(d, "Beam Y1/1-2", "Low roof").result().record().result("snow.drift.load")).isCloseTo(drift / 2, within(1e-6));
        assertThat(member(d, "Beam Y2/1-2", "Low roof").result().record().result("snow.drift.load")).isCloseTo(drift / 2, within(1e-6));
    }

    @Test
    void beamsParallelToTheStepCarryTheSurchargeAtTheirDistance() {
        // beams along y at 10 ft spacing (2 infill): the beam at x = 20 takes the band 15 to 25 ft from x = 0, i.e. 5 to
        // 15 ft from the step: p(5) = 33.297 (1 − 5 / 7.4406) = 10.922 psf to 0 at 7.4406 ft, so
        // w = 10.922 / 2 × 2.4406 = 13.33 plf. The grid beam on line 2 takes 0 to 5 ft: (33.297 + 10.922) / 2 × 5 = 110.5 plf.
        Derived d = twoRoofs(Direction.Y, 2);
        double p5 = PD * (1 - 5 / W);
        CalcRecord beam = member(d, "Beam Y1-Y2/1-2 #2", "Low roof").result().record();
        assertThat(beam.step("w_S,drift1.1").result()).isCloseTo(p5 / 2 * (W - 5), within(1e-9));
        assertThat(beam.step("w_S,drift1.1").result()).isCloseTo(13.33, within(0.01));
        CalcRecord edge = member(d, "Beam 2/Y1-Y2", "Low roof").result().record();
        assertThat(edge.step("w_S,drift1.1").result()).isCloseTo((PD + p5) / 2 * 5, within(1e-9));
        assertThat(edge.step("w_S,drift1.1").result()).isCloseTo(110.5, within(0.1));
        // the beam at x = 10 lies 15 to 25 ft from the step (its band 5 to 15 ft from x = 0): beyond w, no drift
        assertThat(member(d, "Beam Y1-Y2/1-2 #1", "Low roof").result().record().result("snow.drift.load")).isNaN();
    }
}
