package org.tertius.hierarchy;

import org.hipparchus.complex.Complex;
import org.tertius.core.face.Coordinate;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;

/**
 * How a member solution is read off its path tree: the engine variable is log x for member 1 and x itself for
 * members n &gt;= 2; q = a(n-2)12 / (n t_n) (member 1: a(-1)12 / x) is carried by the state component a(n-2)12, so the
 * poles and zeros of q are those of that component.
 */
final class MemberReading implements EngineReading {
    private final MemberSolution solution;
    private final Coordinate coordinate;
    private final int component;
    private final Complex topFactor;

    MemberReading(MemberSolution solution) {
        this.solution = solution;
        this.coordinate = solution.coordinate();
        int n = solution.member().order();
        this.component = solution.member().unknowns().indexOf("a(" + (n - 2) + ")12");
        this.topFactor = n == 1 ? null : solution.parameters().time(n).multiply(n).reciprocal();
    }

    @Override
    public Solution tree() {
        return solution.engine();
    }

    @Override
    public double tauRe(SurfacePoint p) {
        return coordinate.tauRe(p);
    }

    @Override
    public double tauIm(SurfacePoint p) {
        return coordinate.tauIm(p);
    }

    @Override
    public SurfacePoint point(double tauRe, double tauIm) {
        return coordinate.fromTau(tauRe, tauIm);
    }

    @Override
    public Complex coordinateDerivative(SurfacePoint p) {
        return coordinate.hasSheets() ? p.z() : Complex.ONE;
    }

    @Override
    public SolutionValue read(SurfacePoint p, StateEstimate state) {
        return solution.valueFrom(p.z(), p.sheet(), state).toSolutionValue(p);
    }

    @Override
    public int primaryComponent() {
        return component;
    }

    @Override
    public boolean primaryReciprocal() {
        return false;
    }

    @Override
    public Complex primaryFactor(SurfacePoint p) {
        return topFactor == null ? p.z().reciprocal() : topFactor;
    }
}
