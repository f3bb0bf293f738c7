package com.baysheet.framing;

import com.baysheet.engine.InputError;
import com.baysheet.framing.model.Building;
import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.IntRange;

import java.util.HashSet;
import java.util.List;
import java.util.Random;
import java.util.Set;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A derivation made again from an earlier one finds each of its members by id, the member itself, and finds no member
 * the edit removed, however many edits are laid one over another (random models and edits, as RederivationProperties).
 */
class MemberIndexProperties {
    @Property(tries = 60)
    void aRederivedBuildingFindsEachOfItsMembersAndNoneItLost(@ForAll long seed, @ForAll @IntRange(min = 1, max = 8) int edits) {
        Random rnd = new Random(seed);
        Building b = RederivationProperties.model(rnd, seed);
        Rederivation again = new Rederivation();
        Derived last = null;
        for (int e = 0; e <= edits; e++) {
            Derived d;
            try {
                d = again.derive(b);
            } catch (InputError refused) {
                b = RederivationProperties.edit(b, rnd.nextInt(RederivationProperties.EDITS), rnd);
                continue;
            }
            Set<String> ids = new HashSet<>();
            for (DerivedMember m : d.members()) {
                if (ids.add(m.id())) assertThat(d.member(m.id())).as("seed %d, edit %d: %s", seed, e, m.id()).containsSame(m);
            }
            assertThat(d.idsUnique()).isEqualTo(ids.size() == d.members().size());
            if (last != null)
                for (DerivedMember m : last.members())
                    if (!ids.contains(m.id())) assertThat(d.member(m.id())).as("seed %d, edit %d: %s is gone", seed, e, m.id()).isEmpty();
            assertThat(d.member("no such member")).isEmpty();
            last = d;
            b = RederivationProperties.edit(b, rnd.nextInt(RederivationProperties.EDITS), rnd);
        }
    }
}
