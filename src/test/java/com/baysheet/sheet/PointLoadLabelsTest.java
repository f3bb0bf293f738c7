package com.baysheet.sheet;

import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The point-load label layout itself: one arrow per place, label boxes apart, coincident loads counted or summed. */
class PointLoadLabelsTest {
    @Test
    void theLayoutGivesEveryPlaceOneArrowAndBoxesApart() {
        CalcRecord r = LoadDiagramLabelsTest.crowdedGirder();
        Fonts fonts = Fonts.create(1);
        PointLoadLabels.Layout l = LoadDiagram.pointLabels(fonts, UnitSystem.US, r.sketch());
        assertThat(l.arrows()).hasSize(23);   // 24 beams at 23 places (the record's sketch has them as 23 loads)
        List<PointLoadLabels.Arrow> shown = l.arrows().stream().filter(PointLoadLabels.Arrow::labelled).toList();
        for (int i = 0; i < shown.size(); i++)
            for (int j = i + 1; j < shown.size(); j++) {
                PointLoadLabels.Arrow a = shown.get(i), b = shown.get(j);
                boolean apart = a.x1() <= b.x0() || b.x1() <= a.x0() || a.y1() <= b.y0() || b.y1() <= a.y0();
                assertThat(apart).as(a + " and " + b).isTrue();
            }
        long full = l.arrows().stream().filter(a -> a.text().contains("P_D")).count();
        assertThat(full + l.key().size()).as("every place is labelled in full or listed in the key").isEqualTo(23);
    }

    @Test
    void loadsAtOnePlaceAreOneArrowWithOneLabel() {
        var p = new com.baysheet.engine.record.Sketch.Point(10, 5200, 3100);
        var q = new com.baysheet.engine.record.Sketch.Point(20, 5200, 3100);
        var sketch = new com.baysheet.engine.record.Sketch("simple", 30, 30, List.of(), List.of(p, q, p), 0, 0);
        PointLoadLabels.Layout l = PointLoadLabels.of(Fonts.create(1).regular, UnitSystem.US, sketch, 140, 330, x -> 34 + 262 * x / 30);
        assertThat(l.arrows()).hasSize(2);
        assertThat(l.arrows().get(0).text()).isEqualTo("2 × P_D 5.20  P_L 3.10 kip");
        assertThat(l.arrows().get(1).text()).isEqualTo("P_D 5.20  P_L 3.10 kip");
        assertThat(l.key()).isEmpty();
    }

    @Test
    void equalLoadsAtOnePlaceAreCountedUnequalOnesSummed() {
        var a = new com.baysheet.engine.record.Sketch.Point(10, 5200, 3100);
        var b = new com.baysheet.engine.record.Sketch.Point(10, 4800, 3100);
        assertThat(PointLoadLabels.label(List.of(a, a), UnitSystem.US)).isEqualTo("2 × P_D 5.20  P_L 3.10 kip");
        assertThat(PointLoadLabels.label(List.of(a, b), UnitSystem.US)).isEqualTo("ΣP_D 10.0  ΣP_L 6.20 kip");
    }

}
