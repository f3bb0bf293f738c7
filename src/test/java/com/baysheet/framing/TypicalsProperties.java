package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.model.Building;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

import java.util.HashSet;
import java.util.List;
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
}
