package com.baysheet.review;

import com.baysheet.review.ReviewRefused.FourEyes;
import com.baysheet.review.ReviewRefused.Markups;
import com.baysheet.review.ReviewRefused.NotPermitted;
import com.baysheet.review.ReviewRefused.WrongState;
import org.junit.jupiter.api.Test;

import java.util.List;

import static com.baysheet.review.Sheets.*;
import static org.assertj.core.api.Assertions.assertThatCode;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class MarkupRulesTest {
    private static final MarkupNote OPEN = new MarkupNote(1, MarkupTarget.SHEET, 2, "CK", "Check the span", false, List.of(), 1);
    private static final MarkupNote RESOLVED = new MarkupNote(1, MarkupTarget.SHEET, 2, "CK", "Check the span", true, List.of(), 2);

    @Test
    void aCheckerOtherThanThePreparerMarksUpASheetAwaitingItsCheck() {
        assertThatCode(() -> MarkupRules.add(submitted(), CHECKER)).doesNotThrowAnyException();
        assertThatThrownBy(() -> MarkupRules.add(submitted(), OTHER_ENGINEER)).isInstanceOf(NotPermitted.class);
        assertThatThrownBy(() -> MarkupRules.add(SheetRevision.opened(1), CHECKER)).isInstanceOf(WrongState.class);
        assertThatThrownBy(() -> MarkupRules.add(returned(), CHECKER)).as("returned: the preparer's turn").isInstanceOf(WrongState.class);
        assertThatThrownBy(() -> MarkupRules.add(approved(), CHECKER)).isInstanceOf(WrongState.class);
    }

    @Test
    void thePreparerAndCheckersReplyWhileTheCheckIsOpen() {
        assertThatCode(() -> MarkupRules.reply(returned(), ENGINEER)).doesNotThrowAnyException();
        assertThatCode(() -> MarkupRules.reply(submitted(), CHECKER)).doesNotThrowAnyException();
        assertThatThrownBy(() -> MarkupRules.reply(returned(), OTHER_ENGINEER)).isInstanceOf(NotPermitted.class);
        assertThatThrownBy(() -> MarkupRules.reply(returned(), ADMIN)).isInstanceOf(NotPermitted.class);
        assertThatThrownBy(() -> MarkupRules.reply(approved(), ENGINEER)).isInstanceOf(WrongState.class);
    }

    @Test
    void onlyACheckerOtherThanThePreparerResolvesAndReopens() {
        SheetRevision r = returned().resubmit(ENGINEER, FP, DAY);
        assertThatCode(() -> MarkupRules.resolve(r, CHECKER, OPEN)).doesNotThrowAnyException();
        assertThatThrownBy(() -> MarkupRules.resolve(r, ENGINEER, OPEN)).isInstanceOf(NotPermitted.class);
        SheetRevision own = SheetRevision.opened(1).submit(CHECKER, FP, DAY);
        assertThatThrownBy(() -> MarkupRules.resolve(own, CHECKER, OPEN)).isInstanceOf(FourEyes.class);
        assertThatThrownBy(() -> MarkupRules.resolve(r, CHECKER, RESOLVED)).isInstanceOf(Markups.class);
        assertThatCode(() -> MarkupRules.reopen(r, CHECKER, RESOLVED)).doesNotThrowAnyException();
        assertThatThrownBy(() -> MarkupRules.reopen(r, CHECKER, OPEN)).isInstanceOf(Markups.class);
        assertThatThrownBy(() -> MarkupRules.resolve(issued(), CHECKER, OPEN)).isInstanceOf(WrongState.class);
    }

    @Test
    void markupTextIsRequiredAndBounded() {
        assertThatThrownBy(() -> MarkupNote.text("text", "  ")).hasMessageStartingWith("text:");
        assertThatThrownBy(() -> MarkupNote.text("text", "x".repeat(MarkupNote.MAX_TEXT + 1))).hasMessageContaining("at most");
        assertThatCode(() -> MarkupNote.text("text", "<script>alert(1)</script>")).as("kept as text, escaped when shown")
                .doesNotThrowAnyException();
    }
}
