package org.tertius.core.face;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;

/**
 * The values of a computed solution at one point, in the order of its {@link ComputedSolution#valueNames()},
 * each with an estimated absolute error, and the checks of its invariants there (empty when it has none).
 * Immutable.
 */
public final class SolutionValue {
    private final SurfacePoint point;
    private final Complex[] values;
    private final double[] errors;
    private final List<InvariantCheck> checks;

    private SolutionValue(SurfacePoint point, Complex[] values, double[] errors, List<InvariantCheck> checks) {
        if (values.length != errors.length) {
            throw new IllegalArgumentException("values and errors differ in length");
        }
        this.point = point;
        this.values = values.clone();
        this.errors = errors.clone();
        this.checks = List.copyOf(checks);
    }

    public static SolutionValue of(SurfacePoint point, Complex[] values, double[] errors) {
        return new SolutionValue(point, values, errors, List.of());
    }

    public static SolutionValue of(SurfacePoint point, Complex[] values, double[] errors, List<InvariantCheck> checks) {
        return new SolutionValue(point, values, errors, checks);
    }

    public SurfacePoint point() {
        return point;
    }

    /** Number of values. */
    public int size() {
        return values.length;
    }

    public Complex value(int i) {
        return values[i];
    }

    /** Estimated absolute error of value i. */
    public double error(int i) {
        return errors[i];
    }

    /** The largest of the error estimates. */
    public double maxError() {
        double m = 0;
        for (double e : errors) {
            m = Math.max(m, e);
        }
        return m;
    }

    /** The largest error estimate relative to 1 + |value|. */
    public double maxRelativeError() {
        double m = 0;
        for (int i = 0; i < values.length; i++) {
            m = Math.max(m, errors[i] / (1 + values[i].norm()));
        }
        return m;
    }

    /** The invariants checked at this point (empty if the solution has none). */
    public List<InvariantCheck> checks() {
        return checks;
    }

    /** Whether every invariant lies within its estimate (true when there are none). */
    public boolean checksWithinEstimate() {
        for (InvariantCheck c : checks) {
            if (!c.withinEstimate()) {
                return false;
            }
        }
        return true;
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder("value at " + point + ":");
        for (int i = 0; i < values.length; i++) {
            b.append(' ').append(values[i]).append(" +- ").append(errors[i]);
        }
        return b.toString();
    }
}
