package org.tertius.connection.match;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;

/**
 * Finds the behaviour at z = 0 ({@link ZeroBehaviour}) of a computed Painleve III solution from its values near 0
 * on one ray of one sheet (double precision, core engine).
 *
 * <p><b>Exponent</b> (derived here). With w = z g and t = log z the equation is {@code (log g)'' = beta/g +
 * delta/g^2 + alpha z w + gamma z^2 w^2}, so
 * <pre>  E = [(z w' - w)^2 + 2 beta z w + delta z^2] / (2 w^2)   satisfies  dE/dt = (z w'/w - 1)(alpha z w + gamma z^2 w^2),</pre>
 * constant up to terms of the size of X = z^(1+sigma); its limit is k^2/2, k = 1 - sigma (the reduced solutions
 * {@code g = beta/k^2 + a cosh(k (t - t0))} have this energy). The same for 1/w (a solution of PIII(-beta, -alpha,
 * -delta, -gamma)) gives {@code E~ = [(z w' + w)^2 - 2 alpha z w^3 - gamma z^2 w^4] / (2 w^2) -> (1 + sigma)^2/2}, constant
 * up to O(z^(1-sigma)). The invariant that settles faster along the samples gives sigma = 1 - sqrt(2E) (Re sqrt
 * &gt;= 0) or sigma = sqrt(2 E~) - 1, with an error from the last differences (geometric decay assumed, checked) and the
 * propagated data errors. sigma is then refined with the second parameter by {@link ExpansionFit} at several radii
 * and the spread between the radii is added to the error estimate.
 *
 * <p><b>Kinds</b>: |1 - sigma| within 3 error estimates of 0 (or |1 + sigma|): logarithmic, confirmed by fits of t0
 * that agree between the radii; Re sigma within 3 estimates of +-1: edge (zeros or poles accumulate); otherwise
 * power. Anything not confirmed (no settling invariant, Newton failing, radii disagreeing beyond their estimates)
 * is {@link ZeroBehaviour.Kind#UNDECIDED} with the reason. Thread-safe (the solution is).
 */
public final class ZeroBehaviourFit {
    /** Largest and smallest sample radius. */
    public static final double R_MAX = 1e-2;
    public static final double R_MIN = 1e-8;
    private static final int SAMPLES = 13;

    private ZeroBehaviourFit() {
    }

    /** A sample: log coordinate, value and the two invariants with their error estimates. */
    static final class Sample {
        final Complex tau;
        final Painleve3Value value;
        final Complex e;
        final double errE;
        final Complex eTilde;
        final double errETilde;

        Sample(Complex tau, Painleve3Value value, Complex e, double errE, Complex eTilde, double errETilde) {
            this.tau = tau;
            this.value = value;
            this.e = e;
            this.errE = errE;
            this.eTilde = eTilde;
            this.errETilde = errETilde;
        }
    }

    /**
     * The behaviour at 0 of {@code solution}, read on the ray arg z = angle of sheet {@code sheet} (log coordinate
     * Im tau = angle + 2 pi sheet).
     *
     * @throws InvalidInputException for a non-finite angle
     */
    public static ZeroBehaviour analyse(Painleve3Solution solution, double angle, int sheet) {
        InvalidInputException.requireFinite("angle", angle);
        Painleve3 eq = solution.equation();
        double phase = angle + 2 * Math.PI * sheet;
        List<Sample> samples = new ArrayList<>();
        List<String> failures = new ArrayList<>();
        for (int j = 0; j < SAMPLES; j++) {
            double r = R_MAX * Math.pow(R_MIN / R_MAX, j / (double) (SAMPLES - 1));
            Complex tau = new Complex(Math.log(r), phase);
            try {
                Painleve3Value v = solution.evaluate(SurfacePoint.fromLog(tau.getReal(), tau.getImaginary()));
                if (v.w().norm() > 0 && Double.isFinite(v.w().norm()) && Double.isFinite(v.dw().norm())) {
                    samples.add(sample(eq, tau, v));
                }
            } catch (TertiusException ex) {
                failures.add("|z| = " + r + ": " + ex.getMessage());
            }
        }
        if (samples.size() < 5) {
            return ZeroBehaviour.undecided(Complex.NaN, Double.NaN, "the solution could not be evaluated near 0 on"
                    + " this ray (" + failures.size() + " of " + SAMPLES + " points failed" + (failures.isEmpty() ? ""
                    : ", e.g. " + failures.get(0)) + ")");
        }
        Limit direct = limit(samples, false);
        Limit reciprocal = limit(samples, true);
        Limit best = direct.error <= reciprocal.error ? direct : reciprocal;
        if (!(best.error < 0.1)) {
            return ZeroBehaviour.undecided(best.sigma, best.error, "neither invariant settles near 0 on this ray"
                    + " (sigma estimates " + direct.sigma + " +- " + direct.error + " and " + reciprocal.sigma + " +- "
                    + reciprocal.error + ")");
        }
        ExpansionFit fit = new ExpansionFit(eq);
        int side = best.reciprocal ? -1 : 1;
        double kError = best.kError;
        if (best.k.norm() <= 3 * kError) {
            ZeroBehaviour log = fit.logarithmic(samples, side);
            if (log.kind() == ZeroBehaviour.Kind.LOGARITHMIC) {
                return log;
            }
            ZeroBehaviour power = fit.power(samples, best.sigma);
            boolean resolved = power.sigmaError() < 0.5 * power.sigma().subtract(side).norm();
            if (power.kind() != ZeroBehaviour.Kind.UNDECIDED && resolved) {
                return power;
            }
            return ZeroBehaviour.undecided(best.sigma, best.error, "sigma is within " + 3 * kError + " of " + side
                    + " but neither the logarithmic fit (" + log.note() + ") nor the power fit (" + power.note()
                    + ") is consistent between the radii");
        }
        return fit.power(samples, best.sigma);
    }

