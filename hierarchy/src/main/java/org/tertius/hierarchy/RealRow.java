package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.function.BooleanSupplier;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.equation.PolynomialSystem;

/**
 * q of an {@link OriginSolution} (member n &gt;= 2) at one t_n != 0 along the real x-axis on [-left, right]: the
 * x-flow from the state on x = 0 by {@link TaylorLine} both ways. Immutable and thread-safe.
 */
public final class RealRow {
    /** Taylor order of the lines. */
    private static final int ORDER = 32;
    private static final int MAX_STEPS = 400_000;

    private final Complex time;
    private final int n;
    private final TaylorLine forward;
    private final TaylorLine backward;
    /** For rows that keep every unknown: the observables and integrals; null otherwise. */
    private final StateObservables full;
    private final int component;

    private RealRow(Complex time, int n, TaylorLine forward, TaylorLine backward, StateObservables full,
                    int component) {
        this.time = time;
        this.n = n;
        this.forward = forward;
        this.backward = backward;
        this.full = full;
        this.component = component;
    }

    /**
     * @param solution the solution
     * @param tn the time t_n != 0
     * @param left how far to the left of x = 0 (&gt;= 0)
     * @param right how far to the right (&gt;= 0)
     * @param tolerance accepted truncation error per Taylor step (relative)
     * @param halt polled once per step (cancellation), or null
     * @throws org.tertius.core.UnreachableTargetException when the steps collapse (a singularity close to the axis)
     */
    public static RealRow of(OriginSolution solution, Complex tn, double left, double right, double tolerance,
                             BooleanSupplier halt) {
        if (!(left >= 0) || !(right >= 0) || !Double.isFinite(left) || !Double.isFinite(right)) {
            throw new InvalidInputException("x", "the row extends a finite distance >= 0 each way, got left = " + left
                    + ", right = " + right);
        }
        List<Complex> state = new ArrayList<>();
        double[] err = solution.stateOnTheAxis(tn, state);
        return of(solution, tn, state.toArray(new Complex[0]), err, left, right, tolerance, halt, false);
    }

    /**
     * As {@link #of(OriginSolution, Complex, double, double, double, BooleanSupplier)}, keeping every unknown so
     * that {@link #value(double)} can report them with r, the derivatives and the first integrals.
     */
    public static RealRow withAllUnknowns(OriginSolution solution, Complex tn, double left, double right,
                                          double tolerance, BooleanSupplier halt) {
        List<Complex> state = new ArrayList<>();
        double[] err = solution.stateOnTheAxis(tn, state);
        return of(solution, tn, state.toArray(new Complex[0]), err, left, right, tolerance, halt, true);
    }

    /** As {@link #of(OriginSolution, Complex, double, double, double, BooleanSupplier)} from a known axis state. */
    static RealRow of(OriginSolution solution, Complex tn, Complex[] state, double[] err, double left, double right,
                      double tolerance, BooleanSupplier halt, boolean all) {
        HierarchyMember member = solution.member();
        int n = member.order();
        MemberParameters p = solution.parameters(tn);
        PolynomialSystem flow = member.xFlow(p);
        int q = MemberEquations.index(n - 2, 1);
        int[] component = all ? new int[member.dimension()] : new int[] {q};
        for (int i = 0; all && i < component.length; i++) {
            component[i] = i;
        }
        BooleanSupplier stop = halt == null ? () -> false : halt;
        TaylorLine forward = TaylorLine.integrate(flow, ORDER, tolerance, Complex.ZERO, Complex.ONE, right, state, err,
                component, MAX_STEPS, stop);
        TaylorLine backward = left > 0 ? TaylorLine.integrate(flow, ORDER, tolerance, Complex.ZERO,
                Complex.ONE.negate(), left, state, err, component, MAX_STEPS, stop) : null;
        StateObservables observables = all ? new StateObservables(member, p, Complex.ZERO, Arrays.asList(state))
                : null;
        return new RealRow(tn, n, forward, backward, observables, all ? q : 0);
    }

    /** The time t_n of the row. */
    public Complex time() {
        return time;
    }

    /** Steps taken (both ways). */
    public int steps() {
        return forward.steps() + (backward == null ? 0 : backward.steps());
    }

    /** q at real x in [-left, right] with its error (first-order propagation, truncation and rounding). */
    public PotentialValue potential(double x) {
        double[] v = line(x).value(component, Math.abs(x));
        Complex q = new Complex(v[0], v[1]).divide(time.multiply(n));
        double scale = n * time.norm();
        return new PotentialValue(new Complex(x), q, v[2] / scale + 4 * Math.ulp(1.0) * q.norm());
    }

    /** dq/dx at real x in [-left, right] (from the Taylor polynomials of the steps). */
    public Complex derivative(double x) {
        double[] d = line(x).derivative(component, Math.abs(x));
        Complex dq = new Complex(d[0], d[1]).divide(time.multiply(n));
        return x < 0 ? dq.negate() : dq;
    }

    /** Every unknown at real x with q, r, their x-derivatives and the first integrals (rows made withAllUnknowns). */
    public MemberValue value(double x) {
        if (full == null) {
            throw new InvalidInputException("row", "this row keeps q only; make it with RealRow.withAllUnknowns");
        }
        TaylorLine line = line(x);
        List<Complex> state = new ArrayList<>();
        double[] err = new double[n * 3 + 3];
        for (int i = 0; i < err.length; i++) {
            double[] v = line.value(i, Math.abs(x));
            state.add(new Complex(v[0], v[1]));
            err[i] = v[2];
        }
        return full.value(new Complex(x), state, err);
    }

    private TaylorLine line(double x) {
        TaylorLine line = x >= 0 ? forward : backward;
        if (line == null || !(Math.abs(x) <= line.length())) {
            throw new InvalidInputException("x", "must lie within the row [" + (backward == null ? 0
                    : -backward.length()) + ", " + forward.length() + "], got " + x);
        }
        return line;
    }
}
