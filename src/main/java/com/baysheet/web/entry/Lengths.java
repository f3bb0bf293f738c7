package com.baysheet.web.entry;

import com.baysheet.engine.units.Unit;
import com.baysheet.engine.units.UnitSystem;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads one length as typed into a field. US: {@code 25'-6"}, {@code 25' 6"}, {@code 25'6}, {@code 25'-6 1/2"},
 * {@code 25'}, {@code 6"}, {@code 25.5}, {@code 25 1/2} (a bare number is in the field's unit) and, on unsigned
 * fields only, {@code 25-6}. SI: {@code 7.5}, {@code 7.5 m}, {@code 7500 mm}. Pure; throws {@link EntryRefused}.
 */
public final class Lengths {
    private static final String N = Numbers.NUMBER;
    /** Feet, a foot mark, an optional dash, then optionally inches with an optional inch mark. */
    private static final Pattern FEET_INCHES = Pattern.compile("(" + Numbers.DECIMAL + ")\\s*'\\s*(?:-\\s*)?(?:(" + Numbers.INCHES + ")\\s*(\"?))?");
    private static final Pattern INCHES = Pattern.compile("(" + Numbers.INCHES + ")\\s*\"");
    /** 25-6, 25-6", 25-6 1/2": whole feet, a dash, inches that start with a whole number. */
    private static final Pattern DASHED = Pattern.compile("(\\d+)\\s*-\\s*(\\d+(?:\\.\\d*)?(?:\\s+\\d+/\\d+)?)\\s*\"?");
    private static final Pattern METRIC = Pattern.compile("(" + Numbers.DECIMAL + ")\\s*(mm|m)?");
    /** A bare number in metres past this is surely millimetres typed without the unit. */
    static final double MAX_BARE_METRES = 1000;

    private Lengths() {}

    /** The length in the field's unit for the system ({@link LengthField#us()} or {@link LengthField#si()}). */
    public static double read(String typed, LengthField field, UnitSystem system) {
        String t = normalize(typed);
        if (t.isEmpty()) throw new EntryRefused(field.label(), typed, "is required");
        boolean negative = t.startsWith("-");
        String body = (t.startsWith("-") || t.startsWith("+")) ? t.substring(1).strip() : t;
        if (body.startsWith("-") || body.startsWith("+") || body.matches(".*'\\s*-\\s*-.*"))
            throw new EntryRefused(field.label(), typed, "more than one sign");
        if (negative && !field.signed()) throw new EntryRefused(field.label(), typed, "cannot be negative");
        double v;
        try {
            v = system == UnitSystem.US ? us(body, field, typed) : si(body, field, typed);
        } catch (EntryRefused e) {
            throw e;
        } catch (IllegalArgumentException e) {
            throw new EntryRefused(field.label(), typed, e.getMessage());
        }
        if (!field.signed() && v == 0) throw new EntryRefused(field.label(), typed, "must be greater than 0");
        return negative ? -v : v;
    }

    /** Typographic primes and doubled quotes as the plain marks; ft and in as the marks; one space at most. */
    static String normalize(String typed) {
        return typed.strip().replace('′', '\'').replace('’', '\'').replace('″', '"').replace("''", "\"")
                .replace('−', '-').replace('–', '-')
                .replaceAll("(?<=[\\d\\s./])\\s*(?:feet|foot|ft)\\.?", "'")
                .replaceAll("(?<=[\\d\\s./'-])\\s*(?:inches|inch|in)\\.?(?=$|\\s)", "\"")
                .replaceAll("\\s+", " ").strip();
    }

    private static double us(String t, LengthField field, String typed) {
        if (t.matches(".*\\d\\s*(mm|m)$"))
            throw new EntryRefused(field.label(), typed, "this project is in feet and inches, not metres");
        Matcher m = FEET_INCHES.matcher(t);
        if (m.matches()) {
            double feet = Double.parseDouble(m.group(1));
            if (m.group(2) == null) return inUnit(feet, 0, field.us());
            if (feet != Math.rint(feet)) throw new EntryRefused(field.label(), typed, "feet before inches must be whole feet");
            return inUnit(feet, inches(m.group(2), field, typed), field.us());
        }
        m = INCHES.matcher(t);
        if (m.matches()) return inUnit(0, Numbers.read(m.group(1)), field.us());
        m = DASHED.matcher(t);
        if (m.matches()) {
            if (field.signed()) throw new EntryRefused(field.label(), typed, "write " + (typed.strip().startsWith("-") ? "-" : "")
                    + m.group(1) + "'-" + m.group(2) + "\" for feet and inches (without the marks it could be read as a subtraction)");
            return inUnit(Double.parseDouble(m.group(1)), inches(m.group(2), field, typed), field.us());
        }
        Double bare = t.matches(N) ? Numbers.read(t) : null;
        if (bare == null) throw new EntryRefused(field.label(), typed,
                "write a length as 25'-6\", 25' 6 1/2\", 6\" or 25.5 (" + field.us().symbol() + ")");
        return bare;
    }

    private static double inches(String text, LengthField field, String typed) {
        double in = Numbers.read(text);
        if (in >= 12) throw new EntryRefused(field.label(), typed, "inches after feet must be less than 12");
        return in;
    }

    /** Feet and inches in ft (feet + inches/12) or in (12 feet + inches): 12 in = 1 ft exactly. */
    private static double inUnit(double feet, double inches, Unit unit) {
        return unit == Unit.FT ? feet + inches / 12 : feet * 12 + inches;
    }

    private static double si(String t, LengthField field, String typed) {
        if (t.contains("'") || t.contains("\""))
            throw new EntryRefused(field.label(), typed, "this project is in metres, not feet and inches");
        Matcher m = METRIC.matcher(t);
        if (!m.matches()) throw new EntryRefused(field.label(), typed,
                "write a length as 7.5 m, 7500 mm or a bare number in " + field.si().symbol());
        double v = Double.parseDouble(m.group(1));
        if (!Double.isFinite(v)) throw new EntryRefused(field.label(), typed, "is too large");
        String unit = m.group(2);
        if (unit == null) {
            if (field.si() == Unit.M && v >= MAX_BARE_METRES) throw new EntryRefused(field.label(), typed,
                    "that is over a kilometre; write " + t + " mm for millimetres");
            return v;
        }
        Unit given = unit.equals("mm") ? Unit.MM : Unit.M;
        // 1 m = 1000 mm exactly; divide rather than multiply by 0.001 so 7500 mm is exactly 7.5 m
        if (given == field.si()) return v;
        return given == Unit.MM ? v / 1000 : v * 1000;
    }
}
