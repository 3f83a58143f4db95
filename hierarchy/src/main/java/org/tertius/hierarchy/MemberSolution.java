package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.Coordinate;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.face.InvariantCheck;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;
import org.tertius.core.step.Node;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.algebra.Polynomial;

/**
 * A solution of member n, fixed by its state at a start point x0 (or, for member 1, by a_-2 at the fixed
 * singular point x = 0), integrated by the core engine (one path tree with dense output; thread-safe like
 * {@link Solution}). Every value reports q, r, all unknowns with error estimates, and the first integrals.
 * Immutable; build with {@link #builder(MemberParameters)}.
 *
 * <p>Member 1 lives on the Riemann surface of log x: its points are given with a sheet number, counted from
 * the principal sheet of x0. Members n &gt;= 2 are single-valued in x.
 */
public final class MemberSolution implements ComputedSolution {
    /** The values of a member solution on the face: q, r, dq/dx, dr/dx. */
    public static final List<String> VALUE_NAMES = List.of("q", "r", "dq", "dr");
    /** Start data must satisfy the constraints to this relative accuracy. */
    private static final double START_CONSISTENCY = 1e-10;
    /** Coefficients of the series at x = 0 for member 1. */
    static final int SERIES_ORDER = 60;

    private final HierarchyMember member;
    private final MemberParameters parameters;
    private final SolverSettings settings;
    private final Complex x0;
    private final int x0Sheet;
    private final List<Complex> startState;
    private final double[] startError;
    private final Complex traceIntegral;
    private final Solution engine;
    private final IntegralMonitor monitor;
    private final Linearized[] observables;
    /** How the start was given exactly (for the high-precision replay), or null when it was not. */
    private final ExactStart exactStart;
    /** Member 1 started at x = 0: its series there (null otherwise). */
    private final FrobeniusSeries<Complex> origin;

    MemberSolution(HierarchyMember member, MemberParameters parameters, SolverSettings settings, Complex x0,
                           int x0Sheet, List<Complex> startState, double[] startError, ExactStart exactStart,
                           FrobeniusSeries<Complex> origin) {
        this.exactStart = exactStart;
        this.origin = origin;
        this.member = member;
        this.parameters = parameters;
        this.settings = settings;
        this.x0 = x0;
        this.x0Sheet = x0Sheet;
        this.startState = List.copyOf(startState);
        this.startError = startError.clone();
        MemberEquations eq = member.equations();
        this.traceIntegral = new Linearized(eq.traceForm(), eq.unknownCount()).value(ringValues(startState, x0));
        this.monitor = new IntegralMonitor(eq, parameters.s(), traceIntegral);
        List<Polynomial> xf = eq.xFlow();
        int xi = eq.timeIndex(1);
        this.observables = new Linearized[] {new Linearized(eq.q(), eq.unknownCount()),
            new Linearized(eq.r(), eq.unknownCount()),
            new Linearized(eq.q().derivativeAlong(xf, xi), eq.unknownCount()),
            new Linearized(eq.r().derivativeAlong(xf, xi), eq.unknownCount())};
        checkConsistent();
        PolynomialSystem system = member.xFlow(parameters);
        double[] re = new double[startState.size()];
        double[] im = new double[startState.size()];
        for (int i = 0; i < re.length; i++) {
            re[i] = startState.get(i).getReal();
            im[i] = startState.get(i).getImaginary();
        }
        double[] tau = tau(x0, x0Sheet);
        // the uncertainty of the start state (from a series or another flow) is carried by the flow like any error
        this.engine = Solution.start(system, settings, StateProjection.NONE, tau[0], tau[1], re, im,
                this.startError.clone(), new double[re.length]);
    }

    public static MemberSolutionBuilder builder(MemberParameters parameters) {
        return new MemberSolutionBuilder(parameters);
    }

    public HierarchyMember member() {
        return member;
    }

    public MemberParameters parameters() {
        return parameters;
    }

    /** The start point x0 (member 1 started at x = 0: the small point where the series was summed). */
    public Complex startPoint() {
        return x0;
    }

    /** The state at the start point. */
    public List<Complex> startState() {
        return startState;
    }

    /** The value of the trace form tr(a_-2 a_-1), a first integral fixed by the start data. */
    public Complex traceIntegral() {
        return traceIntegral;
    }

    /** Number of nodes in the path tree. */
    @Override
    public int nodeCount() {
        return engine.nodeCount();
    }

    @Override
    public String equationDescription() {
        return "member " + member.order() + " of the Painleve III hierarchy, " + parameters;
    }

    @Override
    public String methodDescription() {
        return "integrated as a first-order system of its " + member.dimension() + " unknowns in "
                + (member.variable() == IndependentVariable.LOG ? "log x" : "x");
    }

    @Override
    public Coordinate coordinate() {
        return member.order() == 1 ? Coordinate.logarithmic("x") : Coordinate.plane("x");
    }

    @Override
    public List<String> valueNames() {
        return VALUE_NAMES;
    }

