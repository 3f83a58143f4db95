package org.tertius.core.piii;

import org.tertius.core.number.MpComplex;
import org.tertius.core.solution.Solution;

/**
 * Access to what lies behind an integrated Painleve III solution, for layers that run the same recurrence
 * plan in another precision along the same path tree: the engine solution (its nodes and their tree) and the
 * conversions of the polynomial form that was chosen, in arbitrary precision.
 */
public final class EngineView {
    private final IntegratedSolution solution;

    private EngineView(IntegratedSolution solution) {
        this.solution = solution;
    }

    /**
     * @throws org.tertius.core.InvalidInputException if the solution is not an integrated one (for example an
     *     image under a symmetry)
     */
    public static EngineView of(Painleve3Solution s) {
        if (!(s instanceof IntegratedSolution)) {
            throw new org.tertius.core.InvalidInputException("solution",
                    "an integrated solution (from Painleve3Solution.builder) is required here");
        }
        return new EngineView((IntegratedSolution) s);
    }

    /** The engine solution (path tree in tau = log z). */
    public Solution engine() {
        return solution.engine();
    }

    /** Coefficients of the form's system in arbitrary precision (order of the system's coefficient list). */
    public MpComplex[] coefficients(HighPrecisionParameters p) {
        return solution.form().coefficients(p);
    }

    /** The state of the form for (z, w, w'), w != 0, in arbitrary precision. */
    public MpComplex[] toState(HighPrecisionParameters p, MpComplex z, MpComplex w, MpComplex dw) {
        return solution.form().toState(p, z, w, dw);
    }

    /** {w, w'} from a state of the form, in arbitrary precision. */
    public MpComplex[] fromState(HighPrecisionParameters p, MpComplex z, MpComplex[] y) {
        return solution.form().fromState(p, z, y);
    }

    /** The state component that carries w or 1/w. */
    public int wComponent() {
        return solution.form().wComponent();
    }

    /** Whether {@link #wComponent()} carries 1/w (then poles of w are zeros of that component). */
    public boolean wComponentIsReciprocal() {
        return solution.form().wComponentIsReciprocal();
    }

    /**
     * The value at a point from the stored tree only (no new steps), or null when no stored node covers the
     * point with a local error below {@code maxRelativeError}.
     */
    public Painleve3Value evaluateStored(org.tertius.core.number.SurfacePoint p, double maxRelativeError) {
        org.tertius.core.solution.StateEstimate s = solution.engine().evaluateStored(p.logRe(), p.logIm(),
                maxRelativeError);
        return s == null ? null : solution.value(p, s);
    }

    /** The start point of the solution (principal sheet). */
    public org.tertius.core.number.SurfacePoint startPoint() {
        org.tertius.core.step.Node root = solution.engine().root();
        return org.tertius.core.number.SurfacePoint.fromLog(root.tauRe(), root.tauIm());
    }

    /** The description of the form. */
    public String formDescription() {
        return solution.form().describe();
    }
}
