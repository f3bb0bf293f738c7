package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import org.junit.jupiter.api.Test;

import java.util.List;

import static com.baysheet.framing.RoofDriftTest.PD;
import static com.baysheet.framing.RoofDriftTest.W;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The drift carried past the free ends of a wall at a roof step (our choice, common practice, conservative: ASCE 7-16
 * 7.7.1 gives no rule at the ends; see docs/engine.md, Drifts at roof steps). The step of {@link RoofDriftTest}: 12 ft
 * high, ℓu = 30 ft, p_g = 30 psf: h_d = 1.8601 ft, w = 7.4406 ft, p_d = 33.297 psf, p_d w / 2 = 123.87 plf. Here the
 * wall runs along x (on y line Y2 or Y3), the lower roof to its south, and the lower roof goes on past the wall's end.
 */
class WallEndsTest {
    static final double PER_FT = PD * W / 2;   // the drift's resultant per length of wall, ℓl ≥ w

    static Derived build(double[] xs, double[] ys, List<int[]> lowBays, List<int[]> highBays, Direction beams, int infill) {
        return build(xs, ys, lowBays, highBays, List.of(), beams, infill);
    }

    /** With {@code midBays} a roof at 18 ft, between the low roof (12 ft) and the high roof (24 ft). */
    static Derived build(double[] xs, double[] ys, List<int[]> lowBays, List<int[]> highBays, List<int[]> midBays,
                         Direction beams, int infill) {
        Grid g = Buildings.grid(xs, ys);
        Framing f = new Framing(beams, infill);
        Level low = Level.roof("Low roof", 12, 0.25, lowBays.stream().map(c -> Bay.floor(c[0], c[1], "roof-ordinary", 20, f)).toList());
        Level high = Level.roof("High roof", 24, 0.25, highBays.stream().map(c -> Bay.floor(c[0], c[1], "roof-ordinary", 20, f)).toList());
        List<Level> levels = new java.util.ArrayList<>(List.of(low, high));
        if (!midBays.isEmpty())
            levels.add(Level.roof("Mid roof", 18, 0.25, midBays.stream().map(c -> Bay.floor(c[0], c[1], "roof-ordinary", 20, f)).toList()));
        return Derivation.derive(SnowTakeDownProperties.building(g, levels, 30));
    }

    /** The drift on the low roof's beams and girders (lb). */
    static double driftOnMembers(Derived d) {
        double sum = 0;
        for (DerivedMember m : d.members()) {
            if (m.role() == MemberRole.COLUMN || !m.level().equals("Low roof")) continue;
            double v = m.result().record().result("snow.drift.load");
            if (!Double.isNaN(v)) sum += v;
        }
        return sum;
    }

    /** Two 30 ft bays of low roof in a row, the high roof over the north of the west one: the wall on Y2 from x = 0 to 30. */
    static Derived beyondOneEnd(double eastBay) {
        return build(new double[] {30, eastBay}, new double[] {30, 30}, List.of(new int[] {0, 0}, new int[] {1, 0}),
                List.of(new int[] {0, 1}), Direction.Y, 4);
    }

    @Test
    void aBeamJustBeyondTheEndOfTheWallCarriesDriftAndOneFartherThanWDoesNot() {
        Derived d = beyondOneEnd(30);
        // beams along y at 6 ft spacing in the east bay: the one at x = 36 takes 33 to 39 ft, of which 33 to 37.44 ft lies
        // within w of the wall's end at x = 30; across, it runs the whole drift: 4.4406 × 123.87 = 550.1 lb
        CalcRecord near = RoofDriftTest.member(d, "Beam Y1-Y2/2-3 #1", "Low roof").result().record();
        assertThat(near.result("snow.drift.load")).isCloseTo((30 + W - 33) * PER_FT, within(1e-6));
        assertThat(near.result("snow.drift.load")).isCloseTo(550.1, within(0.1));
        assertThat(near.notes()).anySatisfy(n -> assertThat(n.text()).contains("past the free end of the wall")
                .contains("our choice, common practice, conservative"));
        // the one at x = 42 takes 39 to 45 ft: farther than w from the end, no drift
        assertThat(RoofDriftTest.member(d, "Beam Y1-Y2/2-3 #2", "Low roof").result().record().result("snow.drift.load")).isNaN();
        // the beams along the wall's own length carry no note of an extension
        CalcRecord own = RoofDriftTest.member(d, "Beam Y1-Y2/1-2 #2", "Low roof").result().record();
        assertThat(own.result("snow.drift.load")).isCloseTo(6 * PER_FT, within(1e-6));
        assertThat(own.notes()).noneSatisfy(n -> assertThat(n.text()).contains("past the free end of the wall"));
        // all told: the wall's 30 ft and the extension's w
        assertThat(driftOnMembers(d)).isCloseTo((30 + W) * PER_FT, within(1e-6));
    }

