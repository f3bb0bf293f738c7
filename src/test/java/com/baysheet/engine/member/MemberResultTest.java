package com.baysheet.engine.member;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaLoad;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The numbers read before the record is written are the record's own numbers. */
class MemberResultTest {
    private final CalcContext us = CalcContext.of(UnitSystem.US);

    @Test
    void valuesReadBeforeTheRecordEqualTheRecordsResults() {
        MemberInput beam = MemberInput.beam("B", MemberKind.INTERIOR_BEAM, new Support.Overhang(24, 6),
                List.of(new AreaStrip("office", 9, 0, 30, 70), new AreaStrip("assembly-lobby", 3, 0, 24, 70)));
        MemberResult numbersFirst = MemberCalculation.calculate(us, beam);
        var written = MemberCalculation.calculate(us, beam).record();
        int compared = 0;
        for (Entry e : written.results()) {
            if (Double.isNaN(e.value())) continue;
            assertThat(numbersFirst.value(e.key())).as(e.key()).isEqualTo(e.value());
            compared++;
        }
        assertThat(compared).isGreaterThan(20);
        assertThat(numbersFirst.record()).isEqualTo(written);
    }

    @Test
    void stepValuesAndLabelsMatchTheWrittenRecord() {
        MemberInput col = MemberInput.column("C", MemberKind.INTERIOR_COLUMN, 3, List.of(new AreaLoad("office", 2400, 90)));
        MemberResult numbers = MemberCalculation.calculate(us, col);
        var written = MemberCalculation.calculate(us, col).record();
        assertThat(numbers.stepValue("f")).isEqualTo(written.step("f").result());
        assertThat(numbers.label("LRFD.P")).isEqualTo(written.entry("LRFD.P").label());
        assertThat(numbers.stepValue("no such step")).isNaN();
    }

    @Test
    void theWrittenRecordHasItsTextAndARenamedResultKeepsItsNumbers() {
        MemberInput beam = MemberInput.beam("B-7", MemberKind.INTERIOR_BEAM, new Support.Simple(30), List.of(new AreaStrip("office", 10, 0, 30, 60)));
        MemberResult r = MemberCalculation.calculate(us, beam);
        MemberResult renamed = r.withSubject("Beam 7, Level 3");
        assertThat(renamed.record().subject()).isEqualTo("Beam 7, Level 3");
        assertThat(renamed.record().steps()).allSatisfy(s -> assertThat(s.shown()).isNotEmpty());
        assertThat(renamed.value("LRFD.M+")).isEqualTo(r.record().result("LRFD.M+"));
        assertThat(renamed.record().steps()).hasSameSizeAs(r.record().steps());
    }
}
