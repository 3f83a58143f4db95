package org.tertius.hierarchy;

import org.hipparchus.complex.Complex;

/**
 * One first integral checked at one point: its value, the value it must keep, and the bound on the deviation
 * implied by the error estimates of the state (first-order propagation plus rounding). Immutable.
 */
public final class IntegralCheck {
    /**
     * The drift allowed, as a multiple of the first-order bound: the engine's error estimates are estimates
     * (propagated to first order along the path), not rigorous bounds, and were measured up to about 1.2 times
     * too small next to poles; a factor 2 separates that from a real drift.
     */
    public static final double ESTIMATE_SAFETY = 2;

    private final String name;
    private final Complex value;
    private final Complex expected;
    private final double bound;

    IntegralCheck(String name, Complex value, Complex expected, double bound) {
        this.name = name;
        this.value = value;
        this.expected = expected;
        this.bound = bound;
    }

    /** What is checked, e.g. {@code det a_-2 = s^2}. */
    public String name() {
        return name;
    }

    public Complex value() {
        return value;
    }

    public Complex expected() {
        return expected;
    }

    /** |value - expected|. */
    public double deviation() {
        return value.subtract(expected).norm();
    }

    /** The deviation allowed by the error estimates of the state. */
    public double bound() {
        return bound;
    }

    /** Whether the deviation lies within {@link #ESTIMATE_SAFETY} times the bound. */
    public boolean withinEstimate() {
        return deviation() <= ESTIMATE_SAFETY * bound;
    }

    /** deviation / bound (above 1: drift beyond the error estimate). */
    public double ratio() {
        return deviation() / bound;
    }

    @Override
    public String toString() {
        return name + ": deviation " + deviation() + " (bound " + bound + ")" + (withinEstimate() ? "" : " EXCEEDED");
    }
}
