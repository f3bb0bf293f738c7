package com.baysheet.engine.beam;

import net.jqwik.api.ForAll;
import net.jqwik.api.Property;
import net.jqwik.api.constraints.DoubleRange;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Equilibrium, superposition and an independent direct-stiffness check of the statics, on random load sets. */
class BeamSolverProperties {
    static final double REL = 1e-8;
    /** The stiffness model solves a linear system whose conditioning grows as nodes crowd: a looser tolerance. */
    static final double FE_REL = 1e-6;

    @Property(tries = 300)
    void reactionsSumToTheAppliedLoadAndBalanceItsMoment(@ForAll long seed) {
        RandomBeams.Case c = RandomBeams.of(seed);
        BeamActions a = BeamSolver.solve(c.support(), c.loads(), Double.NaN);
        double total = c.loads().total(), scale = total * c.support().length();
        assertThat(a.left() + a.right()).as(c.toString()).isCloseTo(total, within(REL * total));
        double moment = c.support() instanceof com.baysheet.engine.load.Support.Cantilever
                ? -a.fixedMoment() : a.right() * c.support().span();
        assertThat(moment).as(c.toString()).isCloseTo(c.loads().momentAboutStart(), within(REL * scale));
    }

    @Property(tries = 200)
    void superpositionOfTwoLoadSetsIsExact(@ForAll long seed1, @ForAll long seed2) {
        RandomBeams.Case c = RandomBeams.of(seed1);
        BeamLoads other = RandomBeams.loads(new java.util.Random(seed2), c.support().length());
        BeamActions a = BeamSolver.solve(c.support(), c.loads(), c.ei());
        BeamActions b = BeamSolver.solve(c.support(), other, c.ei());
        BeamActions ab = BeamSolver.solve(c.support(), new BeamLoads().add(c.loads(), 1).add(other, 1), c.ei());
        double scale = (c.loads().total() + other.total()) * c.support().length();
        assertThat(ab.left()).isCloseTo(a.left() + b.left(), within(REL * scale));
        assertThat(ab.right()).isCloseTo(a.right() + b.right(), within(REL * scale));
        assertThat(ab.fixedMoment()).isCloseTo(a.fixedMoment() + b.fixedMoment(), within(REL * scale));
        assertThat(ab.tipDeflection()).isCloseTo(a.tipDeflection() + b.tipDeflection(),
                within(1e-7 * (Math.abs(a.maxDeflection()) + Math.abs(b.maxDeflection()))));
    }

    @Property(tries = 200)
    void everyActionScalesWithTheLoad(@ForAll long seed, @ForAll @DoubleRange(min = 0.1, max = 10) double k) {
        RandomBeams.Case c = RandomBeams.of(seed);
        BeamActions a = BeamSolver.solve(c.support(), c.loads(), c.ei());
        BeamActions ka = BeamSolver.solve(c.support(), new BeamLoads().add(c.loads(), k), c.ei());
        double scale = k * c.loads().total() * c.support().length();
        assertThat(ka.maxMoment()).isCloseTo(k * a.maxMoment(), within(REL * scale));
        assertThat(ka.minMoment()).isCloseTo(k * a.minMoment(), within(REL * scale));
        // equal and opposite shears may trade places: the magnitude is what designs
        assertThat(Math.abs(ka.maxShear())).isCloseTo(k * Math.abs(a.maxShear()), within(REL * scale));
        assertThat(ka.maxDeflection()).isCloseTo(k * a.maxDeflection(), within(1e-7 * Math.abs(k * a.maxDeflection()) + 1e-15));
    }

    @Property(tries = 400)
    void matchesTheDirectStiffnessMethod(@ForAll long seed) {
        RandomBeams.Case c = RandomBeams.of(seed);
        BeamActions a = BeamSolver.solve(c.support(), c.loads(), c.ei());
        DirectStiffness.Result fe = DirectStiffness.solve(c.support(), c.loads(), c.ei());
        double total = c.loads().total(), forceTol = FE_REL * total, momentTol = FE_REL * total * c.support().length();
        String why = c.toString();
        assertThat(a.left()).as(why).isCloseTo(fe.left(), within(forceTol));
        assertThat(a.right()).as(why).isCloseTo(fe.right(), within(forceTol));
        assertThat(a.fixedMoment()).as(why).isCloseTo(fe.fixedMoment(), within(momentTol));
        // the solver's extremes are attained where it says, and no node of the stiffness model exceeds them
        assertThat(a.maxMoment()).as(why).isCloseTo(fe.momentAt(a.maxMomentAt()), within(momentTol));
        assertThat(a.minMoment()).as(why).isCloseTo(fe.momentAt(a.minMomentAt()), within(momentTol));
        double dTol = FE_REL * Math.abs(a.maxDeflection());
        assertThat(a.maxDeflection()).as(why).isCloseTo(fe.deflectionAt(a.maxDeflectionAt()), within(dTol));
        assertThat(a.tipDeflection()).as(why).isCloseTo(fe.deflectionAt(c.support().length()), within(dTol));
        double feShear = 0;
        for (int i = 0; i < fe.x().length; i++) {
            assertThat(fe.moment()[i]).as(why).isBetween(a.minMoment() - momentTol, a.maxMoment() + momentTol);
            assertThat(Math.abs(fe.deflection()[i])).as(why).isLessThanOrEqualTo(Math.abs(a.maxDeflection()) + dTol);
            feShear = Math.max(feShear, Math.max(Math.abs(fe.shearLeft()[i]), Math.abs(fe.shearRight()[i])));
        }
        // shear is piecewise linear between nodes, so its largest magnitude is at a node
        assertThat(Math.abs(a.maxShear())).as(why).isCloseTo(feShear, within(forceTol));
    }
}
