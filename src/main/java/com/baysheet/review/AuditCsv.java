package com.baysheet.review;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.io.StringWriter;
import java.util.List;

/**
 * The audit trail as CSV (RFC 4180: comma-separated, fields quoted, quotes doubled, CRLF line ends), one
 * entry at a time, so that the export streams however long the trail. The time is the chain's canonical UTC
 * instant and the last column the entry's chain hash, so the export can be re-verified on its own
 * ({@link AuditChain}). A field that a spreadsheet would read as a formula (starting with =, +, - or @) gets a
 * leading apostrophe, so that opening the export never runs what someone typed as a username or markup; the
 * apostrophe is not part of the hashed entry.
 */
public final class AuditCsv {
    static final String HEADER = "id,when (UTC),user,action,subject,detail,address,chain hash";

    private final Writer out;

    /** Writes the header line at once. */
    public AuditCsv(Writer out) {
        this.out = out;
        put(HEADER + "\r\n");
    }

    public void row(AuditEvent e) {
        put(e.id() + "," + field(AuditChain.instant(e.at())) + "," + field(e.actorUsername()) + "," + field(e.action())
                + "," + field(e.subject()) + "," + field(e.detail()) + "," + field(e.address()) + "," + field(e.hash()) + "\r\n");
    }

    public static String of(List<AuditEvent> events) {
        StringWriter w = new StringWriter();
        AuditCsv csv = new AuditCsv(w);
        events.forEach(csv::row);
        return w.toString();
    }

    private void put(String s) {
        try {
            out.write(s);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static String field(String s) {
        String t = s == null ? "" : s;
        if (!t.isEmpty() && "=+-@\t\r".indexOf(t.charAt(0)) >= 0) t = "'" + t;
        return '"' + t.replace("\"", "\"\"") + '"';
    }
}
