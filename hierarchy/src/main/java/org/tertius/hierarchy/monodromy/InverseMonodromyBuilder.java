package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.hierarchy.HierarchyMember;

/** Builder of an {@link InverseMonodromy inverse monodromy problem}. Not thread-safe. */
public final class InverseMonodromyBuilder<T> {
    final MonodromyMap<T> map;
    final int order;
    T x;
    List<T> times = List.of();
    T s;
    T m;
    T m0;
    double topArgument = Double.NaN;
    final List<MonodromyCondition<T>> conditions = new ArrayList<>();
    boolean reality;
    List<T> firstGuess;

    InverseMonodromyBuilder(MonodromyMap<T> map, int order) {
        HierarchyMember.of(order);
        this.map = map;
        this.order = order;
    }

    /** The point x of the result; the argument of t_n (member 1: of x) on its surface fixes the sectors. */
    public InverseMonodromyBuilder<T> point(T x, double topArgument) {
        this.x = x;
        this.topArgument = topArgument;
        return this;
    }

    /** t_2 .. t_n. */
    public InverseMonodromyBuilder<T> times(List<T> times) {
        this.times = times;
        return this;
    }

    /** s, m (formal exponent at infinity) and m0 (formal exponent at 0; the trace form is 2 i s m0). */
    public InverseMonodromyBuilder<T> constants(T s, T m, T m0) {
        this.s = s;
        this.m = m;
        this.m0 = m0;
        return this;
    }

    public InverseMonodromyBuilder<T> condition(MonodromyCondition<T> condition) {
        conditions.add(condition);
        return this;
    }

    /**
     * The reality symmetry r = -conj(q) (all a_k anti-Hermitian): needs real x, times and s and imaginary m and m0.
     */
    public InverseMonodromyBuilder<T> reality(boolean on) {
        this.reality = on;
        return this;
    }

    /** A member state to start from (otherwise a generated one, see {@link StateChart}). */
    public InverseMonodromyBuilder<T> firstGuess(List<T> state) {
        this.firstGuess = state;
        return this;
    }

    public InverseMonodromy<T> build() {
        AnalyticArithmetic<T> ar = map.arithmetic();
        Conjugation.of(ar);
        if (x == null || s == null || m == null || m0 == null || Double.isNaN(topArgument)) {
            throw new InvalidInputException("inverse problem", "needs the point (x and the argument of t_n) and"
                    + " the constants s, m, m0");
        }
        if (times == null || times.size() != order - 1) {
            throw new InvalidInputException("times", "member " + order + " takes " + (order - 1) + " times");
        }
        if (conditions.isEmpty()) {
            throw new InvalidInputException("conditions", "at least one condition on the monodromy data is needed");
        }
        if (firstGuess != null && firstGuess.size() != 3 * (order + 1)) {
            throw new InvalidInputException("first guess", "member " + order + " has " + 3 * (order + 1)
                    + " unknowns");
        }
        if (reality) {
            UnaryOperator<T> conj = Conjugation.of(ar);
            List<T> real = new ArrayList<>(times);
            real.add(x);
            real.add(s);
            for (T t : real) {
                requireSymmetric(ar, "x, times and s", ar.subtract(t, conj.apply(t)), t);
            }
            requireSymmetric(ar, "m", ar.add(m, conj.apply(m)), m);
            requireSymmetric(ar, "m0", ar.add(m0, conj.apply(m0)), m0);
        }
        return new InverseMonodromy<>(this);
    }

    private static <T> void requireSymmetric(AnalyticArithmetic<T> ar, String name, T defect, T value) {
        if (ar.abs(defect) > 1e-12 * (1 + ar.abs(value))) {
            throw new InvalidInputException(name, "the reality symmetry r = -conj(q) needs real x, times and s and"
                    + " imaginary m and m0; got " + ar.toComplex(value));
        }
    }
}
