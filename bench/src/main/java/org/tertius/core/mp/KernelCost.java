package org.tertius.core.mp;

import java.math.BigInteger;
import java.util.Random;

/**
 * Measured cost of the kernel's unit of work, for benchmarks that compare a run with its multiplication-count
 * bound (not used by the engine itself).
 */
public final class KernelCost {
    private KernelCost() {
    }

    /** Time of one fixed-point complex product accumulated in limb columns (the kernel's unit of work). */
    public static double complexProductSeconds(int bits) {
        return complexProductSeconds(new LimbFormat(bits, 1));
    }

    /** As above, with limb-column products ({@code big} false) or BigInteger products. */
    public static double complexProductSeconds(int bits, boolean big) {
        return complexProductSeconds(new LimbFormat(bits, 1, big));
    }

    private static double complexProductSeconds(LimbFormat fmt) {
        int n = 32;
        LimbVector v = new LimbVector(fmt, n + 1);
        Random r = new Random(1);
        for (int i = 0; i < n; i++) {
            v.set(i, new BigInteger(fmt.fractionBits(), r), new BigInteger(fmt.fractionBits(), r).negate());
        }
        LimbAccumulator acc = new LimbAccumulator(fmt);
        int reps = Math.max(20, 20_000_000 / (fmt.limbs() * fmt.limbs() * n));
        for (int i = 0; i < reps; i++) {
            acc.clear();
            acc.convolve(v, 0, v, 0, n - 1);
        }
        long t0 = System.nanoTime();
        for (int i = 0; i < reps; i++) {
            acc.clear();
            acc.convolve(v, 0, v, 0, n - 1);
        }
        double t = (System.nanoTime() - t0) / 1e9 / reps / n;
        acc.store(v, n);
        return t;
    }

    /** Time of one fixed-point complex product with three BigInteger products and their accumulation. */
    public static double bigIntegerProductSeconds(int bits) {
        BigInteger a = BigInteger.ONE.shiftLeft(bits).subtract(BigInteger.valueOf(987654321));
        BigInteger b = a.add(BigInteger.valueOf(123456789));
        BigInteger acc = BigInteger.ZERO;
        int n = Math.max(2000, 4_000_000 / Math.max(1, bits));
        for (int i = 0; i < n; i++) {
            acc = acc.add(a.multiply(b));
        }
        long t0 = System.nanoTime();
        for (int i = 0; i < n; i++) {
            acc = acc.add(a.multiply(b)).add(b.multiply(a)).add(a.multiply(a));
        }
        double t = (System.nanoTime() - t0) / 1e9 / n;
        if (acc.signum() == 0) {
            System.out.print("");
        }
        return t;
    }

}
