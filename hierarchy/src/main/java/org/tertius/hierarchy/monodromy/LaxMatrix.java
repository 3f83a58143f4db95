package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.hierarchy.HierarchyMember;
import org.tertius.hierarchy.Member1Map;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.MemberValue;

/**
 * The lambda-equation Phi_lambda = A(lambda) Phi of member n at one point of a solution:
 * A = sum_{k=-2}^{n-1} a_k lambda^k with a_k from the member state (a(k)11, a(k)12, a(k)21, k = -2 .. n-2, in the
 * order of {@link HierarchyMember#unknowns()}) and a_{n-1} = -i n t_n sigma3 (t_1 = x), together with the error
 * bounds of the state and the argument of the top time t_n on its surface (for member 1 the argument of x
 * including its sheet: the sectors at lambda = infinity turn with it, see {@link MonodromyMap}). Immutable.
 *
 * @param <T> number type
 */
public final class LaxMatrix<T> {
    private final AnalyticArithmetic<T> ar;
    private final int order;
    private final T x;
    private final List<T> times;
    private final T s;
    private final T m;
    private final List<Matrix<T>> coefficients;
    private final List<T> state;
    private final double[] stateErrors;
    private final double topArgument;

    private LaxMatrix(AnalyticArithmetic<T> ar, int order, T x, List<T> times, T s, T m, List<T> state,
                      double[] stateErrors, double topArgument) {
        this.ar = ar;
        this.order = order;
        this.x = x;
        this.times = List.copyOf(times);
        this.s = s;
        this.m = m;
        this.state = List.copyOf(state);
        this.stateErrors = stateErrors.clone();
        this.topArgument = topArgument;
        List<Matrix<T>> a = new ArrayList<>();
        for (int k = -2; k <= order - 2; k++) {
            int i = 3 * (k + 2);
            a.add(new Matrix<>(state.get(i), state.get(i + 1), state.get(i + 2), ar.negate(state.get(i))));
        }
        T top = ar.multiply(ar.of(0, -order), topTime());
        a.add(new Matrix<>(top, ar.zero(), ar.zero(), ar.negate(top)));
        this.coefficients = List.copyOf(a);
    }

    /**
     * The lambda-equation of member {@code order} at x with the times t_2 .. t_n, s and m, from a member state and
     * its error bounds.
     *
     * @param topArgument the argument of t_n (of x for member 1) on its surface: Arg + 2 pi (sheet)
     * @throws InvalidInputException for a wrong count, a non-finite entry, t_n = 0 (x = 0 for member 1), s = 0,
     *     or det a_-2 far from s^2
     */
    public static <T> LaxMatrix<T> of(AnalyticArithmetic<T> ar, int order, T x, List<T> times, T s, T m, List<T> state,
                                      double[] stateErrors, double topArgument) {
        HierarchyMember member = HierarchyMember.of(order);
        if (times == null || times.size() != order - 1) {
            throw new InvalidInputException("times", "member " + order + " takes " + (order - 1) + " times t_2 .. t_"
                    + order + ", got " + (times == null ? "none" : times.size()));
        }
        if (state == null || state.size() != member.dimension() || stateErrors == null
                || stateErrors.length != member.dimension()) {
            throw new InvalidInputException("state", "member " + order + " has " + member.dimension() + " unknowns "
                    + member.unknowns() + " with one error bound each");
        }
        requireFinite(ar, "x", x);
        requireFinite(ar, "s", s);
        requireFinite(ar, "m", m);
        for (int j = 0; j < times.size(); j++) {
            requireFinite(ar, "t_" + (j + 2), times.get(j));
        }
        for (int i = 0; i < state.size(); i++) {
            requireFinite(ar, "state " + member.unknowns().get(i), state.get(i));
            if (!(stateErrors[i] >= 0) || Double.isInfinite(stateErrors[i])) {
                throw new InvalidInputException("state error " + member.unknowns().get(i), "must be finite and >= 0");
            }
        }
        if (!Double.isFinite(topArgument)) {
            throw new InvalidInputException("topArgument", "must be finite");
        }
        LaxMatrix<T> lax = new LaxMatrix<>(ar, order, x, times, s, m, state, stateErrors, topArgument);
        if (ar.abs(lax.topTime()) == 0) {
            throw new InvalidInputException(order == 1 ? "x" : "t_" + order, order == 1
                    ? "x = 0 is the fixed singular point of member 1: there lambda = infinity is not an irregular"
                    + " singular point of the lambda-equation; take a point x != 0 of the solution"
                    : "must be non-zero (the lambda-equation has Poincare rank n at infinity only for t_n != 0)");
        }
        if (ar.abs(s) == 0) {
            throw new InvalidInputException("s", "must be non-zero: s = 0 (nilpotent a_-2, the D7-type equation) makes"
                    + " lambda = 0 a ramified irregular point whose formal solution is not implemented");
        }
        T det = ar.negate(ar.add(ar.multiply(state.get(0), state.get(0)), ar.multiply(state.get(1), state.get(2))));
        double deviation = ar.abs(ar.subtract(det, ar.multiply(s, s)));
        double allowed = 1e-8 * (1 + ar.abs(ar.multiply(s, s))) + 4 * (ar.abs(state.get(0)) * stateErrors[0]
                + ar.abs(state.get(1)) * stateErrors[2] + ar.abs(state.get(2)) * stateErrors[1]);
        if (!(deviation <= allowed)) {
            throw new InvalidInputException("state", "violates det a_-2 = s^2: det a_-2 = " + ar.toComplex(det)
                    + ", s^2 = " + ar.toComplex(ar.multiply(s, s)));
        }
        return lax;
    }

