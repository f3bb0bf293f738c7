package com.baysheet.review;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class MarkupTargetTest {
    private final CalcRecord record = Sheets.record(20, 40);

    @Test
    void targetsAnInputAStepOrTheWholeSheet() {
        assertThat(MarkupTarget.parse("target", "input:span", record)).isEqualTo(new MarkupTarget(MarkupTarget.Kind.INPUT, "span"));
        assertThat(MarkupTarget.parse("target", "step:K_LL", record).sheetRef()).isEqualTo("K_LL");
        assertThat(MarkupTarget.parse("target", "sheet", record)).isEqualTo(MarkupTarget.SHEET);
        assertThat(MarkupTarget.parse("target", "", record)).isEqualTo(MarkupTarget.SHEET);
    }

    @Test
    void codesRoundTrip() {
        for (String code : new String[]{"sheet", "input:span", "step:K_LL"})
            assertThat(MarkupTarget.decode(code).code()).isEqualTo(code);
    }

    @Test
    void refusesWhatTheSheetDoesNotHave() {
        assertThatThrownBy(() -> MarkupTarget.parse("target", "step:nope", record)).isInstanceOf(InputError.class)
                .hasMessageStartingWith("target:").hasMessageContaining("names no input or step");
        assertThatThrownBy(() -> MarkupTarget.parse("target", "input:K_LL", record)).isInstanceOf(InputError.class);
        assertThatThrownBy(() -> MarkupTarget.parse("target", "'; DROP TABLE markup; --", record)).isInstanceOf(InputError.class);
    }
}
