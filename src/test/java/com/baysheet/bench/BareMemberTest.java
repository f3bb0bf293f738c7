package com.baysheet.bench;

import com.baysheet.engine.CalcContext;
import com.baysheet.engine.code.MemberKind;
import com.baysheet.engine.code.Occupancy;
import com.baysheet.engine.load.AreaStrip;
import com.baysheet.engine.load.MemberInput;
import com.baysheet.engine.load.Support;
import com.baysheet.engine.member.MemberCalculation;
import com.baysheet.engine.member.MemberResult;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The engine benchmark's bare-arithmetic baseline computes the numbers the engine computes for the benchmark's
 * member, so that the ratio between them compares like with like (a check of equality, not a timing).
 */
class BareMemberTest {
    static final CalcContext US = CalcContext.of(UnitSystem.US);

    static MemberInput officeBeam() {
        return MemberInput.beam("B-1", MemberKind.INTERIOR_BEAM, new Support.Simple(BareMember.SPAN),
                List.of(new AreaStrip("office", BareMember.WIDTH, 0, BareMember.SPAN, BareMember.DEAD)));
    }

    static double[] bare() {
        Occupancy o = US.catalogue().get("office");
        double[] out = new double[BareMember.SLOTS];
        BareMember.calculate(BareMember.SPAN, BareMember.WIDTH, BareMember.DEAD, o.uniform(UnitSystem.US),
                US.edition().kll(MemberKind.INTERIOR_BEAM), o.concentrated(UnitSystem.US), o.contactSide(UnitSystem.US),
                US.constant("threshold"), US.edition().constant("limit.oneFloor"), out);
        return out;
    }

    @Test
    void theBaselinesNumbersAreTheEnginesForTheBenchmarkMember() {
        double[] bare = bare();
        MemberResult engine = MemberCalculation.calculate(US, officeBeam());
        for (int i = 0; i < BareMember.SLOTS; i++) {
            String key = BareMember.KEYS[i];
            double e = key.contains(".") ? engine.value(key) : engine.stepValue(key);
            assertThat(e).as(key).isNotNaN();
            // the same formulas in another order of operations: equal to rounding
            assertThat(bare[i]).as(key).isCloseTo(e, within(1e-12 * Math.max(1, Math.abs(e))));
        }
    }

    @Test
    void theBaselineCoversEveryBendingResultOfTheMember() {
        // every numeric bending result the engine records for the member is among the baseline's slots
        List<String> keys = List.of(BareMember.KEYS);
        for (var r : MemberCalculation.calculate(US, officeBeam()).record().results())
            if (!Double.isNaN(r.value())) assertThat(keys).as("result " + r.key()).contains(r.key());
    }

    @Test
    void theMemberIsReducedAndGovernedByItsUniformLoad() {
        // the inputs exercise the reduction (K_LL·A_T = 600 ft² ≥ 400) and the concentrated check (it does not govern)
        double[] bare = bare();
        assertThat(bare[0]).isLessThan(1).isGreaterThan(0.5);
        assertThat(bare[18]).isEqualTo(bare[10]);
    }
}