    @Override
    public List<String> invariants() {
        return monitor.names();
    }

    /**
     * The values q, r, q', r' at a point along its canonical path: a function of the start data, the settings and the
     * point alone, bit for bit; {@link #evaluate(Complex, int)} reuses the path tree grown so far instead.
     */
    @Override
    public SolutionValue valueAt(SurfacePoint point) {
        coordinate().check("x", point);
        double[] tau = tau(point.z(), point.sheet());
        return valueFrom(point.z(), point.sheet(), engine.evaluateCanonical(tau[0], tau[1])).toSolutionValue(point);
    }

    @Override
    public Optional<EngineReading> engineReading() {
        return Optional.of(new MemberReading(this));
    }

    @Override
    public HighPrecisionForm highPrecisionForm() {
        if (exactStart == null) {
            throw new InvalidInputException("digits", "this solution's start is not known exactly (a start moved"
                    + " along the t_n-flow from x != 0, a start on another sheet, or origin data with a phase"
                    + " e^(i phase) != 1); start it from exact data (decimals, rationals) to compute it to many digits");
        }
        return new MemberPreciseForm(this, exactStart);
    }

    /** The engine's path tree. */
    Solution engine() {
        return engine;
    }

    /** The observables q, r, dq/dx, dr/dx as polynomials of the ring (unknowns, x, times, m). */
    List<Polynomial> observables() {
        List<Polynomial> out = new ArrayList<>();
        for (Linearized l : observables) {
            out.add(l.function());
        }
        return out;
    }

    /** The value at x (principal sheet for member 1). */
    public MemberValue evaluate(Complex x) {
        return evaluate(x, 0);
    }

    /** The value at a point of the surface of log x (member 1; for n &gt;= 2 the sheet must be 0). */
    public MemberValue evaluate(SurfacePoint x) {
        return evaluate(x.z(), x.sheet());
    }

    /**
     * The value at x on the given sheet.
     *
     * @throws org.tertius.core.UnreachableTargetException if the engine cannot reach x to its tolerance
     */
    public MemberValue evaluate(Complex x, int sheet) {
        requireFinite(x);
        if (member.order() == 1 && x.norm() == 0) {
            throw new InvalidInputException("x", "x = 0 is the fixed singular point of member 1");
        }
        if (member.order() >= 2 && sheet != 0) {
            throw new InvalidInputException("sheet", "member " + member.order() + " is single-valued in x; the sheet"
                    + " must be 0, got " + sheet);
        }
        double[] tau = tau(x, sheet);
        return valueFrom(x, sheet, engine.evaluate(tau[0], tau[1]));
    }

    /** A member n &gt;= 2 solution started at x0 with a state whose uncertainty is carried by the flow. */
    static MemberSolution started(HierarchyMember member, MemberParameters parameters, SolverSettings settings,
                                  Complex x0, List<Complex> state, double[] error, ExactStart precise) {
        member.checkState(state);
        return new MemberSolution(member, parameters, settings, x0, 0, state, error, precise, null);
    }

    /**
     * The value at x = 0 of member 1 started there ({@link MemberSolutionBuilder#startAtOrigin}): the state is the origin data,
     * q, r, dq/dx, dr/dx come from the series at x = 0 (q = a(-1)12 / x there); errors are rounding only.
     */
    public MemberValue valueAtOrigin() {
        if (origin == null) {
            throw new InvalidInputException("x", "x = 0 is the fixed singular point of member 1; its value there is"
                    + " defined for the solution started there (startAtOrigin) only");
        }
        List<Complex> state = new ArrayList<>();
        for (int i = 0; i < member.dimension(); i++) {
            state.add(origin.coefficient(0, i));
        }
        Complex[] qr = {origin.coefficient(1, 4), origin.coefficient(1, 5), origin.coefficient(2, 4),
            origin.coefficient(2, 5)};
        double[] qrErr = new double[4];
        for (int k = 0; k < 4; k++) {
            qrErr[k] = 8 * Math.ulp(1.0) * qr[k].norm();
        }
        double[] err = new double[state.size()];
        return new MemberValue(Complex.ZERO, 0, state, err, qr, qrErr, monitor.check(ringValues(state,
                Complex.ZERO), err));
    }

    /**
     * q alone at x with its error estimate (first-order propagation of the state's errors plus rounding),
     * without the other observables and the integrals: the cheap evaluation for grids.
     */
    public PotentialValue potential(Complex x) {
        requireFinite(x);
        if (member.order() == 1 && x.norm() == 0) {
            return new PotentialValue(x, valueAtOrigin().q(), valueAtOrigin().errorQ());
        }
        double[] tau = tau(x, 0);
        StateEstimate e = engine.evaluate(tau[0], tau[1]);
        double[] err = new double[member.dimension()];
        List<Complex> state = new ArrayList<>(e.dimension());
        for (int i = 0; i < e.dimension(); i++) {
            state.add(new Complex(e.re(i), e.im(i)));
            err[i] = e.error(i);
        }
        List<Complex> values = ringValues(state, x);
        return new PotentialValue(x, observables[0].value(values), observables[0].bound(values, err));
    }

