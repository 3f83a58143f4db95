package org.tertius.core.piii;

import java.math.BigInteger;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpContext;
import org.tertius.core.number.SurfacePoint;

/**
 * Exact Riccati (Bessel-type) solutions of Painleve III as an outside reference, evaluated with Apfloat's 0F1
 * at any precision. If z w' = a z w^2 + b w + c z then w solves PIII with gamma = a^2, delta = -c^2,
 * alpha = a (b + 1), beta = c (1 - b) (NIST DLMF §32.10(iii)). With w = -u'/(a u): u'' - (b/z) u' + a c u = 0,
 * so u = A z^{2 mu} 0F1(;1+mu; x) + B 0F1(;1-mu; x), x = -a c z^2 / 4, mu = (1 + b)/2 (DLMF 10.16.9). The
 * factor z^{2 mu} carries the sheet: on sheet k it is exp(2 mu (Log z + 2 pi i k)).
 */
public final class BesselRiccatiReference {
    private final long digits;
    private final FixedPrecisionApcomplexHelper h;
    private final MpContext ctx;
    private final ExactNumber[] exact;
    private final Apcomplex a;
    private final Apcomplex b;
    private final Apcomplex c;
    private final Apcomplex coefA;
    private final Apcomplex coefB;

    /** a, b, c, A, B as exact strings; values computed with {@code digits} digits. */
    public BesselRiccatiReference(String a, String b, String c, String coefA, String coefB, int digits) {
        this.digits = digits;
        this.h = new FixedPrecisionApcomplexHelper(digits);
        this.ctx = new MpContext(digits);
        this.exact = new ExactNumber[] {ExactNumber.parse("a", a), ExactNumber.parse("b", b),
            ExactNumber.parse("c", c)};
        this.a = ap(exact[0]);
        this.b = ap(exact[1]);
        this.c = ap(exact[2]);
        this.coefA = ap(ExactNumber.parse("A", coefA));
        this.coefB = ap(ExactNumber.parse("B", coefB));
    }

    private Apcomplex ap(ExactNumber x) {
        return h.valueOf(ctx.toApcomplex(ctx.fromExact(x)));
    }

    /** The parameters {alpha, beta, gamma, delta} as exact strings (a, b, c must be real rationals here). */
    String[] parameters() {
        Rational ra = Rational.of(exact[0]);
        Rational rb = Rational.of(exact[1]);
        Rational rc = Rational.of(exact[2]);
        return new String[] {ra.times(rb.plus(Rational.ONE)).toString(), rc.times(Rational.ONE.minus(rb)).toString(),
            ra.times(ra).toString(), rc.times(rc).negate().toString()};
    }

    /** {w, w'} at a point of the surface whose coordinates are taken exactly. */
    public Apcomplex[] value(SurfacePoint p) {
        Apcomplex z = h.valueOf(ctx.toApcomplex(ctx.fromDouble(p.re(), p.im())));
        return value(z, p.sheet());
    }

    Apcomplex[] value(Apcomplex z, int sheet) {
        Apcomplex one = h.valueOf(Apcomplex.ONE);
        Apcomplex two = h.valueOf(new Apfloat(2, digits));
        Apcomplex mu = h.divide(h.add(one, b), two);
        Apcomplex x = h.divide(h.multiply(h.negate(h.multiply(a, c)), h.multiply(z, z)),
                h.valueOf(new Apfloat(4, digits)));
        Apcomplex dxdz = h.divide(h.multiply(h.negate(h.multiply(a, c)), z), two);
        Apcomplex b1 = h.add(one, mu);
        Apcomplex b2 = h.subtract(one, mu);
        Apcomplex f1 = ApcomplexMath.hypergeometric0F1(b1, x);
        Apcomplex f1p = h.divide(ApcomplexMath.hypergeometric0F1(h.add(b1, one), x), b1);
        Apcomplex f2 = ApcomplexMath.hypergeometric0F1(b2, x);
        Apcomplex f2p = h.divide(ApcomplexMath.hypergeometric0F1(h.add(b2, one), x), b2);
        Apfloat twoPiK = new Apfloat(2L * sheet, digits).multiply(ApfloatMath.pi(digits));
        Apcomplex logz = h.add(h.log(z), new Apcomplex(Apfloat.ZERO, twoPiK));
        Apcomplex zPow = h.exp(h.multiply(h.multiply(two, mu), logz));
        Apcomplex u = h.add(h.multiply(coefA, h.multiply(zPow, f1)), h.multiply(coefB, f2));
        Apcomplex du = h.add(h.multiply(coefA, h.add(h.multiply(h.divide(h.multiply(two, mu), z), h.multiply(zPow, f1)),
                h.multiply(zPow, h.multiply(f1p, dxdz)))), h.multiply(coefB, h.multiply(f2p, dxdz)));
        Apcomplex w = h.negate(h.divide(du, h.multiply(a, u)));
        Apcomplex dw = h.divide(h.add(h.add(h.multiply(h.multiply(a, z), h.multiply(w, w)), h.multiply(b, w)),
                h.multiply(c, z)), z);
        return new Apcomplex[] {w, dw};
    }

    /** A value written as an exact decimal string with all the digits of this reference. */
    static String text(Apcomplex x) {
        String re = x.real().toString(true);
        String im = x.imag().toString(true);
        return re + (im.startsWith("-") ? im : "+" + im) + "i";
    }

    /** A small exact rational type for deriving the parameters. */
    static final class Rational {
        static final Rational ONE = new Rational(BigInteger.ONE, BigInteger.ONE);
        final BigInteger p;
        final BigInteger q;

        Rational(BigInteger p, BigInteger q) {
            BigInteger g = p.gcd(q);
            if (q.signum() < 0) {
                g = g.negate();
            }
            this.p = p.divide(g);
            this.q = q.divide(g);
        }

        static Rational of(ExactNumber x) {
            return new Rational(x.realNumerator(), x.realDenominator());
        }

        Rational plus(Rational o) {
            return new Rational(p.multiply(o.q).add(o.p.multiply(q)), q.multiply(o.q));
        }

        Rational minus(Rational o) {
            return plus(o.negate());
        }

        Rational times(Rational o) {
            return new Rational(p.multiply(o.p), q.multiply(o.q));
        }

        Rational negate() {
            return new Rational(p.negate(), q);
        }

        @Override
        public String toString() {
            return q.equals(BigInteger.ONE) ? p.toString() : p + "/" + q;
        }
    }
}
