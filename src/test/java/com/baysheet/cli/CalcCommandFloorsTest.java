package com.baysheet.cli;

import org.junit.jupiter.api.Test;

import java.io.IOException;

import static com.baysheet.cli.CalcCommandTest.stdin;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The optional {@code floors} field: a column's floors, each with its own kind (so its K_LL) and areas. */
class CalcCommandFloorsTest {
    /** A corner column below two office floors; the upper one has a cantilever slab. */
    static final String COLUMN = """
            {"units": "US", "subject": "C-1", "kind": "EXTERIOR_COLUMN", "support": {"type": "axial"},
             "areas": [{"occupancy": "office", "area": 405, "deadLoad": 60}, {"occupancy": "office", "area": 225, "deadLoad": 60}],
             "floors": [{"name": "L3", "kind": "CORNER_COLUMN_CANTILEVER", "areas": [{"occupancy": "office", "area": 405}]},
                        {"name": "L2", "kind": "EXTERIOR_COLUMN", "areas": [{"occupancy": "office", "area": 225}]}] %s}""";

    @Test
    void eachFloorCountsWithItsOwnKll() throws IOException {
        // Σ K_LL,i A_T,i = 2 × 405 + 4 × 225 = 1710 ft² (Table 4.7-1 K_LL; common practice for the sum);
        // ASCE 7-16 Eq. 4.7-1: f = 0.25 + 15/√1710 = 0.612738 ≥ 0.40 (two floors); P_L = 0.612738 × 50 × 630 = 19 301.3 lb
        CalcCommandTest.Run r = stdin(COLUMN.formatted(""));
        assertThat(r.err()).isEmpty();
        assertThat(r.result("L.P")).isCloseTo(19_301.3, within(0.1));
        assertThat(r.out()).contains("2.00 × 405 + 4.00 × 225");
    }

    @Test
    void floorsSupportedDefaultsToTheFloorsListed() throws IOException {
        assertThat(stdin(COLUMN.formatted(", \"floorsSupported\": 2")).result("L.P")).isEqualTo(stdin(COLUMN.formatted("")).result("L.P"));
        assertThat(stdin(COLUMN.formatted(", \"floorsSupported\": 3")).err()).contains("floorsSupported").contains("number of floors listed");
    }

    @Test
    void badFloorsAreNamedByTheirPath() {
        assertThat(stdin(COLUMN.formatted("").replace("\"CORNER_COLUMN_CANTILEVER\"", "\"INTERIOR_BEAM\"")).err()).contains("floors[0].kind");
        assertThat(stdin(COLUMN.formatted("").replace("\"CORNER_COLUMN_CANTILEVER\"", "\"PILLAR\"")).err()).contains("floors[0].kind");
        assertThat(stdin(COLUMN.formatted("").replace("\"area\": 405}]", "\"area\": 400}]")).err()).contains("floors").contains("add up");
        assertThat(stdin(COLUMN.formatted("").replace("\"name\": \"L2\"", "\"name\": \"L3\"")).err()).contains("floors[1].name");
        assertThat(stdin(COLUMN.formatted("").replace("\"name\": \"L2\", ", "")).err()).contains("floors[1].name");
        CalcCommandTest.Run roof = stdin(COLUMN.formatted("").replace("\"area\": 405}]", "\"area\": 405}, {\"occupancy\": \"roof-ordinary\", \"area\": 10}]"));
        assertThat(roof.err()).contains("floors[0].areas[1].occupancy").contains("roof");
    }
}
