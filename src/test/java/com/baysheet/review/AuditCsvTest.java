package com.baysheet.review;

import org.junit.jupiter.api.Test;

import java.time.Instant;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

class AuditCsvTest {
    private static final Instant AT = Instant.parse("2026-03-02T08:00:00Z");

    @Test
    void quotesEveryFieldAndDoublesQuotes() {
        String csv = AuditCsv.of(List.of(new AuditEvent(7, AT, 1L, "jo", "markup", "B-1", "say \"why\", please", "127.0.0.1", "ab12")));
        assertThat(csv).isEqualTo("id,when (UTC),user,action,subject,detail,address,chain hash\r\n"
                + "7,\"2026-03-02T08:00:00.000000Z\",\"jo\",\"markup\",\"B-1\",\"say \"\"why\"\", please\",\"127.0.0.1\",\"ab12\"\r\n");
    }

    @Test
    void neutralizesWhatASpreadsheetWouldRun() {
        assertThat(AuditCsv.field("=HYPERLINK(\"x\")")).isEqualTo("\"'=HYPERLINK(\"\"x\"\")\"");
        assertThat(AuditCsv.field("-2+3")).startsWith("\"'-");
        assertThat(AuditCsv.field("plain")).isEqualTo("\"plain\"");
    }
}