    @Test
    void twoCollinearWallsCarryTheirLengthAndTwoEndExtensionsOnly() {
        // four 30 ft bays of low roof along x, the high roof over the middle two: walls on Y2 from x = 30 to 60 and 60 to
        // 90, one step; free ends at x = 30 and 90 only, each extended w, nothing extra at the joint at x = 60
        Derived d = build(new double[] {30, 30, 30, 30}, new double[] {30, 30},
                List.of(new int[] {0, 0}, new int[] {1, 0}, new int[] {2, 0}, new int[] {3, 0}),
                List.of(new int[] {1, 1}, new int[] {2, 1}), Direction.Y, 2);
        assertThat(driftOnMembers(d)).isCloseTo((60 + 2 * W) * PER_FT, within(1e-6));
        // the grid beam on line 3 (x = 60, at the joint) runs away from the wall over 5 ft each side: 10 ft of drift
        assertThat(RoofDriftTest.member(d, "Beam 3/Y1-Y2", "Low roof").result().record().result("snow.drift.load"))
                .isCloseTo(10 * PER_FT, within(1e-6));
        // the beams of the end bays nearest the walls (x = 20 and x = 100) each take 2.44 ft of an extension (their strips
        // 15 to 25 and 95 to 105 ft, cut at w = 7.44 ft from the ends at 30 and 90: 22.56 to 25 and 95 to 97.44 ft)
        assertThat(RoofDriftTest.member(d, "Beam Y1-Y2/1-2 #2", "Low roof").result().record().result("snow.drift.load"))
                .isCloseTo((25 - (30 - W)) * PER_FT, within(1e-6));
        assertThat(RoofDriftTest.member(d, "Beam Y1-Y2/4-5 #1", "Low roof").result().record().result("snow.drift.load"))
                .isCloseTo((90 + W - 95) * PER_FT, within(1e-6));
    }

    @Test
    void anExtensionStopsAtTheLowerRoofsEdgeAlongTheWall() {
        // the low roof goes on only 5 ft past the wall's end (a 5 ft east bay): the extension is cut to 5 ft, less than w
        Derived d = beyondOneEnd(5);
        assertThat(driftOnMembers(d)).isCloseTo((30 + 5) * PER_FT, within(1e-6));
        assertThat(DriftZones.of(d.building(), "Low roof")).extracting(DriftZones.Zone::area)
                .containsExactly(new PlanRect(0, 30 - W, 30, 30), new PlanRect(30, 30 - W, 35, 30));
    }

    @Test
    void anExtensionStopsAtTheLowerRoofsEdgeAcrossTheWall() {
        // y bays 30, 5, 30: the low roof has the west column's two south bays (35 ft from the wall on Y3) and, past the
        // wall's end, only a 5 ft deep bay: the extension is w long and 5 ft deep, the surcharge p_d to p(5) over it
        Derived d = build(new double[] {30, 30}, new double[] {30, 5, 30},
                List.of(new int[] {0, 0}, new int[] {0, 1}, new int[] {1, 1}), List.of(new int[] {0, 2}), Direction.Y, 4);
        double p5 = PD * (1 - 5 / W);
        double extension = W * (PD + p5) / 2 * 5;
        assertThat(driftOnMembers(d)).isCloseTo(30 * PER_FT + extension, within(1e-6));
        assertThat(DriftZones.of(d.building(), "Low roof")).extracting(DriftZones.Zone::area)
                .containsExactly(new PlanRect(0, 35 - W, 30, 35), new PlanRect(30, 30, 30 + W, 35));
    }

