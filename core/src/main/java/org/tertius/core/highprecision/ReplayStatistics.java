package org.tertius.core.highprecision;

/**
 * Figures of one high-precision computation (for benchmarks): order, steps, fixed-point bits and complex products
 * of its accurate pass. Immutable.
 */
public final class ReplayStatistics {
    private final int order;
    private final int steps;
    private final int totalSteps;
    private final int fractionBits;
    private final long productCount;

    ReplayStatistics(int order, int steps, int totalSteps, int fractionBits, long productCount) {
        this.order = order;
        this.steps = steps;
        this.totalSteps = totalSteps;
        this.fractionBits = fractionBits;
        this.productCount = productCount;
    }

    /** Taylor order of the accurate pass. */
    public int order() {
        return order;
    }

    /** Steps of the accurate pass from the start to the (first) point. */
    public int steps() {
        return steps;
    }

    /** Steps of the cheap and the accurate pass together. */
    public int totalSteps() {
        return totalSteps;
    }

    /** Fractional bits of the fixed-point coefficients of the accurate pass. */
    public int fractionBits() {
        return fractionBits;
    }

    /** Complex products of coefficients done by the accurate pass (recurrence and continued fractions). */
    public long productCount() {
        return productCount;
    }
}
