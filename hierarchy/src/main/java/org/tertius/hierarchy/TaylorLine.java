package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.concurrent.CancellationException;
import java.util.function.BooleanSupplier;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.taylor.DoubleTaylorKernel;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * One solution of a core {@link PolynomialSystem} along the straight line {@code tau = tau0 + u d}, u in
 * [0, length], |d| = 1, by Taylor steps of the core's recurrence ({@link DoubleTaylorKernel}) without Pade
 * approximants: the cheap integrator for lines that stay clear of the solution's singularities (the real plane
 * of a focusing NLS solution), with dense output of chosen components.
 *
 * <p>Step control (common practice for high-order Taylor methods, e.g. Jorba and Zou, Exp. Math. 14 (2005)): the
 * step h keeps the last two terms of every component below tolerance * (1 + |y_i|) and h at most half the
 * radius of convergence estimated from the coefficients. Errors: the local truncation error of a step at
 * fraction sigma is taken as twice the last two terms at sigma, plus a rounding floor of 4 ulps of the largest
 * term; the inherited error vector e is carried by the flow to first order through the solution started at
 * y + eta e (as the core engine does), and the local error is added to it in its direction. Estimates, not
 * bounds. A step below 1e-12 of the scale, or more than maxSteps steps, ends with an
 * {@link UnreachableTargetException} (a singularity close to the line). Immutable once built; thread-safe.
 */
public final class TaylorLine {
    /** Truncation safety factor and rounding floor in ulps of the largest term (common practice). */
    private static final double TRUNCATION_SAFETY = 2;
    private static final double ROUNDING_ULPS = 4;
    /** Relative size of the perturbation that carries the error vector (about the square root of eps). */
    private static final double PERTURBATION = 1e-7;

    private final Complex start;
    private final Complex direction;
    private final int[] components;
    private final int order;
    private final double[] begin;
    private final double[] width;
    /** Per step and stored component: Taylor coefficients (scaled to sigma in [0, 1]) of y and of Phi e. */
    private final List<double[][]> coefficients;
    /** Per step and stored component: {|c_{N-1}|, |c_N|, rounding floor}. */
    private final List<double[][]> tails;
    private final double reached;

    private TaylorLine(Complex start, Complex direction, int[] components, int order, List<Double> begin,
                       List<Double> width, List<double[][]> coefficients, List<double[][]> tails, double reached) {
        this.start = start;
        this.direction = direction;
        this.components = components;
        this.order = order;
        this.begin = begin.stream().mapToDouble(Double::doubleValue).toArray();
        this.width = width.stream().mapToDouble(Double::doubleValue).toArray();
        this.coefficients = coefficients;
        this.tails = tails;
        this.reached = reached;
    }

