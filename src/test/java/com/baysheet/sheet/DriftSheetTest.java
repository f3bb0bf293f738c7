package com.baysheet.sheet;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.SnowOnRoof;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.RecordJson;
import com.baysheet.engine.snow.DriftStrip;
import com.baysheet.engine.snow.RoofStep;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.snow.StepDrift;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** A member under a drift: its sheet draws the drift on the load diagram and prints the statics of the surcharge. */
class DriftSheetTest {
    static CalcRecord beam(boolean drift) {
        SnowRoof roof = SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 0.25, false, Double.NaN).withSimpleSpans(true);
        List<StepDrift> steps = drift ? List.of(new StepDrift(new RoofStep(12, 30, 30), "wall on grid line 2 (Y1-Y2)",
                List.of(new DriftStrip(false, 0, 30, 10, 30, 0)))) : List.of();
        MemberInput in = new MemberInput("R-1 roof beam", MemberKind.INTERIOR_BEAM, new Support.Simple(30), 1,
                List.of(new AreaStrip("roof-ordinary", 10, 0, 30, 15)), List.of(), List.of(), 0, 0.25, Double.NaN, true, List.of(),
                new SnowOnRoof(roof, true, steps));
        return MemberCalculation.calculate(SnowSheetTest.CTX, in).record();
    }

    @Test
    void theSheetShowsTheDriftStepsAndTheDiagramLabel() {
        CalcRecord r = beam(true);
        assertThat(r.sketch().drift()).singleElement().satisfies(d -> {
            assertThat(d.start()).isZero();   // at x = 22.6 ft, w from the step
            assertThat(d.to()).isEqualTo(30.0);
        });
        String text = SheetFixtures.squash(SheetFixtures.text(SheetRenderer.issued(MemberSheet.of(SheetFixtures.header("R-1"), r)).bytes()));
        assertThat(text).contains(SheetFixtures.squash("S drift"), SheetFixtures.squash("uniform pieces"), SheetFixtures.squash("Roof step 1"));
    }

    @Test
    void aRecordWithoutDriftKeepsItsJsonWithoutADriftField() throws Exception {
        assertThat(RecordJson.mapper().readTree(RecordJson.write(beam(false))).path("sketch").has("drift")).isFalse();
        JsonNode drift = RecordJson.mapper().readTree(RecordJson.write(beam(true))).path("sketch").path("drift");
        assertThat(drift.isArray()).as("the sketch's drift pieces: %s", drift).isTrue();
        assertThat(drift).hasSize(beam(true).sketch().drift().size());
    }
}
