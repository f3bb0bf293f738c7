package com.baysheet.sheet;

import com.baysheet.engine.record.Sketch;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import com.lowagie.text.Element;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;

import java.util.ArrayList;
import java.util.List;

/**
 * The member drawn as a hand calculation sketches it: the beam to scale along its length, its supports,
 * the distributed loads as blocks (stacked where they overlap) and the point loads as arrows, each with
 * its dead and live values, the service reactions below, and the span dimensioned. Values come from the
 * record's sketch and are only converted to the sheet's units for labelling.
 */
final class LoadDiagram {
    static final float WIDTH = 330, HEIGHT = 160;
    private static final float LEFT = 34, RIGHT = WIDTH - 34, BEAM = 66, ROW = 17;
    private static final int MAX_ROWS = 4;

    private final Fonts fonts;
    private final UnitSystem system;
    private final Sketch s;
    private final PdfTemplate t;

    private LoadDiagram(Fonts fonts, UnitSystem system, Sketch s, PdfTemplate t) {
        this.fonts = fonts;
        this.system = system;
        this.s = s;
        this.t = t;
    }

    static PdfTemplate draw(PdfContentByte page, Fonts fonts, UnitSystem system, Sketch s) {
        PdfTemplate t = page.createTemplate(WIDTH, HEIGHT);
        new LoadDiagram(fonts, system, s, t).draw();
        return t;
    }

    private float x(double pos) { return (float) (LEFT + (RIGHT - LEFT) * pos / s.length()); }

    private void draw() {
        t.setColorStroke(Fonts.INK);
        t.setColorFill(Fonts.INK);
        distributed();
        points();
        t.setLineWidth(2.2f);
        Drawing.line(t, x(0), BEAM, x(s.length()), BEAM);
        t.setLineWidth(0.6f);
        supports();
        dimensions();
    }

    private void distributed() {
        List<double[]> rows = new ArrayList<>();   // the right end reached so far in each stacked row
        int n = Math.min(s.distributed().size(), MAX_ROWS);
        for (int i = 0; i < n; i++) {
            Sketch.Segment g = s.distributed().get(i);
            int row = 0;
            while (row < rows.size() && rows.get(row)[0] > g.from() + 1e-9) row++;
            if (row == rows.size()) rows.add(new double[]{g.to()});
            else rows.get(row)[0] = g.to();
            float y0 = BEAM + 3 + row * ROW, x0 = x(g.from()), x1 = x(g.to());
            t.setLineWidth(0.5f);
            t.rectangle(x0, y0 + 4, x1 - x0, 7);
            t.stroke();
            int arrows = Math.max(2, (int) ((x1 - x0) / 14));
            for (int k = 0; k <= arrows; k++) {
                float xa = x0 + (x1 - x0) * k / arrows;
                Drawing.arrow(t, xa, y0 + 11, xa, y0 + 1, 2.5f);
            }
            String label = "w_D " + Display.sig3(Quantity.LINE_LOAD.unit(system).fromBase(g.dead())) + "  w_L "
                    + Display.of(g.live(), Quantity.LINE_LOAD, system);
            label = Text.fit(label, fonts.regular, 5.5f, Math.max(x1 - x0, 60));
            float lw = fonts.regular.getWidthPoint(label, 5.5f), cx = (x0 + x1) / 2;
            if (crossesPoint(cx - lw / 2 - 2, cx + lw / 2 + 2)) cx = Math.max(x0, LEFT) + lw / 2 + 2;
            Text.show(t, fonts.regular, 5.5f, Fonts.INK, Element.ALIGN_CENTER, label, cx, y0 + 12.5f);
        }
        drift(rows.size());
        if (s.distributed().size() > MAX_ROWS)
            Text.show(t, fonts.regular, 5.5f, Fonts.GREY, Element.ALIGN_LEFT,
                    "+ " + (s.distributed().size() - MAX_ROWS) + " more distributed loads (see steps)", LEFT, HEIGHT - 8);
    }

    /**
     * The snow drift surcharge at a roof step, in the row above the distributed loads: its outline to scale of its
     * largest intensity (a triangle or trapezoid), labelled with the intensities at its ends.
     */
    private void drift(int row) {
        if (s.drift().isEmpty()) return;
        double max = 0;
        for (Sketch.Drift d : s.drift()) max = Math.max(max, Math.max(d.start(), d.end()));
        if (max <= 0) return;
        float y0 = BEAM + 3 + Math.min(row, MAX_ROWS) * ROW;
        t.setLineWidth(0.5f);
        for (Sketch.Drift d : s.drift()) {
            float x0 = x(d.from()), x1 = x(d.to());
            float h0 = (float) (11 * d.start() / max), h1 = (float) (11 * d.end() / max);
            t.moveTo(x0, y0);
            t.lineTo(x0, y0 + h0);
            t.lineTo(x1, y0 + h1);
            t.lineTo(x1, y0);
            t.closePath();
            t.stroke();
        }
        Sketch.Drift first = s.drift().get(0);
        String label = "S drift " + Display.of(first.start(), Quantity.LINE_LOAD, system) + " to "
                + Display.of(first.end(), Quantity.LINE_LOAD, system) + (s.drift().size() > 1 ? " (+" + (s.drift().size() - 1) + ")" : "");
        float x0 = x(first.from()), x1 = x(first.to());
        Text.show(t, fonts.regular, 5.5f, Fonts.INK, Element.ALIGN_CENTER, Text.fit(label, fonts.regular, 5.5f, Math.max(x1 - x0, 80)),
                Math.max(LEFT + 40, Math.min(RIGHT - 40, (x0 + x1) / 2)), y0 + 13);
    }

