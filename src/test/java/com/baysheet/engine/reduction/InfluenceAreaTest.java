package com.baysheet.engine.reduction;

import com.baysheet.engine.Fixtures;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.load.AreaShare;
import com.baysheet.engine.load.SupportedFloor;
import com.baysheet.engine.record.RecordBuilder;
import com.baysheet.engine.record.RecordJson;
import org.junit.jupiter.api.Test;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

import static com.baysheet.engine.code.MemberKind.CORNER_COLUMN_CANTILEVER;
import static com.baysheet.engine.code.MemberKind.EXTERIOR_COLUMN;
import static com.baysheet.engine.code.MemberKind.INTERIOR_COLUMN;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * A column's influence area over floors of differing K_LL: Σ K_LL,i × (reducible A_T,i) (common practice, from
 * memory: ASCE 7-16 Commentary C4.7 defines the influence area as K_LL A_T), taken by the 4.7.2 threshold and
 * Eq. 4.7-1 alike.
 */
class InfluenceAreaTest {
    RecordBuilder rec;

    static SupportedFloor floor(String name, MemberKind kind, Object... idAndArea) {
        List<AreaShare> a = new java.util.ArrayList<>();
        for (int i = 0; i < idAndArea.length; i += 2) a.add(new AreaShare((String) idAndArea[i], ((Number) idAndArea[i + 1]).doubleValue()));
        return new SupportedFloor(name, kind, a);
    }

    LiveFactors reduce(MemberKind kind, List<SupportedFloor> floors) {
        Map<String, Double> areas = new LinkedHashMap<>();
        for (SupportedFloor f : floors) for (AreaShare a : f.areas()) areas.merge(a.occupancy(), a.area(), Double::sum);
        rec = new RecordBuilder("C", "ASCE 7-16", Fixtures.US.system());
        return ReductionMethods.forEdition(Fixtures.US).reduce(Fixtures.US, kind, areas, floors, floors.size(), 0, rec);
    }

    @Test
    void theThresholdIsDecidedByTheSum() {
        // L2 corner column with cantilever slab (K_LL 2) 100 ft², L1 exterior column (K_LL 4) 40 ft²:
        // Σ K_LL,i A_T,i = 200 + 160 = 360 ft² < 400 ft² (4.7.2): no reduction. K_LL 4 over all 140 ft² would give
        // 560 ft² and f = 0.25 + 15/√560 = 0.884, an 11.6 % cut the code does not allow here.
        LiveFactors lf = reduce(EXTERIOR_COLUMN, List.of(floor("L2", CORNER_COLUMN_CANTILEVER, "office", 100), floor("L1", EXTERIOR_COLUMN, "office", 40)));
        assertThat(lf.influenceArea()).isCloseTo(360.0, within(1e-9));
        assertThat(lf.factor()).isEqualTo(1.0);
        assertThat(lf.of("office")).isEqualTo(1.0);
    }

    @Test
    void mixedOccupancyTakesTheReducibleAreaOfEachFloor() {
        // L2 (K_LL 2): office 300 ft² + assembly 200 ft² (not reducible, 4.7.5); L1 (K_LL 4): office 200 ft².
        // Σ K_LL,i A_T,r,i = 2 × 300 + 4 × 200 = 1400 ft²; f = 0.25 + 15/√1400 = 0.650892 (≥ 0.40, two floors).
        LiveFactors lf = reduce(EXTERIOR_COLUMN, List.of(floor("L2", CORNER_COLUMN_CANTILEVER, "office", 300, "assembly-other", 200),
                floor("L1", EXTERIOR_COLUMN, "office", 200)));
        assertThat(lf.tributaryArea()).isCloseTo(700.0, within(1e-9));
        assertThat(lf.reducibleArea()).isCloseTo(500.0, within(1e-9));
        assertThat(lf.influenceArea()).isCloseTo(1400.0, within(1e-9));
        assertThat(lf.of("office")).isCloseTo(0.650892, within(1e-6));
        assertThat(lf.of("assembly-other")).isEqualTo(1.0);
        var r = rec.build();
        assertThat(r.step("K_LL·A_T").formula()).isEqualTo("Σ K_LL,i × A_T,r,i");
        assertThat(r.step("K_LL·A_T").substituted()).isEqualTo("2.00 × 300 + 4.00 × 200");
        assertThat(r.notes()).anyMatch(n -> n.text().contains("reducible A_T, each floor with its own K_LL"));
    }

    @Test
    void theMultiFloorLimitApplies() {
        // 2 × 800 + 4 × 1200 = 6400 ft²: f_eq = 0.25 + 15/80 = 0.4375 ≥ 0.40; with 3 × 4000 more: floored at 0.40 (4.7.2)
        assertThat(reduce(INTERIOR_COLUMN, List.of(floor("L2", CORNER_COLUMN_CANTILEVER, "office", 800), floor("L1", INTERIOR_COLUMN, "office", 1200)))
                .factor()).isCloseTo(0.4375, within(1e-12));
        assertThat(reduce(INTERIOR_COLUMN, List.of(floor("L3", MemberKind.EDGE_COLUMN_CANTILEVER, "office", 4000),
                floor("L2", CORNER_COLUMN_CANTILEVER, "office", 800), floor("L1", INTERIOR_COLUMN, "office", 1200))).factor()).isEqualTo(0.4);
    }

    @Test
    void floorsSharingTheMembersKllGiveTheRecordOfOneKll() {
        // interior and exterior columns both have K_LL 4 (Table 4.7-1): the per-floor list changes nothing
        List<SupportedFloor> floors = List.of(floor("L2", EXTERIOR_COLUMN, "office", 300), floor("L1", INTERIOR_COLUMN, "office", 500));
        LiveFactors byFloor = reduce(INTERIOR_COLUMN, floors);
        String withFloors = RecordJson.write(rec.build());
        rec = new RecordBuilder("C", "ASCE 7-16", Fixtures.US.system());
        LiveFactors one = ReductionMethods.forEdition(Fixtures.US).reduce(Fixtures.US, INTERIOR_COLUMN, Map.of("office", 800.0), 2, 0, rec);
        assertThat(withFloors).isEqualTo(RecordJson.write(rec.build()));
        assertThat(byFloor).isEqualTo(one);
        assertThat(one.influenceArea()).isEqualTo(3200.0);
    }
}
