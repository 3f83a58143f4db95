package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BooleanSupplier;
import org.hipparchus.complex.Complex;
import org.tertius.core.equation.PolynomialSystem;

/**
 * A member-1 solution started at x = 0 along the real axis, both sides, by {@link TaylorLine} in the variable
 * log x (from the point x_s where the series at 0 was summed; for x &lt; 0 on the sheet arg x = pi, reached by the
 * core engine), all unknowns kept. Points with 0 &lt; |x| &lt;= x_s are answered by the core engine, once, when the
 * line is built (so that later answers do not depend on the order of calls); x = 0 by the series. Immutable.
 */
final class MemberLine {
    private static final int ORDER = 32;
    private static final int MAX_STEPS = 100_000;

    /** The state at a point with its errors. */
    record StateAt(List<Complex> state, double[] errors) {
    }

    private final MemberSolution solution;
    private final double start;
    private final TaylorLine positive;
    private final TaylorLine negative;
    private final Map<Double, MemberValue> near = new HashMap<>();

    MemberLine(MemberSolution solution, double[] x, double tolerance, BooleanSupplier halt) {
        this.solution = solution;
        this.start = solution.startPoint().getReal();
        double right = 0;
        double left = 0;
        for (double v : x) {
            if (v != 0 && Math.abs(v) <= start) {
                near.put(v, solution.evaluate(new Complex(v)));
            }
            right = Math.max(right, v);
            left = Math.max(left, -v);
        }
        PolynomialSystem flow = solution.member().xFlow(solution.parameters());
        int d = solution.member().dimension();
        int[] all = new int[d];
        for (int i = 0; i < d; i++) {
            all[i] = i;
        }
        this.positive = right > start ? line(flow, new Complex(start), right, all, tolerance, halt) : null;
        this.negative = left > start ? line(flow, new Complex(-start), left, all, tolerance, halt) : null;
    }

    private TaylorLine line(PolynomialSystem flow, Complex x0, double reach, int[] all, double tolerance,
                            BooleanSupplier halt) {
        MemberValue v = solution.evaluate(x0);
        Complex[] y = v.state().toArray(new Complex[0]);
        double[] e = new double[y.length];
        for (int i = 0; i < y.length; i++) {
            e[i] = v.error(i);
        }
        // log x on the principal sheet: arg x = 0 or pi
        Complex tau = new Complex(Math.log(start), x0.getReal() > 0 ? 0 : Math.PI);
        return TaylorLine.integrate(flow, ORDER, tolerance, tau, Complex.ONE, Math.log(reach / start), y, e, all,
                MAX_STEPS, halt);
    }

    /** The unknowns at real x != 0 with their errors. */
    StateAt value(double x) {
        MemberValue v = near.get(x);
        if (v != null) {
            double[] e = new double[v.state().size()];
            for (int i = 0; i < e.length; i++) {
                e[i] = v.error(i);
            }
            return new StateAt(v.state(), e);
        }
        TaylorLine line = x > 0 ? positive : negative;
        double u = Math.log(Math.abs(x) / start);
        List<Complex> state = new ArrayList<>();
        double[] e = new double[solution.member().dimension()];
        for (int i = 0; i < e.length; i++) {
            double[] c = line.value(i, Math.min(u, line.length()));
            state.add(new Complex(c[0], c[1]));
            e[i] = c[2];
        }
        return new StateAt(state, e);
    }

    /** q = a(-1)12 / x at real x (at 0 from the series). */
    PotentialValue potential(double x) {
        if (x == 0) {
            MemberValue v = solution.valueAtOrigin();
            return new PotentialValue(Complex.ZERO, v.q(), v.errorQ());
        }
        StateAt s = value(x);
        Complex q = s.state().get(4).divide(x);
        return new PotentialValue(new Complex(x), q, s.errors()[4] / Math.abs(x) + 4 * Math.ulp(1.0) * q.norm());
    }
}
