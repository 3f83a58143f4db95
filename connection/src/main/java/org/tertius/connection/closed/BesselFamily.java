package org.tertius.connection.closed;

import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ApcomplexArithmetic;
import org.tertius.core.piii.Painleve3;

/**
 * The Bessel-function (Riccati) solutions of D6, a one-parameter family on each line {@code e1 alpha + e2 beta = 2}
 * of PIII(alpha, beta, 1, -1) (DLMF &sect;32.10(iii) states that such solutions exist; the reduction below is derived
 * here), with their connection between z = 0 and infinity in closed form.
 *
 * <p><b>Reduction</b> (derived here). If {@code z w' = A z w^2 + s w + C z} then w solves DLMF eq. 32.2.3 iff gamma =
 * A^2, delta = -C^2, alpha = A (s + 1), beta = C (1 - s) (compare the coefficients of w^3, w^2/z, 1/z, 1/w). With
 * gamma = 1, delta = -1: A = e1, C = e2 (signs), s = sigma. {@code w = -e1 (nu/z + psi'/psi)} with psi a solution of
 * {@code psi'' + psi'/z + (e1 e2 - nu^2/z^2) psi = 0}, nu = (1 + sigma)/2: modified Bessel functions for e1 e2 = -1,
 * Bessel functions for e1 e2 = 1. The member is {@code psi = I_nu + t I_-nu} (resp. {@code J_nu + t J_-nu}).
 *
 * <p><b>At 0</b> (DLMF 10.25.2, 10.2.2: {@code I_+-nu, J_+-nu ~ (z/2)^(+-nu)/Gamma(1 +- nu)}): for 0 &lt; Re nu &lt; 1,
 * <pre>  w ~ B z^sigma,  sigma = 2 nu - 1,  B = -e1 2^(1 - 2 nu) Gamma(1 - nu) / (t Gamma(nu)).</pre>
 * <b>At infinity</b>, modified case (DLMF 10.40.5: {@code I_nu ~ e^z/sqrt(2 pi z) (...) +- i e^(+-i nu pi) e^-z/sqrt(2 pi z)
 * (...)}, upper sign for 0 &lt; ph z &lt; pi/2, lower for -pi/2 &lt; ph z &lt; 0; 10.40.2 for K_nu): the solution approaches
 * c = -e1 with the exponentially small amplitude (in the terms of {@link
 * org.tertius.connection.infinity.TransseriesAtInfinity}, where kappa = -1/2 here)
 * <pre>  q = -2i (e^(i nu pi) + t e^(-i nu pi)) / (1 + t)   (0 &lt; ph z &lt; pi/2),
 *   q =  2i (e^(-i nu pi) + t e^(i nu pi)) / (1 + t)   (-pi/2 &lt; ph z &lt; 0);</pre>
 * ordinary case (DLMF 10.4.4, 10.4.6, 10.17.5/6: {@code J_+-nu = (H1_+-nu + H2_+-nu)/2}, {@code H1_-nu = e^(i nu pi) H1_nu},
 * {@code H2_-nu = e^(-i nu pi) H2_nu}, {@code H1 ~ e^(i(z - nu pi/2 - pi/4))}): for 0 &lt; ph z &lt; pi/2 the solution
 * approaches c = i e1 with p = 2i e^(-i nu pi) (1 + t e^(i nu pi)) / (1 + t e^(-i nu pi)) (kappa = 1/2), for
 * -pi/2 &lt; ph z &lt; 0 it approaches c = -i e1 with q = -2i e^(i nu pi) (1 + t e^(-i nu pi)) / (1 + t e^(i nu pi))
 * (kappa = -1/2). (The first-order coefficient: ratio of recessive to dominant solution, times the derivative of its
 * exponential, divided by c.) The rays 0 and +-pi/2 are excluded: there the amplitude changes by a Stokes multiplier
 * or both exponentials are of the same size. Values (for start data and checks) from Apfloat's Bessel functions,
 * principal branches. Immutable.
 */
public final class BesselFamily {
    private final int e1;
    private final int e2;
    private final Complex sigma;
    private final Complex t;

    private BesselFamily(int e1, int e2, Complex sigma, Complex t) {
        this.e1 = e1;
        this.e2 = e2;
        this.sigma = sigma;
        this.t = t;
    }

