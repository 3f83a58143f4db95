package org.tertius.core.mp;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * One step of a high-precision path: the Taylor series at its start point and, when the step vaulted a pole,
 * the continued fractions (Pade approximants) of every component; the scaled end point of the step tells the
 * part of the line it covers. Immutable; kept for dense output along a path.
 */
final class HpNode {
    private final TaylorSeries series;
    private final ContinuedFraction[] fractions;
    private final MpComplex endS;

    HpNode(TaylorSeries series, ContinuedFraction[] fractions, MpComplex endS) {
        this.series = series;
        this.fractions = fractions;
        this.endS = endS;
    }

    TaylorSeries series() {
        return series;
    }

    boolean usesPade() {
        return fractions != null;
    }

    /** The scaled end point of the step. */
    MpComplex endS() {
        return endS;
    }

    /**
     * The state at the scaled point s, or null when s lies on a Pade step and the approximants do not meet the
     * tolerance there (the caller then steps to the point).
     */
    MpComplex[] evaluate(MpContext ctx, MpComplex s, double log2Tolerance) {
        if (fractions == null) {
            return series.evaluate(ctx, s);
        }
        return PadeStepper.padeValue(ctx, fractions, s, log2Tolerance);
    }
}
