package org.tertius.core.mp;

/**
 * The root test of the scaled Taylor coefficients during an expansion of the {@link FixedPointKernel}: the growth
 * per order that a coefficient shows, checked at orders 16, 32, 64, ... against GROWTH_LIMIT, and the exception
 * raised beyond it. Also gives the growth seen when a value outgrows the integer limbs (how many to add).
 */
final class CoefficientGrowth {
    /** Largest growth per order of the scaled coefficients accepted at the root-test checkpoints. */
    private static final double GROWTH_LIMIT = 1.5;

    private CoefficientGrowth() {
    }

    /**
     * Raised when the scaled coefficients grow by more than GROWTH_LIMIT per order (a root test at orders 16, 32,
     * 64, ...): the scale lies well beyond the radius of convergence, and finishing the expansion would only fill
     * integer limbs (and cost their products). Carries the growth factor seen, so that the caller can shrink the
     * scale at once.
     */
    static final class ScaleTooLarge extends RuntimeException {
        private static final long serialVersionUID = 1L;
        final double growth;

        ScaleTooLarge(double growth) {
            super("scaled Taylor coefficients grow by " + growth + " per order", null, false, false);
            this.growth = growth;
        }
    }

    /**
     * log2 of the growth per order shown by coefficient m: max over the components of
     * (log2 |y_{i,m}| - log2(1 + |y_{i,0}|)) / m.
     */
    static double growthBits(LimbVector w, LimbFormat fmt, int n, int st, int m, double[] log2Start) {
        double g = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            int o = (i * st + m) * fmt.limbs();
            double a = Math.hypot(fmt.approximate(w.re, o), fmt.approximate(w.im, o));
            if (a > 0) {
                g = Math.max(g, (Math.log(a) / Math.log(2) - log2Start[i]) / m);
            }
        }
        return g;
    }

    /**
     * The root-test checkpoint at order m: raises ScaleTooLarge when coefficient m shows a growth above
     * GROWTH_LIMIT per order.
     */
    static void check(LimbVector w, LimbFormat fmt, int n, int st, int m, double[] log2Start) {
        double g = growthBits(w, fmt, n, st, m, log2Start);
        if (g > Math.log(GROWTH_LIMIT) / Math.log(2)) {
            throw new ScaleTooLarge(Math.pow(2, g));
        }
    }
}
