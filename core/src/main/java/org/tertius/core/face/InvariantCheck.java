package org.tertius.core.face;

import org.hipparchus.complex.Complex;

/**
 * A quantity a solution must keep, evaluated at a point: its value, the value it must have, the deviation and
 * the bound of that deviation expected from the error estimates of the point's state. A first integral of a
 * hierarchy member is one. Immutable.
 */
public final class InvariantCheck {
    /** Deviations up to this multiple of the bound count as within the estimate. */
    public static final double SAFETY = 2;

    private final String name;
    private final Complex value;
    private final Complex expected;
    private final double bound;

    public InvariantCheck(String name, Complex value, Complex expected, double bound) {
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

    /** The deviation the error estimates allow. */
    public double bound() {
        return bound;
    }

    /** deviation / bound (above 1: drift beyond the error estimate). */
    public double ratio() {
        return deviation() / bound;
    }

    /** Whether the deviation lies within {@link #SAFETY} times the bound. */
    public boolean withinEstimate() {
        return deviation() <= SAFETY * bound;
    }

    @Override
    public String toString() {
        return name + ": deviation " + deviation() + " (bound " + bound + ")" + (withinEstimate() ? "" : " EXCEEDED");
    }
}
