package org.tertius.core.region;

import org.hipparchus.complex.Complex;
import org.tertius.core.number.SurfacePoint;

/**
 * A pole or a zero of w located on the Riemann surface, with its leading coefficient (the residue c of
 * w ~ c / (z - p) at a pole; w' at a zero) and an estimate of the error of its position. Immutable.
 */
public final class Singularity {
    /** Pole or zero. */
    public enum Kind {
        POLE, ZERO;

        public String label() {
            return this == POLE ? "pole" : "zero";
        }
    }

    private final Kind kind;
    private final SurfacePoint point;
    private final Complex lead;
    private final double error;

    public Singularity(Kind kind, SurfacePoint point, Complex lead, double error) {
        this.kind = kind;
        this.point = point;
        this.lead = lead;
        this.error = error;
    }

    public Kind kind() {
        return kind;
    }

    public SurfacePoint point() {
        return point;
    }

    /** The residue at a pole, w' at a zero. */
    public Complex lead() {
        return lead;
    }

    /** Estimated error of the position. */
    public double error() {
        return error;
    }

    @Override
    public String toString() {
        return kind.label() + " at " + point + " lead " + lead + " +- " + error;
    }
}
