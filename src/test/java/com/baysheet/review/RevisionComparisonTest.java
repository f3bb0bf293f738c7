package com.baysheet.review;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Entry;
import com.baysheet.engine.record.Sketch;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class RevisionComparisonTest {
    @Test
    void identicalRecordsHaveNoChanges() {
        RevisionComparison c = RevisionComparison.of(Sheets.record(20, 40), Sheets.record(20, 40));
        assertThat(c.same()).isTrue();
        assertThat(c.unchangedInputs()).isEqualTo(2);
        assertThat(c.unchangedResults()).isEqualTo(2);
    }

    @Test
    void showsChangedInputsAndResultsSideBySide() {
        RevisionComparison c = RevisionComparison.of(Sheets.record(20, 40), Sheets.record(24, 38.5));
        assertThat(c.inputs()).containsExactly(
                new RevisionComparison.Change("span", "Span", "20.0 ft", "24.0 ft", RevisionComparison.Kind.CHANGED));
        assertThat(c.results()).extracting(RevisionComparison.Change::key).containsExactly("L");
        assertThat(c.results().get(0).before()).isEqualTo("40.0 psf");
        assertThat(c.results().get(0).after()).isEqualTo("38.5 psf");
        assertThat(c.unchangedInputs()).isEqualTo(1);
    }

    @Test
    void listsEntriesAddedAndRemoved() {
        CalcRecord a = Sheets.record(20, 40);
        List<Entry> inputs = new ArrayList<>(a.inputs().subList(0, 1));
        inputs.add(new Entry("P", "Point load", 2000, "lb", "2", "kip"));
        CalcRecord b = new CalcRecord(a.subject(), a.edition(), a.units(), inputs, a.steps(), a.results(), a.governing(),
                a.notes(), Sketch.NONE);
        RevisionComparison c = RevisionComparison.of(a, b);
        assertThat(c.inputs()).extracting(RevisionComparison.Change::kind)
                .containsExactly(RevisionComparison.Kind.ADDED, RevisionComparison.Kind.REMOVED);
        assertThat(c.inputs().get(0).before()).isEmpty();
        assertThat(c.inputs().get(1).after()).isEmpty();
        assertThat(c.inputs().get(1).key()).isEqualTo("L0");
    }

    @Test
    void reactionsKeyedR1R2InAnEarlierRevisionCompareWithRaRb() {
        CalcRecord a = Sheets.record(20, 40);
        List<Entry> was = List.of(new Entry("D.R1", "Left reaction, dead load", 2000, "lb", "2.00", "kip"),
                new Entry("LRFD.R2", "Right reaction, factored (LRFD 2)", 5000, "lb", "5.00", "kip"));
        List<Entry> now = List.of(new Entry("D.RA", "Left reaction R_A, dead load", 2000, "lb", "2.00", "kip"),
                new Entry("LRFD.RB", "Right reaction R_B, factored (LRFD 2)", 5200, "lb", "5.20", "kip"));
        CalcRecord before = new CalcRecord(a.subject(), a.edition(), a.units(), a.inputs(), a.steps(), was, a.governing(), a.notes(), Sketch.NONE);
        CalcRecord after = new CalcRecord(a.subject(), a.edition(), a.units(), a.inputs(), a.steps(), now, a.governing(), a.notes(), Sketch.NONE);
        RevisionComparison c = RevisionComparison.of(before, after);
        assertThat(c.results()).containsExactly(new RevisionComparison.Change("LRFD.RB", "Right reaction R_B, factored (LRFD 2)",
                "5.00 kip", "5.20 kip", RevisionComparison.Kind.CHANGED));
        assertThat(RevisionComparison.currentKey("R1")).isEqualTo("R1");   // the roof factor's step symbol is left alone
    }
}
