package org.tertius.hierarchy;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.face.InvariantCheck;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.SurfacePoint;

/**
 * The value of a member solution at one point x: q, r, dq/dx, dr/dx, all unknowns, their estimated absolute
 * errors, and the first integrals checked there. Immutable.
 */
public final class MemberValue {
    private final Complex x;
    private final int sheet;
    private final List<Complex> state;
    private final double[] errors;
    private final Complex[] qr;
    private final double[] qrErrors;
    private final List<InvariantCheck> integrals;

    MemberValue(Complex x, int sheet, List<Complex> state, double[] errors, Complex[] qr, double[] qrErrors,
                List<InvariantCheck> integrals) {
        this.x = x;
        this.sheet = sheet;
        this.state = List.copyOf(state);
        this.errors = errors.clone();
        this.qr = qr.clone();
        this.qrErrors = qrErrors.clone();
        this.integrals = List.copyOf(integrals);
    }

    public Complex x() {
        return x;
    }

    /** The sheet of x around x = 0 (member 1; always 0 for n &gt;= 2). */
    public int sheet() {
        return sheet;
    }

    public Complex q() {
        return qr[0];
    }

    public Complex r() {
        return qr[1];
    }

    /** dq/dx, from the equations at the state. */
    public Complex dq() {
        return qr[2];
    }

    /** dr/dx, from the equations at the state. */
    public Complex dr() {
        return qr[3];
    }

    public double errorQ() {
        return qrErrors[0];
    }

    public double errorR() {
        return qrErrors[1];
    }

    public double errorDq() {
        return qrErrors[2];
    }

    public double errorDr() {
        return qrErrors[3];
    }

    /** All unknowns, in the order of {@link HierarchyMember#unknowns()}. */
    public List<Complex> state() {
        return state;
    }

    /** Estimated absolute error of unknown i. */
    public double error(int i) {
        return errors[i];
    }

    /** The first integrals at this point. */
    public List<InvariantCheck> integrals() {
        return integrals;
    }

    /** Whether every first integral keeps its value within the error estimate. */
    public boolean integralsWithinEstimate() {
        return integrals.stream().allMatch(InvariantCheck::withinEstimate);
    }

    /** The same value on the equation-neutral face at that point (values q, r, dq, dr; the integrals as checks). */
    public SolutionValue toSolutionValue(SurfacePoint point) {
        return SolutionValue.of(point, qr, qrErrors, integrals);
    }

    /** Empty if the integrals are kept; otherwise says which drift beyond the error estimate. */
    public String warning() {
        StringBuilder sb = new StringBuilder();
        for (InvariantCheck c : integrals) {
            if (!c.withinEstimate()) {
                sb.append(sb.length() == 0 ? "first integrals drift beyond the error estimate: " : "; ").append(c);
            }
        }
        return sb.toString();
    }
}
