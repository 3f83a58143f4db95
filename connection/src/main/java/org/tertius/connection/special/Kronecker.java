package org.tertius.connection.special;

import java.math.BigInteger;

/**
 * Products and exact quotients of integer polynomials by Kronecker substitution (common practice, e.g. von zur
 * Gathen and Gerhard, Modern Computer Algebra, §8.4): a polynomial with coefficients |c_i| &lt; 2^(k-1) is packed
 * into the integer sum c_i 2^(k i), the integers are multiplied (or divided) by BigInteger's subquadratic
 * algorithms, and the result is unpacked with signed digits. A product is exact when k exceeds the bit size of
 * every product coefficient; a quotient is unpacked with a guessed k and verified by multiplying back, k
 * doubling until it verifies. Packing and unpacking split in halves (n log n work).
 */
final class Kronecker {
    /** Below this length the schoolbook product is used. */
    static final int THRESHOLD = 24;

    private Kronecker() {
    }

    static int maxBits(BigInteger[] c) {
        int b = 0;
        for (BigInteger x : c) {
            b = Math.max(b, x.bitLength());
        }
        return b;
    }

    /** The product of two integer polynomials (coefficients lowest first). */
    static BigInteger[] multiply(BigInteger[] a, BigInteger[] b) {
        int n = a.length + b.length - 1;
        int k = maxBits(a) + maxBits(b) + 34 - Integer.numberOfLeadingZeros(Math.min(a.length, b.length));
        return unpack(pack(a, 0, a.length, k).multiply(pack(b, 0, b.length, k)), k, n);
    }

    /**
     * The exact quotient a / b for a monic b that divides a; null if it does not divide exactly.
     */
    static BigInteger[] divideExactly(BigInteger[] a, BigInteger[] b) {
        int n = a.length - b.length + 1;
        if (n <= 0) {
            return null;
        }
        int k = Math.max(maxBits(a), maxBits(b)) + 66;
        for (int attempt = 0; attempt < 8; attempt++, k *= 2) {
            BigInteger[] qr = pack(a, 0, a.length, k).divideAndRemainder(pack(b, 0, b.length, k));
            if (qr[1].signum() != 0) {
                continue;
            }
            BigInteger[] q = unpack(qr[0], k, n);
            BigInteger[] back = multiply(q, b);
            if (equal(back, a)) {
                return q;
            }
        }
        return null;
    }

    private static boolean equal(BigInteger[] x, BigInteger[] y) {
        int n = Math.max(x.length, y.length);
        for (int i = 0; i < n; i++) {
            BigInteger a = i < x.length ? x[i] : BigInteger.ZERO;
            BigInteger b = i < y.length ? y[i] : BigInteger.ZERO;
            if (!a.equals(b)) {
                return false;
            }
        }
        return true;
    }

    /** sum_{i in [from, to)} c_i 2^(k (i - from)). */
    static BigInteger pack(BigInteger[] c, int from, int to, int k) {
        if (to - from == 1) {
            return c[from];
        }
        int mid = (from + to) >>> 1;
        return pack(c, from, mid, k).add(pack(c, mid, to, k).shiftLeft(k * (mid - from)));
    }

    /** The n signed digits of x in base 2^k (each in [-2^(k-1), 2^(k-1))). */
    static BigInteger[] unpack(BigInteger x, int k, int n) {
        BigInteger[] out = new BigInteger[n];
        unpack(x, k, out, 0, n);
        return out;
    }

    private static void unpack(BigInteger x, int k, BigInteger[] out, int from, int to) {
        if (to - from == 1) {
            out[from] = x;
            return;
        }
        int m = (to - from) >>> 1;
        int s = k * m;
        // high = round(x / 2^s): the low part then lies in [-2^(s-1), 2^(s-1))
        BigInteger high = x.add(BigInteger.ONE.shiftLeft(s - 1)).shiftRight(s);
        BigInteger low = x.subtract(high.shiftLeft(s));
        unpack(low, k, out, from, from + m);
        unpack(high, k, out, from + m, to);
    }
}
