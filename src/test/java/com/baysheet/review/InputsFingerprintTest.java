package com.baysheet.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Sketch;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class InputsFingerprintTest {
    @Test
    void sameInputsSameFingerprint() {
        assertThat(InputsFingerprint.of(Sheets.record(20, 40))).isEqualTo(InputsFingerprint.of(Sheets.record(20, 40)))
                .matches("[0-9a-f]{64}");
    }

    @Test
    void resultsAloneDoNotChangeItButAnyInputDoes() {
        assertThat(InputsFingerprint.of(Sheets.record(20, 40))).isEqualTo(InputsFingerprint.of(Sheets.record(20, 39)));
        assertThat(InputsFingerprint.of(Sheets.record(20, 40))).isNotEqualTo(InputsFingerprint.of(Sheets.record(20.01, 40)));
    }

    @Test
    void theEditionCounts() {
        CalcRecord a = Sheets.record(20, 40);
        CalcRecord b = new CalcRecord(a.subject(), "ASCE 7-22", a.units(), a.inputs(), a.steps(), a.results(),
                a.governing(), List.of(), Sketch.NONE);
        assertThat(InputsFingerprint.of(a)).isNotEqualTo(InputsFingerprint.of(b));
    }
}
