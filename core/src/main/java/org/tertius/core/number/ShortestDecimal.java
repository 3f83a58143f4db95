package org.tertius.core.number;

import java.math.BigInteger;

/**
 * The shortest decimal that reads back as a given double (with round-half-even reading, as
 * {@link Double#parseDouble} does), and among the shortest the closest (where one digit would do, the closer of the
 * one- and two-digit decimals: 6.9e-323 rather than 7e-323, the rule of {@code Double.toString} since Java 19),
 * appended to a {@link StringBuilder} without intermediate strings. Written for the rows of large tables, where {@code String.format} costs as much as the
 * computation. The digits are found by the Schubfach method (R. Giulietti, "The Schubfach way to render doubles",
 * 2020): the value and the ends of its rounding interval are scaled by a power of ten with one 126-bit
 * multiplication each, from a table of 126-bit approximations of powers of ten filled on first use of each power.
 *
 * <p>Layout: plain decimal ({@code 0.46631791032527390} becomes {@code 0.4663179103252739}, {@code 12.0}) when the
 * decimal exponent E of the leading digit has -4 &lt;= E &lt; 16, otherwise scientific with a lower-case e and no plus
 * sign ({@code 3.058099104651028e-13}, {@code 1.0e16}); {@code nan}, {@code inf}, {@code -inf}; zeros {@code 0.0} and
 * {@code -0.0}. Every output is read back exactly by {@link Double#parseDouble}, Python's {@code float} and NumPy.
 * Thread-safe.
 */
public final class ShortestDecimal {
    private static final int Q_MIN = -1074;
    private static final long C_MIN = 1L << 52;
    private static final long C_TINY = 3;
    private static final long MASK_63 = (1L << 63) - 1;
    private static final int K_MIN = -400;
    private static final int K_MAX = 400;
    /** 126-bit g = floor(10^-k 2^-r) + 1 with 2^125 &lt;= 10^-k 2^-r &lt; 2^126, filled per k on first use. */
    private static final Power[] POWERS = new Power[K_MAX - K_MIN + 1];

    /** The two halves of one g: g = g1 2^63 + g0. Immutable (final fields: safely published by a race). */
    private static final class Power {
        final long g1;
        final long g0;

        Power(long g1, long g0) {
            this.g1 = g1;
            this.g0 = g0;
        }
    }

    private ShortestDecimal() {
    }

    /** The text of {@code v} as the class comment describes it. */
    public static String text(double v) {
        return append(new StringBuilder(24), v).toString();
    }

    /** Appends the text of {@code v} to {@code b}; returns {@code b}. */
    public static StringBuilder append(StringBuilder b, double v) {
        long bits = Double.doubleToRawLongBits(v);
        long t = bits & (C_MIN - 1);
        int bq = (int) (bits >>> 52) & 0x7ff;
        if (bq == 0x7ff) {
            return b.append(t != 0 ? "nan" : bits < 0 ? "-inf" : "inf");
        }
        if (bits < 0) {
            b.append('-');
        }
        if (bq == 0 && t == 0) {
            return b.append("0.0");
        }
        long[] fe = new long[2];
        shortest(bits, fe);
        return layout(b, fe[0], (int) fe[1]);
    }

    /** The shortest f and e with |v| = f 10^e (v finite, not zero) into {@code out[0]} and {@code out[1]}. */
    private static void shortest(long bits, long[] out) {
        long t = bits & (C_MIN - 1);
        int bq = (int) (bits >>> 52) & 0x7ff;
        if (bq != 0) {
            int mq = -Q_MIN + 1 - bq;
            long c = C_MIN | t;
            if (0 < mq && mq < 53) {
                long f = c >> mq;
                if (f << mq == c) {
                    // an integer below 2^53: its digits are exact
                    out[0] = f;
                    out[1] = 0;
                    return;
                }
            }
            decimal(out, -mq, c, 0);
        } else if (t < C_TINY) {
            decimal(out, Q_MIN, 10 * t, -1);
        } else {
            decimal(out, Q_MIN, t, 0);
        }
    }

    /**
     * Appends the number of significant digits {@code digits} of {@code v}, rounded away from zero (upwards for the
     * positive error estimates it is meant for), in scientific layout {@code d.ddde-X} with exactly that many digits
     * (as {@code %.3e} does for 4, but never rounding an estimate down).
     */
    public static StringBuilder appendRoundedUp(StringBuilder b, double v, int digits) {
        if (!Double.isFinite(v) || v == 0) {
            return append(b, v);
        }
        if (v < 0) {
            b.append('-');
            v = -v;
        }
        // the shortest digits f 10^e of v, then rounded up to the requested count
        long[] fe = new long[2];
        shortest(Double.doubleToRawLongBits(v), fe);
        long f = fe[0];
        int e = (int) fe[1];
        while (f % 10 == 0) {
            f /= 10;
            e++;
        }
        int n = length(f);
        if (n > digits) {
            long p = pow10(n - digits);
            long q = f / p;
            if (q * p != f) {
                q++;
            }
            e += n - digits;
            f = q;
            if (length(f) > digits) {
                f /= 10;
                e++;
            }
        } else {
            while (n < digits) {
                f *= 10;
                e--;
                n++;
            }
        }
        int start = b.length();
        b.append(f);
        if (digits > 1) {
            b.insert(start + 1, '.');
        }
        return b.append('e').append(e + digits - 1);
    }

