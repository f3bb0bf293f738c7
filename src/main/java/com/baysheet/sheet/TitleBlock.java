package com.baysheet.sheet;

import com.baysheet.framing.model.Submittal;
import com.lowagie.text.Element;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;

import java.awt.Color;

/**
 * The title block at the head of each page, drawn as a ruled grid: firm, project, job number and sheet
 * n of N; subject, prepared by, checked by, revision and issue date of the sheet on the page ("not issued" where it
 * has none); then a band with the sheet's place in its package and the status of the whole copy (issued, or a
 * checking copy in red with the date it was printed).
 */
final class TitleBlock {
    private static final float LABEL = 5.5f;
    private static final float VALUE = 8.5f;

    private final Fonts fonts;
    private final PdfContentByte cb;
    private final SheetHeader h;
    private final String context;
    private final String status;
    private final Submittal site;
    private final String mark;

    /**
     * @param status what the band says of the copy ("ISSUED · Rev 2 · date"), or null on a checking copy
     * @param site   the site address (beside the project's name) and the engineer of record (under the firm's)
     */
    TitleBlock(Fonts fonts, PdfContentByte cb, SheetHeader h, String context, String status, Submittal site, String mark) {
        this.site = site;
        this.mark = mark;
        this.fonts = fonts;
        this.cb = cb;
        this.h = h;
        this.context = context;
        this.status = status;
    }

    void draw(float x, float y, float w, float height, int page, PdfTemplate total) {
        float row = 24, top = y + height;
        cb.saveState();
        cb.setLineWidth(0.8f);
        cb.setColorStroke(Fonts.INK);
        cb.rectangle(x, y, w, height);
        cb.stroke();
        cb.setLineWidth(0.4f);
        line(x, top - row, x + w, top - row);
        line(x, top - 2 * row, x + w, top - 2 * row);
        float a = x + w * 0.37f, b = x + w * 0.74f, c = x + w * 0.87f;
        float p = a + (b - a) / 2;
        vertical(a, top, top - 2 * row);
        vertical(b, top, top - 2 * row);
        vertical(c, top, top - 2 * row);
        vertical(p, top - row, top - 2 * row);
        cb.restoreState();

        firm(x + 4, site.engineerLine().isEmpty() ? top - 16 : top - 13, a - x - 8);
        cell(site.address().isEmpty() ? "Project" : Text.fit("Project · " + site.address(), fonts.regular, LABEL, b - a - 8),
                h.project(), a, top, b - a);
        if (!site.engineerLine().isEmpty())
            Text.show(cb, fonts.regular, 5.5f, Fonts.GREY, Element.ALIGN_LEFT,
                    Text.fit("Engineer of record: " + site.engineerLine(), fonts.regular, 5.5f, a - x - 8), x + 4, top - 22.3f);
        cell("Job no.", h.jobNumber(), b, top, c - b);
        Text.show(cb, fonts.regular, LABEL, Fonts.GREY, Element.ALIGN_LEFT, "Sheet", c + 4, top - 8);
        String n = page + " of ";
        Text.show(cb, fonts.bold, 9f, Fonts.INK, Element.ALIGN_LEFT, n, c + 4, top - 19);
        cb.addTemplate(total, c + 4 + fonts.bold.getWidthPoint(n, 9f), top - 21);

        cell("Subject", h.subject(), x, top - row, a - x);
        cell("Prepared by", h.preparedBy() + (h.isSubmitted() ? "   " + h.preparedOn() : ""), a, top - row, p - a);
        cell("Checked by", h.isChecked() ? h.checkedBy() + "   " + h.checkedOn() : "not yet checked", p, top - row, b - p);
        cell("Revision", h.revision(), b, top - row, c - b);
        cell("Issue date", h.isIssued() ? h.issueDate().toString() : SheetHeader.NOT_ISSUED, c, top - row, x + w - c);
        band(x, y, w, height - 2 * row);
    }

    /** The firm's name, after its logo text (a short mark in bold) where it has one. */
    private void firm(float x, float y, float width) {
        float nameX = x;
        if (!h.logoText().isEmpty()) {
            String logo = Text.fit(h.logoText(), fonts.bold, 10f, width / 2);
            Text.show(cb, fonts.bold, 10f, Fonts.INK, Element.ALIGN_LEFT, logo, x, y);
            nameX += fonts.bold.getWidthPoint(logo, 10f) + 6;
            Text.show(cb, fonts.regular, 8f, Fonts.INK, Element.ALIGN_LEFT, Text.fit(h.firm(), fonts.regular, 8f, x + width - nameX), nameX, y);
            return;
        }
        Text.show(cb, fonts.bold, 10f, Fonts.INK, Element.ALIGN_LEFT, Text.fit(h.firm(), fonts.bold, 10f, width), x, y);
    }

    private void band(float x, float y, float w, float height) {
        // a checking copy has no issue date: the band says when it was printed instead
        String line = status == null ? "Printed " + h.printedOn() + " · " + context : context;
        Text.show(cb, fonts.regular, 6.5f, Fonts.INK, Element.ALIGN_LEFT, Text.fit(line, fonts.regular, 6.5f, w * 0.55f), x + 4, y + 5);
        if (status == null) {
            float bw = w * 0.4f;
            cb.saveState();
            cb.setColorFill(Fonts.MARK);
            cb.rectangle(x + w - bw, y, bw, height);
            cb.fill();
            cb.restoreState();
            Text.show(cb, fonts.bold, 7.5f, Color.WHITE, Element.ALIGN_CENTER, mark, x + w - bw / 2, y + 5);
        } else {
            Text.show(cb, fonts.bold, 7f, Fonts.INK, Element.ALIGN_RIGHT, status, x + w - 4, y + 5);
        }
    }

    private void cell(String label, String value, float x, float top, float w) {
        Text.show(cb, fonts.regular, LABEL, Fonts.GREY, Element.ALIGN_LEFT, label, x + 4, top - 8);
        Text.show(cb, fonts.bold, VALUE, Fonts.INK, Element.ALIGN_LEFT, Text.fit(value, fonts.bold, VALUE, w - 8), x + 4, top - 19);
    }

    private void line(float x1, float y1, float x2, float y2) {
        cb.moveTo(x1, y1);
        cb.lineTo(x2, y2);
        cb.stroke();
    }

    private void vertical(float x, float y1, float y2) { line(x, y1, x, y2); }
}
