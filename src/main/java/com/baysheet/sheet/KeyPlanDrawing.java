package com.baysheet.sheet;

import com.lowagie.text.Element;
import com.lowagie.text.pdf.PdfContentByte;
import com.lowagie.text.pdf.PdfTemplate;

import java.awt.Color;

/**
 * The key plan: the level's grid lines with their bubbles, the framed bays outlined, the member's
 * tributary area shaded and the member itself as a heavy line (a column as a filled square), to scale.
 */
final class KeyPlanDrawing {
    static final float WIDTH = 200, HEIGHT = 160;
    private static final float PAD = 20;
    private static final Color TRIBUTARY = new Color(0xc8, 0xc8, 0xc8);
    private static final Color BAY = new Color(0xf4, 0xf4, 0xf4);

    private final PdfTemplate t;
    private final double minX, minY, scale;
    private final float offX, offY;

    private KeyPlanDrawing(PdfTemplate t, KeyPlan p) {
        this.t = t;
        double x0 = Double.MAX_VALUE, x1 = -Double.MAX_VALUE, y0 = Double.MAX_VALUE, y1 = -Double.MAX_VALUE;
        for (KeyPlan.GridLine g : p.gridLines()) {
            if (g.alongX()) { x0 = Math.min(x0, g.position()); x1 = Math.max(x1, g.position()); }
            else { y0 = Math.min(y0, g.position()); y1 = Math.max(y1, g.position()); }
        }
        for (KeyPlan.Rect r : p.tributary()) {   // cantilever slabs reach past the outer grid lines
            x0 = Math.min(x0, r.minX()); x1 = Math.max(x1, r.maxX()); y0 = Math.min(y0, r.minY()); y1 = Math.max(y1, r.maxY());
        }
        double w = Math.max(x1 - x0, 1e-6), h = Math.max(y1 - y0, 1e-6);
        this.scale = Math.min((WIDTH - 2 * PAD) / w, (HEIGHT - 2 * PAD) / h);
        this.minX = x0;
        this.minY = y0;
        this.offX = (float) (PAD + ((WIDTH - 2 * PAD) - w * scale) / 2);
        this.offY = (float) (PAD + ((HEIGHT - 2 * PAD) - h * scale) / 2);
    }

    static PdfTemplate draw(PdfContentByte page, Fonts fonts, KeyPlan plan) {
        PdfTemplate t = page.createTemplate(WIDTH, HEIGHT);
        new KeyPlanDrawing(t, plan).draw(fonts, plan);
        return t;
    }

    private float px(double x) { return (float) (offX + (x - minX) * scale); }

    private float py(double y) { return (float) (offY + (y - minY) * scale); }

    private void draw(Fonts fonts, KeyPlan p) {
        t.setLineWidth(0.3f);
        t.setColorStroke(Fonts.RULE);
        for (KeyPlan.Rect b : p.bays()) rect(b, BAY, true);
        for (KeyPlan.Rect r : p.tributary()) rect(r, TRIBUTARY, true);
        t.setLineDash(4f, 1.5f, 0f);
        t.setColorStroke(Fonts.GREY);
        float top = HEIGHT - PAD + 6, left = PAD - 6;
        for (KeyPlan.GridLine g : p.gridLines()) {
            if (g.alongX()) Drawing.line(t, px(g.position()), PAD - 4, px(g.position()), top);
            else Drawing.line(t, left, py(g.position()), WIDTH - PAD + 4, py(g.position()));
        }
        t.setLineDash(0f);
        for (KeyPlan.GridLine g : p.gridLines()) {
            float bx = g.alongX() ? px(g.position()) : left - 5, by = g.alongX() ? top + 5 : py(g.position());
            t.setColorStroke(Fonts.INK);
            t.circle(bx, by, 5);
            t.stroke();
            Text.show(t, fonts.regular, 5f, Fonts.INK, Element.ALIGN_CENTER, Text.fit(g.name(), fonts.regular, 5f, 9), bx, by - 1.8f);
        }
        member(p.member());
    }

    private void rect(KeyPlan.Rect r, Color fill, boolean outline) {
        t.setColorFill(fill);
        t.rectangle(px(r.minX()), py(r.minY()), (float) ((r.maxX() - r.minX()) * scale), (float) ((r.maxY() - r.minY()) * scale));
        if (outline) t.fillStroke(); else t.fill();
    }

    private void member(KeyPlan.Line m) {
        t.setColorFill(Fonts.INK);
        t.setColorStroke(Fonts.INK);
        if (m.isPoint()) {
            t.rectangle(px(m.x1()) - 3, py(m.y1()) - 3, 6, 6);
            t.fill();
            return;
        }
        t.setLineWidth(2.4f);
        Drawing.line(t, px(m.x1()), py(m.y1()), px(m.x2()), py(m.y2()));
    }
}
