package com.baysheet.cli;

import com.fasterxml.jackson.databind.JsonNode;
import org.assertj.core.api.SoftAssertions;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.Map;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

/**
 * A consumer of the JSON record that trusts its fields gets the right number: for every input, step and result
 * of every example, {@code value} (or a step's {@code result}) converted from {@code unit} to {@code shownUnit}
 * gives the number printed in {@code shown}, to its three significant figures. The conversion factors are the
 * test's own (NIST SP 811), not the engine's.
 */
class RecordUnitsTest {
    // NIST SP 811 Appendix B: 1 ft = 0.3048 m exactly, 1 lbf = 4.4482216152605 N
    static final double FT = 0.3048, IN = FT / 12, LBF = 4.4482216152605, KIP = 1000 * LBF;

    /** Each unit symbol the record may carry, as a factor to SI (m, m², Pa, N/m, N, N·m, N·m²). */
    static final Map<String, Double> TO_SI = Map.ofEntries(
            Map.entry("", 1.0), Map.entry("in/ft", 1.0 / 12), Map.entry("%", 0.01),
            Map.entry("ft", FT), Map.entry("in", IN), Map.entry("m", 1.0), Map.entry("mm", 0.001),
            Map.entry("ft²", FT * FT), Map.entry("m²", 1.0),
            Map.entry("psf", LBF / (FT * FT)), Map.entry("kPa", 1000.0),
            Map.entry("plf", LBF / FT), Map.entry("kN/m", 1000.0),
            Map.entry("lb", LBF), Map.entry("kip", KIP), Map.entry("kN", 1000.0),
            Map.entry("lb·ft", LBF * FT), Map.entry("kip·ft", KIP * FT), Map.entry("kN·m", 1000.0),
            Map.entry("lb·ft²", LBF * FT * FT), Map.entry("kip·in²", KIP * IN * IN), Map.entry("kN·m²", 1000.0),
            // the snow chapter's (a snow block in the input): degrees of slope and snow density
            Map.entry("°", 1.0), Map.entry("pcf", LBF / (FT * FT * FT)), Map.entry("kN/m³", 1000.0));

    /** The base units of each system (docs/engine.md, The calculation record). */
    static final Map<String, Set<String>> BASE = Map.of(
            "US", Set.of("", "in/ft", "ft", "ft²", "psf", "plf", "lb", "lb·ft", "lb·ft²", "°", "pcf"),
            "SI", Set.of("", "%", "m", "m²", "kPa", "kN/m", "kN", "kN·m", "kN·m²", "°", "kN/m³"));

    static final Pattern SHOWN = Pattern.compile("(-?\\d+(?:\\.\\d+)?)(?: (.+))?");

    static Stream<Path> examples() throws IOException { return CalcCommandTest.examples(); }

    @ParameterizedTest
    @MethodSource("examples")
    void everyNumberConvertsFromItsUnitToWhatIsShown(Path file) throws IOException {
        CalcCommandTest.Run run = CalcCommandTest.run(InputStream.nullInputStream(), file.toString());
        JsonNode record = run.json();
        String system = record.get("units").asText();
        SoftAssertions soft = new SoftAssertions();
        int checked = 0;
        for (String section : new String[] {"inputs", "steps", "results"})
            for (JsonNode e : record.get(section)) {
                JsonNode value = e.has("value") ? e.get("value") : e.get("result");
                if (!value.isNumber()) continue; // a text entry ("NaN"): edition, member kind, support
                String where = file.getFileName() + " " + section + " " + (e.has("key") ? e.get("key") : e.get("symbol")).asText();
                checked += check(soft, where, system, value.asDouble(), e) ? 1 : 0;
            }
        soft.assertThat(checked).as("numbers checked in " + file).isGreaterThan(20);
        soft.assertAll();
    }

    private static boolean check(SoftAssertions soft, String where, String system, double value, JsonNode e) {
        String unit = e.get("unit").asText(), shown = e.get("shown").asText();
        Matcher m = SHOWN.matcher(shown);
        if (!m.matches()) {
            soft.fail(where + ": shown text is not a number with a unit: " + shown);
            return false;
        }
        double printed = Double.parseDouble(m.group(1));
        String printedUnit = m.group(2) == null ? "" : m.group(2);
        soft.assertThat(BASE.get(system)).as(where + ": unit is a base unit of " + system).contains(unit);
        soft.assertThat(e.has("shownUnit") ? e.get("shownUnit").asText() : null).as(where + ": shownUnit").isEqualTo(printedUnit);
        if (!TO_SI.containsKey(unit) || !TO_SI.containsKey(printedUnit)) {
            soft.fail(where + ": unknown unit " + unit + " or " + printedUnit);
            return false;
        }
        double converted = value * TO_SI.get(unit) / TO_SI.get(printedUnit);
        soft.assertThat(Math.abs(converted - printed)).as(where + ": " + value + " " + unit + " is " + converted + " "
                + printedUnit + ", shown " + shown).isLessThanOrEqualTo(halfOfLastFigure(printed) + 1e-9 * Math.abs(printed));
        return true;
    }

    /** Three significant figures: half a unit in the third figure of the printed number (0 when 0 is printed). */
    private static double halfOfLastFigure(double printed) {
        if (printed == 0) return 1e-12;
        return 0.5 * Math.pow(10, Math.floor(Math.log10(Math.abs(printed))) - 2);
    }
}
