package com.baysheet.engine.record;

import java.util.List;

/**
 * The calculation record: the single source of truth that pages, PDF sheets and the API render.
 * Inputs, ordered steps, results (the keys of the governing ones in {@code governing}), notes, and the
 * sketch a load diagram is drawn from.
 */
public record CalcRecord(String subject, String edition, String units, List<Entry> inputs,
                         List<Step> steps, List<Entry> results, List<String> governing, List<Note> notes,
                         Sketch sketch) {
    public CalcRecord {
        inputs = List.copyOf(inputs);
        steps = List.copyOf(steps);
        results = List.copyOf(results);
        governing = List.copyOf(governing);
        notes = List.copyOf(notes);
        if (sketch == null) sketch = Sketch.NONE;
    }

    /** The same record under another subject (the framing model reuses one calculation for identical members). */
    public CalcRecord withSubject(String s) {
        return s.equals(subject) ? this : new CalcRecord(s, edition, units, inputs, steps, results, governing, notes, sketch);
    }

    /** A result by key, or NaN when absent. */
    public double result(String key) {
        for (Entry e : results) if (e.key().equals(key)) return e.value();
        return Double.NaN;
    }

    public double result(ResultKey key) { return result(key.text()); }

    public Entry entry(ResultKey key) { return entry(key.text()); }

    public Entry entry(String key) {
        for (Entry e : results) if (e.key().equals(key)) return e;
        throw new IllegalArgumentException("no result " + key + " on " + subject);
    }

    public Step step(String symbol) {
        for (Step s : steps) if (s.symbol().equals(symbol)) return s;
        throw new IllegalArgumentException("no step " + symbol + " on " + subject);
    }
}
