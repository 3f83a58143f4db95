package org.tertius.hierarchy;

import java.lang.reflect.Array;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ConcurrentHashMap;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.solution.Solution;
import org.tertius.core.solution.StateEstimate;
import org.tertius.core.step.SolverSettings;

/**
 * The solution of member n &gt;= 2 analytic at x = t_n = 0 (with t_2 = ... = t_{n-1} = 0), fixed by its data
 * there: a_{-2}(0) = [[a11, a12], [a21, -a11]] with det = s^2, and m. It lives on the whole (x, t_n) plane: at
 * t_n = 0 it is the member-1 solution analytic at x = 0 with the same a_{-2}(0) (member n degenerates there and
 * its q, r are member 1's); for t_n != 0 it is reached by the t_n-flow on the line x = 0, started by its Taylor
 * series at the regular singular point t_n = 0 ({@link OriginTimeSeries}, derivation there), summed where its
 * last terms fall below 1e-17 of the data, carried to t_n by the core engine along the ray from 0 (one path tree
 * per ray), and then along x by the x-flow (x = 0 is a regular point of members n &gt;= 2). Thread-safe; the state
 * reached on a ray may depend on which targets were asked before, within the error estimates.
 */
public final class OriginSolution {
    /** Coefficients of the t_n-series. */
    public static final int SERIES_ORDER = 60;
    /** The series hands over where its estimated truncation error is below this fraction of the data. */
    private static final double HANDOVER_ACCURACY = 1e-17;
    /** Origin data must satisfy det a_-2(0) = s^2 to this relative accuracy. */
    private static final double CONSISTENCY = 1e-10;

    private final HierarchyMember member;
    private final Complex s;
    private final Complex m;
    private final Complex[] origin;
    private final SolverSettings settings;
    private final FrobeniusSeries<Complex> series;
    private final double handover;
    private final double handoverError;
    /** a11, a12, a21 and m as given exactly, or null (given as doubles: no high-precision runs). */
    private final List<ExactNumber> exactOrigin;
    private final ExactNumber exactM;
    private final Map<List<Double>, Solution> rays = new ConcurrentHashMap<>();
    private volatile MemberSolution memberOne;

    private OriginSolution(HierarchyMember member, Complex s, Complex m, Complex[] origin, SolverSettings settings,
                           List<ExactNumber> exactOrigin, ExactNumber exactM) {
        this.exactOrigin = exactOrigin;
        this.exactM = exactM;
        this.member = member;
        this.s = s;
        this.m = m;
        this.origin = origin.clone();
        this.settings = settings;
        this.series = timeSeries(ComplexArithmetic.INSTANCE, member.order(), m, origin[0], origin[1], origin[2],
                SERIES_ORDER);
        double scale = 1;
        for (Complex c : origin) {
            scale = Math.max(scale, c.norm());
        }
        double rho = Math.min(0.5 * series.radius(), 1.0);
        while (series.truncation(rho) > HANDOVER_ACCURACY * scale) {
            rho *= 0.5;
        }
        this.handover = rho;
        this.handoverError = series.truncation(rho) + series.rounding(rho);
    }

