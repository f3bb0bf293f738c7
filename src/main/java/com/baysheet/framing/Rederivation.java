package com.baysheet.framing;

import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.member.MemberResult;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Level;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * The derivation of a building that was derived before in another state, doing again only what the change
 * touches. It keeps, for each of the last few buildings it derived (one per project in practice: they are told apart
 * by their levels' keys), the building, its result, the framing of each level by the level's inputs and the
 * engine's results by member input. A new state of that building with the same shared inputs
 * ({@link LevelInputs.Shared}: setting, grid, self weights by role) reuses the framing of every level whose own
 * inputs are equal, frames the others, and keeps each column stack whose own inputs ({@link StackInputs}: what
 * arrives at its grid point level by level, the bays around it, the storeys) are equal; the stacks below a changed
 * level that it changed are taken down again, their columns read from the kept engine results where equal.
 * A change to a shared input derives the whole building, as does a building not seen before.
 *
 * <p>Every reuse is of a result computed from equal inputs by pure functions, so the result equals
 * {@link Derivation#derive} exactly (RederivationProperties compares them member by member). Thread-safe: what is
 * kept is never changed once kept; two derivations at once each derive from what was kept before them.
 */
public final class Rederivation {
    /** Buildings remembered at once: as many as the store keeps derived results for (store.Results). */
    public static final int BUILDINGS = 16;

    private record Kept(Building building, Derived derived, LevelInputs.Shared shared, Map<LevelInputs, LevelFraming> levels,
                        Map<Integer, Derivation.Stack> stacks, Map<MemberInput, MemberResult> results, List<LevelFraming> order) {
        /** Shares a level key with {@code b} (the store's keys are row ids); where neither has keys, has its name. */
        boolean sameBuilding(Building b) {
            for (Level l : b.levels()) for (Level k : building.levels()) if (l.key() != null && l.key().equals(k.key())) return true;
            return !keyed(b) && !keyed(building) && b.name().equals(building.name());
        }

        private static boolean keyed(Building b) {
            for (Level l : b.levels()) if (l.key() != null) return true;
            return false;
        }
    }

    private final List<Kept> kept = new ArrayList<>();   // most recent last

    /** @throws com.baysheet.engine.InputError as {@link Derivation#derive} does */
    public Derived derive(Building b) {
        Kept before = before(b);
        if (before != null && before.building.equals(b)) return before.derived;
        LevelInputs.Shared shared = LevelInputs.Shared.of(b);
        boolean reuse = before != null && before.shared.equals(shared);
        MemberCache cache = new MemberCache(b.context(), reuse ? before.results : Map.of());
        Derivation.Framed f = Derivation.derive(b, cache, reuse ? before.levels : Map.of(), reuse ? before.stacks : Map.of(),
                reuse ? before.derived : null, reuse ? before.order : List.of());
        keep(before, new Kept(b, f.derived(), shared, f.levels(), f.stacks(), cache.kept(), f.order()));
        return f.derived();
    }

    /** How many buildings are remembered, for tests. */
    int remembered() {
        synchronized (kept) { return kept.size(); }
    }

    private Kept before(Building b) {
        synchronized (kept) {
            for (int k = kept.size() - 1; k >= 0; k--) if (kept.get(k).sameBuilding(b)) return kept.get(k);
            return null;
        }
    }

    private void keep(Kept replaced, Kept now) {
        synchronized (kept) {
            kept.removeIf(k -> k == replaced || k.sameBuilding(now.building));
            kept.add(now);
            while (kept.size() > BUILDINGS) kept.remove(0);
        }
    }
}
