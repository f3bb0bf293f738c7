package com.baysheet.framing;

import java.util.Collections;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A derivation's members by id. A derivation made again from an earlier one of the building ({@link Rederivation})
 * keeps most of its parts, so its index is the earlier index with the members of the parts it made laid over it (and
 * those of the parts it dropped marked gone): a one-bay edit indexes a few thousand members, not seventy thousand.
 * Made whole again every few layers, and wherever an id repeats (the first member with an id is the one found).
 */
final class MemberIndex {
    private static final int LAYERS = 4;
    /** An id whose member was in a part the later derivation dropped. */
    private static final Object GONE = new Object();

    private final Map<String, Object> byId;
    private final MemberIndex under;
    private final int depth;
    private final boolean unique;

    private MemberIndex(Map<String, Object> byId, MemberIndex under, boolean unique) {
        this.byId = byId;
        this.under = under;
        this.depth = under == null ? 0 : under.depth + 1;
        this.unique = unique;
    }

    static MemberIndex of(List<DerivedMember> members) {
        // sized once: a large building has a few hundred thousand members
        Map<String, Object> byId = new HashMap<>(members.size() * 4 / 3 + 1);
        for (DerivedMember m : members) byId.putIfAbsent(m.id(), m);
        return new MemberIndex(byId, null, byId.size() == members.size());
    }

    /** The index of {@code all}, made of {@code parts}, over {@code before}'s (the index of the earlier derivation's {@code was}). */
    static MemberIndex after(MemberIndex before, List<List<DerivedMember>> was, List<List<DerivedMember>> parts, List<DerivedMember> all) {
        if (before.depth >= LAYERS || !before.unique) return of(all);
        Set<List<DerivedMember>> now = Collections.newSetFromMap(new IdentityHashMap<>()), then = Collections.newSetFromMap(new IdentityHashMap<>());
        now.addAll(parts);
        then.addAll(was);
        Map<String, Object> changed = new HashMap<>();
        for (List<DerivedMember> p : was) if (!now.contains(p)) for (DerivedMember m : p) changed.put(m.id(), GONE);
        for (List<DerivedMember> p : parts)
            if (!then.contains(p))
                for (DerivedMember m : p) {
                    Object prev = changed.put(m.id(), m);
                    // the id is another member's of this derivation: one made here, or one of a part kept
                    if (prev instanceof DerivedMember || prev == null && before.get(m.id()) != null) return of(all);
                }
        return new MemberIndex(changed, before, true);
    }

    DerivedMember get(String id) {
        for (MemberIndex at = this; at != null; at = at.under) {
            Object m = at.byId.get(id);
            if (m == GONE) return null;
            if (m != null) return (DerivedMember) m;
        }
        return null;
    }

    /** Whether no two members share an id. */
    boolean unique() { return unique; }
}
