package com.baysheet.framing;

import java.util.Collections;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * A derivation's members by id. A derivation made again from an earlier one of the building ({@link Rederivation})
 * keeps most of its parts, so its index is the earlier one's whole table with the members of the parts made since laid
 * over it (and those of the parts dropped since marked gone): a one-bay edit indexes a few thousand members, not
 * seventy thousand. One layer at most, so that a member replaced is held once, not once a write: the layer carries
 * what the layer before it held, and the table is made whole again once the layer has grown to a quarter of it, or
 * wherever an id repeats (the first member with an id is the one found).
 */
final class MemberIndex {
    /** An id whose member was in a part the later derivation dropped. */
    private static final Object GONE = new Object();

    /** The whole table ({@code layer} null), or the one it lies over. */
    private final Map<String, Object> table;
    private final Map<String, Object> layer;
    private final boolean unique;

    private MemberIndex(Map<String, Object> table, Map<String, Object> layer, boolean unique) {
        this.table = table;
        this.layer = layer;
        this.unique = unique;
    }

    static MemberIndex of(List<DerivedMember> members) {
        // sized once: a large building has a few hundred thousand members
        Map<String, Object> byId = new HashMap<>(members.size() * 4 / 3 + 1);
        for (DerivedMember m : members) byId.putIfAbsent(m.id(), m);
        return new MemberIndex(byId, null, byId.size() == members.size());
    }

    /** The index of {@code all}, made of {@code parts}, from {@code before} (the index of the earlier derivation's {@code was}). */
    static MemberIndex after(MemberIndex before, List<List<DerivedMember>> was, List<List<DerivedMember>> parts, List<DerivedMember> all) {
        if (!before.unique) return of(all);
        Set<List<DerivedMember>> now = Collections.newSetFromMap(new IdentityHashMap<>()), then = Collections.newSetFromMap(new IdentityHashMap<>());
        now.addAll(parts);
        then.addAll(was);
        Map<String, Object> changed = before.layer == null ? new HashMap<>() : new HashMap<>(before.layer);
        Map<String, Object> fresh = new HashMap<>();
        for (List<DerivedMember> p : was) if (!now.contains(p)) for (DerivedMember m : p) changed.put(m.id(), GONE);
        for (List<DerivedMember> p : parts)
            if (!then.contains(p))
                for (DerivedMember m : p) {
                    // the id is another member's of this derivation: one made here, or one of a part kept
                    if (fresh.put(m.id(), m) != null || !(changed.get(m.id()) == GONE) && before.get(m.id()) != null) return of(all);
                    changed.put(m.id(), m);
                }
        if (changed.size() > before.table.size() / 4) return of(all);
        return new MemberIndex(before.table, changed, true);
    }

    DerivedMember get(String id) {
        Object m = layer == null ? null : layer.get(id);
        if (m == null) m = table.get(id);
        return m == GONE ? null : (DerivedMember) m;
    }

    /** Whether no two members share an id. */
    boolean unique() { return unique; }
}