    /**
     * @param n the member, 2 .. {@link HierarchyMember#MAX_ORDER}
     * @param s the constant with det a_-2 = s^2
     * @param m the formal monodromy at infinity; 2m must not be a non-zero integer (resonance at t_n = 0)
     * @param a11 entry (1,1) of a_-2(0)
     * @param a12 entry (1,2) of a_-2(0)
     * @param a21 entry (2,1) of a_-2(0); -a11^2 - a12 a21 must equal s^2
     * @param settings integrator settings for both flows
     */
    public static OriginSolution create(int n, Complex s, Complex m, Complex a11, Complex a12, Complex a21,
                                        SolverSettings settings) {
        HierarchyMember.checkOrder(n);
        if (n < 2) {
            throw new InvalidInputException("member", "the start at x = t_n = 0 is for members 2 .. "
                    + HierarchyMember.MAX_ORDER + "; member 1 starts at x = 0 with MemberSolution.startAtOrigin");
        }
        if (settings == null) {
            throw new InvalidInputException("settings", "are required");
        }
        Complex[] a = {a11, a12, a21};
        String[] names = {"a11", "a12", "a21"};
        for (int i = 0; i < 3; i++) {
            requireFinite("origin " + names[i], a[i]);
        }
        requireFinite("s", s);
        requireFinite("m", m);
        double twoM = 2 * m.getReal();
        if (m.getImaginary() == 0 && Math.rint(twoM) != 0 && Math.abs(twoM - Math.rint(twoM)) < 1e-9) {
            throw new InvalidInputException("m", "the start at x = t_n = 0 needs 2m not a non-zero integer (there the"
                    + " flows are resonant at the origin); got m = " + m);
        }
        Complex det = a11.multiply(a11).add(a12.multiply(a21)).negate();
        double scale = 1 + a11.norm() * a11.norm() + a12.norm() * a21.norm() + s.norm() * s.norm();
        if (det.subtract(s.multiply(s)).norm() > CONSISTENCY * scale) {
            throw new InvalidInputException("origin", "a_-2(0) = (" + a11 + ", " + a12 + ", " + a21 + ") has"
                    + " det = -a11^2 - a12 a21 = " + det + ", but it must equal s^2 = " + s.multiply(s)
                    + " (to a relative 1e-10)");
        }
        return new OriginSolution(HierarchyMember.of(n), s, m, a, settings, null, null);
    }

    /**
     * As {@link #create(int, Complex, Complex, Complex, Complex, Complex, SolverSettings)} with m and a_-2(0) given
     * exactly (decimals, rationals), so that the solution can also be computed to many digits at exact t_n
     * ({@link #atTime(ExactNumber)}).
     */
    public static OriginSolution create(int n, Complex s, ExactNumber m, ExactNumber a11, ExactNumber a12,
                                        ExactNumber a21, SolverSettings settings) {
        if (m == null || a11 == null || a12 == null || a21 == null) {
            throw new InvalidInputException(m == null ? "m" : "origin", "is required");
        }
        OriginSolution d = create(n, s, m.toComplex(), a11.toComplex(), a12.toComplex(), a21.toComplex(), settings);
        return new OriginSolution(d.member, s, d.m, d.origin, settings, List.of(a11, a12, a21), m);
    }

    /**
     * The member-n solution at the parameters' t_n started from a_-2(0) = origin (a11, a12, a21) at x = t_n = 0;
     * the lower times must be zero (only there is t_n = 0 a regular singular point of the t_n-flow).
     */
    static MemberSolution startFor(MemberParameters p, List<ExactNumber> exactOrigin, SolverSettings settings) {
        int n = p.order();
        for (int j = 2; j < n; j++) {
            if (p.time(j).norm() != 0) {
                throw new InvalidInputException("times", "a start at x = t_" + n + " = 0 needs t_2 .. t_" + (n - 1)
                        + " = 0 (only there is t_" + n + " = 0 a regular singular point of the t_" + n + "-flow), got t_"
                        + j + " = " + p.time(j));
            }
        }
        OriginSolution o = create(n, p.s(), p.exactTimesAndM().get(n - 1), exactOrigin.get(0), exactOrigin.get(1),
                exactOrigin.get(2), settings);
        o.requireNonZero(p.time(n));
        return o.started(p);
    }

    /**
     * The Taylor series in t_n of the state on x = 0 in any arithmetic (double, or arbitrary precision with
     * {@code new ApcomplexArithmetic(digits)}); the data are not checked here.
     */
    public static <T> FrobeniusSeries<T> timeSeries(AnalyticArithmetic<T> arithmetic, int n, T m, T a11, T a12,
                                                    T a21, int order) {
        HierarchyMember.checkOrder(n);
        MemberEquations eq = HierarchyMember.of(n).equations();
        T[] y0 = OriginTimeSeries.restPoint(arithmetic, newArray(eq.unknownCount(), m, a11, a12, a21,
                arithmetic.zero(), arithmetic.of(0, 1)), m, a11, a12, a21);
        return FrobeniusSeries.compute(arithmetic, OriginTimeSeries.timeSystem(arithmetic, eq, m), y0, order,
                "origin");
    }

    /** An array whose element type holds every sample (their nearest common class). */
    @SafeVarargs
    @SuppressWarnings("unchecked")
    private static <T> T[] newArray(int d, T... samples) {
        Class<?> type = samples[0].getClass();
        for (T x : samples) {
            while (!type.isInstance(x)) {
                type = type.getSuperclass();
            }
        }
        return (T[]) Array.newInstance(type, d);
    }

