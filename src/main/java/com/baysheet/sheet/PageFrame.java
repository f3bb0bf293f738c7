package com.baysheet.sheet;

import com.baysheet.framing.model.Submittal;
import com.lowagie.text.Document;
import com.lowagie.text.Element;
import com.lowagie.text.Rectangle;
import com.lowagie.text.pdf.BaseFont;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfPageEventHelper;
import com.lowagie.text.pdf.PdfTemplate;
import com.lowagie.text.pdf.PdfWriter;

import java.awt.Color;

/**
 * Draws what every page carries: the title block at the head, the footer with "Page n of N" and the short
 * disclaimer, and on a checking copy the mark across the page. N is not known until the last page, so it
 * is written into two small templates when the document closes; streaming is not held up by it.
 */
final class PageFrame extends PdfPageEventHelper {
    static final float MARGIN = 36f;
    static final float BLOCK_HEIGHT = 64f;
    static final float FOOTER = 22f;

    private final Fonts fonts;
    private final boolean checking;
    /** The document's own title block: what the band says this copy is. */
    private final SheetHeader document;
    private SheetHeader header;
    private String context = "";
    private PdfTemplate totalInBlock;
    private PdfTemplate totalInFooter;
    private int pages;
    private Submittal site = Submittal.NONE;
    private Wording wording = Wording.SI;

    PageFrame(Fonts fonts, SheetHeader header, boolean checking) {
        this.fonts = fonts;
        this.header = header;
        this.document = header;
        this.checking = checking;
    }

    /** The title block for the pages that follow (a package changes it sheet by sheet). */
    void show(SheetHeader h, String contextLine) {
        this.header = h;
        this.context = contextLine == null ? "" : contextLine;
    }

    int pages() { return pages; }

    /** The words a copy that is not issued marks itself with. */
    void wording(Wording w) { this.wording = w; }

    Wording wording() { return wording; }

    /** The site address and engineer of record every title block of the document carries. */
    void site(Submittal s) { this.site = s == null ? Submittal.NONE : s; }

    @Override
    public void onOpenDocument(PdfWriter writer, Document document) {
        totalInBlock = writer.getDirectContent().createTemplate(40, 12);
        totalInFooter = writer.getDirectContent().createTemplate(40, 10);
    }

    @Override
    public void onEndPage(PdfWriter writer, Document document) {
        pages++;
        Rectangle page = writer.getPageSize();   // the page ending, which a plan sheet may have turned to landscape
        PdfContentByte cb = writer.getDirectContent();
        if (checking) watermark(writer.getDirectContentUnder(), page);
        new TitleBlock(fonts, cb, header, context, status(), site, wording.mark)
                .draw(MARGIN, page.getHeight() - MARGIN - BLOCK_HEIGHT, page.getWidth() - 2 * MARGIN, BLOCK_HEIGHT, pages, totalInBlock);
        footer(cb, page);
    }

    /**
     * The band's status, about the whole copy: null on a checking copy (the red mark says it), otherwise the
     * issue; a page of a package about something else (a member, the index) names the package it was issued in.
     */
    private String status() {
        if (checking) return null;
        String in = header.subject().equals(document.subject()) ? "" : document.subject() + " · ";
        return "ISSUED · " + in + "Rev " + document.revision() + " · " + document.issueDate();
    }

    @Override
    public void onCloseDocument(PdfWriter writer, Document document) {
        write(totalInBlock, fonts.bold, 9f, 2f);
        write(totalInFooter, fonts.regular, 6.5f, 1.5f);
    }

    private void write(PdfTemplate t, BaseFont font, float size, float y) {
        t.beginText();
        t.setFontAndSize(font, size);
        t.setColorFill(Fonts.INK);
        t.setTextMatrix(0, y);
        t.showText(String.valueOf(pages));
        t.endText();
    }

    private void footer(PdfContentByte cb, Rectangle page) {
        float y = MARGIN - 14, right = page.getWidth() - MARGIN;
        cb.setColorStroke(Fonts.RULE);
        cb.setLineWidth(0.5f);
        cb.moveTo(MARGIN, y + 9);
        cb.lineTo(right, y + 9);
        cb.stroke();
        Text.show(cb, fonts.regular, 6.5f, Fonts.GREY, Element.ALIGN_LEFT,
                "For review by a licensed professional engineer. The adopted local code and its amendments govern.", MARGIN, y);
        String prefix = "Page " + pages + " of ";
        float w = fonts.regular.getWidthPoint(prefix, 6.5f);
        float totalW = fonts.regular.getWidthPoint("0000", 6.5f);
        Text.show(cb, fonts.regular, 6.5f, Fonts.INK, Element.ALIGN_LEFT, prefix, right - w - totalW, y);
        cb.addTemplate(totalInFooter, right - totalW, y - 1.5f);
    }

    /** Light, opaque and under the content: PDF/A-1 allows no transparency. */
    private void watermark(PdfContentByte under, Rectangle page) {
        under.saveState();
        under.beginText();
        under.setFontAndSize(fonts.bold, 30f);
        under.setColorFill(new Color(0xf6, 0xd5, 0xd5));
        under.showTextAligned(Element.ALIGN_CENTER, wording.mark, page.getWidth() / 2, page.getHeight() / 2, 55f);
        under.endText();
        under.restoreState();
    }
}