    private boolean crossesPoint(float from, float to) {
        for (Sketch.Point p : s.points()) if (x(p.x()) > from && x(p.x()) < to) return true;
        return false;
    }

    /** The point-load labels laid out without overlapping; the sheet lists {@code key()} under the diagram. */
    static PointLoadLabels.Layout pointLabels(Fonts fonts, UnitSystem system, Sketch s) {
        return new LoadDiagram(fonts, system, s, null).pointLabels();
    }

    private PointLoadLabels.Layout pointLabels() {
        return PointLoadLabels.of(fonts.regular, system, s, HEIGHT - 16, WIDTH, this::x);
    }

    private void points() {
        float top = HEIGHT - 18;
        for (PointLoadLabels.Arrow a : pointLabels().arrows()) {
            float from = top - a.row() * PointLoadLabels.ROW_PITCH;
            t.setLineWidth(0.9f);
            Drawing.arrow(t, a.x(), from, a.x(), BEAM + 1.5f, 4f);
            if (a.labelled())
                Text.show(t, fonts.regular, PointLoadLabels.SIZE, Fonts.INK, Element.ALIGN_CENTER, a.text(), (a.x0() + a.x1()) / 2, from + 2);
        }
    }

    private void supports() {
        if (s.support().equals("cantilever")) {
            fixedEnd(x(0));
            reaction(x(0), "R = " + force(s.leftReaction()));
            return;
        }
        pin(x(0));
        roller(x(s.span()));
        reaction(x(0), "R_A = " + force(s.leftReaction()));
        reaction(x(s.span()), "R_B = " + force(s.rightReaction()));
    }

    private String force(double v) { return Display.of(v, Quantity.FORCE, system); }

    private void pin(float xs) {
        t.moveTo(xs, BEAM - 1);
        t.lineTo(xs - 6, BEAM - 11);
        t.lineTo(xs + 6, BEAM - 11);
        t.closePath();
        t.stroke();
        ground(xs, BEAM - 11);
    }

    private void roller(float xs) {
        t.moveTo(xs, BEAM - 1);
        t.lineTo(xs - 6, BEAM - 8);
        t.lineTo(xs + 6, BEAM - 8);
        t.closePath();
        t.stroke();
        t.circle(xs - 3, BEAM - 9.5f, 1.5f);
        t.circle(xs + 3, BEAM - 9.5f, 1.5f);
        t.stroke();
        ground(xs, BEAM - 11);
    }

    private void ground(float xs, float y) {
        Drawing.line(t, xs - 9, y, xs + 9, y);
        for (float h = xs - 8; h < xs + 9; h += 3) Drawing.line(t, h, y, h - 2.5f, y - 2.5f);
    }

    private void fixedEnd(float xs) {
        t.setLineWidth(1.2f);
        Drawing.line(t, xs, BEAM - 14, xs, BEAM + 14);
        t.setLineWidth(0.5f);
        for (float y = BEAM - 13; y < BEAM + 14; y += 3.5f) Drawing.line(t, xs, y, xs - 4, y - 3);
    }

    private void reaction(float xs, String label) {
        t.setLineWidth(0.9f);
        Drawing.arrow(t, xs, BEAM - 34, xs, BEAM - 15, 4f);
        t.setLineWidth(0.6f);
        Text.show(t, fonts.bold, 6f, Fonts.INK, Element.ALIGN_CENTER, label, Math.max(LEFT, Math.min(RIGHT, xs)), BEAM - 42);
    }

    private void dimensions() {
        float y = 10;
        t.setLineWidth(0.4f);
        Drawing.dimension(t, x(0), x(s.span()), y);
        Text.show(t, fonts.regular, 6f, Fonts.INK, Element.ALIGN_CENTER, "ℓ = " + Display.of(s.span(), Quantity.LENGTH, system),
                (x(0) + x(s.span())) / 2, y + 2.5f);
        if (s.support().equals("overhang")) {
            Drawing.dimension(t, x(s.span()), x(s.length()), y);
            Text.show(t, fonts.regular, 6f, Fonts.INK, Element.ALIGN_CENTER,
                    "a = " + Display.of(s.length() - s.span(), Quantity.LENGTH, system), (x(s.span()) + x(s.length())) / 2, y + 2.5f);
        }
    }
}
