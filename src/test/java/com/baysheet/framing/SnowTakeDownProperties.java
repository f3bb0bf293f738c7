package com.baysheet.framing;

import com.baysheet.engine.record.Note;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.snow.Exposure;
import com.baysheet.engine.snow.Importance;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.snow.Thermal;
import com.baysheet.engine.units.UnitSystem;
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
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Roof snow carried from the roof members down every column stack. */
class SnowTakeDownProperties {
    static SnowSite site(double pg) {
        return new SnowSite(pg, Exposure.of(Exposure.Terrain.C, Exposure.Shelter.PARTIALLY),
                Thermal.of(Thermal.Condition.HEATED), Importance.of(Importance.RiskCategory.II));
    }

    static Building building(Grid g, List<Level> levels, double pg) {
        return new Building("snow", CalcContext.of(UnitSystem.US).withSnow(site(pg)), g, levels);
    }

    static List<Level> roofOver(Grid g, int floors, Framing f) {
        List<Level> out = new ArrayList<>(Buildings.floors(g, floors, "office", 60, f));
        out.add(Level.roof("R", 12.0 * (floors + 1), 0.25, Buildings.everyBay(g, (c, r) -> Bay.floor(c, r, "roof-ordinary", 20, f))));
        return out;
    }

    @Property(tries = 40)
    void snowAtEachColumnBaseIsTheBalancedLoadTimesTheRoofAreaItSupports(
            @ForAll @DoubleRange(min = 10, max = 40) double sx1, @ForAll @DoubleRange(min = 10, max = 40) double sx2,
            @ForAll @DoubleRange(min = 10, max = 40) double sy1, @ForAll @IntRange(min = 0, max = 3) int beams,
            @ForAll boolean alongX, @ForAll @IntRange(min = 0, max = 2) int floors, @ForAll @DoubleRange(min = 25, max = 60) double pg) {
        Grid g = Buildings.grid(new double[] {sx1, sx2}, new double[] {sy1});
        Derived d = Derivation.derive(building(g, roofOver(g, floors, new Framing(alongX ? Direction.X : Direction.Y, beams)), pg));
        // ASCE 7-16 Eq. 7.3-1 with C_e = C_t = I_s = 1, flat roof (0.25 in/ft, C_s = 1): p_s = 0.7 p_g, over p_m = 20 psf
        // for p_g ≥ 28.6; below it p_m governs (7.3.4). No rain-on-snow (p_g > 20). Snow is not reduced.
        double s = Math.max(0.7 * pg, 20);
        double total = 0;
        for (TakeDown t : d.takeDowns()) {
            TakeDown.Row roof = t.rows().get(0), base = t.rows().get(t.rows().size() - 1);
            assertThat(roof.level()).isEqualTo("R");
            assertThat(base.snow()).as(t.gridPoint()).isCloseTo(s * roof.areaAtLevel(), within(1e-6 * s * roof.areaAtLevel() + 1e-9));
            for (TakeDown.Row r : t.rows()) assertThat(r.snow()).isCloseTo(roof.snow(), within(1e-9 * (1 + roof.snow())));
            assertThat(t.record().result("S.P")).isCloseTo(base.snow(), within(1e-9 * (1 + base.snow())));
            total += base.snow();
        }
        assertThat(total).isCloseTo(s * (sx1 + sx2) * sy1, within(1e-6 * s * (sx1 + sx2) * sy1));
    }

    @Test
    void combinationAtEachLevelUsesTheSnow() {
        // one 30 × 30 ft roof bay: each corner column takes 225 ft² of roof; p_g = 40, p_s = 28 psf → S = 6300 lb.
        // D = 20 psf × 225 = 4500 lb; Lr: A_T = 225 ft², R1 = 1.2 − 0.001 × 225 = 0.975, Lr = 19.5 psf → 4387.5 lb.
        // ASCE 7-16 2.3.1 combination 3: 1.2 × 4500 + 1.6 × 6300 = 15 480 lb (with Lr: 5400 + 7020 = 12 420)
        Grid g = Buildings.grid(new double[] {30}, new double[] {30});
        Derived d = Derivation.derive(building(g, roofOver(g, 0, new Framing(Direction.X, 0)), 40));
        TakeDown.Row r = d.takeDowns().get(0).rows().get(0);
        assertThat(r.snow()).isCloseTo(6300, within(1e-6));
        assertThat(r.lrfd()).isCloseTo(15480, within(1e-6));
        assertThat(r.lrfdCombination()).isEqualTo("LRFD 3: 1.2D + 1.6S");
        // ASCE 7-16 2.4.1 combination 3: D + S = 10 800 lb
        assertThat(r.asd()).isCloseTo(10800, within(1e-6));
    }

    @Test
    void aLowerRoofNextToAHigherLevelCarriesTheDriftOrSaysNoneReachesTheMember() {
        Grid g = Buildings.grid(new double[] {30, 30}, new double[] {30});
        Framing f = new Framing(Direction.X, 1);
        Level low = Level.roof("Low roof", 12, 0.25, List.of(Bay.floor(0, 0, "roof-ordinary", 20, f), Bay.floor(1, 0, "office", 60, f)));
        Level high = Level.roof("High roof", 24, 0.25, List.of(Bay.floor(1, 0, "roof-ordinary", 20, f)));
        Derived d = Derivation.derive(building(g, List.of(low, high), 30));
        int drifted = 0;
        for (DerivedMember m : d.members()) {
            if (m.role() == MemberRole.COLUMN) continue;
            boolean caution = m.result().record().notes().stream()
                    .anyMatch(n -> n.level() == Note.Level.CAUTION && n.text().contains("none reaches this one"));
            boolean drift = !Double.isNaN(m.result().record().result("snow.drift.load"));
            if (drift) drifted++;
            assertThat(caution || drift).as(m.name() + " at " + m.level()).isEqualTo(m.level().equals("Low roof"));
            assertThat(caution && drift).isFalse();
        }
        // the exposed bay's infill beam and its two edge beams run away from the wall on x line 2
        assertThat(drifted).isEqualTo(3);
    }
}
