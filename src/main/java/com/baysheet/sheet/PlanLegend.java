package com.baysheet.sheet;

import com.lowagie.text.Element;
import com.lowagie.text.pdf.PdfTemplate;

import java.awt.Color;
import java.util.List;

/**
 * The strip below a framing plan: the legend (occupancies by tint, opening, cantilever slab, the member pens,
 * column, line load, point load where there are any), what the dimensions are in, and the north arrow.
 */
final class PlanLegend {
    private final PdfTemplate t;
    private final Fonts fonts;
    private final FramingPlan plan;
    private final List<String> occupancies;
    private float x = 4, y;

    PlanLegend(PdfTemplate t, Fonts fonts, FramingPlan plan, List<String> occupancies) {
        this.t = t;
        this.fonts = fonts;
        this.plan = plan;
        this.occupancies = occupancies;
    }

    void draw(float width) {
        float top = FramingPlanDrawing.LEGEND - 6;
        t.setLineWidth(0.4f);
        t.setColorStroke(Fonts.RULE);
        Drawing.line(t, 0, FramingPlanDrawing.LEGEND - 1, width, FramingPlanDrawing.LEGEND - 1);
        Text.show(t, fonts.bold, 6f, Fonts.INK, Element.ALIGN_LEFT, "Legend", 4, top - 4);
        y = top - 16;
        for (int k = 0; k < occupancies.size(); k++) swatch(FramingPlanDrawing.tint(k), occupancies.get(k), width);
        if (!plan.openings().isEmpty()) item(width, "opening", () -> hatch(t, x, y, x + 14, y + 7));
        if (!plan.cantilevers().isEmpty()) swatch(FramingPlanDrawing.CANTILEVER, "cantilever slab (projection shown)", width);
        pen(1.8f, "girder", width);
        pen(1.0f, "beam on a grid line", width);
        pen(0.5f, "infill beam", width);
        item(width, "column", () -> { t.setColorFill(Fonts.INK); t.rectangle(x + 4.5f, y + 1, 5, 5); t.fill(); });
        if (!plan.lineLoads().isEmpty()) item(width, "line load (unfactored)", () -> {
            t.saveState();
            t.setColorStroke(FramingPlanDrawing.LOAD);
            t.setLineWidth(1.2f);
            t.setLineDash(new float[] {5f, 1.5f, 1f, 1.5f}, 0f);
            Drawing.line(t, x, y + 3.5f, x + 14, y + 3.5f);
            t.restoreState();
        });
        if (!plan.pointLoads().isEmpty()) item(width, "point load (unfactored)", () -> {
            t.setColorFill(FramingPlanDrawing.LOAD);
            t.setColorStroke(FramingPlanDrawing.LOAD);
            Drawing.arrow(t, x + 12, y + 7, x + 3, y, 3f);
        });
        Text.show(t, fonts.regular, 5.5f, Fonts.GREY, Element.ALIGN_LEFT, PlanLengths.unit(plan.system())
                + " Drawn to fit the sheet, not to scale: the dimensions govern. Members are labelled as in the schedules.", 4, 4);
        north(width - 22, FramingPlanDrawing.LEGEND / 2 - 2);
    }

    private void swatch(Color c, String text, float width) {
        item(width, text, () -> {
            t.setColorFill(c);
            t.setColorStroke(Fonts.RULE);
            t.setLineWidth(0.3f);
            t.rectangle(x, y, 14, 7);
            t.fillStroke();
        });
    }

    private void pen(float w, String text, float width) {
        item(width, text, () -> {
            t.setColorStroke(Fonts.INK);
            t.setLineWidth(w);
            Drawing.line(t, x, y + 3.5f, x + 14, y + 3.5f);
        });
    }

    /** One legend entry: its symbol drawn at (x, y), its text after it; entries run on in rows. */
    private void item(float width, String text, Runnable symbol) {
        float need = 18 + fonts.regular.getWidthPoint(text, 5.5f) + 10;
        if (x + need > width - 60) { x = 4; y -= 11; }
        t.saveState();
        symbol.run();
        t.restoreState();
        Text.show(t, fonts.regular, 5.5f, Fonts.INK, Element.ALIGN_LEFT, text, x + 18, y + 1.5f);
        x += need;
    }

    /** Plan north: an arrow up the sheet with N above it. */
    private void north(float cx, float cy) {
        t.setColorStroke(Fonts.INK);
        t.setColorFill(Fonts.INK);
        t.setLineWidth(0.6f);
        t.circle(cx, cy, 11);
        t.stroke();
        Drawing.arrow(t, cx, cy - 9, cx, cy + 9, 4f);
        Text.show(t, fonts.bold, 7f, Fonts.INK, Element.ALIGN_CENTER, "N", cx, cy + 13);
    }

    /** Diagonal hatching inside a rectangle, with its outline: an opening in the floor. */
    static void hatch(PdfTemplate t, float x0, float y0, float x1, float y1) {
        t.saveState();
        t.setColorStroke(Fonts.GREY);
        t.setLineWidth(0.3f);
        t.rectangle(x0, y0, x1 - x0, y1 - y0);
        t.stroke();
        t.rectangle(x0, y0, x1 - x0, y1 - y0);
        t.clip();
        t.newPath();
        float step = 4, h = y1 - y0;
        for (float s = x0 - h; s < x1; s += step) Drawing.line(t, s, y0, s + h, y1);
        t.restoreState();
    }
}
