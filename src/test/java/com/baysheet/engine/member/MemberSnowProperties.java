package com.baysheet.engine.member;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.SnowOnRoof;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.snow.Exposure;
import com.baysheet.engine.snow.Importance;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.snow.Thermal;
import com.baysheet.engine.units.UnitSystem;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Random roof beams with snow (and on an occupiable roof, floor live load): the governing combination is at least
 * every candidate combination of ASCE 7-16 2.3.1 and 2.4.1 with S or Lr in the roof term, and the snow reactions are
 * in equilibrium with the uniform snow load on the strips.
 */
class MemberSnowProperties {
    static final String[] EFFECTS = {"RA", "RB", "V", "M+"};

    @Property(tries = 150)
    void governingCombinationIsAtLeastEachCandidate(
            @ForAll @DoubleRange(min = 8, max = 45) double span, @ForAll @DoubleRange(min = 2, max = 15) double width,
            @ForAll @DoubleRange(min = 0, max = 80) double dead, @ForAll @DoubleRange(min = 0, max = 90) double pg,
            @ForAll @DoubleRange(min = 0, max = 12) double slope, @ForAll boolean slippery, @ForAll boolean occupied,
            @ForAll @DoubleRange(min = 0.1, max = 0.9) double split) {
        SnowSite site = new SnowSite(pg, Exposure.of(Exposure.Terrain.B, Exposure.Shelter.FULLY),
                Thermal.of(Thermal.Condition.HEATED), Importance.of(Importance.RiskCategory.III));
        List<AreaStrip> strips = new ArrayList<>();
        if (occupied) {
            strips.add(new AreaStrip("office", width, 0, split * span, dead));
            strips.add(new AreaStrip("roof-ordinary", width, split * span, span, dead));
        } else strips.add(new AreaStrip("roof-ordinary", width, 0, span, dead));
        // W = 40 ft so that rain-on-snow can be decided on any slope
        SnowOnRoof on = new SnowOnRoof(SnowRoof.of(SnowRoof.Shape.MONOSLOPE, slope, slippery, 40).withSimpleSpans(true), false);
        MemberInput in = new MemberInput("P", MemberKind.INTERIOR_BEAM, new Support.Simple(span), 1, strips, List.of(), List.of(),
                0, slope, Double.NaN, true, List.of(), on);
        CalcRecord r = MemberCalculation.calculate(CalcContext.of(UnitSystem.US).withSnow(site), in).record();
        double su = r.step("S_u").result();
        // equilibrium: the snow reactions carry the uniform snow load on the whole strip area
        assertThat(r.result("S.RA") + r.result("S.RB")).isCloseTo(su * width * span, within(1e-9 * (1 + su * width * span)));
        for (String e : EFFECTS) {
            double d = r.result("D." + e), s = r.result("S." + e), l = orZero(r.result("Ldes." + e));
            double lr = Math.max(orZero(r.result("Lr." + e)), orZero(r.result("Lrdes." + e)));
            double u = r.result("LRFD." + e), a = r.result("ASD." + e), tol = 1e-9 * (1 + Math.abs(u));
            // ASCE 7-16 2.3.1 combinations 1 to 3, with the permissive 0.5 L of Exception 1 as the least factor on L
            for (double c : new double[] {1.4 * d, 1.2 * d + 1.6 * l + 0.5 * s, 1.2 * d + 1.6 * l + 0.5 * lr,
                    1.2 * d + 1.6 * s + 0.5 * l, 1.2 * d + 1.6 * lr + 0.5 * l})
                assertThat(u).as("LRFD." + e).isGreaterThanOrEqualTo(c - tol);
            // ASCE 7-16 2.4.1 combinations 1 to 4
            for (double c : new double[] {d, d + l, d + s, d + lr, d + 0.75 * l + 0.75 * s, d + 0.75 * l + 0.75 * lr})
                assertThat(a).as("ASD." + e).isGreaterThanOrEqualTo(c - tol);
        }
    }

    private static double orZero(double v) { return Double.isNaN(v) ? 0 : v; }
}
