package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * A polynomial Hamiltonian form of Painleve III for delta != 0, in the log variable (derived for this project
 * by seeking z w' = 2 w^2 p + B w + C z with p' polynomial; the construction follows Okamoto's polynomial
 * Hamiltonians for the Painleve equations):
 * <pre>
 *   z w' = 2 w^2 p + B w + C z
 *   z p' = -2 w p^2 - B p + (alpha/2) z + (gamma/2) z^2 w
 * </pre>
 * with C^2 = -delta and B = 1 - beta/C. Eliminating p gives Painleve III exactly (checked by the residual
 * tests). Poles of w are regular points of p; the zeros of w with w' = C are regular points of the system
 * and those with w' = -C are double poles of p, which the integrator vaults like any pole.
 */
final class HamiltonianForm implements Painleve3Form {
    private final Painleve3 eq;
    private final Complex c;
    private final Complex b;
    private final PolynomialSystem system;

    HamiltonianForm(Painleve3 eq, Complex c) {
        if (Painleve3.isZero(eq.delta())) {
            throw new InvalidInputException("delta", "the Hamiltonian form needs delta != 0");
        }
        this.eq = eq;
        this.c = c;
        this.b = Complex.ONE.subtract(eq.beta().divide(c));
        this.system = PolynomialSystem.builder(IndependentVariable.LOG, "w", "p")
                .term(0, new Complex(2), 0, 2, 1)
                .term(0, b, 0, 1, 0)
                .term(0, c, 1, 0, 0)
                .term(1, new Complex(-2), 0, 1, 2)
                .term(1, b.negate(), 0, 0, 1)
                .term(1, eq.alpha().multiply(0.5), 1, 0, 0)
                .term(1, eq.gamma().multiply(0.5), 2, 1, 0)
                .build();
    }

    /** The principal square root of -delta. */
    static Complex principalC(Painleve3 eq) {
        return eq.delta().negate().sqrt();
    }

    Complex c() {
        return c;
    }

    Complex b() {
        return b;
    }

    @Override
    public PolynomialSystem system() {
        return system;
    }

    @Override
    public StateProjection projection() {
        return StateProjection.NONE;
    }

    @Override
    public void toState(Complex z, Complex w, Complex dw, double[] re, double[] im) {
        Complex p = z.multiply(dw).subtract(b.multiply(w)).subtract(c.multiply(z)).divide(w.multiply(w).multiply(2));
        re[0] = w.getReal();
        im[0] = w.getImaginary();
        re[1] = p.getReal();
        im[1] = p.getImaginary();
    }

    /**
     * The state at a zero of w with w' = C: p(z0) from the third derivative, p0 = (3 a3 z0 + (2 - B) a2) /
     * (2 C^2) with a2 = B C / (2 z0) = w''(z0)/2 and a3 = w'''(z0)/6 (series of the form at a zero).
     */
    void toStateAtZero(Complex z, Complex d3w, double[] re, double[] im) {
        Complex a2 = b.multiply(c).divide(z.multiply(2));
        Complex a3 = d3w.divide(6);
        Complex p = a3.multiply(z).multiply(3).add(a2.multiply(Complex.valueOf(2).subtract(b)))
                .divide(c.multiply(c).multiply(2));
        re[0] = 0;
        im[0] = 0;
        re[1] = p.getReal();
        im[1] = p.getImaginary();
    }

    @Override
    public Complex[] fromState(Complex z, double[] re, double[] im, double[] err, double[] errOut) {
        // primitive arithmetic: this runs once per grid point
        double wr = re[0];
        double wi = im[0];
        double pr = re[1];
        double pi = im[1];
        double w2r = wr * wr - wi * wi;
        double w2i = 2 * wr * wi;
        double br = b.getReal();
        double bi = b.getImaginary();
        double zr = z.getReal();
        double zi = z.getImaginary();
        // numerator 2 w^2 p + B w + C z
        double nr = 2 * (w2r * pr - w2i * pi) + (br * wr - bi * wi) + (c.getReal() * zr - c.getImaginary() * zi);
        double ni = 2 * (w2r * pi + w2i * pr) + (br * wi + bi * wr) + (c.getReal() * zi + c.getImaginary() * zr);
        double zz = zr * zr + zi * zi;
        double dr = (nr * zr + ni * zi) / zz;
        double di = (ni * zr - nr * zi) / zz;
        double zm = Math.sqrt(zz);
        double wm = ComplexPairs.abs(wr, wi);
        // |d w'/d w| = |4 w p + B| / |z|, |d w'/d p| = 2 |w|^2 / |z|
        double dwdw = ComplexPairs.abs(4 * (wr * pr - wi * pi) + br, 4 * (wr * pi + wi * pr) + bi) / zm;
        double dwdp = 2 * wm * wm / zm;
        errOut[0] = err[0];
        errOut[1] = dwdw * err[0] + dwdp * err[1] + 1e-16 * ComplexPairs.abs(dr, di);
        return new Complex[] {new Complex(wr, wi), new Complex(dr, di)};
    }

    @Override
    public String describe() {
        return "Hamiltonian form (w, p), C = " + Painleve3.fmt(c) + ", B = " + Painleve3.fmt(b);
    }

    Painleve3 equation() {
        return eq;
    }

    @Override
    public MpComplex[] coefficients(HighPrecisionParameters hp) {
        MpContext h = hp.context();
        MpComplex cc = hp.c(c);
        MpComplex bb = h.subtract(h.fromLong(1), h.divide(hp.beta(), cc));
        MpComplex two = h.fromLong(2);
        // same order as the terms of the constructor
        return new MpComplex[] {two, bb, cc, two.negate(), bb.negate(), h.divide(hp.alpha(), 2),
            h.divide(hp.gamma(), 2)};
    }

    @Override
    public MpComplex[] toState(HighPrecisionParameters hp, MpComplex z, MpComplex w, MpComplex dw) {
        MpContext h = hp.context();
        MpComplex[] k = coefficients(hp);
        MpComplex p = h.divide(h.subtract(h.subtract(h.multiply(z, dw), h.multiply(k[1], w)), h.multiply(k[2], z)),
                h.multiply(k[0], h.multiply(w, w)));
        return new MpComplex[] {h.round(w), p};
    }

    @Override
    public MpComplex[] fromState(HighPrecisionParameters hp, MpComplex z, MpComplex[] y) {
        MpContext h = hp.context();
        MpComplex[] k = coefficients(hp);
        MpComplex w = y[0];
        MpComplex dw = h.divide(h.add(h.add(h.multiply(k[0], h.multiply(h.multiply(w, w), y[1])),
                h.multiply(k[1], w)), h.multiply(k[2], z)), z);
        return new MpComplex[] {w, dw};
    }
}
