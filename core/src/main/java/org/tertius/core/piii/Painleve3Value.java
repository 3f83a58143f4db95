package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.SurfacePoint;

/**
 * The value of a Painleve III solution at a point of the Riemann surface: w, w' and their estimated
 * absolute errors. Immutable.
 */
public final class Painleve3Value {
    private final SurfacePoint point;
    private final Complex w;
    private final Complex dw;
    private final double errW;
    private final double errDw;

    public Painleve3Value(SurfacePoint point, Complex w, Complex dw, double errW, double errDw) {
        this.point = point;
        this.w = w;
        this.dw = dw;
        this.errW = errW;
        this.errDw = errDw;
    }

    public SurfacePoint point() {
        return point;
    }

    public Complex w() {
        return w;
    }

    public Complex dw() {
        return dw;
    }

    /** Estimated absolute error of w. */
    public double errW() {
        return errW;
    }

    /** Estimated absolute error of w'. */
    public double errDw() {
        return errDw;
    }

    /** The larger of the two error estimates relative to 1 + |value|. */
    public double relativeError() {
        return Math.max(errW / (1 + w.norm()), errDw / (1 + dw.norm()));
    }

    /** The same value on the equation-neutral face (values w, w' in that order). */
    public SolutionValue toSolutionValue() {
        return SolutionValue.of(point, new Complex[] {w, dw}, new double[] {errW, errDw});
    }

    /** A value of the face with the layout of {@link Painleve3Solution#VALUE_NAMES} (w, w'). */
    public static Painleve3Value of(SolutionValue v) {
        return new Painleve3Value(v.point(), v.value(0), v.value(1), v.error(0), v.error(1));
    }

    @Override
    public String toString() {
        return "w(" + point + ") = " + w + " +- " + errW + ", w' = " + dw + " +- " + errDw;
    }
}
