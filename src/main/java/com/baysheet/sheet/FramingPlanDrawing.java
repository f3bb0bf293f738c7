package com.baysheet.sheet;

import com.baysheet.framing.MemberRole;
import com.lowagie.text.Element;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;

import java.awt.Color;
import java.util.ArrayList;
import java.util.List;

/**
 * A level's framing plan drawn to fit its sheet, plan north up: bays tinted by occupancy, openings hatched,
 * cantilever slabs shaded with their projection, grid lines with bubbles and dimension strings, members by
 * role (girders heavy, beams on grid lines medium, infill beams light, columns filled squares) each with its
 * label, line loads as dash-dot lines with their text, point loads as arrows; the legend and the north arrow
 * in a strip below ({@link PlanLegend}). Every fill is opaque: PDF/A-1 allows no transparency.
 */
final class FramingPlanDrawing {
    static final float LEGEND = 64;
    private static final float LEFT = 62, TOP = 62, RIGHT = 30, BOTTOM = 24;
    static final Color CANTILEVER = new Color(0xdc, 0xdc, 0xdc);
    static final Color LOAD = new Color(0x1f, 0x4e, 0x8c);
    static final Color[] TINTS = {new Color(0xf3, 0xf3, 0xf3), new Color(0xe6, 0xee, 0xf7), new Color(0xf6, 0xee, 0xdf),
            new Color(0xe8, 0xf2, 0xe4), new Color(0xf4, 0xe6, 0xee), new Color(0xee, 0xec, 0xdf)};

    private final PdfTemplate t;
    private final Fonts fonts;
    private final FramingPlan plan;
    private final List<String> occupancies = new ArrayList<>();
    private final double minX, minY, scale;
    private final float offX, offY;

    private FramingPlanDrawing(PdfTemplate t, Fonts fonts, FramingPlan p, float width, float height) {
        this.t = t;
        this.fonts = fonts;
        this.plan = p;
        double x0 = Double.MAX_VALUE, x1 = -Double.MAX_VALUE, y0 = Double.MAX_VALUE, y1 = -Double.MAX_VALUE;
        for (KeyPlan.GridLine g : p.gridLines()) {
            if (g.alongX()) { x0 = Math.min(x0, g.position()); x1 = Math.max(x1, g.position()); }
            else { y0 = Math.min(y0, g.position()); y1 = Math.max(y1, g.position()); }
        }
        for (FramingPlan.Cantilever c : p.cantilevers()) {   // slabs reach past the outer grid lines
            x0 = Math.min(x0, c.rect().minX()); x1 = Math.max(x1, c.rect().maxX());
            y0 = Math.min(y0, c.rect().minY()); y1 = Math.max(y1, c.rect().maxY());
        }
        double w = Math.max(x1 - x0, 1e-6), h = Math.max(y1 - y0, 1e-6);
        float aw = width - LEFT - RIGHT, ah = height - LEGEND - TOP - BOTTOM;
        this.scale = Math.min(aw / w, ah / h);
        this.minX = x0;
        this.minY = y0;
        this.offX = (float) (LEFT + (aw - w * scale) / 2);
        this.offY = (float) (LEGEND + BOTTOM + (ah - h * scale) / 2);
        for (FramingPlan.Bay b : p.bays()) if (!occupancies.contains(b.occupancy())) occupancies.add(b.occupancy());
    }

    static PdfTemplate draw(PdfContentByte page, Fonts fonts, FramingPlan plan, float width, float height) {
        PdfTemplate t = page.createTemplate(width, height);
        FramingPlanDrawing d = new FramingPlanDrawing(t, fonts, plan, width, height);
        d.draw();
        new PlanLegend(t, fonts, plan, d.occupancies).draw(width);
        return t;
    }

    static Color tint(int k) { return TINTS[k % TINTS.length]; }

    float px(double x) { return (float) (offX + (x - minX) * scale); }

    float py(double y) { return (float) (offY + (y - minY) * scale); }

    private void draw() {
        t.setLineWidth(0.3f);
        t.setColorStroke(Fonts.RULE);
        for (FramingPlan.Bay b : plan.bays()) fill(b.rect(), tint(occupancies.indexOf(b.occupancy())));
        for (FramingPlan.Cantilever c : plan.cantilevers()) cantilever(c);
        for (KeyPlan.Rect o : plan.openings()) PlanLegend.hatch(t, px(o.minX()), py(o.minY()), px(o.maxX()), py(o.maxY()));
        new PlanGrid(this, t, fonts, plan).draw();
        for (FramingPlan.Member m : plan.members()) if (m.role() != MemberRole.COLUMN) beam(m);
        for (FramingPlan.LoadLine l : plan.lineLoads()) lineLoad(l);
        for (FramingPlan.LoadPoint p : plan.pointLoads()) pointLoad(p);
        for (FramingPlan.Member m : plan.members()) if (m.role() == MemberRole.COLUMN) column(m);
    }

