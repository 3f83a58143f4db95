package org.tertius.core.mp;

import java.math.BigInteger;

/**
 * A binary fixed-point format on preallocated arrays of limbs: a value is X 2^-F with F = {@link #fractionBits()},
 * and the integer X = sum_i x_i 2^(BITS i) is held in {@link #limbs()} consecutive longs, limbs 0..L-2 in
 * [0, 2^BITS) and the top limb signed with |x_{L-1}| < 2^(BITS-2). The top {@code headroom} limbs hold the
 * integer part. Products are accumulated exactly in columns of longs (see {@link LimbAccumulator}), without an
 * allocation per operation. Immutable.
 */
final class LimbFormat {
    /** Bits per limb: a term ar br - ai bi or ar bi + ai br of two complex limbs stays below 2^50. */
    static final int BITS = 24;
    static final long MASK = (1L << BITS) - 1;
    /** Bound on the magnitude of the top limb of a stored value. */
    static final long TOP_BOUND = 1L << (BITS - 2);
    /** Largest sum of column terms a column may receive between two carry passes (it then stays below 2^62). */
    private static final long COLUMN_BUDGET = 1L << 60;
    /** Columns computed below the rounding position: the dropped ones change the result by far less than 2^-F. */
    private static final int GUARD_COLUMNS = 3;
    private static final RuntimeException OVERFLOW = new Overflow();
    /**
     * Limbs from which products are formed with BigInteger (Karatsuba above about 2500 bits, 64-bit multiplier
     * intrinsics) rather than limb by limb: measured with {@code KernelCost}, the limb columns win below about
     * 250 digits and BigInteger wins above (twice as fast at 1000 digits).
     */
    static final int BIG_PRODUCT_LIMBS = 40;

    private final int fractionLimbs;
    private final int limbs;
    private final int lowColumn;
    private final int flushEvery;
    private final boolean bigProducts;

    /**
     * @param fractionBits at least this many fractional bits (rounded up to whole limbs)
     * @param headroom limbs for the integer part (values up to about 2^(BITS headroom - 2))
     */
    LimbFormat(int fractionBits, int headroom) {
        this(fractionBits, headroom, (fractionBits + BITS - 1) / BITS + headroom >= BIG_PRODUCT_LIMBS);
    }

    /** As above, with the way products are formed chosen by the caller (tests and benchmarks). */
    LimbFormat(int fractionBits, int headroom, boolean bigProducts) {
        this.bigProducts = bigProducts;
        this.fractionLimbs = (fractionBits + BITS - 1) / BITS;
        this.limbs = fractionLimbs + headroom;
        this.lowColumn = Math.max(0, fractionLimbs - GUARD_COLUMNS);
        // every product adds at most `limbs` terms below 2^(2 BITS + 2) to a column
        this.flushEvery = (int) Math.max(1, COLUMN_BUDGET / ((long) limbs << (2 * BITS + 2)) - 1);
    }

    /** F rounded up to whole limbs. */
    static int fractionBits(int atLeast) {
        return (atLeast + BITS - 1) / BITS * BITS;
    }

    int fractionBits() {
        return fractionLimbs * BITS;
    }

    /** Whether products are formed with BigInteger (exact, all columns) rather than limb by limb. */
    boolean bigProducts() {
        return bigProducts;
    }

    int fractionLimbs() {
        return fractionLimbs;
    }

    int limbs() {
        return limbs;
    }

    /** The lowest product column computed (short products: the columns below only feed the rounding). */
    int lowColumn() {
        return lowColumn;
    }

    /** Products an accumulator may take between two carry passes. */
    int flushEvery() {
        return flushEvery;
    }

    /** Raised when a value does not fit the integer limbs; the caller retries with more headroom. */
    static RuntimeException overflow() {
        return OVERFLOW;
    }

    /** Writes the fixed-point integer x (scale 2^-F) into dst[off .. off+L-1]. */
    void write(BigInteger x, long[] dst, int off) {
        int lowBits = BITS * (limbs - 1);
        BigInteger top = x.shiftRight(lowBits);
        if (top.bitLength() >= BITS - 2) {
            throw OVERFLOW;
        }
        dst[off + limbs - 1] = top.longValue();
        // the low limbs of the two's complement, BITS = 24 bits = 3 bytes each
        byte[] b = x.toByteArray();
        for (int i = 0; i < limbs - 1; i++) {
            long v = 0;
            for (int j = 2; j >= 0; j--) {
                int p = b.length - 1 - (3 * i + j);
                int octet = p >= 0 ? b[p] & 0xff : (x.signum() < 0 ? 0xff : 0);
                v = (v << 8) | octet;
            }
            dst[off + i] = v;
        }
    }

