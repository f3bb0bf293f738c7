package com.baysheet.framing;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Beams and girders of one level, worked by hand. Two 30 ft × 30 ft office bays side by side along x
 * (L0 = 50 psf, ASCE 7-16 Table 4.3-1; dead 60 psf), two infill beams per bay spanning along x at 10 ft,
 * girders on the x grid lines carrying the beams. K_LL from Table 4.7-1, f from Eq. 4.7-1.
 */
class LevelFramingTest {
    private static final Grid GRID = Buildings.grid(new double[] {30, 30}, new double[] {30});
    private static final Derived D = Derivation.derive(Buildings.building(GRID,
            Buildings.floors(GRID, 1, "office", 60, new Framing(Direction.X, 2))));

    private static List<DerivedMember> role(MemberRole r) {
        return D.members().stream().filter(m -> m.role() == r).toList();
    }

    @Test
    void infillBeamWorkedByHand() {
        // A_T = 30 ft × 10 ft = 300 ft²; K_LL = 2 (interior beam); K_LL A_T = 600 ft² ≥ 400
        // f = 0.25 + 15/√600 = 0.25 + 0.612372 = 0.862372
        // w_L = 0.862372 × 50 psf × 10 ft = 431.186 plf; M_L = w ℓ²/8 = 431.186 × 30²/8 = 48 508.4 lb·ft; R_L = 431.186 × 15 = 6467.8 lb
        // w_D = 60 × 10 = 600 plf; M_D = 600 × 900/8 = 67 500 lb·ft (AISC Table 3-23, simple beam, uniform load)
        // M_u = 1.2 × 67 500 + 1.6 × 48 508.4 = 158 613.4 lb·ft (ASCE 7-16 2.3.1, 1.2D + 1.6L governs)
        List<DerivedMember> beams = role(MemberRole.INFILL_BEAM);
        assertThat(beams).hasSize(4);
        DerivedMember b = beams.get(0);
        assertThat(b.kind()).isEqualTo(MemberKind.INTERIOR_BEAM);
        assertThat(b.span()).isEqualTo(30.0);
        assertThat(b.tributaryWidth()).isCloseTo(10.0, within(1e-12));
        assertThat(b.tributaryArea()).isCloseTo(300.0, within(1e-9));
        CalcRecord r = b.result().record();
        assertThat(r.step("K_LL·A_T").result()).isCloseTo(600.0, within(1e-9));
        assertThat(r.step("f").result()).isCloseTo(0.862372, within(1e-6));
        assertThat(r.result("L.M+")).isCloseTo(48_508.4, within(0.1));
        assertThat(r.result("L.RA")).isCloseTo(6_467.8, within(0.1));
        assertThat(r.result("D.M+")).isCloseTo(67_500.0, within(1e-6));
        assertThat(r.result("LRFD.M+")).isCloseTo(158_613.4, within(0.2));
        assertThat(r.entry("LRFD.M+").label()).contains("LRFD 2");
    }

    @Test
    void girderCarryingBeamReactionsIsReducedWithItsOwnArea() {
        // Interior girder on grid line 2, span 30 ft, carries two beams from each bay at y = 10 ft and 20 ft.
        // Each beam hands on L0 = 50 × 10 × 30 / 2 = 7500 lb and D = 60 × 10 × 30 / 2 = 9000 lb: P_L0 = 15 000 lb, P_D = 18 000 lb per point.
        // A_T = 4 beams × 150 ft² = 600 ft²; K_LL = 2; K_LL A_T = 1200 ft²; f = 0.25 + 15/√1200 = 0.25 + 0.433013 = 0.683013
        // M_L = 0.683013 × P a = 0.683013 × 15 000 × 10 = 102 452 lb·ft; R_L = 0.683013 × 15 000 = 10 245.2 lb
        // (AISC Table 3-23, two equal loads symmetrically placed). With the beams' own reduced reactions
        // (f = 0.862372) it would be 129 356 lb·ft: the girder must not use them.
        // M_D = 18 000 × 10 = 180 000 lb·ft; M_u = 1.2 × 180 000 + 1.6 × 102 452 = 379 923 lb·ft
        DerivedMember g = role(MemberRole.GIRDER).stream().filter(m -> m.plan().x1() == 30.0).findFirst().orElseThrow();
        assertThat(g.kind()).isEqualTo(MemberKind.INTERIOR_BEAM);
        assertThat(g.span()).isEqualTo(30.0);
        assertThat(g.directArea()).isEqualTo(0.0);
        assertThat(g.tributaryArea()).isCloseTo(600.0, within(1e-9));
        assertThat(g.bays()).hasSize(2);
        CalcRecord r = g.result().record();
        assertThat(r.step("f").result()).isCloseTo(0.683013, within(1e-6));
        assertThat(r.result("L0.M+")).isCloseTo(150_000.0, within(1e-6));
        assertThat(r.result("L.M+")).isCloseTo(102_452.0, within(0.5));
        assertThat(r.result("L.M+")).isNotCloseTo(129_356.0, within(100.0));
        assertThat(r.result("L.RA")).isCloseTo(10_245.2, within(0.1));
        assertThat(r.result("D.M+")).isCloseTo(180_000.0, within(1e-6));
        assertThat(r.result("LRFD.M+")).isCloseTo(379_923.0, within(1.0));
    }

    @Test
    void edgeGirderAndGridBeamsTakeTheirShare() {
        // edge girder on line 1: two beams × 150 ft² = 300 ft², K_LL = 2 (edge beam without cantilever slab)
        DerivedMember edge = role(MemberRole.GIRDER).stream().filter(m -> m.plan().x1() == 0.0).findFirst().orElseThrow();
        assertThat(edge.kind()).isEqualTo(MemberKind.EDGE_BEAM);
        assertThat(edge.tributaryArea()).isCloseTo(300.0, within(1e-9));
        // grid beams on lines Y1 and Y2, parallel to the infill beams: half a spacing, 5 ft × 30 ft = 150 ft² per bay
        List<DerivedMember> grid = role(MemberRole.GRID_BEAM);
        assertThat(grid).hasSize(4);
        for (DerivedMember m : grid) {
            assertThat(m.kind()).isEqualTo(MemberKind.EDGE_BEAM);
            assertThat(m.tributaryWidth()).isCloseTo(5.0, within(1e-12));
            assertThat(m.directArea()).isCloseTo(150.0, within(1e-9));
            // K_LL A_T = 300 ft² < 400 ft²: no reduction (4.7.2)
            assertThat(m.result().record().result("L.RA")).isCloseTo(50 * 5 * 15.0, within(1e-9));
        }
    }
}
