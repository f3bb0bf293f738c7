package com.baysheet.sheet;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.Derivation;
import com.baysheet.framing.Derived;
import com.baysheet.framing.TakeDown;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Level;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The printed take-down table: what each area column means, and the area that gave f beside it. */
class TakeDownTablesTest {
    /** Two 30 ft × 30 ft bays by two; F1 assembly (not reducible), F2 office. */
    static Derived mixed() {
        Grid g = new Grid(new GridAxis("x", List.of("1", "2", "3"), List.of(30.0, 30.0)), new GridAxis("y", List.of("A", "B", "C"), List.of(30.0, 30.0)));
        List<Level> levels = new ArrayList<>();
        for (String[] l : new String[][] {{"F1", "assembly-movable-seats"}, {"F2", "office"}}) {
            List<Bay> bays = new ArrayList<>();
            for (int c = 0; c < 2; c++) for (int r = 0; r < 2; r++) bays.add(Bay.floor(c, r, l[1], 60, new Framing(Direction.X, 1)));
            levels.add(Level.floor(l[0], levels.size() * 12 + 12, bays));
        }
        return Derivation.derive(new Building("t", CalcContext.of(UnitSystem.US), g, levels));
    }

    @Test
    void areaAtTheLevelIsLabelledApartFromTheCumulativeAndReducibleAreas() {
        Derived d = mixed();
        TakeDown t = d.takeDown("c1x1").orElseThrow();
        TakeDownTable table = TakeDownTables.of(d, t);
        assertThat(table.headings()).contains("Area at this level (ft²)", "A_T supported, cumulative (ft²)", "Reducible A_T, cumulative (ft²)",
                "Influence area Σ K_LL,i A_T,r,i (ft²)");
        // interior column B/2, 900 ft² a floor; below F1: A_T 1800 ft², reducible 900 ft² (the office), influence 4 × 900 = 3600 ft²
        List<String> f1 = table.rows().get(1);
        int at = table.headings().indexOf("Area at this level (ft²)");
        assertThat(f1.subList(at, at + 5)).containsExactly("900", "1800", "900", "4.00", "3600");
        assertThat(f1.get(at + 6)).isEqualTo("0.500"); // f = 0.25 + 15/√3600 = 0.50 (ASCE 7-16 Eq. 4.7-1)
    }
}
