package com.baysheet.framing;

import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.snow.DriftSurcharge;
import com.baysheet.engine.snow.RoofSnow;
import com.baysheet.engine.snow.RoofStep;
import com.baysheet.engine.snow.SnowLoads;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;
import net.jqwik.api.constraints.IntRange;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The drift at a roof step is carried once: the drift loads on the members add up to the drift's area load (its
 * resultant per length of wall × the wall's length, ASCE 7-16 7.7.1), and the column bases carry every roof's uniform
 * snow plus that drift, whatever the framing.
 */
class RoofDriftProperties {
    @Property(tries = 60)
    void driftOnMembersSumsToTheDriftAreaLoadAndReachesTheColumnsOnce(
            @ForAll @DoubleRange(min = 12, max = 40) double lowSpan, @ForAll @DoubleRange(min = 12, max = 60) double highSpan,
            @ForAll @DoubleRange(min = 12, max = 40) double across, @ForAll @IntRange(min = 0, max = 3) int beams,
            @ForAll boolean beamsAlongX, @ForAll boolean stepAlongX, @ForAll boolean highFirst,
            @ForAll @DoubleRange(min = 4, max = 20) double height, @ForAll @DoubleRange(min = 21, max = 60) double pg) {
        // p_g above 20 psf: a flat roof needs no W for rain-on-snow (7.10), which the check here does not give
        // two cells in a row (along x, or along y where the wall runs along x): one low roof bay, one covered by the high roof
        double[] run = highFirst ? new double[] {highSpan, lowSpan} : new double[] {lowSpan, highSpan};
        Grid g = stepAlongX ? Buildings.grid(new double[] {across}, run) : Buildings.grid(run, new double[] {across});
        int low = highFirst ? 1 : 0, high = 1 - low;
        Framing f = new Framing(beamsAlongX ? Direction.X : Direction.Y, beams);
        Level lowRoof = Level.roof("Low", 10, 0.25, List.of(stepAlongX ? Bay.floor(0, low, "roof-ordinary", 20, f) : Bay.floor(low, 0, "roof-ordinary", 20, f)));
        Level highRoof = Level.roof("High", 10 + height, 0.25,
                List.of(stepAlongX ? Bay.floor(0, high, "roof-ordinary", 20, f) : Bay.floor(high, 0, "roof-ordinary", 20, f)));
        Building b = SnowTakeDownProperties.building(g, List.of(lowRoof, highRoof), pg);
        Derived d = Derivation.derive(b);

        CalcContext ctx = b.context();
        SnowLoads expected = RoofSnow.calculate(ctx, ctx.snow(), SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 0.25, false, Double.NaN)
                .withStep(new RoofStep(height, highSpan, lowSpan)), RecordBuilder.numbersOnly("check", ctx.edition().id(), ctx.system()));
        DriftSurcharge drift = expected.drift();
        double driftArea = drift.resultant() * across;

        double onMembers = 0;
        for (DerivedMember m : d.members()) {
            if (m.role() == MemberRole.COLUMN) continue;
            double v = m.result().record().result("snow.drift.load");
            if (!Double.isNaN(v)) {
                assertThat(m.level()).isEqualTo("Low");
                onMembers += v;
            }
        }
        assertThat(onMembers).isCloseTo(driftArea, within(1e-9 * (1 + driftArea)));

        double base = 0;
        for (TakeDown t : d.takeDowns()) base += t.rows().get(t.rows().size() - 1).snow();
        double uniform = expected.uniform() * (lowSpan + highSpan) * across;
        assertThat(base).isCloseTo(uniform + driftArea, within(1e-9 * (uniform + driftArea)));
    }
}
