package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.hierarchy.algebra.Evaluation;
import org.tertius.hierarchy.algebra.Polynomial;

/**
 * A function of the state given by a polynomial, evaluated with a first-order error bound:
 * {@code sum_i |dP/dy_i| err_i} plus a rounding allowance proportional to the size of its terms. Immutable.
 */
final class Linearized {
    /** Rounding allowance per unit of magnitude of the terms (a few ulps per operation; common practice). */
    private static final double ROUNDING = 64 * Math.ulp(1.0);

    private final Polynomial function;
    private final List<Polynomial> gradient;

    Linearized(Polynomial function, int unknowns) {
        this.function = function;
        List<Polynomial> g = new ArrayList<>();
        for (int i = 0; i < unknowns; i++) {
            g.add(function.derivative(i));
        }
        this.gradient = List.copyOf(g);
    }

    /** The function itself. */
    Polynomial function() {
        return function;
    }

    Complex value(List<Complex> values) {
        return function.evaluate(Evaluation.COMPLEX, values);
    }

    /** The error bound at the point (values of all ring variables) given the absolute errors of the unknowns. */
    double bound(List<Complex> values, double[] err) {
        List<Double> moduli = new ArrayList<>();
        for (Complex v : values) {
            moduli.add(v.norm());
        }
        double b = ROUNDING * function.evaluate(Evaluation.MAGNITUDE, moduli);
        for (int i = 0; i < err.length; i++) {
            Polynomial g = gradient.get(i);
            if (!g.isZero() && err[i] != 0) {
                b += g.evaluate(Evaluation.COMPLEX, values).norm() * err[i];
            }
        }
        return b;
    }
}
