package com.baysheet.sheet;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;

/**
 * A PDF's text as lines, page by page, as PDFBox extracts it: a test asserts that a line says something, or that
 * the line after a title block's label holds a value, where a substring of the whole text would also match the
 * same characters inside a longer word, a number or another cell ("of 3" inside "of 30", a mark "B1" inside "B12").
 * The diagonal watermark comes out as scattered letters; a page's mark is read from its printed line instead.
 */
public final class PdfText {
    private PdfText() {}

    /** Each page's lines, trimmed, blank lines left out. */
    public static List<List<String>> pages(byte[] pdf) {
        try (PDDocument d = Loader.loadPDF(pdf)) {
            PDFTextStripper s = new PDFTextStripper();
            List<List<String>> out = new ArrayList<>();
            for (int p = 1; p <= d.getNumberOfPages(); p++) {
                s.setStartPage(p);
                s.setEndPage(p);
                out.add(lines(s.getText(d)));
            }
            return out;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Every line of the document, page after page. */
    public static List<String> lines(byte[] pdf) {
        return pages(pdf).stream().flatMap(List::stream).toList();
    }

    /** The lines of extracted text, trimmed, blank lines left out. */
    public static List<String> lines(String text) {
        return text.lines().map(String::strip).filter(l -> !l.isEmpty()).toList();
    }

    /** The words of a line, split on white space: a mark or initials are found as a word, not inside one. */
    public static List<String> words(String line) {
        return List.of(line.strip().split("\\s+"));
    }

    /** The line after the first line that is exactly {@code label} (a title block cell prints its label above its value). */
    public static String after(List<String> lines, String label) {
        int i = lines.indexOf(label);
        if (i < 0 || i + 1 >= lines.size()) throw new AssertionError("no line \"" + label + "\" followed by a value in " + lines);
        return lines.get(i + 1);
    }
}