    private static void requireFinite(Complex x) {
        if (x == null || !Double.isFinite(x.getReal()) || !Double.isFinite(x.getImaginary())) {
            throw new InvalidInputException("x", "must be a finite complex number, got " + x);
        }
    }

    /** The value at x from an engine estimate there. */
    MemberValue valueFrom(Complex x, int sheet, StateEstimate e) {
        List<Complex> state = new ArrayList<>();
        double[] err = new double[e.dimension()];
        for (int i = 0; i < e.dimension(); i++) {
            state.add(new Complex(e.re(i), e.im(i)));
            err[i] = e.error(i);
        }
        List<Complex> values = ringValues(state, x);
        Complex[] qr = new Complex[4];
        double[] qrErr = new double[4];
        for (int k = 0; k < 4; k++) {
            qr[k] = observables[k].value(values);
            qrErr[k] = observables[k].bound(values, err);
        }
        return new MemberValue(x, sheet, state, err, qr, qrErr, monitor.check(values, err));
    }

    /**
     * The first integrals checked at every node of the path tree grown so far; for each integral the check
     * with the largest deviation relative to its bound.
     */
    public List<InvariantCheck> integralsAlongPaths() {
        List<InvariantCheck> worst = null;
        for (Node node : engine.nodes()) {
            List<Complex> state = new ArrayList<>();
            double[] err = new double[node.dimension()];
            for (int i = 0; i < node.dimension(); i++) {
                state.add(new Complex(node.stateRe(i), node.stateIm(i)));
                err[i] = Math.hypot(node.errorRe(i), node.errorIm(i)) + 4 * Math.ulp(1.0) * state.get(i).norm();
            }
            Complex x = member.variable() == IndependentVariable.LOG
                    ? new Complex(node.tauRe(), node.tauIm()).exp() : new Complex(node.tauRe(), node.tauIm());
            List<InvariantCheck> c = monitor.check(ringValues(state, x), err);
            if (worst == null) {
                worst = c;
            } else {
                for (int k = 0; k < c.size(); k++) {
                    if (c.get(k).ratio() > worst.get(k).ratio()) {
                        worst.set(k, c.get(k));
                    }
                }
            }
            worst = new ArrayList<>(worst);
        }
        return List.copyOf(worst);
    }

    /**
     * The solution with the top time moved to tn at the same x0: the start state is carried along the flow in
     * t_n (integrated by the core engine in the variable t_n; t_n = 0 is its singular point). The error estimate
     * of the carried state is added to every later error estimate (not propagated further).
     */
    public MemberSolution withTopTime(Complex tn) {
        int n = member.order();
        if (n < 2) {
            throw new InvalidInputException("t_n", "member 1 has no time besides x");
        }
        MemberParameters moved = parameters.withTopTime(tn);
        Complex t0 = parameters.time(n);
        PolynomialSystem flow = member.timeFlow(parameters, x0);
        double[] re = new double[startState.size()];
        double[] im = new double[startState.size()];
        for (int i = 0; i < re.length; i++) {
            re[i] = startState.get(i).getReal();
            im[i] = startState.get(i).getImaginary();
        }
        StateEstimate e = Solution.start(flow, settings, StateProjection.NONE, t0.getReal(), t0.getImaginary(), re, im)
                .evaluate(tn.getReal(), tn.getImaginary());
        List<Complex> state = new ArrayList<>();
        double[] err = startError.clone();
        for (int i = 0; i < re.length; i++) {
            state.add(new Complex(e.re(i), e.im(i)));
            err[i] += e.error(i);
        }
        return new MemberSolution(member, moved, settings, x0, 0, state, err, null, null);
    }

    private List<Complex> ringValues(List<Complex> state, Complex x) {
        List<Complex> v = new ArrayList<>(state);
        v.addAll(parameters.ringValues(x));
        return v;
    }

    private double[] tau(Complex x, int sheet) {
        if (member.variable() == IndependentVariable.LOG) {
            SurfacePoint p = SurfacePoint.of(x, sheet);
            return new double[] {p.logRe(), p.logIm()};
        }
        return new double[] {x.getReal(), x.getImaginary()};
    }

    private void checkConsistent() {
        double[] err = new double[startState.size()];
        for (int i = 0; i < err.length; i++) {
            err[i] = START_CONSISTENCY * (1 + startState.get(i).norm()) + startError[i];
        }
        for (InvariantCheck c : monitor.check(ringValues(startState, x0), err)) {
            if (!c.withinEstimate()) {
                throw new InvalidInputException(c.name().startsWith("det a_-2") ? "s" : "start state",
                        "the start data violate " + c.name() + ": value " + c.value() + ", required " + c.expected()
                        + " (deviation " + c.deviation() + "); the diagonal entries a(k)11, k >= -1, follow from x0,"
                        + " the times and m (HierarchyMember.completeDiagonal), and det a_-2 must equal s^2");
            }
        }
    }
}
