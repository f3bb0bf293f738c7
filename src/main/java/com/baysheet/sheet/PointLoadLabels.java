package com.baysheet.sheet;

import com.baysheet.engine.record.Sketch;
import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import com.lowagie.text.pdf.BaseFont;

import java.util.ArrayList;
import java.util.List;
import java.util.function.DoubleUnaryOperator;

/**
 * Where the point-load labels of a load diagram go, so that no two overlap however many beams frame into a
 * girder. Loads at the same place are one arrow with one label ("2 × P_D 5.20  P_L 3.10 kip" where they are
 * equal, their sums otherwise). Each label takes the first of {@link #ROWS} rows where it clears the label
 * before it; where none has room, a short key ("P3") takes its place, and where even that has none, the arrow
 * goes unlabelled: keyed and unlabelled loads are listed under the diagram with their positions.
 */
final class PointLoadLabels {
    static final int ROWS = 2;
    static final float SIZE = 5.5f, ROW_PITCH = 8f, GAP = 3f, EDGE = 2f;
    /** Loads closer than this fraction of the member's length are drawn as one (the same beam line). */
    static final double SAME_PLACE = 1e-6;

    /** One arrow: where it stands (template x), its label (empty where there was no room) and the label's box. */
    record Arrow(float x, int row, String text, float x0, float x1, float y0, float y1) {
        boolean labelled() { return !text.isEmpty(); }
    }

    /** The arrows and, for each load not labelled in full, a line for the key under the diagram. */
    record Layout(List<Arrow> arrows, List<String> key) {}

    private PointLoadLabels() {}

    /** @param top the baseline of the upper row; @param x from a position along the member to template x */
    static Layout of(BaseFont font, UnitSystem system, Sketch s, float top, float width, DoubleUnaryOperator x) {
        List<Arrow> arrows = new ArrayList<>();
        List<String> key = new ArrayList<>();
        float[] rowEnd = new float[ROWS];
        java.util.Arrays.fill(rowEnd, -Float.MAX_VALUE);
        for (List<Sketch.Point> group : groups(s)) {
            float xp = (float) x.applyAsDouble(group.get(0).x());
            String full = label(group, system);
            Arrow a = place(font, full, xp, top, width, rowEnd);
            if (a == null || !a.text().equals(full)) {
                String k = "P" + (key.size() + 1);
                if (a == null) a = place(font, k, xp, top, width, rowEnd);
                if (a == null) a = new Arrow(xp, 0, "", xp, xp, top, top);
                key.add((a.labelled() ? k : k + " (unlabelled)") + " at " + Display.of(group.get(0).x(), Quantity.LENGTH, system) + ": " + full);
            }
            arrows.add(a);
        }
        return new Layout(arrows, key);
    }

    /** The label in the first row where it clears the one before it, or null where no row has room. */
    private static Arrow place(BaseFont font, String text, float xp, float top, float width, float[] rowEnd) {
        float w = font.getWidthPoint(text, SIZE);
        float cx = Math.max(EDGE + w / 2, Math.min(width - EDGE - w / 2, xp));
        for (int r = 0; r < ROWS; r++) {
            if (cx - w / 2 < rowEnd[r] + GAP) continue;
            rowEnd[r] = cx + w / 2;
            float base = top - r * ROW_PITCH;
            return new Arrow(xp, r, text, cx - w / 2, cx + w / 2, base + font.getFontDescriptor(BaseFont.DESCENT, SIZE),
                    base + font.getFontDescriptor(BaseFont.ASCENT, SIZE));
        }
        return null;
    }

    /** The point loads in order along the member, those at one place together. */
    static List<List<Sketch.Point>> groups(Sketch s) {
        List<Sketch.Point> sorted = new ArrayList<>(s.points());
        sorted.sort((a, b) -> Double.compare(a.x(), b.x()));
        List<List<Sketch.Point>> out = new ArrayList<>();
        double tol = SAME_PLACE * Math.max(s.length(), 1);
        for (Sketch.Point p : sorted) {
            List<Sketch.Point> last = out.isEmpty() ? null : out.get(out.size() - 1);
            if (last != null && Math.abs(last.get(0).x() - p.x()) <= tol) last.add(p);
            else out.add(new ArrayList<>(List.of(p)));
        }
        return out;
    }

    /** "P_D 5.20  P_L 3.10 kip", "2 × P_D 5.20  P_L 3.10 kip" for equal loads at one place, or the sums ("ΣP_D ..."). */
    static String label(List<Sketch.Point> group, UnitSystem system) {
        Sketch.Point first = group.get(0);
        boolean equal = group.stream().allMatch(p -> p.dead() == first.dead() && p.live() == first.live());
        if (group.size() == 1 || equal) {
            String one = "P_D " + Display.sig3(Quantity.FORCE.unit(system).fromBase(first.dead())) + "  P_L "
                    + Display.of(first.live(), Quantity.FORCE, system);
            return group.size() == 1 ? one : group.size() + " × " + one;
        }
        double dead = group.stream().mapToDouble(Sketch.Point::dead).sum(), live = group.stream().mapToDouble(Sketch.Point::live).sum();
        return "ΣP_D " + Display.sig3(Quantity.FORCE.unit(system).fromBase(dead)) + "  ΣP_L " + Display.of(live, Quantity.FORCE, system);
    }
}