    /**
     * Spreads the integer x into columns: col[c] = the BITS-bit limb c of x for c < length - 1, and the last
     * column the (signed) rest; when the rest does not fit a column it is replaced by a value that makes
     * {@link #round} report an overflow.
     */
    static void spill(BigInteger x, long[] col) {
        int last = col.length - 1;
        byte[] b = x.toByteArray();
        long fill = x.signum() < 0 ? 0xff : 0;
        for (int c = 0; c < last; c++) {
            long v = 0;
            for (int j = 2; j >= 0; j--) {
                int p = b.length - 1 - (3 * c + j);
                v = (v << 8) | (p >= 0 ? b[p] & 0xff : fill);
            }
            col[c] = v;
        }
        BigInteger rest = x.shiftRight(BITS * last);
        col[last] = rest.bitLength() < 62 ? rest.longValue() : (rest.signum() < 0 ? -(1L << 61) : 1L << 61);
    }

    /** The fixed-point integer (scale 2^-F) held in src[off .. off+L-1]. */
    BigInteger read(long[] src, int off) {
        byte[] b = new byte[3 * (limbs - 1) + 1];
        for (int i = 0; i < limbs - 1; i++) {
            long v = src[off + i];
            int p = b.length - 1 - 3 * i;
            b[p] = (byte) v;
            b[p - 1] = (byte) (v >>> 8);
            b[p - 2] = (byte) (v >>> 16);
        }
        BigInteger low = new BigInteger(1, b);
        return BigInteger.valueOf(src[off + limbs - 1]).shiftLeft(BITS * (limbs - 1)).add(low);
    }

    /** Divides the value in a[off ..] by d (0 < d < 2^38) in place, rounding toward minus infinity. */
    void divide(long[] a, int off, long d) {
        int top = off + limbs - 1;
        long q = Math.floorDiv(a[top], d);
        long r = a[top] - q * d;
        a[top] = q;
        for (int i = top - 1; i >= off; i--) {
            long v = (r << BITS) | a[i];
            q = v / d;
            r = v - q * d;
            a[i] = q;
        }
    }

    /** The value in a[off ..] as a double (for magnitudes; exact cancellation of the sign limbs). */
    double approximate(long[] a, int off) {
        double v = 0;
        int x = limbs - 1;
        for (; x >= 0; x--) {
            v = v * (MASK + 1) + a[off + x];
            if (Math.abs(v) > 0x1p60) {
                break;
            }
        }
        return Math.scalb(v, BITS * Math.max(x, 0) - fractionBits());
    }

    /**
     * Rounds exact column sums to nearest at column {@code from} (the column of limb 0 of the result) into
     * out[off .. off+L-1]; the columns below {@code low} count as zero.
     *
     * @throws RuntimeException {@link #overflow()} when the result does not fit
     */
    void round(long[] col, int from, int low, long[] out, int off) {
        long carry = 0;
        for (int c = low; c < from; c++) {
            long v = col[c] + carry;
            if (c == from - 1) {
                v += 1L << (BITS - 1);
            }
            carry = v >> BITS;
        }
        int topColumn = from + limbs - 1;
        for (int c = from; c < topColumn; c++) {
            long v = (c >= low ? col[c] : 0) + carry;
            out[off + c - from] = v & MASK;
            carry = v >> BITS;
        }
        long v = (topColumn >= low ? col[topColumn] : 0) + carry;
        long t = v & MASK;
        carry = v >> BITS;
        boolean zeros = true;
        boolean ones = true;
        for (int c = topColumn + 1; c < col.length; c++) {
            v = col[c] + carry;
            long limb = v & MASK;
            zeros &= limb == 0;
            ones &= limb == MASK;
            carry = v >> BITS;
        }
        if (carry == -1 && ones) {
            t -= 1L << BITS;
        } else if (carry != 0 || !zeros) {
            throw OVERFLOW;
        }
        if (Math.abs(t) >= TOP_BOUND) {
            throw OVERFLOW;
        }
        out[off + limbs - 1] = t;
    }

    /** Normalises the columns low .. last-1 to [0, 2^BITS), carrying into the last column. */
    void carry(long[] col, int low) {
        int last = col.length - 1;
        for (int c = low; c < last; c++) {
            long v = col[c];
            col[c] = v & MASK;
            col[c + 1] += v >> BITS;
        }
    }

    /**
     * The highest column of carried columns that is not a sign extension (-1 when they all vanish); a negative
     * value whose columns are all ones down to low gives low.
     */
    int topColumn(long[] col, int low) {
        int last = col.length - 1;
        long top = col[last];
        if (top != 0 && top != -1) {
            return last;
        }
        long sign = top == 0 ? 0 : MASK;
        for (int c = last - 1; c >= low; c--) {
            if (col[c] != sign) {
                return c;
            }
        }
        return top == 0 ? -1 : low;
    }

    private static final class Overflow extends RuntimeException {
        private static final long serialVersionUID = 1L;

        Overflow() {
            super("fixed-point value exceeds its integer limbs", null, false, false);
        }
    }
}
