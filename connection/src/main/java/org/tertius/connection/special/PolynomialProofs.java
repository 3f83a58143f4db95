package org.tertius.connection.special;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Exact facts about Gaussian-integer polynomials: that a polynomial has only simple roots, that two have no
 * common root (both by reduction modulo primes), and the discriminant (exactly, for small degrees).
 *
 * <p>Reduction: for a prime p = 1 (mod 4) with r^2 = -1 (mod p), a + b i -> a + b r is a ring map Z[i] -> F_p.
 * If the leading coefficients survive it, a gcd of degree 0 modulo p proves a gcd of degree 0 over Q(i): the
 * resultant (of P and P', or of P and Q) maps to the resultant of the images, which is then non-zero
 * (common practice, e.g. von zur Gathen and Gerhard, Modern Computer Algebra, ch. 6). A non-trivial gcd modulo
 * p proves nothing (p may divide the resultant), so several primes are tried before giving up.
 */
public final class PolynomialProofs {
    /** Number of primes tried. */
    static final int PRIMES = 6;
    private static final long[][] FIELDS = fields();

    private PolynomialProofs() {
    }

    /** True if P is proved to have only simple roots; false if not proved (P may still be square-free). */
    public static boolean provedSquareFree(GaussianPolynomial p) {
        if (p.degree() <= 1) {
            return p.degree() >= 0;
        }
        return provedCoprime(p, p.derivative());
    }

    /** True if P and Q are proved to have no common root; false if not proved. */
    public static boolean provedCoprime(GaussianPolynomial p, GaussianPolynomial q) {
        if (p.isZero() || q.isZero()) {
            return false;
        }
        for (long[] f : FIELDS) {
            long[] a = reduce(p, f[0], f[1]);
            long[] b = reduce(q, f[0], f[1]);
            if (a.length != p.degree() + 1 || b.length != q.degree() + 1) {
                continue; // a leading coefficient vanishes modulo this prime
            }
            if (gcdDegree(a, b, f[0]) == 0) {
                return true;
            }
        }
        return false;
    }

    /** Primes p = 1 (mod 4) below 2^31 and a square root r of -1 modulo each. */
    private static long[][] fields() {
        List<long[]> out = new ArrayList<>();
        long c = (1L << 31) - 1;
        while (out.size() < PRIMES) {
            c--;
            if (c % 4 != 1 || !BigInteger.valueOf(c).isProbablePrime(60)) {
                continue;
            }
            BigInteger p = BigInteger.valueOf(c);
            for (long g = 2; ; g++) {
                // r = g^((p-1)/4) squares to -1 exactly when g is a quadratic non-residue
                long r = BigInteger.valueOf(g).modPow(BigInteger.valueOf((c - 1) / 4), p).longValue();
                if (r * r % c == c - 1) {
                    out.add(new long[] {c, r});
                    break;
                }
            }
        }
        return out.toArray(new long[0][]);
    }

    /** Coefficients modulo p, lowest first, trailing zeros removed. */
    private static long[] reduce(GaussianPolynomial q, long p, long r) {
        BigInteger bp = BigInteger.valueOf(p);
        long[] a = new long[q.degree() + 1];
        for (int k = 0; k < a.length; k++) {
            long x = q.re(k).mod(bp).longValue();
            long y = q.im(k).mod(bp).longValue();
            a[k] = (x + y * r % p) % p;
        }
        int n = a.length;
        while (n > 0 && a[n - 1] == 0) {
            n--;
        }
        return Arrays.copyOf(a, n);
    }

    /** Degree of gcd(a, b) over F_p (Euclid); -1 if both are zero. */
    static int gcdDegree(long[] a, long[] b, long p) {
        long[] x = a;
        long[] y = b;
        while (y.length > 0) {
            long[] rem = remainder(x, y, p);
            x = y;
            y = rem;
        }
        return x.length - 1;
    }

    private static long[] remainder(long[] a, long[] b, long p) {
        long[] r = a.clone();
        int db = b.length - 1;
        long inv = BigInteger.valueOf(b[db]).modInverse(BigInteger.valueOf(p)).longValue();
        for (int k = r.length - 1; k >= db; k--) {
            if (r[k] == 0) {
                continue;
            }
            long f = r[k] * inv % p;
            for (int j = 0; j <= db; j++) {
                r[k - db + j] = Math.floorMod(r[k - db + j] - f * b[j] % p, p);
            }
        }
        int n = Math.min(r.length, db);
        while (n > 0 && r[n - 1] == 0) {
            n--;
        }
        return Arrays.copyOf(r, n);
    }

    /**
     * The discriminant prod_{i&lt;j} (x_i - x_j)^2 of a monic polynomial, exactly, as {re, im}: (-1)^(d(d-1)/2)
     * times the resultant of P and P', the determinant of their Sylvester matrix, by fraction-free (Bareiss)
     * elimination over Z[i] (common practice). Cost grows like d^3 big-integer operations: meant for small degrees.
     */
    public static BigInteger[] discriminant(GaussianPolynomial p) {
        if (!p.isMonic()) {
            throw new IllegalArgumentException("the discriminant is computed for monic polynomials");
        }
        int d = p.degree();
        if (d <= 1) {
            return new BigInteger[] {BigInteger.ONE, BigInteger.ZERO};
        }
        GaussianPolynomial q = p.derivative();
        int n = 2 * d - 1;
        BigInteger[][] mr = new BigInteger[n][n];
        BigInteger[][] mi = new BigInteger[n][n];
        for (BigInteger[] row : mr) {
            Arrays.fill(row, BigInteger.ZERO);
        }
        for (BigInteger[] row : mi) {
            Arrays.fill(row, BigInteger.ZERO);
        }
        for (int row = 0; row < d - 1; row++) {
            for (int k = 0; k <= d; k++) {
                mr[row][row + d - k] = p.re(k);
                mi[row][row + d - k] = p.im(k);
            }
        }
        for (int row = 0; row < d; row++) {
            for (int k = 0; k <= d - 1; k++) {
                mr[d - 1 + row][row + d - 1 - k] = q.re(k);
                mi[d - 1 + row][row + d - 1 - k] = q.im(k);
            }
        }
        BigInteger[] det = bareiss(mr, mi);
        if ((d * (d - 1) / 2) % 2 == 1) {
            det = new BigInteger[] {det[0].negate(), det[1].negate()};
        }
        return det;
    }

    /** Determinant over Z[i] by Bareiss elimination with row exchanges. */
    private static BigInteger[] bareiss(BigInteger[][] ar, BigInteger[][] ai) {
        int n = ar.length;
        BigInteger pr = BigInteger.ONE;
        BigInteger pi = BigInteger.ZERO;
        boolean negate = false;
        for (int k = 0; k < n - 1; k++) {
            int piv = k;
            while (piv < n && ar[piv][k].signum() == 0 && ai[piv][k].signum() == 0) {
                piv++;
            }
            if (piv == n) {
                return new BigInteger[] {BigInteger.ZERO, BigInteger.ZERO};
            }
            if (piv != k) {
                BigInteger[] t = ar[piv];
                ar[piv] = ar[k];
                ar[k] = t;
                t = ai[piv];
                ai[piv] = ai[k];
                ai[k] = t;
                negate = !negate;
            }
            BigInteger kr = ar[k][k];
            BigInteger ki = ai[k][k];
            BigInteger norm = pr.multiply(pr).add(pi.multiply(pi));
            for (int i = k + 1; i < n; i++) {
                for (int j = k + 1; j < n; j++) {
                    // (a_kk a_ij - a_ik a_kj) / previous pivot, exact in Z[i]
                    BigInteger xr = kr.multiply(ar[i][j]).subtract(ki.multiply(ai[i][j]))
                            .subtract(ar[i][k].multiply(ar[k][j]).subtract(ai[i][k].multiply(ai[k][j])));
                    BigInteger xi = kr.multiply(ai[i][j]).add(ki.multiply(ar[i][j]))
                            .subtract(ar[i][k].multiply(ai[k][j]).add(ai[i][k].multiply(ar[k][j])));
                    // divide by (pr + i pi): multiply by the conjugate, divide by the norm
                    BigInteger yr = xr.multiply(pr).add(xi.multiply(pi));
                    BigInteger yi = xi.multiply(pr).subtract(xr.multiply(pi));
                    ar[i][j] = yr.divide(norm);
                    ai[i][j] = yi.divide(norm);
                }
                ar[i][k] = BigInteger.ZERO;
                ai[i][k] = BigInteger.ZERO;
            }
            pr = kr;
            pi = ki;
        }
        BigInteger dr = ar[n - 1][n - 1];
        BigInteger di = ai[n - 1][n - 1];
        return negate ? new BigInteger[] {dr.negate(), di.negate()} : new BigInteger[] {dr, di};
    }
}