    /** The lambda-equation of a member solution at x (double precision; member 1: x on its sheet). */
    public static LaxMatrix<Complex> of(MemberSolution solution, SurfacePoint x) {
        return of(ComplexArithmetic.INSTANCE, solution, x);
    }

    /**
     * The lambda-equation of a member solution at x, its double-precision state converted exactly to the arithmetic.
     *
     * @throws InvalidInputException if x is a pole of the solution or so close to one that the state is not known to
     *     a relative accuracy of 1e-4
     */
    public static <T> LaxMatrix<T> of(AnalyticArithmetic<T> ar, MemberSolution solution, SurfacePoint x) {
        MemberValue v;
        try {
            v = solution.evaluate(x);
        } catch (UnreachableTargetException e) {
            // the engine's message says what stopped it; a target at a pole ends in a grown error estimate
            throw new InvalidInputException("x", "the solution cannot be evaluated at " + x + " (the point is at or next"
                    + " to a pole, or the way to it is blocked): " + e.getMessage());
        }
        List<T> state = new ArrayList<>();
        double[] err = new double[v.state().size()];
        double scale = 0;
        for (int i = 0; i < err.length; i++) {
            Complex c = v.state().get(i);
            if (!Double.isFinite(c.getReal()) || !Double.isFinite(c.getImaginary()) || !Double.isFinite(v.error(i))) {
                throw new InvalidInputException("x", x + " is a pole of the solution (its state is not finite there)");
            }
            state.add(ar.of(c.getReal(), c.getImaginary()));
            err[i] = v.error(i);
            scale = Math.max(scale, c.norm());
        }
        for (int i = 0; i < err.length; i++) {
            if (err[i] > 1e-4 * Math.max(1, scale)) {
                throw new InvalidInputException("x", "the state of the solution at " + x + " is known only to " + err[i]
                        + " (entry " + i + "), too little for monodromy data: the point is at or next to a pole, or"
                        + " the errors grew along the path to it");
            }
        }
        MemberParameters p = solution.parameters();
        int n = p.order();
        List<T> times = new ArrayList<>();
        for (Complex t : p.times()) {
            times.add(ar.of(t.getReal(), t.getImaginary()));
        }
        double argument = n == 1 ? x.logIm() : p.time(n).getArgument();
        return of(ar, n, ar.of(x.re(), x.im()), times, ar.of(p.s().getReal(), p.s().getImaginary()),
                ar.of(p.m().getReal(), p.m().getImaginary()), state, err, argument);
    }

