package org.tertius.connection.infinity;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;

/**
 * The behaviour of a D6 solution (or D7 with gamma = 0) at infinity along one ray (angle, sheet), in the terms of
 * {@link TransseriesAtInfinity}: w = c e^u, u ~ x^(-1/2) (p E + q/E) + ..., E = e^(mu x) x^kappa (for D7: w = c
 * x^(1/3) e^u, u ~ s^(-1/2) (p E + q/E), E = e^(mu s) s^kappa, s = x^(2/3)). Kinds:
 * <ul>
 *   <li>{@link Kind#OSCILLATING}: the ray is one where mu x is imaginary; both amplitudes p, q; equivalently
 *       {@code p E + q/E = A cos(theta(x))}, {@code theta = -i (mu x + kappa log x) + phi}, A = 2 sqrt(p q),
 *       phi = log(p/q)/(2i), with the logarithmic phase drift {@code -i mu p q} (the coefficient of log x in theta
 *       beyond the linear part -i (alpha c - beta/c)/(2 mu));</li>
 *   <li>{@link Kind#EXPONENTIALLY_SMALL}: Re(mu x) != 0 on the ray: the one-parameter family exponentially close to
 *       c, amplitude q (Re(mu x) &gt; 0) or p (Re(mu x) &lt; 0) of the decaying exponential, the other zero;</li>
 *   <li>{@link Kind#UNDECIDED}: no background is approached, or the fits disagree (reason in the note).</li>
 * </ul>
 * Instances from {@link #of} are exact data for building solutions. Immutable.
 */
public final class InfinityBehaviour {
    /** The kinds of behaviour along a ray. */
    public enum Kind { OSCILLATING, EXPONENTIALLY_SMALL, UNDECIDED }

    /** Orders of the transseries used for start data and fits. */
    public static final int ORDERS = 36;

    private final Kind kind;
    private final double angle;
    private final int sheet;
    private final Complex background;
    private final Complex p;
    private final Complex q;
    private final double errP;
    private final double errQ;
    private final String note;

    private InfinityBehaviour(Kind kind, double angle, int sheet, Complex background, Complex p, Complex q,
                              double errP, double errQ, String note) {
        this.kind = kind;
        this.angle = angle;
        this.sheet = sheet;
        this.background = background;
        this.p = p;
        this.q = q;
        this.errP = errP;
        this.errQ = errQ;
        this.note = note;
    }

    /**
     * Exact data: background c, amplitudes p (of E) and q (of 1/E) along the ray (angle, sheet). The kind follows
     * from the ray: oscillating if mu e^(i angle) is imaginary to 1e-9 relative, else exponentially small, which
     * requires the amplitude of the growing exponential to be zero.
     *
     * @throws InvalidInputException for an equation that is not D6, c not a background, a non-zero amplitude of
     *     the exponential that grows along the ray, or, on an oscillating ray, |Re kappa| &gt;= 1/2 (the terms of the
     *     transseries do not decay)
     */
    public static InfinityBehaviour of(Painleve3 eq, Complex c, Complex p, Complex q, double angle, int sheet) {
        InvalidInputException.requireFinite("angle", angle);
        TransseriesAtInfinity t = TransseriesAtInfinity.create(eq, c, p, q, 2);
        double direction = t.direction(angle + 2 * Math.PI * sheet);
        Kind kind;
        if (Math.abs(Math.cos(direction)) <= 1e-9) {
            kind = Kind.OSCILLATING;
            // |E^k x^(-n/2)| = r^(k Re kappa - n/2) on the ray (|k| <= n): the terms decay only for |Re kappa| < 1/2
            double growth = Math.abs(t.kappa().getReal());
            if (!(growth < 0.5)) {
                throw new InvalidInputException("p, q", "the oscillation about c = " + ComplexText.brief(c)
                        + " with p = " + ComplexText.brief(p) + ", q = " + ComplexText.brief(q) + " does not decay"
                        + " along the ray arg z = " + angle + ": |Re kappa| = " + growth + " (kappa = "
                        + ComplexText.brief(t.kappa()) + "), and the transseries describes solutions only for |Re kappa| < 1/2"
                        + " (smaller amplitudes: p q closer to 0)");
            }
        } else {
            kind = Kind.EXPONENTIALLY_SMALL;
            boolean qDecays = Math.cos(direction) > 0;
            Complex growing = qDecays ? p : q;
            if (growing.norm() != 0) {
                throw new InvalidInputException(qDecays ? "p" : "q", "the exponential " + (qDecays ? "E" : "1/E")
                        + " grows along the ray arg z = " + angle + " (Re(mu z) " + (qDecays ? "> 0" : "< 0")
                        + ", mu = " + t.mu() + "); its amplitude must be 0 for a solution that approaches c = " + c
                        + " there; the rays where both amplitudes are free are " + oscillatingRays(eq, c));
            }
        }
        return new InfinityBehaviour(kind, angle, sheet, t.background(), p, q, 0, 0, "");
    }

