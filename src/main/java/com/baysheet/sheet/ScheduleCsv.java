package com.baysheet.sheet;

import com.baysheet.framing.schedule.LoadSchedule;

import java.math.BigDecimal;

/**
 * A load schedule as CSV (RFC 4180: fields quoted where they hold text, quotes doubled, CRLF line ends), with
 * the unit in each heading and every number in that unit at full precision, so that a spreadsheet reads the
 * same values as the records. A text field that a spreadsheet would take for a formula (=, +, - or @ first,
 * as a grid name typed by a user may be) gets a leading apostrophe.
 */
public final class ScheduleCsv {
    private ScheduleCsv() {}

    public static String of(LoadSchedule s) {
        StringBuilder b = new StringBuilder();
        for (int c = 0; c < s.columns().size(); c++) b.append(c == 0 ? "" : ",").append(text(s.heading(c)));
        b.append("\r\n");
        for (int r = 0; r < s.rows().size(); r++) {
            for (int c = 0; c < s.columns().size(); c++) {
                if (c > 0) b.append(',');
                b.append(s.columns().get(c).isNumber() ? number(s.shown(r, c)) : text((String) s.rows().get(r).get(c)));
            }
            b.append("\r\n");
        }
        return b.toString();
    }

    /** The shortest decimal that reads back as the same double; empty where the value does not apply. */
    static String number(double v) {
        if (Double.isNaN(v)) return "";
        return v == 0 ? "0" : BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }

    static String text(String s) {
        String t = s == null ? "" : s;
        if (!t.isEmpty() && "=+-@\t\r".indexOf(t.charAt(0)) >= 0) t = "'" + t;
        return '"' + t.replace("\"", "\"\"") + '"';
    }
}
