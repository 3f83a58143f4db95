package org.tertius.core.number;

import java.math.BigDecimal;
import java.math.BigInteger;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;

/**
 * The one fixed-precision helper of the high-precision layer: it fixes the working precision (decimal digits
 * and the matching number of bits) and rounds every result of {@link MpComplex} arithmetic to it, widens it in
 * one place ({@link #widen(int)}), and converts from exact input and to and from Apfloat. Results are rounded
 * to nearest; exact inputs (integers, doubles, rationals) are converted with a single rounding.
 *
 * <p>Immutable and thread-safe.
 */
public final class MpContext {
    /** log2(10). */
    public static final double LOG2_10 = Math.log(10) / Math.log(2);
    /** Extra bits carried beyond the decimal digits (so that the last decimal digit is not at the edge). */
    private static final int GUARD_BITS = 8;

    private final int digits;
    private final int bits;

    /** A context of {@code digits} significant decimal digits (at least 10). */
    public MpContext(int digits) {
        if (digits < 10 || digits > 100000) {
            throw new InvalidInputException("digits", "working precision must be in [10, 100000], got " + digits);
        }
        this.digits = digits;
        this.bits = (int) Math.ceil(digits * LOG2_10) + GUARD_BITS;
    }

    /** log2(1 + 2^log2x), for sizes given as base-2 logarithms (0 for negative infinity). */
    public static double log2OnePlus(double log2x) {
        if (log2x == Double.NEGATIVE_INFINITY) {
            return 0;
        }
        return log2x > 60 ? log2x : Math.log(1 + Math.pow(2, log2x)) / Math.log(2);
    }

    public int digits() {
        return digits;
    }

    /** Mantissa bits of every rounded result. */
    public int bits() {
        return bits;
    }

    /** The same helper with {@code extra} more decimal digits. */
    public MpContext widen(int extra) {
        return new MpContext(digits + extra);
    }

    // ---- rounding -------------------------------------------------------------------------------------------

    /** Rounds the mantissas to {@link #bits()} bits (to nearest). */
    public MpComplex round(MpComplex x) {
        int excess = x.mantissaBits() - bits;
        if (excess <= 0) {
            return x;
        }
        return new MpComplex(shiftRound(x.re, excess), shiftRound(x.im, excess), x.exp + excess);
    }

    /** Rounds x / 2^s to the nearest integer (s &gt;= 0). */
    public static BigInteger shiftRound(BigInteger x, int s) {
        if (s <= 0) {
            return x.shiftLeft(-s);
        }
        return x.add(BigInteger.ONE.shiftLeft(s - 1)).shiftRight(s);
    }

    // ---- arithmetic -------------------------------------------------------------------------------------------

    public MpComplex add(MpComplex a, MpComplex b) {
        if (a.isZero()) {
            return round(b);
        }
        if (b.isZero()) {
            return round(a);
        }
        long topA = (long) a.exp + a.mantissaBits();
        long topB = (long) b.exp + b.mantissaBits();
        if (topA - topB > bits + 2) {
            return round(a);
        }
        if (topB - topA > bits + 2) {
            return round(b);
        }
        if (a.exp > b.exp) {
            MpComplex t = a;
            a = b;
            b = t;
        }
        int d = b.exp - a.exp;
        return round(new MpComplex(a.re.add(b.re.shiftLeft(d)), a.im.add(b.im.shiftLeft(d)), a.exp));
    }

    public MpComplex subtract(MpComplex a, MpComplex b) {
        return add(a, b.negate());
    }

    /** The product, with three integer multiplications (Gauss). */
    public MpComplex multiply(MpComplex a, MpComplex b) {
        if (a.isZero() || b.isZero()) {
            return MpComplex.ZERO;
        }
        BigInteger t1 = a.re.multiply(b.re);
        BigInteger t2 = a.im.multiply(b.im);
        BigInteger t3 = a.re.add(a.im).multiply(b.re.add(b.im));
        return round(new MpComplex(t1.subtract(t2), t3.subtract(t1).subtract(t2), a.exp + b.exp));
    }

    public MpComplex multiply(MpComplex a, long k) {
        BigInteger m = BigInteger.valueOf(k);
        return round(new MpComplex(a.re.multiply(m), a.im.multiply(m), a.exp));
    }

    /** The quotient a / b (b != 0). */
    public MpComplex divide(MpComplex a, MpComplex b) {
        if (b.isZero()) {
            throw new ArithmeticException("division by zero");
        }
        if (a.isZero()) {
            return MpComplex.ZERO;
        }
        BigInteger den = b.re.multiply(b.re).add(b.im.multiply(b.im));
        BigInteger nr = a.re.multiply(b.re).add(a.im.multiply(b.im));
        BigInteger ni = a.im.multiply(b.re).subtract(a.re.multiply(b.im));
        int k = Math.max(0, bits + 2 + den.bitLength() - Math.max(nr.bitLength(), ni.bitLength()));
        BigInteger qr = nr.shiftLeft(k).divide(den);
        BigInteger qi = ni.shiftLeft(k).divide(den);
        return round(new MpComplex(qr, qi, a.exp - b.exp - k));
    }

