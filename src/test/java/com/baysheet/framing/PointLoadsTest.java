package com.baysheet.framing;

import com.baysheet.engine.InputError;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridPointLoad;
import com.baysheet.framing.model.Level;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Point loads put on members by statics, against hand calculations. */
class PointLoadsTest {
    static final Grid G = Buildings.grid(new double[] {30}, new double[] {30});

    static Derived with(GridPointLoad... loads) {
        Level l = Level.floor("L2", 12, List.of(Bay.floor(0, 0, "office", 0, new Framing(Direction.X, 2))));
        return Derivation.derive(new Building("p", Buildings.US, G, List.of(l)).withPointLoads(List.of(loads)));
    }

    static CalcRecord record(Derived d, String name) {
        return d.members().stream().filter(m -> m.name().equals(name)).findFirst().orElseThrow().result().record();
    }

    @Test
    void aLoadBetweenTwoBeamsIsSharedByTheLeverRule() {
        // beams along x at y = 10 and 20 ft (s = 10 ft); 3000 lb at x = 12, y = 14 ft: u = 4 ft from the beam at 10 ft,
        // so it takes 1 − 4/10 = 0.6 (1800 lb) and the beam at 20 ft 0.4 (1200 lb), each at x = 12 ft.
        // Simple beam, load at a = 12 (AISC Manual Table 3-23, case 7): R_A = P b / ℓ = 1800 × 18 / 30 = 1080 lb.
        Derived d = with(GridPointLoad.inBay("L2", "RTU-1", 0, 0, 12, 14, 3000, 0, null));
        CalcRecord b1 = record(d, "Beam Y1-Y2/1-2 #1"), b2 = record(d, "Beam Y1-Y2/1-2 #2");
        assertThat(b1.result("D.RA")).isCloseTo(1080, within(1e-9));
        assertThat(b1.result("D.RB")).isCloseTo(720, within(1e-9));
        assertThat(b2.result("D.RA")).isCloseTo(1200 * 18 / 30.0, within(1e-9));
        assertThat(b1.step("P_D,point1").result()).isCloseTo(1800, within(1e-9));
        assertThat(b1.inputs().stream().filter(e -> e.key().equals("point[0]")).findFirst().orElseThrow().shown())
                .contains("RTU-1").contains("lever rule").contains("0.600");
        // the edge beams carry none of it
        assertThat(record(d, "Beam Y1/1-2").result("D.RA")).isEqualTo(0);
    }

    @Test
    void aLoadOnAGirderStaysThereAndLiveIsNotReduced() {
        // 2000 lb live (office) on girder 1/Y1-Y2 at 7.5 ft from Y2 toward Y1, i.e. at y = 22.5: R at Y1 = 2000 × 7.5 / 30 = 500 lb
        Derived d = with(GridPointLoad.onLine("L2", "tank", true, 0, 1, 0, 7.5, 0, 2000, "office"));
        CalcRecord g = record(d, "Girder 1/Y1-Y2");
        assertThat(g.step("P_L,point3").result()).isCloseTo(2000, within(1e-9));
        // its own reduction (K_LL A_T of the beams' office area) does not reach the point load's 2000 lb: L.RA ≥ 500 lb + reduced beams
        double beamsOnly = record(with(), "Girder 1/Y1-Y2").result("L.RA");
        assertThat(g.result("L.RA") - beamsOnly).isCloseTo(500, within(1e-6));
    }

    @Test
    void aLoadOutsideItsBayOrOffItsMemberIsRefusedNamingTheField() {
        assertThatThrownBy(() -> with(GridPointLoad.inBay("L2", "RTU-1", 0, 0, 31, 4, 3000, 0, null)))
                .isInstanceOf(InputError.class).hasMessageContaining("pointLoads[RTU-1].x").hasMessageContaining("outside bay");
        assertThatThrownBy(() -> with(GridPointLoad.inBay("L2", "RTU-1", 1, 0, 3, 4, 3000, 0, null)))
                .isInstanceOf(InputError.class).hasMessageContaining("pointLoads[RTU-1].bay");
        assertThatThrownBy(() -> with(GridPointLoad.onLine("L2", "tank", true, 0, 0, 1, 31, 100, 0, null)))
                .isInstanceOf(InputError.class).hasMessageContaining("pointLoads[tank].distance");
    }
}
