package org.tertius.core.step;

import org.tertius.core.InvalidInputException;

/**
 * Settings of the Taylor-Pade integrator. Immutable; build with {@link #builder()}.
 *
 * <ul>
 *   <li>order N: Taylor order per node; Pade approximants [N/2 / N/2] and [N/2-1 / N/2-1] are formed and
 *       their difference is the local error estimate.</li>
 *   <li>tolerance: accepted local error per step, relative to 1 + |y| per component. What limits it: below
 *       1e-14 the Pade rank test follows the tolerance down to 1e-15 only, and a truncation error below the
 *       rounding level of the approximants (at most 2e-15 relative) is not chased with smaller steps, so that
 *       tolerances under about 2e-15 act alike (the values are then as accurate as double precision allows along
 *       the path, and their estimates say how accurate that is; more digits need high precision).</li>
 *   <li>padeTolerance: the relative threshold of the rank test of the robust Pade algorithm.</li>
 *   <li>maxSteps: the largest number of steps of one path before the target is declared unreachable.</li>
 *   <li>maxError: a path whose carried error (relative to 1 + |y| per component) exceeds this is abandoned and its
 *       target reported unreachable; next to a pole the relative error of a node grows like 1/distance, so this
 *       is a guard against garbage, not an accuracy target (default 1e-3).</li>
 * </ul>
 */
public final class SolverSettings {
    private final int order;
    private final double tolerance;
    private final double padeTolerance;
    private final int maxSteps;
    private final double initialStep;
    private final double maxError;

    private SolverSettings(Builder b) {
        this.order = b.order;
        this.tolerance = b.tolerance;
        this.padeTolerance = b.padeTolerance;
        this.maxSteps = b.maxSteps;
        this.initialStep = b.initialStep;
        this.maxError = b.maxError;
    }

    public static Builder builder() {
        return new Builder();
    }

    /** The defaults: order 32, tolerance 1e-13, Pade rank tolerance 1e-14, 20000 steps per path. */
    public static SolverSettings defaults() {
        return builder().build();
    }

    public int order() {
        return order;
    }

    public double tolerance() {
        return tolerance;
    }

    public double padeTolerance() {
        return padeTolerance;
    }

    public int maxSteps() {
        return maxSteps;
    }

    public double initialStep() {
        return initialStep;
    }

    public double maxError() {
        return maxError;
    }

    public Builder toBuilder() {
        return new Builder().order(order).tolerance(tolerance).padeTolerance(padeTolerance).maxSteps(maxSteps)
                .initialStep(initialStep).maxError(maxError);
    }

    /** Builder with validation of every field. */
    public static final class Builder {
        private int order = 32;
        private double tolerance = 1e-13;
        private double padeTolerance = 1e-14;
        private int maxSteps = 20000;
        private double initialStep = 0.25;
        private double maxError = 1e-3;

        public Builder order(int order) {
            if (order < 8 || order > 400 || order % 2 != 0) {
                throw new InvalidInputException("order", "must be an even number in [8, 400], got " + order);
            }
            this.order = order;
            return this;
        }

        public Builder tolerance(double tolerance) {
            if (!(tolerance >= 1e-16 && tolerance <= 1e-2)) {
                throw new InvalidInputException("tolerance", "must be in [1e-16, 1e-2], got " + tolerance);
            }
            this.tolerance = tolerance;
            return this;
        }

        public Builder padeTolerance(double padeTolerance) {
            if (!(padeTolerance >= 1e-17 && padeTolerance <= 1e-4)) {
                throw new InvalidInputException("padeTolerance", "must be in [1e-17, 1e-4], got " + padeTolerance);
            }
            this.padeTolerance = padeTolerance;
            return this;
        }

        public Builder maxSteps(int maxSteps) {
            if (maxSteps < 1) {
                throw new InvalidInputException("maxSteps", "must be >= 1, got " + maxSteps);
            }
            this.maxSteps = maxSteps;
            return this;
        }

        public Builder initialStep(double initialStep) {
            if (!(initialStep > 0 && initialStep <= 10)) {
                throw new InvalidInputException("initialStep", "must be in (0, 10], got " + initialStep);
            }
            this.initialStep = initialStep;
            return this;
        }

        public Builder maxError(double maxError) {
            if (!(maxError > 0)) {
                throw new InvalidInputException("maxError", "must be > 0, got " + maxError);
            }
            this.maxError = maxError;
            return this;
        }

        public SolverSettings build() {
            return new SolverSettings(this);
        }
    }
}
