package com.baysheet.framing;

import com.baysheet.framing.model.Building;

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
    private final List<TakeDown> takeDowns;
    private final Map<String, DerivedMember> memberById;
    private final Map<String, TakeDown> takeDownById;

    public Derived(Building building, List<DerivedMember> members, List<TakeDown> takeDowns) {
        this.building = building;
        this.members = List.copyOf(members);
        this.takeDowns = List.copyOf(takeDowns);
        // sized once: a large building has a few hundred thousand members
        memberById = new HashMap<>(this.members.size() * 4 / 3 + 1);
        takeDownById = new HashMap<>(this.takeDowns.size() * 4 / 3 + 1);
        for (DerivedMember m : this.members) memberById.putIfAbsent(m.id(), m);
        for (TakeDown t : this.takeDowns) takeDownById.putIfAbsent(t.id(), t);
    }

    public Building building() { return building; }

    public List<DerivedMember> members() { return members; }

    public List<TakeDown> takeDowns() { return takeDowns; }

    public Optional<DerivedMember> member(String id) { return Optional.ofNullable(memberById.get(id)); }

    public Optional<TakeDown> takeDown(String id) { return Optional.ofNullable(takeDownById.get(id)); }

    public List<DerivedMember> onLevel(String level) {
        return members.stream().filter(m -> m.level().equals(level)).toList();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Derived d && d.building.equals(building) && d.members.equals(members) && d.takeDowns.equals(takeDowns);
    }

    @Override
    public int hashCode() { return Objects.hash(building, members, takeDowns); }
}
