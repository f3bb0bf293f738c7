package com.baysheet.framing;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Step;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridLineLoad;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.SelfWeights;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Self weight and line loads through the framing and the take-down, worked by hand. */
class GravityLoadsTest {
    /** One bay 30 ft (x) × 20 ft (y), slab spanning to the edge beams on Y1 and Y2 (no infill beams, no girders). */
    private static final Grid ONE = Buildings.grid(new double[] {30}, new double[] {20});

    private static Building oneBay(Framing f) {
        Level l = Level.floor("L2", 13, List.of(Bay.floor(0, 0, "office", 50, f)));
        return Buildings.building(ONE, List.of(l));
    }

    private static TakeDown.Row foot(Derived d, String point) {
        TakeDown t = d.takeDowns().stream().filter(x -> x.gridPoint().equals(point)).findFirst().orElseThrow();
        return t.rows().get(t.rows().size() - 1);
    }

    private static double footDead(Derived d) {
        return d.takeDowns().stream().mapToDouble(t -> t.rows().get(t.rows().size() - 1).dead()).sum();
    }

    @Test
    void claddingOnAThirtyFootEdgeBeamAddsHalfToEachColumn() {
        // 10 ft of cladding at 15 psf: w = 15 × 10 = 150 plf on the 30 ft edge beam Y1/1-2;
        // R = 150 × 30 / 2 = 2 250 lb added to D at each end (Y1/1 and Y1/2), nothing at Y2
        Building b = oneBay(new Framing(Direction.X, 0));
        Derived before = Derivation.derive(b);
        Derived after = Derivation.derive(b.withLineLoads(List.of(GridLineLoad.dead("L2", false, 0, 0, 1, "cladding", 15 * 10))));
        assertThat(foot(after, "Y1/1").dead() - foot(before, "Y1/1").dead()).isCloseTo(2_250.0, within(1e-6));
        assertThat(foot(after, "Y1/2").dead() - foot(before, "Y1/2").dead()).isCloseTo(2_250.0, within(1e-6));
        assertThat(foot(after, "Y2/1").dead()).isCloseTo(foot(before, "Y2/1").dead(), within(1e-6));
        DerivedMember beam = after.members().stream().filter(m -> m.name().equals("Beam Y1/1-2")).findFirst().orElseThrow();
        CalcRecord r = beam.result().record();
        assertThat(r.step("w_D,line1").result()).isCloseTo(150.0, within(1e-9));
        assertThat(r.inputs().stream().anyMatch(i -> i.shown() != null && i.shown().startsWith("cladding: dead"))).isTrue();
        // the edge beam's area is untouched: a line load has no tributary area
        DerivedMember old = before.members().stream().filter(m -> m.name().equals("Beam Y1/1-2")).findFirst().orElseThrow();
        assertThat(beam.tributaryArea()).isEqualTo(old.tributaryArea());
    }

    @Test
    void aLiveLineLoadIsNotReduced() {
        // 100 plf live (office) on the 30 ft edge beam: 1 500 lb unreduced to each end column; the column reduces
        // its office area (if at all) but adds the line's 1 500 lb in full, so L grows by exactly 1 500 lb
        Building b = oneBay(new Framing(Direction.X, 0));
        Derived before = Derivation.derive(b);
        Derived after = Derivation.derive(b.withLineLoads(List.of(
                new GridLineLoad("L2", false, 0, 0, 1, "balcony rail crowd", 0, 100, "office", false))));
        TakeDown.Row a = foot(after, "Y1/1"), o = foot(before, "Y1/1");
        assertThat(a.liveUnreduced() - o.liveUnreduced()).isCloseTo(1_500.0, within(1e-6));
        assertThat(a.liveReduced() - o.liveReduced()).isCloseTo(1_500.0, within(1e-6));
        assertThat(a.cumulativeArea()).isEqualTo(o.cumulativeArea());
    }

    @Test
    void aLineLoadOnAGirderLineReachesTheColumnsOnceThroughTheGirder() {
        // 30 × 20 bay, two infill beams along x: girders on x lines 1 and 2 (20 ft). 200 plf on line 1 from Y1 to Y2:
        // W = 200 × 20 = 4 000 lb, R = 2 000 lb at Y1/1 and at Y2/1; the sum over all column feet grows by 4 000, not 8 000
        Building b = oneBay(new Framing(Direction.X, 2));
        Derived before = Derivation.derive(b);
        Derived after = Derivation.derive(b.withLineLoads(List.of(GridLineLoad.dead("L2", true, 0, 0, 1, "wall", 200))));
        assertThat(footDead(after) - footDead(before)).isCloseTo(4_000.0, within(1e-6));
        assertThat(foot(after, "Y1/1").dead() - foot(before, "Y1/1").dead()).isCloseTo(2_000.0, within(1e-6));
        assertThat(foot(after, "Y2/1").dead() - foot(before, "Y2/1").dead()).isCloseTo(2_000.0, within(1e-6));
        assertThat(foot(after, "Y1/2").dead()).isCloseTo(foot(before, "Y1/2").dead(), within(1e-6));
    }

