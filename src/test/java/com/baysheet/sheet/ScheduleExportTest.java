package com.baysheet.sheet;

import com.baysheet.framing.Derived;
import com.baysheet.framing.MemberLabels;
import com.baysheet.framing.schedule.MarkSchedule;
import com.baysheet.review.MarkSheets;
import com.baysheet.framing.schedule.ColumnSchedules;
import com.baysheet.framing.schedule.LoadSchedule;
import com.baysheet.framing.schedule.MemberSchedule;
import org.dhatim.fastexcel.reader.ReadableWorkbook;
import org.dhatim.fastexcel.reader.Row;
import org.junit.jupiter.api.Test;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The CSV and XLSX downloads read back to the very values of the take-downs and the records. */
class ScheduleExportTest {
    static final Derived D = SheetFixtures.building();
    static final MemberLabels MARKS = MarkSheets.fresh(D).labels();
    static final List<LoadSchedule> ALL = List.of(ColumnSchedules.loads(D), ColumnSchedules.foundations(D), MemberSchedule.of(D),
            ColumnSchedules.loads(D, t -> true, MARKS), MarkSchedule.of(D, MARKS), MemberSchedule.of(D, MARKS));

    @Test
    void csvReadsBackToTheRecordValuesInTheHeadingsUnits() {
        for (LoadSchedule s : ALL) {
            List<List<String>> csv = parse(ScheduleCsv.of(s));
            assertThat(csv.get(0)).hasSize(s.columns().size()).first().isEqualTo(s.heading(0));
            assertThat(csv).hasSize(s.rows().size() + 1);
            for (int r = 0; r < s.rows().size(); r++)
                for (int c = 0; c < s.columns().size(); c++) {
                    String cell = csv.get(r + 1).get(c);
                    Object value = s.rows().get(r).get(c);
                    if (!s.columns().get(c).isNumber()) assertThat(cell).isEqualTo(value);
                    else if (Double.isNaN((Double) value)) assertThat(cell).isEmpty();
                    else assertThat(s.columns().get(c).quantity().unit(s.system()).toBase(Double.parseDouble(cell)))
                            .as("%s row %d %s", s.title(), r, s.heading(c)).isCloseTo((Double) value, within(1e-9 * Math.max(1, Math.abs((Double) value))));
                }
        }
    }

    @Test
    void xlsxReadsBackToTheRecordValuesAsNumberCells() throws IOException {
        for (LoadSchedule s : ALL) {
            byte[] book = ScheduleXlsx.of(s, "Elm Street Offices, job 2024-117");
            try (ReadableWorkbook wb = new ReadableWorkbook(new ByteArrayInputStream(book))) {
                List<Row> rows = wb.getFirstSheet().read();
                assertThat(rows.get(0).getCellAsString(0)).hasValue(s.title());
                assertThat(rows.get(2).getCellAsString(0).orElseThrow()).contains("licensed engineer");
                Row head = rows.get(ScheduleXlsx.HEADING_ROW);
                for (int c = 0; c < s.columns().size(); c++) assertThat(head.getCellAsString(c)).hasValue(s.heading(c));
                for (int r = 0; r < s.rows().size(); r++) {
                    Row row = rows.get(ScheduleXlsx.HEADING_ROW + 1 + r);
                    for (int c = 0; c < s.columns().size(); c++) {
                        Object value = s.rows().get(r).get(c);
                        if (!s.columns().get(c).isNumber()) assertThat(row.getCellAsString(c).orElse("")).isEqualTo(value);
                        else if (Double.isNaN((Double) value)) assertThat(row.getOptionalCell(c).map(x -> x.getRawValue()).orElse(null)).isNull();
                        else {
                            BigDecimal n = row.getCellAsNumber(c).orElseThrow();
                            assertThat(n.doubleValue()).as("%s row %d %s", s.title(), r, s.heading(c)).isEqualTo(s.shown(r, c));
                        }
                    }
                }
            }
        }
    }

    @Test
    void aCsvTextFieldThatASpreadsheetWouldRunIsDefused() {
        assertThat(ScheduleCsv.text("=HYPERLINK(\"x\")")).isEqualTo("\"'=HYPERLINK(\"\"x\"\")\"");
        assertThat(ScheduleCsv.text("-A/1")).isEqualTo("\"'-A/1\"");
        assertThat(ScheduleCsv.number(0.1 + 0.2)).isEqualTo("0.30000000000000004");
    }

    /** RFC 4180 fields: quoted or bare, doubled quotes inside quotes, CRLF rows. */
    static List<List<String>> parse(String csv) {
        List<List<String>> out = new ArrayList<>();
        for (String line : csv.split("\r\n")) {
            List<String> row = new ArrayList<>();
            StringBuilder f = new StringBuilder();
            boolean quoted = false;
            for (int i = 0; i < line.length(); i++) {
                char ch = line.charAt(i);
                if (quoted && ch == '"' && i + 1 < line.length() && line.charAt(i + 1) == '"') { f.append('"'); i++; }
                else if (ch == '"') quoted = !quoted;
                else if (ch == ',' && !quoted) { row.add(f.toString()); f.setLength(0); }
                else f.append(ch);
            }
            row.add(f.toString());
            out.add(row);
        }
        return out;
    }
}
