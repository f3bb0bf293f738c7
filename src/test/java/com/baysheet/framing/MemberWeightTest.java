package com.baysheet.framing;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.SelfWeights;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** A single member's own weight, entered in place of its role's, worked by hand through the member, girder and columns. */
class MemberWeightTest {
    /** One bay 30 ft (x) × 20 ft (y) with two infill beams along x, girders on lines 1 and 2. */
    private static final Grid ONE = Buildings.grid(new double[] {30}, new double[] {20});
    private static final SelfWeights ROLES = new SelfWeights(40, 25, 60, 50, "firm default");

    private static Building floor(int levels) {
        List<Level> ls = new ArrayList<>();
        for (int k = 1; k <= levels; k++)
            ls.add(Level.floor("F" + k, 13.0 * k, List.of(Bay.floor(0, 0, "office", 50, new Framing(Direction.X, 2)))));
        return Buildings.building(ONE, ls).withSelfWeights(ROLES);
    }

    private static double footDead(Derived d) {
        return d.takeDowns().stream().mapToDouble(t -> t.rows().get(t.rows().size() - 1).dead()).sum();
    }

    @Test
    void anInfillBeamsOwnWeightReplacesItsRolesAndReachesTheFeetOnce() {
        Building b = floor(1);
        Derived before = Derivation.derive(b);
        DerivedMember beam = before.members().stream().filter(m -> m.role() == MemberRole.INFILL_BEAM).findFirst().orElseThrow();
        // 90 plf instead of 40 on one 30 ft beam: each end reaction grows by (90 − 40) × 30 / 2 = 750 lb (statics);
        // the girders pass it on, so the feet carry (90 − 40) × 30 = 1 500 lb more, and nothing else changes
        Derived after = Derivation.derive(b.withSelfWeights(ROLES.withMembers(Map.of(beam.id(), 90.0))));
        DerivedMember heavier = after.member(beam.id()).orElseThrow();
        assertThat(heavier.result().record().step("w_sw").result()).isEqualTo(90.0);
        assertThat(heavier.result().record().step("w_sw").description()).contains(SelfWeights.ENTERED);
        assertThat(heavier.result().record().result("D.RA") - beam.result().record().result("D.RA")).isCloseTo(750.0, within(1e-6));
        assertThat(footDead(after) - footDead(before)).isCloseTo(1_500.0, within(1e-6));
        DerivedMember other = after.members().stream().filter(m -> m.role() == MemberRole.INFILL_BEAM && !m.id().equals(beam.id()))
                .findFirst().orElseThrow();
        assertThat(other.result().record().step("w_sw").result()).isEqualTo(40.0);
        assertThat(other.result().record().step("w_sw").description()).contains("firm default for infill beams");
    }

    @Test
    void aGirdersOwnWeightOfZeroIsTakenAsEntered() {
        Building b = floor(1);
        Derived before = Derivation.derive(b);
        DerivedMember girder = before.members().stream().filter(m -> m.role() == MemberRole.GIRDER).findFirst().orElseThrow();
        // 0 entered: the girder's 60 plf × 20 ft = 1 200 lb leaves the feet; the record says it is not included
        Derived after = Derivation.derive(b.withSelfWeights(ROLES.withMembers(Map.of(girder.id(), 0.0))));
        assertThat(footDead(before) - footDead(after)).isCloseTo(1_200.0, within(1e-6));
        assertThat(after.member(girder.id()).orElseThrow().result().record().notes())
                .anyMatch(n -> n.text().startsWith("Self weight not included (0): " + SelfWeights.ENTERED));
    }

    @Test
    void aColumnsOwnWeightCountsInAStackLikeOneTakenDownBefore() {
        // three equal bays in a row: the two interior stacks on each y line carry the same loads to the last digit, so
        // the later one is taken down storey by storey as the earlier one was (ColumnStorey)
        Grid row = Buildings.grid(new double[] {30, 30, 30}, new double[] {20});
        List<Level> ls = new ArrayList<>();
        for (int k = 1; k <= 3; k++)
            ls.add(Level.floor("F" + k, 13.0 * k, Buildings.everyBay(row, (c, r) -> Bay.floor(c, r, "office", 50, new Framing(Direction.X, 2)))));
        Building b = Buildings.building(row, ls).withSelfWeights(ROLES);
        Derived before = Derivation.derive(b);
        List<TakeDown> ts = before.takeDowns();
        int twin = -1, of = -1;
        for (int n = 1; n < ts.size() && twin < 0; n++)
            for (int m = 0; m < n && twin < 0; m++)
                if (dead(ts.get(n)).equals(dead(ts.get(m)))) { twin = n; of = m; }
        assertThat(twin).as("a stack taken down like an earlier one").isPositive();
        String f2 = ts.get(twin).rows().get(1).member();
        Derived after = Derivation.derive(b.withSelfWeights(ROLES.withMembers(Map.of(f2, 150.0))));
        TakeDown u = after.takeDowns().get(twin);
        assertThat(u.rows()).extracting(TakeDown.Row::selfWeightAtLevel).containsExactly(650.0, 1_950.0, 650.0);
        assertThat(u.rows().get(2).dead() - ts.get(twin).rows().get(2).dead()).isCloseTo(1_300.0, within(1e-6));
        assertThat(after.takeDowns().get(of).rows()).isEqualTo(ts.get(of).rows());
        assertThat(after.member(f2).orElseThrow().result().record().step("P_sw").description()).contains(SelfWeights.ENTERED);
    }

    private static List<Double> dead(TakeDown t) { return t.rows().stream().map(TakeDown.Row::dead).toList(); }

    @Test
    void aColumnsOwnWeightIsPerLengthOverTheStoreyBelowItsLevel() {
        Building b = floor(3);
        Derived before = Derivation.derive(b);
        TakeDown t = before.takeDowns().stream().filter(x -> x.gridPoint().equals("Y1/1")).findFirst().orElseThrow();
        String f2 = t.rows().get(1).member(); // the column below F2, 13 ft (F2 at 26 ft, F1 at 13 ft)
        // 150 plf instead of 50 on that storey only: (150 − 50) × 13 = 1 300 lb more at F2 and below, nowhere else
        Derived after = Derivation.derive(b.withSelfWeights(ROLES.withMembers(Map.of(f2, 150.0))));
        TakeDown u = after.takeDowns().stream().filter(x -> x.gridPoint().equals("Y1/1")).findFirst().orElseThrow();
        assertThat(u.rows()).extracting(TakeDown.Row::selfWeightAtLevel).containsExactly(650.0, 1_950.0, 650.0);
        assertThat(u.rows().get(u.rows().size() - 1).dead() - t.rows().get(t.rows().size() - 1).dead()).isCloseTo(1_300.0, within(1e-6));
        assertThat(after.member(f2).orElseThrow().result().record().step("P_sw").description()).contains(SelfWeights.ENTERED);
        assertThat(footDead(after) - footDead(before)).isCloseTo(1_300.0, within(1e-6));
    }

    @Test
    void aNegativeOwnWeightIsRefusedNamingTheMember() {
        assertThatThrownBy(() -> ROLES.withMembers(Map.of("L1-h1x1", -5.0)))
                .isInstanceOf(InputError.class).hasMessageContaining("selfWeight.L1-h1x1");
    }

    @Test
    void aWeightForNoMemberChangesNothing() {
        Building b = floor(2);
        assertThat(footDead(Derivation.derive(b.withSelfWeights(ROLES.withMembers(Map.of("gone-h9x9", 500.0))))))
                .isEqualTo(footDead(Derivation.derive(b)));
    }
}