    private static void requireFinite(String name, Complex c) {
        if (c == null || !Double.isFinite(c.getReal()) || !Double.isFinite(c.getImaginary())) {
            throw new InvalidInputException(name, "must be a finite complex number, got " + c);
        }
    }

    public HierarchyMember member() {
        return member;
    }

    public Complex s() {
        return s;
    }

    public Complex m() {
        return m;
    }

    /** a_-2(0) as (a11, a12, a21). */
    public List<Complex> originData() {
        return List.of(origin);
    }

    public SolverSettings settings() {
        return settings;
    }

    /** The t_n-series on x = 0 (double precision). */
    public FrobeniusSeries<Complex> timeSeries() {
        return series;
    }

    /** |t_n| up to which the series is used; beyond it the core engine carries the state along the ray. */
    public double handover() {
        return handover;
    }

    /** The member-n constants at t_n = tn (tn != 0; the lower times are zero). */
    public MemberParameters parameters(Complex tn) {
        Complex[] times = new Complex[member.order() - 1];
        Arrays.fill(times, Complex.ZERO);
        times[times.length - 1] = tn;
        return MemberParameters.builder(member.order()).times(times).s(s).m(m).build();
    }

    /**
     * The member-n solution at t_n = tn != 0, started at x = 0 with the state carried there from t_n = 0 (its
     * error estimate is carried by the x-flow).
     *
     * @throws InvalidInputException for tn = 0 (member n degenerates; use {@link #memberOne()} or
     *     {@link #evaluate(Complex, Complex)})
     */
    public MemberSolution atTime(Complex tn) {
        requireNonZero(tn);
        return started(parameters(tn));
    }

    /**
     * As {@link #atTime(Complex)} at an exact t_n; if the data were given exactly, the solution can also be computed
     * to many digits (its state on x = 0 is then carried in arbitrary precision too, {@link OriginPreciseStart}).
     */
    public MemberSolution atTime(ExactNumber tn) {
        requireNonZero(tn.toComplex());
        ExactNumber[] times = new ExactNumber[member.order() - 1];
        Arrays.fill(times, ExactNumber.ofInteger(0));
        times[times.length - 1] = tn;
        MemberParameters.Builder b = MemberParameters.builder(member.order()).times(times).s(s);
        return started(exactM != null ? b.m(exactM).build() : b.m(m).build());
    }

    private void requireNonZero(Complex tn) {
        requireFinite("t_" + member.order(), tn);
        if (tn.norm() == 0) {
            throw new InvalidInputException("t_" + member.order(), "member " + member.order() + " degenerates at t_"
                    + member.order() + " = 0; there the solution is member 1's: use memberOne() or evaluate(x, 0)");
        }
    }

    /** Member n at the parameters' t_n, started on x = 0; to many digits too if the origin data are given exactly. */
    private MemberSolution started(MemberParameters p) {
        Complex tn = p.time(member.order());
        List<Complex> state = new ArrayList<>();
        double[] err = stateOnTheAxis(tn, state);
        ExactStart precise = null;
        if (exactOrigin != null) {
            List<ExactNumber> timesAndM = p.exactTimesAndM();
            precise = ExactStart.carried(ExactNumber.ofInteger(0), new OriginPreciseStart(this, exactOrigin,
                    timesAndM.get(timesAndM.size() - 1), timesAndM.get(timesAndM.size() - 2)));
        }
        return MemberSolution.started(member, p, settings, Complex.ZERO, state, err, precise);
    }

    /** The state on x = 0 at t_n = tn != 0 into {@code state}; returns its error estimates. */
    double[] stateOnTheAxis(Complex tn, List<Complex> state) {
        int d = member.dimension();
        double[] err = new double[d];
        if (tn.norm() <= handover) {
            Complex[] v = series.value(tn);
            state.addAll(Arrays.asList(v));
            double e = series.truncation(tn.norm()) + series.rounding(tn.norm());
            Arrays.fill(err, e);
            return err;
        }
        StateEstimate e = ray(tn).evaluate(tn.getReal(), tn.getImaginary());
        for (int i = 0; i < d; i++) {
            state.add(new Complex(e.re(i), e.im(i)));
            err[i] = e.error(i);
        }
        return err;
    }

