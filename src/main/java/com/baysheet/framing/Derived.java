package com.baysheet.framing;

import com.baysheet.framing.model.Building;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything derived from a building: its members level by level and its column take-downs. Members and
 * take-downs are indexed by id once, since pages, sheets and packages look them up one by one.
 */
public final class Derived {
    private final Building building;
    private final List<DerivedMember> members;
    private final List<List<DerivedMember>> parts;
    private final List<TakeDown> takeDowns;
    private final MemberIndex memberById;
    private final Map<String, TakeDown> takeDownById;
    /** Each level's members in derivation order, each level's made on first asking (a member page draws its level's plan). */
    private final Map<String, List<DerivedMember>> byLevel = new java.util.concurrent.ConcurrentHashMap<>();
    /**
     * Each part's members by level, made on first asking: a level's members are gathered part by part, and a part
     * this derivation kept from the one before it (the same list) is not read again. Built whole, then published.
     */
    private volatile Map<List<DerivedMember>, Map<String, List<DerivedMember>>> partLevels;
    /** The earlier derivation's {@link #partLevels} for the parts this one kept, where it had them (else null). */
    private final Map<List<DerivedMember>, Map<String, List<DerivedMember>>> keptPartLevels;

    public Derived(Building building, List<DerivedMember> members, List<TakeDown> takeDowns) {
        this(building, List.copyOf(members), takeDowns, null, null);
    }

    private Derived(Building building, List<DerivedMember> members, List<TakeDown> takeDowns, List<List<DerivedMember>> parts, Derived before) {
        this.building = building;
        this.members = members;
        this.parts = parts != null ? parts : members.isEmpty() ? List.of() : List.of(members);
        this.takeDowns = List.copyOf(takeDowns);
        memberById = before == null ? MemberIndex.of(members) : MemberIndex.after(before.memberById, before.parts, this.parts, members);
        takeDownById = new HashMap<>(this.takeDowns.size() * 4 / 3 + 1);
        for (TakeDown t : this.takeDowns) takeDownById.putIfAbsent(t.id(), t);
        keptPartLevels = before == null ? null : kept(before.partLevels, this.parts);
    }

    /** Of {@code earlier}'s entries, those for {@code parts} (none of the parts this derivation dropped are held on to). */
    private static Map<List<DerivedMember>, Map<String, List<DerivedMember>>> kept(
            Map<List<DerivedMember>, Map<String, List<DerivedMember>>> earlier, List<List<DerivedMember>> parts) {
        if (earlier == null) return null;
        Map<List<DerivedMember>, Map<String, List<DerivedMember>>> kept = new IdentityHashMap<>(parts.size() * 2);
        for (List<DerivedMember> p : parts) {
            Map<String, List<DerivedMember>> l = earlier.get(p);
            if (l != null) kept.put(p, l);
        }
        return kept;
    }

    /**
     * A derivation made of parts (a level's framing, a column stack), their members in this order: a part another
     * derivation of the building reused is the same list object in both, so what is worked out from a part can be kept by it.
     * {@code before}, where given, is the earlier derivation of the building these parts were made from (its index is reused).
     */
    static Derived ofParts(Building building, List<List<DerivedMember>> parts, List<TakeDown> takeDowns, Derived before) {
        List<DerivedMember> all = new ArrayList<>();
        for (List<DerivedMember> p : parts) all.addAll(p);
        return new Derived(building, List.copyOf(all), takeDowns, List.copyOf(parts), before);
    }

    public Building building() { return building; }

    /** The members by the parts they were derived in (one part for a derivation not made of parts), in the order of {@link #members}. */
    public List<List<DerivedMember>> parts() { return parts; }

    public List<DerivedMember> members() { return members; }

    public List<TakeDown> takeDowns() { return takeDowns; }

    public Optional<DerivedMember> member(String id) { return Optional.ofNullable(memberById.get(id)); }

    public Optional<TakeDown> takeDown(String id) { return Optional.ofNullable(takeDownById.get(id)); }

    /** Whether no two members share an id (the framing's ids are unique; a hand-built derivation may repeat one). */
    public boolean idsUnique() { return memberById.unique(); }

    public List<DerivedMember> onLevel(String level) {
        return byLevel.computeIfAbsent(level, l -> {
            Map<List<DerivedMember>, Map<String, List<DerivedMember>>> byPart = partLevels();
            List<DerivedMember> on = new ArrayList<>();
            for (List<DerivedMember> p : parts) on.addAll(byPart.get(p).getOrDefault(l, List.of()));
            return List.copyOf(on);
        });
    }

    private Map<List<DerivedMember>, Map<String, List<DerivedMember>>> partLevels() {
        Map<List<DerivedMember>, Map<String, List<DerivedMember>>> m = partLevels;
        if (m != null) return m;
        m = new IdentityHashMap<>(parts.size() * 2);
        for (List<DerivedMember> p : parts) {
            Map<String, List<DerivedMember>> l = keptPartLevels == null ? null : keptPartLevels.get(p);
            m.put(p, l != null ? l : byLevel(p));
        }
        partLevels = m;
        return m;
    }

    /** A part's members by level, each level's in the part's order. */
    private static Map<String, List<DerivedMember>> byLevel(List<DerivedMember> part) {
        Map<String, List<DerivedMember>> by = new HashMap<>();
        for (DerivedMember x : part) by.computeIfAbsent(x.level(), k -> new ArrayList<>()).add(x);
        by.replaceAll((k, v) -> List.copyOf(v));
        return by;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Derived d && d.building.equals(building) && d.members.equals(members) && d.takeDowns.equals(takeDowns);
    }

    @Override
    public int hashCode() { return Objects.hash(building, members, takeDowns); }
}
