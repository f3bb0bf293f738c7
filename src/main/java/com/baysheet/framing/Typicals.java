package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.HashMap;
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
        // members made from one calculation share its record's parts: the record is compared by value (every step
        // hashed) once for each calculation, not once for each member
        record Made(MemberRole role, RecordParts parts) {}
        Map<Made, List<DerivedMember>> made = new HashMap<>();
        for (DerivedMember m : ordered) {
            CalcRecord r = m.result().record();
            Made k = new Made(m.role(), new RecordParts(r));
            List<DerivedMember> group = made.get(k);
            if (group == null) {
                group = groups.computeIfAbsent(new Key(m.role(), r.withSubject(NEUTRAL)), x -> new ArrayList<>());
                made.put(k, group);
            }
            group.add(m);
        }
        List<TypicalGroup> out = new ArrayList<>();
        for (var e : groups.entrySet()) out.add(new TypicalGroup(e.getKey().role(), e.getValue()));
        return out;
    }
}
