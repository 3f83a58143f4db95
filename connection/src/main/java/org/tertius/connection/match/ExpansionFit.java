package org.tertius.connection.match;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.connection.zero.ZeroExpansion;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Value;

/**
 * Newton fits of the expansions at 0 ({@link ZeroExpansion}) to computed values, for {@link ZeroBehaviourFit}:
 * (sigma, log B) of the power kinds from (w, w') at one point, t0 of the logarithmic kind from w (w' checks it).
 * Jacobians by differences; the errors of the data and of the expansion are mapped through the inverse Jacobian
 * (first order). Every fit is repeated at the smallest radii and the spread between them enters the estimate.
 * Double precision. Immutable.
 */
final class ExpansionFit {
    private static final ComplexArithmetic AR = ComplexArithmetic.INSTANCE;
    /** Largest error of sigma (or relative error of t0) for which a kind is reported; beyond it: undecided. */
    static final double RESOLVED = 1e-3;
    /** Number of smallest radii fitted, and of smallest radii tried for them. */
    private static final int RADII = 4;
    private static final int TRIED = 6;
    private final Painleve3 eq;
    private final List<Complex> p;

    ExpansionFit(Painleve3 eq) {
        this.eq = eq;
        this.p = List.of(eq.alpha(), eq.beta(), eq.gamma(), eq.delta());
    }

    /** One fit: the parameters and their error estimates. */
    private static final class Fit {
        final Complex first;
        final Complex second;
        final double errFirst;
        final double errSecond;
        final int branch;

        Fit(Complex first, Complex second, double errFirst, double errSecond, int branch) {
            this.first = first;
            this.second = second;
            this.errFirst = errFirst;
            this.errSecond = errSecond;
            this.branch = branch;
        }
    }

    /** The power kinds: (sigma, B) from the samples, started at sigma0. */
    ZeroBehaviour power(List<ZeroBehaviourFit.Sample> samples, Complex sigma0) {
        List<Fit> fits = new ArrayList<>();
        String last = "";
        for (int i = samples.size() - 1; i >= Math.max(0, samples.size() - TRIED) && fits.size() < RADII; i--) {
            try {
                fits.add(powerAt(samples.get(i), sigma0));
            } catch (RuntimeException ex) {
                last = ex.getMessage();
            }
        }
        if (fits.size() < 2) {
            return ZeroBehaviour.undecided(sigma0, Double.NaN, "the fit of (sigma, B) failed at the smallest radii"
                    + (last.isEmpty() ? "" : " (" + last + ")"));
        }
        Fit best = combine(fits);
        if (best == null) {
            return ZeroBehaviour.undecided(sigma0, spread(fits, true), "the fits of (sigma, B) at the smallest radii"
                    + " disagree beyond their error estimates: " + describe(fits));
        }
        Complex b = best.second.exp();
        Complex sigma = best.first;
        if (!(best.errFirst < RESOLVED)) {
            return ZeroBehaviour.undecided(sigma, best.errFirst, "the exponent is not resolved (error " + best.errFirst
                    + "): the data do not tell the kind");
        }
        if (Math.abs(sigma.getReal()) > 1 + 3 * best.errFirst) {
            // iterates stepped over the edge: the canonical description has exponent 2 - sigma (or -2 - sigma)
            return ZeroBehaviour.undecided(sigma, best.errFirst, "the fit ended beyond the edge |Re sigma| = 1 by more"
                    + " than its error; the exponent is not resolved");
        }
        double errB = b.norm() * best.errSecond;
        String note = "fitted at the " + fits.size() + " smallest radii";
        boolean edge = Math.abs(Math.abs(sigma.getReal()) - 1) <= 3 * best.errFirst;
        if (edge && sigma.getImaginary() < 0) {
            // the canonical description of an edge solution has Im sigma > 0
            Complex[] other = ZeroExpansion.edgeAlternate(eq.alpha(), eq.beta(), eq.gamma(), eq.delta(), sigma, b);
            if (other != null) {
                double h = 1e-7;
                Complex[] ds = ZeroExpansion.edgeAlternate(eq.alpha(), eq.beta(), eq.gamma(), eq.delta(),
                        sigma.add(h), b);
                Complex[] db = ZeroExpansion.edgeAlternate(eq.alpha(), eq.beta(), eq.gamma(), eq.delta(), sigma,
                        b.add(h));
                double slopeS = ds == null ? 0 : ds[1].subtract(other[1]).norm() / h;
                double slopeB = db == null ? 0 : db[1].subtract(other[1]).norm() / h;
                errB = slopeS * best.errFirst + slopeB * errB;
                sigma = other[0];
                b = other[1];
                note += "; converted to the description with Im sigma > 0";
            }
        }
        return ZeroBehaviour.measuredPower(sigma, best.errFirst, b, errB, note);
    }

