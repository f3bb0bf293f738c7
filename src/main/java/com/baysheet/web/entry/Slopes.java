package com.baysheet.web.entry;

import com.baysheet.engine.units.UnitSystem;

import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Reads a roof slope as typed, in in/ft on a US project and in percent on an SI one: a bare number or
 * fraction in that unit ({@code 0.25}, {@code 1/4}, {@code 1 1/2}), a pitch as rise:run ({@code 6:12} is
 * 6 in/ft or 50 %; {@code 1:50} is 0.24 in/ft or 2 %), a percentage ({@code 2%}) and, on US projects, an
 * explicit {@code in/ft} or {@code "/ft}. A fraction over 12 ({@code 6/12}) is refused: it reads as half an
 * inch per foot but is often meant as a pitch of 6 in 12, so the engineer is asked to say which.
 */
public final class Slopes {
    private static final String N = Numbers.NUMBER;
    private static final Pattern PITCH = Pattern.compile("(" + N + ")\\s*:\\s*(" + N + ")");
    private static final Pattern PERCENT = Pattern.compile("(" + Numbers.DECIMAL + ")\\s*%");
    private static final Pattern PER_FOOT = Pattern.compile("(" + N + ")\\s*(?:in\\.?\\s*/\\s*ft\\.?|\"\\s*/\\s*ft\\.?|\"\\s*/\\s*'|\")?");
    private static final Pattern TWELFTHS = Pattern.compile("(?:\\d+\\s+)?\\d+\\s*/\\s*12\\b.*");

    private Slopes() {}

    /** The slope in in/ft (US) or % (SI). */
    public static double read(String typed, String label, UnitSystem system) {
        String t = typed.strip().replaceAll("\\s+", " ");
        if (t.isEmpty()) throw new EntryRefused(label, typed, "is required");
        if (t.startsWith("-") || t.startsWith("−")) throw new EntryRefused(label, typed, "a roof slope cannot be negative");
        try {
            return parse(t, label, typed, system == UnitSystem.US);
        } catch (EntryRefused e) {
            throw e;
        } catch (IllegalArgumentException e) {
            throw new EntryRefused(label, typed, e.getMessage());
        }
    }

    private static double parse(String t, String label, String typed, boolean us) {
        Matcher m = PITCH.matcher(t);
        if (m.matches()) {
            double rise = Numbers.read(m.group(1));
            double run = Numbers.read(m.group(2));
            if (run == 0) throw new EntryRefused(label, typed, "a pitch needs a run greater than 0");
            // rise:run is a ratio: 12 in per ft of run, or 100 %
            return us ? 12 * rise / run : 100 * rise / run;
        }
        m = PERCENT.matcher(t);
        if (m.matches()) {
            double pct = Double.parseDouble(m.group(1));
            return us ? pct * 12 / 100 : pct;
        }
        if (TWELFTHS.matcher(t).matches()) throw new EntryRefused(label, typed,
                "write a pitch of rise in 12 as " + t.replaceAll("\\s*/\\s*12.*", ":12") + ", or the slope as a decimal");
        m = PER_FOOT.matcher(t);
        if (m.matches() && (us || t.equals(m.group(1)))) return Numbers.read(m.group(1));
        throw new EntryRefused(label, typed, us
                ? "write a slope as 1/4 or 0.25 (in/ft), a pitch as 6:12, or a percentage as 2%"
                : "write a slope as 2 or 2% (percent), or a pitch as 1:50");
    }
}
