package org.tertius.core.piii;

import java.math.BigDecimal;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;

/**
 * The Riccati (Bessel-type) solutions of Painleve III (NIST DLMF §32.10(iii), evaluated with Apfloat's 0F1 by
 * {@link BesselRiccatiReference}) for double-precision parameters: the doubles are passed as their exact
 * decimal expansions, the values computed at 40 digits and rounded to double. If z w' = a z w^2 + b w + c z then
 * w solves PIII with gamma = a^2, delta = -c^2, alpha = a (b + 1), beta = c (1 - b) (re-derived for this
 * project by substitution).
 */
final class RiccatiReference {
    private static final int DIGITS = 40;
    private final Complex a;
    private final Complex b;
    private final Complex c;
    private final BesselRiccatiReference exact;

    RiccatiReference(Complex a, Complex b, Complex c, Complex coefA, Complex coefB) {
        this.a = a;
        this.b = b;
        this.c = c;
        this.exact = new BesselRiccatiReference(text(a), text(b), text(c), text(coefA), text(coefB), DIGITS);
    }

    private static String text(Complex x) {
        String re = new BigDecimal(x.getReal()).toString();
        String im = new BigDecimal(Math.abs(x.getImaginary())).toString();
        return re + (x.getImaginary() < 0 ? "-" : "+") + im + "i";
    }

    Painleve3 equation() {
        return Painleve3.of(a.multiply(b.add(1)), c.multiply(Complex.ONE.subtract(b)), a.multiply(a),
                c.multiply(c).negate());
    }

    /** {w, w'} at a point of the surface. */
    Complex[] value(SurfacePoint p) {
        Apcomplex[] v = exact.value(p);
        return new Complex[] {dbl(v[0]), dbl(v[1])};
    }

    private static Complex dbl(Apcomplex x) {
        return new Complex(x.real().doubleValue(), x.imag().doubleValue());
    }
}
