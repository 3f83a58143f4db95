package org.tertius.connection.special;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.hipparchus.fraction.BigFraction;
import org.tertius.core.InvalidInputException;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * The special polynomials S_n(z; mu) of Painleve III, generated exactly from the recurrence of P. A. Clarkson,
 * J. Phys. A 36 (2003) 9507, Theorem 2.1 (also NIST DLMF §32.8(iii)):
 * <pre>  S_{n+1} S_{n-1} = -z [S_n S_n'' - (S_n')^2] - S_n S_n' + (z + mu) S_n^2,   S_{-1} = S_0 = 1, </pre>
 * whose every quotient is a polynomial (of degree n(n+1)/2, monic). mu is any Gaussian rational.
 *
 * <p>Exact arithmetic without fractions: with mu = m/q (m a Gaussian integer, q &gt; 0 an integer) the
 * polynomials T_n(x) = q^(d_n) S_n(x/q), d_n = n(n+1)/2, are monic with Gaussian-integer coefficients and obey
 * (substitute z = x/q, d/dz = q d/dx, and use d_{n+1} + d_{n-1} = 2 d_n + 1)
 * <pre>  T_{n+1} T_{n-1} = q^2 [-x (T_n T_n'' - (T_n')^2) - T_n T_n'] + (x + m) T_n^2, </pre>
 * so each step is an exact division by a monic polynomial. Cost: about d_n^2 big-integer products per step.
 */
public final class SpecialPolynomials {
    /** Largest index accepted (degree 500500; memory, not the method, is the limit long before that). */
    public static final int MAX_INDEX = 1000;

    private SpecialPolynomials() {
    }

    /**
     * S_0, ..., S_n for the given mu.
     *
     * @throws InvalidInputException if n is negative or above {@link #MAX_INDEX}
     */
    public static List<SpecialPolynomial> generate(int n, GaussianRational mu) {
        if (n < 0 || n > MAX_INDEX) {
            throw new InvalidInputException("n", "the index of the special polynomial must be in [0, " + MAX_INDEX
                    + "], got " + n);
        }
        BigInteger q = mu.re().getDenominator().multiply(mu.im().getDenominator())
                .divide(mu.re().getDenominator().gcd(mu.im().getDenominator()));
        BigInteger mr = mu.re().getNumerator().multiply(q.divide(mu.re().getDenominator()));
        BigInteger mi = mu.im().getNumerator().multiply(q.divide(mu.im().getDenominator()));
        GaussianPolynomial xPlusM = GaussianPolynomial.linear(mr, mi);
        BigInteger q2 = q.multiply(q);
        List<SpecialPolynomial> out = new ArrayList<>(n + 1);
        GaussianPolynomial previous = GaussianPolynomial.ONE;
        GaussianPolynomial current = GaussianPolynomial.ONE;
        out.add(new SpecialPolynomial(0, mu, q, current));
        for (int k = 0; k < n; k++) {
            GaussianPolynomial d1 = current.derivative();
            GaussianPolynomial d2 = d1.derivative();
            GaussianPolynomial bracket = current.multiply(d2).subtract(d1.multiply(d1)).multiplyByX()
                    .add(current.multiply(d1)).scale(q2.negate(), BigInteger.ZERO);
            GaussianPolynomial rhs = bracket.add(xPlusM.multiply(current.multiply(current)));
            GaussianPolynomial next = rhs.divideExactly(previous);
            previous = current;
            current = next;
            out.add(new SpecialPolynomial(k + 1, mu, q, current));
        }
        return Collections.unmodifiableList(out);
    }

    /** S_n alone. */
    public static SpecialPolynomial of(int n, GaussianRational mu) {
        List<SpecialPolynomial> all = generate(n, mu);
        return all.get(n);
    }

    /** mu as a Gaussian rational from a fraction p/q (real). */
    public static GaussianRational mu(long p, long q) {
        return GaussianRational.of(new BigFraction(p, q), BigFraction.ZERO);
    }
}
