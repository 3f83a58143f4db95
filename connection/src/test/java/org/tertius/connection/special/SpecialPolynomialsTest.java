package org.tertius.connection.special;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import org.hipparchus.fraction.BigFraction;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * The special polynomials S_n(z; mu) against published and independently computed facts.
 */
class SpecialPolynomialsTest {
    private static final GaussianRational[] MUS = {SpecialPolynomials.mu(1, 3), SpecialPolynomials.mu(-5, 7),
        GaussianRational.of(new BigFraction(2), new BigFraction(1)), GaussianRational.of(new BigFraction(1, 2),
            new BigFraction(-3, 4))};

    /**
     * S_1 = z + mu, S_2 = (z+mu)^3 - mu, S_3 = (z+mu)^6 - 5 mu (z+mu)^3 + 9 mu (z+mu) - 5 mu^2: Clarkson, J. Phys. A
     * 36 (2003) 9507, the polynomials listed after Theorem 2.1 (recalled from memory; the same three come out of
     * an independent sympy run of the recurrence, tools/reference/special_discriminants.py).
     */
    @Test
    void firstPolynomialsAreThePublishedOnes() {
        for (GaussianRational mu : MUS) {
            List<SpecialPolynomial> s = SpecialPolynomials.generate(3, mu);
            assertEquals(List.of(GaussianRational.ONE), coefficients(s.get(0)));
            assertEquals(shifted(mu, new long[] {0, 1}, new GaussianRational[2]), coefficients(s.get(1)));
            GaussianRational[] extra2 = new GaussianRational[4];
            extra2[0] = mu.negate();
            assertEquals(shifted(mu, new long[] {0, 0, 0, 1}, extra2), coefficients(s.get(2)));
            // (z+mu)^6 - 5 mu (z+mu)^3 + 9 mu (z+mu) - 5 mu^2, as a polynomial in y = z + mu
            GaussianRational[] y = new GaussianRational[7];
            y[6] = GaussianRational.ONE;
            y[3] = mu.multiply(GaussianRational.of(-5, 0));
            y[1] = mu.multiply(GaussianRational.of(9, 0));
            y[0] = mu.multiply(mu).multiply(GaussianRational.of(-5, 0));
            assertEquals(expand(mu, y), coefficients(s.get(3)), "S_3 at mu = " + mu);
        }
    }

    @Test
    void degreesAreTriangularNumbersAndThePolynomialsMonic() {
        List<SpecialPolynomial> s = SpecialPolynomials.generate(14, SpecialPolynomials.mu(2, 7));
        for (int n = 0; n <= 14; n++) {
            assertEquals(n * (n + 1) / 2, s.get(n).degree(), "degree of S_" + n);
            assertEquals(GaussianRational.ONE, s.get(n).coefficient(s.get(n).degree()));
        }
    }

    /**
     * disc S_2 = -27 mu^2, disc S_3 = 1660753125 mu^6 (mu-1)^2 (mu+1)^2, disc S_4 = 598908179242958921527862548828125
     * mu^14 (mu-2)^2 (mu-1)^6 (mu+1)^6 (mu+2)^2 (sympy, tools/reference/special_discriminants.py): the roots are
     * simple unless mu is an integer with |mu| < n.
     */
    @Test
    void discriminantsAgreeWithTheSymbolicOnes() {
        for (GaussianRational mu : MUS) {
            List<SpecialPolynomial> s = SpecialPolynomials.generate(4, mu);
            GaussianRational one = GaussianRational.ONE;
            GaussianRational two = GaussianRational.of(2, 0);
            GaussianRational m2 = mu.multiply(mu);
            GaussianRational expected2 = m2.multiply(GaussianRational.of(-27, 0));
            GaussianRational expected3 = pow(mu, 6).multiply(pow(mu.subtract(one), 2)).multiply(pow(mu.add(one), 2))
                    .multiply(GaussianRational.of(1660753125L, 0));
            GaussianRational expected4 = pow(mu, 14).multiply(pow(mu.subtract(two), 2))
                    .multiply(pow(mu.subtract(one), 6)).multiply(pow(mu.add(one), 6)).multiply(pow(mu.add(two), 2))
                    .multiply(GaussianRational.of(new BigFraction(new BigInteger("598908179242958921527862548828125")),
                            BigFraction.ZERO));
            assertEquals(expected2, discriminant(s.get(2)), "mu = " + mu);
            assertEquals(expected3, discriminant(s.get(3)), "mu = " + mu);
            assertEquals(expected4, discriminant(s.get(4)), "mu = " + mu);
        }
    }

