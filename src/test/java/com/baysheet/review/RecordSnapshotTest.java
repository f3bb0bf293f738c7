package com.baysheet.review;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.record.CalcRecord;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

class RecordSnapshotTest {
    @Test
    void anEngineRecordReadsBackEqual() {
        CalcRecord r = Fixtures.calc(Fixtures.US, Fixtures.beam(MemberKind.INTERIOR_BEAM, 24, "office", 10, 15));
        CalcRecord back = RecordSnapshot.read(RecordSnapshot.write(r));
        assertThat(back).isEqualTo(r);
        assertThat(CalcFingerprint.of(back)).isEqualTo(CalcFingerprint.of(r));
    }

    @Test
    void aHandMadeRecordReadsBackEqual() {
        CalcRecord r = Sheets.record(20, 40);
        assertThat(RecordSnapshot.read(RecordSnapshot.write(r))).isEqualTo(r);
    }
}
