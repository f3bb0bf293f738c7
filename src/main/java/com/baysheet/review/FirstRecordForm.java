package com.baysheet.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Clause;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.Note;
import com.baysheet.engine.record.Sketch;
import com.baysheet.engine.record.Step;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.Unit;
import com.baysheet.engine.units.UnitSystem;

import java.util.List;

/**
 * The record as it was first written, before each number named its base unit: one {@code unit} field that held
 * the unit of the shown text, beside a value in the base unit. Revisions stored then carry that JSON and a
 * fingerprint of it. Two things keep them valid: the fingerprint is still taken over this form (it drops only
 * the base-unit symbol, which the record's unit system and the shown unit fix, so two records with one
 * fingerprint still print the same sheet), and a stored record in this form is read back into today's.
 */
final class FirstRecordForm {
    private FirstRecordForm() {}

    record FirstEntry(String key, String label, double value, String unit, String shown) {}

    record FirstStep(String symbol, String description, String formula, String substituted,
                     double result, String unit, String shown, Clause clause) {}

    record FirstRecord(String subject, String edition, String units, List<FirstEntry> inputs, List<FirstStep> steps,
                       List<FirstEntry> results, List<String> governing, List<Note> notes, Sketch sketch) {}

    /** What the fingerprint is taken over: the record with the shown unit in {@code unit}. */
    static FirstRecord of(CalcRecord r) {
        return new FirstRecord(r.subject(), r.edition(), r.units(), entries(r.inputs()),
                r.steps().stream().map(s -> new FirstStep(s.symbol(), s.description(), s.formula(), s.substituted(),
                        s.result(), s.shownUnit(), s.shown(), s.clause())).toList(),
                entries(r.results()), r.governing(), r.notes(), r.sketch());
    }

    /** Whether a record read from storage is in the first form (no entry or step names its shown unit). */
    static boolean isFirstForm(CalcRecord r) {
        return r.inputs().stream().anyMatch(e -> e.shownUnit() == null) || r.results().stream().anyMatch(e -> e.shownUnit() == null)
                || r.steps().stream().anyMatch(s -> s.shownUnit() == null);
    }

    /** A record read in the first form, in today's: the old unit becomes the shown unit, its base unit the unit. */
    static CalcRecord upgrade(CalcRecord r) {
        UnitSystem system = system(r.units());
        return new CalcRecord(r.subject(), r.edition(), r.units(), upgrade(r.inputs(), system),
                r.steps().stream().map(s -> s.shownUnit() != null ? s : new Step(s.symbol(), s.description(), s.formula(),
                        s.substituted(), s.result(), base(s.unit(), system), s.shown(), s.unit(), s.clause())).toList(),
                upgrade(r.results(), system), r.governing(), r.notes(), r.sketch());
    }

    private static List<FirstEntry> entries(List<Entry> es) {
        return es.stream().map(e -> new FirstEntry(e.key(), e.label(), e.value(), e.shownUnit(), e.shown())).toList();
    }

    private static List<Entry> upgrade(List<Entry> es, UnitSystem system) {
        return es.stream().map(e -> e.shownUnit() != null ? e
                : new Entry(e.key(), e.label(), e.value(), base(e.unit(), system), e.shown(), e.unit())).toList();
    }

    /** The base unit of a shown unit; a symbol no quantity is shown in is kept as it was. */
    private static String base(String shownUnit, UnitSystem system) {
        Unit b = system == null ? null : Quantity.baseOfShown(shownUnit, system);
        return b == null ? shownUnit : b.symbol();
    }

    private static UnitSystem system(String units) {
        for (UnitSystem s : UnitSystem.values()) if (s.name().equals(units)) return s;
        return null;
    }
}
