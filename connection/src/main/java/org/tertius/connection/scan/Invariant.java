package org.tertius.connection.scan;

import org.tertius.core.piii.Painleve3Value;

/**
 * The invariant of the autonomous limit of PIII(0, 0, 1, -1) at 0 at one point x (see
 * {@link DecayingClassifier}), with its error: in the form of w, E = ((q - 1)^2 - x^2/w^2)/2, which neglects
 * x^2 w^2; in the form of 1/w, E = ((q + 1)^2 - x^2 w^2)/2, which neglects x^2/w^2 (q = x w'/w). The error is
 * propagated from the error estimates of w and w', plus the neglected term (a bound of the change of E
 * between X_MIN and x, where that term is largest; common practice). Immutable.
 */
final class Invariant {
    private final boolean reciprocal;
    private final double value;
    private final double error;

    private Invariant(boolean reciprocal, double value, double error) {
        this.reciprocal = reciprocal;
        this.value = value;
        this.error = error;
    }

    /** Whether the form of 1/w neglects less than the form of w at this value (|w| &gt; 1). */
    static boolean reciprocalFormAt(Painleve3Value v) {
        return Math.abs(v.w().getReal()) > 1;
    }

    /** The invariant at the value's point in the given form. */
    static Invariant at(Painleve3Value v, boolean reciprocal) {
        double x = v.point().re();
        double w = v.w().getReal();
        double dw = v.dw().getReal();
        double q = x * dw / w;
        double relW = v.errW() / Math.abs(w);
        double dq = x * (v.errDw() + Math.abs(dw) * relW) / Math.abs(w);
        double kept = reciprocal ? x * w : x / w;
        double neglected = reciprocal ? x / w : x * w;
        double shifted = reciprocal ? q + 1 : q - 1;
        double value = (shifted * shifted - kept * kept) / 2;
        double error = Math.abs(shifted) * dq + kept * kept * relW + neglected * neglected;
        return new Invariant(reciprocal, value, error);
    }

    boolean reciprocal() {
        return reciprocal;
    }

    double value() {
        return value;
    }

    double error() {
        return error;
    }

    boolean isFinite() {
        return Double.isFinite(value) && Double.isFinite(error);
    }

    /** Whether another value of the same invariant agrees with this one within three times their errors. */
    boolean agreesWith(Invariant other) {
        return other.reciprocal == reciprocal && other.isFinite()
                && Math.abs(other.value - value) <= 3 * (other.error + error) + DecayingClassifier.DECISION_FLOOR;
    }
}