    @Test
    void aFourLevelColumnCarriesItsOwnWeightStoreyByStorey() {
        // 50 plf column, 13 ft storeys, levels at 13, 26, 39, 52 ft, the lowest running to elevation 0:
        // each level adds 50 × 13 = 650 lb; D at the base grows by 50 × 13 × 4 = 2 600 lb
        List<Level> levels = new ArrayList<>();
        for (int k = 1; k <= 4; k++)
            levels.add(Level.floor("F" + k, 13.0 * k, List.of(Bay.floor(0, 0, "office", 50, new Framing(Direction.X, 0)))));
        Building b = Buildings.building(ONE, levels);
        Derived before = Derivation.derive(b);
        Derived after = Derivation.derive(b.withSelfWeights(new SelfWeights(0, 0, 0, 50, "firm default")));
        TakeDown t = after.takeDowns().stream().filter(x -> x.gridPoint().equals("Y1/1")).findFirst().orElseThrow();
        assertThat(t.rows()).extracting(TakeDown.Row::selfWeightAtLevel).containsExactly(650.0, 650.0, 650.0, 650.0);
        assertThat(foot(after, "Y1/1").dead() - foot(before, "Y1/1").dead()).isCloseTo(2_600.0, within(1e-6));
        DerivedMember col = after.member(t.rows().get(0).member()).orElseThrow();
        Step sw = col.result().record().step("P_sw");
        assertThat(sw.result()).isCloseTo(650.0, within(1e-9));
        assertThat(sw.description()).contains("firm default for columns");
        assertThat(t.record().step("P_sw@F1").result()).isCloseTo(650.0, within(1e-9));
    }

    @Test
    void beamSelfWeightReachesTheGirderAndTheColumns() {
        // two 30 ft infill beams at 40 plf: R = 40 × 30 / 2 = 600 lb on each girder per beam; girders 20 ft at 60 plf:
        // 600 lb to each end column; the edge beams on Y1 and Y2 (30 ft, slab only) at 25 plf. Whole floor:
        // 2 × 40 × 30 + 2 × 60 × 20 + 2 × 25 × 30 = 2 400 + 2 400 + 1 500 = 6 300 lb more at the feet
        Building b = oneBay(new Framing(Direction.X, 2));
        Derived before = Derivation.derive(b);
        Derived after = Derivation.derive(b.withSelfWeights(new SelfWeights(40, 25, 60, 0, "firm default")));
        DerivedMember beam = after.members().stream().filter(m -> m.role() == MemberRole.INFILL_BEAM).findFirst().orElseThrow();
        DerivedMember old = before.member(beam.id()).orElseThrow();
        assertThat(beam.result().record().result("D.RA") - old.result().record().result("D.RA")).isCloseTo(600.0, within(1e-6));
        assertThat(beam.result().record().step("w_sw").description()).contains("firm default for infill beams");
        assertThat(footDead(after) - footDead(before)).isCloseTo(6_300.0, within(1e-6));
    }

    @Test
    void noSelfWeightIsSaidOnTheSheet() {
        Derived d = Derivation.derive(oneBay(new Framing(Direction.X, 0)));
        for (DerivedMember m : d.members()) {
            CalcRecord r = m.result().record();
            assertThat(r.step(m.role() == MemberRole.COLUMN ? "P_sw" : "w_sw").result()).as(m.name()).isZero();
            assertThat(r.notes()).anyMatch(n -> n.text().startsWith("Self weight not included (0)"));
        }
    }

    @Test
    void aLineLoadWithNoMemberBeneathIsRefusedNamingTheLines() {
        // no infill beams: nothing on the x lines (the slab spans to Y1 and Y2), so a wall along line 1 has no member
        Building b = oneBay(new Framing(Direction.X, 0));
        assertThatThrownBy(() -> Derivation.derive(b.withLineLoads(List.of(GridLineLoad.dead("L2", true, 0, 0, 1, "wall", 100)))))
                .isInstanceOf(InputError.class).hasMessageContaining("levels[L2].lineLoads[wall]")
                .hasMessageContaining("line 1 from Y1 to Y2: no member at L2 along 1/Y1-Y2");
        assertThatThrownBy(() -> Derivation.derive(b.withLineLoads(List.of(GridLineLoad.dead("L2", false, 0, 0, 2, "wall", 100)))))
                .isInstanceOf(InputError.class).hasMessageContaining("lineLoads[wall].to").hasMessageContaining("outside the grid");
        assertThatThrownBy(() -> Derivation.derive(b.withLineLoads(List.of(GridLineLoad.dead("L9", false, 0, 0, 1, "wall", 100)))))
                .isInstanceOf(InputError.class).hasMessageContaining("lineLoads[wall].level");
        assertThatThrownBy(() -> GridLineLoad.dead("L2", false, 0, 0, 1, "wall", -1)).hasMessageContaining("lineLoad.dead");
        assertThatThrownBy(() -> GridLineLoad.dead("L2", false, 0, 0, 1, "wall", Double.NaN)).hasMessageContaining("lineLoad.dead");
        assertThatThrownBy(() -> new SelfWeights(0, -5, 0, 0, "firm default")).hasMessageContaining("selfWeight.gridBeam");
    }
}
