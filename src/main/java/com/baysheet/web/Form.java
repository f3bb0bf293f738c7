package com.baysheet.web;

import com.baysheet.engine.InputError;
import com.baysheet.store.Duplicate;
import com.baysheet.engine.units.Unit;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.store.StaleVersion;
import com.baysheet.web.entry.EntryRefused;
import com.baysheet.web.entry.LengthField;
import com.baysheet.web.entry.LengthList;
import com.baysheet.web.entry.Lengths;
import com.baysheet.web.entry.Shown;
import com.baysheet.web.entry.Slopes;
import io.javalin.http.Context;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.function.Supplier;

/**
 * A submitted form: the user's input as typed (to show it again), and errors by field. Numbers are read
 * here, once, with a message that names the value; the domain's own refusals ({@link InputError}) and a
 * stale version land beside the field they name, or at the top of the form.
 */
public final class Form {
    /** Errors that belong to no single field are kept under this name and shown at the top. */
    public static final String GENERAL = "";

    /** Plain decimals as people type them: no hex, no "NaN", no type suffixes that Java would accept. */
    private static final java.util.regex.Pattern DECIMAL = java.util.regex.Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d{1,3})?");

    private final Map<String, String> values = new LinkedHashMap<>();
    private final Map<String, List<String>> lists = new LinkedHashMap<>();
    private final Map<String, String> errors = new LinkedHashMap<>();
    private boolean conflict;
    /** What each length or slope field was read as ("= 25.5 ft"), shown beside it when the form comes back. */
    private final Map<String, String> readings = new LinkedHashMap<>();

    private Form() {}

    public static Form of(Context ctx) {
        Form f = new Form();
        ctx.formParamMap().forEach((k, v) -> {
            f.lists.put(k, List.copyOf(v));
            if (!v.isEmpty()) f.values.put(k, v.get(0));
        });
        return f;
    }

    /** An empty form showing these starting values. */
    public static Form filled(Map<String, String> values) {
        Form f = new Form();
        f.values.putAll(values);
        return f;
    }

    public String value(String field) { return values.getOrDefault(field, ""); }

    public List<String> values(String field) { return lists.getOrDefault(field, List.of()); }

    public String error(String field) { return errors.get(field); }

    public boolean hasError(String field) { return errors.containsKey(field); }

    /** The value a length or slope field was read as, or null when it was not read or was refused. */
    public String reading(String field) { return hasError(field) ? null : readings.get(field); }

    public Map<String, String> errors() { return errors; }

    public boolean ok() { return errors.isEmpty(); }

    public void reject(String field, String problem) { errors.putIfAbsent(field, problem); }

    public String text(String field) { return value(field).strip(); }

    public boolean checked(String field) { return values.containsKey(field); }

    /** A required finite number; NaN after recording an error. */
    public double number(String field) {
        String t = text(field);
        if (t.isEmpty()) {
            reject(field, "is required");
            return Double.NaN;
        }
        return parse(field, t);
    }

    /** A number that may be left blank (NaN when blank). */
    public double optionalNumber(String field) {
        String t = text(field);
        return t.isEmpty() ? Double.NaN : parse(field, t);
    }

    public int integer(String field) {
        String t = text(field);
        try {
            return Integer.parseInt(t);
        } catch (NumberFormatException e) {
            reject(field, t.isEmpty() ? "is required" : "must be a whole number (got \"" + t + "\")");
            return 0;
        }
    }

    /** A length as engineers write it (see {@link Lengths}), in the field's unit for the system; NaN after an error. */
    public double length(String field, LengthField spec, UnitSystem system) {
        try {
            double v = Lengths.read(text(field), spec, system);
            readings.put(field, Shown.of(v, unit(spec, system)));
            return v;
        } catch (EntryRefused e) {
            reject(field, e.getMessage());
            return Double.NaN;
        }
    }

    /** A length that may be left blank (NaN when blank). */
    public double optionalLength(String field, LengthField spec, UnitSystem system) {
        return text(field).isEmpty() ? Double.NaN : length(field, spec, system);
    }

    /** A list of lengths in one field ("25'-6\" 30' 24'"), each read as {@link #length}; errors name the item. */
    public List<Double> lengths(String field, LengthField spec, UnitSystem system) {
        List<Double> out = new ArrayList<>();
        try {
            List<String> items = LengthList.split(text(field), spec.label());
            List<String> shown = new ArrayList<>();
            for (int i = 0; i < items.size(); i++) {
                LengthField item = new LengthField(spec.label() + " (number " + (i + 1) + ")", spec.signed(), spec.us(), spec.si());
                double v = Lengths.read(items.get(i), item, system);
                out.add(v);
                shown.add(Shown.of(v, unit(spec, system)).substring(2));
            }
            readings.put(field, "= " + String.join(", ", shown));
        } catch (EntryRefused e) {
            reject(field, e.getMessage());
        }
        return out;
    }

    /** A roof slope (see {@link Slopes}) in in/ft or %; NaN after an error. */
    public double slope(String field, String label, UnitSystem system) {
        try {
            double v = Slopes.read(text(field), label, system);
            readings.put(field, Shown.of(v, system == UnitSystem.US ? Unit.IN_PER_FT : Unit.PERCENT));
            return v;
        } catch (EntryRefused e) {
            reject(field, e.getMessage());
            return Double.NaN;
        }
    }

    /**
     * Runs the domain's own check of one field now, before the store is called, so that every field's
     * refusal is shown at once; a refusal lands on this field unless it already has one.
     */
    public void check(String field, Runnable domainCheck) {
        try {
            domainCheck.run();
        } catch (InputError e) {
            reject(field, e.problem());
        }
    }

    private static Unit unit(LengthField spec, UnitSystem system) {
        return system == UnitSystem.US ? spec.us() : spec.si();
    }

    /** The version the form was opened at; a form without one cannot be saved safely. */
    public long version() {
        try {
            return Long.parseLong(text("version"));
        } catch (NumberFormatException e) {
            reject(GENERAL, "the form carries no project version; reload the page");
            return -1;
        }
    }

    /**
     * Runs a store action when the form has no errors so far. A refusal by the domain or a stale version
     * becomes an error of the form, and nothing is saved (the store rolls back).
     */
    public <T> Optional<T> attempt(Supplier<T> action) {
        if (!ok()) return Optional.empty();
        try {
            return Optional.of(action.get());
        } catch (InputError e) {
            reject(fieldFor(e.field()), fieldFor(e.field()).equals(GENERAL) ? e.getMessage() : e.problem());
        } catch (StaleVersion e) {
            reject(GENERAL, "Not saved: " + e.getMessage() + ".");
            conflict = true;
        } catch (com.baysheet.store.Archived e) {
            // the project's state refuses it, not another save: answered 422 with the state named, no reload offered
            reject(GENERAL, "Not saved: " + e.getMessage() + ".");
        } catch (Duplicate e) {
            reject(fieldFor(e.field()), fieldFor(e.field()).equals(GENERAL) ? "Not saved: " + e.getMessage() + "." : e.problem());
            conflict = true;
        }
        return Optional.empty();
    }

    /** Whether the save lost to another one (a stale version, a job number just taken): answered 409, not 422. */
    public boolean stale() { return conflict; }

    /** The form field a domain field names: the longest field of this form that it ends with, ignoring [..] parts. */
    private String fieldFor(String domainField) {
        String plain = domainField.replaceAll("\\[[^]]*]", "");
        String best = GENERAL;
        for (String f : values.keySet())
            if ((plain.equals(f) || plain.endsWith("." + f)) && f.length() > best.length()) best = f;
        return best;
    }

    private double parse(String field, String t) {
        if (DECIMAL.matcher(t).matches()) {
            double v = Double.parseDouble(t);
            if (Double.isFinite(v)) return v;
        }
        reject(field, "must be a number (got \"" + t + "\")");
        return Double.NaN;
    }
}
