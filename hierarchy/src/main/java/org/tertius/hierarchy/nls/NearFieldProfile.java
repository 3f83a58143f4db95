package org.tertius.hierarchy.nls;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.InvariantCheck;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.Member1Map;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.MemberValue;
import org.tertius.hierarchy.NlsCheck;
import org.tertius.hierarchy.NlsTimeSeries;
import org.tertius.hierarchy.OriginSolution;
import org.tertius.hierarchy.PlaneGrid;
import org.tertius.hierarchy.PotentialValue;
import org.tertius.hierarchy.RealRow;

/**
 * The near-field profile Psi(X, T) of focusing NLS, i Psi_T + Psi_XX / 2 + |Psi|^2 Psi = 0 (family "nearfield"):
 * the member-2 solution ({@link OriginSolution}) analytic at X = T = 0 with s = 2, m = 0 and
 * a_-2(0) = (0, 2i, 2i), so Psi(0, 0) = -2i a12 = 4, X = x, T = t_2, Psi = q; at T = 0 it is member 1
 * (Painleve III). What singles it out among the solutions analytic at the origin with s = 2, m = 0 (hierarchy/
 * README.md): the reality reduction r = -conj(q) (a_-2(0) anti-Hermitian: a11 imaginary, a12 = -conj a21),
 * evenness in X (a11 = 0; then the trace integral tr(a_-2 a_-1) = 2 m a11 = 0), and Psi(0, 0) = 4 &gt; 0.
 *
 * <p>Relatives: phase and scale, {@code Psi_{s,phi}(X, T) = e^(i phi) (s/2) Psi((s/2) X, (s/2)^2 T)}, the
 * solution with a_-2(0) = (0, i s e^(i phi), i s e^(-i phi)); Psi_{s,phi}(0, 0) = 2 s e^(i phi).
 *
 * <p>Routes for real (X, T): T = 0 member 1; X = 0 the t_2-series and t_2-flow; 0 &lt; |T| &lt;= 0.05 first the
 * small-time series from member 1 ({@link NlsTimeSeries}), kept when its error estimate is below 1e-10 (1 + |Psi|)
 * (the x-flow needs about X^2 / (20 |T|) Taylor steps there); otherwise the x-flow from X = 0 along the real axis
 * ({@link RealRow}, kept for the last 32 times asked).
 * Complex points use the core engine's path tree. Thread-safe.
 */
public final class NearFieldProfile {
    /** The short name of the family. */
    public static final String NAME = "nearfield";
    /** |T| up to which the small-time series is tried first (its cost does not grow as T -> 0; the line's does). */
    private static final double SMALL_TIME = 0.05;
    /** The small-time series is accepted when its error estimate is below this times 1 + |Psi|. */
    private static final double SERIES_ACCEPT = 1e-10;
    private static final int CACHED_ROWS = 32;

    private final double s;
    private final double phase;
    private final OriginSolution solution;
    private final NlsTimeSeries smallTime;
    private final Map<List<Double>, RealRow> rows = new LinkedHashMap<>(16, 0.75f, true) {
        @Override
        protected boolean removeEldestEntry(Map.Entry<List<Double>, RealRow> eldest) {
            return size() > CACHED_ROWS;
        }
    };

    private NearFieldProfile(double s, ExactNumber exactScale, double phase, SolverSettings settings) {
        this.s = s;
        this.phase = phase;
        if (exactScale != null && phase == 0) {
            // a_-2(0) = (0, i s, i s) exactly: the profile can be computed to many digits
            ExactNumber is = exactScale.multiply(ExactNumber.parse("s", "i"));
            ExactNumber zero = ExactNumber.ofInteger(0);
            this.solution = OriginSolution.create(2, new Complex(s), zero, zero, is, is, settings);
        } else {
            Complex rotation = new Complex(Math.cos(phase), Math.sin(phase));
            Complex a12 = new Complex(0, s).multiply(rotation);
            Complex a21 = new Complex(0, s).multiply(rotation.conjugate());
            this.solution = OriginSolution.create(2, new Complex(s), Complex.ZERO, Complex.ZERO, a12, a21, settings);
        }
        this.smallTime = new NlsTimeSeries(solution.memberOne().parameters());
    }

