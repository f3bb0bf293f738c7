package com.baysheet.sheet;

import com.lowagie.text.Chunk;
import com.lowagie.text.Element;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;

/**
 * The foot of every sheet, kept on one page: the governing results boxed and the disclaimer, beside a clear
 * box for the engineer's seal.
 */
final class ClosingBlock {
    static final String DISCLAIMER = "This sheet is for review by a licensed professional engineer, who is responsible "
            + "for its use. It records gravity dead and live loads, live load reductions, member actions and load "
            + "combinations from the inputs shown; member sizing, strength and serviceability are outside it. "
            + "The adopted local building code and its amendments govern over the edition cited here.";
    /** Printed on issued copies, which are signed as they are issued. */
    static final String SIGNED = "This file is digitally signed by the office: the signature attests that the file is as "
            + "issued, not the engineer's seal.";
    static final float STAMP = 144;   // 2 in square: room for a seal with signature and date

    private final Fonts fonts;
    private final boolean checking;
    private final String auditHead;
    private final Wording wording;

    ClosingBlock(Fonts fonts, boolean checking, Wording wording) {
        this(fonts, checking, wording, "");
    }

    /** @param auditHead the audit trail's chain head at the issue, printed under the disclaimer; blank for none */
    ClosingBlock(Fonts fonts, boolean checking, Wording wording, String auditHead) {
        this.wording = wording;
        this.fonts = fonts;
        this.checking = checking;
        this.auditHead = auditHead == null ? "" : auditHead;
    }

    /** @param lead what sits above the disclaimer (the governing results), or null */
    PdfPTable table(com.lowagie.text.Element lead) {
        PdfPTable t = Cells.table(540 - STAMP, STAMP);
        t.setSpacingBefore(8);
        t.setKeepTogether(true);
        Phrase words = new Phrase(DISCLAIMER, fonts.body());
        if (!checking && !auditHead.isEmpty()) {
            words.add(new Chunk("\n\n" + SIGNED, fonts.smallGrey()));
            words.add(new Chunk("\nAudit trail at issue: " + auditHead, fonts.smallGrey()));
        }
        if (checking) words.add(new Chunk("\n\n" + wording.closing, fonts.mark()));
        PdfPCell left = new PdfPCell();
        if (lead != null) left.addElement(lead);
        com.lowagie.text.Paragraph p = new com.lowagie.text.Paragraph(words);
        p.setLeading(9.5f);
        left.addElement(p);
        left.setBorder(0);
        left.setPadding(0);
        left.setPaddingRight(12);
        t.addCell(left);
        PdfPCell stamp = Cells.cell(new Phrase(checking ? "Not to be sealed" : "Engineer's seal and signature",
                checking ? fonts.mark() : fonts.smallGrey()), Element.ALIGN_CENTER);
        stamp.setFixedHeight(STAMP);
        stamp.setBorderWidth(0.9f);
        stamp.setBorderColor(Fonts.INK);
        t.addCell(stamp);
        return t;
    }
}
