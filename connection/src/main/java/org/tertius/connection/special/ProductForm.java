package org.tertius.connection.special;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Value;

/**
 * The rational function W = S_n(mu-1) S_{n-1}(mu) / (S_n(mu) S_{n-1}(mu-1)) (all four monic) evaluated in double
 * precision as a product over its roots, W = z^m prod (z - r_i)^(s_i), W'/W = m/z + sum s_i/(z - r_i) (s_i = +1
 * for a root of the numerator, -1 for one of the denominator; m the net order at 0). Unlike Horner's rule on
 * the monomial coefficients this loses no digits to cancellation far from the roots. The roots come from
 * {@link RootIsolation} at 20 digits; each carries its disk radius plus its rounding to double, rho_i, and the
 * relative error of W is bounded by sum rho_i/|z - r_i| / (1 - ...) plus (2 + |log(z - r_i)|) u per factor
 * (logarithms are summed, so no overflow). Points within 2 rho_i of a root are left to the other methods.
 */
final class ProductForm {
    private static final double U = 0x1p-53;
    private final Complex[] roots;
    private final double[] rho;
    private final int[] sign;
    private final int orderAtZero;

    private ProductForm(Complex[] roots, double[] rho, int[] sign, int orderAtZero) {
        this.roots = roots;
        this.rho = rho;
        this.sign = sign;
        this.orderAtZero = orderAtZero;
    }

    /** From the four polynomials S_n(mu-1), S_{n-1}(mu) (numerator) and S_n(mu), S_{n-1}(mu-1). */
    static ProductForm of(SpecialPolynomial[] polys) {
        List<Complex> r = new ArrayList<>();
        List<Double> radius = new ArrayList<>();
        List<Integer> signs = new ArrayList<>();
        int order = 0;
        for (int k = 0; k < 4; k++) {
            int s = k < 2 ? 1 : -1;
            GaussianPolynomial p = polys[k].scaled();
            int zeros = p.zeroRootMultiplicity();
            order += s * zeros;
            GaussianPolynomial rest = p.divideByPowerOfX(zeros);
            if (rest.degree() < 1) {
                continue;
            }
            for (CertifiedRoot c : RootIsolation.roots(rest, polys[k].scale(), 20)) {
                Complex v = c.toComplex();
                double e = c.radius() + 2 * U * v.norm();
                for (int j = 0; j < c.multiplicity(); j++) {
                    r.add(v);
                    radius.add(e);
                    signs.add(s);
                }
            }
        }
        double[] rho = new double[r.size()];
        int[] sign = new int[r.size()];
        for (int i = 0; i < rho.length; i++) {
            rho[i] = radius.get(i);
            sign[i] = signs.get(i);
        }
        return new ProductForm(r.toArray(new Complex[0]), rho, sign, order);
    }

    /** The value of the solution at the point, or null when the point is too close to a root for this form. */
    Painleve3Value evaluate(SurfacePoint point, RationalSolution s) {
        Complex[] scales = s.scalesDouble();
        Complex t = point.z();
        Complex z = t.divide(scales[0]);
        double zr = z.getReal();
        double zi = z.getImaginary();
        double logRe = orderAtZero * Math.log(z.norm());
        double logIm = orderAtZero * z.getArgument();
        Complex l = new Complex(orderAtZero).divide(z);
        Complex m = new Complex(orderAtZero).divide(z.multiply(z));
        double rel = 0;
        double errL = 0;
        for (int i = 0; i < roots.length; i++) {
            double dr = zr - roots[i].getReal();
            double di = zi - roots[i].getImaginary();
            double dist = Math.hypot(dr, di);
            if (!(dist > 2 * rho[i])) {
                return null;
            }
            double lg = Math.log(dist);
            logRe += sign[i] * lg;
            logIm += sign[i] * Math.atan2(di, dr);
            Complex inv = new Complex(dr, di).reciprocal();
            l = sign[i] > 0 ? l.add(inv) : l.subtract(inv);
            Complex inv2 = inv.multiply(inv);
            m = sign[i] > 0 ? m.add(inv2) : m.subtract(inv2);
            // a root moved by rho changes log(z - r) by at most rho / (dist - rho) <= 2 rho / dist
            rel += 2 * rho[i] / dist + (2 + Math.abs(lg)) * U;
            errL += 4 * rho[i] / (dist * dist) + 4 * U / dist;
        }
        if (rel > 0.1 || Math.abs(logRe) > 700) {
            return null;
        }
        Complex w0 = new Complex(Math.cos(logIm), Math.sin(logIm)).multiply(Math.exp(logRe));
        Complex dw0 = w0.multiply(l);
        Complex d2w0 = w0.multiply(l.multiply(l).subtract(m));
        double errW0 = w0.norm() * 1.2 * rel;
        double errDw0 = dw0.norm() * 1.2 * rel + w0.norm() * errL;
        // z = t/lambda: lambda and the division carry about 8 units of rounding
        double shift = 8 * U * z.norm();
        errW0 += dw0.norm() * shift;
        errDw0 += d2w0.norm() * shift;
        Complex w = w0.divide(scales[1]);
        Complex dw = dw0.multiply(scales[2]);
        double errW = errW0 / scales[1].norm() + 8 * U * w.norm();
        double errDw = errDw0 * scales[2].norm() + 8 * U * dw.norm();
        if (!(errW <= ClosedFormSolution.DOUBLE_TOLERANCE * w.norm())) {
            return null;
        }
        return new Painleve3Value(point, w, dw, errW, errDw);
    }
}
