package org.tertius.core.piii;

import org.hipparchus.complex.Complex;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;

/** How an integrated Painleve III solution is read off its path tree in tau = log z. */
final class Painleve3Reading implements EngineReading {
    private final IntegratedSolution solution;

    Painleve3Reading(IntegratedSolution solution) {
        this.solution = solution;
    }

    @Override
    public Solution tree() {
        return solution.engine();
    }

    @Override
    public double tauRe(SurfacePoint p) {
        return p.logRe();
    }

    @Override
    public double tauIm(SurfacePoint p) {
        return p.logIm();
    }

    @Override
    public SurfacePoint point(double tauRe, double tauIm) {
        return SurfacePoint.fromLog(tauRe, tauIm);
    }

    @Override
    public Complex coordinateDerivative(SurfacePoint p) {
        return p.z();
    }

    @Override
    public SolutionValue read(SurfacePoint p, StateEstimate state) {
        return solution.value(p, state).toSolutionValue();
    }

    @Override
    public int primaryComponent() {
        return solution.form().wComponent();
    }

    @Override
    public boolean primaryReciprocal() {
        return solution.form().wComponentIsReciprocal();
    }

    @Override
    public Complex primaryFactor(SurfacePoint p) {
        return Complex.ONE;
    }
}
