package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * Integrates W = 1/w with another form (for delta = 0, gamma != 0, where 1/w has delta' = -gamma != 0) and
 * maps values back: w = 1/W, w' = -W'/W^2.
 */
final class ReciprocalForm implements Painleve3Form {
    private final Painleve3Form inner;

    ReciprocalForm(Painleve3Form inner) {
        this.inner = inner;
    }

    @Override
    public PolynomialSystem system() {
        return inner.system();
    }

    @Override
    public StateProjection projection() {
        return inner.projection();
    }

    @Override
    public void toState(Complex z, Complex w, Complex dw, double[] re, double[] im) {
        inner.toState(z, w.reciprocal(), dw.negate().divide(w.multiply(w)), re, im);
    }

    @Override
    public Complex[] fromState(Complex z, double[] re, double[] im, double[] err, double[] errOut) {
        double[] e = new double[2];
        Complex[] v = inner.fromState(z, re, im, err, e);
        Complex big = v[0];
        Complex w = big.reciprocal();
        Complex dw = v[1].negate().divide(big.multiply(big));
        double m = big.norm();
        errOut[0] = e[0] / (m * m);
        errOut[1] = e[1] / (m * m) + 2 * v[1].norm() * e[0] / (m * m * m);
        return new Complex[] {w, dw};
    }

    @Override
    public MpComplex[] coefficients(HighPrecisionParameters p) {
        return inner.coefficients(p.reciprocal());
    }

    @Override
    public MpComplex[] toState(HighPrecisionParameters p, MpComplex z, MpComplex w, MpComplex dw) {
        MpContext h = p.context();
        return inner.toState(p.reciprocal(), z, h.reciprocal(w), h.divide(dw, h.multiply(w, w)).negate());
    }

    @Override
    public MpComplex[] fromState(HighPrecisionParameters p, MpComplex z, MpComplex[] y) {
        MpContext h = p.context();
        MpComplex[] v = inner.fromState(p.reciprocal(), z, y);
        return new MpComplex[] {h.reciprocal(v[0]), h.divide(v[1], h.multiply(v[0], v[0])).negate()};
    }

    @Override
    public boolean wComponentIsReciprocal() {
        return !inner.wComponentIsReciprocal();
    }

    @Override
    public String describe() {
        return "reciprocal 1/w in the " + inner.describe();
    }
}
