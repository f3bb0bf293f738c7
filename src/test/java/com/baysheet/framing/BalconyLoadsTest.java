package com.baysheet.framing;

import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.DesignOptions;
import com.baysheet.engine.record.CalcRecord;
import com.baysheet.engine.record.Note;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * A cantilever slab on an office floor carries the balcony load, not the office's: ASCE 7-16 Table 4.3-1
 * (from memory) gives balconies and decks 1.5 × the live load of the area served, not over 100 psf, so
 * 1.5 × 50 = 75 psf, with no partition allowance (4.3.2 is for the area served) and, by our conservative
 * choice, not reduced. One 30 ft × 30 ft office bay, dead 60 psf, two infill beams spanning north-south at
 * x = 10 and 20 ft, the project's partition allowance on (15 psf, not reduced).
 */
class BalconyLoadsTest {
    private static final Grid GRID = Buildings.grid(new double[] {30}, new double[] {30});
    private static final Framing FRAMING = new Framing(Direction.Y, 2);

    private static Derived derive(Bay bay) {
        Building b = new Building("balcony", Buildings.US.withOptions(new DesignOptions(true, false)), GRID,
                List.of(Level.floor("F1", 12, List.of(bay))));
        return Derivation.derive(b);
    }

    private static Bay office() { return Bay.floor(0, 0, "office", 60, FRAMING); }

    private static DerivedMember member(Derived d, MemberRole role, MemberKind kind) {
        return d.members().stream().filter(m -> m.role() == role && m.kind() == kind).findFirst().orElseThrow();
    }

    @Test
    void edgeBeamCarriesSeventyFivePsfOnTheCantileverWithoutPartitions() {
        // East edge beam on line 2, span 30 ft, K_LL = 1 (Table 4.7-1, edge beam with cantilever slab):
        //   office 5 ft × 30 ft = 150 ft² (half the 10 ft beam spacing), balcony 6 ft × 30 ft = 180 ft².
        //   Only the office is reducible: K_LL A_T,r = 150 ft² < 400 ft², no reduction (4.7.2).
        //   w_L = 50 × 5 + 15 × 5 (partitions on the office only) + 75 × 6 = 250 + 75 + 450 = 775 plf
        //   R_L = 775 × 15 = 11 625 lb; M_L = 775 × 30² / 8 = 87 187.5 lb·ft (AISC Table 3-23, simple beam, uniform load)
        // Treated as office (the old behaviour) it would be 250 + 75 + 300 + 90 = 715 plf, R_L = 10 725 lb.
        DerivedMember edge = member(derive(office().withCantilever(Side.EAST, 6)), MemberRole.GRID_BEAM, MemberKind.EDGE_BEAM_CANTILEVER);
        CalcRecord r = edge.result().record();
        assertThat(r.result("L.RA")).isCloseTo(11_625.0, within(1e-6));
        assertThat(edge.areas()).containsOnlyKeys("office", "balcony:office");
        assertThat(edge.areas().get("balcony:office")).isCloseTo(180.0, within(1e-9));
        assertThat(r.inputs()).anySatisfy(e -> {
            assertThat(e.key()).isEqualTo("L0[balcony:office]");
            assertThat(e.value()).isEqualTo(75.0);
        });
        assertThat(r.result("L.RA")).isCloseTo(11_625.0, within(1e-6));
        assertThat(r.result("L.M+")).isCloseTo(87_187.5, within(1e-6));
        assertThat(r.steps()).extracting(s -> s.symbol()).contains("L_p[office]").doesNotContain("L_p[balcony:office]");
        assertBalconyNote(r);
    }

    @Test
    void edgeGirderCarriesTheBalconyStripBesideTheBeamReactions() {
        // North girder on line Y2, span 30 ft, K_LL = 1: the two infill beams each hand on
        //   P_L0 = 50 × 10 × 30 / 2 = 7500 lb and P_partitions = 15 × 10 × 30 / 2 = 2250 lb at x = 10 and 20 ft (300 ft² office),
        //   and the 6 ft cantilever slab loads it directly: 75 × 6 = 450 plf over 30 ft (180 ft² balcony).
        //   K_LL A_T,r = 300 ft² < 400 ft²: no reduction.
        //   R_L = 7500 + 2250 + 450 × 15 = 16 500 lb
        //   M_L = (7500 + 2250) × 10 + 450 × 30² / 8 = 97 500 + 50 625 = 148 125 lb·ft (two equal loads symmetrically placed + uniform)
        // Treated as office it would be R_L = 0.934653 × 12 000 + 3600 = 14 815.8 lb (f from K_LL A_T = 480 ft²).
        DerivedMember girder = member(derive(office().withCantilever(Side.NORTH, 6)), MemberRole.GIRDER, MemberKind.EDGE_BEAM_CANTILEVER);
        CalcRecord r = girder.result().record();
        assertThat(r.result("L.RA")).isCloseTo(16_500.0, within(1e-6));
        assertThat(girder.areas().get("office")).isCloseTo(300.0, within(1e-9));
        assertThat(girder.areas().get("balcony:office")).isCloseTo(180.0, within(1e-9));
        assertThat(r.result("L.RA")).isCloseTo(16_500.0, within(1e-6));
        assertThat(r.result("L.M+")).isCloseTo(148_125.0, within(1e-6));
        assertBalconyNote(r);
    }

