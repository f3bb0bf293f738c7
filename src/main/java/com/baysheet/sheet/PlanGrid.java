package com.baysheet.sheet;

import com.lowagie.text.Element;
import com.lowagie.text.pdf.PdfTemplate;

import java.util.ArrayList;
import java.util.List;

/**
 * The grid of a framing plan: centre lines past the building, a bubble with the line's name at the top (x
 * lines) and the left (y lines), and two dimension strings on each of those sides, the spacings from line to
 * line and the overall length, in feet and inches or millimetres.
 */
final class PlanGrid {
    private static final float BUBBLE = 6.5f;

    private final FramingPlanDrawing at;
    private final PdfTemplate t;
    private final Fonts fonts;
    private final FramingPlan plan;

    PlanGrid(FramingPlanDrawing at, PdfTemplate t, Fonts fonts, FramingPlan plan) {
        this.at = at;
        this.t = t;
        this.fonts = fonts;
        this.plan = plan;
    }

    void draw() {
        List<KeyPlan.GridLine> xs = new ArrayList<>(), ys = new ArrayList<>();
        for (KeyPlan.GridLine g : plan.gridLines()) (g.alongX() ? xs : ys).add(g);
        xs.sort((a, b) -> Double.compare(a.position(), b.position()));
        ys.sort((a, b) -> Double.compare(a.position(), b.position()));
        float left = at.px(xs.get(0).position()), right = at.px(xs.get(xs.size() - 1).position());
        float bottom = at.py(ys.get(0).position()), top = at.py(ys.get(ys.size() - 1).position());
        for (FramingPlan.Cantilever c : plan.cantilevers()) {
            left = Math.min(left, at.px(c.rect().minX()));
            right = Math.max(right, at.px(c.rect().maxX()));
            bottom = Math.min(bottom, at.py(c.rect().minY()));
            top = Math.max(top, at.py(c.rect().maxY()));
        }
        t.saveState();
        t.setLineWidth(0.3f);
        t.setColorStroke(Fonts.GREY);
        t.setLineDash(6f, 1.5f, 0f);
        for (KeyPlan.GridLine g : xs) Drawing.line(t, at.px(g.position()), bottom - 8, at.px(g.position()), top + 40);
        for (KeyPlan.GridLine g : ys) Drawing.line(t, left - 40, at.py(g.position()), right + 8, at.py(g.position()));
        t.restoreState();
        for (KeyPlan.GridLine g : xs) bubble(g.name(), at.px(g.position()), top + 40 + BUBBLE);
        for (KeyPlan.GridLine g : ys) bubble(g.name(), left - 40 - BUBBLE, at.py(g.position()));
        t.setLineWidth(0.3f);
        t.setColorStroke(Fonts.INK);
        t.setColorFill(Fonts.INK);
        along(xs, top + 12, true);
        along(ys, left - 12, false);
        if (xs.size() > 2) overall(xs, top + 24, true);
        if (ys.size() > 2) overall(ys, left - 24, false);
    }

    private void bubble(String name, float x, float y) {
        t.setLineWidth(0.5f);
        t.setColorStroke(Fonts.INK);
        t.setColorFill(java.awt.Color.WHITE);
        t.circle(x, y, BUBBLE);
        t.fillStroke();
        Text.show(t, fonts.bold, 6f, Fonts.INK, Element.ALIGN_CENTER, Text.fit(name, fonts.bold, 6f, 2 * BUBBLE - 1), x, y - 2.1f);
    }

    /** The spacings from each line to the next, written above (x) or left of (y) the dimension line. */
    private void along(List<KeyPlan.GridLine> lines, float offset, boolean horizontal) {
        for (int k = 0; k + 1 < lines.size(); k++) {
            double a = lines.get(k).position(), b = lines.get(k + 1).position();
            dimension(horizontal ? at.px(a) : at.py(a), horizontal ? at.px(b) : at.py(b), offset, horizontal,
                    PlanLengths.of(b - a, plan.system()));
        }
    }

    private void overall(List<KeyPlan.GridLine> lines, float offset, boolean horizontal) {
        double a = lines.get(0).position(), b = lines.get(lines.size() - 1).position();
        dimension(horizontal ? at.px(a) : at.py(a), horizontal ? at.px(b) : at.py(b), offset, horizontal,
                PlanLengths.of(b - a, plan.system()));
    }

    private void dimension(float from, float to, float offset, boolean horizontal, String text) {
        t.setLineWidth(0.3f);
        if (horizontal) {
            Drawing.dimension(t, from, to, offset);
            Text.show(t, fonts.regular, 5f, Fonts.INK, Element.ALIGN_CENTER, text, (from + to) / 2, offset + 2f);
        } else {
            // a vertical string: the same ticks turned a quarter, the text reading up the page
            Drawing.line(t, offset, from, offset, to);
            for (float v : new float[] {from, to}) {
                Drawing.line(t, offset - 3, v, offset + 3, v);
                Drawing.line(t, offset - 2, v - 2, offset + 2, v + 2);
            }
            Text.show(t, fonts.regular, 5f, Fonts.INK, Element.ALIGN_CENTER, text, offset - 2f, (from + to) / 2, 90);
        }
    }
}