    /**
     * q on x = 0 at t_n = tn != 0 with its error: within the series' disk from the series of q itself
     * (q = a(n-2)12 / (n t_n) = sum_j c_(j+1) t_n^j / n, which keeps its relative accuracy as t_n -> 0), beyond
     * it from the state carried along the ray.
     */
    public PotentialValue axisPotential(Complex tn) {
        requireFinite("t_" + member.order(), tn);
        if (tn.norm() == 0) {
            throw new InvalidInputException("t_" + member.order(), "q on x = 0 at t_n = 0 is member 1's value at"
                    + " x = 0: use memberOne().valueAtOrigin()");
        }
        int n = member.order();
        int k = MemberEquations.index(n - 2, 1);
        if (tn.norm() <= handover) {
            Complex s = Complex.ZERO;
            double size = 0;
            double rho = tn.norm();
            for (int j = series.order(); j >= 1; j--) {
                s = s.multiply(tn).add(series.coefficient(j, k));
                size = size * rho + series.coefficient(j, k).norm();
            }
            Complex q = s.divide(n);
            double truncation = series.truncation(rho) / Math.max(rho, 1e-300);
            return new PotentialValue(Complex.ZERO, q, (truncation + 8 * Math.ulp(1.0) * size) / n);
        }
        List<Complex> state = new ArrayList<>();
        double[] err = stateOnTheAxis(tn, state);
        Complex q = state.get(k).divide(tn.multiply(n));
        return new PotentialValue(Complex.ZERO, q, err[k] / (n * tn.norm()) + 4 * Math.ulp(1.0) * q.norm());
    }

    /** The double-precision ray of the t_n-flow through tn (|tn| &gt; the handover), grown on demand. */
    Solution ray(Complex tn) {
        Complex direction = direction(tn);
        return rays.computeIfAbsent(List.of(direction.getReal() + 0.0, direction.getImaginary() + 0.0),
                k -> startRay(direction));
    }

    /** Where the ray through tn starts: at the handover radius in the direction of tn. */
    Complex rayStart(Complex tn) {
        return direction(tn).multiply(handover);
    }

    private static Complex direction(Complex tn) {
        return tn.divide(tn.norm());
    }

    private Solution startRay(Complex direction) {
        Complex t0 = direction.multiply(handover);
        Complex[] v = series.value(t0);
        int d = v.length;
        double[] re = new double[d];
        double[] im = new double[d];
        double[] e0 = new double[d];
        for (int i = 0; i < d; i++) {
            re[i] = v[i].getReal();
            im[i] = v[i].getImaginary();
            e0[i] = handoverError;
        }
        return Solution.start(member.timeFlow(parameters(t0), Complex.ZERO), settings, StateProjection.NONE,
                t0.getReal(), t0.getImaginary(), re, im, e0, new double[d]);
    }

    /** The member-1 solution analytic at x = 0 with the same a_-2(0), s and m: the slice t_n = 0. */
    public MemberSolution memberOne() {
        MemberSolution one = memberOne;
        if (one == null) {
            synchronized (this) {
                if (memberOne == null) {
                    MemberParameters.Builder p = MemberParameters.builder(1).s(s);
                    MemberSolutionBuilder b = MemberSolution.builder(exactM != null ? p.m(exactM).build()
                            : p.m(m).build()).settings(settings);
                    memberOne = (exactOrigin != null ? b.startAtOrigin(exactOrigin.get(0), exactOrigin.get(1),
                            exactOrigin.get(2)) : b.startAtOrigin(origin[0], origin[1], origin[2])).build();
                }
                one = memberOne;
            }
        }
        return one;
    }

    /**
     * The value at (x, t_n): for t_n != 0 member n's (a new x-flow per call: keep {@link #atTime} for many
     * points of one t_n); for t_n = 0 member 1's (its unknowns; q, r, dq/dx, dr/dx are the same functions), at
     * x = 0 from the series of member 1 there.
     */
    public MemberValue evaluate(Complex x, Complex tn) {
        requireFinite("x", x);
        requireFinite("t_" + member.order(), tn);
        if (tn.norm() != 0) {
            return atTime(tn).evaluate(x);
        }
        if (x.norm() == 0) {
            return memberOne().valueAtOrigin();
        }
        return memberOne().evaluate(x);
    }
}
