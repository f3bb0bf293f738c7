package com.baysheet.web;


import java.util.ArrayList;
import java.util.List;

/**
 * One line of a comma-separated table. A field that starts with a double quote is quoted (RFC 4180: "" inside is
 * one quote); anywhere else a quote is literal, so that 30'-6" can be written as it is.
 */
final class CsvLine {
    private CsvLine() {}

    static String[] split(String line) {
        List<String> out = new ArrayList<>();
        StringBuilder f = new StringBuilder();
        int i = 0;
        while (i <= line.length()) {
            f.setLength(0);
            while (i < line.length() && line.charAt(i) == ' ') i++;
            if (i < line.length() && line.charAt(i) == '"') {
                i++;
                while (i < line.length()) {
                    char ch = line.charAt(i++);
                    if (ch == '"' && i < line.length() && line.charAt(i) == '"') { f.append('"'); i++; }
                    else if (ch == '"') break;
                    else f.append(ch);
                }
                while (i < line.length() && line.charAt(i) != ',') i++;
            } else {
                while (i < line.length() && line.charAt(i) != ',') f.append(line.charAt(i++));
            }
            out.add(f.toString().strip());
            i++;
        }
        return out.toArray(String[]::new);
    }
}
