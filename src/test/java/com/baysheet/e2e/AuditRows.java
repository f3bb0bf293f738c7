package com.baysheet.e2e;

import java.util.ArrayList;
import java.util.List;

/** The administrator's audit export (RFC 4180 CSV: quoted fields, doubled quotes, CRLF) read back as rows, each one line of its fields. */
final class AuditRows {
    private AuditRows() {}

    /** Every row after the header, its fields joined by " | ". */
    static List<String> of(String csv) {
        List<String> rows = new ArrayList<>();
        List<String> fields = new ArrayList<>();
        StringBuilder field = new StringBuilder();
        boolean quoted = false;
        for (int i = 0; i < csv.length(); i++) {
            char ch = csv.charAt(i);
            if (quoted) {
                if (ch == '"' && i + 1 < csv.length() && csv.charAt(i + 1) == '"') {
                    field.append('"');
                    i++;
                } else if (ch == '"') quoted = false;
                else field.append(ch);
            } else if (ch == '"') quoted = true;
            else if (ch == ',') {
                fields.add(field.toString());
                field.setLength(0);
            } else if (ch == '\n') {
                fields.add(field.toString());
                field.setLength(0);
                rows.add(String.join(" | ", fields));
                fields.clear();
            } else if (ch != '\r') field.append(ch);
        }
        if (!field.isEmpty() || !fields.isEmpty()) {
            fields.add(field.toString());
            rows.add(String.join(" | ", fields));
        }
        return rows.isEmpty() ? rows : rows.subList(1, rows.size());
    }
}
