package org.tertius.connection.match;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.infinity.TransseriesAtInfinity;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Value;

/**
 * Newton fit of the amplitudes (p, q) of {@link TransseriesAtInfinity} about a background c to one computed value
 * (w, w'), in the variables u = log(w/c) (D7: log(w/(c x^(1/3)))) and u' (relative accuracy of an exponentially
 * small deviation). Both
 * amplitudes ({@code free = 0}) from u and u'; one ({@code free = -1}: q with p = 0, {@code +1}: p with q = 0) from u,
 * with u' as a check. Start from the linear part: u - u_background ~ x^(-1/2) (p E + q/E). Immutable.
 */
final class AmplitudeFit {
    private final Painleve3 eq;
    private final Complex c;
    private final int free;
    private final TransseriesAtInfinity background;

    AmplitudeFit(Painleve3 eq, Complex c, int free) {
        this.eq = eq;
        this.c = c;
        this.free = free;
        this.background = TransseriesAtInfinity.create(eq, c, Complex.ZERO, Complex.ZERO, InfinityBehaviour.ORDERS);
    }

    /** A fit and its error estimates. */
    static final class Result {
        final Complex p;
        final Complex q;
        final double errP;
        final double errQ;

        Result(Complex p, Complex q, double errP, double errQ) {
            this.p = p;
            this.q = q;
            this.errP = errP;
            this.errQ = errQ;
        }
    }

    private LocalValue<Complex> model(Complex p, Complex q, Complex tau) {
        return TransseriesAtInfinity.create(eq, c, p, q, InfinityBehaviour.ORDERS).logAt(tau);
    }

    Result at(Complex tau, Painleve3Value v) {
        Complex w = v.w();
        double m = w.norm();
        Complex[] ud = background.logOf(tau, w, v.dw());
        Complex u = ud[0];
        Complex du = ud[1];
        double eu = v.errW() / m;
        double edu = v.errDw() / m + v.dw().norm() * v.errW() / (m * m);
        LocalValue<Complex> bg = background.logAt(tau);
        Complex uo = u.subtract(bg.w());
        Complex duo = du.subtract(bg.dw());
        // in the variable y of the transseries (x for D6, s = x^(2/3) for D7); du/dy = du/dx (dx/dy)
        Complex tauY = background.isD7() ? tau.multiply(2.0 / 3) : tau;
        Complex y = tauY.exp();
        Complex e0 = background.mu().multiply(y).add(background.kappa().multiply(tauY)).exp();
        Complex root = tauY.multiply(0.5).exp();
        Complex mu = background.mu();
        if (background.isD7()) {
            duo = duo.multiply(tau.divide(3).exp().multiply(1.5));
        }
        Complex p0 = Complex.ZERO;
        Complex q0 = Complex.ZERO;
        if (free == 0) {
            // the phase drift mu p q enters E: iterate the linear estimate with it
            Complex pe = uo.add(duo.divide(mu)).multiply(root).divide(2);
            Complex qe = uo.subtract(duo.divide(mu)).multiply(root).divide(2);
            for (int i = 0; i < 8; i++) {
                p0 = pe.divide(e0);
                q0 = qe.multiply(e0);
                Complex kappa = TransseriesAtInfinity.create(eq, c, p0, q0, 4).kappa();
                e0 = mu.multiply(y).add(kappa.multiply(tauY)).exp();
            }
        } else if (free < 0) {
            q0 = uo.multiply(root).multiply(e0);
        } else {
            p0 = uo.multiply(root).divide(e0);
        }
        return free == 0 ? two(p0, q0, tau, u, du, eu, edu) : one(free < 0 ? q0 : p0, tau, u, du, eu, edu);
    }

    private Complex[] residual(Complex p, Complex q, Complex tau, Complex u, Complex du) {
        LocalValue<Complex> l = model(p, q, tau);
        return new Complex[] {l.w().subtract(u), l.dw().subtract(du), new Complex(l.errW(), l.errDw())};
    }

