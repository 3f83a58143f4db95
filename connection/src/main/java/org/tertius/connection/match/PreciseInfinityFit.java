package org.tertius.connection.match;

import java.util.List;
import java.util.function.DoubleConsumer;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.infinity.PreciseTransseries;
import org.tertius.connection.infinity.TransseriesAtInfinity;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Type;

/**
 * The amplitudes p, q of the transseries at infinity ({@link PreciseTransseries}) of a solution with exact start data,
 * in arbitrary precision, along a ray whose kind the double-precision fit ({@link InfinityBehaviourFit}) has decided
 * (derived here, common practice for the method): the solution is replayed to D digits
 * ({@link HighPrecisionSolution}) to two radii r1 &lt; r2 on the ray, and the equations "transseries at r1 = (w, w')"
 * (oscillating ray: both amplitudes; one decaying exponential: its amplitude from w alone) are solved by Newton's
 * method started from the double-precision amplitudes. Every iterate needs a new transseries (its coefficients depend
 * on p q); the Jacobian is that of the double-precision transseries, so each step gains about as many digits as the
 * Jacobian has (about 10) and the iteration stops when a step is below the accuracy asked for.
 *
 * <p><b>Radii.</b> On an oscillating ray the amplitudes change w by about |x|^(-1/2), so they are well fixed far out,
 * where the asymptotic series needs few orders for D digits (its terms fall like Gamma(n/2) / |mu x|^(n/2)) and the
 * build is cheap (its cost grows like the fourth power of the orders): r1 is the smallest of {@link #RADII} at or
 * beyond 40 where at most D/2 + 24 orders reach D + 3 digits, r2 = 1.25 r1. Where one exponential decays its
 * amplitude changes w by only e^(-Re(mu x)) |x|^(-1/2): r1 is the radius of {@link #RADII} where the truncation
 * and the replay's digits fix it best (relative), r2 the better of its neighbours.
 *
 * <p><b>Errors.</b> The replay's errors and the transseries' own estimates (truncation, rounding) at r1 are mapped
 * through the inverse Jacobian; added: the last Newton step, and the disagreement at r2 (the Newton step the final
 * amplitudes would take there) as far as it exceeds the errors mapped at r2. Thread-safe (no state).
 */
public final class PreciseInfinityFit {
    /** Most digits: beyond, the builds (and the replay to large radii) take minutes. */
    public static final int MAX_DIGITS = 60;
    /** Radii tried for the fit (|z|). */
    static final double[] RADII = {5, 6, 8, 10, 12, 15, 20, 25, 30, 40, 50, 60, 80, 100, 120, 150, 200, 250, 300, 400,
        500, 600, 800};
    private static final int MAX_BUILDS = 6;
    private static final double OSCILLATING_FROM = 40;

    private PreciseInfinityFit() {
    }

    /** A fit in arbitrary precision: p, q with absolute errors, where and how they were found. */
    public record Result(Apcomplex p, Apcomplex q, double errP, double errQ, ExactPoint fitPoint, ExactPoint checkPoint,
                         int orders, int builds, double replayDigits, double disagreement, double checkError) {
    }

