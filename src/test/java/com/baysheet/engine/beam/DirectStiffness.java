package com.baysheet.engine.beam;

import com.baysheet.engine.load.Support;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.ArrayRealVector;
import org.hipparchus.linear.LUDecomposition;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.RealVector;

import java.util.Arrays;
import java.util.TreeSet;
import java.util.stream.IntStream;

/**
 * An independent beam solver for the tests: Euler–Bernoulli beam elements assembled by the direct stiffness
 * method and solved with Hipparchus. With nodes at every load change and consistent nodal loads for uniform
 * loads, nodal displacements, reactions and end forces are exact; inside an element the moment follows from
 * its end forces and the deflection from its Hermite shape plus the fixed-end particular solution.
 * Upward forces and displacements positive in the model; results are given as sagging moments and downward
 * deflections to match the engine.
 */
final class DirectStiffness {
    static final int SUBDIVISIONS = 16;

    /** Nodes, their sagging moments, shears just left and right of each node, reactions, downward deflections. */
    record Result(double[] x, double[] moment, double[] shearLeft, double[] shearRight, double left, double right,
                  double fixedMoment, double[] deflection, double[] d, double[] q, double ei) {

        /** Sagging moment anywhere: the element's left-end moment and shear carried along it with its load. */
        double momentAt(double at) {
            int e = element(at);
            double t = at - x[e];
            return moment[e] + shearRight[e] * t + q[e] * t * t / 2;
        }

        /** Downward deflection anywhere: Hermite interpolation of the end displacements plus q t²(l − t)²/24EI. */
        double deflectionAt(double at) {
            int e = element(at);
            double l = x[e + 1] - x[e], s = (at - x[e]) / l;
            double h1 = 1 - 3 * s * s + 2 * s * s * s, h2 = l * (s - 2 * s * s + s * s * s);
            double h3 = 3 * s * s - 2 * s * s * s, h4 = l * (s * s * s - s * s);
            double t = at - x[e];
            double v = h1 * d[2 * e] + h2 * d[2 * e + 1] + h3 * d[2 * e + 2] + h4 * d[2 * e + 3]
                    + q[e] * t * t * (l - t) * (l - t) / (24 * ei);
            return -v;
        }

        private int element(double at) {
            for (int e = 0; e + 2 < x.length; e++) if (at <= x[e + 1]) return e;
            return x.length - 2;
        }
    }

