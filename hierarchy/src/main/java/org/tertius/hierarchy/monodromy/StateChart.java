package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * Coordinates on the member states of fixed x, times, s, m and trace form T = 2 i s m0: the 2n + 1 entries left
 * free by det a_-2 = s^2, the trace form and the diagonal constraints (the diagonal entries a(k)11, k &gt;= -1, follow
 * from the exponents at infinity, computed by {@link FormalSolution}).
 * <ul>
 *   <li>Complex chart: a(-2)11, a(-2)P, a(-1)P, then a(k)12, a(k)21 for k = 0 .. n-2, with P = 12 (then
 *       a(-2)21 = -(s^2 + a(-2)11^2) / a(-2)12 and a(-1)21 from T) or P = 21 (the mirror image).</li>
 *   <li>Real chart (the reality symmetry r = -conj(q): every a_k anti-Hermitian, for real x, times and s,
 *       imaginary m and m0): real coordinates u, theta, w, then Re and Im of a(k)12 for k = 0 .. n-2, with
 *       a(-2) = [[i u, rho e^(i theta)], [-rho e^(-i theta), -i u]], rho = sqrt(s^2 - u^2), and
 *       a(-1)12 = e^(i theta) (v + i w) where v is fixed by T. theta is the gauge (a phase for this symmetry).</li>
 * </ul>
 * Immutable.
 *
 * @param <T> number type
 */
final class StateChart<T> {
    private final AnalyticArithmetic<T> ar;
    private final UnaryOperator<T> conj;
    private final int order;
    private final T x;
    private final List<T> times;
    private final T s;
    private final T m;
    private final T trace;
    private final boolean real;
    private final boolean pivot12;

    StateChart(AnalyticArithmetic<T> ar, int order, T x, List<T> times, T s, T m, T trace, boolean real,
               boolean pivot12) {
        this.ar = ar;
        this.conj = Conjugation.of(ar);
        this.order = order;
        this.x = x;
        this.times = List.copyOf(times);
        this.s = s;
        this.m = m;
        this.trace = trace;
        this.real = real;
        this.pivot12 = pivot12;
    }

    int dimension() {
        return 2 * order + 1;
    }

    boolean real() {
        return real;
    }

    private T time(int j) {
        return j == 1 ? x : times.get(j - 2);
    }

    private T i() {
        return ar.of(0, 1);
    }

    /** The full state (order of HierarchyMember.unknowns()) at the given coordinates. */
    List<T> state(List<T> c) {
        int n = order;
        List<T> st = new ArrayList<>();
        for (int i = 0; i < 3 * (n + 1); i++) {
            st.add(ar.zero());
        }
        T a2;
        T v;
        T w = null;
        T e = null;
        T rho = null;
        if (real) {
            T u = c.get(0);
            T rho2 = ar.subtract(ar.multiply(s, s), ar.multiply(u, u));
            if (!(ar.toComplex(rho2).getReal() > 0)) {
                throw new InvalidInputException("state", "a(-2)11 = i u needs |u| < |s| under the reality symmetry");
            }
            rho = ar.sqrt(rho2);
            e = ar.exp(ar.multiply(i(), c.get(1)));
            st.set(0, ar.multiply(i(), u));
            st.set(1, ar.multiply(rho, e));
            st.set(2, ar.negate(ar.multiply(rho, ar.reciprocal(e))));
            w = c.get(2);
            for (int k = 0; k <= n - 2; k++) {
                T re = c.get(3 + 2 * k);
                T im = c.get(4 + 2 * k);
                st.set(3 * (k + 2) + 1, ar.add(re, ar.multiply(i(), im)));
                st.set(3 * (k + 2) + 2, ar.negate(ar.subtract(re, ar.multiply(i(), im))));
            }
        } else {
            T a11 = c.get(0);
            T other = ar.negate(ar.divide(ar.add(ar.multiply(s, s), ar.multiply(a11, a11)), c.get(1)));
            st.set(0, a11);
            st.set(pivot12 ? 1 : 2, c.get(1));
            st.set(pivot12 ? 2 : 1, other);
            st.set(pivot12 ? 4 : 5, c.get(2));
            for (int k = 0; k <= n - 2; k++) {
                st.set(3 * (k + 2) + 1, c.get(3 + 2 * k));
                st.set(3 * (k + 2) + 2, c.get(4 + 2 * k));
            }
        }
        completeDiagonal(st);
        T a1 = st.get(3);
        if (real) {
            // T = 2 a(-2)11 a(-1)11 - 2 rho v
            v = ar.divide(ar.subtract(ar.multiply(ar.of(2), ar.multiply(st.get(0), a1)), trace), ar.multiply(ar.of(2), rho));
            T inner = ar.add(v, ar.multiply(i(), w));
            st.set(4, ar.multiply(e, inner));
            st.set(5, ar.negate(ar.multiply(ar.reciprocal(e), conj.apply(inner))));
        } else {
            a2 = st.get(0);
            int free = pivot12 ? 4 : 5;
            int solved = pivot12 ? 5 : 4;
            int pivot = pivot12 ? 1 : 2;
            int partner = pivot12 ? 2 : 1;
            T rest = ar.subtract(ar.subtract(trace, ar.multiply(ar.of(2), ar.multiply(a2, a1))),
                    ar.multiply(st.get(partner), st.get(free)));
            st.set(solved, ar.divide(rest, st.get(pivot)));
        }
        return st;
    }

