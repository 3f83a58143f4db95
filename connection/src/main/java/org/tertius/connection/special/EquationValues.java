package org.tertius.connection.special;

import org.tertius.core.number.AnalyticArithmetic;

/**
 * The third Painleve equation w'' = w'^2/w - w'/z + (alpha w^2 + beta)/z + gamma w^3 + delta/w (NIST DLMF
 * 32.2.3) evaluated in any arithmetic.
 */
final class EquationValues {
    private EquationValues() {
    }

    /** w'' from the equation; null where w = 0 (the equation is singular there). */
    static <T> T secondDerivative(AnalyticArithmetic<T> ar, T alpha, T beta, T gamma, T delta, T z, T w, T dw) {
        if (ar.abs(w) == 0) {
            return null;
        }
        T iw = ar.reciprocal(w);
        T iz = ar.reciprocal(z);
        T r = ar.multiply(ar.multiply(dw, dw), iw);
        r = ar.subtract(r, ar.multiply(dw, iz));
        r = ar.add(r, ar.multiply(ar.add(ar.multiply(alpha, ar.multiply(w, w)), beta), iz));
        r = ar.add(r, ar.multiply(gamma, ar.multiply(w, ar.multiply(w, w))));
        return ar.add(r, ar.multiply(delta, iw));
    }

    /**
     * The residual z w w'' - z w'^2 + w w' - alpha w^3 - beta w - gamma z w^4 - delta z (the equation times
     * z w, finite at zeros of w), for checks.
     */
    static <T> T residual(AnalyticArithmetic<T> ar, T alpha, T beta, T gamma, T delta, T z, T w, T dw, T d2w) {
        T w2 = ar.multiply(w, w);
        T r = ar.multiply(ar.multiply(z, w), d2w);
        r = ar.subtract(r, ar.multiply(z, ar.multiply(dw, dw)));
        r = ar.add(r, ar.multiply(w, dw));
        r = ar.subtract(r, ar.multiply(alpha, ar.multiply(w2, w)));
        r = ar.subtract(r, ar.multiply(beta, w));
        r = ar.subtract(r, ar.multiply(gamma, ar.multiply(z, ar.multiply(w2, w2))));
        return ar.subtract(r, ar.multiply(delta, z));
    }
}