    /** Measured data (errors of p and q). */
    public static InfinityBehaviour measured(Kind kind, double angle, int sheet, Complex c, Complex p, Complex q,
                                             double errP, double errQ, String note) {
        return new InfinityBehaviour(kind, angle, sheet, c, p, q, errP, errQ, note);
    }

    /** Nothing decided. */
    public static InfinityBehaviour undecided(double angle, int sheet, String reason) {
        return new InfinityBehaviour(Kind.UNDECIDED, angle, sheet, Complex.NaN, Complex.NaN, Complex.NaN, Double.NaN,
                Double.NaN, reason);
    }

    /**
     * The rays of the principal sheet (angles in (-pi, pi]) along which mu x (D6) or mu x^(2/3) (D7) is imaginary for
     * the background c: two for D6, one or two for D7.
     */
    public static List<Double> oscillatingRays(Painleve3 eq, Complex c) {
        TransseriesAtInfinity t = TransseriesAtInfinity.create(eq, c, Complex.ZERO, Complex.ZERO, 2);
        double argMu = t.mu().getArgument();
        double f = t.phaseFactor();
        List<Double> r = new ArrayList<>();
        for (int j = -3; j <= 3; j++) {
            double a = (Math.PI / 2 + j * Math.PI - argMu) / f;
            if (a > -Math.PI && a <= Math.PI) {
                r.add(a);
            }
        }
        return r;
    }

    public Kind kind() {
        return kind;
    }

    public double angle() {
        return angle;
    }

    public int sheet() {
        return sheet;
    }

    public Complex background() {
        return background;
    }

    /** Amplitude of E = e^(mu x) x^kappa. */
    public Complex p() {
        return p;
    }

    /** Amplitude of 1/E. */
    public Complex q() {
        return q;
    }

    public double errP() {
        return errP;
    }

    public double errQ() {
        return errQ;
    }

    public String note() {
        return note;
    }

    /** The amplitude A = 2 sqrt(p q) of the oscillation and its error (first order). */
    public double amplitudeError() {
        double rel = (errP / Math.max(p.norm(), Double.MIN_NORMAL) + errQ / Math.max(q.norm(), Double.MIN_NORMAL)) / 2;
        return amplitude().norm() * rel;
    }

    /** A = 2 sqrt(p q) (principal root). */
    public Complex amplitude() {
        return p.multiply(q).sqrt().multiply(2);
    }

    /** phi = log(p/q)/(2i) (principal log), so that p E + q/E = A cos(-i (mu x + kappa log x) + phi). */
    public Complex phase() {
        return p.divide(q).log().divide(new Complex(0, 2));
    }

    /** Error of {@link #phase()} (first order). */
    public double phaseError() {
        return (errP / Math.max(p.norm(), Double.MIN_NORMAL) + errQ / Math.max(q.norm(), Double.MIN_NORMAL)) / 2;
    }

    /**
     * The logarithmic phase drift: -i times the part of kappa due to the amplitudes, {@code -i (kappa(p, q) - kappa(0,
     * 0))}; for D6 it is -i mu p q.
     */
    public Complex drift(Painleve3 eq) {
        return driftOf(eq, p, q);
    }

    private Complex driftOf(Painleve3 eq, Complex a, Complex b) {
        Complex k = TransseriesAtInfinity.create(eq, background, a, b, 4).kappa();
        Complex k0 = TransseriesAtInfinity.create(eq, background, Complex.ZERO, Complex.ZERO, 4).kappa();
        return k.subtract(k0).multiply(new Complex(0, -1));
    }

    /** Error of {@link #drift} (first order, slopes by differences). */
    public double driftError(Painleve3 eq) {
        Complex d = drift(eq);
        double hp = 1e-7 * (1 + p.norm());
        double hq = 1e-7 * (1 + q.norm());
        double sp = driftOf(eq, p.add(hp), q).subtract(d).norm() / hp;
        double sq = driftOf(eq, p, q.add(hq)).subtract(d).norm() / hq;
        return sp * errP + sq * errQ;
    }