    /**
     * The lambda-equation of member 1 at the image of a Painleve III value (D6: gamma delta != 0) under
     * {@link Member1Map#forEquation}(equation, s): x = (z/c)^2 on its sheet, m and T from alpha and beta, the state
     * in the gauge a(-1)12 = 1 at that point (Member1Map.state; needs w != 0). The errors of w and w' are carried to
     * the state by finite differences.
     */
    public static LaxMatrix<Complex> ofPainleve3(Painleve3 equation, Painleve3Value value, Complex s) {
        Member1Map map = Member1Map.forEquation(equation, s);
        MemberParameters p = map.parameters(equation);
        List<Complex> state = map.state(equation, value);
        double[] err = new double[state.size()];
        double[] sizes = {value.errW(), value.errDw()};
        for (int k = 0; k < 2; k++) {
            if (sizes[k] == 0) {
                continue;
            }
            double h = 1e-7 * Math.max(1, (k == 0 ? value.w() : value.dw()).norm());
            Painleve3Value moved = new Painleve3Value(value.point(), k == 0 ? value.w().add(h) : value.w(),
                    k == 1 ? value.dw().add(h) : value.dw(), 0, 0);
            List<Complex> other = map.state(equation, moved);
            for (int i = 0; i < err.length; i++) {
                err[i] += other.get(i).subtract(state.get(i)).norm() / h * sizes[k];
            }
        }
        for (int i = 0; i < err.length; i++) {
            err[i] += 4 * Math.ulp(1.0) * state.get(i).norm();
        }
        SurfacePoint x = map.x(value.point());
        ComplexArithmetic ar = ComplexArithmetic.INSTANCE;
        return of(ar, 1, x.z(), List.of(), p.s(), p.m(), state, err, x.logIm());
    }

    private static <T> void requireFinite(AnalyticArithmetic<T> ar, String name, T value) {
        if (value == null || !Double.isFinite(ar.abs(value))) {
            throw new InvalidInputException(name, "must be a finite complex number, got " + value);
        }
    }

    public AnalyticArithmetic<T> arithmetic() {
        return ar;
    }

    public int order() {
        return order;
    }

    public T x() {
        return x;
    }

    /** t_2 .. t_n. */
    public List<T> times() {
        return times;
    }

    /** t_j for 1 &lt;= j &lt;= n (t_1 = x). */
    public T time(int j) {
        return j == 1 ? x : times.get(j - 2);
    }

    /** t_n (x for member 1). */
    public T topTime() {
        return time(order);
    }

    public T s() {
        return s;
    }

    /** The formal monodromy exponent at infinity the state was built for. */
    public T m() {
        return m;
    }

    /** The member state, in the order of {@link HierarchyMember#unknowns()}. */
    public List<T> state() {
        return state;
    }

    public double stateError(int i) {
        return stateErrors[i];
    }

    /** The argument of t_n on its surface (member 1: of x, including its sheet). */
    public double topArgument() {
        return topArgument;
    }

    /** a_k, -2 &lt;= k &lt;= n-1. */
    public Matrix<T> coefficient(int k) {
        return coefficients.get(k + 2);
    }

    /** a_{-2} .. a_{n-1}. */
    List<Matrix<T>> coefficients() {
        return coefficients;
    }

    /** The same equation with another state (same length), without error bounds and without checks. */
    LaxMatrix<T> withState(List<T> other) {
        return new LaxMatrix<>(ar, order, x, times, s, m, other, new double[other.size()], topArgument);
    }

    /** Whether any entry of the state has a non-zero error bound. */
    boolean hasStateErrors() {
        for (double e : stateErrors) {
            if (e > 0) {
                return true;
            }
        }
        return false;
    }

    /** The trace form T = tr(a_-2 a_-1). */
    public T traceIntegral() {
        Matrix<T> a2 = coefficient(-2);
        Matrix<T> a1 = coefficient(-1);
        return ar.add(ar.add(ar.multiply(ar.of(2), ar.multiply(a2.m11(), a1.m11())), ar.multiply(a2.m12(), a1.m21())),
                ar.multiply(a2.m21(), a1.m12()));
    }
}
