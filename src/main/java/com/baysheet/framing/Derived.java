package com.baysheet.framing;

import com.baysheet.framing.model.Building;

import java.util.ArrayList;
import java.util.HashMap;
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
        return byLevel.computeIfAbsent(level, l -> members.stream().filter(m -> m.level().equals(l)).toList());
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Derived d && d.building.equals(building) && d.members.equals(members) && d.takeDowns.equals(takeDowns);
    }

    @Override
    public int hashCode() { return Objects.hash(building, members, takeDowns); }
}
