package org.tertius.connection.special;

import java.math.BigInteger;
import java.util.Arrays;

/**
 * A polynomial in one variable with Gaussian-integer coefficients a_k = re_k + i im_k, exact. Immutable. The
 * special polynomials are generated in this form (after clearing the denominator of mu, see
 * {@link SpecialPolynomials}), so that every operation, the exact divisions of the recurrence included, is
 * done without rounding.
 */
public final class GaussianPolynomial {
    /** The zero polynomial (degree -1). */
    public static final GaussianPolynomial ZERO = new GaussianPolynomial(new BigInteger[0], new BigInteger[0]);
    /** The constant 1. */
    public static final GaussianPolynomial ONE = constant(BigInteger.ONE, BigInteger.ZERO);

    private final BigInteger[] re;
    private final BigInteger[] im;

    private GaussianPolynomial(BigInteger[] re, BigInteger[] im) {
        int n = re.length;
        while (n > 0 && re[n - 1].signum() == 0 && im[n - 1].signum() == 0) {
            n--;
        }
        this.re = n == re.length ? re : Arrays.copyOf(re, n);
        this.im = n == im.length ? im : Arrays.copyOf(im, n);
    }

    /** The polynomial sum_k (re[k] + i im[k]) x^k (arrays lowest degree first, of equal length; copied). */
    public static GaussianPolynomial of(BigInteger[] re, BigInteger[] im) {
        if (re.length != im.length) {
            throw new IllegalArgumentException("real and imaginary coefficient arrays differ in length");
        }
        return new GaussianPolynomial(re.clone(), im.clone());
    }

    /** The constant re + i im. */
    public static GaussianPolynomial constant(BigInteger re, BigInteger im) {
        return new GaussianPolynomial(new BigInteger[] {re}, new BigInteger[] {im});
    }

    /** x + (re + i im). */
    public static GaussianPolynomial linear(BigInteger re, BigInteger im) {
        return new GaussianPolynomial(new BigInteger[] {re, BigInteger.ONE}, new BigInteger[] {im, BigInteger.ZERO});
    }

    /** Degree; -1 for the zero polynomial. */
    public int degree() {
        return re.length - 1;
    }

    /** Real part of the coefficient of x^k (zero beyond the degree). */
    public BigInteger re(int k) {
        return k < re.length ? re[k] : BigInteger.ZERO;
    }

    /** Imaginary part of the coefficient of x^k. */
    public BigInteger im(int k) {
        return k < im.length ? im[k] : BigInteger.ZERO;
    }

    public boolean isZero() {
        return re.length == 0;
    }

    /** True if the leading coefficient is 1. */
    public boolean isMonic() {
        return re.length > 0 && re[re.length - 1].equals(BigInteger.ONE) && im[im.length - 1].signum() == 0;
    }

    /** True if every coefficient is real. */
    public boolean isReal() {
        for (BigInteger b : im) {
            if (b.signum() != 0) {
                return false;
            }
        }
        return true;
    }

    /** The multiplicity of the root x = 0 (the number of vanishing lowest coefficients); 0 for the zero polynomial. */
    public int zeroRootMultiplicity() {
        int k = 0;
        while (k < re.length && re[k].signum() == 0 && im[k].signum() == 0) {
            k++;
        }
        return k == re.length ? 0 : k;
    }

    /** This polynomial divided by x^k (the k lowest coefficients must vanish). */
    public GaussianPolynomial divideByPowerOfX(int k) {
        for (int j = 0; j < Math.min(k, re.length); j++) {
            if (re[j].signum() != 0 || im[j].signum() != 0) {
                throw new ArithmeticException("x^" + k + " does not divide the polynomial");
            }
        }
        if (k >= re.length) {
            return ZERO;
        }
        return new GaussianPolynomial(Arrays.copyOfRange(re, k, re.length), Arrays.copyOfRange(im, k, im.length));
    }

    public GaussianPolynomial add(GaussianPolynomial o) {
        int n = Math.max(re.length, o.re.length);
        BigInteger[] r = new BigInteger[n];
        BigInteger[] s = new BigInteger[n];
        for (int k = 0; k < n; k++) {
            r[k] = re(k).add(o.re(k));
            s[k] = im(k).add(o.im(k));
        }
        return new GaussianPolynomial(r, s);
    }

    public GaussianPolynomial subtract(GaussianPolynomial o) {
        return add(o.scale(BigInteger.ONE.negate(), BigInteger.ZERO));
    }