    /**
     * Integrates from tau0 along d for the given length.
     *
     * @param system the system (PLAIN or LOG; the line is in its integration variable tau)
     * @param order the Taylor order N (8 .. 60)
     * @param tolerance accepted truncation error per step, relative to 1 + |y_i|
     * @param tau0 the start point
     * @param direction the direction d (normalised here)
     * @param length how far to go (&gt;= 0)
     * @param y0 the start state
     * @param e0 the absolute errors of the start state (carried as a real vector)
     * @param components the unknowns kept for dense output
     * @param maxSteps the step budget
     * @param cancelled polled once per step; when true the integration stops with a {@link CancellationException}
     */
    public static TaylorLine integrate(PolynomialSystem system, int order, double tolerance, Complex tau0,
                                       Complex direction, double length, Complex[] y0, double[] e0, int[] components,
                                       int maxSteps, BooleanSupplier cancelled) {
        int n = system.dimension();
        if (order < 8 || order > 60 || !(tolerance > 0) || !(length >= 0) || !Double.isFinite(length)
                || direction.norm() == 0 || y0.length != n || e0.length != n) {
            throw new InvalidInputException("line", "needs order in [8, 60], tolerance > 0, a finite length >= 0,"
                    + " a non-zero direction and " + n + " start values and errors");
        }
        Complex d = direction.divide(direction.norm());
        DoubleTaylorKernel kernel = new DoubleTaylorKernel(RecurrencePlan.compile(system), system, order);
        Stepper s = new Stepper(kernel, n, order, tolerance, components);
        double[] yRe = new double[n];
        double[] yIm = new double[n];
        double[] eRe = new double[n];
        double[] eIm = new double[n];
        for (int i = 0; i < n; i++) {
            yRe[i] = y0[i].getReal();
            yIm[i] = y0[i].getImaginary();
            eRe[i] = e0[i];
        }
        List<Double> begin = new ArrayList<>();
        List<Double> width = new ArrayList<>();
        List<double[][]> coefficients = new ArrayList<>();
        List<double[][]> tails = new ArrayList<>();
        double u = 0;
        double guess = Math.min(0.25, Math.max(length, 1e-3));
        double scale = 1 + tau0.norm() + length;
        int steps = 0;
        do {
            if (cancelled.getAsBoolean()) {
                throw new CancellationException("line integration cancelled");
            }
            if (++steps > maxSteps) {
                throw new UnreachableTargetException("the line needs more than " + maxSteps + " Taylor steps at u = "
                        + u + " (stiff, or a singularity close to it)");
            }
            Complex tau = tau0.add(d.multiply(u));
            // a line of length 0 still takes one step, so that its start can be evaluated
            double h = s.step(tau, d, yRe, yIm, eRe, eIm, guess, length > 0 ? length - u : guess);
            if (h < 1e-12 * scale) {
                throw new UnreachableTargetException("Taylor steps collapse at u = " + u + " (a singularity close to"
                        + " the line)");
            }
            begin.add(u);
            width.add(h);
            coefficients.add(s.stored());
            tails.add(s.storedTails());
            s.advance(yRe, yIm, eRe, eIm);
            u = u + h >= length * (1 - 1e-15) ? length : u + h;
            guess = s.nextGuess();
        } while (u < length);
        u = Math.min(u, length);
        return new TaylorLine(tau0, d, components.clone(), order, begin, width, coefficients, tails, u);
    }

    /** The start point tau0. */
    public Complex start() {
        return start;
    }

    /** The unit direction d. */
    public Complex direction() {
        return direction;
    }

    /** Number of steps taken. */
    public int steps() {
        return begin.length;
    }

    /** The length covered. */
    public double length() {
        return reached;
    }

    /**
     * The stored component k (index into the components given to {@link #integrate}) at u in [0, length]:
     * {re, im, estimated absolute error}.
     */
    public double[] value(int k, double u) {
        int j = piece(u);
        double sigma = Math.min(1, (u - begin[j]) / width[j]);
        double[][] c = coefficients.get(j);
        int base = 4 * k;
        double vr = 0;
        double vi = 0;
        double dr = 0;
        double di = 0;
        for (int m = order; m >= 0; m--) {
            vr = vr * sigma + c[base][m];
            vi = vi * sigma + c[base + 1][m];
            dr = dr * sigma + c[base + 2][m];
            di = di * sigma + c[base + 3][m];
        }
        double[] t = tails.get(j)[k];
        double trunc = TRUNCATION_SAFETY * (t[0] * Math.pow(sigma, order - 1) + t[1] * Math.pow(sigma, order));
        return new double[] {vr, vi, Math.hypot(dr, di) + trunc + t[2]};
    }

    /** d/du of the stored component k at u (d/dtau = conj(d) d/du for |d| = 1): {re, im}. */
    public double[] derivative(int k, double u) {
        int j = piece(u);
        double sigma = Math.min(1, (u - begin[j]) / width[j]);
        double[][] c = coefficients.get(j);
        double vr = 0;
        double vi = 0;
        for (int m = order; m >= 1; m--) {
            vr = vr * sigma + m * c[4 * k][m];
            vi = vi * sigma + m * c[4 * k + 1][m];
        }
        return new double[] {vr / width[j], vi / width[j]};
    }

