package com.baysheet.web;

import com.baysheet.engine.record.RecordJson;
import com.baysheet.framing.TakeDown;
import com.baysheet.framing.schedule.ColumnSchedules;
import com.baysheet.framing.schedule.MemberSchedule;
import com.baysheet.sheet.ScheduleCsv;
import com.baysheet.store.Results;
import com.fasterxml.jackson.databind.JsonNode;
import org.dhatim.fastexcel.reader.ReadableWorkbook;
import org.dhatim.fastexcel.reader.Row;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import java.io.ByteArrayInputStream;
import java.net.URI;
import java.net.http.HttpClient;
import java.net.http.HttpRequest;
import java.net.http.HttpResponse;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The load summaries of the demo: the page, the CSV and XLSX downloads and the API, all from the same records. */
class SchedulePagesTest {
    @RegisterExtension
    static final TestServer server = TestServer.perClass();
    static Results.Computed alder() { return server.alderResults(); }

    static String base() { return "/projects/" + server.alderId(); }

    @Test
    void thePageShowsTheThreeSchedulesWithTheirDownloadsAndTheCaution() {
        HttpResponse<String> r = server.get(base() + "/schedules");
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(r.body()).contains("Column load schedule", "Foundation reactions", "Member schedule", "D (kip)",
                "schedules/column-loads.csv", "schedules/members.xlsx", "licensed engineer");
        assertThat(server.get("/projects/987654/schedules").statusCode()).isEqualTo(404);
    }

    @Test
    void theCsvIsTheScheduleOfTheCurrentRecordsAsAnAttachment() {
        HttpResponse<String> r = server.get(base() + "/schedules/foundation-reactions.csv");
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(r.headers().firstValue("Content-Type").orElse("")).startsWith("text/csv");
        assertThat(r.headers().firstValue("Content-Disposition").orElse("")).contains("attachment", "foundation-reactions.csv");
        assertThat(r.body()).isEqualTo(ScheduleCsv.of(ColumnSchedules.foundations(alder().derived())));
    }

    @Test
    void theXlsxOpensWithTheMembersAsNumberCells() throws Exception {
        HttpResponse<byte[]> r = server.engineer.getBytes(base() + "/schedules/members.xlsx");
        assertThat(r.statusCode()).isEqualTo(200);
        assertThat(r.headers().firstValue("Content-Type").orElse("")).contains("spreadsheetml");
        var s = MemberSchedule.of(alder().derived());
        try (ReadableWorkbook wb = new ReadableWorkbook(new ByteArrayInputStream(r.body()))) {
            List<Row> rows = wb.getFirstSheet().read();
            Row first = rows.get(com.baysheet.sheet.ScheduleXlsx.HEADING_ROW + 1);
            int m = s.column("M_u+");
            assertThat(first.getCellAsString(1)).hasValue((String) s.rows().get(0).get(1));
            assertThat(first.getCellAsNumber(m).orElseThrow().doubleValue()).isEqualTo(s.shown(0, m));
        }
    }

    @Test
    void theApiGivesTheColumnLoadsInBaseUnitsFromTheTakeDownRows() throws Exception {
        HttpResponse<String> r = server.get("/api" + base() + "/schedules/column-loads");
        assertThat(r.statusCode()).isEqualTo(200);
        JsonNode j = RecordJson.mapper().readTree(r.body());
        assertThat(j.path("key").asText()).isEqualTo("column-loads");
        assertThat(j.path("columns").get(2).path("heading").asText()).isEqualTo("D");
        assertThat(j.path("columns").get(2).path("unit").asText()).isEqualTo("lb");
        TakeDown t = alder().derived().takeDowns().get(0);
        assertThat(j.path("rows").get(0).get(2).asDouble()).isEqualTo(t.rows().get(0).dead());
        JsonNode all = RecordJson.mapper().readTree(server.get("/api" + base() + "/schedules").body());
        assertThat(all).hasSize(3);
        assertThat(server.get("/api/projects/987654/schedules/members").statusCode()).isEqualTo(404);
    }
}