    /**
     * p and q of {@code solution} (exact start data, exact equation) to about {@code digits} digits on the ray and
     * sheet of {@code estimate}.
     *
     * @param estimate the double-precision behaviour on that ray ({@link InfinityBehaviourFit}); must be decided
     * @throws InvalidInputException for an undecided estimate, digits outside [16, {@link #MAX_DIGITS}], start data
     *     or parameters not exact, a ray where no radius reaches the digits
     * @throws TertiusException if Newton's method does not converge
     */
    public static Result fit(Painleve3Solution solution, InfinityBehaviour estimate, int digits,
                             DoubleConsumer progress) {
        if (estimate.kind() == InfinityBehaviour.Kind.UNDECIDED) {
            throw new InvalidInputException("digits", "the behaviour at infinity is undecided in double precision ("
                    + estimate.note() + "), so there is nothing to refine");
        }
        if (digits < HighPrecisionSolution.MIN_DIGITS || digits > MAX_DIGITS) {
            throw new InvalidInputException("digits", "must be in [" + HighPrecisionSolution.MIN_DIGITS + ", "
                    + MAX_DIGITS + "] for the behaviour at infinity, got " + digits);
        }
        Painleve3 eq = solution.equation();
        ExactNumber[] parameters = eq.exactParameters();
        if (parameters == null) {
            throw new InvalidInputException("digits", "the equation's parameters must be exact (decimals or p/q)");
        }
        solution.highPrecisionForm().requireDigits(digits + 5);
        List<Complex> roots = TransseriesAtInfinity.backgrounds(eq);
        int background = roots.indexOf(estimate.background());
        if (background < 0) {
            throw new InvalidInputException("digits", "the background " + estimate.background() + " is not one of "
                    + roots);
        }
        boolean both = estimate.kind() == InfinityBehaviour.Kind.OSCILLATING;
        double phase = estimate.angle() + 2 * Math.PI * estimate.sheet();
        TransseriesAtInfinity probe = TransseriesAtInfinity.create(eq, estimate.background(), Complex.ZERO,
                Complex.ZERO, 4);
        // which exponential decays along the ray (as InfinityBehaviourFit decides it): -1 for 1/E (q), +1 for E (p)
        int free = both ? 0 : Math.cos(probe.direction(phase)) > 0 ? -1 : 1;
        double target = Math.pow(10, -digits);
        double[] radii = both ? oscillatingRadii(eq, estimate, digits, phase)
                : decayingRadii(eq, estimate, digits, phase, free);
        int orders = PreciseTransseries.ordersAt(eq, estimate.background(), estimate.p(), estimate.q(),
                1e-3 * target, Math.min(radii[0], radii[1]), phase, both ? budget(digits)
                : PreciseTransseries.ordersFor(digits));
        if (orders < 0) {
            orders = PreciseTransseries.ordersFor(digits);
        }
        HighPrecisionSolution replay = HighPrecisionSolution.of(solution, digits + 5, f -> progress.accept(0.5 * f));
        ExactPoint fitPoint = point(radii[0], estimate);
        ExactPoint checkPoint = point(radii[1], estimate);
        HighPrecisionValue v1 = replay.evaluate(fitPoint);
        HighPrecisionValue v2 = replay.evaluate(checkPoint);
        progress.accept(0.5);
        Newton newton = new Newton(eq, parameters, background, estimate, digits, orders, both ? -1 : free < 0 ? 0 : 1);
        return newton.solve(fitPoint, v1, checkPoint, v2, target, progress);
    }

    /** The point r e^(i angle) as an exact number (rounded to doubles: it is exact whatever it is) on the sheet. */
    private static ExactPoint point(double r, InfinityBehaviour estimate) {
        double cos = Math.cos(estimate.angle());
        double sin = Math.sin(estimate.angle());
        // on the axes exactly (cos(pi/2) is 6e-17 in double)
        Complex z = new Complex(Math.abs(cos) < 1e-15 ? 0 : cos, Math.abs(sin) < 1e-15 ? 0 : sin).multiply(r);
        return ExactPoint.of(ExactNumber.ofDouble("radius", z), estimate.sheet());
    }

    /** The most orders built on an oscillating ray (their cost grows like the fourth power of the orders). */
    private static int budget(int digits) {
        return digits / 2 + 24;
    }

    private static double[] oscillatingRadii(Painleve3 eq, InfinityBehaviour e, int digits, double phase) {
        int budget = budget(digits);
        for (double r : RADII) {
            if (r >= OSCILLATING_FROM && PreciseTransseries.ordersAt(eq, e.background(), e.p(), e.q(),
                    1e-3 * Math.pow(10, -digits), r, phase, budget) > 0) {
                return new double[] {r, 1.25 * r};
            }
        }
        throw new InvalidInputException("digits", digits + " digits are not reached by the transseries with at most "
                + budget + " orders for |z| <= " + RADII[RADII.length - 1] + " on this ray; ask fewer digits");
    }

    /**
     * The radius where the decaying amplitude is best fixed: its part of u, |a| |E^(+-1)| |x|^(-1/2), against the
     * truncation estimate of {@link PreciseTransseries#ordersFor} orders plus 10^-(D+3); and the radius before it.
     */
    private static double[] decayingRadii(Painleve3 eq, InfinityBehaviour e, int digits, double phase, int free) {
        TransseriesAtInfinity probe = TransseriesAtInfinity.create(eq, e.background(), e.p(), e.q(), 4);
        int orders = PreciseTransseries.ordersFor(digits);
        Complex a = free > 0 ? e.p() : e.q();
        double[] rel = new double[RADII.length];
        // (on the smallest radius the check is the next one)
        int best = 0;
        for (int i = 0; i < RADII.length; i++) {
            double y = probe.isD7() ? Math.pow(RADII[i], 2.0 / 3) : RADII[i];
            Complex tauY = new Complex(Math.log(y), probe.phaseFactor() * phase);
            Complex exponent = probe.mu().multiply(tauY.exp()).add(probe.kappa().multiply(tauY));
            double part = (a.norm() > 0 ? a.norm() : 1) * Math.exp(free * exponent.getReal()) / Math.sqrt(y);
            double truncation = PreciseTransseries.truncationAt(eq, e.background(), e.p(), e.q(), orders, RADII[i],
                    phase);
            rel[i] = (truncation + Math.pow(10, -digits - 3)) / part;
            if (rel[i] < rel[best]) {
                best = i;
            }
        }
        // the check inside: beyond, the growing exponential's tiny amplitude (carried by any rounding of the start
        // data) grows, and with it the error of its linear term
        return new double[] {RADII[best], RADII[best == 0 ? 1 : best - 1]};
    }

