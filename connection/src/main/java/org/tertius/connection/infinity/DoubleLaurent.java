package org.tertius.connection.infinity;

import org.hipparchus.complex.Complex;
import org.tertius.core.number.ComplexArithmetic;

/**
 * {@link Laurent} in double precision with the coefficients as primitive real and imaginary parts (zero where never
 * set): the same operations without a Complex object per product, which keeps the fits at infinity as fast as before
 * the recursion was written over the arithmetic family. Mutable; used by one thread.
 */
final class DoubleLaurent extends Laurent<Complex> {
    private final double[] re;
    private final double[] im;

    DoubleLaurent(int width) {
        super(ComplexArithmetic.INSTANCE, width, false);
        this.re = new double[2 * width + 1];
        this.im = new double[2 * width + 1];
    }

    @Override
    Complex get(int k) {
        return Math.abs(k) > width ? Complex.ZERO : new Complex(re[k + width], im[k + width]);
    }

    @Override
    Complex raw(int k) {
        return get(k);
    }

    @Override
    void set(int k, Complex v) {
        re[k + width] = v.getReal();
        im[k + width] = v.getImaginary();
        widen(k);
    }

    @Override
    Laurent<Complex> scaled(int s) {
        DoubleLaurent r = new DoubleLaurent(width);
        for (int k = lo; k <= hi; k++) {
            r.re[k + width] = s * re[k + width];
            r.im[k + width] = s * im[k + width];
        }
        r.lo = lo;
        r.hi = hi;
        return r;
    }

    @Override
    void addInPlace(Laurent<Complex> other, Complex s) {
        DoubleLaurent x = (DoubleLaurent) other;
        double sr = s.getReal();
        double si = s.getImaginary();
        for (int k = x.lo; k <= x.hi; k++) {
            double xr = x.re[k + width];
            double xi = x.im[k + width];
            re[k + width] += sr * xr - si * xi;
            im[k + width] += sr * xi + si * xr;
        }
        if (x.lo <= x.hi) {
            widen(x.lo);
            widen(x.hi);
        }
    }

    @Override
    void addInPlace(Laurent<Complex> other, int s) {
        DoubleLaurent x = (DoubleLaurent) other;
        for (int k = x.lo; k <= x.hi; k++) {
            re[k + width] += s * x.re[k + width];
            im[k + width] += s * x.im[k + width];
        }
        if (x.lo <= x.hi) {
            widen(x.lo);
            widen(x.hi);
        }
    }

    @Override
    Laurent<Complex> times(Laurent<Complex> other) {
        DoubleLaurent y = (DoubleLaurent) other;
        DoubleLaurent r = new DoubleLaurent(width);
        for (int i = lo; i <= hi; i++) {
            double xr = re[i + width];
            double xi = im[i + width];
            if (xr == 0 && xi == 0) {
                continue;
            }
            for (int j = y.lo; j <= y.hi; j++) {
                int k = i + j;
                if (Math.abs(k) > width) {
                    continue;
                }
                double yr = y.re[j + width];
                double yi = y.im[j + width];
                r.re[k + width] += xr * yr - xi * yi;
                r.im[k + width] += xr * yi + xi * yr;
            }
        }
        if (lo <= hi && y.lo <= y.hi) {
            r.lo = Math.max(-width, lo + y.lo);
            r.hi = Math.min(width, hi + y.hi);
        }
        return r;
    }
}
