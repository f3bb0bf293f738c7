package com.baysheet.engine.beam;

import com.baysheet.engine.load.Support;

import java.util.Random;

/** Random members and load sets for property tests, drawn from a seed so a failure can be replayed. */
final class RandomBeams {
    private RandomBeams() {}

    record Case(Support support, BeamLoads loads, double ei) {
        @Override
        public String toString() {
            StringBuilder s = new StringBuilder(support.toString()).append(" EI=").append(ei);
            for (int i = 0; i < loads.distributedCount(); i++)
                s.append(" w").append(loads.w(i)).append('[').append(loads.a(i)).append(',').append(loads.b(i)).append(']');
            for (int i = 0; i < loads.pointCount(); i++) s.append(" P").append(loads.p(i)).append('@').append(loads.x(i));
            return s.toString();
        }
    }

    static Support support(Random r) {
        double span = 4 + r.nextDouble() * 36;
        return switch (r.nextInt(3)) {
            case 0 -> new Support.Simple(span);
            case 1 -> new Support.Overhang(span, 1 + r.nextDouble() * span / 2);
            default -> new Support.Cantilever(2 + r.nextDouble() * 14);
        };
    }

    /**
     * Positions fall on a grid of length/200, as drawn positions do: loads often start, end or sit at the same
     * point (which the solver must merge), and no two distinct positions crowd, which would leave the
     * independent stiffness model ill-conditioned.
     */
    static final int GRID = 200;

    static double position(Random r, double length) { return length * r.nextInt(GRID + 1) / GRID; }

    static BeamLoads loads(Random r, double length) {
        BeamLoads l = new BeamLoads();
        int nd = 1 + r.nextInt(3), np = r.nextInt(4);
        for (int i = 0; i < nd; i++) {
            double a = position(r, length), b = position(r, length);
            if (r.nextInt(3) == 0) { a = 0; b = length; }
            l.distributed(10 + r.nextDouble() * 2000, Math.min(a, b), Math.max(a, b));
        }
        for (int i = 0; i < np; i++) l.point(100 + r.nextDouble() * 20000, position(r, length));
        if (l.isEmpty()) l.point(1000, length / 2);
        return l;
    }

    static Case of(long seed) {
        Random r = new Random(seed);
        Support s = support(r);
        return new Case(s, loads(r, s.length()), Math.pow(10, 5 + 3 * r.nextDouble()));
    }
}