    /** Newton's method on the precise transseries with the Jacobian of the double one. */
    private static final class Newton {
        private final Painleve3 eq;
        private final ExactNumber[] parameters;
        private final int background;
        private final Complex c;
        private final int digits;
        private final int orders;
        /** The amplitude of the exponential that grows along the ray (0: p, 1: q), taken linearly; -1: none. */
        private int grows;
        private Complex pd;
        private Complex qd;

        Newton(Painleve3 eq, ExactNumber[] parameters, int background, InfinityBehaviour e, int digits, int orders,
               int grows) {
            this.grows = grows;
            this.eq = eq;
            this.parameters = parameters;
            this.background = background;
            this.c = e.background();
            this.digits = digits;
            this.orders = orders;
            this.pd = e.p();
            this.qd = e.q();
        }

        Result solve(ExactPoint fitPoint, HighPrecisionValue v1, ExactPoint checkPoint, HighPrecisionValue v2,
                     double target, DoubleConsumer progress) {
            MpArithmetic ar = new MpArithmetic(digits + PreciseTransseries.GUARD);
            MpContext ctx = ar.context();
            MpComplex p = ctx.fromDouble(pd.getReal(), pd.getImaginary());
            MpComplex q = ctx.fromDouble(qd.getReal(), qd.getImaginary());
            double last = Double.POSITIVE_INFINITY;
            for (int build = 1; build <= MAX_BUILDS; build++) {
                // the growing amplitude is left out of the build (it would fill every harmonic) and added linearly
                PreciseTransseries t = PreciseTransseries.create(eq, parameters, background,
                        ctx.toApcomplex(grows == 0 ? ar.zero() : p), ctx.toApcomplex(grows == 1 ? ar.zero() : q),
                        digits, orders);
                progress.accept(0.5 + 0.5 * build / (MAX_BUILDS + 1.0));
                Complex[][] j = jacobian(tau(fitPoint));
                Complex[] step = solve(j, residual(ar, t, fitPoint, v1, j, p, q));
                double size = step[0].norm() / (1 + pd.norm()) + step[1].norm() / (1 + qd.norm());
                double[] err = dataErrors(ar, t, j, fitPoint, v1);
                if (grows >= 0 && linearShare(ar, t, j, fitPoint, v1) > 0.1) {
                    // the growing amplitude's linear term would dominate the errors: build with both amplitudes
                    grows = -1;
                    p = ar.subtract(p, ctx.fromDouble(step[0].getReal(), step[0].getImaginary()));
                    q = ar.subtract(q, ctx.fromDouble(step[1].getReal(), step[1].getImaginary()));
                    pd = ar.toComplex(p);
                    qd = ar.toComplex(q);
                    last = Double.POSITIVE_INFINITY;
                    continue;
                }
                // below the errors of the data and the model a step only follows their noise
                boolean noise = step[0].norm() <= 0.1 * err[0] && step[1].norm() <= 0.1 * err[1];
                if (!Double.isFinite(size) || (build >= 3 && size > 0.5 * last && !noise)) {
                    throw new TertiusException("Newton's method for the amplitudes in " + digits + " digits does not"
                            + " converge (step " + size + " after " + build + " builds)");
                }
                // each step shrinks by the measured contraction (the Jacobian's relative error, about 1e-9): the
                // error left after this step is taken as 10 times the step times that contraction
                double contraction = build == 1 ? 1 : Math.min(1, size / last);
                if (10 * contraction * size <= 0.1 * target || noise || build == MAX_BUILDS) {
                    return result(ar, t, j, step, 10 * contraction, p, q, fitPoint, v1, checkPoint, v2, build);
                }
                p = ar.subtract(p, ctx.fromDouble(step[0].getReal(), step[0].getImaginary()));
                q = ar.subtract(q, ctx.fromDouble(step[1].getReal(), step[1].getImaginary()));
                pd = ar.toComplex(p);
                qd = ar.toComplex(q);
                last = size;
            }
            throw new IllegalStateException("unreachable");
        }

