package com.baysheet.sheet;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.LiveShare;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.PointLoad;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.units.UnitSystem;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.apache.pdfbox.text.TextPosition;
import org.junit.jupiter.api.Test;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Point-load labels on a girder carrying many beams: coincident loads drawn once, no two labels overlapping. */
class LoadDiagramLabelsTest {
    /** A 30 ft girder with a beam every 1.25 ft (23 beams, loads varying a little) and a second beam at midspan. */
    static CalcRecord crowdedGirder() {
        List<PointLoad> beams = new ArrayList<>();
        for (int i = 1; i <= 23; i++) beams.add(beam(1.25 * i, 4000 + 37 * i));
        beams.add(beam(15.0, 4000 + 37 * 12));   // a second beam at midspan, framing in from the other side
        return MemberCalculation.calculate(SheetFixtures.US, new MemberInput("Girder G9", MemberKind.INTERIOR_BEAM, new Support.Simple(30), 1,
                List.of(new AreaStrip("office", 2, 0, 30, 65)), List.of(), beams, 50, Double.NaN, Double.NaN, false)).record();
    }

    private static PointLoad beam(double x, double dead) {
        return new PointLoad(x, dead, List.of(new LiveShare("office", false, 3000)), List.of(new AreaShare("office", 60)));
    }

    @Test
    void labelsReadBackFromTheSheetNeverOverlap() throws IOException {
        byte[] pdf = SheetRenderer.issued(MemberSheet.of(SheetFixtures.header("Girder G9"), crowdedGirder())).bytes();
        List<Box> labels = labelBoxes(pdf).stream().filter(b -> b.text.matches("(\\d+ × |Σ)?P_D .*|P\\d+")).toList();
        assertThat(labels).hasSizeGreaterThan(5);
        for (int i = 0; i < labels.size(); i++)
            for (int j = i + 1; j < labels.size(); j++)
                assertThat(labels.get(i).overlaps(labels.get(j))).as(labels.get(i) + " and " + labels.get(j)).isFalse();
        String text = SheetFixtures.squash(SheetFixtures.text(pdf));
        assertThat(text).as("loads without room for a label are listed with their positions").contains("Pointloadsbykey:P1");
    }

    /** A run of text as one text-showing operator drew it, with its glyphs' extent on the page. */
    record Box(String text, float x0, float x1, float y0, float y1) {
        boolean overlaps(Box o) {
            float e = 0.05f;   // glyph boxes that only touch do not overlap
            return x0 < o.x1 - e && o.x0 < x1 - e && y0 < o.y1 - e && o.y0 < y1 - e;
        }
    }

    /** Each text-showing operator of page 1 (drawings included) as a box of its glyphs. */
    static List<Box> labelBoxes(byte[] pdf) throws IOException {
        List<Box> out = new ArrayList<>();
        List<TextPosition> run = new ArrayList<>();
        PDFTextStripper s = new PDFTextStripper() {
            @Override
            protected void showText(byte[] string) throws IOException {
                run.clear();
                super.showText(string);
                if (run.isEmpty()) return;
                StringBuilder t = new StringBuilder();
                float x0 = Float.MAX_VALUE, x1 = -Float.MAX_VALUE, y0 = Float.MAX_VALUE, y1 = -Float.MAX_VALUE;
                for (TextPosition p : run) {
                    t.append(p.getUnicode());
                    x0 = Math.min(x0, p.getXDirAdj());
                    x1 = Math.max(x1, p.getXDirAdj() + p.getWidthDirAdj());
                    y0 = Math.min(y0, p.getYDirAdj() - p.getHeightDir());
                    y1 = Math.max(y1, p.getYDirAdj());
                }
                out.add(new Box(t.toString(), x0, x1, y0, y1));
            }

            @Override
            protected void processTextPosition(TextPosition text) {
                run.add(text);
                super.processTextPosition(text);
            }
        };
        s.setStartPage(1);
        s.setEndPage(1);
        try (PDDocument d = Loader.loadPDF(pdf)) {
            s.getText(d);
        }
        return out;
    }
}
