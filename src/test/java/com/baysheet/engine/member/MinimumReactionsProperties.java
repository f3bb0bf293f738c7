package com.baysheet.engine.member;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.CalcRecord;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class MinimumReactionsProperties {
    /** Floor occupancies without a concentrated load, so that the uniform patterns alone give the least. */
    static final String[] UNIFORM_ONLY = {"residential-other", "assembly-other", "storage-heavy", "walkway"};

    @Property(tries = 200)
    void leastBackSpanReactionMatchesTheOverhangOnlyClosedForm(
            @ForAll @DoubleRange(min = 4, max = 40) double span, @ForAll @DoubleRange(min = 0.1, max = 0.9) double share,
            @ForAll @IntRange(min = 0, max = 3) int occ, @ForAll @DoubleRange(min = 0.5, max = 15) double width,
            @ForAll @DoubleRange(min = 1, max = 150) double dead, @ForAll boolean firm) {
        double a = span * share, l = span;
        var o = Fixtures.US.catalogue().get(UNIFORM_ONLY[occ]);
        CalcRecord r = Fixtures.calc(Fixtures.US.withOptions(new DesignOptions(false, false, firm)), Fixtures.beam(new Support.Overhang(l, a),
                List.of(new AreaStrip(o.id(), width, 0, l + a, dead)), List.of(), Double.NaN, Double.NaN));
        // AISC Manual Table 3-23, beam overhanging one support: R_A = w(ℓ² − a²)/2ℓ for w over ℓ + a;
        // w over the overhang alone: R_A = −w a²/2ℓ (statics). 2.3.1 combination 2, 2.4.1 combination 2.
        double wd = dead * width, wl = o.uniform(Fixtures.US.system()) * width;
        double rd = wd * (l * l - a * a) / (2 * l), rl = -wl * a * a / (2 * l);
        double tol = 1e-9 * (Math.abs(rd) + Math.abs(rl) + 1);
        assertThat(r.result("L0.RA,min")).isCloseTo(rl, within(tol));
        double lrfd = Math.min(1.2 * rd + 1.6 * rl, firm ? 0.9 * rd + 1.6 * rl : Double.POSITIVE_INFINITY);
        assertThat(r.result("LRFD.RA,min")).isCloseTo(Math.min(lrfd, 1.4 * rd), within(tol));
        assertThat(r.result("ASD.RA,min")).isCloseTo(Math.min(rd + rl, rd), within(tol));
        // a least reaction never exceeds the largest, and uplift always carries its caution
        assertThat(r.result("LRFD.RA,min")).isLessThanOrEqualTo(r.result("LRFD.RA"));
        assertThat(r.result("ASD.RB,min")).isLessThanOrEqualTo(r.result("ASD.RB"));
        boolean uplift = r.result("LRFD.RA,min") < 0 || r.result("ASD.RA,min") < 0;
        assertThat(r.notes().stream().anyMatch(n -> n.text().startsWith("Uplift at support A"))).isEqualTo(uplift);
    }
}
