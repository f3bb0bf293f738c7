package com.baysheet.sheet;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** A copy not issued speaks as its office writes: a US check print, not for construction; an SI checking copy. */
class WordingTest {
    @Test
    void aUsCopyIsACheckPrintNotForConstructionAndNotToBeSealed() {
        String text = SheetFixtures.text(SheetRenderer.checking(MemberSheet.of(SheetFixtures.unchecked("Beam B1"), SheetFixtures.beam()), List.of()).bytes());
        assertThat(text).contains("CHECK PRINT — NOT FOR CONSTRUCTION").contains("not to be sealed").doesNotContain("CHECKING COPY");
    }

    @Test
    void anSiCopyKeepsItsCheckingCopyNotForSubmittal() {
        CalcRecord si = MemberCalculation.calculate(CalcContext.of(UnitSystem.SI), MemberInput.beam("Beam B1", MemberKind.INTERIOR_BEAM,
                new Support.Simple(9), List.of(new AreaStrip("office", 3, 0, 9, 3.1)))).record();
        String text = SheetFixtures.text(SheetRenderer.checking(MemberSheet.of(SheetFixtures.unchecked("Beam B1"), si), List.of()).bytes());
        assertThat(text).contains("CHECKING COPY — NOT FOR SUBMITTAL").contains("do not seal").doesNotContain("CHECK PRINT");
    }
}
