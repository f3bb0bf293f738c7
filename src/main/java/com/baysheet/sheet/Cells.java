package com.baysheet.sheet;

import com.lowagie.text.Chunk;
import com.lowagie.text.Element;
import com.lowagie.text.Font;
import com.lowagie.text.Paragraph;
import com.lowagie.text.Phrase;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;

import java.awt.Color;

/** Table cells and headings in the sheets' one style: thin rules, small type, a grey head row. */
final class Cells {
    private Cells() {}

    static PdfPTable table(float... widths) {
        PdfPTable t = new PdfPTable(widths);
        t.setWidthPercentage(100);
        t.setSpacingBefore(4);
        t.setSpacingAfter(4);
        return t;
    }

    static PdfPCell text(String s, Font f) { return cell(new Phrase(s, f), Element.ALIGN_LEFT); }

    static PdfPCell right(String s, Font f) { return cell(new Phrase(s, f), Element.ALIGN_RIGHT); }

    static PdfPCell head(String s, Fonts fonts) {
        PdfPCell c = cell(new Phrase(s, fonts.smallBold()), Element.ALIGN_LEFT);
        c.setBackgroundColor(Fonts.SHADE);
        return c;
    }

    static PdfPCell cell(Phrase p, int align) {
        PdfPCell c = new PdfPCell(p);
        c.setHorizontalAlignment(align);
        c.setVerticalAlignment(Element.ALIGN_TOP);
        c.setBorderWidth(0.3f);
        c.setBorderColor(Fonts.RULE);
        c.setPaddingTop(1.5f);
        c.setPaddingBottom(3f);
        c.setPaddingLeft(3f);
        c.setPaddingRight(3f);
        return c;
    }

    static PdfPCell blank(Fonts fonts) {
        PdfPCell c = new PdfPCell(new Phrase("", fonts.body()));
        c.setBorder(Rectangle.NO_BORDER);
        return c;
    }

    static PdfPCell shaded(PdfPCell c, Color bg) {
        c.setBackgroundColor(bg);
        return c;
    }

    /**
     * A section title as the table's first row, so that it is never left alone at the foot of a page;
     * call before any other cell and count it in the header rows.
     */
    static void title(PdfPTable t, String s, Fonts fonts) {
        PdfPCell c = new PdfPCell(new Phrase(s, fonts.heading()));
        c.setColspan(t.getNumberOfColumns());
        c.setBorder(Rectangle.NO_BORDER);
        c.setPaddingLeft(0);
        c.setPaddingBottom(3);
        t.addCell(c);
    }

    static Paragraph line(String s, Font f) {
        Paragraph p = new Paragraph(s, f);
        p.setLeading(f.getSize() * 1.3f);
        return p;
    }
}