    private Result two(Complex p, Complex q, Complex tau, Complex u, Complex du, double eu, double edu) {
        Complex[] r = residual(p, q, tau, u, du);
        double last = Double.POSITIVE_INFINITY;
        Complex j11 = Complex.NaN;
        Complex j12 = Complex.NaN;
        Complex j21 = Complex.NaN;
        Complex j22 = Complex.NaN;
        for (int it = 0; it < 50; it++) {
            double hp = 1e-7 * (1 + p.norm());
            double hq = 1e-7 * (1 + q.norm());
            Complex[] rp = residual(p.add(hp), q, tau, u, du);
            Complex[] rq = residual(p, q.add(hq), tau, u, du);
            j11 = rp[0].subtract(r[0]).divide(hp);
            j21 = rp[1].subtract(r[1]).divide(hp);
            j12 = rq[0].subtract(r[0]).divide(hq);
            j22 = rq[1].subtract(r[1]).divide(hq);
            Complex det = j11.multiply(j22).subtract(j12.multiply(j21));
            Complex dp = j22.multiply(r[0]).subtract(j12.multiply(r[1])).divide(det);
            Complex dq = j11.multiply(r[1]).subtract(j21.multiply(r[0])).divide(det);
            if (!Double.isFinite(dp.norm()) || !Double.isFinite(dq.norm())) {
                throw new IllegalStateException("singular Jacobian of the amplitude fit");
            }
            p = p.subtract(dp);
            q = q.subtract(dq);
            r = residual(p, q, tau, u, du);
            double size = dp.norm() / (1 + p.norm()) + dq.norm() / (1 + q.norm());
            if (size <= 1e-15 || (it >= 3 && size > 0.5 * last && size < 1e-9)) {
                double e1 = eu + r[2].getReal();
                double e2 = edu + r[2].getImaginary();
                double dn = j11.multiply(j22).subtract(j12.multiply(j21)).norm();
                double errP = (j22.norm() * e1 + j12.norm() * e2) / dn;
                double errQ = (j21.norm() * e1 + j11.norm() * e2) / dn;
                return new Result(p, q, errP, errQ);
            }
            last = size;
        }
        throw new IllegalStateException("Newton's method for the amplitudes did not converge");
    }

    private Result one(Complex a, Complex tau, Complex u, Complex du, double eu, double edu) {
        Complex[] r = residual(free > 0 ? a : Complex.ZERO, free < 0 ? a : Complex.ZERO, tau, u, du);
        Complex slope = Complex.NaN;
        for (int it = 0; it < 50; it++) {
            double h = 1e-7 * (1 + a.norm());
            Complex ah = a.add(h);
            Complex[] rh = residual(free > 0 ? ah : Complex.ZERO, free < 0 ? ah : Complex.ZERO, tau, u, du);
            slope = rh[0].subtract(r[0]).divide(h);
            Complex step = r[0].divide(slope);
            if (!Double.isFinite(step.norm())) {
                throw new IllegalStateException("zero slope in the amplitude fit");
            }
            a = a.subtract(step);
            r = residual(free > 0 ? a : Complex.ZERO, free < 0 ? a : Complex.ZERO, tau, u, du);
            if (step.norm() <= 1e-15 * (1 + a.norm())) {
                break;
            }
        }
        double e1 = eu + r[2].getReal();
        double e2 = edu + r[2].getImaginary();
        double err = e1 / slope.norm();
        // u' is not fitted: it must agree by itself (sensitivity |du/da| err), else the data are not of this family
        Complex ah = a.add(1e-7 * (1 + a.norm()));
        Complex[] rh = residual(free > 0 ? ah : Complex.ZERO, free < 0 ? ah : Complex.ZERO, tau, u, du);
        double slope2 = rh[1].subtract(r[1]).norm() / (1e-7 * (1 + a.norm()));
        if (!(r[1].norm() <= 10 * (e2 + slope2 * err) + 1e-13 * (1 + du.norm()))) {
            throw new IllegalStateException("u' does not fit the one-parameter family (residual " + r[1].norm()
                    + "): the exponential that grows along the ray is present");
        }
        return free < 0 ? new Result(Complex.ZERO, a, 0, err) : new Result(a, Complex.ZERO, err, 0);
    }

    /** The fit with the smallest error, errors raised to the spread; null if two fits differ by &gt; 10 x estimates. */
    static Result combine(List<Result> fits) {
        Result best = fits.get(0);
        for (Result f : fits) {
            if (f.errP + f.errQ < best.errP + best.errQ) {
                best = f;
            }
        }
        double sp = best.errP;
        double sq = best.errQ;
        for (Result f : fits) {
            double dp = f.p.subtract(best.p).norm();
            double dq = f.q.subtract(best.q).norm();
            if (dp > 10 * (f.errP + best.errP) + 1e-15 || dq > 10 * (f.errQ + best.errQ) + 1e-15) {
                return null;
            }
            sp = Math.max(sp, dp);
            sq = Math.max(sq, dq);
        }
        return new Result(best.p, best.q, sp, sq);
    }

    static String describe(List<Result> fits) {
        StringBuilder b = new StringBuilder();
        for (Result f : fits) {
            b.append(b.length() == 0 ? "" : "; ").append("p = ").append(f.p).append(" +- ").append(f.errP)
                    .append(", q = ").append(f.q).append(" +- ").append(f.errQ);
        }
        return b.toString();
    }
}
