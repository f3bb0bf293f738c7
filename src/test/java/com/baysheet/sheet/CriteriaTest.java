package com.baysheet.sheet;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.units.UnitSystem;
import com.baysheet.framing.model.Bay;
import com.baysheet.framing.model.Building;
import com.baysheet.framing.model.Direction;
import com.baysheet.framing.model.Framing;
import com.baysheet.framing.model.Grid;
import com.baysheet.framing.model.GridAxis;
import com.baysheet.framing.model.Level;
import com.baysheet.framing.model.Side;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** The cover's design criteria list every occupancy the model uses, the cantilever slabs' included. */
class CriteriaTest {
    @Test
    void aCantileverSlabsBalconyIsListedWithItsLoadAndTheChoiceNotToReduceIt() {
        Grid g = new Grid(new GridAxis("x", List.of("1", "2"), List.of(30.0)), new GridAxis("y", List.of("A", "B"), List.of(30.0)));
        Bay office = Bay.floor(0, 0, "office", 60, new Framing(Direction.Y, 2)).withCantilever(Side.SOUTH, 6);
        Building b = new Building("t", CalcContext.of(UnitSystem.US), g, List.of(Level.floor("L2", 12, List.of(office))));
        DesignCriteria c = Criteria.of(b);
        assertThat(c.loads()).extracting(DesignCriteria.LoadRow::occupancy).containsExactly("Offices", "Balcony or deck serving Offices");
        DesignCriteria.LoadRow balcony = c.loads().get(1);
        // ASCE 7-16 Table 4.3-1 (from memory): 1.5 × 50 psf = 75 psf; the concentrated load of the area served
        assertThat(balcony.liveLoad()).isEqualTo("75.0 psf");
        assertThat(balcony.concentrated()).isEqualTo("2.00 kip");
        assertThat(balcony.reduction()).isEqualTo("not reduced (conservative choice), Table 4.3-1");
    }
}