    @Test
    void atAnInsideCornerBothWallsCarryTheirDriftAndNeitherIsExtendedUnderTheHigherRoof() {
        // the high roof is L-shaped round the low roof's bay (0,0): walls on Y2 (x 0 to 30) and on line 2 (y 0 to 30); the
        // low level's bay (1,0) lies under the higher roof, so nothing is extended into it; in the corner both drifts act
        // and add (conservative)
        Derived d = build(new double[] {30, 30}, new double[] {30, 30}, List.of(new int[] {0, 0}, new int[] {1, 0}),
                List.of(new int[] {0, 1}, new int[] {1, 1}, new int[] {1, 0}), Direction.Y, 4);
        assertThat(driftOnMembers(d)).isCloseTo(2 * 30 * PER_FT, within(1e-6));
        assertThat(DriftZones.of(d.building(), "Low roof")).hasSize(2);
    }

    @Test
    void pastAWallOfAnotherStepOnTheSameLineBothDriftsAct() {
        // walls on Y2 from x = 0 to 30 (12 ft up to the high roof) and 30 to 60 (6 ft up to the mid roof): two steps, so
        // each end at x = 30 is free and each drift runs w into the other's length, where both add (conservative). With
        // 6 ft, h_c = 6 − 1.173 = 4.83 ft > h_d: the same h_d, w and p_d (7.7.1), so the total is p_d w/2 (60 + 2 w)
        Derived d = build(new double[] {30, 30}, new double[] {30, 30}, List.of(new int[] {0, 0}, new int[] {1, 0}),
                List.of(new int[] {0, 1}), List.of(new int[] {1, 1}), Direction.Y, 4);
        assertThat(driftOnMembers(d)).isCloseTo((60 + 2 * W) * PER_FT, within(1e-6));
    }

    @Test
    void pastTheEndTheDriftIsCutWhereTheLowerRoofEndsThereNotAtTheWallsLowerRoofLength() {
        // y bays 30, 5, 30: the high roof over the west column's north bay, the wall on Y3 (y = 35) from x = 0 to 30; beside
        // the wall the low roof is one 5 ft bay deep (ℓl = 5 ft < w: the drift there is cut at 5 ft), but past the wall's
        // east end the low roof runs 35 ft south (the east column's two bays): there the extension is w deep, the band
        // from 5 ft to w loaded too (the drift truncated only at the far edge of the lower roof there, ASCE 7-16 7.7.1).
        // Leeward governs (ℓu = 30 ft): h_d, w and p_d as in RoofDriftTest
        Derived d = build(new double[] {30, 30}, new double[] {30, 5, 30},
                List.of(new int[] {0, 1}, new int[] {1, 0}, new int[] {1, 1}), List.of(new int[] {0, 2}), Direction.Y, 4);
        double p5 = PD * (1 - 5 / W);
        double atWall = (PD + p5) / 2 * 5;                  // per ft of wall, cut at ℓl = 5 ft
        double band = PD * (W - 5) * (W - 5) / (2 * W);     // per ft, from 5 ft to w
        assertThat(driftOnMembers(d)).isCloseTo(30 * atWall + W * PER_FT, within(1e-6));
        assertThat(DriftZones.of(d.building(), "Low roof")).extracting(DriftZones.Zone::area)
                .containsExactly(new PlanRect(0, 30, 30, 35), new PlanRect(30, 35 - W, 30 + W, 35));
        // the beam at x = 36 in the east column's south bay (strip 33 to 39 ft) lies in the band: 33 to 37.44 ft along,
        // 5 ft to w across; cut at the wall's ℓl it would carry nothing
        CalcRecord inBand = RoofDriftTest.member(d, "Beam Y1-Y2/2-3 #1", "Low roof").result().record();
        assertThat(inBand.result("snow.drift.load")).isCloseTo((30 + W - 33) * band, within(1e-6));
        // the one beside it in the 5 ft bay (y 30 to 35) carries the drift from 0 to 5 ft, and its record names the cut-off
        CalcRecord near = RoofDriftTest.member(d, "Beam Y2-Y3/2-3 #1", "Low roof").result().record();
        assertThat(near.result("snow.drift.load")).isCloseTo((30 + W - 33) * atWall, within(1e-6));
        assertThat(near.steps()).anySatisfy(st -> assertThat(st.description()).contains("the lower roof across this strip ends 35")
                .contains("cut off at 7.44 ft"));
    }
}
