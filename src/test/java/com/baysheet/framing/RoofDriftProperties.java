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
 * resultant per length of wall, ASCE 7-16 7.7.1, × the loaded length: the walls' length plus, at each free end, the
 * extension of w along the wall's line cut at the lower roof's edge, our choice), and the column bases carry every
 * roof's uniform snow plus that drift, whatever the framing.
 */
class RoofDriftProperties {
    @Property(tries = 60)
    void driftOnMembersSumsToTheDriftAreaLoadAndReachesTheColumnsOnce(
            @ForAll @DoubleRange(min = 12, max = 40) double lowSpan, @ForAll @DoubleRange(min = 12, max = 60) double highSpan,
            @ForAll @DoubleRange(min = 3, max = 40) double a0, @ForAll @DoubleRange(min = 12, max = 40) double a1,
            @ForAll @DoubleRange(min = 3, max = 40) double a2, @ForAll @DoubleRange(min = 12, max = 40) double a3,
            @ForAll @IntRange(min = 1, max = 4) int cells, @ForAll @IntRange(min = 0, max = 3) int first,
            @ForAll @IntRange(min = 1, max = 4) int covered, @ForAll @IntRange(min = 0, max = 3) int beams,
            @ForAll boolean beamsAlongX, @ForAll boolean stepAlongX, @ForAll boolean highFirst,
            @ForAll @DoubleRange(min = 4, max = 20) double height, @ForAll @DoubleRange(min = 21, max = 60) double pg) {
        // p_g above 20 psf: a flat roof needs no W for rain-on-snow (7.10), which the check here does not give
        // two rows of cells across the wall: the low roof's row (every cell along), and the row the high roof covers in
        // part (cells from..to along); the wall runs between them, one step (one height, ℓu and ℓl) all along
        double[] along = java.util.Arrays.copyOf(new double[] {a0, a1, a2, a3}, cells);
        int from = Math.min(first, cells - 1), to = Math.min(cells, from + covered);
        double[] run = highFirst ? new double[] {highSpan, lowSpan} : new double[] {lowSpan, highSpan};
        Grid g = stepAlongX ? Buildings.grid(along, run) : Buildings.grid(run, along);
        int low = highFirst ? 1 : 0, high = 1 - low;
        Framing f = new Framing(beamsAlongX ? Direction.X : Direction.Y, beams);
        List<Bay> lowBays = new java.util.ArrayList<>(), highBays = new java.util.ArrayList<>();
        for (int k = 0; k < cells; k++) {
            lowBays.add(stepAlongX ? Bay.floor(k, low, "roof-ordinary", 20, f) : Bay.floor(low, k, "roof-ordinary", 20, f));
            if (k >= from && k < to) highBays.add(stepAlongX ? Bay.floor(k, high, "roof-ordinary", 20, f) : Bay.floor(high, k, "roof-ordinary", 20, f));
        }
        Level lowRoof = Level.roof("Low", 10, 0.25, lowBays);
        Level highRoof = Level.roof("High", 10 + height, 0.25, highBays);
        Building b = SnowTakeDownProperties.building(g, List.of(lowRoof, highRoof), pg);
        Derived d = Derivation.derive(b);

        CalcContext ctx = b.context();
        SnowLoads expected = RoofSnow.calculate(ctx, ctx.snow(), SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 0.25, false, Double.NaN)
                .withStep(new RoofStep(height, highSpan, lowSpan)), RecordBuilder.numbersOnly("check", ctx.edition().id(), ctx.system()));
        DriftSurcharge drift = expected.drift();
        double wall = 0, before = 0, after = 0;
        for (int k = 0; k < cells; k++) {
            if (k < from) before += along[k];
            else if (k < to) wall += along[k];
            else after += along[k];
        }
        double loaded = !drift.required() ? 0 : wall + Math.min(drift.width(), before) + Math.min(drift.width(), after);
        double driftArea = drift.resultant() * loaded;

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
        double uniform = expected.uniform() * (lowSpan * (before + wall + after) + highSpan * wall);
        assertThat(base).isCloseTo(uniform + driftArea, within(1e-9 * (uniform + driftArea)));
    }
}