    static Result solve(Support s, BeamLoads loads, double ei) {
        boolean cantilever = s instanceof Support.Cantilever;
        double length = s.length();
        TreeSet<Double> nodes = new TreeSet<>(java.util.List.of(0.0, length));
        if (!cantilever) nodes.add(s.span());
        for (int i = 0; i < loads.distributedCount(); i++) { nodes.add(loads.a(i)); nodes.add(loads.b(i)); }
        for (int i = 0; i < loads.pointCount(); i++) nodes.add(loads.x(i));
        double[] exact = merge(nodes, length * 1e-12);
        // mesh nodes only where they do not crowd a load node: short elements make the matrix ill-conditioned
        for (int i = 1; i < SUBDIVISIONS; i++) {
            double p = length * i / SUBDIVISIONS;
            if (Math.abs(exact[nodeAt(exact, p)] - p) > length / (4.0 * SUBDIVISIONS)) nodes.add(p);
        }
        double[] x = merge(nodes, length * 1e-12);
        int n = x.length, dof = 2 * n;
        RealMatrix k = new Array2DRowRealMatrix(dof, dof);
        double[] f = new double[dof], q = new double[n - 1];
        double[][] feq = new double[n - 1][];
        for (int e = 0; e + 1 < n; e++) {
            double l = x[e + 1] - x[e];
            q[e] = -intensity(loads, (x[e] + x[e + 1]) / 2);
            double[][] ke = element(ei, l);
            feq[e] = new double[] {q[e] * l / 2, q[e] * l * l / 12, q[e] * l / 2, -q[e] * l * l / 12};
            for (int i = 0; i < 4; i++) {
                f[2 * e + i] += feq[e][i];
                for (int j = 0; j < 4; j++) k.addToEntry(2 * e + i, 2 * e + j, ke[i][j]);
            }
        }
        for (int i = 0; i < loads.pointCount(); i++) f[2 * nodeAt(x, loads.x(i))] -= loads.p(i);
        int[] fixed = cantilever ? new int[] {0, 1} : new int[] {0, 2 * nodeAt(x, s.span())};
        double[] d = displacements(k, f, fixed);

        double[] m = new double[n], vl = new double[n], vr = new double[n], defl = new double[n];
        for (int e = 0; e + 1 < n; e++) {
            double[] fe = new Array2DRowRealMatrix(element(ei, x[e + 1] - x[e])).operate(Arrays.copyOfRange(d, 2 * e, 2 * e + 4));
            for (int i = 0; i < 4; i++) fe[i] -= feq[e][i];
            vr[e] = fe[0];
            m[e] = -fe[1];
            vl[e + 1] = -fe[2];
            m[e + 1] = fe[3];
        }
        for (int i = 0; i < n; i++) defl[i] = -d[2 * i];
        // reactions from the jump in shear at each support, not from K·d − f: a short element makes K's
        // entries huge and that difference loses digits, while its end forces stay accurate
        int j = nodeAt(x, s.span());
        double left = vr[0] + pointAt(loads, x[0]);
        double right = cantilever ? 0 : vr[j] - vl[j] + pointAt(loads, x[j]);
        double fixedMoment = cantilever ? m[0] : 0;
        return new Result(x, m, vl, vr, left, right, fixedMoment, defl, d, q, ei);
    }

    static int nodeAt(double[] x, double at) {
        int best = 0;
        for (int i = 1; i < x.length; i++) if (Math.abs(x[i] - at) < Math.abs(x[best] - at)) best = i;
        return best;
    }

    private static double[] displacements(RealMatrix k, double[] f, int[] fixed) {
        boolean[] held = new boolean[f.length];
        for (int j : fixed) held[j] = true;
        int[] free = IntStream.range(0, f.length).filter(i -> !held[i]).toArray();
        RealVector ff = new ArrayRealVector(free.length);
        for (int i = 0; i < free.length; i++) ff.setEntry(i, f[free[i]]);
        RealVector df = new LUDecomposition(k.getSubMatrix(free, free)).getSolver().solve(ff);
        double[] d = new double[f.length];
        for (int i = 0; i < free.length; i++) d[free[i]] = df.getEntry(i);
        return d;
    }

    private static double[][] element(double ei, double l) {
        double c = ei / (l * l * l);
        return new double[][] {
                {12 * c, 6 * l * c, -12 * c, 6 * l * c},
                {6 * l * c, 4 * l * l * c, -6 * l * c, 2 * l * l * c},
                {-12 * c, -6 * l * c, 12 * c, -6 * l * c},
                {6 * l * c, 2 * l * l * c, -6 * l * c, 4 * l * l * c}};
    }

    private static double pointAt(BeamLoads loads, double at) {
        double p = 0;
        for (int i = 0; i < loads.pointCount(); i++) if (Math.abs(loads.x(i) - at) <= 1e-12 * Math.max(1, at)) p += loads.p(i);
        return p;
    }

    private static double intensity(BeamLoads loads, double at) {
        double w = 0;
        for (int i = 0; i < loads.distributedCount(); i++) if (loads.a(i) < at && at < loads.b(i)) w += loads.w(i);
        return w;
    }

    private static double[] merge(TreeSet<Double> xs, double tol) {
        double[] out = new double[xs.size()];
        int u = 0;
        for (double v : xs) if (u == 0 || v - out[u - 1] > tol) out[u++] = v;
        return Arrays.copyOf(out, u);
    }
}
