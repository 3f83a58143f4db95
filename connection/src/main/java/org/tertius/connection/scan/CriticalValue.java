package org.tertius.connection.scan;

import java.util.function.DoublePredicate;
import java.util.function.DoubleUnaryOperator;
import org.hipparchus.analysis.solvers.BrentSolver;
import org.tertius.core.InvalidInputException;

/** Location of a critical parameter value where the classification of a family changes. */
public final class CriticalValue {
    private CriticalValue() {
    }

    /**
     * Bisection on a predicate that differs at the two ends, until the bracket is a few units in the last place
     * (full double precision) or 200 halvings.
     *
     * @return the midpoint of the final bracket
     * @throws InvalidInputException if the predicate has the same value at both ends
     */
    public static double bisect(DoublePredicate predicate, double lo, double hi) {
        boolean atLo = predicate.test(lo);
        if (atLo == predicate.test(hi)) {
            throw new InvalidInputException("bracket", "the classification is the same at both ends [" + lo + ", "
                    + hi + "]; widen the bracket");
        }
        double a = lo;
        double b = hi;
        for (int i = 0; i < 200 && Math.abs(b - a) > 4 * Math.ulp(Math.max(Math.abs(a), Math.abs(b))); i++) {
            double m = 0.5 * (a + b);
            if (predicate.test(m) == atLo) {
                a = m;
            } else {
                b = m;
            }
        }
        return 0.5 * (a + b);
    }

    /**
     * The root of a continuous indicator whose sign is the classification (Brent's method, Hipparchus), to
     * absolute accuracy {@code accuracy}.
     *
     * @throws InvalidInputException if the indicator has the same sign at both ends
     */
    public static double root(DoubleUnaryOperator indicator, double lo, double hi, double accuracy) {
        double fa = indicator.applyAsDouble(lo);
        double fb = indicator.applyAsDouble(hi);
        if (Math.signum(fa) == Math.signum(fb)) {
            throw new InvalidInputException("bracket", "the indicator has the same sign at both ends [" + lo + ", "
                    + hi + "]; widen the bracket");
        }
        return new BrentSolver(1e-16, accuracy, 1e-300).solve(200, indicator::applyAsDouble, lo, hi);
    }
}
