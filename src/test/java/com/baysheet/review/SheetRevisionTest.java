package com.baysheet.review;

import com.baysheet.review.ReviewRefused.FourEyes;
import com.baysheet.review.ReviewRefused.InputsChanged;
import com.baysheet.review.ReviewRefused.Markups;
import com.baysheet.review.ReviewRefused.NotPermitted;
import com.baysheet.review.ReviewRefused.WrongState;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.EnumSource;

import java.util.function.Function;

import static com.baysheet.review.Sheets.*;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class SheetRevisionTest {
    @Test
    void theWholeCheckRunsFromPreparedToSuperseded() {
        SheetRevision r = SheetRevision.opened(1);
        assertThat(r.state()).isEqualTo(SheetState.PREPARING);
        r = r.submit(ENGINEER, FP, DAY);
        assertThat(r.state()).isEqualTo(SheetState.SUBMITTED);
        assertThat(r.preparer().initials()).isEqualTo("EP");
        r = r.returnWithMarkups(CHECKER, 2);
        assertThat(r.state()).isEqualTo(SheetState.RETURNED);
        r = r.resubmit(ENGINEER, FP2, DAY);
        assertThat(r.state()).isEqualTo(SheetState.RESUBMITTED);
        assertThat(r.fingerprint()).isEqualTo(FP2);
        r = r.approve(CHECKER, DAY, 0, FP2);
        assertThat(r.state()).isEqualTo(SheetState.APPROVED);
        assertThat(r.approval().initials()).isEqualTo("CK");
        assertThat(r.approval().on()).isEqualTo(DAY);
        r = r.issue(SECOND_CHECKER, DAY, PDF, FP2, "First issue");
        assertThat(r.state()).isEqualTo(SheetState.ISSUED);
        assertThat(r.issue().pdfSha256()).isEqualTo(PDF);
        assertThat(r.outdatedBy(FP2)).isFalse();
        assertThat(r.outdatedBy(FP)).isTrue();
        assertThat(r.issue().description()).isEqualTo("First issue");
        SheetRevision next = r.reopen(FP);
        assertThat(next.number()).isEqualTo(2);
        assertThat(next.state()).isEqualTo(SheetState.PREPARING);
        r = r.supersededByNext();
        assertThat(r.state()).isEqualTo(SheetState.SUPERSEDED);
        assertThat(r.issue().pdfSha256()).as("the superseded copy keeps its hash").isEqualTo(PDF);
    }

    @Test
    void thePreparerMayNotReturnApproveOrMarkUpTheirOwnSheet() {
        SheetRevision own = SheetRevision.opened(1).submit(CHECKER, FP, DAY);
        assertThatThrownBy(() -> own.approve(CHECKER, DAY, 0, FP)).isInstanceOf(FourEyes.class)
                .hasMessageContaining("someone other than its preparer");
        assertThatThrownBy(() -> own.returnWithMarkups(CHECKER, 1)).isInstanceOf(FourEyes.class);
        assertThatThrownBy(() -> MarkupRules.add(own, CHECKER)).isInstanceOf(FourEyes.class);
        assertThat(own.approve(SECOND_CHECKER, DAY, 0, FP).state()).isEqualTo(SheetState.APPROVED);
    }

    @Test
    void thePreparerNeverIssuesTheirOwnSheetEvenOnceAnotherCheckerApprovedIt() {
        SheetRevision approved = SheetRevision.opened(1).submit(CHECKER, FP, DAY).approve(SECOND_CHECKER, DAY, 0, FP);
        assertThatThrownBy(() -> approved.issue(CHECKER, DAY, PDF, FP, "First issue")).isInstanceOf(FourEyes.class)
                .hasMessageContaining("issued by someone other than its preparer");
        assertThat(approved.issue(SECOND_CHECKER, DAY, PDF, FP, "First issue").state()).isEqualTo(SheetState.ISSUED);
    }

    @Test
    void onlyCheckersCheck() {
        for (Actor a : new Actor[]{OTHER_ENGINEER, ADMIN}) {
            assertThatThrownBy(() -> submitted().approve(a, DAY, 0, FP)).isInstanceOf(NotPermitted.class);
            assertThatThrownBy(() -> submitted().returnWithMarkups(a, 1)).isInstanceOf(NotPermitted.class);
            assertThatThrownBy(() -> approved().issue(a, DAY, PDF, FP, "First issue")).isInstanceOf(NotPermitted.class);
        }
    }

    @Test
    void anAdministratorDoesNotPrepare() {
        assertThatThrownBy(() -> SheetRevision.opened(1).submit(ADMIN, FP, DAY)).isInstanceOf(NotPermitted.class)
                .hasMessageContaining("administrator");
    }

    @Test
    void onlyThePreparerResubmits() {
        assertThatThrownBy(() -> returned().resubmit(OTHER_ENGINEER, FP, DAY)).isInstanceOf(NotPermitted.class)
                .hasMessageContaining("EP");
    }

    @Test
    void thePreparerTakesASubmittedSheetBackUntilACheckerActsOnIt() {
        SheetRevision back = submitted().takeBack(ENGINEER, 0);
        assertThat(back).isEqualTo(SheetRevision.opened(submitted().number()));
        assertThat(back.submit(ENGINEER, FP2, DAY).state()).isEqualTo(SheetState.SUBMITTED);
        assertThatThrownBy(() -> submitted().takeBack(CHECKER, 0)).isInstanceOf(NotPermitted.class).hasMessageContaining("EP");
        assertThatThrownBy(() -> submitted().takeBack(OTHER_ENGINEER, 0)).isInstanceOf(NotPermitted.class);
        assertThatThrownBy(() -> submitted().takeBack(ADMIN, 0)).isInstanceOf(NotPermitted.class);
        assertThatThrownBy(() -> submitted().takeBack(ENGINEER, 1)).isInstanceOf(Markups.class)
                .hasMessageContaining("a checker has begun: 1 markup(s)");
        assertThatThrownBy(() -> approved().takeBack(ENGINEER, 0)).isInstanceOf(WrongState.class).hasMessageContaining("approved");
    }

    @Test
    void returningNeedsAnOpenMarkupAndApprovingNeedsNone() {
        assertThatThrownBy(() -> submitted().returnWithMarkups(CHECKER, 0)).isInstanceOf(Markups.class);
        assertThatThrownBy(() -> submitted().approve(CHECKER, DAY, 1, FP)).isInstanceOf(Markups.class)
                .hasMessageContaining("1 markup(s) are still open");
    }

    @Test
    void inputsChangedSinceSubmissionBlockApprovalAndIssueButAllowResubmission() {
        assertThatThrownBy(() -> submitted().approve(CHECKER, DAY, 0, FP2)).isInstanceOf(InputsChanged.class);
        assertThatThrownBy(() -> approved().issue(CHECKER, DAY, PDF, FP2, "First issue")).isInstanceOf(InputsChanged.class);
        SheetRevision again = approved().resubmit(ENGINEER, FP2, DAY);
        assertThat(again.state()).isEqualTo(SheetState.RESUBMITTED);
        assertThat(again.approval()).as("the approval is void").isNull();
        assertThatThrownBy(() -> submitted().resubmit(ENGINEER, FP, DAY)).as("unchanged and not returned")
                .isInstanceOf(WrongState.class);
    }

    @ParameterizedTest
    @EnumSource(SheetState.class)
    void eachActionIsRefusedFromEveryStateThatDoesNotAllowIt(SheetState s) {
        SheetRevision r = in(s);
        expect(s == SheetState.PREPARING, () -> r.submit(ENGINEER, FP, DAY));
        expect(s.awaitingCheck(), () -> r.returnWithMarkups(CHECKER, 1));
        expect(s.awaitingCheck(), () -> r.approve(CHECKER, DAY, 0, FP));
        expect(s == SheetState.RETURNED, () -> r.resubmit(ENGINEER, FP, DAY));
        expect(s == SheetState.SUBMITTED, () -> r.takeBack(ENGINEER, 0));
        expect(s == SheetState.APPROVED, () -> r.issue(CHECKER, DAY, PDF, FP, "First issue"));
        expect(s == SheetState.ISSUED, () -> r.reopen(FP2));
        expect(s == SheetState.ISSUED, r::supersededByNext);
    }

    @Test
    void issuedWorkIsFrozen() {
        SheetRevision r = issued();
        assertThat(r.state().frozen()).isTrue();
        assertThatThrownBy(() -> r.resubmit(ENGINEER, FP2, DAY)).isInstanceOf(WrongState.class).hasMessageContaining("issued");
        assertThatThrownBy(() -> MarkupRules.add(r, SECOND_CHECKER)).isInstanceOf(WrongState.class);
        assertThatThrownBy(() -> MarkupRules.reply(r, ENGINEER)).isInstanceOf(WrongState.class);
        assertThatThrownBy(() -> r.reopen(FP)).as("unchanged since issue: no next revision").isInstanceOf(WrongState.class);
    }

    @Test
    void anIssueNeedsADescriptionOfWhatItChanges() {
        for (String blank : new String[]{null, "", "   "})
            assertThatThrownBy(() -> approved().issue(CHECKER, DAY, PDF, FP, blank)).isInstanceOf(com.baysheet.engine.InputError.class)
                    .hasMessageContaining("description");
        assertThatThrownBy(() -> approved().issue(CHECKER, DAY, PDF, FP, "x".repeat(SheetRevision.MAX_DESCRIPTION + 1)))
                .hasMessageContaining("description");
        assertThat(approved().issue(CHECKER, DAY, PDF, FP, "  Beam  load\n revised ").issue().description()).isEqualTo("Beam load revised");
    }

    @Test
    void anIssueNeedsAProperHash() {
        assertThatThrownBy(() -> approved().issue(CHECKER, DAY, "not a hash", FP, "First issue")).isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void revisionsCountFromOne() {
        assertThatThrownBy(() -> SheetRevision.opened(0)).hasMessageContaining("number");
    }

    private static void expect(boolean allowed, Runnable action) {
        if (allowed) action.run();
        else assertThatThrownBy(action::run).isInstanceOf(WrongState.class);
    }

    private static SheetRevision in(SheetState s) {
        Function<SheetState, SheetRevision> f = x -> switch (x) {
            case PREPARING -> SheetRevision.opened(1);
            case SUBMITTED -> submitted();
            case RETURNED -> returned();
            case RESUBMITTED -> returned().resubmit(ENGINEER, FP, DAY);
            case APPROVED -> approved();
            case ISSUED -> issued();
            case SUPERSEDED -> issued().supersededByNext();
        };
        return f.apply(s);
    }
}