    /** (c + i d) times this polynomial. */
    public GaussianPolynomial scale(BigInteger c, BigInteger d) {
        BigInteger[] r = new BigInteger[re.length];
        BigInteger[] s = new BigInteger[re.length];
        for (int k = 0; k < re.length; k++) {
            r[k] = re[k].multiply(c).subtract(im[k].multiply(d));
            s[k] = re[k].multiply(d).add(im[k].multiply(c));
        }
        return new GaussianPolynomial(r, s);
    }

    public GaussianPolynomial multiply(GaussianPolynomial o) {
        if (isZero() || o.isZero()) {
            return ZERO;
        }
        if (Math.min(re.length, o.re.length) >= Kronecker.THRESHOLD) {
            return kroneckerProduct(o);
        }
        int n = re.length + o.re.length - 1;
        BigInteger[] r = new BigInteger[n];
        BigInteger[] s = new BigInteger[n];
        Arrays.fill(r, BigInteger.ZERO);
        Arrays.fill(s, BigInteger.ZERO);
        boolean real = isReal() && o.isReal();
        for (int i = 0; i < re.length; i++) {
            for (int j = 0; j < o.re.length; j++) {
                if (real) {
                    r[i + j] = r[i + j].add(re[i].multiply(o.re[j]));
                } else {
                    r[i + j] = r[i + j].add(re[i].multiply(o.re[j])).subtract(im[i].multiply(o.im[j]));
                    s[i + j] = s[i + j].add(re[i].multiply(o.im[j])).add(im[i].multiply(o.re[j]));
                }
            }
        }
        return new GaussianPolynomial(r, s);
    }

    /** The product by Kronecker substitution: one integer product when both are real, four otherwise. */
    private GaussianPolynomial kroneckerProduct(GaussianPolynomial o) {
        BigInteger[] rr = Kronecker.multiply(re, o.re);
        if (isReal() && o.isReal()) {
            BigInteger[] zero = new BigInteger[rr.length];
            Arrays.fill(zero, BigInteger.ZERO);
            return new GaussianPolynomial(rr, zero);
        }
        BigInteger[] ii = Kronecker.multiply(im, o.im);
        BigInteger[] ri = Kronecker.multiply(re, o.im);
        BigInteger[] ir = Kronecker.multiply(im, o.re);
        BigInteger[] r = new BigInteger[rr.length];
        BigInteger[] s = new BigInteger[rr.length];
        for (int k = 0; k < rr.length; k++) {
            r[k] = rr[k].subtract(ii[k]);
            s[k] = ri[k].add(ir[k]);
        }
        return new GaussianPolynomial(r, s);
    }

    /** The complex conjugate polynomial (conjugated coefficients). */
    public GaussianPolynomial conjugate() {
        BigInteger[] s = new BigInteger[im.length];
        for (int k = 0; k < im.length; k++) {
            s[k] = im[k].negate();
        }
        return new GaussianPolynomial(re.clone(), s);
    }

    /** x times this polynomial. */
    public GaussianPolynomial multiplyByX() {
        if (isZero()) {
            return ZERO;
        }
        BigInteger[] r = new BigInteger[re.length + 1];
        BigInteger[] s = new BigInteger[re.length + 1];
        r[0] = BigInteger.ZERO;
        s[0] = BigInteger.ZERO;
        System.arraycopy(re, 0, r, 1, re.length);
        System.arraycopy(im, 0, s, 1, im.length);
        return new GaussianPolynomial(r, s);
    }

    /** The derivative d/dx. */
    public GaussianPolynomial derivative() {
        if (re.length <= 1) {
            return ZERO;
        }
        BigInteger[] r = new BigInteger[re.length - 1];
        BigInteger[] s = new BigInteger[re.length - 1];
        for (int k = 1; k < re.length; k++) {
            BigInteger f = BigInteger.valueOf(k);
            r[k - 1] = re[k].multiply(f);
            s[k - 1] = im[k].multiply(f);
        }
        return new GaussianPolynomial(r, s);
    }