    /** The work arrays of one integration (one thread). */
    private static final class Stepper {
        private final DoubleTaylorKernel kernel;
        private final int n;
        private final int order;
        private final double tolerance;
        private final int[] components;
        private final double[][] cRe;
        private final double[][] cIm;
        private final double[][] pRe;
        private final double[][] pIm;
        private double eta;
        private double next;

        Stepper(DoubleTaylorKernel kernel, int n, int order, double tolerance, int[] components) {
            this.kernel = kernel;
            this.n = n;
            this.order = order;
            this.tolerance = tolerance;
            this.components = components;
            this.cRe = new double[n][order + 1];
            this.cIm = new double[n][order + 1];
            this.pRe = new double[n][order + 1];
            this.pIm = new double[n][order + 1];
        }

        /** Expands at tau and fixes the step h &lt;= remaining; the coefficients are left scaled to h along d. */
        double step(Complex tau, Complex d, double[] yRe, double[] yIm, double[] eRe, double[] eIm, double guess,
                    double remaining) {
            double r = Math.max(guess, 1e-300);
            kernel.coefficients(tau.getReal(), tau.getImaginary(), yRe, yIm, r, cRe, cIm);
            while (!finite(cRe, cIm) && r > 1e-300) {
                r *= 0.25;
                kernel.coefficients(tau.getReal(), tau.getImaginary(), yRe, yIm, r, cRe, cIm);
            }
            rotate(cRe, cIm, d);
            double radius = r * radius(yRe, yIm);
            double last = 0;
            for (int i = 0; i < n; i++) {
                double a = Math.hypot(cRe[i][order - 1], cIm[i][order - 1]) + Math.hypot(cRe[i][order], cIm[i][order]);
                last = Math.max(last, a / (1 + Math.hypot(yRe[i], yIm[i])));
            }
            double sigma = last == 0 ? 4 : 0.9 * Math.pow(tolerance / last, 1.0 / (order - 1));
            double h = Math.min(Math.min(sigma * r, 0.5 * radius), remaining);
            rescale(cRe, cIm, h / r);
            next = Math.min(2 * h, Math.max(sigma * r, 0.5 * h));
            // the solution through y + eta e, for the inherited error
            double rel = 0;
            for (int i = 0; i < n; i++) {
                rel = Math.max(rel, Math.hypot(eRe[i], eIm[i]) / (1 + Math.hypot(yRe[i], yIm[i])));
            }
            eta = rel == 0 ? 0 : PERTURBATION / rel;
            if (eta > 0) {
                double[] zRe = new double[n];
                double[] zIm = new double[n];
                for (int i = 0; i < n; i++) {
                    zRe[i] = yRe[i] + eta * eRe[i];
                    zIm[i] = yIm[i] + eta * eIm[i];
                }
                kernel.coefficients(tau.getReal(), tau.getImaginary(), zRe, zIm, h, pRe, pIm);
                rotate(pRe, pIm, d);
                for (int i = 0; i < n; i++) {
                    for (int k = 0; k <= order; k++) {
                        pRe[i][k] = (pRe[i][k] - cRe[i][k]) / eta;
                        pIm[i][k] = (pIm[i][k] - cIm[i][k]) / eta;
                    }
                }
            } else {
                for (int i = 0; i < n; i++) {
                    Arrays.fill(pRe[i], 0);
                    Arrays.fill(pIm[i], 0);
                }
            }
            return h;
        }

        double nextGuess() {
            return next;
        }

        /** The estimated radius of convergence in units of the current scale (as the core's stepper). */
        private double radius(double[] yRe, double[] yIm) {
            double g = 0;
            for (int k = Math.max(1, order / 3); k <= order; k++) {
                double s = 0;
                for (int i = 0; i < n; i++) {
                    s = Math.max(s, Math.hypot(cRe[i][k], cIm[i][k]) / (1 + Math.hypot(yRe[i], yIm[i])));
                }
                if (s > 0) {
                    g = Math.max(g, Math.pow(s, 1.0 / k));
                }
            }
            return g == 0 ? 1e6 : 1 / g;
        }

