package com.baysheet.sheet;

import com.lowagie.text.pdf.PdfContentByte;

/** Small pen strokes shared by the load diagram and the key plan. */
final class Drawing {
    private Drawing() {}

    static void line(PdfContentByte cb, float x1, float y1, float x2, float y2) {
        cb.moveTo(x1, y1);
        cb.lineTo(x2, y2);
        cb.stroke();
    }

    /** An arrow from (x1, y1) with its head at (x2, y2). */
    static void arrow(PdfContentByte cb, float x1, float y1, float x2, float y2, float head) {
        line(cb, x1, y1, x2, y2);
        double a = Math.atan2(y2 - y1, x2 - x1);
        float hx1 = (float) (x2 - head * Math.cos(a - 0.4)), hy1 = (float) (y2 - head * Math.sin(a - 0.4));
        float hx2 = (float) (x2 - head * Math.cos(a + 0.4)), hy2 = (float) (y2 - head * Math.sin(a + 0.4));
        cb.moveTo(x2, y2);
        cb.lineTo(hx1, hy1);
        cb.lineTo(hx2, hy2);
        cb.closePath();
        cb.fill();
    }

    /** A dimension line with end ticks; the label is placed by the caller. */
    static void dimension(PdfContentByte cb, float x1, float x2, float y) {
        line(cb, x1, y, x2, y);
        line(cb, x1, y - 3, x1, y + 3);
        line(cb, x2, y - 3, x2, y + 3);
        line(cb, x1 - 2, y - 2, x1 + 2, y + 2);
        line(cb, x2 - 2, y - 2, x2 + 2, y + 2);
    }
}
