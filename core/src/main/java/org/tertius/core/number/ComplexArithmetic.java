package org.tertius.core.number;

import org.hipparchus.complex.Complex;

/** {@link AnalyticArithmetic} in double precision, on Hipparchus complex numbers. */
public final class ComplexArithmetic implements AnalyticArithmetic<Complex> {
    /** The one instance (the class has no state). */
    public static final ComplexArithmetic INSTANCE = new ComplexArithmetic();

    private ComplexArithmetic() {
    }

    @Override
    public Complex of(double re, double im) {
        return new Complex(re, im);
    }

    @Override
    public Complex ratio(long p, long q) {
        return new Complex((double) p / q);
    }

    @Override
    public Complex add(Complex a, Complex b) {
        return a.add(b);
    }

    @Override
    public Complex subtract(Complex a, Complex b) {
        return a.subtract(b);
    }

    @Override
    public Complex multiply(Complex a, Complex b) {
        return a.multiply(b);
    }

    @Override
    public Complex divide(Complex a, Complex b) {
        return a.divide(b);
    }

    @Override
    public Complex negate(Complex a) {
        return a.negate();
    }

    @Override
    public Complex reciprocal(Complex a) {
        return a.reciprocal();
    }

    @Override
    public Complex exp(Complex a) {
        return a.exp();
    }

    @Override
    public Complex log(Complex a) {
        return a.log();
    }

    @Override
    public Complex sqrt(Complex a) {
        return a.sqrt();
    }

    @Override
    public Complex pow(Complex a, Complex b) {
        return b.multiply(a.log()).exp();
    }

    @Override
    public Complex pi() {
        return new Complex(Math.PI);
    }

    @Override
    public double abs(Complex a) {
        return a.norm();
    }

    @Override
    public double logAbs(Complex a) {
        return Math.log(a.norm());
    }

    @Override
    public Complex toComplex(Complex a) {
        return a;
    }

    @Override
    public double epsilon() {
        return 0x1p-53;
    }

    @Override
    public long digits() {
        return 16;
    }
}
