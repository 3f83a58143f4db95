package org.tertius.connection.special;

import java.math.BigInteger;
import org.hipparchus.fraction.BigFraction;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * One special polynomial S_n(z; mu) of {@link SpecialPolynomials}, held exactly as T_n(x) = q^(d) S_n(x/q)
 * (Gaussian-integer coefficients, monic, d = n(n+1)/2, mu = m/q). Immutable.
 */
public final class SpecialPolynomial {
    private final int index;
    private final GaussianRational mu;
    private final BigInteger scale;
    private final GaussianPolynomial scaled;

    SpecialPolynomial(int index, GaussianRational mu, BigInteger scale, GaussianPolynomial scaled) {
        this.index = index;
        this.mu = mu;
        this.scale = scale;
        this.scaled = scaled;
    }

    /** n. */
    public int index() {
        return index;
    }

    public GaussianRational mu() {
        return mu;
    }

    /** The degree n(n+1)/2. */
    public int degree() {
        return scaled.degree();
    }

    /** q, the denominator of mu: S_n(z) = q^(-d) T_n(q z). */
    public BigInteger scale() {
        return scale;
    }

    /** T_n(x) = q^d S_n(x / q): monic, Gaussian-integer coefficients. */
    public GaussianPolynomial scaled() {
        return scaled;
    }

    /** The coefficient of z^k of S_n, exactly. */
    public GaussianRational coefficient(int k) {
        BigInteger den = scale.pow(Math.max(0, degree() - k));
        return GaussianRational.of(new BigFraction(scaled.re(k), den), new BigFraction(scaled.im(k), den));
    }

    /** S_n with its coefficients converted once into an arithmetic, for evaluation with rounding bounds. */
    public <T> NumericPolynomial<T> numeric(AnalyticArithmetic<T> ar) {
        return new NumericPolynomial<>(ar, scaled, scale);
    }

    /** S_n in the variable z, highest degree first, exact coefficients (e.g. {@code z^3 + z^2 - 1/3}). */
    public String text() {
        StringBuilder b = new StringBuilder();
        for (int k = degree(); k >= 0; k--) {
            GaussianRational c = coefficient(k);
            if (c.isZero()) {
                continue;
            }
            String t = c.toString();
            boolean complex = c.im().signum() != 0 && c.re().signum() != 0;
            boolean negative = !complex && t.startsWith("-");
            if (b.length() > 0) {
                b.append(negative ? " - " : " + ");
            } else if (negative) {
                b.append('-');
            }
            if (negative) {
                t = t.substring(1);
            }
            String power = k == 0 ? "" : k == 1 ? "z" : "z^" + k;
            if (k == 0) {
                b.append(t);
            } else if (t.equals("1")) {
                b.append(power);
            } else {
                b.append(t).append('*').append(power);
            }
        }
        return b.length() == 0 ? "0" : b.toString();
    }

    @Override
    public String toString() {
        return "S_" + index + "(z; " + mu + ") = " + text();
    }
}
