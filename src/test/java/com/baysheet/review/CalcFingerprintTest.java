package com.baysheet.review;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Sketch;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class CalcFingerprintTest {
    @Test
    void sameRecordSameFingerprint() {
        assertThat(CalcFingerprint.of(Sheets.record(20, 40))).isEqualTo(CalcFingerprint.of(Sheets.record(20, 40)))
                .matches("[0-9a-f]{64}");
    }

    @Test
    void anyInputOrResultChangesIt() {
        assertThat(CalcFingerprint.of(Sheets.record(20, 40))).isNotEqualTo(CalcFingerprint.of(Sheets.record(20, 39)));
        assertThat(CalcFingerprint.of(Sheets.record(20, 40))).isNotEqualTo(CalcFingerprint.of(Sheets.record(20.01, 40)));
    }

    @Test
    void aDeadLoadThatTheInputTableDoesNotListStillChangesIt() {
        CalcRecord light = Fixtures.calc(Fixtures.US, Fixtures.beam(MemberKind.INTERIOR_BEAM, 24, "office", 10, 15));
        CalcRecord heavy = Fixtures.calc(Fixtures.US, Fixtures.beam(MemberKind.INTERIOR_BEAM, 24, "office", 10, 25));
        assertThat(CalcFingerprint.of(light)).isNotEqualTo(CalcFingerprint.of(heavy));
    }

    @Test
    void theEditionCounts() {
        CalcRecord a = Sheets.record(20, 40);
        CalcRecord b = new CalcRecord(a.subject(), "ASCE 7-22", a.units(), a.inputs(), a.steps(), a.results(),
                a.governing(), List.of(), Sketch.NONE);
        assertThat(CalcFingerprint.of(a)).isNotEqualTo(CalcFingerprint.of(b));
    }
}