    /** The transseries of these data. */
    public TransseriesAtInfinity transseries(Painleve3 eq, int orders) {
        if (kind == Kind.UNDECIDED) {
            throw new InvalidInputException("behaviour", "the behaviour at infinity is undecided (" + note + ")");
        }
        return TransseriesAtInfinity.create(eq, background, p, q, orders);
    }

    /** Start data: the transseries at |z| = radius on the ray (the value's z is the point). */
    public LocalValue<Complex> startData(Painleve3 eq, double radius) {
        if (!(radius > 0) || !Double.isFinite(radius)) {
            throw new InvalidInputException("radius", "must be a positive finite number, got " + radius);
        }
        return transseries(eq, ORDERS).at(new Complex(Math.log(radius), angle + 2 * Math.PI * sheet));
    }

    /**
     * The solution with these data, started from the transseries at |z| = radius on the ray; only rays of the
     * principal sheet (angle in (-pi, pi], sheet 0) are accepted so that the sheets of the result are numbered
     * from there.
     *
     * @throws InvalidInputException for another sheet, or start data whose estimated error exceeds {@code tolerance}
     *     relative to 1 + |value| (then start further out)
     */
    public Painleve3Solution solution(Painleve3 eq, double radius, double tolerance, SolverSettings settings) {
        if (sheet != 0 || !(angle > -Math.PI && angle <= Math.PI)) {
            throw new InvalidInputException("angle", "start data at infinity are taken on the principal sheet (angle in"
                    + " (-pi, pi], sheet 0), got angle " + angle + " on sheet " + sheet);
        }
        LocalValue<Complex> v = startData(eq, radius);
        double rel = Math.max(v.errW() / (1 + v.w().norm()), v.errDw() / (1 + v.dw().norm()));
        if (!(rel <= tolerance)) {
            throw new InvalidInputException("radius", "the transseries at |z| = " + radius + " has estimated error " + rel
                    + " (relative), above the tolerance " + tolerance + "; start further out");
        }
        return Painleve3Solution.builder(eq).start(v.z(), v.w(), v.dw()).startErrors(v.errW(), v.errDw())
                .startComputedBy("the transseries at infinity").settings(settings).build();
    }

    /**
     * The start radius on [3, 80] at which the transseries fixes the amplitudes best: the estimated error of u =
     * log(w/c) plus double rounding of w, relative to the part of u that the amplitudes carry (u minus the
     * background series). Near 0 the series is inaccurate, far out an exponentially small deviation drowns in
     * rounding.
     *
     * @return {radius, the relative resolution of the amplitudes there}
     */
    public double[] bestStartRadius(Painleve3 eq) {
        TransseriesAtInfinity t = transseries(eq, ORDERS);
        TransseriesAtInfinity bg = TransseriesAtInfinity.create(eq, background, Complex.ZERO, Complex.ZERO, ORDERS);
        double best = Double.POSITIVE_INFINITY;
        double radius = 3;
        for (int i = 0; i <= 60; i++) {
            double r = 3 * Math.pow(80 / 3.0, i / 60.0);
            Complex tau = new Complex(Math.log(r), angle + 2 * Math.PI * sheet);
            LocalValue<Complex> u = t.logAt(tau);
            LocalValue<Complex> u0 = bg.logAt(tau);
            // without amplitudes the background alone is fixed: its absolute accuracy counts
            double carried = p.norm() == 0 && q.norm() == 0 ? 1 : u.w().subtract(u0.w()).norm();
            double res = (u.errW() + u0.errW() + 0x1p-52 * (1 + u.w().norm())) / carried;
            if (res < best) {
                best = res;
                radius = r;
            }
        }
        return new double[] {radius, best};
    }

    /**
     * The solution with these data, started at {@link #bestStartRadius} (principal sheet only, as
     * {@link #solution(Painleve3, double, double, SolverSettings)}).
     */
    public Painleve3Solution solution(Painleve3 eq, SolverSettings settings) {
        return solution(eq, bestStartRadius(eq)[0], 1e-8, settings);
    }

    @Override
    public String toString() {
        return kind + " about c = " + background + " on arg z = " + angle + (sheet == 0 ? "" : " (sheet " + sheet + ")")
                + ": p = " + p + " +- " + errP + ", q = " + q + " +- " + errQ + (note.isEmpty() ? "" : " (" + note + ")");
    }
}
