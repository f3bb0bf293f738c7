package com.baysheet.sheet;

import com.lowagie.text.Document;
import com.lowagie.text.DocumentException;
import com.lowagie.text.Element;
import com.lowagie.text.PageSize;
import com.lowagie.text.pdf.PdfDate;
import com.lowagie.text.pdf.PdfEncryption;
import com.lowagie.text.pdf.PdfName;
import com.lowagie.text.pdf.PdfWriter;

import java.awt.color.ColorSpace;
import java.awt.color.ICC_Profile;
import java.io.FilterOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.security.DigestOutputStream;
import java.security.MessageDigest;
import java.time.LocalDate;
import java.util.Arrays;
import java.util.Calendar;
import java.util.GregorianCalendar;
import java.util.HexFormat;
import java.util.TimeZone;

/**
 * An OpenPDF document set up for PDF/A-1b on US Letter: embedded fonts, an sRGB output intent, XMP
 * metadata, and everything that would otherwise vary from run to run fixed: the creation and modification
 * dates are the date of the copy (the issue date of an issued copy), and the file ID and font subset names derive from a digest of the content.
 * The bytes pass through a digest on their way out, so the SHA-256 is known without holding the file.
 */
final class PdfaDocument {
    final Document document;
    final PdfWriter writer;
    final Fonts fonts;
    final PageFrame frame;
    private final MessageDigest sha;
    private final Counting counting;

    private PdfaDocument(OutputStream out, SheetHeader header, String title, byte[] contentId, boolean checking) {
        this.sha = Hashes.sha256();
        this.counting = new Counting(new DigestOutputStream(out, sha));
        this.fonts = Fonts.create(Hashes.seed(contentId));
        this.frame = new PageFrame(fonts, header, checking);
        float top = PageFrame.MARGIN + PageFrame.BLOCK_HEIGHT + 10;
        this.document = new Document(PageSize.LETTER, PageFrame.MARGIN, PageFrame.MARGIN, top, PageFrame.MARGIN + PageFrame.FOOTER);
        try {
            this.writer = PdfWriter.getInstance(document, counting);
        } catch (DocumentException e) {
            throw new IllegalStateException("PDF writer refused to start", e);
        }
        writer.setPDFXConformance(PdfWriter.PDFA1B);
        writer.setPageEvent(frame);
        PdfDate date = new PdfDate(midnightUtc(header.printedOn()));
        document.addTitle(title);
        document.addAuthor(header.firm() + (header.isSubmitted() ? " (prepared by " + header.preparedBy() + ")" : ""));
        document.addSubject(header.project() + ", job " + header.jobNumber());
        document.addCreator("Baysheet");
        document.addCreationDate(date);
        document.addModificationDate(date);
        byte[] id = Arrays.copyOf(contentId, 16);
        writer.getInfo().put(PdfName.FILEID, PdfEncryption.createInfoId(id, id));
        document.open();
        writer.getInfo().put(PdfName.CREATIONDATE, date);   // open() stamps the clock time over it
        try {
            writer.setOutputIntents("Custom", "", "http://www.color.org", "sRGB IEC61966-2.1",
                    ICC_Profile.getInstance(ColorSpace.CS_sRGB));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static PdfaDocument open(OutputStream out, SheetHeader header, String title, byte[] contentId, boolean checking) {
        return new PdfaDocument(out, header, title, contentId, checking);
    }

    void add(Element e) {
        try {
            document.add(e);
        } catch (DocumentException ex) {
            throw new IllegalStateException("PDF layout failed", ex);
        }
    }

    void newPage() { document.newPage(); }

    /** Closes the document (which flushes the stream but leaves it open for the caller). */
    StreamedPdf finish() {
        writer.createXmpMetadata();
        writer.setCloseStream(false);
        document.close();
        return new StreamedPdf(HexFormat.of().formatHex(sha.digest()), counting.count, frame.pages());
    }

    private static Calendar midnightUtc(LocalDate d) {
        GregorianCalendar c = new GregorianCalendar(TimeZone.getTimeZone("UTC"));
        c.clear();
        c.set(d.getYear(), d.getMonthValue() - 1, d.getDayOfMonth(), 0, 0, 0);
        return c;
    }

    private static final class Counting extends FilterOutputStream {
        long count;

        Counting(OutputStream out) { super(out); }

        @Override
        public void write(int b) throws IOException {
            out.write(b);
            count++;
        }

        @Override
        public void write(byte[] b, int off, int len) throws IOException {
            out.write(b, off, len);
            count += len;
        }
    }
}