        /**
         * The result after the last step (taken), with the errors of the model of this build, at (p, q) before the
         * step: the data's and the model's errors at r1, the step times {@code left} (what remains of it), and the
         * disagreement at r2 (the step there against the step at r1) beyond the errors at r2.
         */
        private Result result(MpArithmetic ar, PreciseTransseries t, Complex[][] j, Complex[] step, double left,
                              MpComplex p, MpComplex q, ExactPoint fitPoint, HighPrecisionValue v1,
                              ExactPoint checkPoint, HighPrecisionValue v2, int builds) {
            double[] err = dataErrors(ar, t, j, fitPoint, v1);
            MpContext ctx = ar.context();
            Complex[][] j2 = jacobian(tau(checkPoint));
            Complex[] other = solve(j2, residual(ar, t, checkPoint, v2, j2, p, q));
            double[] own = dataErrors(ar, t, j2, checkPoint, v2);
            double dp = other[0].subtract(step[0]).norm();
            double dq = other[1].subtract(step[1]).norm();
            // only the part of the disagreement beyond the check's own errors (where one exponential decays, the
            // check radius fixes the amplitude less well than the fit radius)
            double ep = Math.max(0, dp - own[0]);
            double eq2 = Math.max(0, dq - own[1]);
            MpComplex pp = ar.subtract(p, ctx.fromDouble(step[0].getReal(), step[0].getImaginary()));
            MpComplex qq = ar.subtract(q, ctx.fromDouble(step[1].getReal(), step[1].getImaginary()));
            return new Result(ctx.toApcomplex(pp), ctx.toApcomplex(qq), err[0] + left * step[0].norm() + ep,
                    err[1] + left * step[1].norm() + eq2, fitPoint, checkPoint, orders, builds,
                    Math.min(v1.correctDigits(), v2.correctDigits()), Math.max(dp, dq), Math.max(own[0], own[1]));
        }

        /** The linear term's error in w against the data's and the model's error there. */
        private double linearShare(MpArithmetic ar, PreciseTransseries t, Complex[][] j, ExactPoint z,
                                   HighPrecisionValue v) {
            LocalValue<MpComplex> m = t.startData(z.z(), z.sheet());
            double data = Math.pow(10, -v.correctDigits()) * ar.abs(m.w()) + m.errW();
            return 1e-9 * (grows == 0 ? pd.norm() : qd.norm()) * j[0][grows].norm() / data;
        }

        /** The data's and the model's errors at the point through the inverse Jacobian. */
        private double[] dataErrors(MpArithmetic ar, PreciseTransseries t, Complex[][] j, ExactPoint z,
                                    HighPrecisionValue v) {
            LocalValue<MpComplex> m = t.startData(z.z(), z.sheet());
            double rel = Math.pow(10, -v.correctDigits());
            MpContext ctx = ar.context();
            double e1 = rel * ar.abs(ctx.fromApcomplex(v.value(0))) + m.errW();
            double e2 = rel * ar.abs(ctx.fromApcomplex(v.value(1))) + m.errDw();
            if (grows >= 0) {
                // the linear term: the Jacobian's relative error (about 1e-10, taken as 1e-9), and the neglected
                // products of the two amplitudes (the first, u_(2,0) ~ p q / y, bounded by 10 |p q| / y)
                double a = grows == 0 ? pd.norm() : qd.norm();
                double y = Math.pow(z.z().toComplex().norm(), eq.type() == Painleve3Type.D7 ? 2.0 / 3 : 1);
                double second = 10 * pd.norm() * qd.norm() / y;
                e1 += 1e-9 * a * j[0][grows].norm() + second * ar.abs(m.w());
                e2 += 1e-9 * a * j[1][grows].norm() + second * (ar.abs(m.dw()) + ar.abs(m.w()) / y);
            }
            return errors(j, e1, e2);
        }

        private Complex tau(ExactPoint z) {
            Complex zz = z.z().toComplex();
            return new Complex(Math.log(zz.norm()), zz.getArgument() + 2 * Math.PI * z.sheet());
        }

