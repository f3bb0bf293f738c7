package com.baysheet.sheet;

import com.baysheet.engine.record.Entry;
import com.lowagie.text.Chunk;
import com.lowagie.text.Element;
import com.lowagie.text.Phrase;
import com.lowagie.text.pdf.PdfPTable;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The results as an engineer tabulates them: one row per action (reactions, shear, moments, axial load),
 * one column per load case (dead, live unreduced and reduced, concentrated, design live, roof live, roof
 * concentrated, design roof live, snow, factored, service). A result key reads "case.action" ("D.RA", "LRFD.M+",
 * "LRFD.RA,min" for the least reaction of an overhanging beam); the matrix only arranges the
 * record's shown values. Keys of another form are returned for a plain list.
 */
final class ResultMatrix {
    private static final Map<String, String> CASES = new LinkedHashMap<>();
    private static final Map<String, String> ACTIONS = new LinkedHashMap<>();
    static {
        CASES.put("D", "Dead D");
        CASES.put("L0", "Live L0 unreduced");
        CASES.put("L", "Live L reduced");
        CASES.put("Lc", "Point Lc");
        CASES.put("gov", "Live load governing");
        CASES.put("Ldes", "Design live");
        CASES.put("Lr0", "Roof live unreduced");
        CASES.put("Lr", "Roof live Lr");
        CASES.put("Lrc", "Roof point Lrc");
        CASES.put("Lrgov", "Roof live governing");
        CASES.put("Lrdes", "Design roof live");
        CASES.put("S", "Snow S (not reduced)");
        CASES.put("LRFD", "Factored (LRFD)");
        CASES.put("ASD", "Service (ASD)");
        ACTIONS.put("RA", "Left reaction R_A");
        ACTIONS.put("RB", "Right reaction R_B");
        ACTIONS.put("RA,min", "Least left reaction R_A (uplift where negative)");
        ACTIONS.put("RB,min", "Least right reaction R_B (uplift where negative)");
        ACTIONS.put("V", "Maximum shear V");
        ACTIONS.put("M+", "Maximum positive moment M+");
        ACTIONS.put("M-", "Maximum negative moment M−");
        ACTIONS.put("P", "Axial load P");
    }

    private final Fonts fonts;
    private final List<String> governing;
    final List<Entry> others = new ArrayList<>();
    private final List<String> cases = new ArrayList<>();
    private final Map<String, Map<String, Entry>> rows = new LinkedHashMap<>();

    ResultMatrix(Fonts fonts, List<Entry> results, List<String> governing) {
        this.fonts = fonts;
        this.governing = governing;
        for (Entry e : results) {
            int dot = e.key().indexOf('.');
            String c = dot < 0 ? "" : e.key().substring(0, dot), a = dot < 0 ? "" : e.key().substring(dot + 1);
            if (!CASES.containsKey(c)) { others.add(e); continue; }
            if (!cases.contains(c)) cases.add(c);
            rows.computeIfAbsent(a, k -> new LinkedHashMap<>()).put(c, e);
        }
        cases.sort((x, y) -> Integer.compare(order(x), order(y)));
    }

    private static int order(String c) { return new ArrayList<>(CASES.keySet()).indexOf(c); }

    boolean isEmpty() { return rows.isEmpty(); }

    PdfPTable table() {
        float[] widths = new float[cases.size() + 1];
        widths[0] = 20;
        for (int i = 1; i < widths.length; i++) widths[i] = 80f / cases.size();
        PdfPTable t = Cells.table(widths);
        Cells.title(t, "Summary of results", fonts);
        t.setHeaderRows(2);
        t.setKeepTogether(true);
        t.addCell(Cells.head("Action", fonts));
        for (String c : cases) t.addCell(Cells.head(CASES.get(c), fonts));
        for (Map.Entry<String, Map<String, Entry>> row : rows.entrySet()) {
            t.addCell(Cells.text(ACTIONS.getOrDefault(row.getKey(), row.getKey()), fonts.body()));
            for (String c : cases) t.addCell(value(row.getValue().get(c)));
        }
        return t;
    }

    private com.lowagie.text.pdf.PdfPCell value(Entry e) {
        if (e == null) return Cells.right("—", fonts.smallGrey());
        boolean gov = governing.contains(e.key());
        Phrase p = new Phrase(e.shown(), gov ? fonts.bodyBold() : fonts.body());
        String combination = combination(e.label());
        if (!combination.isEmpty()) p.add(new Chunk("\n" + combination, fonts.smallGrey()));
        var cell = Cells.cell(p, Element.ALIGN_RIGHT);
        if (gov) cell.setBackgroundColor(Fonts.SHADE);
        return cell;
    }

    /** The load combination named in a label's closing brackets ("..., factored (LRFD 2)" gives "LRFD 2"). */
    private static String combination(String label) {
        int open = label.lastIndexOf('(');
        return open >= 0 && label.endsWith(")") ? label.substring(open + 1, label.length() - 1) : "";
    }
}