    @Test
    void simpleRootsAreProvedExactlyAndMultipleOnesAreNot() {
        assertTrue(PolynomialProofs.provedSquareFree(SpecialPolynomials.of(9, SpecialPolynomials.mu(1, 3)).scaled()));
        GaussianPolynomial atTwo = SpecialPolynomials.of(4, SpecialPolynomials.mu(2, 1)).scaled();
        // S_4(z; 2) = z^3 (z^7 + ...) (sympy factorisation, same script): a triple root at 0, the rest simple
        assertEquals(3, atTwo.zeroRootMultiplicity());
        assertFalse(PolynomialProofs.provedSquareFree(atTwo));
        assertTrue(PolynomialProofs.provedSquareFree(atTwo.divideByPowerOfX(3)));
    }

    @Test
    void badIndexIsRefused() {
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> SpecialPolynomials.generate(-1, SpecialPolynomials.mu(1, 2)));
        assertTrue(e.getMessage().contains("[0, "), e.getMessage());
    }

    static List<GaussianRational> coefficients(SpecialPolynomial p) {
        List<GaussianRational> out = new ArrayList<>();
        for (int k = 0; k <= p.degree(); k++) {
            out.add(p.coefficient(k));
        }
        return out;
    }

    /** sum_k c_k (z + mu)^k with c_k = extra[k] (if set) plus the integer ints[k], lowest first, in powers of z. */
    private static List<GaussianRational> shifted(GaussianRational mu, long[] ints, GaussianRational[] extra) {
        GaussianRational[] y = new GaussianRational[ints.length];
        for (int k = 0; k < ints.length; k++) {
            y[k] = GaussianRational.of(ints[k], 0).add(extra[k] == null ? GaussianRational.ZERO : extra[k]);
        }
        return expand(mu, y);
    }

    private static List<GaussianRational> expand(GaussianRational mu, GaussianRational[] y) {
        int d = y.length - 1;
        GaussianRational[] z = new GaussianRational[d + 1];
        Arrays.fill(z, GaussianRational.ZERO);
        for (int k = 0; k <= d; k++) {
            if (y[k] == null) {
                continue;
            }
            for (int j = 0; j <= k; j++) {
                GaussianRational binomial = GaussianRational.of(BigIntegerBinomial.of(k, j), 0);
                z[j] = z[j].add(y[k].multiply(binomial).multiply(pow(mu, k - j)));
            }
        }
        return List.of(z);
    }

    static GaussianRational pow(GaussianRational x, int k) {
        GaussianRational r = GaussianRational.ONE;
        for (int i = 0; i < k; i++) {
            r = r.multiply(x);
        }
        return r;
    }

    /** disc S_n = q^(-d(d-1)) disc T_n for S_n(z) = q^(-d) T_n(q z). */
    static GaussianRational discriminant(SpecialPolynomial p) {
        BigInteger[] d = PolynomialProofs.discriminant(p.scaled());
        int deg = p.degree();
        BigInteger den = p.scale().pow(deg * (deg - 1));
        return GaussianRational.of(new BigFraction(d[0], den), new BigFraction(d[1], den));
    }

    /** Small binomial coefficients. */
    static final class BigIntegerBinomial {
        static long of(int n, int k) {
            long r = 1;
            for (int i = 1; i <= k; i++) {
                r = r * (n - k + i) / i;
            }
            return r;
        }
    }
}
