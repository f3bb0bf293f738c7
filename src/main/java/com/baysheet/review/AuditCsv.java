package com.baysheet.review;

import java.time.format.DateTimeFormatter;
import java.util.List;

/**
 * The audit trail as CSV (RFC 4180: comma-separated, fields quoted, quotes doubled, CRLF line ends). A
 * field that a spreadsheet would read as a formula (starting with =, +, - or @) gets a leading apostrophe,
 * so that opening the export never runs what someone typed as a username or markup.
 */
public final class AuditCsv {
    private static final String HEADER = "id,when (UTC),user,action,subject,detail,address";

    private AuditCsv() {}

    public static String of(List<AuditEvent> events) {
        StringBuilder b = new StringBuilder(HEADER).append("\r\n");
        for (AuditEvent e : events) {
            b.append(e.id()).append(',')
                    .append(field(DateTimeFormatter.ISO_INSTANT.format(e.at()))).append(',')
                    .append(field(e.actorUsername())).append(',')
                    .append(field(e.action())).append(',')
                    .append(field(e.subject())).append(',')
                    .append(field(e.detail())).append(',')
                    .append(field(e.address())).append("\r\n");
        }
        return b.toString();
    }

    static String field(String s) {
        String t = s == null ? "" : s;
        if (!t.isEmpty() && "=+-@\t\r".indexOf(t.charAt(0)) >= 0) t = "'" + t;
        return '"' + t.replace("\"", "\"\"") + '"';
    }
}