        double[][] stored() {
            double[][] out = new double[4 * components.length][];
            for (int k = 0; k < components.length; k++) {
                int i = components[k];
                out[4 * k] = cRe[i].clone();
                out[4 * k + 1] = cIm[i].clone();
                out[4 * k + 2] = pRe[i].clone();
                out[4 * k + 3] = pIm[i].clone();
            }
            return out;
        }

        double[][] storedTails() {
            double[][] out = new double[components.length][];
            for (int k = 0; k < components.length; k++) {
                out[k] = tail(components[k]);
            }
            return out;
        }

        private double[] tail(int i) {
            double max = 0;
            for (int k = 0; k <= order; k++) {
                max = Math.max(max, Math.hypot(cRe[i][k], cIm[i][k]));
            }
            return new double[] {Math.hypot(cRe[i][order - 1], cIm[i][order - 1]),
                Math.hypot(cRe[i][order], cIm[i][order]), ROUNDING_ULPS * Math.ulp(1.0) * max};
        }

        /** Moves y and e to the end of the step (sigma = 1). */
        void advance(double[] yRe, double[] yIm, double[] eRe, double[] eIm) {
            for (int i = 0; i < n; i++) {
                double vr = 0;
                double vi = 0;
                double dr = 0;
                double di = 0;
                for (int k = order; k >= 0; k--) {
                    vr += cRe[i][k];
                    vi += cIm[i][k];
                    dr += pRe[i][k];
                    di += pIm[i][k];
                }
                double[] t = tail(i);
                double local = TRUNCATION_SAFETY * (t[0] + t[1]) + t[2];
                double m = Math.hypot(dr, di);
                yRe[i] = vr;
                yIm[i] = vi;
                if (m > 0) {
                    eRe[i] = dr + local * dr / m;
                    eIm[i] = di + local * di / m;
                } else {
                    eRe[i] = local;
                    eIm[i] = 0;
                }
            }
        }

        /** Coefficients in s (tau = tau0 + r s) to coefficients in sigma along d (s = d sigma): c_k d^k. */
        private void rotate(double[][] re, double[][] im, Complex d) {
            for (int i = 0; i < n; i++) {
                double pr = 1;
                double pi = 0;
                for (int k = 0; k <= order; k++) {
                    double a = re[i][k] * pr - im[i][k] * pi;
                    double b = re[i][k] * pi + im[i][k] * pr;
                    re[i][k] = a;
                    im[i][k] = b;
                    double t = pr * d.getReal() - pi * d.getImaginary();
                    pi = pr * d.getImaginary() + pi * d.getReal();
                    pr = t;
                }
            }
        }

        private void rescale(double[][] re, double[][] im, double f) {
            for (int i = 0; i < n; i++) {
                double p = 1;
                for (int k = 0; k <= order; k++) {
                    re[i][k] *= p;
                    im[i][k] *= p;
                    p *= f;
                }
            }
        }

        private boolean finite(double[][] re, double[][] im) {
            for (int i = 0; i < n; i++) {
                for (int k = 0; k <= order; k++) {
                    if (!Double.isFinite(re[i][k]) || !Double.isFinite(im[i][k])) {
                        return false;
                    }
                }
            }
            return true;
        }
    }

    /** The index of the stored piece that covers u in [0, length]. */
    private int piece(double u) {
        if (!(u >= 0 && u <= reached)) {
            throw new InvalidInputException("u", "must lie in [0, " + reached + "], got " + u);
        }
        int j = Arrays.binarySearch(begin, u);
        if (j < 0) {
            j = -j - 2;
        }
        return Math.max(0, Math.min(j, begin.length - 1));
    }
}