    /**
     * The member t of the family with signs e1, e2 and exponent sigma.
     *
     * @throws InvalidInputException for signs other than +-1, |Re sigma| &gt;= 1, t = 0 (the member with w ~ -2 e1 nu /
     *     z at 0), or t = -1 in the Bessel-J case (allowed in the modified case: the member K_nu, see {@link
     *     #isTronquee()})
     */
    public static BesselFamily of(int e1, int e2, Complex sigma, Complex t) {
        if (Math.abs(e1) != 1 || Math.abs(e2) != 1) {
            throw new InvalidInputException("sign", "e1 and e2 must be +1 or -1, got " + e1 + ", " + e2);
        }
        if (!(Math.abs(sigma.getReal()) < 1)) {
            throw new InvalidInputException("sigma", "must have |Re sigma| < 1 (0 < Re nu < 1), got " + sigma);
        }
        boolean minusOne = t.add(1).norm() == 0;
        if (!(t.norm() > 0) || (minusOne && e1 * e2 != -1) || !Double.isFinite(t.norm())) {
            throw new InvalidInputException("t", "must be finite and non-zero (and differ from -1 for the Bessel-J"
                    + " case e1 e2 = 1), got " + t);
        }
        return new BesselFamily(e1, e2, sigma, t);
    }

    /** PIII(e1 (sigma + 1), e2 (1 - sigma), 1, -1). */
    public Painleve3 equation() {
        return Painleve3.of(sigma.add(1).multiply(e1), Complex.ONE.subtract(sigma).multiply(e2), Complex.ONE,
                new Complex(-1));
    }

    public boolean modified() {
        return e1 * e2 == -1;
    }

    private Complex nu() {
        return sigma.add(1).divide(2);
    }

    /** The exponent at 0. */
    public Complex sigma() {
        return sigma;
    }

    /** B = -e1 2^(1 - 2 nu) Gamma(1 - nu) / (t Gamma(nu)) (Gamma from Apfloat). */
    public Complex amplitudeAtZero() {
        FixedPrecisionApcomplexHelper h = new FixedPrecisionApcomplexHelper(30);
        Apcomplex nu = ap(nu());
        Apcomplex one = new Apcomplex("1");
        Apcomplex g = h.divide(h.gamma(h.subtract(one, nu)), h.gamma(nu));
        Apcomplex two = h.pow(new Apcomplex("2"), h.subtract(one, h.multiply(new Apcomplex("2"), nu)));
        Apcomplex b = h.divide(h.multiply(two, g), ap(t));
        return toComplex(b).multiply(-e1);
    }

    /**
     * True for the member t = -1 of the modified case: psi = I_nu - I_-nu = -(2/pi) sin(nu pi) K_nu, which approaches
     * c = e1 in |ph z| &lt; 3 pi/2 (DLMF 10.40.2 holds there) with no exponential correction for |ph z| &lt; pi: a
     * tronquee solution (its pole-free sector is three half-planes wide).
     */
    public boolean isTronquee() {
        return modified() && t.add(1).norm() == 0;
    }

    /** The background approached along arg z = angle (0 &lt; |angle| &lt; pi/2). */
    public Complex background(double angle) {
        requireRay(angle);
        if (isTronquee()) {
            return new Complex(e1);
        }
        if (modified()) {
            return new Complex(-e1);
        }
        return new Complex(0, angle > 0 ? e1 : -e1);
    }

    /** {p, q}: the amplitudes of E and 1/E about {@link #background} along arg z = angle (0 &lt; |angle| &lt; pi/2). */
    public Complex[] amplitudesAtInfinity(double angle) {
        requireRay(angle);
        Complex ep = new Complex(0, Math.PI).multiply(nu()).exp();
        Complex em = ep.reciprocal();
        Complex i2 = new Complex(0, 2);
        if (isTronquee()) {
            return new Complex[] {Complex.ZERO, Complex.ZERO};
        }
        if (modified()) {
            Complex q = angle > 0 ? i2.negate().multiply(ep.add(t.multiply(em))).divide(t.add(1))
                    : i2.multiply(em.add(t.multiply(ep))).divide(t.add(1));
            return new Complex[] {Complex.ZERO, q};
        }
        if (angle > 0) {
            Complex p = i2.multiply(em).multiply(t.multiply(ep).add(1)).divide(t.multiply(em).add(1));
            return new Complex[] {p, Complex.ZERO};
        }
        Complex q = i2.negate().multiply(ep).multiply(t.multiply(em).add(1)).divide(t.multiply(ep).add(1));
        return new Complex[] {Complex.ZERO, q};
    }

