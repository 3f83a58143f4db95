package org.tertius.core.mp;
import org.tertius.core.number.MpComplex;

/**
 * A step of a {@link SegmentIntegrator} run: its scaled length, the state at its end, its fractions (Pade) and the
 * waypoint reached (or -1).
 */
final class SegmentStep {
    final MpComplex s;
    final MpComplex[] y;
    final ContinuedFraction[] fractions;
    final int waypoint;

    SegmentStep(MpComplex s, MpComplex[] y, ContinuedFraction[] fractions, int waypoint) {
        this.s = s;
        this.y = y;
        this.fractions = fractions;
        this.waypoint = waypoint;
    }
}
