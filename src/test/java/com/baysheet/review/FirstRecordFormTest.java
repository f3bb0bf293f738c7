package com.baysheet.review;

import com.baysheet.auth.Tokens;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.engine.record.Step;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Revisions stored before records named their base units: the fixtures are the command line's records of
 * docs/examples/office-beam-us.json and storage-column-si.json as the program wrote them then, with one
 * {@code unit} field holding the shown unit.
 */
class FirstRecordFormTest {
    static String stored(String system) throws IOException {
        try (InputStream in = FirstRecordFormTest.class.getResourceAsStream("/review/record-before-unit-split-" + system + ".json")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8).strip();
        }
    }

    @ParameterizedTest
    @ValueSource(strings = {"us", "si"})
    void aStoredRecordKeepsTheFingerprintItWasIssuedWith(String system) throws IOException {
        String json = stored(system);
        CalcRecord read = RecordSnapshot.read(json);
        assertThat(CalcFingerprint.of(read)).isEqualTo(Tokens.sha256(json));
        // written again in today's form (as the next revision stores it) the fingerprint still agrees
        String today = RecordSnapshot.write(read);
        assertThat(today).isNotEqualTo(json);
        assertThat(RecordJson.mapper().readTree(today).path("inputs")).as("every input written with its shown unit")
                .isNotEmpty().allSatisfy(in -> assertThat(in.has("shownUnit")).as(in.toString()).isTrue());
        assertThat(CalcFingerprint.of(RecordSnapshot.read(today))).isEqualTo(Tokens.sha256(json));
        String fp = Tokens.sha256(json);
        SheetRevision issued = SheetRevision.opened(1).submit(Sheets.ENGINEER, fp, Sheets.DAY)
                .approve(Sheets.CHECKER, Sheets.DAY, 0, fp).issue(Sheets.CHECKER, Sheets.DAY, Sheets.PDF, fp, "First issue");
        assertThat(issued.outdatedBy(CalcFingerprint.of(RecordSnapshot.read(today)))).isFalse();
    }

    @ParameterizedTest
    @ValueSource(strings = {"us", "si"})
    void aStoredRecordComparesUnchangedWithTheSameRecordInTodaysForm(String system) throws IOException {
        CalcRecord old = RecordSnapshot.read(stored(system));
        CalcRecord today = RecordSnapshot.read(RecordSnapshot.write(old));
        assertThat(today).isEqualTo(old);
        assertThat(RevisionComparison.of(old, today).same()).isTrue();
    }

    @Test
    void theOldUnitBecomesTheShownUnitAndTheBaseUnitIsNamed() throws IOException {
        CalcRecord us = RecordSnapshot.read(stored("us"));
        Entry ei = us.inputs().stream().filter(e -> e.key().equals("EI")).findFirst().orElseThrow();
        assertThat(ei.unit()).isEqualTo("lb·ft²");
        assertThat(ei.shownUnit()).isEqualTo("kip·in²");
        // 14,210,000 kip·in² × 1000 lb/kip ÷ 144 in²/ft²
        assertThat(ei.value()).isCloseTo(14_210_000 * 1000.0 / 144, org.assertj.core.api.Assertions.within(1e-3));
        assertThat(us.entry("D.R1")).extracting(Entry::unit, Entry::shownUnit).containsExactly("lb", "kip");
        assertThat(us.entry("L.M+")).extracting(Entry::unit, Entry::shownUnit).containsExactly("lb·ft", "kip·ft");
        assertThat(us.entry("Δ.total")).extracting(Entry::unit, Entry::shownUnit).containsExactly("ft", "in");
        Step kll = us.step("K_LL");
        assertThat(kll.unit()).isEmpty();
        assertThat(kll.shownUnit()).isEmpty();
        assertThat(us.inputs().get(0)).extracting(Entry::unit, Entry::shownUnit).containsExactly("", "");

        CalcRecord si = RecordSnapshot.read(stored("si"));
        assertThat(si.entry("LRFD.P")).extracting(Entry::unit, Entry::shownUnit).containsExactly("kN", "kN");
    }
}
