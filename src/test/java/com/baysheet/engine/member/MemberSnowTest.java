package com.baysheet.engine.member;

import com.baysheet.engine.InputError;
import com.baysheet.engine.code.Editions;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.load.SnowOnRoof;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.snow.Exposure;
import com.baysheet.engine.snow.Importance;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.snow.Thermal;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Roof snow S on members: the uniform case on the strips, carried on in end shares, in the combinations. */
class MemberSnowTest {
    static SnowSite site(double pg) {
        return new SnowSite(pg, Exposure.of(Exposure.Terrain.C, Exposure.Shelter.PARTIALLY),
                Thermal.of(Thermal.Condition.HEATED), Importance.of(Importance.RiskCategory.II));
    }

    static final SnowOnRoof FLAT = new SnowOnRoof(SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 0, false, Double.NaN).withSimpleSpans(true), false);

    static MemberInput roofBeam(SnowOnRoof snow) {
        return new MemberInput("R-1", MemberKind.INTERIOR_BEAM, new Support.Simple(30), 1,
                List.of(new AreaStrip("roof-ordinary", 10, 0, 30, 15)), List.of(), List.of(), 0, 0.25, Double.NaN, true, List.of(), snow);
    }

    static CalcRecord calc(CalcContext ctx, MemberInput in) { return MemberCalculation.calculate(ctx, in).record(); }

    @Test
    void balancedSnowOnAFlatRoofBeamWithHandCalculation() {
        // ASCE 7-16 Eq. 7.3-1: p_f = 0.7 × 1.0 × 1.0 × 1.0 × 30 = 21 psf; C_s = 1 (flat), p_s = 21 psf;
        // 7.3.4: p_g > 20 psf so p_m = 20 I_s = 20 psf < 21: the balanced load governs. No rain-on-snow (p_g > 20).
        // w_S = 21 × 10 = 210 plf; R = 210 × 30 / 2 = 3150 lb; M+ = 210 × 30² / 8 = 23 625 lb·ft
        CalcRecord r = calc(CalcContext.of(UnitSystem.US).withSnow(site(30)), roofBeam(FLAT));
        assertThat(r.step("S_u").result()).isCloseTo(21, within(1e-9));
        assertThat(r.result("S.RA")).isCloseTo(3150, within(1e-6));
        assertThat(r.result("S.M+")).isCloseTo(23625, within(1e-6));
        assertThat(r.step("S_u").description()).contains("balanced load governs");
        // D = 15 × 10 = 150 plf → M_D = 16 875; Lr: A_T = 300 ft², R1 = 1.2 − 0.001 × 300 = 0.9, R2 = 1 (F = 0.25 < 4),
        // Lr = 18 psf → M_Lr = 180 × 900 / 8 = 20 250. ASCE 7-16 2.3.1 combination 3 with S: 1.2 × 16 875 + 1.6 × 23 625 = 58 050
        // (with Lr: 20 250 + 32 400 = 52 650)
        assertThat(r.result("LRFD.M+")).isCloseTo(58050, within(1e-6));
        assertThat(r.results().stream().filter(e -> e.key().equals("LRFD.M+")).findFirst().orElseThrow().label())
                .contains("1.2D + 1.6S");
        // ASCE 7-16 2.4.1 combination 3: D + S = 16 875 + 23 625 = 40 500
        assertThat(r.result("ASD.M+")).isCloseTo(40500, within(1e-6));
    }

    @Test
    void minimumLoadGovernsWhereItExceedsTheBalancedLoad() {
        // p_g = 25, terrain C fully exposed: C_e = 0.9, p_f = 0.7 × 0.9 × 25 = 15.75 psf; 7.3.4, p_g > 20: p_m = 20 psf governs
        SnowSite s = new SnowSite(25, Exposure.of(Exposure.Terrain.C, Exposure.Shelter.FULLY),
                Thermal.of(Thermal.Condition.HEATED), Importance.of(Importance.RiskCategory.II));
        CalcRecord r = calc(CalcContext.of(UnitSystem.US).withSnow(s), roofBeam(FLAT));
        assertThat(r.step("S_u").result()).isCloseTo(20, within(1e-9));
        assertThat(r.step("S_u").description()).contains("minimum p_m governs");
        assertThat(r.result("S.RA")).isCloseTo(20 * 10 * 30 / 2.0, within(1e-6));
    }

    @Test
    void snowIsHandedOnInTheEndSharesAndCarriedByAGirder() {
        var res = MemberCalculation.calculate(CalcContext.of(UnitSystem.US).withSnow(site(30)), roofBeam(FLAT));
        assertThat(res.left().snow()).isCloseTo(3150, within(1e-6));
        PointLoad p = res.left().at(10);
        MemberInput girder = new MemberInput("G-1", MemberKind.INTERIOR_BEAM, new Support.Simple(20), 1, List.of(), List.of(),
                List.of(p), 0, 0.25, Double.NaN, true);
        CalcRecord g = calc(CalcContext.of(UnitSystem.US).withSnow(site(30)), girder);
        // a point load of 3150 lb at mid-span of 20 ft: R = 1575 lb, M = P ℓ / 4 = 15 750 lb·ft
        assertThat(g.result("S.RA")).isCloseTo(1575, within(1e-6));
        assertThat(g.result("S.M+")).isCloseTo(15750, within(1e-6));
    }

    @Test
    void noSnowWithoutASiteOrOffTheRoof() {
        assertThat(calc(CalcContext.of(UnitSystem.US), roofBeam(FLAT)).result("S.RA")).isNaN();
        assertThat(calc(CalcContext.of(UnitSystem.US).withSnow(site(30)), roofBeam(null)).result("S.RA")).isNaN();
    }

    @Test
    void aRoofBelowAnotherLevelCarriesTheDriftCaution() {
        CalcRecord r = calc(CalcContext.of(UnitSystem.US).withSnow(site(30)), roofBeam(new SnowOnRoof(FLAT.roof(), true)));
        assertThat(r.notes()).anyMatch(n -> n.level() == Note.Level.CAUTION && n.clause().ref().equals("7.7.1")
                && n.text().contains("none reaches this one"));
    }

    @Test
    void snowOnAnAsce722ProjectIsRefusedOnTheEdition() {
        CalcContext c = CalcContext.of(UnitSystem.US).withEdition(Editions.builtIn().get("ASCE 7-22")).withSnow(site(30));
        assertThatThrownBy(() -> calc(c, roofBeam(FLAT))).isInstanceOf(InputError.class).hasMessageContaining("edition");
    }
}
