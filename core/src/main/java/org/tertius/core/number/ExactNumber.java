package org.tertius.core.number;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;

/**
 * A complex number given exactly, as decimal strings or rationals p/q (for example {@code 1/3}, {@code -1/2},
 * {@code 2.5e-3}, {@code 1/2+1/3i}, {@code -0.25i}), or a binary double whose value is exact but which stands
 * for a number known to about 16 significant digits only. Immutable.
 *
 * <p>Each part is kept as a reduced fraction of integers, so no digit is lost before a working precision is
 * chosen; {@link #significantDigits()} tells how many digits the caller vouches for ({@link #EXACT} for a
 * decimal or rational string).
 */
public final class ExactNumber {
    /** The digit count of a number given exactly. */
    public static final int EXACT = Integer.MAX_VALUE;
    /** The digit count vouched for by a binary double (a double holds 15 to 17 significant decimal digits). */
    public static final int DOUBLE_DIGITS = 15;

    private static final String REAL = "(?:[0-9]+\\.?[0-9]*|\\.[0-9]+)(?:[eE][+-]?[0-9]+)?";
    private static final String RATIONAL = REAL + "(?:/" + REAL + ")?";
    private static final Pattern PART = Pattern.compile("^(" + RATIONAL + ")$");
    private static final Pattern COMPLEX = Pattern.compile(
            "^([+-]?" + RATIONAL + ")?(?:([+-])(" + RATIONAL + ")?\\*?[iIjJ])?$");
    private static final Pattern IMAG_ONLY = Pattern.compile("^([+-]?)(" + RATIONAL + ")?\\*?[iIjJ]$");

    private final BigInteger reNum;
    private final BigInteger reDen;
    private final BigInteger imNum;
    private final BigInteger imDen;
    private final int significantDigits;

    private ExactNumber(BigInteger reNum, BigInteger reDen, BigInteger imNum, BigInteger imDen, int digits) {
        BigInteger g = reNum.gcd(reDen);
        BigInteger s = BigInteger.valueOf(reDen.signum());
        this.reNum = reNum.divide(g).multiply(s);
        this.reDen = reDen.divide(g).abs();
        g = imNum.gcd(imDen);
        s = BigInteger.valueOf(imDen.signum());
        this.imNum = imNum.divide(g).multiply(s);
        this.imDen = imDen.divide(g).abs();
        this.significantDigits = digits;
    }

    /** The exact rational number p/q (q != 0), real. */
    public static ExactNumber ofRational(BigInteger p, BigInteger q) {
        if (q.signum() == 0) {
            throw new InvalidInputException("denominator", "must be non-zero");
        }
        return new ExactNumber(p, q, BigInteger.ZERO, BigInteger.ONE, EXACT);
    }

    /** The exact complex rational a/b + (c/d) i (b, d != 0). */
    public static ExactNumber ofComplexRational(BigInteger a, BigInteger b, BigInteger c, BigInteger d) {
        if (b.signum() == 0 || d.signum() == 0) {
            throw new InvalidInputException("denominator", "must be non-zero");
        }
        return new ExactNumber(a, b, c, d, EXACT);
    }

    /** The exact integer n. */
    public static ExactNumber ofInteger(long n) {
        return ofRational(BigInteger.valueOf(n), BigInteger.ONE);
    }

    /**
     * A complex number given as binary doubles: its value is taken exactly, but it is vouched for to
     * {@link #DOUBLE_DIGITS} significant digits only, so a request for more digits is refused.
     */
    public static ExactNumber ofDouble(String argument, Complex c) {
        if (c == null || !Double.isFinite(c.getReal()) || !Double.isFinite(c.getImaginary())) {
            throw new InvalidInputException(argument, "must be a finite complex number, got " + c);
        }
        BigDecimal re = new BigDecimal(c.getReal());
        BigDecimal im = new BigDecimal(c.getImaginary());
        return new ExactNumber(unscaled(re), denominator(re), unscaled(im), denominator(im), DOUBLE_DIGITS);
    }

