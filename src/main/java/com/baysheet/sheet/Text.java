package com.baysheet.sheet;

import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;

import java.awt.Color;

/** Placing single lines of text directly on a page or a drawing, shortened to fit where room is fixed. */
final class Text {
    private Text() {}

    static void show(PdfContentByte cb, BaseFont font, float size, Color color, int align, String text, float x, float y) {
        show(cb, font, size, color, align, text, x, y, 0f);
    }

    static void show(PdfContentByte cb, BaseFont font, float size, Color color, int align, String text, float x, float y, float rotation) {
        cb.beginText();
        cb.setFontAndSize(font, size);
        cb.setColorFill(color);
        cb.showTextAligned(align, text, x, y, rotation);
        cb.endText();
    }

    /** The text, cut with an ellipsis so that it fits {@code width} points. */
    static String fit(String text, BaseFont font, float size, float width) {
        if (font.getWidthPoint(text, size) <= width) return text;
        String s = text;
        while (!s.isEmpty() && font.getWidthPoint(s + "…", size) > width) s = s.substring(0, s.length() - 1);
        return s.stripTrailing() + "…";
    }
}