    private static Sample sample(Painleve3 eq, Complex tau, Painleve3Value v) {
        Complex z = tau.exp();
        Complex w = v.w();
        Complex dw = v.dw();
        Complex zdw = z.multiply(dw);
        Complex w2 = w.multiply(w);
        double eps = 0x1p-52;
        // E = [(z w' - w)^2 + 2 beta z w + delta z^2] / (2 w^2)
        Complex m = zdw.subtract(w);
        Complex n = m.multiply(m).add(eq.beta().multiply(z).multiply(w).multiply(2)).add(eq.delta().multiply(z.multiply(z)));
        Complex e = n.divide(w2.multiply(2));
        Complex dnw = m.multiply(-2).add(eq.beta().multiply(z).multiply(2));
        Complex dndw = z.multiply(m).multiply(2);
        double errE = (dnw.divide(w2.multiply(2)).subtract(n.divide(w2.multiply(w))).norm() * v.errW()
                + dndw.divide(w2.multiply(2)).norm() * v.errDw())
                + 8 * eps * (m.norm() * m.norm() + 2 * eq.beta().multiply(z).multiply(w).norm()
                + eq.delta().multiply(z.multiply(z)).norm()) / (2 * w2.norm());
        // E~ = [(z w' + w)^2 - 2 alpha z w^3 - gamma z^2 w^4] / (2 w^2)
        Complex p = zdw.add(w);
        Complex a3 = eq.alpha().multiply(z).multiply(w2.multiply(w)).multiply(2);
        Complex g4 = eq.gamma().multiply(z.multiply(z)).multiply(w2.multiply(w2));
        Complex nt = p.multiply(p).subtract(a3).subtract(g4);
        Complex et = nt.divide(w2.multiply(2));
        Complex dntw = p.multiply(2).subtract(eq.alpha().multiply(z).multiply(w2).multiply(6))
                .subtract(eq.gamma().multiply(z.multiply(z)).multiply(w2.multiply(w)).multiply(4));
        Complex dntdw = z.multiply(p).multiply(2);
        double errEt = (dntw.divide(w2.multiply(2)).subtract(nt.divide(w2.multiply(w))).norm() * v.errW()
                + dntdw.divide(w2.multiply(2)).norm() * v.errDw())
                + 8 * eps * (p.norm() * p.norm() + a3.norm() + g4.norm()) / (2 * w2.norm());
        return new Sample(tau, v, e, errE, et, errEt);
    }

    /** The limit of an invariant along the samples and the exponent it gives. */
    static final class Limit {
        final boolean reciprocal;
        final Complex sigma;
        final Complex k;
        final double kError;
        final double error;

        Limit(boolean reciprocal, Complex sigma, Complex k, double kError, double error) {
            this.reciprocal = reciprocal;
            this.sigma = sigma;
            this.k = k;
            this.kError = kError;
            this.error = error;
        }
    }

    /**
     * E (or E~) at the smallest radius with an error from the last differences: if the last three differences
     * decay, the tail d_last q/(1 - q), q their ratio (at most 0.9); otherwise the largest of them (noise floor).
     */
    static Limit limit(List<Sample> s, boolean reciprocal) {
        int n = s.size();
        Complex[] e = new Complex[n];
        double[] err = new double[n];
        for (int i = 0; i < n; i++) {
            e[i] = reciprocal ? s.get(i).eTilde : s.get(i).e;
            err[i] = reciprocal ? s.get(i).errETilde : s.get(i).errE;
        }
        double d1 = e[n - 1].subtract(e[n - 2]).norm();
        double d2 = e[n - 2].subtract(e[n - 3]).norm();
        double d3 = e[n - 3].subtract(e[n - 4]).norm();
        double floor = err[n - 1] + err[n - 2];
        double tail;
        if (d1 <= floor) {
            tail = floor;
        } else if (d1 < d2 && d2 < d3) {
            double q = Math.min(0.9, Math.max(d1 / d2, d2 / d3));
            tail = d1 * q / (1 - q);
        } else {
            tail = Math.max(d1, Math.max(d2, d3));
        }
        double errE = tail + err[n - 1];
        Complex k = e[n - 1].multiply(2).sqrt();
        double kError = k.norm() * k.norm() > errE ? errE / k.norm() : Math.sqrt(2 * errE);
        Complex sigma = reciprocal ? k.subtract(1) : Complex.ONE.subtract(k);
        if (!Double.isFinite(kError)) {
            kError = Double.POSITIVE_INFINITY;
        }
        return new Limit(reciprocal, sigma, k, kError, kError);
    }
}