    private void fill(KeyPlan.Rect r, Color c) {
        t.setColorFill(c);
        t.rectangle(px(r.minX()), py(r.minY()), (float) ((r.maxX() - r.minX()) * scale), (float) ((r.maxY() - r.minY()) * scale));
        t.fillStroke();
    }

    private void cantilever(FramingPlan.Cantilever c) {
        t.saveState();
        t.setLineDash(3f, 1.5f, 0f);
        t.setColorStroke(Fonts.GREY);
        fill(c.rect(), CANTILEVER);
        t.restoreState();
        KeyPlan.Rect r = c.rect();
        float cx = (px(r.minX()) + px(r.maxX())) / 2, cy = (py(r.minY()) + py(r.maxY())) / 2;
        boolean tall = (r.maxY() - r.minY()) > (r.maxX() - r.minX());
        Text.show(t, fonts.regular, 4.5f, Fonts.INK, Element.ALIGN_CENTER,
                "cantilever slab " + PlanLengths.of(c.projection(), plan.system()), cx, cy - 1.5f, tall ? 90 : 0);
    }

    private void beam(FramingPlan.Member m) {
        KeyPlan.Line l = m.line();
        float x1 = px(l.x1()), y1 = py(l.y1()), x2 = px(l.x2()), y2 = py(l.y2());
        t.setColorStroke(Fonts.INK);
        t.setLineWidth(switch (m.role()) { case GIRDER -> 1.8f; case GRID_BEAM -> 1.0f; default -> 0.5f; });
        Drawing.line(t, x1, y1, x2, y2);
        boolean vertical = Math.abs(x2 - x1) < Math.abs(y2 - y1);
        float len = (float) Math.hypot(x2 - x1, y2 - y1), mx = (x1 + x2) / 2, my = (y1 + y2) / 2;
        String label = Text.fit(m.label(), fonts.regular, 4.5f, Math.max(12, len - 8));
        // the label sits beside the member, rotated with it, so that it never covers the line
        if (vertical) Text.show(t, fonts.regular, 4.5f, Fonts.INK, Element.ALIGN_CENTER, label, mx - 2f, my, 90);
        else Text.show(t, fonts.regular, 4.5f, Fonts.INK, Element.ALIGN_CENTER, label, mx, my + 2f, 0);
    }

    private void column(FramingPlan.Member m) {
        float x = px(m.line().x1()), y = py(m.line().y1());
        t.setColorFill(Fonts.INK);
        t.rectangle(x - 2.5f, y - 2.5f, 5, 5);
        t.fill();
        Text.show(t, fonts.bold, 4.5f, Fonts.INK, Element.ALIGN_LEFT, m.label(), x + 3.5f, y - 6.5f);
    }

    private void lineLoad(FramingPlan.LoadLine l) {
        KeyPlan.Line g = l.line();
        float x1 = px(g.x1()), y1 = py(g.y1()), x2 = px(g.x2()), y2 = py(g.y2());
        boolean vertical = Math.abs(x2 - x1) < Math.abs(y2 - y1);
        float dx = vertical ? 3.5f : 0, dy = vertical ? 0 : -3.5f;   // just inside the line, so the member stays visible
        t.saveState();
        t.setColorStroke(LOAD);
        t.setLineWidth(1.2f);
        t.setLineDash(new float[] {5f, 1.5f, 1f, 1.5f}, 0f);
        Drawing.line(t, x1 + dx, y1 + dy, x2 + dx, y2 + dy);
        t.restoreState();
        // the text a third of the way along, clear of the grid point a two-bay load has at its middle
        float mx = x1 + (x2 - x1) / 3 + 2 * dx, my = y1 + (y2 - y1) / 3 + 2 * dy - (vertical ? 0 : 4);
        Text.show(t, fonts.regular, 4.5f, LOAD, Element.ALIGN_CENTER, l.text(), mx + (vertical ? 3 : 0), my, vertical ? 90 : 0);
    }

    private void pointLoad(FramingPlan.LoadPoint p) {
        float x = px(p.x()), y = py(p.y());
        t.setColorStroke(LOAD);
        t.setColorFill(LOAD);
        t.setLineWidth(0.8f);
        Drawing.arrow(t, x + 9, y + 9, x + 1.5f, y + 1.5f, 3f);
        Text.show(t, fonts.regular, 4.5f, LOAD, Element.ALIGN_LEFT, p.text(), x + 10, y + 10);
    }
}
