package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.face.Coordinate;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.solution.Solution;
import org.tertius.hierarchy.algebra.Evaluation;

/**
 * The t_n-flow of a member n &gt;= 2 on the line x = 0 (lower times zero) along one ray from t_n = 0, in arbitrary
 * precision: the flow's coefficients from the exact m, the start on the ray where the double-precision engine
 * starts it (a binary number, hence exact), its state there from the t_n-series summed to the working precision,
 * and the unknowns as values. The first stage of {@link OriginPreciseStart}.
 */
final class TimeRayForm implements HighPrecisionForm {
    private final OriginSolution origin;
    private final Solution ray;
    private final Complex start;
    private final List<ExactNumber> data;
    private final ExactNumber m;

    /**
     * @param origin the solution whose ray this is
     * @param ray the double-precision ray (plans the paths)
     * @param start where the ray starts (a binary number, taken exactly)
     * @param data a11, a12, a21 of a_-2(0), exactly
     * @param m the exact m
     */
    TimeRayForm(OriginSolution origin, Solution ray, Complex start, List<ExactNumber> data, ExactNumber m) {
        this.origin = origin;
        this.ray = ray;
        this.start = start;
        this.data = List.copyOf(data);
        this.m = m;
    }

    @Override
    public Solution planner() {
        return ray;
    }

    @Override
    public Coordinate coordinate() {
        return Coordinate.plane("t_" + origin.member().order());
    }

    @Override
    public List<String> valueNames() {
        return origin.member().equations().names().subList(0, origin.member().dimension());
    }

    @Override
    public void requireDigits(int digits) {
        // the data are checked by the carried start that owns this stage
    }

    @Override
    public MpComplex[] coefficients(MpContext ctx) {
        MemberEquations eq = origin.member().equations();
        int n = eq.order();
        List<MpComplex> ring = new ArrayList<>();
        ring.add(MpComplex.ZERO); // x = 0
        for (int j = 2; j <= n; j++) {
            ring.add(MpComplex.ZERO); // t_2 .. t_{n-1} = 0; t_n is the variable (ignored)
        }
        ring.add(ctx.fromExact(m));
        return SystemAssembler.coefficients(eq, eq.tFlow(), IndependentVariable.PLAIN, eq.timeIndex(n), ring,
                Evaluation.precise(ctx)).toArray(new MpComplex[0]);
    }

    @Override
    public MpComplex startTau(MpContext ctx) {
        return ctx.fromDouble(start.getReal(), start.getImaginary());
    }

    @Override
    public MpComplex[] startState(MpContext ctx) {
        return seriesState(ctx, startTau(ctx));
    }

    /** The state on x = 0 at t_n = t from the t_n-series summed to the context's precision (t inside its disk). */
    MpComplex[] seriesState(MpContext ctx, MpComplex t) {
        MpArithmetic ar = new MpArithmetic(ctx);
        MpComplex mm = ctx.fromExact(m);
        MpComplex a11 = ctx.fromExact(data.get(0));
        MpComplex a12 = ctx.fromExact(data.get(1));
        MpComplex a21 = ctx.fromExact(data.get(2));
        double scale = 1;
        for (ExactNumber e : data) {
            scale = Math.max(scale, e.toComplex().norm());
        }
        int n = origin.member().order();
        return PreciseSeries.sum(ctx, order -> OriginSolution.timeSeries(ar, n, mm, a11, a12, a21, order), t,
                origin.timeSeries().radius(), scale, "state on x = 0 in t_" + n);
    }

    @Override
    public MpComplex[] values(MpContext ctx, MpComplex u, MpComplex[] state) {
        return state.clone();
    }
}
