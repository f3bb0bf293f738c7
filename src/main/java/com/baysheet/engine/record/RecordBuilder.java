package com.baysheet.engine.record;

import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;

/** Collects the steps of a calculation as it runs; the engine's only way of explaining itself. */
public final class RecordBuilder {
    private final String subject;
    private final String edition;
    private final UnitSystem system;
    private final List<Entry> inputs = new ArrayList<>();
    private final List<Step> steps = new ArrayList<>();
    private final List<Entry> results = new ArrayList<>();
    private final List<String> governing = new ArrayList<>();
    private final List<Note> notes = new ArrayList<>();
    private Sketch sketch = Sketch.NONE;

    public RecordBuilder(String subject, String edition, UnitSystem system) {
        this.subject = subject;
        this.edition = edition;
        this.system = system;
    }

    public UnitSystem system() { return system; }

    /** Shows a base-unit value in its sheet unit, three significant figures. */
    public String show(double base, Quantity q) { return Display.of(base, q, system); }

    /** The number alone in the sheet unit, for substituted values. */
    public String num(double base, Quantity q) { return Display.sig3(q.unit(system).fromBase(base)); }

    public RecordBuilder input(String key, String label, double base, Quantity q) {
        inputs.add(new Entry(key, label, base, q.unit(system).symbol(), show(base, q)));
        return this;
    }

    public RecordBuilder inputText(String key, String label, String text) {
        inputs.add(new Entry(key, label, Double.NaN, "", text));
        return this;
    }

    public double step(String symbol, String description, String formula, String substituted,
                       double base, Quantity q, Clause clause) {
        steps.add(new Step(symbol, description, formula, substituted, base, q.unit(system).symbol(), show(base, q), clause));
        return base;
    }

    public RecordBuilder result(String key, String label, double base, Quantity q) {
        results.add(new Entry(key, label, base, q.unit(system).symbol(), show(base, q)));
        return this;
    }

    public RecordBuilder resultText(String key, String label, String text) {
        results.add(new Entry(key, label, Double.NaN, "", text));
        return this;
    }

    public RecordBuilder governs(String key) {
        governing.add(key);
        return this;
    }

    public RecordBuilder info(String text, Clause clause) {
        notes.add(new Note(Note.Level.INFO, text, clause));
        return this;
    }

    public RecordBuilder caution(String text, Clause clause) {
        notes.add(new Note(Note.Level.CAUTION, text, clause));
        return this;
    }

    public RecordBuilder sketch(Sketch s) {
        this.sketch = s;
        return this;
    }

    public CalcRecord build() {
        return new CalcRecord(subject, edition, system.name(), inputs, steps, results, governing, notes, sketch);
    }
}
