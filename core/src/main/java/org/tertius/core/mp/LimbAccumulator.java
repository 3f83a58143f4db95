package org.tertius.core.mp;

import java.math.BigInteger;
import java.util.Arrays;

/**
 * An exact accumulator of complex fixed-point products in columns of longs: the real and imaginary parts of a
 * sum of products, re = sum (ar br - ai bi) and im = sum (ar bi + ai br), column by column. A sum of products is
 * rounded once, when it is stored; nothing is allocated per product. Columns below a low column are not formed
 * (short products). When the format asks for BigInteger products (many
 * limbs), a complex product takes three BigInteger products (Gauss: t1 = ar br, t2 = ai bi,
 * t3 = (ar + ai)(br + bi), re = t1 - t2, im = t3 - t1 - t2), summed as three integers and spread into the same
 * columns when the sum is stored. Mutable scratch space of one computation.
 */
final class LimbAccumulator {
    private final LimbFormat format;
    private final int limbs;
    private final int low;
    private final int flushEvery;
    /** Column sums of the real and imaginary parts (with BigInteger products: filled when the sum is stored). */
    private final long[] re;
    private final long[] im;
    private int load;
    private final boolean big;
    /** With BigInteger products: the sums of ar br, ai bi and (ar + ai)(br + bi), in units of column 0. */
    private BigInteger sum1 = BigInteger.ZERO;
    private BigInteger sum2 = BigInteger.ZERO;
    private BigInteger sum3 = BigInteger.ZERO;

    /** An accumulator of fixed-point products rounded at 2^-F, forming the columns from the format's low one. */
    LimbAccumulator(LimbFormat format) {
        this(format, format.lowColumn());
    }

    /** @param low the lowest column formed (column 0 has the weight 2^-2F; below 0 means 0) */
    LimbAccumulator(LimbFormat format, int low) {
        this.format = format;
        this.limbs = format.limbs();
        this.low = Math.max(0, low);
        this.flushEvery = format.flushEvery();
        int n = 2 * limbs + 1;
        re = new long[n];
        im = new long[n];
        big = format.bigProducts();
    }

    void clear() {
        if (big) {
            sum1 = BigInteger.ZERO;
            sum2 = BigInteger.ZERO;
            sum3 = BigInteger.ZERO;
            return;
        }
        Arrays.fill(re, low, re.length, 0);
        Arrays.fill(im, low, im.length, 0);
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
        if (big) {
            sum1 = sum1.add(a.bigRe(i).multiply(b.bigRe(j)));
            sum2 = sum2.add(a.bigIm(i).multiply(b.bigIm(j)));
            sum3 = sum3.add(a.bigSum(i).multiply(b.bigSum(j)));
            return;
        }
        final int n = limbs;
        final long[] ar = a.re;
        final long[] ai = a.im;
        final long[] br = b.re;
        final long[] bi = b.im;
        final long[] cr = re;
        final long[] ci = im;
        final int ao = i * n;
        final int bo = j * n;
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
        // carry passes only when the columns could not take another product (and never before a store, which
        // carries and rounds itself)
        if (load >= flushEvery) {
            format.carry(re, low);
            format.carry(im, low);
            load = 0;
        }
        load++;
        // column by column (product scanning): the terms of a column are summed in registers and the column is
        // written once; a column receives fewer than 64 terms below 2^(2 BITS + 1), inside a long. Four products
        // per pair of limbs rather than Gauss's three: no sums re + im to load, and in the quick compiler's code
        // (no range-check elimination) the loads cost more than the multiplications (13 % faster measured)
        final int cEnd = na + nb - 2;
        for (int c = low; c <= cEnd; c++) {
            int xLo = Math.max(0, c - (nb - 1));
            int xHi = Math.min(na - 1, c);
            long sr = 0;
            long si = 0;
            int p = ao + xLo;
            int q = bo + c - xLo;
            int m = xHi - xLo + 1;
            for (; m >= 2; m -= 2, p += 2, q -= 2) {
                long xr = ar[p];
                long xi = ai[p];
                long yr = br[q];
                long yi = bi[q];
                long ur = ar[p + 1];
                long ui = ai[p + 1];
                long vr = br[q - 1];
                long vi = bi[q - 1];
                sr += xr * yr - xi * yi + ur * vr - ui * vi;
                si += xr * yi + xi * yr + ur * vi + ui * vr;
            }
            if (m == 1) {
                long xr = ar[p];
                long xi = ai[p];
                long yr = br[q];
                long yi = bi[q];
                sr += xr * yr - xi * yi;
                si += xr * yi + xi * yr;
            }
            cr[c] += sr;
            ci[c] += si;
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
        format.carry(re, low);
        format.carry(im, low);
        format.carry(other.re, low);
        format.carry(other.im, low);
        for (int c = low; c < re.length; c++) {
            re[c] += other.re[c];
            im[c] += other.im[c];
        }
        load = 1;
    }

    /** Adds the value a[i] itself (scale 2^-F). */
    void add(LimbVector a, int i) {
        int o = i * limbs;
        int f = format.fractionLimbs();
        if (big) {
            // as in the columns: re goes to the first sum, re + im to the third
            sum1 = sum1.add(a.bigRe(i).shiftLeft(LimbFormat.BITS * f));
            sum3 = sum3.add(a.bigSum(i).shiftLeft(LimbFormat.BITS * f));
            return;
        }
        for (int x = 0; x < limbs; x++) {
            re[f + x] += a.re[o + x];
            im[f + x] += a.im[o + x];
        }
    }

    /**
     * Rounds the sum to scale 2^-F and stores it as value i of dst.
     *
     * @throws RuntimeException {@link LimbFormat#overflow()} when it does not fit
     */
    void store(LimbVector dst, int i) {
        compose();
        int from = format.fractionLimbs();
        format.round(re, from, low, dst.re, i * limbs);
        format.round(im, from, low, dst.im, i * limbs);
        dst.changed(i);
    }

    /**
     * Rounds the sum to L - 1 significant limbs (a floating value) and stores it as value i of dst: the stored
     * value times 2^(BITS e) is the sum, where e is returned; Integer.MIN_VALUE when the sum vanishes (dst then
     * holds 0).
     */
    int storeNormalized(LimbVector dst, int i) {
        compose();
        format.carry(re, low);
        format.carry(im, low);
        int t = Math.max(format.topColumn(re, low), format.topColumn(im, low));
        if (t < 0) {
            Arrays.fill(dst.re, i * limbs, (i + 1) * limbs, 0);
            Arrays.fill(dst.im, i * limbs, (i + 1) * limbs, 0);
            dst.changed(i);
            return Integer.MIN_VALUE;
        }
        int from = t - (limbs - 2);
        format.round(re, from, low, dst.re, i * limbs);
        format.round(im, from, low, dst.im, i * limbs);
        dst.changed(i);
        return from - format.fractionLimbs();
    }

    /**
     * With BigInteger products: re = t1 - t2 and im = t3 - t1 - t2 spread into the columns (limb products are
     * summed there directly).
     */
    private void compose() {
        if (big) {
            LimbFormat.spill(sum1.subtract(sum2), re);
            LimbFormat.spill(sum3.subtract(sum1).subtract(sum2), im);
        }
    }
}
