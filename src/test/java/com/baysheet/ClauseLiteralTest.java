package com.baysheet;

import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Clause numbers are edition data (editions.json): a label typed into a Java string literal or a template is
 * wrong for every other edition (ASCE 7-10 numbers its K_LL table 4-2). This scans the Java string literals
 * under src/main/java and the text and attributes of templates/ (comments may cite clauses) for anything
 * shaped like a clause reference.
 */
class ClauseLiteralTest {
    /** Table 4.7-1, Eq. 4.7-1, Fig. 7.4-1, a section number 4.7.2, a commentary section C4.7. */
    static final Pattern CLAUSE = Pattern.compile(
            "Table\\s*\\d+(\\.\\d+)?-\\d+|Eq\\.\\s?\\d+(\\.\\d+)?-\\d+|Fig\\.\\s?\\d+(\\.\\d+)?-\\d+"
                    + "|(?<![\\w.])\\d{1,2}\\.\\d+\\.\\d+(?![\\w.])|\\bC\\d+\\.\\d+");

    /**
     * What matches the pattern but is no clause. Keep this tiny: each entry is an exact substring of the
     * offending text, with the reason it is not a clause.
     */
    static final List<String> NOT_CLAUSES = List.of();

    @Test
    void noClauseLabelInJavaLiteralsOrTemplates() throws IOException {
        List<String> hits = new ArrayList<>();
        try (Stream<Path> files = Files.walk(Path.of("src/main/java"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".java")).sorted().toList())
                hits.addAll(scan(f.toString(), javaLiterals(Files.readString(f))));
        }
        try (Stream<Path> files = Files.walk(Path.of("templates"))) {
            for (Path f : files.filter(p -> p.toString().endsWith(".html")).sorted().toList())
                hits.addAll(scan(f.toString(), htmlText(Files.readString(f))));
        }
        assertThat(hits).as("clause labels belong in editions.json, not in code or templates").isEmpty();
    }

    @Test
    void scannerCatchesAPlantedLiteralAndIgnoresComments() {
        String java = """
                class X {
                    // ASCE 7-16 Eq. 4.7-1 in a comment is fine
                    /* Table 4.7-1, 4.7.2
                     * C4.7 */
                    String ok = "ASCE 7-16"; String bad = "see Table 4.7-1";
                    char q = '"'; String s = "a \\" 7.3.1";
                }
                """;
        assertThat(scan("X.java", javaLiterals(java))).containsExactly("X.java:5: Table 4.7-1", "X.java:6: 7.3.1");
        String html = "<p>Kind</p>\n<!-- Table 4.7-1 -->\n<label title=\"Eq. 7.3-1\">x</label>\n<p>C4.7</p>";
        assertThat(scan("t.html", htmlText(html))).containsExactly("t.html:3: Eq. 7.3-1", "t.html:4: C4.7");
        assertThat(scan("v", "version 1.2 and ASCE 7-10 and 3.5 in")).isEmpty();
    }

    /** The hits in text whose non-scanned parts are blanked (newlines kept, so line numbers hold). */
    static List<String> scan(String file, String text) {
        List<String> hits = new ArrayList<>();
        String[] lines = text.split("\n", -1);
        for (int i = 0; i < lines.length; i++) {
            Matcher m = CLAUSE.matcher(lines[i]);
            while (m.find()) {
                String line = lines[i];
                if (NOT_CLAUSES.stream().noneMatch(line::contains)) hits.add(file + ":" + (i + 1) + ": " + m.group());
            }
        }
        return hits;
    }

    /** The source with everything but the contents of string literals and text blocks blanked to spaces. */
    static String javaLiterals(String src) {
        StringBuilder out = new StringBuilder(src.length());
        int i = 0, n = src.length();
        while (i < n) {
            char c = src.charAt(i);
            if (src.startsWith("//", i)) {
                while (i < n && src.charAt(i) != '\n') { out.append(' '); i++; }
            } else if (src.startsWith("/*", i)) {
                int end = src.indexOf("*/", i + 2);
                end = end < 0 ? n : end + 2;
                blank(src, i, end, out);
                i = end;
            } else if (src.startsWith("\"\"\"", i)) {
                int end = src.indexOf("\"\"\"", i + 3);
                end = end < 0 ? n : end;
                out.append("   ").append(src, i + 3, end);
                i = Math.min(n, end + 3);
                out.append("   ", 0, i - end);
            } else if (c == '"' || c == '\'') {
                out.append(' ');
                i++;
                while (i < n && src.charAt(i) != c && src.charAt(i) != '\n') {
                    if (src.charAt(i) == '\\' && i + 1 < n) { out.append(c == '"' ? "  " : "  "); i += 2; continue; }
                    out.append(c == '"' ? src.charAt(i) : ' ');
                    i++;
                }
                if (i < n && src.charAt(i) == c) { out.append(' '); i++; }
            } else {
                out.append(c == '\n' ? '\n' : ' ');
                i++;
            }
        }
        return out.toString();
    }

    /** The template with its comments blanked: text and attribute values stay. */
    static String htmlText(String html) {
        StringBuilder out = new StringBuilder(html.length());
        int i = 0;
        while (i < html.length()) {
            int start = html.indexOf("<!--", i);
            if (start < 0) { out.append(html, i, html.length()); break; }
            out.append(html, i, start);
            int end = html.indexOf("-->", start + 4);
            end = end < 0 ? html.length() : end + 3;
            blank(html, start, end, out);
            i = end;
        }
        return out.toString();
    }

    private static void blank(String s, int from, int to, StringBuilder out) {
        for (int k = from; k < to; k++) out.append(s.charAt(k) == '\n' ? '\n' : ' ');
    }
}
