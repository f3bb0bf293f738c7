package com.baysheet.cli;

import com.baysheet.engine.record.RecordJson;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class CalcCommandTest {
    static final Path EXAMPLES = Path.of("docs/examples");

    record Run(int exit, String out, String err) {
        JsonNode json() throws IOException { return RecordJson.mapper().readTree(out); }

        double result(String key) throws IOException {
            for (JsonNode e : json().get("results")) if (e.get("key").asText().equals(key)) return e.get("value").asDouble();
            throw new AssertionError("no result " + key);
        }
    }

    static Run run(InputStream in, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(), err = new ByteArrayOutputStream();
        int exit = CalcCommand.run(args, in, new PrintStream(out, true, StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(exit, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    static Run stdin(String json) { return run(new ByteArrayInputStream(json.getBytes(StandardCharsets.UTF_8)), "-"); }

    static final String BEAM = """
            {"units": "US", "subject": "B", "kind": "INTERIOR_BEAM", "support": {"type": "simple", "span": 30},
             "strips": [{"occupancy": "office", "width": 10, "from": 0, "to": 30, "deadLoad": 15}] %s}""";

    static Stream<Path> examples() throws IOException {
        try (Stream<Path> s = Files.list(EXAMPLES)) {
            return s.filter(p -> p.toString().endsWith(".json")).sorted().toList().stream();
        }
    }

    @Test
    void everyKindOfExampleIsThereInBothUnitSystems() throws IOException {
        assertThat(examples().map(p -> p.getFileName().toString())).hasSize(12)
                .contains("office-beam-us.json", "office-beam-si.json", "girder-us.json", "roof-beam-si.json", "storage-column-us.json",
                "snow-drift-beam-us.json", "snow-drift-beam-si.json");
    }

    @ParameterizedTest
    @MethodSource("examples")
    void examplesRunCleanly(Path file) throws IOException {
        Run r = run(InputStream.nullInputStream(), file.toString());
        assertThat(r.err()).isEmpty();
        assertThat(r.exit()).isZero();
        assertThat(r.json().get("results").size()).isGreaterThan(5);
    }

    @Test
    void usAndSiExamplesOfTheOfficeBeamAgreeToTheirRounding() throws IOException {
        Run us = run(InputStream.nullInputStream(), "docs/examples/office-beam-us.json");
        Run si = run(InputStream.nullInputStream(), "docs/examples/office-beam-si.json");
        // 9 m for 30 ft and 3 m for 10 ft: about 2 % apart in length and width, so moments within about 8 %
        double usKnM = us.result("LRFD.M+") * 0.0013558179;
        assertThat(si.result("LRFD.M+")).isCloseTo(usKnM, within(0.08 * usKnM));
    }

    @Test
    void readsStandardInputAndMatchesTheEngineDirectly() throws IOException {
        Run r = stdin(BEAM.formatted(""));
        assertThat(r.exit()).isZero();
        double f = 0.25 + 15 / Math.sqrt(600); // ASCE 7-16 Eq. 4.7-1, K_LL 2, A_T 300 ft²
        assertThat(r.result("L.M+")).isCloseTo(500 * f * 900 / 8, within(1e-6));
        assertThat(stdin(BEAM.formatted("")).out()).isEqualTo(r.out());
    }

    @Test
    void stiffnessIsGivenInKipSquareInches() throws IOException {
        // EI = 14,500,000 kip·in² is 14.5e9/144 lb·ft²; Δ = 5wℓ⁴/384EI in inches
        Run r = stdin(BEAM.formatted(", \"EI\": 14500000"));
        double w = 500 * (0.25 + 15 / Math.sqrt(600)), ei = 14.5e9 / 144;
        assertThat(r.result("L.Δ")).isCloseTo(5 * w * Math.pow(30, 4) / (384 * ei), within(1e-12));
    }

    @Test
    void firmsOwnOccupancyCanBeDeclared() throws IOException {
        Run r = stdin("""
                {"units": "US", "subject": "B", "kind": "INTERIOR_BEAM", "support": {"type": "simple", "span": 20},
                 "customOccupancies": [{"id": "archive", "name": "Archive", "uniform": 90, "rule": "ORDINARY"}],
                 "strips": [{"occupancy": "archive", "width": 10, "from": 0, "to": 20}]}""");
        assertThat(r.exit()).as(r.err()).isZero();
        assertThat(r.result("L0.RA")).isCloseTo(90 * 10 * 10, within(1e-9));
    }

    @Test
    void overhangUpliftAndTheFirmOptionComeThroughTheCommand() throws IOException {
        // 10 ft + 8 ft, 15 psf dead and 50 psf office on 10 ft: R_A = 1.2 × 270 − 1.6 × 1600 = −2,236 lb (2.3.1
        // combination 2, live load on the overhang only); with the option, 0.9 × 270 − 1.6 × 1600 = −2,317 lb
        String beam = """
                {"units": "US", "subject": "B", "kind": "INTERIOR_BEAM", "support": {"type": "overhang", "span": 10, "overhang": 8},
                 "strips": [{"occupancy": "office", "width": 10, "from": 0, "to": 18, "deadLoad": 15}] %s}""";
        Run code = stdin(beam.formatted(""));
        assertThat(code.exit()).as(code.err()).isZero();
        assertThat(code.result("LRFD.RA,min")).isCloseTo(-2236, within(1e-9));
        Run firm = stdin(beam.formatted(", \"options\": {\"upliftReducedDead\": true}"));
        assertThat(firm.result("LRFD.RA,min")).isCloseTo(-2317, within(1e-9));
        assertThat(firm.out()).contains("firm practice, not a 2.3.1 combination");
        assertThat(stdin(beam.formatted(", \"options\": {\"upliftReducedDead\": \"yes\"}")).err()).contains("upliftReducedDead");
    }

    @Test
    void malformedJsonIsExitTwoWithOneLine() {
        Run r = stdin("{\"units\": \"US\", ");
        assertThat(r.exit()).isEqualTo(2);
        assertThat(r.err()).startsWith("malformed JSON").hasLineCount(1);
        assertThat(r.out()).isEmpty();
    }

    @Test
    void missingFieldIsNamed() {
        Run r = stdin(BEAM.formatted("").replace("\"span\": 30", "\"length\": 30"));
        assertThat(r.exit()).isEqualTo(2);
        assertThat(r.err()).contains("support.span").contains("required").hasLineCount(1);
        assertThat(stdin("{\"units\": \"US\"}").err()).contains("subject");
    }

    @Test
    void unknownFieldIsRefused() {
        Run r = stdin(BEAM.formatted(", \"colour\": \"red\""));
        assertThat(r.exit()).isEqualTo(2);
        assertThat(r.err()).contains("colour").contains("not a known field");
        assertThat(stdin(BEAM.formatted("").replace("\"deadLoad\"", "\"dead\"")).err()).contains("strips[0].dead");
    }

    @Test
    void badValuesAreNamedByTheirPathInTheInput() {
        assertThat(stdin(BEAM.formatted("").replace("\"width\": 10", "\"width\": -10")).err()).contains("strips[0].width").contains("-10");
        assertThat(stdin(BEAM.formatted("").replace("\"span\": 30", "\"span\": 0")).err()).contains("support.span");
        assertThat(stdin(BEAM.formatted("").replace("\"span\": 30", "\"span\": \"30\"")).err()).contains("support.span").contains("number");
        assertThat(stdin(BEAM.formatted(", \"EI\": 0")).err()).contains("EI");
        assertThat(stdin(BEAM.formatted("").replace("\"deadLoad\": 15", "\"deadLoad\": -15")).err()).contains("strips[0].deadLoad");
    }

    @Test
    void unknownOccupancyEditionOrUnitsAreRefused() {
        assertThat(stdin(BEAM.formatted("").replace("\"office\"", "\"ballroom\"")).err()).contains("strips[0].occupancy").contains("ballroom");
        Run ed = stdin(BEAM.formatted(", \"edition\": \"ASCE 7-98\""));
        assertThat(ed.exit()).isEqualTo(2);
        assertThat(ed.err()).contains("edition").contains("ASCE 7-98");
        assertThat(stdin(BEAM.formatted("").replace("\"US\"", "\"imperial\"")).err()).contains("units");
    }

    @Test
    void pointLoadOffTheSpanAndFloorsBelowOneAreRefused() {
        Run off = stdin(BEAM.formatted(", \"pointLoads\": [{\"x\": 31, \"dead\": 100}]"));
        assertThat(off.exit()).isEqualTo(2);
        assertThat(off.err()).contains("pointLoads[0].x").contains("31");
        assertThat(stdin(BEAM.formatted(", \"floorsSupported\": 0")).err()).contains("floorsSupported");
        assertThat(stdin(BEAM.formatted(", \"pointLoads\": [{\"dead\": 100}]")).err()).contains("pointLoads[0].x").contains("required");
    }

    @Test
    void usageAndUnreadableFilesAreExitTwo() {
        Run none = run(InputStream.nullInputStream());
        assertThat(none.exit()).isEqualTo(2);
        assertThat(none.err()).startsWith("usage:");
        Run missing = run(InputStream.nullInputStream(), "docs/examples/no-such-member.json");
        assertThat(missing.exit()).isEqualTo(2);
        assertThat(missing.err()).contains("no-such-member.json").hasLineCount(1);
        assertThat(stdin("").exit()).isEqualTo(2);
    }

    @Test
    void aMemberJsonCarriesSnowAndADrift() throws IOException {
        // p_g 30 psf, C_e = C_t = I_s = 1, flat: p_f = p_s = 21.0 psf (Eq. 7.3-1) over p_m 20 psf, so S_u = 21 psf on a
        // 10 ft strip: 210 plf × 30 / 2 = 3150 lb at each end. The drift (12 ft step, ℓu = ℓl = 30 ft, see RoofDriftTest):
        // h_d = 0.43 ∛30 ∜40 − 1.5 = 1.860 ft, w = 7.441 ft, p_d = 33.30 psf; the step is at x = 30 (d = 0 there), so the
        // triangle lies on the last w of the span: 10 × p_d w / 2 = 1238.7 lb, its resultant w/3 from the step, and
        // R_A = 3150 + 1238.7 × (7.441/3)/30 = 3252.4 lb (AISC Manual Table 3-23, load increasing to one end, on the stretch).
        Run r = run(InputStream.nullInputStream(), "docs/examples/snow-drift-beam-us.json");
        assertThat(r.exit()).as(r.err()).isZero();
        double hd = 0.43 * Math.cbrt(30) * Math.pow(40, 0.25) - 1.5, w = 4 * hd, drift = 10 * hd * 17.9 * w / 2;
        assertThat(r.result("snow.drift.load")).isCloseTo(drift, within(1e-6));
        assertThat(r.result("S.RA")).isCloseTo(3150 + drift * (w / 3) / 30, within(1e-3 * drift));
        Run si = run(InputStream.nullInputStream(), "docs/examples/snow-drift-beam-si.json");
        assertThat(si.exit()).as(si.err()).isZero();
        assertThat(si.result("snow.drift.hd")).isGreaterThan(0);
        Run bad = stdin(BEAM.formatted(", \"snow\": {\"groundSnow\": -5, \"terrain\": \"C\", \"exposure\": \"PARTIALLY\","
                + " \"thermalCondition\": \"HEATED\", \"riskCategory\": \"II\"}"));
        assertThat(bad.exit()).isEqualTo(2);
        assertThat(bad.err()).contains("groundSnowLoad");
    }
}
