package org.tertius.core.mp;

/**
 * An exact accumulator of complex fixed-point products in columns of longs: with three multiplications per
 * complex product (Gauss), t1 = sum ar br, t2 = sum ai bi, t3 = sum (ar + ai)(br + bi), so that re = t1 - t2 and
 * im = t3 - t1 - t2. A sum of products is rounded once, when it is stored; nothing is allocated per product.
 * Columns below a low column are not formed (short products). A product may be placed some whole limbs lower
 * (a smaller binary exponent), for floating values with limb-granular exponents ({@link ScaledRow}). When the
 * format asks for BigInteger products (many limbs), the three products are formed exactly with BigInteger and
 * summed as three integers, composed and spread into the same columns when the sum is stored.
 * Mutable scratch space of one computation.
 */
final class LimbAccumulator {
    private final LimbFormat format;
    private final int limbs;
    /** column of weight 2^-2F (columns below it serve products placed lower) */
    private final int base;
    private final int low;
    private final int flushEvery;
    private final long[] t1;
    private final long[] t2;
    private final long[] t3;
    private final long[] column;
    private final long[] column2;
    private int load;
    private final boolean big;
    /** With BigInteger products: the sums of ar br, ai bi and (ar + ai)(br + bi), in units of column 0. */
    private java.math.BigInteger sum1 = java.math.BigInteger.ZERO;
    private java.math.BigInteger sum2 = java.math.BigInteger.ZERO;
    private java.math.BigInteger sum3 = java.math.BigInteger.ZERO;

    /** An accumulator of fixed-point products rounded at 2^-F, forming the columns from the format's low one. */
    LimbAccumulator(LimbFormat format) {
        this(format, 0, format.lowColumn());
    }

    /**
     * @param base columns below the one of weight 2^-2F, for products placed up to that many limbs lower
     * @param low the lowest column formed
     */
    LimbAccumulator(LimbFormat format, int base, int low) {
        this.format = format;
        this.limbs = format.limbs();
        this.base = base;
        this.low = low;
        this.flushEvery = format.flushEvery();
        int n = base + 2 * limbs + 1;
        t1 = new long[n];
        t2 = new long[n];
        t3 = new long[n];
        column = new long[n];
        column2 = new long[n];
        big = format.bigProducts();
    }

    void clear() {
        if (big) {
            sum1 = java.math.BigInteger.ZERO;
            sum2 = java.math.BigInteger.ZERO;
            sum3 = java.math.BigInteger.ZERO;
            return;
        }
        java.util.Arrays.fill(t1, 0);
        java.util.Arrays.fill(t2, 0);
        java.util.Arrays.fill(t3, 0);
        load = 0;
    }

    /** Adds sum_{i=0..k} a[ai + i] b[bi + k - i]. */
    void convolve(LimbVector a, int ai, LimbVector b, int bi, int k) {
        for (int i = 0; i <= k; i++) {
            multiplyAdd(a, ai + i, b, bi + k - i);
        }
    }

    /** Adds a[i] b[j]. */
    void multiplyAdd(LimbVector a, int i, LimbVector b, int j) {
        multiplyAdd(a, i, b, j, 0);
    }

    /** Adds a[i] b[j] 2^(BITS shift), shift <= 0 and -shift <= base. */
    void multiplyAdd(LimbVector a, int i, LimbVector b, int j, int shift) {
        if (big) {
            java.math.BigInteger p1 = a.bigRe(i).multiply(b.bigRe(j));
            java.math.BigInteger p2 = a.bigIm(i).multiply(b.bigIm(j));
            java.math.BigInteger p3 = a.bigSum(i).multiply(b.bigSum(j));
            int at = LimbFormat.BITS * (base + shift);
            sum1 = sum1.add(at == 0 ? p1 : p1.shiftLeft(at));
            sum2 = sum2.add(at == 0 ? p2 : p2.shiftLeft(at));
            sum3 = sum3.add(at == 0 ? p3 : p3.shiftLeft(at));
            return;
        }
        final int n = limbs;
        final long[] ar = a.re;
        final long[] ai = a.im;
        final long[] as = a.sum;
        final long[] br = b.re;
        final long[] bi = b.im;
        final long[] bs = b.sum;
        final long[] c1 = t1;
        final long[] c2 = t2;
        final long[] c3 = t3;
        final int ao = i * n;
        final int bo = j * n;
        final int off = base + shift;
        // leading zero limbs (small positive values) take no part
        int na = n;
        while (na > 0 && (ar[ao + na - 1] | ai[ao + na - 1]) == 0) {
            na--;
        }
        int nb = n;
        while (nb > 0 && (br[bo + nb - 1] | bi[bo + nb - 1]) == 0) {
            nb--;
        }
        if (na == 0 || nb == 0) {
            return;
        }
        // column by column (product scanning): the terms of a column are summed in registers and the column is
        // written once; a column receives at most L terms below 2^(2 BITS + 2), far inside a long
        final int cEnd = off + na + nb - 2;
        for (int c = Math.max(low, off); c <= cEnd; c++) {
            int k = c - off;
            int xLo = Math.max(0, k - (nb - 1));
            int xHi = Math.min(na - 1, k);
            long s1 = 0;
            long s2 = 0;
            long s3 = 0;
            int p = ao + xLo;
            int q = bo + k - xLo;
            int m = xHi - xLo + 1;
            for (; m >= 2; m -= 2, p += 2, q -= 2) {
                s1 += ar[p] * br[q] + ar[p + 1] * br[q - 1];
                s2 += ai[p] * bi[q] + ai[p + 1] * bi[q - 1];
                s3 += as[p] * bs[q] + as[p + 1] * bs[q - 1];
            }
            if (m == 1) {
                s1 += ar[p] * br[q];
                s2 += ai[p] * bi[q];
                s3 += as[p] * bs[q];
            }
            c1[c] += s1;
            c2[c] += s2;
            c3[c] += s3;
        }
        if (++load >= flushEvery) {
            format.carry(t1, low);
            format.carry(t2, low);
            format.carry(t3, low);
            load = 0;
        }
    }