    /** The logarithmic kind at sigma = side from the samples. */
    ZeroBehaviour logarithmic(List<ZeroBehaviourFit.Sample> samples, int side) {
        List<Fit> fits = new ArrayList<>();
        String last = "";
        for (int i = samples.size() - 1; i >= Math.max(0, samples.size() - TRIED) && fits.size() < RADII; i--) {
            try {
                fits.add(logAt(samples.get(i), side));
            } catch (RuntimeException ex) {
                last = ex.getMessage();
            }
        }
        if (fits.size() < 2) {
            return ZeroBehaviour.undecided(new Complex(side), Double.NaN, "the logarithmic fit failed"
                    + (last.isEmpty() ? "" : " (" + last + ")"));
        }
        int branch = fits.get(0).branch;
        for (Fit f : fits) {
            if (f.branch != branch) {
                return ZeroBehaviour.undecided(new Complex(side), Double.NaN, "the logarithmic branch differs between"
                        + " radii");
            }
        }
        Fit best = combine(fits);
        if (best == null) {
            return ZeroBehaviour.undecided(new Complex(side), Double.NaN, "the fits of t0 disagree between radii: "
                    + describe(fits));
        }
        if (!(best.errFirst < RESOLVED * (1 + best.first.norm()))) {
            return ZeroBehaviour.undecided(new Complex(side), Double.NaN, "t0 is not resolved (error " + best.errFirst
                    + ")");
        }
        return ZeroBehaviour.measuredLogarithmic(side, best.first, best.errFirst, branch,
                "fitted at the " + fits.size() + " smallest radii");
    }

    /**
     * The fit with the smallest error, its errors raised to the spread of the others; null when two fits differ by
     * more than 10 times their combined estimates.
     */
    private static Fit combine(List<Fit> fits) {
        Fit best = fits.get(0);
        for (Fit f : fits) {
            if (f.errFirst < best.errFirst) {
                best = f;
            }
        }
        double s1 = best.errFirst;
        double s2 = best.errSecond;
        for (Fit f : fits) {
            double d1 = f.first.subtract(best.first).norm();
            double d2 = f.second.subtract(best.second).norm();
            if (d1 > 10 * (f.errFirst + best.errFirst) + 1e-15 || d2 > 10 * (f.errSecond + best.errSecond) + 1e-15) {
                return null;
            }
            s1 = Math.max(s1, d1);
            s2 = Math.max(s2, d2);
        }
        return new Fit(best.first, best.second, s1, s2, best.branch);
    }

    private static double spread(List<Fit> fits, boolean first) {
        double s = 0;
        for (Fit f : fits) {
            s = Math.max(s, (first ? f.first : f.second).subtract((first ? fits.get(0).first : fits.get(0).second))
                    .norm());
        }
        return s;
    }

    private static String describe(List<Fit> fits) {
        StringBuilder b = new StringBuilder();
        for (Fit f : fits) {
            b.append(b.length() == 0 ? "" : "; ").append(f.first).append(" +- ").append(f.errFirst);
        }
        return b.toString();
    }

