package org.tertius.hierarchy;

import java.util.Arrays;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.step.SolverSettings;

/** Builder of a member solution. Not thread-safe. */
public final class MemberSolutionBuilder {
    private final MemberParameters parameters;
    private final HierarchyMember member;
    private SolverSettings settings = SolverSettings.defaults();
    private Complex x0;
    private int x0Sheet;
    private List<Complex> state;
    private Complex[] origin;
    private ExactStart exact;
    private double[] startErrors;

    MemberSolutionBuilder(MemberParameters parameters) {
        if (parameters == null) {
            throw new InvalidInputException("parameters", "are required");
        }
        this.parameters = parameters;
        this.member = HierarchyMember.of(parameters.order());
    }

    public MemberSolutionBuilder settings(SolverSettings settings) {
        this.settings = settings;
        return this;
    }

    /**
     * Start at x0 with all unknowns given (order of {@link HierarchyMember#unknowns()}); they must satisfy
     * det a_-2 = s^2 and the top-coefficient constraints (see {@link HierarchyMember#completeDiagonal}).
     * For member 1, x0 != 0 lies on the principal sheet.
     */
    public MemberSolutionBuilder start(Complex x0, List<Complex> state) {
        return start(x0, 0, state);
    }

    /** As {@link #start(Complex, List)} with x0 on the given sheet of log x (member 1; 0 for n &gt;= 2). */
    public MemberSolutionBuilder start(Complex x0, int sheet, List<Complex> state) {
        this.x0 = x0;
        this.x0Sheet = sheet;
        this.state = state;
        this.origin = null;
        this.exact = null;
        return this;
    }

    /**
     * Error bounds of the start state given to {@link #start(Complex, int, List)} (one per unknown, finite, &gt;= 0),
     * e.g. of a state found by the inverse monodromy map: the flow carries them into the error estimates of every
     * value. A start with error bounds is not exact, so it has no high-precision form.
     */
    public MemberSolutionBuilder startErrors(double[] errors) {
        if (errors != null) {
            for (double e : errors) {
                if (!(e >= 0) || Double.isInfinite(e)) {
                    throw new InvalidInputException("start errors", "must be finite and >= 0, got " + e);
                }
            }
        }
        this.startErrors = errors == null ? null : errors.clone();
        return this;
    }

    /**
     * As {@link #start(Complex, List)} with the data given exactly (decimals, rationals), so that the solution
     * can also be computed to many digits ({@link MemberSolution#highPrecisionForm()}).
     */
    public MemberSolutionBuilder start(ExactNumber x0, List<ExactNumber> state) {
        if (x0 == null || state == null) {
            throw new InvalidInputException(x0 == null ? "x0" : "start state", "is required");
        }
        start(x0.toComplex(), 0, ExactStart.toComplex(state));
        this.exact = ExactStart.atPoint(x0, state);
        return this;
    }

    /**
     * The solution analytic at x = 0 with a_-2(0) = [[a11, a12], [a21, -a11]] (det = s^2); needs 2m not a
     * non-zero integer. Member 1: there a_-1(0) = diag(m, -m), and the trace form equals 2 m a11. Members
     * n &gt;= 2 (with t_2 .. t_{n-1} = 0): the solution analytic at x = t_n = 0 whose slice t_n = 0 is that
     * member-1 solution, carried on x = 0 to the parameters' t_n (see {@link OriginSolution}).
     */
    public MemberSolutionBuilder startAtOrigin(Complex a11, Complex a12, Complex a21) {
        this.origin = new Complex[] {a11, a12, a21};
        this.x0 = null;
        this.state = null;
        this.exact = null;
        return this;
    }

    /** As {@link #startAtOrigin(Complex, Complex, Complex)} with a_{-2}(0) given exactly. */
    public MemberSolutionBuilder startAtOrigin(ExactNumber a11, ExactNumber a12, ExactNumber a21) {
        if (a11 == null || a12 == null || a21 == null) {
            throw new InvalidInputException("origin", "a11, a12 and a21 are required");
        }
        startAtOrigin(a11.toComplex(), a12.toComplex(), a21.toComplex());
        this.exact = ExactStart.atOrigin(List.of(a11, a12, a21));
        return this;
    }

    public MemberSolution build() {
        if (settings == null) {
            throw new InvalidInputException("settings", "are required");
        }
        int n = member.order();
        if (origin != null) {
            return n == 1 ? fromOrigin() : OriginSolution.startFor(parameters, exact != null ? exact.origin()
                    : ExactStart.ofDoubles("origin", Arrays.asList(origin)), settings);
        }
        if (x0 == null) {
            throw new InvalidInputException("x0", "start data are missing: give x0 and the start state");
        }
        if (!Double.isFinite(x0.getReal()) || !Double.isFinite(x0.getImaginary())) {
            throw new InvalidInputException("x0", "must be a finite complex number, got " + x0);
        }
        if (n == 1 && x0.norm() == 0) {
            throw new InvalidInputException("x0", "x = 0 is the fixed singular point of member 1; use startAtOrigin");
        }
        if (n >= 2 && x0Sheet != 0) {
            throw new InvalidInputException("sheet", "member " + n + " is single-valued in x; the sheet must be 0");
        }
        member.checkState(state);
        ExactStart e = exact != null ? exact : ExactStart.atPoint(ExactNumber.ofDouble("x0", x0),
                ExactStart.ofDoubles("start state", state));
        if (startErrors != null && startErrors.length != state.size()) {
            throw new InvalidInputException("start errors", "member " + n + " has " + state.size() + " unknowns, got "
                    + startErrors.length + " error bounds");
        }
        boolean withErrors = startErrors != null && Arrays.stream(startErrors).anyMatch(v -> v > 0);
        return new MemberSolution(member, parameters, settings, x0, x0Sheet, state, withErrors ? startErrors
                : new double[state.size()], x0Sheet == 0 && !withErrors ? e : null, null);
    }

    private MemberSolution fromOrigin() {
        Complex m = parameters.m();
        double twoM = 2 * m.getReal();
        if (m.getImaginary() == 0 && Math.rint(twoM) != 0 && Math.abs(twoM - Math.rint(twoM)) < 1e-9) {
            throw new InvalidInputException("m", "the start at x = 0 needs 2m not a non-zero integer (there the"
                    + " analytic solution is resonant); got m = " + m);
        }
        Complex[] y0 = {origin[0], origin[1], origin[2], m, Complex.ZERO, Complex.ZERO};
        member.checkState(Arrays.asList(y0));
        PolynomialSystem flow = member.xFlow(parameters);
        FrobeniusSeries<Complex> series = FrobeniusSeries.compute(ComplexArithmetic.INSTANCE,
                OriginTimeSeries.fromSystem(flow), y0, MemberSolution.SERIES_ORDER, "start state at x = 0");
        double scale = 1;
        for (Complex c : y0) {
            scale = Math.max(scale, c.norm());
        }
        double x = Math.min(0.25 * series.radius(), 0.5);
        while (series.lastTerm(x) > 1e-18 * scale) {
            x *= 0.5;
        }
        Complex xs = new Complex(x);
        double[] err = new double[y0.length];
        Arrays.fill(err, 16 * series.lastTerm(x));
        ExactStart e = exact != null ? exact : ExactStart.atOrigin(ExactStart.ofDoubles("origin",
                Arrays.asList(origin)));
        return new MemberSolution(member, parameters, settings, xs, 0, Arrays.asList(series.value(xs)), err, e,
                series);
    }
}