    /** Adds the sum held by another accumulator of the same format and placement. */
    void addSum(LimbAccumulator other) {
        if (big) {
            sum1 = sum1.add(other.sum1);
            sum2 = sum2.add(other.sum2);
            sum3 = sum3.add(other.sum3);
            return;
        }
        // carried columns lie below 2^BITS (the top one holds the rest), so the sum of two stays in budget
        format.carry(t1, low);
        format.carry(t2, low);
        format.carry(t3, low);
        format.carry(other.t1, low);
        format.carry(other.t2, low);
        format.carry(other.t3, low);
        for (int c = low; c < t1.length; c++) {
            t1[c] += other.t1[c];
            t2[c] += other.t2[c];
            t3[c] += other.t3[c];
        }
        load = 1;
    }

    /** Adds the value a[i] itself (scale 2^-F). */
    void add(LimbVector a, int i) {
        int o = i * limbs;
        int f = base + format.fractionLimbs();
        if (big) {
            // as in the columns: re goes to the first sum, re + im to the third
            sum1 = sum1.add(a.bigRe(i).shiftLeft(LimbFormat.BITS * f));
            sum3 = sum3.add(a.bigSum(i).shiftLeft(LimbFormat.BITS * f));
            return;
        }
        for (int x = 0; x < limbs; x++) {
            // re goes to t1; im = t3 - t1 - t2 then needs re + im in t3
            t1[f + x] += a.re[o + x];
            t3[f + x] += a.sum[o + x];
        }
    }

    /**
     * Adds (or, with {@code negate}, subtracts) the value a[i] 2^(BITS shift), shift <= 0 and -shift <= base, in
     * the units of a product (a value added at shift 0 is stored back unchanged). Columns below the low one are
     * left out, as for products.
     */
    void addShifted(LimbVector a, int i, int shift, boolean negate) {
        int f = base + format.fractionLimbs() + shift;
        if (big) {
            java.math.BigInteger re = a.bigRe(i).shiftLeft(LimbFormat.BITS * f);
            java.math.BigInteger s = a.bigSum(i).shiftLeft(LimbFormat.BITS * f);
            sum1 = negate ? sum1.subtract(re) : sum1.add(re);
            sum3 = negate ? sum3.subtract(s) : sum3.add(s);
            return;
        }
        int o = i * limbs;
        long sign = negate ? -1 : 1;
        for (int x = Math.max(0, low - f); x < limbs; x++) {
            t1[f + x] += sign * a.re[o + x];
            t3[f + x] += sign * a.sum[o + x];
        }
    }

    /**
     * Rounds the sum to scale 2^-F and stores it as value i of dst.
     *
     * @throws RuntimeException {@link LimbFormat#overflow()} when it does not fit
     */
    void store(LimbVector dst, int i) {
        compose();
        int from = base + format.fractionLimbs();
        format.round(column, from, low, dst.re, i * limbs);
        format.round(column2, from, low, dst.im, i * limbs);
        dst.updateSum(i);
    }

    /**
     * Rounds the sum to L - 1 significant limbs (a floating value) and stores it as value i of dst: the stored
     * value times 2^(BITS e) is the sum, where e is returned; Integer.MIN_VALUE when the sum vanishes (dst then
     * holds 0).
     */
    int storeNormalized(LimbVector dst, int i) {
        compose();
        format.carry(column, low);
        format.carry(column2, low);
        int t = Math.max(format.topColumn(column, low), format.topColumn(column2, low));
        if (t < 0) {
            java.util.Arrays.fill(dst.re, i * limbs, (i + 1) * limbs, 0);
            java.util.Arrays.fill(dst.im, i * limbs, (i + 1) * limbs, 0);
            dst.updateSum(i);
            return Integer.MIN_VALUE;
        }
        int from = t - (limbs - 2);
        format.round(column, from, low, dst.re, i * limbs);
        format.round(column2, from, low, dst.im, i * limbs);
        dst.updateSum(i);
        return from - base - format.fractionLimbs();
    }

    /** re = t1 - t2 into column, im = t3 - t1 - t2 into column2. */
    private void compose() {
        if (big) {
            java.math.BigInteger re = sum1.subtract(sum2);
            LimbFormat.spill(re, column);
            LimbFormat.spill(sum3.subtract(sum1).subtract(sum2), column2);
            return;
        }
        for (int c = low; c < column.length; c++) {
            column[c] = t1[c] - t2[c];
            column2[c] = t3[c] - t1[c] - t2[c];
        }
    }
}