    /**
     * Rows enough for double precision at this radius: the rows decay like |z|^(1 + Re sigma') (sigma' the exponent of
     * the side used, Re sigma' &gt;= 0) or |z|^2 on the edge; the expansion's own estimate covers a shortfall.
     */
    static int rowsFor(Complex tau) {
        double digits = Math.max(1, -tau.getReal() / Math.log(10) - 0.5);
        return Math.max(3, Math.min(ZeroBehaviour.ROWS, (int) Math.ceil(18 / digits) + 2));
    }

    private Fit powerAt(ZeroBehaviourFit.Sample s, Complex sigma0) {
        Complex tau = s.tau;
        int rows = rowsFor(tau);
        Complex z = tau.exp();
        Painleve3Value v = s.value;
        Complex[] x = {sigma0, initialAmplitude(tau, v, sigma0).log()};
        return newton(x, xs -> {
            LocalValue<Complex> e = ZeroExpansion.powerFormal(AR, p, xs[0], xs[1].exp(), rows).at(tau);
            return residual(e, v, z);
        }, v, z);
    }

    /** B from the reduced solution g = B z^-k + beta/k^2 + B' z^k (g = w/z, k = 1 - sigma), or of 1/w. */
    private Complex initialAmplitude(Complex tau, Painleve3Value v, Complex sigma) {
        boolean inverse = sigma.getReal() < 0;
        Complex w = inverse ? v.w().reciprocal() : v.w();
        Complex dw = inverse ? v.dw().negate().divide(v.w().multiply(v.w())) : v.dw();
        Complex beta = inverse ? eq.alpha().negate() : eq.beta();
        Complex k = Complex.ONE.subtract(inverse ? sigma.negate() : sigma);
        Complex z = tau.exp();
        Complex g = w.divide(z);
        Complex dg = z.multiply(dw).subtract(w).divide(z);
        Complex b = k.multiply(tau).exp().multiply(g.subtract(beta.divide(k.multiply(k))).subtract(dg.divide(k)))
                .divide(2);
        if (!(b.norm() > 0) || !Double.isFinite(b.norm())) {
            b = w.divide(k.negate().multiply(tau).exp().multiply(z));
        }
        return inverse ? b.reciprocal() : b;
    }

    private Fit logAt(ZeroBehaviourFit.Sample s, int side) {
        Complex tau = s.tau;
        Complex z = tau.exp();
        Painleve3Value v = s.value;
        boolean inverse = side == -1;
        Complex w = inverse ? v.w().reciprocal() : v.w();
        Complex dw = inverse ? v.dw().negate().divide(v.w().multiply(v.w())) : v.dw();
        Complex beta = inverse ? eq.alpha().negate() : eq.beta();
        Complex delta = inverse ? eq.gamma().negate() : eq.delta();
        Complex g = w.divide(z);
        Complex dg = z.multiply(dw).subtract(w).divide(z);
        Complex t0;
        int branch = 0;
        if (beta.norm() == 0) {
            Complex ratio = dg.divide(delta.negate().sqrt());
            branch = ratio.getReal() >= 0 ? 1 : -1;
            if (!(ratio.subtract(branch).norm() < 0.1)) {
                throw new InvalidInputException("t0", "the slope z d(w/z)/dz = " + dg + " is not +-sqrt(-delta)");
            }
            t0 = tau.subtract(g.divide(dg));
        } else {
            t0 = tau.add(dg.divide(beta));
        }
        int br = branch;
        Residual f = xs -> residual(ZeroExpansion.logarithmic(AR, p, side, xs[0], br, rowsFor(tau)).at(tau), v, z);
        double h = 1e-7;
        Complex[] r = f.of(new Complex[] {t0});
        Complex slope = Complex.NaN;
        for (int it = 0; it < 40; it++) {
            slope = f.of(new Complex[] {t0.add(h)})[0].subtract(r[0]).divide(h);
            Complex step = r[0].divide(slope);
            if (!Double.isFinite(step.norm())) {
                throw new IllegalStateException("the logarithmic fit met a zero slope");
            }
            t0 = t0.subtract(step);
            r = f.of(new Complex[] {t0});
            if (step.norm() <= 1e-15 * (1 + t0.norm())) {
                break;
            }
            if (it == 39) {
                throw new IllegalStateException("Newton's method for t0 did not converge");
            }
        }
        double m = v.w().norm();
        double e1 = v.errW() / m + r[2].getReal();
        double e2 = v.errDw() * z.norm() / m + r[2].getImaginary();
        double errT0 = e1 / slope.norm();
        // the derivative is not fitted: it must agree by itself (its sensitivity to t0 is at most |dr2/dt0| errT0)
        Complex slope2 = f.of(new Complex[] {t0.add(h)})[1].subtract(r[1]).divide(h);
        if (!(r[1].norm() <= 10 * (e2 + slope2.norm() * errT0) + 1e-14)) {
            throw new IllegalStateException("w' does not fit the logarithmic series (relative residual "
                    + r[1].norm() + ")");
        }
        return new Fit(t0, Complex.ZERO, errT0, 0, br);
    }

