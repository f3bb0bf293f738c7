package com.baysheet.sheet;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.SnowOnRoof;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.CalcContext;
import com.baysheet.engine.snow.Exposure;
import com.baysheet.engine.snow.Importance;
import com.baysheet.engine.snow.SnowRoof;
import com.baysheet.engine.snow.SnowSite;
import com.baysheet.engine.snow.Thermal;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Level;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** A roof member's sheet shows its snow case, and the cover lists the project's snow inputs. */
class SnowSheetTest {
    static final SnowSite SITE = new SnowSite(30, Exposure.of(Exposure.Terrain.C, Exposure.Shelter.PARTIALLY),
            Thermal.of(Thermal.Condition.HEATED), Importance.of(Importance.RiskCategory.II));
    static final CalcContext CTX = CalcContext.of(UnitSystem.US).withSnow(SITE);

    @Test
    void theSummaryOfResultsHasASnowColumnAndTheStepsTheirClauses() {
        MemberInput in = new MemberInput("R-1 roof beam", MemberKind.INTERIOR_BEAM, new Support.Simple(30), 1,
                List.of(new AreaStrip("roof-ordinary", 10, 0, 30, 15)), List.of(), List.of(), 0, 0.25, Double.NaN, true, List.of(),
                new SnowOnRoof(SnowRoof.of(SnowRoof.Shape.MONOSLOPE, 0.25, false, Double.NaN).withSimpleSpans(true), false));
        CalcRecord r = MemberCalculation.calculate(CTX, in).record();
        String text = SheetFixtures.squash(SheetFixtures.text(SheetRenderer.issued(MemberSheet.of(SheetFixtures.header("R-1"), r)).bytes()));
        assertThat(text).contains(SheetFixtures.squash("Snow S (not reduced)"), SheetFixtures.squash("7.3, Eq. 7.3-1"),
                SheetFixtures.squash("1.2D + 1.6S"), SheetFixtures.squash("balanced load governs"));
    }

    @Test
    void theCoverListsTheSnowInputs() {
        Grid g = new Grid(new GridAxis("x", List.of("1", "2"), List.of(30.0)), new GridAxis("y", List.of("A", "B"), List.of(30.0)));
        Level roof = Level.roof("R", 12, 0.25, List.of(Bay.floor(0, 0, "roof-ordinary", 20, new Framing(Direction.X, 1))));
        DesignCriteria c = Criteria.of(new Building("t", CTX, g, List.of(roof)));
        assertThat(c.options()).anyMatch(o -> o.startsWith("Roof snow: p_g = 30") && o.contains("terrain C, partially exposed")
                && o.contains("risk category II") && o.contains("7.3.4"));
        DesignCriteria none = Criteria.of(new Building("t", CalcContext.of(UnitSystem.US), g, List.of(roof)));
        assertThat(none.options()).contains("Roof snow: none (the project gives no ground snow load)");
    }
}