        /** model - data at the point, {w, w'}; the growing amplitude a enters as a J (its column of J). */
        private Complex[] residual(MpArithmetic ar, PreciseTransseries t, ExactPoint z, HighPrecisionValue v,
                                   Complex[][] j, MpComplex p, MpComplex q) {
            LocalValue<MpComplex> m = t.startData(z.z(), z.sheet());
            MpContext ctx = ar.context();
            MpComplex w = ar.subtract(m.w(), ctx.fromApcomplex(v.value(0)));
            MpComplex dw = ar.subtract(m.dw(), ctx.fromApcomplex(v.value(1)));
            if (grows >= 0) {
                MpComplex a = grows == 0 ? p : q;
                w = ar.add(w, ar.multiply(a, ctx.fromDouble(j[0][grows].getReal(), j[0][grows].getImaginary())));
                dw = ar.add(dw, ar.multiply(a, ctx.fromDouble(j[1][grows].getReal(), j[1][grows].getImaginary())));
            }
            return new Complex[] {ar.toComplex(w), ar.toComplex(dw)};
        }

        /**
         * d(w, w')/d(p, q) of the double transseries at tau by central differences of u = log(w/reference) and u'
         * (which keep the relative accuracy of an exponentially small amplitude part).
         */
        private Complex[][] jacobian(Complex tau) {
            TransseriesAtInfinity at = TransseriesAtInfinity.create(eq, c, pd, qd, InfinityBehaviour.ORDERS);
            // steps that change u by about 1e-5 through the linear part x^(-1/2) (p E + q/E), or 1e-5 |a|
            Complex tauY = at.isD7() ? tau.multiply(2.0 / 3) : tau;
            double e = at.mu().multiply(tauY.exp()).add(at.kappa().multiply(tauY)).getReal();
            double root = Math.exp(tauY.getReal() / 2);
            double hp = 1e-5 * Math.max(pd.norm(), root * Math.exp(-e));
            double hq = 1e-5 * Math.max(qd.norm(), root * Math.exp(e));
            LocalValue<Complex> v = at.at(tau);
            Complex[] dp = richardson(slope(v, tau, hp, 0), slope(v, tau, hp / 2, 0));
            Complex[] dq = richardson(slope(v, tau, hq, 1), slope(v, tau, hq / 2, 1));
            return new Complex[][] {{dp[0], dq[0]}, {dp[1], dq[1]}};
        }

        /**
         * Richardson's extrapolation of central differences of steps h and h/2: (4 D(h/2) - D(h))/3, error O(h^4)
         * (common practice; the drift p q makes u markedly nonlinear in the amplitudes far out).
         */
        private static Complex[] richardson(Complex[] coarse, Complex[] fine) {
            return new Complex[] {fine[0].multiply(4).subtract(coarse[0]).divide(3),
                fine[1].multiply(4).subtract(coarse[1]).divide(3)};
        }

        private Complex[] slope(LocalValue<Complex> v, Complex tau, double h, int which) {
            return which == 0 ? slope(v, logModel(pd.add(h), qd, tau), logModel(pd.subtract(h), qd, tau), 2 * h)
                    : slope(v, logModel(pd, qd.add(h), tau), logModel(pd, qd.subtract(h), tau), 2 * h);
        }

        /** {dw, dw'} from the differences of u and u': w = ref e^u, w' = w (u' + ref'/ref). */
        private static Complex[] slope(LocalValue<Complex> v, LocalValue<Complex> plus, LocalValue<Complex> minus,
                                       double h) {
            Complex du = plus.w().subtract(minus.w()).divide(h);
            Complex ddu = plus.dw().subtract(minus.dw()).divide(h);
            return new Complex[] {v.w().multiply(du), v.dw().multiply(du).add(v.w().multiply(ddu))};
        }

        private LocalValue<Complex> logModel(Complex p, Complex q, Complex tau) {
            return TransseriesAtInfinity.create(eq, c, p, q, InfinityBehaviour.ORDERS).logAt(tau);
        }

        /** The Newton step {dp, dq}: the 2 x 2 system. */
        private static Complex[] solve(Complex[][] j, Complex[] r) {
            Complex det = j[0][0].multiply(j[1][1]).subtract(j[0][1].multiply(j[1][0]));
            return new Complex[] {j[1][1].multiply(r[0]).subtract(j[0][1].multiply(r[1])).divide(det),
                j[0][0].multiply(r[1]).subtract(j[1][0].multiply(r[0])).divide(det)};
        }

        /** First-order errors of (p, q) from errors e1 of w and e2 of w'. */
        private static double[] errors(Complex[][] j, double e1, double e2) {
            double det = j[0][0].multiply(j[1][1]).subtract(j[0][1].multiply(j[1][0])).norm();
            return new double[] {(j[1][1].norm() * e1 + j[0][1].norm() * e2) / det,
                (j[1][0].norm() * e1 + j[0][0].norm() * e2) / det};
        }
    }
}
