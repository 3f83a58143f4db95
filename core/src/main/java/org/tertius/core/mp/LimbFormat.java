package org.tertius.core.mp;

import java.math.BigInteger;

/**
 * A binary fixed-point format on preallocated arrays of limbs: a value is X 2^-F with F = {@link #fractionBits()},
 * and the integer X = sum_i x_i 2^(BITS i) is held in {@link #limbs()} consecutive longs, limbs 0..L-2 in
 * [0, 2^BITS) and the top limb signed with |x_{L-1}| &lt; 2^(BITS-2). The top {@code headroom} limbs hold the
 * integer part. Products are accumulated exactly in columns of longs (see {@link LimbAccumulator}), without an
 * allocation per operation. Immutable.
 */
final class LimbFormat {
    /**
     * Bits per limb: a term ar br - ai bi or ar bi + ai br of two complex limbs lies below 2^(2 BITS + 1) = 2^57,
     * so a column of fewer than 64 such terms fits a long.
     */
    static final int BITS = 28;
    static final long MASK = (1L << BITS) - 1;
    /** Bound on the magnitude of the top limb of a stored value. */
    static final long TOP_BOUND = 1L << (BITS - 2);
    /**
     * Largest sum of column terms a column may receive between two carry passes: a carried column lies in
     * [0, 2^BITS), so it then stays within a long, with room for 2^12 values added without a product.
     */
    private static final long COLUMN_BUDGET = Long.MAX_VALUE - (1L << (BITS + 12));
    /**
     * Columns computed below the rounding position. The dropped columns (below) hold at most L terms below
     * 2^(2 BITS + 1) each, worth less than L 2^(1 - BITS) units of 2^-F per product with two guard columns: 2^-23
     * units at 15 limbs, 2^-16 for a convolution of 125 such products.
     */
    private static final int GUARD_COLUMNS = 2;
    private static final RuntimeException OVERFLOW = new Overflow();
    /**
     * Limbs from which products are formed with BigInteger (Karatsuba above about 2500 bits, 64-bit multiplier
     * intrinsics) rather than limb by limb: measured with {@code KernelCost}, the limb columns win below about
     * 250 digits and BigInteger wins above (twice as fast at 1000 digits). Below 64, as the column sums require.
     */
    static final int BIG_PRODUCT_LIMBS = 34;

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
        // every product adds at most `limbs` terms below 2^(2 BITS + 1) to a column (limbs < 64: one product
        // alone stays within the budget)
        this.flushEvery = (int) Math.max(1, COLUMN_BUDGET / ((long) limbs << (2 * BITS + 1)));
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
        byte[] b = x.toByteArray();
        for (int i = 0; i < limbs - 1; i++) {
            dst[off + i] = limbAt(b, x.signum() < 0, i);
        }
    }

    /**
     * Bits [BITS c, BITS (c + 1)) of the two's complement integer whose big-endian bytes are b (sign-extended
     * beyond them), as a limb in [0, 2^BITS).
     */
    private static long limbAt(byte[] b, boolean negative, int c) {
        int lowBit = BITS * c;
        int first = lowBit >>> 3;
        int last = (lowBit + BITS - 1) >>> 3;
        long v = 0;
        for (int k = last; k >= first; k--) {
            int p = b.length - 1 - k;
            v = (v << 8) | (p >= 0 ? b[p] & 0xff : (negative ? 0xff : 0));
        }
        return (v >>> (lowBit & 7)) & MASK;
    }

    /**
     * Spreads the integer x into columns: col[c] = the BITS-bit limb c of x for c &lt; length - 1, and the last
     * column the (signed) rest; when the rest does not fit a column it is replaced by a value that makes
     * {@link #round} report an overflow.
     */
    static void spill(BigInteger x, long[] col) {
        int last = col.length - 1;
        byte[] b = x.toByteArray();
        for (int c = 0; c < last; c++) {
            col[c] = limbAt(b, x.signum() < 0, c);
        }
        BigInteger rest = x.shiftRight(BITS * last);
        col[last] = rest.bitLength() < 62 ? rest.longValue() : (rest.signum() < 0 ? -(1L << 61) : 1L << 61);
    }

    /** The fixed-point integer (scale 2^-F) held in src[off .. off+L-1]. */
    BigInteger read(long[] src, int off) {
        int lowBits = BITS * (limbs - 1);
        byte[] b = new byte[(lowBits + 7) / 8 + 1];
        // the low limbs as one unsigned integer, written bit group by bit group from the least significant byte
        long pending = 0;
        int pendingBits = 0;
        int p = b.length - 1;
        for (int i = 0; i < limbs - 1; i++) {
            pending |= src[off + i] << pendingBits;
            pendingBits += BITS;
            while (pendingBits >= 8) {
                b[p--] = (byte) pending;
                pending >>>= 8;
                pendingBits -= 8;
            }
        }
        if (pendingBits > 0) {
            b[p] = (byte) pending;
        }
        BigInteger low = new BigInteger(1, b);
        return BigInteger.valueOf(src[off + limbs - 1]).shiftLeft(lowBits).add(low);
    }

    /** Divides the value in a[off ..] by d (0 &lt; d &lt; 2^(63 - BITS)) in place, rounding toward minus infinity. */
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
