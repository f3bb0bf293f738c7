package com.baysheet.engine.record;

import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/**
 * Collects the steps of a calculation as it runs; the engine's only way of explaining itself.
 * A builder made {@link #numbersOnly} keeps every number but writes no shown text, for callers (the framing
 * model) that need the values of thousands of members and the text of the few someone reads: it keeps the results
 * (key, value, label) and the steps (symbol, value) as arrays ({@link #numbers}); inputs, notes and the sketch are
 * for reading and are not kept.
 */
public final class RecordBuilder {
    private final String subject;
    private final String edition;
    private final UnitSystem system;
    // sized for a beam's record (about 15 inputs, 35 steps, 35 results) so that they are not grown step by step;
    // a numbers-only builder adds to none of them
    private final List<Entry> inputs;
    private final List<Step> steps;
    private final List<Entry> results;
    private final List<String> governing;
    private final List<Note> notes;
    private Sketch sketch = Sketch.NONE;
    private final boolean text;
    /** The numbers-only pass's store; null when writing text. */
    private final RecordNumbers numbers;
    /** The shown numbers written so far; null in a numbers-only pass. */
    private final ShownNumbers shownNumbers;

    public RecordBuilder(String subject, String edition, UnitSystem system) {
        this(subject, edition, system, true);
    }

    private RecordBuilder(String subject, String edition, UnitSystem system, boolean text) {
        this.subject = subject;
        this.edition = edition;
        this.system = system;
        this.text = text;
        this.numbers = text ? null : new RecordNumbers();
        this.shownNumbers = text ? new ShownNumbers(system) : null;
        this.inputs = text ? new ArrayList<>(24) : List.of();
        this.steps = text ? new ArrayList<>(64) : List.of();
        this.results = text ? new ArrayList<>(64) : List.of();
        this.governing = text ? new ArrayList<>(8) : List.of();
        this.notes = text ? new ArrayList<>(8) : List.of();
    }

    /** A builder whose shown strings are left empty: same steps, same numbers. */
    public static RecordBuilder numbersOnly(String subject, String edition, UnitSystem system) {
        return new RecordBuilder(subject, edition, system, false);
    }

    public UnitSystem system() { return system; }

    /** Shows a base-unit value in its sheet unit, three significant figures. */
    public String show(double base, Quantity q) { return text ? shownNumbers.of(base, q) : ""; }

    /** Whether this builder writes shown text (false for a numbers-only pass). */
    public boolean writesText() { return text; }

    /** A ratio or factor to three significant figures, or "" in a numbers-only pass. */
    public String fmt(double v) { return text ? shownNumbers.sig3(v) : ""; }

    /** An equation constant as printed (15, 4.57), or "" in a numbers-only pass. */
    public String plain(double v) { return text ? Display.plain(v) : ""; }

    /** The number alone in the sheet unit, for substituted values. */
    public String num(double base, Quantity q) { return text ? shownNumbers.sig3(q.unit(system).fromBase(base)) : ""; }

    public RecordBuilder input(String key, String label, double base, Quantity q) {
        if (text) inputs.add(entry(key, label, base, q));
        return this;
    }

    public RecordBuilder inputText(String key, String label, String text) {
        if (this.text) inputs.add(Entry.unitless(key, label, Double.NaN, text));
        return this;
    }

    public double step(String symbol, String description, String formula, String substituted,
                       double base, Quantity q, Clause clause) {
        if (!text) {
            numbers.step(symbol, base);
            return base;
        }
        steps.add(new Step(symbol, description, formula, substituted, base, q.base(system).symbol(), show(base, q),
                q.unit(system).symbol(), clause));
        return base;
    }

    public RecordBuilder result(String key, String label, double base, Quantity q) {
        if (!text) numbers.result(key, label, base);
        else results.add(entry(key, label, base, q));
        return this;
    }

    public RecordBuilder result(ResultKey key, String label, double base, Quantity q) {
        return result(key.text(), label, base, q);
    }

    public RecordBuilder resultText(ResultKey key, String label, String text) {
        return resultText(key.text(), label, text);
    }

    public RecordBuilder resultText(String key, String label, String text) {
        if (!this.text) numbers.result(key, label, Double.NaN);
        else results.add(Entry.unitless(key, label, Double.NaN, text));
        return this;
    }

    /** The value stays in the base unit and says so; only the shown text is in the sheet unit. */
    private Entry entry(String key, String label, double base, Quantity q) {
        return new Entry(key, label, base, q.base(system).symbol(), show(base, q), q.unit(system).symbol());
    }

    public RecordBuilder governs(ResultKey key) {
        return governs(key.text());
    }

    public RecordBuilder governs(String key) {
        if (text) governing.add(key);
        return this;
    }

    public RecordBuilder info(String text, Clause clause) {
        if (this.text) notes.add(new Note(Note.Level.INFO, text, clause));
        return this;
    }

    public RecordBuilder caution(String text, Clause clause) {
        if (this.text) notes.add(new Note(Note.Level.CAUTION, text, clause));
        return this;
    }

    public RecordBuilder sketch(Sketch s) {
        this.sketch = s;
        return this;
    }

    /** The numbers of a numbers-only pass (results and steps); only for a builder made {@link #numbersOnly}. */
    public RecordNumbers numbers() {
        if (numbers == null) throw new IllegalStateException("a builder that writes text builds a record: use build()");
        return numbers;
    }

    /** The record written; a numbers-only builder's record has no inputs, notes or sketch and empty shown text. */
    public CalcRecord build() {
        if (!text) throw new IllegalStateException("a numbers-only builder keeps its numbers: use numbers()");
        return new CalcRecord(subject, edition, system.name(), inputs, steps, results, governing, notes, sketch);
    }
}
