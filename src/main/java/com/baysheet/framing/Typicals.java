package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Groups a derivation's members into typical members: one group per role and calculation, the calculation
 * compared with the member's name removed (what {@link MemberCache} already computes once). Groups come in
 * reading order: by their first location, level from the top down, then west to east, then south to north.
 */
public final class Typicals {
    /** The subject a group's calculation is compared under. */
    static final String NEUTRAL = "typical member";

    private Typicals() {}

    public static List<TypicalGroup> of(Derived d) {
        List<String> levels = d.members().stream().map(DerivedMember::level).distinct().toList();
        Comparator<DerivedMember> reading = Comparator.comparingInt((DerivedMember m) -> levels.indexOf(m.level()))
                .thenComparingDouble(m -> Math.min(m.plan().x1(), m.plan().x2()))
                .thenComparingDouble(m -> Math.min(m.plan().y1(), m.plan().y2()))
                .thenComparing(DerivedMember::id);
        List<DerivedMember> ordered = new ArrayList<>(d.members());
        ordered.sort(reading);
        record Key(MemberRole role, CalcRecord calculation) {}
        Map<Key, List<DerivedMember>> groups = new LinkedHashMap<>();
        for (DerivedMember m : ordered)
            groups.computeIfAbsent(new Key(m.role(), m.result().record().withSubject(NEUTRAL)), k -> new ArrayList<>()).add(m);
        List<TypicalGroup> out = new ArrayList<>();
        for (var e : groups.entrySet()) out.add(new TypicalGroup(e.getKey().role(), e.getValue()));
        return out;
    }
}
