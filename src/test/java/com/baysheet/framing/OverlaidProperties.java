package com.baysheet.framing;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Random;
import java.util.function.Predicate;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * An overlaid map reads as a plain map given the same puts and removals, state after state, and an earlier state
 * reads as it did whatever is made from it; an entry the fold refuses is gone once folded and only then.
 */
class OverlaidProperties {
    @Property(tries = 300)
    void eachStateReadsAsAPlainMapGivenTheSameChanges(@ForAll long seed) {
        Random rnd = new Random(seed);
        int keys = 1 + rnd.nextInt(60);
        Predicate<Integer> keep = v -> v % 7 != 0;
        Overlaid<Integer, Integer> now = Overlaid.empty();
        Map<Integer, Integer> model = new HashMap<>();
        List<Overlaid<Integer, Integer>> states = new ArrayList<>();
        List<Map<Integer, Integer>> models = new ArrayList<>();
        for (int generation = 0; generation < 30; generation++) {
            Overlaid.Editor<Integer, Integer> e = now.edit();
            for (int n = rnd.nextInt(1 + rnd.nextInt(keys)); n > 0; n--) {
                int k = rnd.nextInt(keys);
                if (rnd.nextInt(3) == 0) assertThat(e.remove(k)).isEqualTo(model.remove(k));
                else {
                    int v = rnd.nextInt(1000);
                    e.put(k, v);
                    model.put(k, v);
                }
                int probe = rnd.nextInt(keys);
                assertThat(e.get(probe)).as("editor, key %d", probe).isEqualTo(model.get(probe));
            }
            now = e.done(keep);
            for (int k = 0; k < keys; k++) {
                Integer got = now.get(k), want = model.get(k);
                if (got == null && want != null && !keep.test(want)) {
                    model.remove(k); // dropped by the fold
                } else assertThat(got).as("generation %d, key %d", generation, k).isEqualTo(want);
            }
            states.add(now);
            models.add(new HashMap<>(model));
        }
        // every earlier state still reads as it did
        for (int g = 0; g < states.size(); g++)
            for (int k = 0; k < keys; k++) assertThat(states.get(g).get(k)).as("state %d, key %d", g, k).isEqualTo(models.get(g).get(k));
    }

    @Property(tries = 50)
    void aFoldDropsWhatItRefusesAndKeepsTheRest(@ForAll long seed) {
        Random rnd = new Random(seed);
        Overlaid.Editor<Integer, Integer> e = Overlaid.<Integer, Integer>empty().edit();
        Map<Integer, Integer> model = new HashMap<>();
        for (int k = 0; k < 40; k++) {
            int v = rnd.nextInt(100);
            e.put(k, v);
            model.put(k, v);
        }
        // from nothing every change is folded in at once
        Overlaid<Integer, Integer> folded = e.done(v -> v % 2 == 0);
        assertThat(folded.changes()).isZero();
        for (int k = 0; k < 40; k++) assertThat(folded.get(k)).isEqualTo(model.get(k) % 2 == 0 ? model.get(k) : null);
    }
}