    /**
     * Reads a complex number written as {@code a}, {@code bi}, {@code a+bi} or {@code a-bi}, where a and b are
     * decimals ({@code 2.5e-3}) or rationals ({@code 1/3}); a bare {@code i} means 1i. Spaces are ignored.
     *
     * @param argument the argument name for the error message
     * @param text the text
     * @throws InvalidInputException if the text is not such a number or a denominator is zero
     */
    public static ExactNumber parse(String argument, String text) {
        if (text == null || text.isBlank()) {
            throw new InvalidInputException(argument, "an exact number is required, for example 1/3, -0.5, 2.5e-3"
                    + " or 1/2+1/3i");
        }
        String s = text.replace(" ", "").replace("_", "");
        BigInteger[] re = {BigInteger.ZERO, BigInteger.ONE};
        BigInteger[] im = {BigInteger.ZERO, BigInteger.ONE};
        Matcher m = IMAG_ONLY.matcher(s);
        if (m.matches()) {
            im = m.group(2) == null ? new BigInteger[] {BigInteger.ONE, BigInteger.ONE} : rational(argument, text,
                    m.group(2));
            if ("-".equals(m.group(1))) {
                im[0] = im[0].negate();
            }
        } else {
            m = COMPLEX.matcher(s);
            if (!m.matches() || (m.group(1) == null && m.group(2) == null)) {
                throw bad(argument, text);
            }
            if (m.group(1) != null) {
                String r = m.group(1);
                boolean neg = r.startsWith("-");
                re = rational(argument, text, r.replaceFirst("^[+-]", ""));
                if (neg) {
                    re[0] = re[0].negate();
                }
            }
            if (m.group(2) != null) {
                im = m.group(3) == null ? new BigInteger[] {BigInteger.ONE, BigInteger.ONE}
                        : rational(argument, text, m.group(3));
                if ("-".equals(m.group(2))) {
                    im[0] = im[0].negate();
                }
            }
        }
        return new ExactNumber(re[0], re[1], im[0], im[1], EXACT);
    }

    private static BigInteger[] rational(String argument, String text, String part) {
        if (!PART.matcher(part).matches()) {
            throw bad(argument, text);
        }
        int slash = part.indexOf('/');
        BigDecimal p = new BigDecimal(slash < 0 ? part : part.substring(0, slash));
        BigDecimal q = slash < 0 ? BigDecimal.ONE : new BigDecimal(part.substring(slash + 1));
        if (q.signum() == 0) {
            throw new InvalidInputException(argument, "the denominator in '" + text + "' is zero");
        }
        if (Math.abs((long) p.scale()) > 100000 || Math.abs((long) q.scale()) > 100000) {
            throw new InvalidInputException(argument, "the exponent in '" + text + "' is out of range (|e| <= 100000)");
        }
        // (a / 10^sa) / (b / 10^sb) = (a 10^sb) / (b 10^sa)
        BigInteger num = unscaled(p).multiply(denominator(q));
        BigInteger den = denominator(p).multiply(unscaled(q));
        return new BigInteger[] {num, den};
    }

    private static BigInteger unscaled(BigDecimal d) {
        return d.scale() >= 0 ? d.unscaledValue() : d.unscaledValue().multiply(BigInteger.TEN.pow(-d.scale()));
    }

    private static BigInteger denominator(BigDecimal d) {
        return d.scale() > 0 ? BigInteger.TEN.pow(d.scale()) : BigInteger.ONE;
    }

    private static InvalidInputException bad(String argument, String text) {
        return new InvalidInputException(argument, "cannot read '" + text + "' as an exact number; write a decimal"
                + " or a rational p/q, optionally complex a+bi, for example 1/3, -0.5, 2.5e-3, 3i or 1/2+1/3i");
    }

    /** Numerator of the real part (the fraction is reduced, the denominator positive). */
    public BigInteger realNumerator() {
        return reNum;
    }

    public BigInteger realDenominator() {
        return reDen;
    }

    public BigInteger imaginaryNumerator() {
        return imNum;
    }

    public BigInteger imaginaryDenominator() {
        return imDen;
    }

    /** The number of significant digits vouched for: {@link #EXACT} for exact input. */
    public int significantDigits() {
        return significantDigits;
    }

    public boolean isZero() {
        return reNum.signum() == 0 && imNum.signum() == 0;
    }

