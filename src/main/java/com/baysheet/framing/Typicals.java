package com.baysheet.framing;

import com.baysheet.engine.record.CalcRecord;

import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.HashSet;
import java.util.IdentityHashMap;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;

/**
 * Groups a derivation's members into typical members: one group per role and calculation, the calculation
 * compared with the member's name removed (what {@link MemberCache} already computes once). A group's members are in
 * reading order (level from the top down, then west to east, then south to north, then by id), and groups come in
 * the reading order of their first members.
 *
 * <p>A {@link Grouping} keeps what the next state of the building is grouped from ({@link #grouped(Derived, Grouping)}).
 * A derivation is made of parts (a level's framing, a column stack): a part an edit left alone is the same list in
 * the next derivation ({@link Derived#parts}), and in a part derived again each member that came out as it was is the
 * same object ({@link SameMembers}). So only the members an edit changed are placed and compared, only the groups they
 * leave or join are made again, and every other group is the very group object of the last grouping: an edit of one
 * bay in a building of seventy thousand members regroups the few groups its members belong to. The groups are
 * exactly those worked out from nothing (TypicalsProperties compares them on random edits).
 */
public final class Typicals {
    /** The subject a group's calculation is compared under. */
    static final String NEUTRAL = "typical member";

    private Typicals() {}

    /** A derivation's typical groups, and what grouping the next state of its building starts from. */
    public static final class Grouping {
        private static final Grouping NONE = new Grouping(List.of(), Map.of(), new IdentityHashMap<>(), Overlaid.empty(), List.of(), Overlaid.empty());

        private final List<TypicalGroup> groups;
        private final Map<String, Integer> levels;
        private final Map<List<DerivedMember>, Part> parts;
        private final Overlaid<Key, Group> byKey;
        private final List<Group> order;
        private final Overlaid<Made, Key> keys;

        private Grouping(List<TypicalGroup> groups, Map<String, Integer> levels, Map<List<DerivedMember>, Part> parts,
                         Overlaid<Key, Group> byKey, List<Group> order, Overlaid<Made, Key> keys) {
            this.groups = groups;
            this.levels = levels;
            this.parts = parts;
            this.byKey = byKey;
            this.order = order;
            this.keys = keys;
        }

        public List<TypicalGroup> groups() { return groups; }
    }

    public static List<TypicalGroup> of(Derived d) {
        return grouped(d, null).groups();
    }

    /**
     * The typical groups of {@code d}, worked out from {@code before}, the grouping of an earlier state of the building
     * (null: none). A group {@code d} has just as {@code before} had it, same members and calculation, is the same object.
     */
    public static Grouping grouped(Derived d, Grouping before) {
        if (before == null) before = Grouping.NONE;
        // each part's levels, then the levels' ranks (the order they first appear in): a part is placed again only
        // where the ranks moved (a level added, removed or reordered) or ids repeat (their order is the derivation's)
        Map<List<DerivedMember>, Part> parts = new IdentityHashMap<>();
        for (List<DerivedMember> p : d.parts()) {
            Part was = before.parts.get(p);
            parts.put(p, was != null ? was : new Part(p));
        }
        Map<String, Integer> levels = new HashMap<>();
        for (List<DerivedMember> p : d.parts()) for (String l : parts.get(p).levels) levels.putIfAbsent(l, levels.size());
        boolean reuse = before.levels.equals(levels) && d.idsUnique();
        if (!reuse) {
            before = Grouping.NONE;
            parts.replaceAll((p, was) -> was.places == null ? was : new Part(p));
        }
        Keys keys = new Keys(before);
        // the members of the parts dropped: one that a new part holds again (the same object, unchanged) keeps its place
        Map<DerivedMember, Place> left = new IdentityHashMap<>();
        for (var e : before.parts.entrySet())
            if (!parts.containsKey(e.getKey())) for (Place at : e.getValue().places) left.put(at.member, at);
        // what arrives or goes changes the groups of its members, and no others
        Set<Key> touched = new LinkedHashSet<>();
        Map<Key, List<Place>> arriving = new HashMap<>();
        int seq = 0;
        for (List<DerivedMember> p : d.parts()) {
            Part part = parts.get(p);
            if (part.places == null) {
                part.places = new ArrayList<>(p.size());
                for (int k = 0; k < p.size(); k++) {
                    DerivedMember m = p.get(k);
                    Place at = left.remove(m);
                    if (at == null) {
                        at = new Place(levels.get(m.level()), Math.min(m.plan().x1(), m.plan().x2()),
                                Math.min(m.plan().y1(), m.plan().y2()), m, keys.of(m), seq + k);
                        touched.add(at.key);
                        arriving.computeIfAbsent(at.key, x -> new ArrayList<>()).add(at);
                    }
                    part.places.add(at);
                }
            }
            seq += p.size();
        }
        for (Place at : left.values()) touched.add(at.key);
        return regrouped(before, levels, parts, keys, touched, arriving, left.keySet());
    }

