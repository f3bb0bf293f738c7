package com.baysheet.engine.beam;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class BeamLoadsTest {
    @Test
    void totalAndFirstMomentSumDistributedAndPointLoads() {
        BeamLoads l = new BeamLoads().distributed(100, 2, 6).point(300, 5);
        assertThat(l.total()).isEqualTo(700);
        assertThat(l.momentAboutStart()).isCloseTo(400 * 4 + 300 * 5, within(1e-12));
    }

    @Test
    void zeroLoadsAndEmptyStretchesAreDropped() {
        BeamLoads l = new BeamLoads().distributed(0, 0, 5).distributed(100, 3, 3).point(0, 2);
        assertThat(l.isEmpty()).isTrue();
    }

    @Test
    void growsPastItsInitialCapacity() {
        BeamLoads l = new BeamLoads();
        for (int i = 1; i <= 20; i++) l.point(i, i);
        assertThat(l.pointCount()).isEqualTo(20);
        assertThat(l.total()).isEqualTo(210);
    }

    @Test
    void addScalesTheOtherLoads() {
        BeamLoads l = new BeamLoads().point(10, 1).add(new BeamLoads().distributed(50, 0, 2).point(20, 1), 0.5);
        assertThat(l.total()).isEqualTo(10 + 0.5 * (50 * 2 + 20));
    }

    @Test
    void withinCutsDistributedLoadsAndKeepsPointsInside() {
        BeamLoads l = new BeamLoads().distributed(100, 0, 25).point(500, 22).point(700, 10);
        BeamLoads back = l.within(0, 20);
        assertThat(back.total()).isCloseTo(2000 + 700, within(1e-12));
        BeamLoads over = l.within(20, 25);
        assertThat(over.total()).isCloseTo(500 + 500, within(1e-12));
    }
}