    /** a(k)11 for k = -1 .. n-2 from the exponents at infinity -i theta_inf' + m / lambda. */
    private void completeDiagonal(List<T> st) {
        int n = order;
        List<Matrix<T>> a = new ArrayList<>();
        for (int k = -2; k <= n - 2; k++) {
            int b = 3 * (k + 2);
            a.add(new Matrix<>(st.get(b), st.get(b + 1), st.get(b + 2), ar.negate(st.get(b))));
        }
        T top = ar.multiply(ar.of(0, -n), time(n));
        a.add(new Matrix<>(top, ar.zero(), ar.zero(), ar.negate(top)));
        List<T> targets = new ArrayList<>();
        for (int k = n - 2; k >= 0; k--) {
            targets.add(ar.multiply(ar.of(0, -(k + 1)), time(k + 1)));
        }
        targets.add(m);
        FormalSolution<T> f = FormalSolution.compute(ar, a, -2, targets, 0);
        for (int k = -1; k <= n - 2; k++) {
            st.set(3 * (k + 2), f.coefficient(k).m11());
        }
    }

    /** Coordinates of a state (the inverse of {@link #state}; under the real chart the state must be symmetric). */
    List<T> coordinates(List<T> st) {
        List<T> c = new ArrayList<>();
        if (real) {
            T twoI = ar.of(0, 2);
            T u = ar.divide(ar.subtract(st.get(0), conj.apply(st.get(0))), twoI);
            T logA = ar.log(st.get(1));
            T theta = ar.divide(ar.subtract(logA, conj.apply(logA)), twoI);
            T inner = ar.multiply(st.get(4), ar.exp(ar.multiply(ar.of(0, -1), theta)));
            T w = ar.divide(ar.subtract(inner, conj.apply(inner)), twoI);
            c.add(u);
            c.add(theta);
            c.add(w);
            for (int k = 0; k <= order - 2; k++) {
                T a12 = st.get(3 * (k + 2) + 1);
                c.add(ar.divide(ar.add(a12, conj.apply(a12)), ar.of(2)));
                c.add(ar.divide(ar.subtract(a12, conj.apply(a12)), twoI));
            }
        } else {
            c.add(st.get(0));
            c.add(st.get(pivot12 ? 1 : 2));
            c.add(st.get(pivot12 ? 4 : 5));
            for (int k = 0; k <= order - 2; k++) {
                c.add(st.get(3 * (k + 2) + 1));
                c.add(st.get(3 * (k + 2) + 2));
            }
        }
        return c;
    }

    /**
     * Coordinates to start from when no state is given: a generic point (no symmetry beyond the chart's, no zero
     * off-diagonal entry), with a_-2 of size |s|: complex chart a(-2)11 = 0.3 s, a(-2)P = (0.8 + 0.5 i) s,
     * a(-1)P = 0.2 + 0.1 i, then a(k)12 = 0.1, a(k)21 = -0.1; real chart u = 0.3 |s|, theta = 0.7, w = 0.2, then
     * a(k)12 = 0.1 - 0.1 i. Variant k turns the phases of a(-2)11 and a(-1)P by k pi / 3 and alternates the sign of
     * u (real chart).
     */
    List<T> generatedCoordinates(int variant) {
        int k = variant;
        List<T> c = new ArrayList<>();
        T turn = ar.exp(ar.multiply(ar.of(0, k), ar.divide(ar.pi(), ar.of(3))));
        if (real) {
            c.add(ar.multiply(ar.ratio(k % 2 == 0 ? 3 : -3, 10), ar.sqrt(ar.multiply(s, s))));
            c.add(ar.add(ar.ratio(7, 10), ar.multiply(ar.of(k), ar.ratio(1, 2))));
            c.add(ar.multiply(ar.ratio(2, 10), ar.of(1 - k % 3)));
        } else {
            c.add(ar.multiply(turn, ar.multiply(ar.ratio(3, 10), s)));
            c.add(ar.multiply(ar.add(ar.ratio(8, 10), ar.multiply(i(), ar.ratio(5, 10))), s));
            c.add(ar.multiply(turn, ar.add(ar.ratio(2, 10), ar.multiply(i(), ar.ratio(1, 10)))));
        }
        for (int level = 0; level <= order - 2; level++) {
            c.add(ar.ratio(1, 10));
            c.add(ar.ratio(-1, 10));
        }
        return c;
    }
}
