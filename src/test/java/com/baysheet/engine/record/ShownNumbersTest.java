package com.baysheet.engine.record;

import com.baysheet.engine.units.Display;
import com.baysheet.engine.units.Quantity;
import com.baysheet.engine.units.UnitSystem;
import org.junit.jupiter.api.Test;

import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;

/** A record's kept shown numbers are exactly what {@link Display} writes, however often and in whatever order asked. */
class ShownNumbersTest {
    private static final double[] AWKWARD = {0.0, -0.0, Double.NaN, Double.POSITIVE_INFINITY, Double.NEGATIVE_INFINITY,
            Double.MIN_VALUE, 9.995, 9.996, 30.0, 300.0, 1e-22, 1e22, -12.5};

    @Test
    void aRepeatedNumberIsShownAsWhenFirstWritten() {
        for (UnitSystem system : UnitSystem.values()) {
            ShownNumbers kept = new ShownNumbers(system);
            Random r = new Random(7 + system.ordinal());
            // a few thousand asks over about 300 values: past the table's capacity, with repeats of every kind
            double[] values = new double[300];
            for (int i = 0; i < values.length; i++)
                values[i] = i < AWKWARD.length ? AWKWARD[i] : Math.pow(10, r.nextDouble() * 8 - 3) * (r.nextBoolean() ? 1 : -1);
            for (int n = 0; n < 5000; n++) {
                double v = values[r.nextInt(n < 2000 ? 40 : values.length)];
                if (r.nextBoolean()) {
                    assertThat(kept.sig3(v)).as("sig3(%s)", v).isEqualTo(Display.sig3(v));
                } else {
                    Quantity q = Quantity.values()[r.nextInt(Quantity.values().length)];
                    assertThat(kept.of(v, q)).as("of(%s, %s, %s)", v, q, system).isEqualTo(Display.of(v, q, system));
                }
            }
        }
    }

    @Test
    void theSameValueAsAPlainNumberAndAsEachQuantityIsKeptApart() {
        ShownNumbers kept = new ShownNumbers(UnitSystem.US);
        for (int round = 0; round < 2; round++) {
            assertThat(kept.sig3(30.0)).isEqualTo("30.0");
            for (Quantity q : Quantity.values())
                assertThat(kept.of(30.0, q)).as("%s", q).isEqualTo(Display.of(30.0, q, UnitSystem.US));
        }
    }
}
