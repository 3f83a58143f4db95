package org.tertius.connection.infinity;

import org.hipparchus.complex.Complex;

/** A Laurent polynomial in E with harmonics -width..width, stored as real and imaginary parts. */
final class Laurent {
    final int width;
    final double[] re;
    final double[] im;
    int lo;
    int hi;

    Laurent(int width) {
        this.width = width;
        this.re = new double[2 * width + 1];
        this.im = new double[2 * width + 1];
        this.lo = 1;
        this.hi = -1;
    }

    Complex get(int k) {
        return Math.abs(k) > width ? Complex.ZERO : new Complex(re[k + width], im[k + width]);
    }

    void set(int k, Complex v) {
        re[k + width] = v.getReal();
        im[k + width] = v.getImaginary();
        widen(k);
    }

    private void widen(int k) {
        if (lo > hi) {
            lo = k;
            hi = k;
        } else {
            lo = Math.min(lo, k);
            hi = Math.max(hi, k);
        }
    }

    Laurent scaled(double s) {
        Laurent r = new Laurent(width);
        for (int k = lo; k <= hi; k++) {
            r.re[k + width] = s * re[k + width];
            r.im[k + width] = s * im[k + width];
        }
        r.lo = lo;
        r.hi = hi;
        return r;
    }

    void addInPlace(Laurent x, double s) {
        for (int k = x.lo; k <= x.hi; k++) {
            re[k + width] += s * x.re[k + width];
            im[k + width] += s * x.im[k + width];
        }
        if (x.lo <= x.hi) {
            widen(x.lo);
            widen(x.hi);
        }
    }

    void addInPlace(Laurent x, Complex s) {
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

    Laurent times(Laurent y) {
        Laurent r = new Laurent(width);
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