    /**
     * The quotient of this polynomial by a monic one, which must divide it exactly (schoolbook long division; a
     * monic divisor keeps every quotient coefficient a Gaussian integer).
     *
     * @throws ArithmeticException if the divisor is not monic or leaves a remainder
     */
    public GaussianPolynomial divideExactly(GaussianPolynomial divisor) {
        if (!divisor.isMonic()) {
            throw new ArithmeticException("the divisor must be monic");
        }
        int dd = divisor.degree();
        if (isZero()) {
            return ZERO;
        }
        if (degree() < dd) {
            throw new ArithmeticException("the divisor has a larger degree than the dividend");
        }
        if (dd >= Kronecker.THRESHOLD) {
            return kroneckerQuotient(divisor);
        }
        BigInteger[] r = re.clone();
        BigInteger[] s = im.clone();
        int qn = degree() - dd + 1;
        BigInteger[] qr = new BigInteger[qn];
        BigInteger[] qi = new BigInteger[qn];
        for (int k = qn - 1; k >= 0; k--) {
            BigInteger cr = r[k + dd];
            BigInteger ci = s[k + dd];
            qr[k] = cr;
            qi[k] = ci;
            if (cr.signum() == 0 && ci.signum() == 0) {
                continue;
            }
            for (int j = 0; j <= dd; j++) {
                BigInteger ar = divisor.re[j];
                BigInteger ai = divisor.im[j];
                r[k + j] = r[k + j].subtract(cr.multiply(ar).subtract(ci.multiply(ai)));
                s[k + j] = s[k + j].subtract(cr.multiply(ai).add(ci.multiply(ar)));
            }
        }
        for (int k = 0; k < dd; k++) {
            if (r[k].signum() != 0 || s[k].signum() != 0) {
                throw new ArithmeticException("the division leaves a remainder");
            }
        }
        return new GaussianPolynomial(qr, qi);
    }

    /**
     * The exact quotient by Kronecker substitution; for a non-real divisor B through A conj(B) / (B conj(B)), whose
     * denominator is real and monic.
     */
    private GaussianPolynomial kroneckerQuotient(GaussianPolynomial divisor) {
        GaussianPolynomial num = this;
        GaussianPolynomial den = divisor;
        if (!divisor.isReal()) {
            num = multiply(divisor.conjugate());
            den = divisor.multiply(divisor.conjugate());
        }
        BigInteger[] qr = Kronecker.divideExactly(pad(num.re, num.re.length), den.re);
        BigInteger[] qi = num.isReal() ? null : Kronecker.divideExactly(pad(num.im, num.re.length), den.re);
        if (qr == null || (!num.isReal() && qi == null)) {
            throw new ArithmeticException("the division leaves a remainder");
        }
        if (qi == null) {
            qi = new BigInteger[qr.length];
            Arrays.fill(qi, BigInteger.ZERO);
        }
        return new GaussianPolynomial(qr, qi);
    }

    private static BigInteger[] pad(BigInteger[] c, int n) {
        BigInteger[] out = Arrays.copyOf(c, n);
        for (int k = c.length; k < n; k++) {
            out[k] = BigInteger.ZERO;
        }
        return out;
    }

    /** The largest number of decimal digits of a coefficient part (a size measure for planning precision). */
    public int maxCoefficientDigits() {
        int bits = 0;
        for (int k = 0; k < re.length; k++) {
            bits = Math.max(bits, Math.max(re[k].bitLength(), im[k].bitLength()));
        }
        return (int) Math.ceil(bits * Math.log10(2)) + 1;
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof GaussianPolynomial && Arrays.equals(re, ((GaussianPolynomial) o).re)
                && Arrays.equals(im, ((GaussianPolynomial) o).im);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(re) * 31 + Arrays.hashCode(im);
    }

    /** The polynomial in the variable {@code x}, highest degree first, e.g. {@code x^3 + (2-i)*x - 5}. */
    public String toString(String x) {
        if (isZero()) {
            return "0";
        }
        StringBuilder b = new StringBuilder();
        for (int k = degree(); k >= 0; k--) {
            if (re[k].signum() == 0 && im[k].signum() == 0) {
                continue;
            }
            String c = coefficientText(re[k], im[k]);
            boolean negative = c.startsWith("-");
            if (b.length() > 0) {
                b.append(negative ? " - " : " + ");
                if (negative) {
                    c = c.substring(1);
                }
            } else if (negative) {
                b.append('-');
                c = c.substring(1);
            }
            String power = k == 0 ? "" : k == 1 ? x : x + "^" + k;
            if (k == 0) {
                b.append(c);
            } else if (c.equals("1")) {
                b.append(power);
            } else {
                b.append(c).append('*').append(power);
            }
        }
        return b.toString();
    }

    private static String coefficientText(BigInteger r, BigInteger i) {
        if (i.signum() == 0) {
            return r.toString();
        }
        String imag = (i.abs().equals(BigInteger.ONE) ? "" : i.abs().toString()) + "i";
        if (r.signum() == 0) {
            return (i.signum() < 0 ? "-" : "") + imag;
        }
        return "(" + r + (i.signum() < 0 ? "-" : "+") + imag + ")";
    }

    @Override
    public String toString() {
        return toString("x");
    }
}