    private static void requireRay(double angle) {
        if (!(Math.abs(angle) > 0 && Math.abs(angle) < Math.PI / 2)) {
            throw new InvalidInputException("angle", "the closed-form amplitudes hold for 0 < |arg z| < pi/2 (arg z = 0"
                    + " and +-pi/2 are Stokes or anti-Stokes rays of the background), got " + angle);
        }
    }

    /**
     * {w, w'} at z (principal branch), from Apfloat's Bessel functions in {@code digits} digits (at most 20; the
     * parameters enter with 30 digits); w' from the Riccati equation {@code w' = e1 w^2 + sigma w/z + e2}. Accurate to
     * about 10^(5 - digits) relative, and to double rounding.
     */
    public Complex[] value(Complex z, int digits) {
        if (digits < 16 || digits > 20) {
            throw new InvalidInputException("digits", "must be in [16, 20], got " + digits);
        }
        ApcomplexArithmetic ar = new ApcomplexArithmetic(digits + 10);
        FixedPrecisionApcomplexHelper h = ar.helper();
        Apcomplex zz = ap(z);
        Apcomplex nu = ap(nu());
        Apcomplex tt = ap(t);
        Apcomplex one = ar.one();
        Apcomplex half = ar.ratio(1, 2);
        Apcomplex psi;
        Apcomplex dpsi;
        if (modified()) {
            psi = h.add(h.besselI(nu, zz), h.multiply(tt, h.besselI(h.negate(nu), zz)));
            // I'_mu = (I_(mu-1) + I_(mu+1))/2 (DLMF 10.29.1)
            Apcomplex d1 = h.multiply(half, h.add(h.besselI(h.subtract(nu, one), zz), h.besselI(h.add(nu, one), zz)));
            Apcomplex mnu = h.negate(nu);
            Apcomplex d2 = h.multiply(half, h.add(h.besselI(h.subtract(mnu, one), zz), h.besselI(h.add(mnu, one), zz)));
            dpsi = h.add(d1, h.multiply(tt, d2));
        } else {
            psi = h.add(h.besselJ(nu, zz), h.multiply(tt, h.besselJ(h.negate(nu), zz)));
            // J'_mu = (J_(mu-1) - J_(mu+1))/2 (DLMF 10.6.1)
            Apcomplex d1 = h.multiply(half, h.subtract(h.besselJ(h.subtract(nu, one), zz), h.besselJ(h.add(nu, one), zz)));
            Apcomplex mnu = h.negate(nu);
            Apcomplex d2 = h.multiply(half, h.subtract(h.besselJ(h.subtract(mnu, one), zz),
                    h.besselJ(h.add(mnu, one), zz)));
            dpsi = h.add(d1, h.multiply(tt, d2));
        }
        Apcomplex w = h.multiply(new Apcomplex(String.valueOf(-e1)), h.add(h.divide(nu, zz), h.divide(dpsi, psi)));
        Apcomplex dw = h.add(h.add(h.multiply(new Apcomplex(String.valueOf(e1)), h.multiply(w, w)),
                h.divide(h.multiply(ap(sigma), w), zz)), new Apcomplex(String.valueOf(e2)));
        return new Complex[] {toComplex(w), toComplex(dw)};
    }

    private static Apcomplex ap(Complex c) {
        return new Apcomplex(new Apfloat(c.getReal(), 30), new Apfloat(c.getImaginary(), 30));
    }

    private static Complex toComplex(Apcomplex a) {
        return new Complex(a.real().doubleValue(), a.imag().doubleValue());
    }

    @Override
    public String toString() {
        return "Bessel family e1 = " + e1 + ", e2 = " + e2 + ", sigma = " + sigma + ", t = " + t + " of " + equation();
    }
}