    /** The decimal of c 2^q (Schubfach, section 9 of the paper); dk corrects the exponent of a scaled c. */
    private static void decimal(long[] result, int q, long c, int dk) {
        int out = (int) c & 0x1;
        long cb = c << 2;
        long cbr = cb + 2;
        long cbl;
        int k;
        if (c != C_MIN || q == Q_MIN) {
            cbl = cb - 2;
            k = flog10pow2(q);
        } else {
            // the lower neighbour is closer: the interval is asymmetric
            cbl = cb - 1;
            k = flog10threeQuartersPow2(q);
        }
        int h = q + flog2pow10(-k) + 2;
        Power g = power(k);
        long vb = rop(g.g1, g.g0, cb << h);
        long vbl = rop(g.g1, g.g0, cbl << h);
        long vbr = rop(g.g1, g.g0, cbr << h);
        long s = vb >> 2;
        if (s >= 100) {
            // one digit less: sp10 = 10 floor(s / 10)
            long sp10 = 10 * (s / 10);
            long tp10 = sp10 + 10;
            boolean upin = vbl + out <= sp10 << 2;
            boolean wpin = (tp10 << 2) + out <= vbr;
            if (upin != wpin) {
                result[0] = upin ? sp10 : tp10;
                result[1] = k;
                return;
            }
        }
        long t = s + 1;
        boolean uin = vbl + out <= s << 2;
        boolean win = (t << 2) + out <= vbr;
        long cmp = vb - (s + t << 1);
        result[0] = uin != win ? (uin ? s : t) : cmp < 0 || cmp == 0 && (s & 0x1) == 0 ? s : t;
        result[1] = k + dk;
    }

    /** floor(g cp / 2^127), with the lowest bit set when the remainder is not zero (round to odd). */
    private static long rop(long g1, long g0, long cp) {
        long x1 = Math.multiplyHigh(g0, cp);
        long y0 = g1 * cp;
        long y1 = Math.multiplyHigh(g1, cp);
        long z = (y0 >>> 1) + x1;
        long vbp = y1 + (z >>> 63);
        return vbp | (z & MASK_63) + MASK_63 >>> 63;
    }

    /** floor(q log10 2) for |q| &lt;= 5456721 (the constants of the paper). */
    private static int flog10pow2(int q) {
        return (int) (q * 661_971_961_083L >> 41);
    }

    /** floor(log10(3/4 2^q)). */
    private static int flog10threeQuartersPow2(int q) {
        return (int) (q * 661_971_961_083L - 274_743_187_321L >> 41);
    }

    /** floor(e log2 10). */
    private static int flog2pow10(int e) {
        return (int) (e * 913_124_641_741L >> 38);
    }

    private static Power power(int k) {
        Power p = POWERS[k - K_MIN];
        if (p == null) {
            p = computePower(k);
            POWERS[k - K_MIN] = p;
        }
        return p;
    }

    /** g = floor(10^-k / 2^r) + 1, r = floor(-k log2 10) - 125, exactly (BigInteger, once per k). */
    private static Power computePower(int k) {
        int r = flog2pow10(-k) - 125;
        BigInteger num = BigInteger.TEN.pow(Math.max(-k, 0)).shiftLeft(Math.max(-r, 0));
        BigInteger den = BigInteger.TEN.pow(Math.max(k, 0)).shiftLeft(Math.max(r, 0));
        BigInteger g = num.divide(den).add(BigInteger.ONE);
        return new Power(g.shiftRight(63).longValue(), g.longValue() & MASK_63);
    }

    /** Appends f 10^e (f &gt; 0) in the layout of the class comment. */
    private static StringBuilder layout(StringBuilder b, long f, int e) {
        while (f % 10 == 0) {
            f /= 10;
            e++;
        }
        int n = length(f);
        int lead = e + n - 1;
        int start = b.length();
        b.append(f);
        if (lead >= -4 && lead < 16) {
            if (e >= 0) {
                for (int i = 0; i < e; i++) {
                    b.append('0');
                }
                return b.append(".0");
            }
            int point = n + e;
            if (point > 0) {
                return b.insert(start + point, '.');
            }
            b.insert(start, "0.");
            for (int i = 0; i < -point; i++) {
                b.insert(start + 2, '0');
            }
            return b;
        }
        if (n == 1) {
            b.append(".0");
        } else {
            b.insert(start + 1, '.');
        }
        return b.append('e').append(lead);
    }

    private static int length(long f) {
        int n = 1;
        while (f >= 10) {
            f /= 10;
            n++;
        }
        return n;
    }

    private static long pow10(int n) {
        long p = 1;
        for (int i = 0; i < n; i++) {
            p *= 10;
        }
        return p;
    }
}
