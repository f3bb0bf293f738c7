package com.baysheet.engine.beam;

import com.baysheet.engine.InputError;
import com.baysheet.engine.load.Support;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Closed-form cases of AISC Steel Construction Manual Table 3-23 (cited by case title), US base units. */
class BeamSolverTest {
    static final double EI = 2.9e7 * 500 / 144; // E 29,000 ksi, I 500 in⁴, in lb·ft²

    @Test
    void simpleBeamUniformLoad() {
        // Table 3-23, simple beam, uniformly distributed load: R = wℓ/2, M = wℓ²/8 at midspan, Δ = 5wℓ⁴/384EI
        double w = 1000, l = 20;
        BeamActions a = BeamSolver.solve(new Support.Simple(l), new BeamLoads().distributed(w, 0, l), EI);
        assertThat(a.left()).isCloseTo(w * l / 2, within(1e-9));
        assertThat(a.right()).isCloseTo(w * l / 2, within(1e-9));
        assertThat(Math.abs(a.maxShear())).isCloseTo(w * l / 2, within(1e-9));
        assertThat(a.maxMoment()).isCloseTo(w * l * l / 8, within(1e-7));
        assertThat(a.maxMomentAt()).isCloseTo(l / 2, within(1e-9));
        assertThat(a.maxDeflection()).isCloseTo(5 * w * Math.pow(l, 4) / (384 * EI), within(1e-12));
        assertThat(a.maxDeflectionAt()).isCloseTo(l / 2, within(1e-6));
    }

    @Test
    void simpleBeamConcentratedLoadAtAnyPoint() {
        // Table 3-23, simple beam, concentrated load at any point: R_A = Pb/ℓ, R_B = Pa/ℓ, M = Pab/ℓ under the load
        double p = 10000, l = 20, at = 5, b = l - at;
        BeamActions a = BeamSolver.solve(new Support.Simple(l), new BeamLoads().point(p, at), Double.NaN);
        assertThat(a.left()).isCloseTo(p * b / l, within(1e-9));
        assertThat(a.right()).isCloseTo(p * at / l, within(1e-9));
        assertThat(a.maxMoment()).isCloseTo(p * at * b / l, within(1e-7));
        assertThat(a.maxMomentAt()).isEqualTo(at);
        assertThat(a.maxDeflection()).isNaN();
    }

    @Test
    void simpleBeamConcentratedLoadAtCentre() {
        // Table 3-23, simple beam, concentrated load at centre: M = Pℓ/4, Δ = Pℓ³/48EI
        double p = 10000, l = 24;
        BeamActions a = BeamSolver.solve(new Support.Simple(l), new BeamLoads().point(p, l / 2), EI);
        assertThat(a.maxMoment()).isCloseTo(p * l / 4, within(1e-7));
        assertThat(a.maxDeflection()).isCloseTo(p * l * l * l / (48 * EI), within(1e-12));
        assertThat(a.maxDeflectionAt()).isCloseTo(l / 2, within(1e-6));
    }

    @Test
    void cantileverUniformLoad() {
        // Table 3-23, cantilever beam, uniformly distributed load: R = wℓ, M = wℓ²/2 at the fixed end;
        // free-end deflection wℓ⁴/8EI (from memory)
        double w = 500, l = 8;
        BeamActions a = BeamSolver.solve(new Support.Cantilever(l), new BeamLoads().distributed(w, 0, l), EI);
        assertThat(a.left()).isCloseTo(w * l, within(1e-9));
        assertThat(a.right()).isZero();
        assertThat(a.fixedMoment()).isCloseTo(-w * l * l / 2, within(1e-7));
        assertThat(a.minMoment()).isCloseTo(-w * l * l / 2, within(1e-7));
        assertThat(a.tipDeflection()).isCloseTo(w * Math.pow(l, 4) / (8 * EI), within(1e-12));
    }

    @Test
    void cantileverConcentratedLoadAtFreeEnd() {
        // Table 3-23, cantilever beam, concentrated load at free end: R = P, M = Pℓ; Δ = Pℓ³/3EI
        double p = 3000, l = 6;
        BeamActions a = BeamSolver.solve(new Support.Cantilever(l), new BeamLoads().point(p, l), EI);
        assertThat(a.left()).isCloseTo(p, within(1e-9));
        assertThat(a.fixedMoment()).isCloseTo(-p * l, within(1e-9));
        assertThat(a.maxDeflection()).isCloseTo(p * l * l * l / (3 * EI), within(1e-12));
        assertThat(a.maxDeflectionAt()).isCloseTo(l, within(1e-9));
    }

