package org.tertius.core.number;

import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;

/**
 * A point of the universal cover of the punctured plane: a complex number z != 0 and a sheet number k.
 * On sheet k the argument of z lies in (-pi, pi] + 2 pi k; the argument is followed continuously along a
 * path from the principal argument of the start point. The log coordinate of the point is
 * {@code tau = log|z| + i (Arg z + 2 pi k)}.
 *
 * <p>Immutable.
 */
public final class SurfacePoint {
    private final double re;
    private final double im;
    private final int sheet;

    private SurfacePoint(double re, double im, int sheet) {
        this.re = re;
        this.im = im;
        this.sheet = sheet;
    }

    /** A point z on sheet {@code sheet}; z must be finite and non-zero. */
    public static SurfacePoint of(double re, double im, int sheet) {
        InvalidInputException.requireFinite("z (real part)", re);
        InvalidInputException.requireFinite("z (imaginary part)", im);
        if (re == 0.0 && im == 0.0) {
            throw new InvalidInputException("z", "z = 0 is the branch point of the equation; choose a point with z != 0");
        }
        return new SurfacePoint(re, im, sheet);
    }

    /**
     * A point of the plane of a single-valued solution: any finite z, the origin included, on sheet 0 (its log
     * coordinate is not used; at z = 0 it is -infinity).
     */
    public static SurfacePoint planar(double re, double im) {
        InvalidInputException.requireFinite("x (real part)", re);
        InvalidInputException.requireFinite("x (imaginary part)", im);
        return new SurfacePoint(re, im, 0);
    }

    public static SurfacePoint of(Complex z, int sheet) {
        return of(z.getReal(), z.getImaginary(), sheet);
    }

    /** The principal sheet (k = 0). */
    public static SurfacePoint of(double re, double im) {
        return of(re, im, 0);
    }

    /** The point with log coordinate tau (any complex number); its sheet follows from Im tau. */
    public static SurfacePoint fromLog(double tauRe, double tauIm) {
        double r = Math.exp(tauRe);
        double arg = tauIm;
        long k = Math.round(arg / (2 * Math.PI));
        double principal = arg - 2 * Math.PI * k;
        // principal argument in (-pi, pi]
        if (principal <= -Math.PI) {
            principal += 2 * Math.PI;
            k -= 1;
        } else if (principal > Math.PI) {
            principal -= 2 * Math.PI;
            k += 1;
        }
        return of(r * Math.cos(arg), r * Math.sin(arg), Math.toIntExact(k));
    }

    public double re() {
        return re;
    }

    public double im() {
        return im;
    }

    public int sheet() {
        return sheet;
    }

    public Complex z() {
        return new Complex(re, im);
    }

    /** Real part of the log coordinate, log|z|. */
    public double logRe() {
        return Math.log(ComplexPairs.abs(re, im));
    }

    /** Imaginary part of the log coordinate: Arg z + 2 pi k with Arg z in (-pi, pi]. */
    public double logIm() {
        double a = Math.atan2(im, re);
        if (a == -Math.PI) {
            a = Math.PI;
        }
        return a + 2 * Math.PI * sheet;
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof SurfacePoint)) {
            return false;
        }
        SurfacePoint p = (SurfacePoint) o;
        return Double.compare(re, p.re) == 0 && Double.compare(im, p.im) == 0 && sheet == p.sheet;
    }

    @Override
    public int hashCode() {
        return Double.hashCode(re) * 31 * 31 + Double.hashCode(im) * 31 + sheet;
    }

    @Override
    public String toString() {
        return ComplexText.format(re, im) + (sheet == 0 ? "" : " (sheet " + sheet + ")");
    }
}