    public MpComplex divide(MpComplex a, long k) {
        return divide(a, fromLong(k));
    }

    /**
     * 1 / a = conj(a) / |a|^2 from one integer division (a quotient takes two), within 0.5 + 2^-29 units of its last
     * bit: |a|^2 is cut to 32 bits beyond the working precision before the division, and the quotient keeps as
     * many.
     */
    public MpComplex reciprocal(MpComplex a) {
        if (a.isZero()) {
            throw new ArithmeticException("division by zero");
        }
        BigInteger den = a.re.multiply(a.re).add(a.im.multiply(a.im));
        int drop = Math.max(0, den.bitLength() - (bits + 32));
        den = den.shiftRight(drop);
        int k = den.bitLength() + bits + 32;
        BigInteger q = BigInteger.ONE.shiftLeft(k).divide(den);
        // 1/a = (re - i im) 2^exp / (den 2^(drop + 2 exp)) = (re - i im) q 2^(-k - drop - exp)
        return round(new MpComplex(a.re.multiply(q), a.im.negate().multiply(q), -k - drop - a.exp));
    }

    // ---- conversions ------------------------------------------------------------------------------------------

    public MpComplex fromLong(long k) {
        return new MpComplex(BigInteger.valueOf(k), BigInteger.ZERO, 0);
    }

    /** The exact binary value of a double pair, rounded to the working precision. */
    public MpComplex fromDouble(double re, double im) {
        if (!Double.isFinite(re) || !Double.isFinite(im)) {
            throw new InvalidInputException("value", "must be finite, got " + re + ", " + im);
        }
        MpComplex r = exactDouble(re);
        MpComplex i = exactDouble(im);
        return add(r, new MpComplex(i.im.negate(), i.re, i.exp));
    }

    private static MpComplex exactDouble(double x) {
        if (x == 0) {
            return MpComplex.ZERO;
        }
        int e = Math.getExponent(x) - 52;
        return new MpComplex(BigInteger.valueOf((long) Math.scalb(x, -e)), BigInteger.ZERO, e);
    }

    /** An exact number, each part rounded once to the working precision. */
    public MpComplex fromExact(ExactNumber x) {
        MpComplex re = fromRational(x.realNumerator(), x.realDenominator());
        MpComplex im = fromRational(x.imaginaryNumerator(), x.imaginaryDenominator());
        return add(re, new MpComplex(im.im.negate(), im.re, im.exp));
    }

    /** p / q (q &gt; 0) as a real value, rounded once. */
    public MpComplex fromRational(BigInteger p, BigInteger q) {
        if (p.signum() == 0) {
            return MpComplex.ZERO;
        }
        int k = Math.max(0, bits + 2 + q.bitLength() - p.bitLength());
        BigInteger[] qr = p.shiftLeft(k).divideAndRemainder(q);
        BigInteger m = qr[0];
        // round to nearest on the last bit
        if (qr[1].abs().shiftLeft(1).compareTo(q) >= 0) {
            m = m.add(BigInteger.valueOf(p.signum()));
        }
        return round(new MpComplex(m, BigInteger.ZERO, -k));
    }

    /** An Apfloat complex number (exact decimal expansion of its digits), rounded once. */
    public MpComplex fromApcomplex(Apcomplex x) {
        MpComplex re = fromDecimal(new BigDecimal(x.real().toString(true)));
        MpComplex im = fromDecimal(new BigDecimal(x.imag().toString(true)));
        return add(re, new MpComplex(im.im.negate(), im.re, im.exp));
    }

    private MpComplex fromDecimal(BigDecimal d) {
        if (d.scale() <= 0) {
            return round(new MpComplex(d.toBigIntegerExact(), BigInteger.ZERO, 0));
        }
        return fromRational(d.unscaledValue(), BigInteger.TEN.pow(d.scale()));
    }

    /** The value as an Apfloat complex number with this context's decimal digits (the binary value is exact). */
    public Apcomplex toApcomplex(MpComplex x) {
        return new Apcomplex(toApfloat(x.re, x.exp), toApfloat(x.im, x.exp));
    }

    private Apfloat toApfloat(BigInteger m, int e) {
        if (m.signum() == 0) {
            return new Apfloat(0, digits);
        }
        return new Apfloat(exactDecimal(m, e), digits);
    }

    // ---- fixed point ------------------------------------------------------------------------------------------

    /** The real part of x as a fixed-point integer with f fractional bits (rounded). */
    public static BigInteger fixedRe(MpComplex x, int f) {
        return shiftRound(x.re, -(x.exp + f));
    }

    /** The imaginary part of x as a fixed-point integer with f fractional bits (rounded). */
    public static BigInteger fixedIm(MpComplex x, int f) {
        return shiftRound(x.im, -(x.exp + f));
    }

