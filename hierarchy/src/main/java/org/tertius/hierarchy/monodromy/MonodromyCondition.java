package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * A condition on monodromy data for {@link InverseMonodromy}: complex residuals that vanish on the data sought,
 * each with the error estimate of the quantity it is made of. Conditions on the entries of E and on the
 * multipliers at 0 refer to the normalised data ({@link MonodromyData.ConnectionNormalization}); the trivial
 * monodromy at 0 and the product E11 E22 do not depend on any normalisation.
 *
 * @param <T> number type
 */
public interface MonodromyCondition<T> {
    /** What is prescribed, e.g. {@code s^inf_1 = 0.3}. */
    String description();

    /** The residuals at the given data (value minus target, with the error estimate of the value). */
    List<Estimate<T>> residuals(MonodromyData<T> data);

    /** s^inf_k = value (1 &lt;= k &lt;= 2n). */
    static <T> MonodromyCondition<T> stokesAtInfinity(int k, T value) {
        return of("s^inf_" + k + " = " + value, d -> List.of(minus(d, d.stokesAtInfinity(k), value)));
    }

    /** s^0_k = value (k = 1, 2; normalised data). */
    static <T> MonodromyCondition<T> stokesAtZero(int k, T value) {
        return of("s^0_" + k + " = " + value, d -> List.of(minus(d, d.stokesAtZero(k), value)));
    }

    /** Trivial Stokes matrices at 0: s^0_1 = s^0_2 = 0 (with an integer exponent m0, trivial monodromy at 0). */
    static <T> MonodromyCondition<T> trivialStokesAtZero() {
        return of("s^0_1 = s^0_2 = 0", d -> List.of(d.stokesAtZero(1), d.stokesAtZero(2)));
    }

    /** Trivial Stokes matrices at infinity: s^inf_k = 0 for all k. */
    static <T> MonodromyCondition<T> trivialStokesAtInfinity() {
        return of("s^inf_k = 0 for all k", d -> {
            List<Estimate<T>> r = new ArrayList<>();
            for (int k = 1; k <= 2 * d.order(); k++) {
                r.add(d.stokesAtInfinity(k));
            }
            return r;
        });
    }

    /** E11 E22 = value (free of both diagonal gauges). */
    static <T> MonodromyCondition<T> connectionProduct(T value) {
        return of("E11 E22 = " + value, d -> List.of(minus(d, d.connectionProduct(), value)));
    }

    /** E(row, column) = value (normalised data). */
    static <T> MonodromyCondition<T> connection(int row, int column, T value) {
        return of("E" + row + column + " = " + value, d -> List.of(minus(d, d.connection(row, column), value)));
    }

    /**
     * All monodromy data of member n = stokesAtInfinity.size() / 2: the multipliers s^inf_1 .. s^inf_2n, s^0_1,
     * s^0_2, the connection matrix E and the exponents m, m0, in the conventions of {@link MonodromyMap}. E and the
     * multipliers at 0 may be given in any normalisation of the canonical solutions at 0 (they are normalised here).
     *
     * @param tolerance the allowed violation of det E = 1 and of the cyclic relation M_inf E = E M_0, relative to
     *     the size of the matrices
     * @throws InvalidInputException if a count is wrong or the data violate det E = 1 or the cyclic relation
     */
    static <T> MonodromyCondition<T> allData(AnalyticArithmetic<T> ar, List<T> stokesAtInfinity, List<T> stokesAtZero,
                                             Matrix<T> connection, T m, T m0, double tolerance) {
        MonodromyData<T> target = DataCheck.validated(ar, stokesAtInfinity, stokesAtZero, connection, m, m0, tolerance);
        int n = stokesAtInfinity.size() / 2;
        return of("all monodromy data of member " + n, d -> {
            if (d.order() != n) {
                throw new InvalidInputException("monodromy data", "are for member " + n + " (" + 2 * n
                        + " Stokes multipliers at infinity), the problem is member " + d.order());
            }
            List<Estimate<T>> r = new ArrayList<>();
            List<Estimate<T>> have = d.normalized(target.connectionNormalization()).quantities();
            List<Estimate<T>> want = target.quantities();
            for (int i = 0; i < have.size(); i++) {
                r.add(new Estimate<>(ar.subtract(have.get(i).value(), want.get(i).value()),
                        have.get(i).error() + want.get(i).error()));
            }
            return r;
        });
    }

    /** A condition from a description and a residual function. */
    static <T> MonodromyCondition<T> of(String description, Function<MonodromyData<T>,
            List<Estimate<T>>> residuals) {
        if (description == null || residuals == null) {
            throw new InvalidInputException("condition", "needs a description and a residual function");
        }
        return new MonodromyCondition<>() {
            @Override
            public String description() {
                return description;
            }

            @Override
            public List<Estimate<T>> residuals(MonodromyData<T> data) {
                return residuals.apply(data);
            }

            @Override
            public String toString() {
                return description;
            }
        };
    }

    private static <T> Estimate<T> minus(MonodromyData<T> d, Estimate<T> e, T value) {
        AnalyticArithmetic<T> ar = d.arithmetic();
        if (value == null || !Double.isFinite(ar.abs(value))) {
            throw new InvalidInputException("condition value", "must be a finite complex number, got " + value);
        }
        return new Estimate<>(ar.subtract(e.value(), value), e.error() + 2 * ar.epsilon() * ar.abs(value));
    }
}
