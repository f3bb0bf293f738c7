package com.baysheet.framing;

import java.util.HashMap;
import java.util.Map;
import java.util.function.Predicate;

/**
 * A map read as an earlier map with a few changes laid over it, so that the next state of a large map after a small
 * edit costs the edit, not a copy: the earlier map is shared, never changed, and the changes are copied on. Once the
 * changes reach a quarter of the map they are folded into a new one (with what {@code keep} refuses dropped then).
 * Keys compare by {@code equals}, as in a {@link HashMap}; no value is null.
 */
final class Overlaid<K, V> {
    /** Marks a key removed in the changes. */
    private static final Object GONE = new Object();

    private final Map<K, V> base;
    private final Map<K, Object> top;

    private Overlaid(Map<K, V> base, Map<K, Object> top) {
        this.base = base;
        this.top = top;
    }

    static <K, V> Overlaid<K, V> empty() { return new Overlaid<>(Map.of(), Map.of()); }

    V get(K key) { return read(top, base, key); }

    /** {@code key}'s value in {@code top} over {@code base}. */
    @SuppressWarnings("unchecked")
    private static <K, V> V read(Map<K, Object> top, Map<K, V> base, K key) {
        Object v = top.get(key);
        if (v == null) return base.get(key);
        return v == GONE ? null : (V) v;
    }

    /** How many entries the changes hold (removals too): what folding them in weighs against. */
    int changes() { return top.size(); }

    /** An editor of the next state, this one left as it is. */
    Editor<K, V> edit() { return new Editor<>(this); }

    /** The next state of an {@link Overlaid}, built by a few puts and removals. */
    static final class Editor<K, V> {
        private final Overlaid<K, V> from;
        private final Map<K, Object> top;

        private Editor(Overlaid<K, V> from) {
            this.from = from;
            this.top = new HashMap<>(from.top);
        }

        V get(K key) { return read(top, from.base, key); }

        void put(K key, V value) {
            if (value == null) throw new IllegalArgumentException("no value is null");
            top.put(key, value);
        }

        /** Removes {@code key}; its value, or null where it had none. */
        V remove(K key) {
            V was = get(key);
            if (was == null) return null;
            if (from.base.containsKey(key)) top.put(key, GONE);
            else top.remove(key);
            return was;
        }

        /** The new state; where the changes reach a quarter of the map, folded in with the entries {@code keep} refuses dropped. */
        Overlaid<K, V> done(Predicate<V> keep) {
            if (top.size() * 4L < from.base.size()) return new Overlaid<>(from.base, top);
            Map<K, V> all = new HashMap<>(from.base);
            for (Map.Entry<K, Object> e : top.entrySet()) {
                if (e.getValue() == GONE) all.remove(e.getKey());
                else {
                    @SuppressWarnings("unchecked") V v = (V) e.getValue();
                    all.put(e.getKey(), v);
                }
            }
            all.values().removeIf(keep.negate());
            return new Overlaid<>(all, Map.of());
        }

        Overlaid<K, V> done() { return done(v -> true); }
    }
}