    /** The profile itself: s = 2, phase 0, default solver settings. */
    public static NearFieldProfile standard() {
        return of(ExactNumber.ofInteger(2), 0, SolverSettings.defaults());
    }

    /**
     * A relative: e^(i phase) (s/2) Psi((s/2) X, (s/2)^2 T).
     *
     * @param s the scale, 0 &lt; s &lt;= 1e3
     * @param phase the phase, finite
     */
    public static NearFieldProfile of(double s, double phase, SolverSettings settings) {
        return of(s, null, phase, settings);
    }

    /**
     * As {@link #of(double, double, SolverSettings)} with the scale given exactly (a real decimal or rational): at
     * phase 0 the origin data (0, i s, i s) are then exact and the profile can be computed to many digits.
     */
    public static NearFieldProfile of(ExactNumber s, double phase, SolverSettings settings) {
        if (s == null || s.toComplex().getImaginary() != 0) {
            throw new InvalidInputException("s", "the scale of the profile must be a real number, got " + s);
        }
        return of(s.toComplex().getReal(), s, phase, settings);
    }

    private static NearFieldProfile of(double s, ExactNumber exactScale, double phase, SolverSettings settings) {
        if (!(s > 0 && s <= 1e3)) {
            throw new InvalidInputException("s", "the scale of the profile must lie in (0, 1000], got " + s);
        }
        if (!Double.isFinite(phase)) {
            throw new InvalidInputException("phase", "must be a finite real number, got " + phase);
        }
        if (settings == null) {
            throw new InvalidInputException("settings", "are required");
        }
        return new NearFieldProfile(s, exactScale, phase, settings);
    }

    public double s() {
        return s;
    }

    public double phase() {
        return phase;
    }

    /** Psi(0, 0) = 2 s e^(i phase), from the origin data. */
    public Complex valueAtOrigin() {
        return new Complex(2 * s * Math.cos(phase), 2 * s * Math.sin(phase));
    }

    /** The member-2 solution behind it. */
    public OriginSolution solution() {
        return solution;
    }

    /** Psi at real (X, T) with its estimated error. */
    public ProfileValue value(double x, double t) {
        requireFinite("X", x);
        requireFinite("T", t);
        Complex cx = new Complex(x);
        Complex ct = new Complex(t);
        if (t == 0) {
            MemberSolution one = solution.memberOne();
            MemberValue v = x == 0 ? one.valueAtOrigin() : one.evaluate(cx);
            return new ProfileValue(cx, ct, v.q(), v.errorQ(), "member 1");
        }
        if (x == 0) {
            PotentialValue v = solution.axisPotential(ct);
            return new ProfileValue(cx, ct, v.q(), v.error(), Math.abs(t) <= solution.handover() ? "t-series"
                    : "t-flow");
        }
        if (Math.abs(t) <= SMALL_TIME) {
            MemberValue m1 = solution.memberOne().evaluate(cx);
            double[] e = new double[m1.state().size()];
            for (int i = 0; i < e.length; i++) {
                e[i] = m1.error(i);
            }
            PotentialValue v = smallTime.at(cx, m1.state(), e, ct, 0.5 * Math.abs(x));
            if (v.error() <= SERIES_ACCEPT * (1 + v.q().norm())) {
                return new ProfileValue(cx, ct, v.q(), v.error(), "small-time series");
            }
        }
        PotentialValue v = row(t, x).potential(x);
        return new ProfileValue(cx, ct, v.q(), v.error(), "line");
    }

    /** dPsi/dX at real (X, T != 0) from the x-flow along the real axis. */
    public Complex derivative(double x, double t) {
        requireFinite("X", x);
        requireFinite("T", t);
        if (t == 0) {
            return x == 0 ? solution.memberOne().valueAtOrigin().dq() : solution.memberOne().evaluate(
                    new Complex(x)).dq();
        }
        return row(t, x).derivative(x);
    }

