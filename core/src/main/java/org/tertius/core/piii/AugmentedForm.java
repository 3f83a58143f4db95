package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * A polynomial form of Painleve III valid for all parameters, used when delta = gamma = 0 (D8 and the
 * degenerate cases), carrying w, theta = z w' and u = 1/w:
 * <pre>
 *   z w'     = theta
 *   z theta' = theta^2 u + z (alpha w^2 + beta) + gamma z^2 w^3 + delta z^2 u
 *   z u'     = -theta u^2
 * </pre>
 * (from z (z w')' = z^2 w'' + z w' and the equation). Zeros of w are poles of u, vaulted like poles of w.
 * w u = 1 is invariant; every node is projected back onto it, keeping whichever of w and u is not large.
 */
final class AugmentedForm implements Painleve3Form {
    private final PolynomialSystem system;

    AugmentedForm(Painleve3 eq) {
        this.system = PolynomialSystem.builder(IndependentVariable.LOG, "w", "theta", "u")
                .term(0, Complex.ONE, 0, 0, 1, 0)
                .term(1, Complex.ONE, 0, 0, 2, 1)
                .term(1, eq.alpha(), 1, 2, 0, 0)
                .term(1, eq.beta(), 1, 0, 0, 0)
                .term(1, eq.gamma(), 2, 3, 0, 0)
                .term(1, eq.delta(), 2, 0, 0, 1)
                .term(2, new Complex(-1), 0, 0, 1, 2)
                .build();
    }

    @Override
    public PolynomialSystem system() {
        return system;
    }

    @Override
    public StateProjection projection() {
        return (tr, ti, re, im) -> {
            double wm = ComplexPairs.abs(re[0], im[0]);
            if (wm >= 1) {
                double d = re[0] * re[0] + im[0] * im[0];
                re[2] = re[0] / d;
                im[2] = -im[0] / d;
            } else {
                double d = re[2] * re[2] + im[2] * im[2];
                re[0] = re[2] / d;
                im[0] = -im[2] / d;
            }
        };
    }

    @Override
    public void toState(Complex z, Complex w, Complex dw, double[] re, double[] im) {
        Complex theta = z.multiply(dw);
        Complex u = w.reciprocal();
        re[0] = w.getReal();
        im[0] = w.getImaginary();
        re[1] = theta.getReal();
        im[1] = theta.getImaginary();
        re[2] = u.getReal();
        im[2] = u.getImaginary();
    }

    @Override
    public Complex[] fromState(Complex z, double[] re, double[] im, double[] err, double[] errOut) {
        Complex w = new Complex(re[0], im[0]);
        Complex u = new Complex(re[2], im[2]);
        double errW = err[0];
        if (w.norm() < 1 && u.norm() > 0) {
            // near a zero of w the reciprocal is the accurate one
            w = u.reciprocal();
            errW = Math.min(err[0], err[2] / (u.norm() * u.norm()));
        }
        Complex dw = new Complex(re[1], im[1]).divide(z);
        errOut[0] = errW;
        errOut[1] = err[1] / z.norm() + 1e-16 * dw.norm();
        return new Complex[] {w, dw};
    }

    @Override
    public MpComplex[] coefficients(HighPrecisionParameters p) {
        MpContext h = p.context();
        MpComplex one = h.fromLong(1);
        // same order as the terms of the constructor
        return new MpComplex[] {one, one, p.alpha(), p.beta(), p.gamma(), p.delta(), one.negate()};
    }

    @Override
    public MpComplex[] toState(HighPrecisionParameters p, MpComplex z, MpComplex w, MpComplex dw) {
        MpContext h = p.context();
        return new MpComplex[] {h.round(w), h.multiply(z, dw), h.reciprocal(w)};
    }

    @Override
    public MpComplex[] fromState(HighPrecisionParameters p, MpComplex z, MpComplex[] y) {
        MpContext h = p.context();
        MpComplex w = y[0];
        if (w.abs() < 1) {
            w = h.reciprocal(y[2]);
        }
        return new MpComplex[] {w, h.divide(y[1], z)};
    }

    @Override
    public String describe() {
        return "augmented form (w, z w', 1/w)";
    }
}
