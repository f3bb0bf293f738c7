package com.baysheet.review;

import com.baysheet.auth.Role;
import com.baysheet.review.CheckQueue.Entry;
import com.baysheet.review.CheckQueue.Filter;
import com.baysheet.review.CheckQueue.Waiting;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Optional;

import static org.assertj.core.api.Assertions.assertThat;

/** What waits for whom: each state against each person, and the filters and counts. */
class CheckQueueTest {
    private static final Actor ENGINEER = new Actor(1, "EP", Role.ENGINEER);
    private static final Actor CHECKER = new Actor(2, "CK", Role.CHECKER);
    private static final Actor OTHER_CHECKER = new Actor(5, "SC", Role.CHECKER);
    private static final Actor ADMIN = new Actor(3, "AD", Role.ADMINISTRATOR);
    private static final List<MarkSheets.MarkSheet> SHEETS = MarkSheets.fresh(PackageManifestTest.building(60)).all();

    private static Entry entry(int n, SheetState state, Actor preparer, boolean reopens) {
        return new Entry(SHEETS.get(n), state, preparer == null ? null : preparer.userId(),
                preparer == null ? null : preparer.initials(), "0", 1, reopens);
    }

    @Test
    void aCheckerIsWaitedForByWhatOthersSubmittedAndApprovedNeverByTheirOwn() {
        assertThat(CheckQueue.waiting(entry(0, SheetState.SUBMITTED, ENGINEER, false), CHECKER)).contains(Waiting.TO_CHECK);
        assertThat(CheckQueue.waiting(entry(0, SheetState.RESUBMITTED, ENGINEER, false), CHECKER)).contains(Waiting.TO_CHECK);
        assertThat(CheckQueue.waiting(entry(0, SheetState.SUBMITTED, CHECKER, false), CHECKER)).isEmpty();
        assertThat(CheckQueue.waiting(entry(0, SheetState.SUBMITTED, CHECKER, false), OTHER_CHECKER)).contains(Waiting.TO_CHECK);
        assertThat(CheckQueue.waiting(entry(0, SheetState.APPROVED, ENGINEER, false), CHECKER)).contains(Waiting.TO_ISSUE);
        assertThat(CheckQueue.waiting(entry(0, SheetState.APPROVED, CHECKER, false), CHECKER)).as("never issues their own").isEmpty();
        assertThat(CheckQueue.waiting(entry(0, SheetState.PREPARING, null, false), CHECKER)).isEmpty();
    }

    @Test
    void thePreparerIsWaitedForByTheirReturnedSheetsAndAnEngineerByWhatIsNotYetSubmitted() {
        assertThat(CheckQueue.waiting(entry(0, SheetState.RETURNED, ENGINEER, false), ENGINEER)).contains(Waiting.RETURNED);
        assertThat(CheckQueue.waiting(entry(0, SheetState.RETURNED, CHECKER, false), CHECKER)).contains(Waiting.RETURNED);
        assertThat(CheckQueue.waiting(entry(0, SheetState.RETURNED, ENGINEER, false), new Actor(9, "OE", Role.ENGINEER))).isEmpty();
        assertThat(CheckQueue.waiting(entry(0, SheetState.PREPARING, null, false), ENGINEER)).contains(Waiting.TO_SUBMIT);
        assertThat(CheckQueue.waiting(entry(0, SheetState.ISSUED, ENGINEER, true), ENGINEER)).as("changed since issue").contains(Waiting.TO_SUBMIT);
        assertThat(CheckQueue.waiting(entry(0, SheetState.ISSUED, ENGINEER, false), ENGINEER)).isEmpty();
        assertThat(CheckQueue.waiting(entry(0, SheetState.SUBMITTED, ENGINEER, false), ENGINEER)).isEmpty();
        for (SheetState s : SheetState.values())
            assertThat(CheckQueue.waiting(entry(0, s, ENGINEER, false), ADMIN)).as("the administrator takes no part: " + s).isEqualTo(Optional.empty());
    }

    @Test
    void theFiltersNarrowTheListAndTheCountsIgnoreOnlyTheStateFilter() {
        List<Entry> all = List.of(entry(0, SheetState.SUBMITTED, ENGINEER, false), entry(1, SheetState.SUBMITTED, CHECKER, false),
                entry(2, SheetState.APPROVED, ENGINEER, false), entry(3, SheetState.PREPARING, null, false));
        assertThat(CheckQueue.select(all, new Filter("", "", null, "", true), CHECKER)).containsExactly(all.get(0), all.get(2));
        assertThat(CheckQueue.select(all, new Filter("", "", SheetState.SUBMITTED, "", false), CHECKER)).hasSize(2);
        assertThat(CheckQueue.select(all, new Filter("", "", null, "ck", false), CHECKER)).containsExactly(all.get(1));
        String level = all.get(0).level();
        assertThat(CheckQueue.select(all, new Filter(level, "", null, "", false), CHECKER)).allMatch(e -> e.level().equals(level));
        var counts = CheckQueue.counts(all, new Filter("", "", SheetState.APPROVED, "", false), CHECKER);
        assertThat(counts.get(SheetState.SUBMITTED)).isEqualTo(2);
        assertThat(counts.get(SheetState.APPROVED)).isEqualTo(1);
        assertThat(counts.get(SheetState.PREPARING)).isEqualTo(1);
        assertThat(counts.get(SheetState.ISSUED)).isZero();
        assertThat(CheckQueue.waitingCounts(all, CHECKER)).containsEntry(Waiting.TO_CHECK, 1).containsEntry(Waiting.TO_ISSUE, 1);
    }
}
