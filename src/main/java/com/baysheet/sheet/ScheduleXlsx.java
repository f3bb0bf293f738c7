package com.baysheet.sheet;

import com.baysheet.framing.schedule.LoadSchedule;
import org.dhatim.fastexcel.Workbook;
import org.dhatim.fastexcel.Worksheet;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.List;

/**
 * A load schedule as an XLSX workbook: a title row, the project line, the headings with units, then the rows,
 * every number a number cell in the heading's unit at full precision (a cell is left empty where the value
 * does not apply); the notes and the caution below. Text is written as text cells, never as formulas.
 */
public final class ScheduleXlsx {
    private ScheduleXlsx() {}

    /** Rows above the headings: the title, the project and the caution, and a blank row. */
    public static final int HEADING_ROW = 3;

    public static byte[] of(LoadSchedule s, String project) {
        ByteArrayOutputStream out = new ByteArrayOutputStream(16 * 1024);
        try (Workbook wb = new Workbook(out, "Baysheet", "1.0")) {
            Worksheet ws = wb.newWorksheet(sheetName(s.title()));
            ws.value(0, 0, s.title());
            ws.style(0, 0).bold().fontSize(12).set();
            ws.value(1, 0, project);
            ws.value(2, 0, SchedulePages.CAUTION);
            for (int c = 0; c < s.columns().size(); c++) {
                ws.value(HEADING_ROW, c, s.heading(c));
                ws.style(HEADING_ROW, c).bold().fillColor("EEEEEE").wrapText(true).set();
                ws.width(c, c < 2 ? 22 : 13);
            }
            for (int r = 0; r < s.rows().size(); r++) {
                List<Object> row = s.rows().get(r);
                for (int c = 0; c < row.size(); c++) {
                    int at = HEADING_ROW + 1 + r;
                    if (!s.columns().get(c).isNumber()) ws.value(at, c, (String) row.get(c));
                    else if (!Double.isNaN(s.shown(r, c))) ws.value(at, c, s.shown(r, c));
                }
            }
            int at = HEADING_ROW + 2 + s.rows().size();
            for (String n : s.notes()) ws.value(at++, 0, n);
            wb.finish();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }

    /** A worksheet name as spreadsheets accept it: at most 31 characters, none of : \ / ? * [ ]. */
    static String sheetName(String title) {
        String n = title.replaceAll("[:\\\\/?*\\[\\]]", " ").strip();
        return n.length() > 31 ? n.substring(0, 31) : n;
    }
}