    /** The nearest double-precision complex number (for planning in double precision). */
    public Complex toComplex() {
        return new Complex(toDouble(reNum, reDen), toDouble(imNum, imDen));
    }

    /**
     * p/q as the nearest double: the quotient to 40 significant digits, then rounded once more (a second rounding
     * that can differ from the nearest double only for quotients within 1e-40 relative of a midpoint).
     */
    private static double toDouble(BigInteger p, BigInteger q) {
        return new BigDecimal(p).divide(new BigDecimal(q), QUOTIENT).doubleValue();
    }

    private static final MathContext QUOTIENT = new MathContext(40, RoundingMode.HALF_EVEN);

    /** this + b, exact; vouched for to the smaller of the two digit counts. */
    public ExactNumber add(ExactNumber b) {
        return new ExactNumber(reNum.multiply(b.reDen).add(b.reNum.multiply(reDen)), reDen.multiply(b.reDen),
                imNum.multiply(b.imDen).add(b.imNum.multiply(imDen)), imDen.multiply(b.imDen),
                Math.min(significantDigits, b.significantDigits));
    }

    /** this - b, exact. */
    public ExactNumber subtract(ExactNumber b) {
        return add(b.negate());
    }

    /** this * b, exact. */
    public ExactNumber multiply(ExactNumber b) {
        // (a + ci)(e + gi) with a = p/q, c = r/s, e = t/u, g = v/w
        BigInteger reA = reNum.multiply(b.reNum).multiply(imDen).multiply(b.imDen)
                .subtract(imNum.multiply(b.imNum).multiply(reDen).multiply(b.reDen));
        BigInteger reB = reDen.multiply(b.reDen).multiply(imDen).multiply(b.imDen);
        BigInteger imA = reNum.multiply(b.imNum).multiply(imDen).multiply(b.reDen)
                .add(imNum.multiply(b.reNum).multiply(reDen).multiply(b.imDen));
        return new ExactNumber(reA, reB, imA, reB, Math.min(significantDigits, b.significantDigits));
    }

    /** this * k / d for integers k and d != 0, exact. */
    public ExactNumber scale(long k, long d) {
        if (d == 0) {
            throw new InvalidInputException("denominator", "must be non-zero");
        }
        BigInteger bk = BigInteger.valueOf(k);
        BigInteger bd = BigInteger.valueOf(d);
        return new ExactNumber(reNum.multiply(bk), reDen.multiply(bd), imNum.multiply(bk), imDen.multiply(bd),
                significantDigits);
    }

    /** The real part's value to that many significant digits (plain decimal text, or exact when it terminates). */
    public BigDecimal realPart(MathContext mc) {
        return new BigDecimal(reNum).divide(new BigDecimal(reDen), mc);
    }

    /** The imaginary part's value to that many significant digits. */
    public BigDecimal imaginaryPart(MathContext mc) {
        return new BigDecimal(imNum).divide(new BigDecimal(imDen), mc);
    }

    /** -this (same digit count). */
    public ExactNumber negate() {
        return new ExactNumber(reNum.negate(), reDen, imNum.negate(), imDen, significantDigits);
    }

    @Override
    public boolean equals(Object o) {
        if (!(o instanceof ExactNumber)) {
            return false;
        }
        ExactNumber e = (ExactNumber) o;
        return reNum.equals(e.reNum) && reDen.equals(e.reDen) && imNum.equals(e.imNum) && imDen.equals(e.imDen)
                && significantDigits == e.significantDigits;
    }

    @Override
    public int hashCode() {
        return ((reNum.hashCode() * 31 + reDen.hashCode()) * 31 + imNum.hashCode()) * 31 + imDen.hashCode();
    }

    @Override
    public String toString() {
        String re = reDen.equals(BigInteger.ONE) ? reNum.toString() : reNum + "/" + reDen;
        if (imNum.signum() == 0) {
            return re;
        }
        String im = imDen.equals(BigInteger.ONE) ? imNum.abs().toString() : imNum.abs() + "/" + imDen;
        return (reNum.signum() == 0 ? (imNum.signum() < 0 ? "-" : "") : re + (imNum.signum() < 0 ? "-" : "+"))
                + im + "i";
    }
}
