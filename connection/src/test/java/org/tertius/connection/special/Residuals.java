package org.tertius.connection.special;

import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.SurfacePoint;

/**
 * The residual of Painleve III on a special solution at high precision: w, w' from the solution in the core's
 * multiprecision arithmetic, w'' by the central difference (w'(z+h) - w'(z-h))/(2h) with h = 10^-(digits/2.5)
 * (truncation about h^2, rounding about 10^-digits / h), the residual
 * z w w'' - z w'^2 + w w' - alpha w^3 - beta w - gamma z w^4 - delta z divided by the sum of the moduli of its
 * terms.
 */
final class Residuals {
    private Residuals() {
    }

    static double relativeResidual(ClosedFormSolution s, SurfacePoint p, int digits) {
        MpArithmetic ar = new MpArithmetic(digits);
        MpComplex z = ar.of(p.re(), p.im());
        MpComplex h = ar.of(Math.pow(10, -digits / 2.5), 0);
        ClosedFormSolution.Estimate<MpComplex> v = s.compute(ar, z, p.sheet());
        ClosedFormSolution.Estimate<MpComplex> plus = s.compute(ar, ar.add(z, h), p.sheet());
        ClosedFormSolution.Estimate<MpComplex> minus = s.compute(ar, ar.subtract(z, h), p.sheet());
        MpComplex d2w = ar.divide(ar.subtract(plus.dw(), minus.dw()), ar.multiply(ar.of(2, 0), h));
        ParameterSet q = s.parameters();
        MpComplex alpha = q.alpha(ar);
        MpComplex beta = q.beta(ar);
        MpComplex gamma = q.gamma(ar);
        MpComplex delta = q.delta(ar);
        MpComplex w = v.w();
        MpComplex dw = v.dw();
        MpComplex r = EquationValues.residual(ar, alpha, beta, gamma, delta, z, w, dw, d2w);
        double scale = ar.abs(ar.multiply(ar.multiply(z, w), d2w)) + ar.abs(ar.multiply(z, ar.multiply(dw, dw)))
                + ar.abs(ar.multiply(w, dw)) + ar.abs(ar.multiply(alpha, ar.multiply(w, ar.multiply(w, w))))
                + ar.abs(ar.multiply(beta, w)) + ar.abs(ar.multiply(gamma, ar.multiply(z,
                ar.multiply(ar.multiply(w, w), ar.multiply(w, w))))) + ar.abs(ar.multiply(delta, z));
        return ar.abs(r) / scale;
    }
}
