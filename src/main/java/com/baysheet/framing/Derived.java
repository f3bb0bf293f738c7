package com.baysheet.framing;

import com.baysheet.framing.model.Building;

import java.util.List;
import java.util.Optional;

/** Everything derived from a building: its members level by level and its column take-downs. */
public record Derived(Building building, List<DerivedMember> members, List<TakeDown> takeDowns) {
    public Derived {
        members = List.copyOf(members);
        takeDowns = List.copyOf(takeDowns);
    }

    public Optional<DerivedMember> member(String id) {
        return members.stream().filter(m -> m.id().equals(id)).findFirst();
    }

    public Optional<TakeDown> takeDown(String id) {
        return takeDowns.stream().filter(t -> t.id().equals(id)).findFirst();
    }

    public List<DerivedMember> onLevel(String level) {
        return members.stream().filter(m -> m.level().equals(level)).toList();
    }
}
