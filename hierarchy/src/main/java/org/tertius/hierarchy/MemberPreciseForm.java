package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.TertiusException;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.face.Coordinate;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.solution.Solution;
import org.tertius.hierarchy.algebra.Evaluation;
import org.tertius.hierarchy.algebra.Polynomial;

/**
 * A member solution in arbitrary precision: the x-flow's coefficients from the exact times and m, the exact start
 * state (or, for member 1 started at x = 0, its series summed at the engine's start point to the working precision),
 * and q, r, dq/dx, dr/dx from a state.
 */
final class MemberPreciseForm implements HighPrecisionForm {
    private final MemberSolution solution;
    private final ExactStart start;
    private final MemberEquations equations;
    private final List<ExactNumber> timesAndM;

    MemberPreciseForm(MemberSolution solution, ExactStart start) {
        this.solution = solution;
        this.start = start;
        this.equations = solution.member().equations();
        this.timesAndM = solution.parameters().exactTimesAndM();
    }

    @Override
    public Solution planner() {
        return solution.engine();
    }

    @Override
    public Coordinate coordinate() {
        return solution.coordinate();
    }

    @Override
    public List<String> valueNames() {
        return MemberSolution.VALUE_NAMES;
    }

    @Override
    public void requireDigits(int digits) {
        start.requireDigits(digits);
        int n = solution.member().order();
        for (int j = 0; j < n - 1; j++) {
            ExactStart.require("t_" + (j + 2), timesAndM.get(j), digits);
        }
        ExactStart.require("m", timesAndM.get(n - 1), digits);
    }

    /** Values of the ring's parameters x, t_2 .. t_n, m at this precision. */
    private List<MpComplex> ring(MpContext ctx, MpComplex x) {
        List<MpComplex> v = new ArrayList<>();
        v.add(x);
        for (ExactNumber e : timesAndM) {
            v.add(ctx.fromExact(e));
        }
        return v;
    }

    @Override
    public MpComplex[] coefficients(MpContext ctx) {
        IndependentVariable variable = solution.member().variable();
        return SystemAssembler.coefficients(equations, equations.xFlow(), variable, equations.timeIndex(1),
                ring(ctx, MpComplex.ZERO), Evaluation.precise(ctx)).toArray(new MpComplex[0]);
    }

    /** The start point: as given, or (start at the origin) the engine's start point, a binary number. */
    private MpComplex startPoint(MpContext ctx) {
        if (start.atOrigin()) {
            Complex x0 = solution.startPoint();
            return ctx.fromDouble(x0.getReal(), x0.getImaginary());
        }
        return ctx.fromExact(start.x0());
    }

    @Override
    public MpComplex startTau(MpContext ctx) {
        return tau(ctx, startPoint(ctx), 0);
    }

    @Override
    public MpComplex[] startState(MpContext ctx) {
        if (start.carried() != null) {
            return start.carried().state(ctx);
        }
        if (!start.atOrigin()) {
            MpComplex[] y = new MpComplex[start.state().size()];
            for (int i = 0; i < y.length; i++) {
                y[i] = ctx.fromExact(start.state().get(i));
            }
            return y;
        }
        return originSeriesAt(ctx, startPoint(ctx));
    }

    /**
     * Member 1 started at x = 0: the series of the solution analytic there summed at x0 with as many orders as make
     * its last term fall below the working precision (orders estimated from the double-precision series' radius,
     * then checked).
     */
    private MpComplex[] originSeriesAt(MpContext ctx, MpComplex x0) {
        List<ExactNumber> a = start.origin();
        MpComplex m = ctx.fromExact(timesAndM.get(timesAndM.size() - 1));
        MpComplex[] y0 = {ctx.fromExact(a.get(0)), ctx.fromExact(a.get(1)), ctx.fromExact(a.get(2)), m,
            MpComplex.ZERO, MpComplex.ZERO};
        PolynomialSystem flow = solution.member().xFlow(solution.parameters());
        Complex[] y0d = new Complex[y0.length];
        double scale = 1;
        for (int i = 0; i < y0.length; i++) {
            y0d[i] = y0[i].toComplex();
            scale = Math.max(scale, y0d[i].norm());
        }
        double radius = FrobeniusSeries.compute(ComplexArithmetic.INSTANCE, OriginTimeSeries.fromSystem(flow), y0d, 60,
                "start state at x = 0").radius();
        List<List<FrobeniusSeries.Term<MpComplex>>> terms = OriginTimeSeries.fromSystem(flow,
                List.of(coefficients(ctx)));
        MpArithmetic ar = new MpArithmetic(ctx);
        return PreciseSeries.sum(ctx, order -> FrobeniusSeries.compute(ar, terms, y0, order, "start state at x = 0"),
                x0, radius, scale, "start state at x = 0");
    }

    @Override
    public MpComplex[] values(MpContext ctx, MpComplex u, MpComplex[] state) {
        List<MpComplex> ring = new ArrayList<>(List.of(state));
        ring.addAll(ring(ctx, u));
        Evaluation<MpComplex> precise = Evaluation.precise(ctx);
        List<Polynomial> observables = solution.observables();
        MpComplex[] out = new MpComplex[observables.size()];
        for (int k = 0; k < out.length; k++) {
            out[k] = observables.get(k).evaluate(precise, ring);
        }
        return out;
    }
}
