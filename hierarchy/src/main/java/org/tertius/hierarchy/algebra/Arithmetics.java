package org.tertius.hierarchy.algebra;

import org.hipparchus.complex.Complex;

/** The three {@link Arithmetic}s used by the hierarchy module. */
public final class Arithmetics {
    /** Exact arithmetic on Gaussian rationals. */
    public static final Arithmetic<GaussianRational> EXACT = new Arithmetic<>() {
        @Override
        public GaussianRational one() {
            return GaussianRational.ONE;
        }

        @Override
        public GaussianRational add(GaussianRational a, GaussianRational b) {
            return a.add(b);
        }

        @Override
        public GaussianRational multiply(GaussianRational a, GaussianRational b) {
            return a.multiply(b);
        }

        @Override
        public GaussianRational reciprocal(GaussianRational a) {
            return a.reciprocal();
        }

        @Override
        public GaussianRational coefficient(GaussianRational c) {
            return c;
        }
    };

    /** Double-precision complex arithmetic. */
    public static final Arithmetic<Complex> COMPLEX = new Arithmetic<>() {
        @Override
        public Complex one() {
            return Complex.ONE;
        }

        @Override
        public Complex add(Complex a, Complex b) {
            return a.add(b);
        }

        @Override
        public Complex multiply(Complex a, Complex b) {
            return a.multiply(b);
        }

        @Override
        public Complex reciprocal(Complex a) {
            return a.reciprocal();
        }

        @Override
        public Complex coefficient(GaussianRational c) {
            return c.toComplex();
        }
    };

    /**
     * Magnitudes: evaluates sum |c| prod |v|^e, the scale that bounds the rounding error of a double evaluation
     * (values are given as moduli).
     */
    public static final Arithmetic<Double> MAGNITUDE = new Arithmetic<>() {
        @Override
        public Double one() {
            return 1.0;
        }

        @Override
        public Double add(Double a, Double b) {
            return a + b;
        }

        @Override
        public Double multiply(Double a, Double b) {
            return a * b;
        }

        @Override
        public Double reciprocal(Double a) {
            return 1 / a;
        }

        @Override
        public Double coefficient(GaussianRational c) {
            return c.toComplex().norm();
        }
    };

    private Arithmetics() {
    }
}
