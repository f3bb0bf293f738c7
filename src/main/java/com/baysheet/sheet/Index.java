package com.baysheet.sheet;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.ResultKey;
import com.lowagie.text.BadElementException;
import com.lowagie.text.Element;
import com.lowagie.text.Image;
import com.lowagie.text.pdf.PdfPCell;
import com.lowagie.text.pdf.PdfPTable;
import com.lowagie.text.pdf.PdfTemplate;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.IdentityHashMap;
import java.util.List;
import java.util.Map;
import java.util.StringJoiner;

/**
 * The index of a package: each sheet under its level and member kind, with the sheet (page) it starts on
 * and its governing results (action, combination, value). The index comes before the sheets, so each sheet number is a small template
 * written when that sheet begins.
 */
final class Index {
    static final Object TAKE_DOWNS = new Object();
    static final Object REVISIONS = new Object();
    static final Object METHODS = new Object();
    static final Object SCHEDULES = new Object();
    static final Object CRITERIA = new Object();

    private final PdfaDocument pdf;
    private final CalcPackage pkg;
    private final Map<Object, PdfTemplate> starts = new IdentityHashMap<>();

    Index(PdfaDocument pdf, CalcPackage pkg) {
        this.pdf = pdf;
        this.pkg = pkg;
        for (MemberSheet s : pkg.sheets()) starts.put(s, template());
        starts.put(TAKE_DOWNS, template());
        starts.put(REVISIONS, template());
        starts.put(METHODS, template());
        starts.put(SCHEDULES, template());
        starts.put(CRITERIA, template());
        for (FramingPlan p : pkg.plans()) starts.put(p, template());
    }

    private PdfTemplate template() { return pdf.writer.getDirectContent().createTemplate(28, 9); }

    void write() {
        Fonts fonts = pdf.fonts;
        PdfPTable t = Cells.table(7, 28, 65);
        Cells.title(t, "Index of sheets · " + pkg.title(), fonts);
        t.addCell(Cells.head("Sheet", fonts));
        t.addCell(Cells.head("Subject", fonts));
        t.addCell(Cells.head("Governing results", fonts));
        t.setHeaderRows(2);
        row(t, starts.get(CRITERIA), "Design criteria", "codes, loads, combinations, self weights");
        for (FramingPlan p : pkg.plans()) row(t, starts.get(p), "Framing plan, " + p.level(), p.members().size() + " members");
        String group = null;
        for (MemberSheet s : pkg.sheets()) {
            String g = s.level().isEmpty() && s.group().isEmpty() ? "Members" : (s.level() + " · " + s.group());
            if (!g.equals(group)) {
                PdfPCell c = Cells.text(g, fonts.bodyBold());
                c.setColspan(3);
                c.setBackgroundColor(Fonts.SHADE);
                t.addCell(c);
                group = g;
            }
            row(t, starts.get(s), s.record().subject(), governing(s.record()));
        }
        if (!pkg.takeDowns().isEmpty())
            row(t, starts.get(TAKE_DOWNS), "Column take-downs", pkg.takeDowns().size() + " column stacks");
        if (!pkg.methodTables().isEmpty())
            row(t, starts.get(METHODS), "Floor live load reduction methods compared", pkg.methodTables().size() + " levels");
        if (!pkg.schedules().isEmpty())
            row(t, starts.get(SCHEDULES), "Load summaries", String.join("; ", pkg.schedules().stream().map(x -> x.title()).toList()));
        row(t, starts.get(REVISIONS), "Revision log", "");
        pdf.add(t);
    }

    private void row(PdfPTable t, PdfTemplate start, String subject, String governing) {
        try {
            PdfPCell c = new PdfPCell(Image.getInstance(start), false);
            c.setBorderWidth(0.3f);
            c.setBorderColor(Fonts.RULE);
            c.setPadding(2.5f);
            t.addCell(c);
        } catch (BadElementException e) {
            throw new IllegalStateException(e);
        }
        t.addCell(Cells.text(subject, pdf.fonts.body()));
        t.addCell(Cells.cell(new com.lowagie.text.Phrase(governing, pdf.fonts.small()), Element.ALIGN_LEFT));
    }

    private static String governing(CalcRecord r) {
        StringJoiner j = new StringJoiner("; ");
        for (String k : r.governing()) {
            String label = r.entry(k).label(), action = ResultKey.parse(k).action();
            int open = label.lastIndexOf('(');
            j.add(action + (open >= 0 && label.endsWith(")") ? " " + label.substring(open) : "") + " " + r.entry(k).shown());
        }
        return j.toString();
    }

    /** Writes the current page number into the index entry of {@code key}, which begins on this page. */
    void startsHere(Object key) {
        PdfTemplate t = starts.get(key);
        t.beginText();
        t.setFontAndSize(pdf.fonts.regular, 7.5f);
        t.setColorFill(Fonts.INK);
        t.setTextMatrix(0, 1.5f);
        t.showText(String.valueOf(pdf.writer.getPageNumber()));
        t.endText();
        try {
            pdf.writer.releaseTemplate(t);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Sheets grouped by level (in the order levels first appear) and then by member kind, otherwise as given. */
    static List<MemberSheet> grouped(List<MemberSheet> sheets) {
        List<String> levels = sheets.stream().map(MemberSheet::level).distinct().toList();
        List<String> groups = sheets.stream().map(MemberSheet::group).distinct().toList();
        List<MemberSheet> out = new ArrayList<>(sheets);
        out.sort((a, b) -> levels.indexOf(a.level()) != levels.indexOf(b.level())
                ? Integer.compare(levels.indexOf(a.level()), levels.indexOf(b.level()))
                : Integer.compare(groups.indexOf(a.group()), groups.indexOf(b.group())));
        return out;
    }
}
