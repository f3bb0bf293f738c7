package com.baysheet.store;

import com.baysheet.framing.model.GridAxis;
import org.junit.jupiter.api.Test;

import java.util.Arrays;
import java.util.Collections;
import java.util.List;

import static com.baysheet.store.LineMatch.NEW;
import static org.assertj.core.api.Assertions.assertThat;

class LineMatchTest {
    /** Saved lines 1 2 3 4 with ids 10, 11, 12, 13. */
    private static final GridAxis SAVED = new GridAxis("x", List.of("1", "2", "3", "4"), List.of(30.0, 30.0, 30.0), List.of(10, 11, 12, 13));

    private static GridAxis requested(String names) {
        List<String> n = Arrays.asList(names.split(" "));
        return new GridAxis("x", n, Collections.nCopies(n.size() - 1, 10.0));
    }

    @Test
    void theSameNumberOfLinesIsTheSameLinesRenamedOrMoved() {
        assertThat(LineMatch.ids(SAVED, requested("A B C D"))).containsExactly(10, 11, 12, 13);
        assertThat(LineMatch.ids(SAVED, requested("1 3 2 4"))).containsExactly(10, 11, 12, 13);
    }

    @Test
    void anInsertedNameIsANewLineAndTheOthersKeepTheirIds() {
        assertThat(LineMatch.ids(SAVED, requested("1 2 2A 3 4"))).containsExactly(10, 11, NEW, 12, 13);
        assertThat(LineMatch.ids(SAVED, requested("0 1 2 3 4 5"))).containsExactly(NEW, 10, 11, 12, 13, NEW);
    }

    @Test
    void aMissingNameIsARemovedLine() {
        assertThat(LineMatch.ids(SAVED, requested("1 3 4"))).containsExactly(10, 12, 13);
        assertThat(LineMatch.ids(SAVED, requested("2 3"))).containsExactly(11, 12);
    }

    @Test
    void insertedAndRemovedInOneSaveAreMatchedInOrder() {
        assertThat(LineMatch.ids(SAVED, requested("1 X 3 4 5"))).containsExactly(10, NEW, 12, 13, NEW);
        // names out of order cannot all be the saved lines: the longest run in order is kept
        assertThat(LineMatch.ids(SAVED, requested("4 1 2 3 9"))).containsExactly(NEW, 10, 11, 12, NEW);
    }
}