    /** {relative residual of w, of z w' (scaled by w), error of the expansion in the same scale}. */
    private static Complex[] residual(LocalValue<Complex> e, Painleve3Value v, Complex z) {
        Complex w = v.w();
        double m = w.norm();
        Complex r1 = e.w().subtract(w).divide(w);
        Complex r2 = e.dw().subtract(v.dw()).multiply(z).divide(w);
        return new Complex[] {r1, r2, new Complex(e.errW() / m, e.errDw() * z.norm() / m)};
    }

    /** A residual function of the unknowns. */
    private interface Residual {
        Complex[] of(Complex[] x);
    }

    /** Newton's method on two unknowns and two equations. */
    private static Fit newton(Complex[] x, Residual f, Painleve3Value v, Complex z) {
        Complex[] r = f.of(x);
        double h = 1e-7;
        double last = Double.POSITIVE_INFINITY;
        Complex[][] jac = new Complex[2][2];
        for (int it = 0; it < 40; it++) {
            Complex[] x0 = {x[0].add(h), x[1]};
            Complex[] r0 = f.of(x0);
            Complex[] x1 = {x[0], x[1].add(h)};
            Complex[] r1 = f.of(x1);
            jac[0][0] = r0[0].subtract(r[0]).divide(h);
            jac[1][0] = r0[1].subtract(r[1]).divide(h);
            jac[0][1] = r1[0].subtract(r[0]).divide(h);
            jac[1][1] = r1[1].subtract(r[1]).divide(h);
            Complex det = jac[0][0].multiply(jac[1][1]).subtract(jac[0][1].multiply(jac[1][0]));
            Complex d0 = jac[1][1].multiply(r[0]).subtract(jac[0][1].multiply(r[1])).divide(det);
            Complex d1 = jac[0][0].multiply(r[1]).subtract(jac[1][0].multiply(r[0])).divide(det);
            if (!Double.isFinite(d0.norm()) || !Double.isFinite(d1.norm())) {
                throw new IllegalStateException("singular Jacobian");
            }
            x = new Complex[] {x[0].subtract(d0), x[1].subtract(d1)};
            r = f.of(x);
            double size = d0.norm() / (1 + x[0].norm()) + d1.norm() / (1 + x[1].norm());
            if (size <= 1e-15 || (it >= 3 && size > 0.5 * last && size < 1e-9)) {
                return errors(x, r, jac, v, z);
            }
            last = size;
        }
        throw new IllegalStateException("Newton's method did not converge");
    }

    private static Fit errors(Complex[] x, Complex[] r, Complex[][] jac, Painleve3Value v, Complex z) {
        double m = v.w().norm();
        double e1 = v.errW() / m + r[2].getReal();
        double e2 = v.errDw() * z.norm() / m + r[2].getImaginary();
        Complex det = jac[0][0].multiply(jac[1][1]).subtract(jac[0][1].multiply(jac[1][0]));
        double dn = det.norm();
        double err0 = (jac[1][1].norm() * e1 + jac[0][1].norm() * e2) / dn;
        double err1 = (jac[1][0].norm() * e1 + jac[0][0].norm() * e2) / dn;
        return new Fit(x[0], x[1], err0, err1, 0);
    }
}
