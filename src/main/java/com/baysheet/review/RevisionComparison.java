package com.baysheet.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Pattern;

/**
 * What changed between two revisions of a sheet: the inputs and the results whose value or unit differ,
 * and those present in only one, side by side in the order of the later record (then the earlier one's
 * leftovers). Values are compared at full precision; the shown text is what the page prints. An earlier
 * revision's reactions keyed R1, R2 compare with today's RA, RB (renamed so as not to read as the roof factors).
 */
public record RevisionComparison(List<Change> inputs, List<Change> results, int unchangedInputs, int unchangedResults) {
    public enum Kind { CHANGED, ADDED, REMOVED }

    /** One entry side by side; {@code before} or {@code after} is blank where the entry is absent. */
    public record Change(String key, String label, String before, String after, Kind kind) {}

    public RevisionComparison {
        inputs = List.copyOf(inputs);
        results = List.copyOf(results);
    }

    public static RevisionComparison of(CalcRecord before, CalcRecord after) {
        List<Change> in = diff(before.inputs(), after.inputs());
        List<Change> out = diff(current(before.results()), current(after.results()));
        return new RevisionComparison(in, out, unchanged(after.inputs(), in), unchanged(after.results(), out));
    }

    /** Reaction keys of records written before the reactions became R_A, R_B ("D.R1" reads as "D.RA"). */
    static String currentKey(String key) {
        if (!LEGACY_REACTION.matcher(key).matches()) return key;
        return key.substring(0, key.length() - 1) + (key.endsWith("1") ? "A" : "B");
    }

    private static final Pattern LEGACY_REACTION = Pattern.compile("[A-Za-z0-9]+\\.R[12]");

    private static List<Entry> current(List<Entry> results) {
        List<Entry> out = new ArrayList<>(results.size());
        for (Entry e : results) {
            String k = currentKey(e.key());
            out.add(k.equals(e.key()) ? e : new Entry(k, e.label(), e.value(), e.unit(), e.shown(), e.shownUnit()));
        }
        return out;
    }

    public boolean same() { return inputs.isEmpty() && results.isEmpty(); }

    private static List<Change> diff(List<Entry> before, List<Entry> after) {
        Map<String, Entry> old = new LinkedHashMap<>();
        for (Entry e : before) old.put(e.key(), e);
        List<Change> changes = new ArrayList<>();
        for (Entry now : after) {
            Entry was = old.remove(now.key());
            if (was == null) changes.add(new Change(now.key(), now.label(), "", shown(now), Kind.ADDED));
            else if (differs(was, now)) changes.add(new Change(now.key(), now.label(), shown(was), shown(now), Kind.CHANGED));
        }
        for (Entry gone : old.values()) changes.add(new Change(gone.key(), gone.label(), shown(gone), "", Kind.REMOVED));
        return changes;
    }

    private static boolean differs(Entry a, Entry b) {
        return Double.compare(a.value(), b.value()) != 0 || !a.unit().equals(b.unit()) || !a.shown().equals(b.shown())
                || !a.shownUnit().equals(b.shownUnit());
    }

    private static String shown(Entry e) {
        return e.shownUnit().isBlank() || e.shown().endsWith(e.shownUnit()) ? e.shown() : e.shown() + " " + e.shownUnit();
    }

    private static int unchanged(List<Entry> after, List<Change> changes) {
        long touched = changes.stream().filter(c -> c.kind() != Kind.REMOVED).count();
        return after.size() - (int) touched;
    }
}
