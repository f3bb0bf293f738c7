package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.model.Building;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;
import com.baysheet.engine.InputError;

import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Typical members on random buildings: the groups partition the members, a group's members print the same
 * calculation but for their name, two groups of one role never do, and groups come in reading order.
 */
class TypicalsProperties {
    @Property(tries = 60)
    void everyMemberIsInExactlyOneGroupOfItsOwnRole(@ForAll long seed) {
        Derived d = Derivation.derive(Buildings.random(seed));
        List<TypicalGroup> groups = Typicals.of(d);
        Set<String> seen = new HashSet<>();
        for (TypicalGroup g : groups)
            for (DerivedMember m : g.members()) {
                assertThat(seen.add(m.id())).as("seed %d: %s in two groups", seed, m.id()).isTrue();
                assertThat(m.role()).isEqualTo(g.role());
            }
        assertThat(seen).hasSize(d.members().size());
    }

    @Property(tries = 60)
    void aGroupsMembersShareOneCalculationAndNoTwoGroupsDo(@ForAll long seed) {
        Derived d = Derivation.derive(Buildings.random(seed));
        Set<List<Object>> calculations = new HashSet<>();
        for (TypicalGroup g : Typicals.of(d)) {
            CalcRecord shared = g.calculation();
            for (DerivedMember m : g.members())
                assertThat(m.result().record().withSubject(shared.subject())).as("seed %d: %s", seed, m.id()).isEqualTo(shared);
            assertThat(calculations.add(List.of(g.role(), shared))).as("seed %d: two groups with one calculation", seed).isTrue();
        }
    }

    @Property(tries = 60)
    void groupsComeInReadingOrderAndTheirSheetsListEachLocationOnce(@ForAll long seed) {
        Building b = Buildings.random(seed);
        Derived d = Derivation.derive(b);
        List<String> levels = d.members().stream().map(DerivedMember::level).distinct().toList();
        int last = -1;
        for (TypicalGroup g : Typicals.of(d)) {
            int level = levels.indexOf(g.first().level());
            assertThat(level).as("seed %d: groups by their first location's level, top down", seed).isGreaterThanOrEqualTo(last);
            last = level;
            for (DerivedMember m : g.members()) assertThat(levels.indexOf(m.level())).isGreaterThanOrEqualTo(level);
            String note = g.record("X1").notes().get(g.record("X1").notes().size() - 1).text();
            assertThat(note).as("seed %d", seed).endsWith(": " + String.join("; ", g.locations()) + ".");
            assertThat(new HashSet<>(g.locations())).as("seed %d: no location twice", seed).hasSize(g.members().size());
            assertThat(g.record("X1").subject()).isEqualTo("X1");
        }
    }

    /**
     * Grouped from the grouping of the state before an edit (the derivation reusing the members the edit left alone),
     * the groups are exactly those worked out from nothing: the same groups in the same order, the same members in
     * the same order, each group's calculation equal.
     */
    @Property(tries = 60)
    void aBuildingGroupedFromItsLastGroupingIsGroupedAsFromNothing(@ForAll long seed, @ForAll @IntRange(min = 1, max = 4) int edits) {
        Random rnd = new Random(seed);
        Building b = RederivationProperties.model(rnd, seed);
        Rederivation again = new Rederivation();
        Typicals.Grouping last = null;
        for (int e = 0; e <= edits; e++) {
            Derived d;
            try {
                d = again.derive(b);
            } catch (InputError refused) {
                b = RederivationProperties.edit(b, rnd.nextInt(RederivationProperties.EDITS), rnd);
                continue;
            }
            Typicals.Grouping now = Typicals.grouped(d, last);
            List<TypicalGroup> whole = Typicals.of(d);
            assertThat(now.groups()).as("seed %d, edit %d", seed, e).hasSameSizeAs(whole);
            for (int g = 0; g < whole.size(); g++) {
                assertThat(now.groups().get(g).role()).isEqualTo(whole.get(g).role());
                assertThat(now.groups().get(g).memberIds()).as("seed %d, edit %d, group %d", seed, e, g).isEqualTo(whole.get(g).memberIds());
                assertThat(now.groups().get(g).calculation()).isEqualTo(whole.get(g).calculation());
            }
            last = now;
            b = RederivationProperties.edit(b, rnd.nextInt(RederivationProperties.EDITS), rnd);
        }
    }
}
