package org.tertius.core.mp;

/**
 * An exact accumulator of complex fixed-point products in columns of longs: with three multiplications per
 * complex product (Gauss), t1 = sum ar br, t2 = sum ai bi, t3 = sum (ar + ai)(br + bi), so that re = t1 - t2 and
 * im = t3 - t1 - t2. A sum of products is rounded once, when it is stored; nothing is allocated per product.
 * Columns below {@link LimbFormat#lowColumn()} are not formed (short products). Mutable scratch space of one
 * computation.
 */
final class LimbAccumulator {
    private final LimbFormat format;
    private final int limbs;
    private final int low;
    private final int flushEvery;
    private final long[] t1;
    private final long[] t2;
    private final long[] t3;
    private final long[] column;
    private int load;

    LimbAccumulator(LimbFormat format) {
        this.format = format;
        this.limbs = format.limbs();
        this.low = format.lowColumn();
        this.flushEvery = format.flushEvery();
        int n = 2 * limbs + 1;
        t1 = new long[n];
        t2 = new long[n];
        t3 = new long[n];
        column = new long[n];
    }

    void clear() {
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
        for (int x = 0; x < n; x++) {
            long pr = ar[ao + x];
            long pi = ai[ao + x];
            long ps = as[ao + x];
            if ((pr | pi | ps) == 0) {
                continue;
            }
            int y0 = Math.max(0, low - x);
            for (int y = y0; y < n; y++) {
                int c = x + y;
                int q = bo + y;
                c1[c] += pr * br[q];
                c2[c] += pi * bi[q];
                c3[c] += ps * bs[q];
            }
        }
        if (++load >= flushEvery) {
            format.carry(t1);
            format.carry(t2);
            format.carry(t3);
            load = 0;
        }
    }

    /** Adds the value a[i] itself (scale 2^-F). */
    void add(LimbVector a, int i) {
        int o = i * limbs;
        int f = format.fractionLimbs();
        for (int x = 0; x < limbs; x++) {
            // re goes to t1; im = t3 - t1 - t2 then needs re + im in t3
            t1[f + x] += a.re[o + x];
            t3[f + x] += a.sum[o + x];
        }
    }

    /**
     * Rounds the sum to scale 2^-F and stores it as value i of dst.
     *
     * @throws RuntimeException {@link LimbFormat#overflow()} when it does not fit
     */
    void store(LimbVector dst, int i) {
        long[] col = column;
        for (int c = low; c < col.length; c++) {
            col[c] = t1[c] - t2[c];
        }
        format.round(col, dst.re, i * limbs);
        for (int c = low; c < col.length; c++) {
            col[c] = t3[c] - t1[c] - t2[c];
        }
        format.round(col, dst.im, i * limbs);
        dst.updateSum(i);
    }
}