    /** The groups: those no touched key names kept as they were, the touched ones made again from who stays and who arrives. */
    private static Grouping regrouped(Grouping before, Map<String, Integer> levels, Map<List<DerivedMember>, Part> parts, Keys keys,
                                      Set<Key> touched, Map<Key, List<Place>> arriving, Set<DerivedMember> gone) {
        // the groups kept: the last grouping's but the touched, found by their first places (the order is by them)
        Overlaid.Editor<Key, Group> byKey = before.byKey.edit();
        boolean[] drop = new boolean[before.order.size()];
        for (Key k : touched) {
            Group was = byKey.remove(k);
            if (was != null) drop[Collections.binarySearch(before.order, was, BY_FIRST)] = true;
        }
        List<Group> kept = new ArrayList<>(before.order.size());
        for (int n = 0; n < drop.length; n++) if (!drop[n]) kept.add(before.order.get(n));
        List<Group> made = new ArrayList<>();
        for (Key k : touched) {
            Group was = before.byKey.get(k);
            List<Place> stay = new ArrayList<>();
            if (was != null) for (Place at : was.places) if (!gone.contains(at.member)) stay.add(at);
            List<Place> come = arriving.getOrDefault(k, new ArrayList<>());
            come.sort(null);
            List<Place> places = merged(stay, come);
            if (places.isEmpty()) continue;
            Group g = new Group(k, places);
            made.add(g);
            byKey.put(k, g);
        }
        made.sort(BY_FIRST);
        List<Group> order = merged(kept, made, BY_FIRST);
        List<TypicalGroup> groups = new ArrayList<>(order.size());
        for (Group g : order) groups.add(g.group);
        Overlaid<Key, Group> now = byKey.done();
        return new Grouping(List.copyOf(groups), levels, parts, now, order, keys.kept(now));
    }

    private static List<Place> merged(List<Place> a, List<Place> b) {
        return merged(a, b, Place::compareTo);
    }

    /** Two lists each in order, as one in order. */
    private static <T> List<T> merged(List<T> a, List<T> b, java.util.Comparator<T> order) {
        if (b.isEmpty()) return a;
        List<T> out = new ArrayList<>(a.size() + b.size());
        int j = 0;
        for (T x : a) {
            while (j < b.size() && order.compare(b.get(j), x) < 0) out.add(b.get(j++));
            out.add(x);
        }
        while (j < b.size()) out.add(b.get(j++));
        return out;
    }

    /** A calculation as members are made from it: members made from one share its record's parts. Hashed once. */
    private static final class Made {
        final MemberRole role;
        final RecordParts parts;
        final int hash;

        Made(MemberRole role, RecordParts parts) {
            this.role = role;
            this.parts = parts;
            this.hash = role.hashCode() * 31 + parts.hashCode();
        }

        @Override
        public boolean equals(Object o) {
            return this == o || o instanceof Made m && hash == m.hash && role == m.role && parts.equals(m.parts);
        }