    @Test
    void beamOverhangingOneSupportUniformLoadPublishedExample() {
        // Table 3-23, beam overhanging one support, uniformly distributed load; REFERENCES.md example:
        // w = 1 k/ft, ℓ = 20 ft, a = 5 ft: R_A = 9.375 k, R_B = 15.625 k, M1 = 43.945 k-ft, M2 = −12.5 k-ft
        BeamActions a = BeamSolver.solve(new Support.Overhang(20, 5), new BeamLoads().distributed(1000, 0, 25), Double.NaN);
        assertThat(a.left()).isCloseTo(9375, within(1e-6));
        assertThat(a.right()).isCloseTo(15625, within(1e-6));
        assertThat(a.maxMoment()).isCloseTo(43945, within(0.5));
        assertThat(a.minMoment()).isCloseTo(-12500, within(1e-6));
        assertThat(a.minMomentAt()).isCloseTo(20, within(1e-9));
        // M1 at x = ℓ (1 − a²/ℓ²)/2 = 9.375 ft (same case)
        assertThat(a.maxMomentAt()).isCloseTo(9.375, within(1e-9));
    }

    @Test
    void beamOverhangingOneSupportFormulasHoldForOtherProportions() {
        // same case: R_A = w(ℓ² − a²)/2ℓ, R_B = w(ℓ + a)²/2ℓ, M1 = w(ℓ + a)²(ℓ − a)²/8ℓ², M2 = −wa²/2
        double w = 730, l = 17, o = 6.5;
        BeamActions a = BeamSolver.solve(new Support.Overhang(l, o), new BeamLoads().distributed(w, 0, l + o), Double.NaN);
        assertThat(a.left()).isCloseTo(w * (l * l - o * o) / (2 * l), within(1e-6));
        assertThat(a.right()).isCloseTo(w * (l + o) * (l + o) / (2 * l), within(1e-6));
        assertThat(a.maxMoment()).isCloseTo(w * Math.pow(l + o, 2) * Math.pow(l - o, 2) / (8 * l * l), within(1e-6));
        assertThat(a.minMoment()).isCloseTo(-w * o * o / 2, within(1e-6));
    }

    @Test
    void loadDirectlyOverASupportGoesStraightIntoIt() {
        BeamActions a = BeamSolver.solve(new Support.Simple(10), new BeamLoads().point(500, 0), Double.NaN);
        assertThat(a.left()).isCloseTo(500, within(1e-12));
        assertThat(a.maxMoment()).isZero();
    }

    @Test
    void loadOffTheMemberIsRefusedNamingItsPosition() {
        BeamLoads l = new BeamLoads().point(1000, 12);
        assertThatThrownBy(() -> BeamSolver.solve(new Support.Simple(10), l, Double.NaN))
                .isInstanceOf(InputError.class).hasMessageContaining("pointLoads[0].x").hasMessageContaining("12");
        BeamLoads d = new BeamLoads().distributed(100, 2, 11);
        assertThatThrownBy(() -> BeamSolver.solve(new Support.Simple(10), d, Double.NaN)).isInstanceOf(InputError.class);
    }

    @Test
    void axialSupportHasNoBendingActions() {
        assertThatThrownBy(() -> BeamSolver.solve(new Support.Axial(), new BeamLoads().point(1, 0), Double.NaN))
                .isInstanceOf(IllegalArgumentException.class);
    }

    @Test
    void independentStiffnessSolverReproducesTheOverhangExample() {
        // the test's own direct stiffness solver, checked on the published example before the properties rely on it
        DirectStiffness.Result r = DirectStiffness.solve(new Support.Overhang(20, 5), new BeamLoads().distributed(1000, 0, 25), EI);
        assertThat(r.left()).isCloseTo(9375, within(1e-4));
        assertThat(r.right()).isCloseTo(15625, within(1e-4));
        assertThat(r.momentAt(9.375)).isCloseTo(43945.3125, within(1e-3));
        assertThat(r.momentAt(20)).isCloseTo(-12500, within(1e-3));
        DirectStiffness.Result simple = DirectStiffness.solve(new Support.Simple(20), new BeamLoads().distributed(1000, 0, 20), EI);
        assertThat(simple.deflectionAt(10)).isCloseTo(5 * 1000 * Math.pow(20, 4) / (384 * EI), within(1e-10));
    }
}
