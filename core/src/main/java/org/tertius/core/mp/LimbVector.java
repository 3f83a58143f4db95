package org.tertius.core.mp;

import java.math.BigInteger;

/**
 * A work array of complex fixed-point numbers in one {@link LimbFormat}: real and imaginary parts, each value
 * taking L consecutive longs (with BigInteger products also the values as integers, and their sums re + im for
 * products with three multiplications). Mutable scratch space owned by one computation (never shared between
 * threads).
 */
final class LimbVector {
    final LimbFormat format;
    final int limbs;
    final long[] re;
    final long[] im;
    /** With BigInteger products: the values as integers, formed when first needed after each change. */
    private final BigInteger[] bigRe;
    private final BigInteger[] bigIm;
    private final BigInteger[] bigSum;

    LimbVector(LimbFormat format, int size) {
        this.format = format;
        this.limbs = format.limbs();
        this.re = new long[size * limbs];
        this.im = new long[size * limbs];
        boolean big = format.bigProducts();
        this.bigRe = big ? new BigInteger[size] : null;
        this.bigIm = big ? new BigInteger[size] : null;
        this.bigSum = big ? new BigInteger[size] : null;
    }

    /**
     * The same values in a format with the same fraction limbs and more integer limbs (limb by limb: the signed
     * top limb is split into its low bits and the sign extension).
     */
    LimbVector widened(LimbFormat wider) {
        if (wider.fractionLimbs() != format.fractionLimbs() || wider.limbs() < limbs) {
            throw new IllegalArgumentException("not a wider format of the same fraction");
        }
        int size = re.length / limbs;
        LimbVector out = new LimbVector(wider, size);
        for (int i = 0; i < size; i++) {
            widen(re, i * limbs, out.re, i * out.limbs, out.limbs);
            widen(im, i * limbs, out.im, i * out.limbs, out.limbs);
        }
        return out;
    }

    private void widen(long[] src, int from, long[] dst, int to, int wideLimbs) {
        System.arraycopy(src, from, dst, to, limbs - 1);
        long top = src[from + limbs - 1];
        if (wideLimbs == limbs) {
            dst[to + limbs - 1] = top;
            return;
        }
        dst[to + limbs - 1] = top & LimbFormat.MASK;
        long sign = top >> LimbFormat.BITS;
        for (int x = limbs; x < wideLimbs - 1; x++) {
            dst[to + x] = sign & LimbFormat.MASK;
        }
        dst[to + wideLimbs - 1] = sign;
    }

    /** Sets value i to (r + i m) 2^-F from fixed-point integers. */
    void set(int i, BigInteger r, BigInteger m) {
        format.write(r, re, i * limbs);
        format.write(m, im, i * limbs);
        changed(i);
    }

    /** Forgets the integers cached for value i (BigInteger products); every change of a value ends here. */
    void changed(int i) {
        if (bigRe != null) {
            bigRe[i] = null;
            bigIm[i] = null;
            bigSum[i] = null;
        }
    }

    /** The real part of value i as an integer (BigInteger products only; cached until the value changes). */
    BigInteger bigRe(int i) {
        return cached(bigRe, re, i);
    }

    BigInteger bigIm(int i) {
        return cached(bigIm, im, i);
    }

    private BigInteger cached(BigInteger[] cache, long[] limbArray, int i) {
        BigInteger v = cache[i];
        if (v == null) {
            v = format.read(limbArray, i * limbs);
            cache[i] = v;
        }
        return v;
    }

    /** re + im of value i as an integer. */
    BigInteger bigSum(int i) {
        BigInteger v = bigSum[i];
        if (v == null) {
            v = bigRe(i).add(bigIm(i));
            bigSum[i] = v;
        }
        return v;
    }

    BigInteger re(int i) {
        return format.read(re, i * limbs);
    }

    BigInteger im(int i) {
        return format.read(im, i * limbs);
    }

    /** Divides value i by d (0 &lt; d &lt; 2^(63 - BITS)), rounding each part toward minus infinity. */
    void divide(int i, long d) {
        format.divide(re, i * limbs, d);
        format.divide(im, i * limbs, d);
        changed(i);
    }
}