    @Test
    void endColumnsTakeTheBalconyUnreducedBesideTheReducedOffice() {
        // Corner column Y1/2 (Table 4.7-1: corner column with cantilever slab, K_LL = 2), half-way rule:
        //   from the east edge beam: office 75 ft² (L0 3750 lb, partitions 1125 lb) and balcony 90 ft² (75 × 90 = 6750 lb);
        //   from the south girder: the beams' reactions, 150 ft² office (7500 lb, partitions 2250 lb).
        //   Office 225 ft²: K_LL A_T,r = 450 ft² ≥ 400; f = 0.25 + 15/√450 = 0.957107 (Eq. 4.7-1, above the 0.50 limit)
        //   L0 = 11 250 + 3375 + 6750 = 21 375 lb
        //   L = 0.957107 × 11 250 + 3375 + 6750 = 10 767.45 + 10 125 = 20 892.45 lb
        // Treated as office: 315 ft², f = 0.25 + 15/√630 = 0.847614, L = 0.847614 × 15 750 + 4725 = 18 074.9 lb.
        Derived d = derive(office().withCantilever(Side.EAST, 6));
        for (String point : List.of("Y1/2", "Y2/2")) {
            TakeDown t = d.takeDowns().stream().filter(x -> x.gridPoint().equals(point)).findFirst().orElseThrow();
            TakeDown.Row row = t.rows().get(0);
            assertThat(row.liveReduced()).as(point).isCloseTo(20_892.45, within(0.01));
            assertThat(row.kll()).isEqualTo(2.0);
            assertThat(row.areaAtLevel()).as(point).isCloseTo(315.0, within(1e-9));
            assertThat(row.liveUnreduced()).as(point).isCloseTo(21_375.0, within(1e-6));
            assertThat(row.liveReduced()).as(point).isCloseTo(20_892.45, within(0.01));
            DerivedMember column = d.members().stream().filter(m -> m.id().equals(row.member())).findFirst().orElseThrow();
            assertThat(column.areas().get("balcony:office")).isCloseTo(90.0, within(1e-9));
            assertBalconyNote(column.result().record());
        }
        // the west columns carry no balcony and no note
        TakeDown west = d.takeDowns().stream().filter(x -> x.gridPoint().equals("Y1/1")).findFirst().orElseThrow();
        assertThat(west.rows().get(0).areaAtLevel()).isCloseTo(225.0, within(1e-9));
    }

    @Test
    void anEnclosedCantileverGivenTheBaysOwnOccupancyCarriesItAsBefore() {
        // cantileverOccupancy = office: 50 × 6 + 15 × 6 on the slab, office area 330 ft², K_LL A_T = 330 < 400
        // w_L = (50 + 15) × 11 = 715 plf; R_L = 715 × 15 = 10 725 lb
        DerivedMember edge = member(derive(office().withCantilever(Side.EAST, 6).withCantileverOccupancy("office")),
                MemberRole.GRID_BEAM, MemberKind.EDGE_BEAM_CANTILEVER);
        assertThat(edge.areas()).containsOnlyKeys("office");
        assertThat(edge.result().record().result("L.RA")).isCloseTo(10_725.0, within(1e-6));
        assertThat(edge.result().record().notes()).noneMatch(n -> n.text().contains("Balcony"));
    }

    /** The record's INFO note cites the edition's load table, from the edition data. */
    private static void assertBalconyNote(CalcRecord r) {
        assertThat(r.notes()).anySatisfy(n -> {
            assertThat(n.level()).isEqualTo(Note.Level.INFO);
            assertThat(n.text()).contains("Balcony or deck serving Offices").contains("75.0 psf").contains("no partition allowance");
            assertThat(n.clause().label()).isEqualTo("ASCE 7-16 Table 4.3-1");
        });
    }
}
