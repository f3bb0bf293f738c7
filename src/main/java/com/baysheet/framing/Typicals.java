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
        // each member's place in reading order worked out once, not in every comparison of the sort (a level's rank
        // was looked up in the list of levels twice a comparison: about a million comparisons for a tall building)
        Map<String, Integer> levels = new HashMap<>();
        record Place(int level, double x, double y, DerivedMember member) {}
        List<Place> places = new ArrayList<>(d.members().size());
        for (DerivedMember m : d.members()) {
            int level = levels.computeIfAbsent(m.level(), l -> levels.size());
            places.add(new Place(level, Math.min(m.plan().x1(), m.plan().x2()), Math.min(m.plan().y1(), m.plan().y2()), m));
        }
        places.sort(Comparator.comparingInt(Place::level).thenComparingDouble(Place::x).thenComparingDouble(Place::y)
                .thenComparing(p -> p.member().id()));
        List<DerivedMember> ordered = new ArrayList<>(places.size());
        for (Place p : places) ordered.add(p.member());
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
