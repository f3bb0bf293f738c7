package com.baysheet.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Step;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class FingerprintsTest {
    @Test
    void aKeptFingerprintIsTheOneCalcFingerprintGives() {
        Fingerprints f = new Fingerprints();
        CalcRecord r = Sheets.record(20, 40);
        assertThat(f.of(1, r)).isEqualTo(CalcFingerprint.of(r));
        f.turn(1);
        // the same parts under a record made again (as a member's record is made from its calculation's)
        assertThat(f.of(1, r.withSubject("other").withSubject(r.subject()))).isEqualTo(CalcFingerprint.of(r));
    }

    @Test
    void aRecordWithOtherPartsIsFingerprintedAgainEvenWhenEqual() {
        Fingerprints f = new Fingerprints();
        CalcRecord r = Sheets.record(20, 40), changed = Sheets.record(20, 39);
        f.of(1, r);
        f.turn(1);
        assertThat(f.of(1, changed)).isEqualTo(CalcFingerprint.of(changed)).isNotEqualTo(CalcFingerprint.of(r));
        // equal steps in a new list: a new key, the same fingerprint
        CalcRecord copied = new CalcRecord(r.subject(), r.edition(), r.units(), r.inputs(), new ArrayList<>(r.steps()), r.results(),
                r.governing(), r.notes(), r.sketch());
        assertThat(f.of(1, copied)).isEqualTo(CalcFingerprint.of(r));
    }

    @Test
    void theSubjectAndTheEditionAreComparedByValue() {
        Fingerprints f = new Fingerprints();
        CalcRecord r = Sheets.record(20, 40);
        CalcRecord renamed = r.withSubject("typical member");
        CalcRecord edition = new CalcRecord(r.subject(), "ASCE 7-22", r.units(), r.inputs(), r.steps(), r.results(), r.governing(),
                r.notes(), r.sketch());
        f.of(1, r);
        assertThat(f.of(1, renamed)).isEqualTo(CalcFingerprint.of(renamed)).isNotEqualTo(CalcFingerprint.of(r));
        assertThat(f.of(1, edition)).isEqualTo(CalcFingerprint.of(edition)).isNotEqualTo(CalcFingerprint.of(r));
    }

    @Test
    void aStepChangedInAnEqualLookingListIsSeen() {
        Fingerprints f = new Fingerprints();
        CalcRecord r = Sheets.record(20, 40);
        f.of(1, r);
        List<Step> steps = new ArrayList<>(r.steps());
        Step s = steps.get(0);
        steps.set(0, new Step(s.symbol(), s.description(), s.formula(), s.substituted() + " + 1", s.result() + 1, s.unit(), s.shown() + "1",
                s.shownUnit(), s.clause()));
        CalcRecord other = new CalcRecord(r.subject(), r.edition(), r.units(), r.inputs(), steps, r.results(), r.governing(),
                r.notes(), r.sketch());
        assertThat(f.of(1, other)).isEqualTo(CalcFingerprint.of(other)).isNotEqualTo(CalcFingerprint.of(r));
    }
}