    /**
     * The first integrals of the member solution at real (X, T) as values with the bounds implied by the errors
     * (det a_-2 = s^2 = 4, the trace integral 0, the top coefficients of det A): member 1's at T = 0, else from
     * the x-flow along the real axis with every unknown kept (about X^2 / (20 |T|) steps: for tiny |T| it may
     * refuse with an UnreachableTargetException).
     */
    public List<InvariantCheck> integrals(double x, double t) {
        requireFinite("X", x);
        requireFinite("T", t);
        if (t == 0) {
            MemberSolution one = solution.memberOne();
            return (x == 0 ? one.valueAtOrigin() : one.evaluate(new Complex(x))).integrals();
        }
        RealRow row = RealRow.withAllUnknowns(solution, new Complex(t), Math.max(0, -x), Math.max(0, x), 1e-14, null);
        return row.value(x).integrals();
    }

    /** Psi at complex (X, T) by the core engine's path tree (slower; for T real prefer {@link #value(double, double)}). */
    public ProfileValue value(Complex x, Complex t) {
        if (x == null || t == null) {
            throw new InvalidInputException("X", "X and T are required");
        }
        if (x.getImaginary() == 0 && t.getImaginary() == 0) {
            return value(x.getReal(), t.getReal());
        }
        if (t.norm() == 0) {
            PotentialValue v = solution.memberOne().potential(x);
            return new ProfileValue(x, t, v.q(), v.error(), "path tree");
        }
        PotentialValue v = solution.atTime(t).potential(x);
        return new ProfileValue(x, t, v.q(), v.error(), "path tree");
    }

    private RealRow row(double t, double x) {
        List<Double> key = List.of(t + 0.0, x < 0 ? -1.0 : 1.0);
        synchronized (rows) {
            RealRow r = rows.get(key);
            if (r != null) {
                try {
                    r.potential(x);
                    return r;
                } catch (InvalidInputException outside) {
                    // beyond the cached row: extend it below
                }
            }
            double reach = Math.max(Math.abs(x), 10);
            r = RealRow.of(solution, new Complex(t), x < 0 ? reach : 0, x < 0 ? 0 : reach, 1e-14, null);
            rows.put(key, r);
            return r;
        }
    }

    /** The grid over real X and T (see {@link PlaneGrid}; both symmetries of the profile apply). */
    public PlaneGrid grid(double[] x, double[] t) {
        return PlaneGrid.of(solution, x, t);
    }

    /** The Painleve III equation of the slice T = 0 under the canonical map: (alpha, beta, gamma, delta) = (2, 0, 1, -1). */
    public Painleve3 painleve3Equation() {
        return Member1Map.canonical(new Complex(s)).equation(Complex.ZERO, solution.memberOne().traceIntegral());
    }

    /** w(z) and w'(z) at z = 4 sqrt(s X), the image of the slice T = 0 at X &gt; 0 under the canonical map. */
    public Painleve3Value painleve3(double x) {
        if (!(x > 0) || !Double.isFinite(x)) {
            throw new InvalidInputException("X", "the map to Painleve III takes X > 0 (z = 4 sqrt(s X)), got " + x);
        }
        Member1Map map = Member1Map.canonical(new Complex(s));
        return map.toPainleve3(solution.memberOne().evaluate(SurfacePoint.of(new Complex(x), 0)));
    }

    /** The NLS residual of the computed Psi at real (X, T) by central differences with steps h (in X and T). */
    public NlsCheck.Residual residual(double x, double t, double h) {
        return NlsCheck.residual((a, b) -> value(a, b).psi(), x, t, h, h);
    }

    private static void requireFinite(String name, double v) {
        if (!Double.isFinite(v)) {
            throw new InvalidInputException(name, "must be a finite real number, got " + v);
        }
    }
}
