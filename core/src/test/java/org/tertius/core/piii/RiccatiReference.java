package org.tertius.core.piii;

import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;

/**
 * Exact Riccati (Bessel-type) solutions of Painleve III as an outside reference, evaluated with Apfloat's
 * 0F1 at 40 digits. If z w' = a z w^2 + b w + c z then w solves PIII with gamma = a^2, delta = -c^2,
 * alpha = a (b + 1), beta = c (1 - b) (NIST DLMF §32.10(iii); the parameter relations were re-derived for
 * this project by substitution). With w = -u'/(a u): u'' - (b/z) u' + a c u = 0, so
 * u = A z^{2 mu} 0F1(;1+mu; x) + B 0F1(;1-mu; x), x = -a c z^2 / 4, mu = (1 + b)/2 (DLMF 10.16.9).
 * The factor z^{2 mu} carries the sheet: on sheet k it is |z|^{2mu} e^{2 mu i (Arg z + 2 pi k)}.
 */
final class RiccatiReference {
    private static final long DIGITS = 40;
    private final FixedPrecisionApcomplexHelper h = new FixedPrecisionApcomplexHelper(DIGITS);
    private final Apcomplex a;
    private final Apcomplex b;
    private final Apcomplex c;
    private final Apcomplex coefA;
    private final Apcomplex coefB;

    RiccatiReference(Complex a, Complex b, Complex c, Complex coefA, Complex coefB) {
        this.a = ap(a);
        this.b = ap(b);
        this.c = ap(c);
        this.coefA = ap(coefA);
        this.coefB = ap(coefB);
    }

    Painleve3 equation() {
        Complex ad = dbl(a);
        Complex bd = dbl(b);
        Complex cd = dbl(c);
        return Painleve3.of(ad.multiply(bd.add(1)), cd.multiply(Complex.ONE.subtract(bd)), ad.multiply(ad),
                cd.multiply(cd).negate());
    }

    private Apcomplex ap(Complex x) {
        return h.valueOf(new Apcomplex(new Apfloat(x.getReal(), DIGITS), new Apfloat(x.getImaginary(), DIGITS)));
    }

    static Complex dbl(Apcomplex x) {
        return new Complex(x.real().doubleValue(), x.imag().doubleValue());
    }

    /** {w, w'} at a point of the surface. */
    Complex[] value(SurfacePoint p) {
        Apcomplex z = ap(p.z());
        Apcomplex one = h.valueOf(Apcomplex.ONE);
        Apcomplex two = h.valueOf(new Apfloat(2, DIGITS));
        Apcomplex mu = h.divide(h.add(one, b), two);
        Apcomplex x = h.divide(h.multiply(h.negate(h.multiply(a, c)), h.multiply(z, z)), h.valueOf(new Apfloat(4, DIGITS)));
        Apcomplex dxdz = h.divide(h.multiply(h.negate(h.multiply(a, c)), z), two);
        Apcomplex b1 = h.add(one, mu);
        Apcomplex b2 = h.subtract(one, mu);
        Apcomplex f1 = ApcomplexMath.hypergeometric0F1(b1, x);
        Apcomplex f1p = h.divide(ApcomplexMath.hypergeometric0F1(h.add(b1, one), x), b1);
        Apcomplex f2 = ApcomplexMath.hypergeometric0F1(b2, x);
        Apcomplex f2p = h.divide(ApcomplexMath.hypergeometric0F1(h.add(b2, one), x), b2);
        // z^{2 mu} on the sheet: exp(2 mu (Log z + 2 pi i k))
        Apfloat twoPiK = new Apfloat(2 * p.sheet(), DIGITS).multiply(org.apfloat.ApfloatMath.pi(DIGITS));
        Apcomplex logz = h.add(h.log(z), new Apcomplex(Apfloat.ZERO, twoPiK));
        Apcomplex zPow = h.exp(h.multiply(h.multiply(two, mu), logz));
        Apcomplex u = h.add(h.multiply(coefA, h.multiply(zPow, f1)), h.multiply(coefB, f2));
        Apcomplex du = h.add(h.multiply(coefA, h.add(h.multiply(h.divide(h.multiply(two, mu), z), h.multiply(zPow, f1)),
                h.multiply(zPow, h.multiply(f1p, dxdz)))), h.multiply(coefB, h.multiply(f2p, dxdz)));
        Apcomplex w = h.negate(h.divide(du, h.multiply(a, u)));
        Apcomplex dw = h.divide(h.add(h.add(h.multiply(h.multiply(a, z), h.multiply(w, w)), h.multiply(b, w)),
                h.multiply(c, z)), z);
        return new Complex[] {dbl(w), dbl(dw)};
    }
}