        @Override
        public int hashCode() { return hash; }
    }

    /** A group's identity: its role and its calculation by value, hashed once (a record hashes every step). */
    private static final class Key {
        final MemberRole role;
        final CalcRecord calculation;
        final int hash;

        Key(MemberRole role, CalcRecord calculation) {
            this.role = role;
            this.calculation = calculation;
            this.hash = role.hashCode() * 31 + calculation.hashCode();
        }

        @Override
        public boolean equals(Object o) {
            return this == o || o instanceof Key k && hash == k.hash && role == k.role && calculation.equals(k.calculation);
        }

        @Override
        public int hashCode() { return hash; }
    }

    /**
     * Each member's group key. A calculation is compared by value once: its members share its record's parts, and the
     * key a calculation had in the last grouping is kept by them. One key object stands for each group, so that
     * finding a group by its key compares no record.
     */
    private static final class Keys {
        private final Overlaid.Editor<Made, Key> made;
        private final Overlaid<Key, Group> groups;
        private final Map<Key, Key> fresh = new HashMap<>();

        Keys(Grouping before) {
            made = before.keys.edit();
            groups = before.byKey;
        }

        Key of(DerivedMember m) {
            CalcRecord r = m.result().record();
            Made k = new Made(m.role(), new RecordParts(r));
            Key key = made.get(k);
            if (key == null) {
                key = canonical(new Key(m.role(), r.withSubject(NEUTRAL)));
                made.put(k, key);
            } else key = canonical(key);
            return key;
        }

        /**
         * The one key object of the group {@code key} names: the last grouping's, else the first made in this one. A
         * calculation remembered from a group since gone (let go only when the changes are folded in) gets the current one.
         */
        private Key canonical(Key key) {
            Group g = groups.get(key);
            if (g != null) return g.key;
            Key first = fresh.putIfAbsent(key, key);
            return first != null ? first : key;
        }

        /**
         * The calculations for the next grouping. Those of groups gone are let go when the changes are folded in: each
         * holds a record, and a building entered bay by bay would otherwise keep the record of every calculation it ever had.
         */
        Overlaid<Made, Key> kept(Overlaid<Key, Group> now) {
            return made.done(k -> now.get(k) != null);
        }
    }

    /** A part's levels in the order they appear in it, and each member's place (made once the levels are ranked). */
    private static final class Part {
        final List<String> levels;
        List<Place> places;

        Part(List<DerivedMember> members) {
            Set<String> in = new LinkedHashSet<>();
            for (DerivedMember m : members) in.add(m.level());
            levels = List.copyOf(in);
        }
    }

    /** Groups in the reading order of their first members (no two groups share one). */
    private static final java.util.Comparator<Group> BY_FIRST = (a, b) -> a.first.compareTo(b.first);

    /** One typical group, with its members' places in reading order. */
    private static final class Group {
        final Key key;
        final List<Place> places;
        final Place first;
        final TypicalGroup group;

        Group(Key key, List<Place> places) {
            this.key = key;
            this.places = places;
            this.first = places.get(0);
            List<DerivedMember> members = new ArrayList<>(places.size());
            for (Place p : places) members.add(p.member);
            group = new TypicalGroup(key.role, members);
        }
    }

    /**
     * A member's place in reading order and its group's key. {@code seq}, its place in the derivation, breaks a tie
     * only where ids repeat (then the derivation's order stands, as a stable sort keeps it).
     */
    private record Place(int level, double x, double y, DerivedMember member, Key key, int seq) implements Comparable<Place> {
        @Override
        public int compareTo(Place o) {
            int c = Integer.compare(level, o.level);
            if (c == 0) c = Double.compare(x, o.x);
            if (c == 0) c = Double.compare(y, o.y);
            if (c == 0) c = member.id().compareTo(o.member.id());
            return c != 0 ? c : Integer.compare(seq, o.seq);
        }
    }
}