    /** The fixed-point pair (re, im) * 2^-f, rounded to the working precision. */
    public MpComplex fromFixed(BigInteger re, BigInteger im, int f) {
        return round(new MpComplex(re, im, -f));
    }

    // ---- elementary functions -----------------------------------------------------------------------------

    /**
     * e^x by the Taylor series after halving the argument until |x| &lt; 2^-m (m about the square root of the bit
     * count), then squaring back m times (common practice); the work is done with m + 16 extra bits.
     */
    public MpComplex exp(MpComplex x) {
        if (x.isZero()) {
            return fromLong(1);
        }
        int m = (int) Math.ceil(Math.sqrt(bits));
        double l2 = x.log2Abs();
        int halvings = Math.max(0, (int) Math.ceil(l2) + m);
        MpContext w = new MpContext(digits + (int) Math.ceil((halvings + 16) / LOG2_10));
        MpComplex t = w.round(x.scalb(-halvings));
        MpComplex sum = w.fromLong(1);
        MpComplex term = w.fromLong(1);
        for (int k = 1; k < 100000; k++) {
            term = w.divide(w.multiply(term, t), k);
            sum = w.add(sum, term);
            if (term.isZero() || term.log2Abs() < -w.bits - 4) {
                break;
            }
        }
        for (int i = 0; i < halvings; i++) {
            sum = w.multiply(sum, sum);
        }
        return round(sum);
    }

    /**
     * The principal square root, from the double-precision root refined by Newton's iteration s = (s + x/s)/2,
     * which doubles the correct bits per step (common practice); worked with 16 extra bits.
     */
    public MpComplex sqrt(MpComplex x) {
        if (x.isZero()) {
            return MpComplex.ZERO;
        }
        int e = 2 * (int) Math.floor(x.log2Abs() / 2);
        MpContext w = widenBits(16);
        MpComplex y = w.round(x.scalb(-e));
        Complex seed = y.toComplex().sqrt();
        MpComplex s = w.fromDouble(seed.getReal(), seed.getImaginary());
        for (int good = 50; ; good *= 2) {
            s = w.divide(w.add(s, w.divide(y, s)), 2);
            if (good >= w.bits) {
                break;
            }
        }
        return round(s.scalb(e / 2));
    }

    /**
     * The principal logarithm (imaginary part in (-pi, pi]): from the double-precision logarithm l0 of x 2^-e,
     * log x = l0 + log1p(u) + e log 2 with u = x 2^-e exp(-l0) - 1 of about 1e-16, log1p by its series (common
     * practice); worked with 16 extra bits plus the bits lost to e log 2.
     */
    public MpComplex log(MpComplex x) {
        if (x.isZero()) {
            throw new ArithmeticException("logarithm of zero");
        }
        int e = (int) Math.round(x.log2Abs());
        MpContext w = widenBits(16 + (e == 0 ? 0 : 32 - Integer.numberOfLeadingZeros(Math.abs(e))));
        MpComplex l = w.logNearOne(w.round(x.scalb(-e)));
        if (e != 0) {
            l = w.add(l, w.multiply(w.logNearOne(w.fromLong(2)), e));
        }
        return round(l);
    }

    /** log y for |y| within a factor 2 of 1 (no scaling). */
    private MpComplex logNearOne(MpComplex y) {
        Complex seed = y.toComplex().log();
        MpComplex l0 = fromDouble(seed.getReal(), seed.getImaginary());
        MpComplex u = subtract(multiply(y, exp(l0.negate())), fromLong(1));
        MpComplex sum = MpComplex.ZERO;
        MpComplex power = u;
        for (int k = 1; !power.isZero() && power.log2Abs() - Math.log(k) / Math.log(2) > -bits - 4; k++) {
            MpComplex term = divide(power, k);
            sum = (k % 2 == 1) ? add(sum, term) : subtract(sum, term);
            power = multiply(power, u);
        }
        return add(l0, sum);
    }

    /** pi, as the imaginary part of log(-1). */
    public MpComplex pi() {
        MpComplex l = log(fromLong(-1));
        return new MpComplex(l.im, BigInteger.ZERO, l.exp);
    }

    /** The same helper with {@code extra} more bits (at least). */
    private MpContext widenBits(int extra) {
        return widen((int) Math.ceil(extra / LOG2_10));
    }

    /** The exact decimal values of the real and the imaginary part (a binary number has a finite expansion). */
    public static BigDecimal[] exactDecimal(MpComplex x) {
        return new BigDecimal[] {exactDecimal(x.re, x.exp), exactDecimal(x.im, x.exp)};
    }

    private static BigDecimal exactDecimal(BigInteger m, int e) {
        return e >= 0 ? new BigDecimal(m.shiftLeft(e)) : new BigDecimal(m.multiply(BigInteger.valueOf(5).pow(-e)), -e);
    }

    @Override
    public String toString() {
        return digits + " digits (" + bits + " bits)";
    }
}
