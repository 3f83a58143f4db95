package org.tertius.core.step;

import java.util.Arrays;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.StateProjection;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.pade.PadeApproximant;
import org.tertius.core.pade.PolynomialRoots;
import org.tertius.core.pade.RobustPade;
import org.tertius.core.taylor.DoubleTaylorKernel;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * Expands the solution at a point into a {@link Node} and steps from node to node.
 *
 * <p>Per node: Taylor coefficients from the recurrence plan; robust Pade approximants of two orders per
 * component (pole vaulting: Corliss, Math. Comp. 35 (1980); Fornberg and Weideman, J. Comput. Phys. 230
 * (2011)); a radius no larger than the estimated radius of convergence (root test), shrunk until the two
 * orders, together with the defect of each approximant against all known coefficients, agree to the
 * tolerance on the circle of that radius; and the poles of the approximants near the disk.
 *
 * <p>Error propagation: each node carries an absolute error vector e. Stepping to s, the new vector is
 * {@code Phi(s) e + local(s)}, where the directional derivative {@code Phi(s) e} of the flow is obtained by
 * expanding once more from the perturbed state {@code y + eta e} (a finite difference of the step map; common
 * practice for cheap first-order error propagation). Repeated application lines e up with the most expanding
 * direction, so error growth along unstable paths (where 1e-16 in the data becomes 1e-8 downstream) is seen
 * and reported rather than hidden.
 *
 * <p>Holds a kernel with work arrays: confined to one thread (the solution layer keeps one per thread).
 */
public final class TaylorPadeStepper {
    private static final int CIRCLE_POINTS = 8;
    private static final double SINGULARITY_WINDOW = 3.0;
    private static final double ROUNDING_ULPS = 2;
    /** Largest radius as a multiple of the estimated radius of convergence. */
    private static final double RHO_FACTOR = 1.0;
    /** Relative size of the perturbation used for the directional derivative. */
    private static final double ETA = 1e-7;
    /**
     * The largest relative rounding level that step control lets stand in for a tighter tolerance (see
     * {@link #controlled}): the rounding bound of double-precision Pade values in small disks (measured on the
     * demo solution of the README: 1.8e-15 at radii 1e-4 to 1e-6, 3e-13 at radius 0.1).
     */
    static final double ROUNDING_CAP = 2e-15;
    /**
     * The smallest rank tolerance of the robust Pade approximants: below it their rank decisions follow the
     * rounding of the Taylor coefficients (measured on the demo solution of the README: 1e-16 lost two to three
     * digits against 1e-15 at tolerance 1e-16).
     */
    static final double RANK_TOLERANCE_FLOOR = 1e-15;

    private final SolverSettings settings;
    private final DoubleTaylorKernel kernel;
    private final StateProjection projection;
    private final int n;
    private final int order;
    private final double[][] rawRe;
    private final double[][] rawIm;
    private final double[][] cRe;
    private final double[][] cIm;
    private final double[] val;
    private final double[] err;
    private final double[] rounding;
    private final double rankTolerance;
    private long expansions;

    public TaylorPadeStepper(PolynomialSystem system, RecurrencePlan plan, SolverSettings settings,
                             StateProjection projection) {
        this.settings = settings;
        this.order = settings.order();
        this.kernel = new DoubleTaylorKernel(plan, system, order);
        this.projection = projection;
        this.n = system.dimension();
        this.rawRe = new double[n][order + 1];
        this.rawIm = new double[n][order + 1];
        this.cRe = new double[n][order + 1];
        this.cIm = new double[n][order + 1];
        this.val = new double[2 * n];
        this.err = new double[n];
        this.rounding = new double[n];
        this.rankTolerance = rankTolerance(settings);
    }

    /**
     * The rank tolerance of the robust Pade approximants: the settings' one, lowered to the step tolerance when
     * that is tighter (a degree dropped at the rank tolerance leaves a misfit of about that size, which a
     * tolerance below it would chase with ever smaller steps), but not below {@link #RANK_TOLERANCE_FLOOR}.
     */
    static double rankTolerance(SolverSettings settings) {
        return Math.min(settings.padeTolerance(), Math.max(settings.tolerance(), RANK_TOLERANCE_FLOOR));
    }

    public SolverSettings settings() {
        return settings;
    }

    /** Number of Taylor expansions (recurrence runs) done by this stepper. */
    public long expansions() {
        return expansions;
    }

    public StateProjection projection() {
        return projection;
    }

    /**
     * Expands at tau into a node whose radius is adapted to the tolerance.
     *
     * @param id id of the new node
     * @param parent id of its parent or -1
     * @param yRe state, real parts (not modified)
     * @param yIm state, imaginary parts
     * @param eRe inherited absolute error vector, real parts (zeros at a start point)
     * @param eIm inherited absolute error vector, imaginary parts
     * @param radiusGuess first trial radius
     * @param maxRadius the largest radius allowed (for example half the distance to a singular point)
     */
    public Node expand(int id, int parent, double tRe, double tIm, double[] yRe, double[] yIm, double[] eRe,
                       double[] eIm, double radiusGuess, double maxRadius) {
        double tol = settings.tolerance();
        int m = order / 2;
        double r0 = Math.min(radiusGuess, maxRadius);
        computeRaw(tRe, tIm, yRe, yIm, r0, rawRe, rawIm);
        while (!finite(rawRe, rawIm) && r0 > 1e-14) {
            r0 *= 0.25;
            computeRaw(tRe, tIm, yRe, yIm, r0, rawRe, rawIm);
        }
        // the radius stays within the estimated radius of convergence: beyond it the scaled coefficients grow
        // and their rounding errors, shared by both Pade orders, would reach the values unseen
        double rho = r0 * convergenceRadius();
        double rMax = Math.min(maxRadius, RHO_FACTOR * rho);
        double r = Math.min(r0, rMax);
        PadeApproximant[] hi = new PadeApproximant[n];
        PadeApproximant[] lo = new PadeApproximant[n];
        double suggested = r;
        for (int iter = 0; iter < 30; iter++) {
            rescale(rawRe, rawIm, r / r0);
            for (int i = 0; i < n; i++) {
                hi[i] = RobustPade.approximate(cRe[i], cIm[i], m, m, rankTolerance, order);
                lo[i] = RobustPade.approximate(cRe[i], cIm[i], m - 1, m - 1, rankTolerance, order);
            }
            double e = circleError(hi, lo);
            double factor = Math.pow(tol / Math.max(e, 1e-300), 1.0 / m);
            if (!(e <= tol)) {
                if (r < 1e-13 * Math.max(1, ComplexPairs.abs(tRe, tIm))) {
                    break;
                }
                r *= Math.max(0.2, Math.min(0.9, 0.9 * factor));
                continue;
            }
            // accepted; the next node starts from a radius predicted by the error model e ~ r^m
            suggested = Math.min(rMax * 2, r * Math.max(0.5, Math.min(2.0, 0.9 * factor)));
            break;
        }
        double[] floor = new double[n];
        for (int i = 0; i < n; i++) {
            double mx = 0;
            for (int k = 0; k <= order; k++) {
                mx = Math.max(mx, ComplexPairs.abs(cRe[i][k], cIm[i][k]));
            }
            // rounding of the coefficients reaches the values in proportion to the largest one (common practice)
            floor[i] = ROUNDING_ULPS * Math.ulp(1.0) * mx;
        }
        double[][] sing = singularities(hi);
        // the solution through the perturbed state, for the inherited error anywhere in the disk
        PadeApproximant[] perturbed = null;
        double eta = 0;
        if (nonZero(eRe, eIm)) {
            eta = perturbationSize(yRe, yIm, eRe, eIm);
            perturbed = perturbedApproximants(tRe, tIm, yRe, yIm, eRe, eIm, eta, r0, r, m);
        }
        Node node = new Node(id, parent, tRe, tIm, yRe.clone(), yIm.clone(), r, hi, lo, sing[0], sing[1], floor,
                eRe.clone(), eIm.clone(), perturbed, eta, suggested);
        return node;
    }
    /** Expands a start node (no inherited error). */
    public Node expandStart(int id, double tRe, double tIm, double[] yRe, double[] yIm, double radiusGuess,
                            double maxRadius) {
        return expand(id, -1, tRe, tIm, yRe, yIm, new double[n], new double[n], radiusGuess, maxRadius);
    }

    /**
     * The relative local truncation error estimate of a node at the scaled point s (what step control acts
     * on): max over components of truncation error / (1 + |value|), each scaled by
     * {@code tol / max(tol, rounding level)} (see {@link #controlled}), so that comparing it with the tolerance
     * compares the truncation error with the larger of the tolerance and the rounding level. Rounding errors
     * are not included here but are carried into the error vector and the reported errors.
     */
    public double localError(Node node, double sr, double si) {
        node.localErrors(sr, si, val, err, rounding);
        double e = 0;
        for (int i = 0; i < n; i++) {
            double scale = 1 + ComplexPairs.abs(val[2 * i], val[2 * i + 1]);
            double rel = controlled(err[i] / scale, rounding[i] / scale, settings.tolerance());
            if (!Double.isFinite(rel)) {
                return Double.POSITIVE_INFINITY;
            }
            e = Math.max(e, rel);
        }
        return e;
    }

    /**
     * A relative truncation error as step control sees it: scaled by {@code tol / max(tol, level)}, where level
     * is the relative rounding level of the value capped at {@link #ROUNDING_CAP}. A truncation error below the
     * rounding of the coefficients and of the evaluation cannot be told from it, and no smaller step lowers
     * that rounding: a tolerance below it acts as that level (at most {@link #ROUNDING_CAP}), instead of
     * shrinking the steps towards zero after noise. Tolerances above the cap, the default among them, are not
     * affected.
     */
    static double controlled(double relativeTruncation, double relativeRounding, double tol) {
        double level = Math.min(relativeRounding, ROUNDING_CAP);
        return level > tol ? relativeTruncation * (tol / level) : relativeTruncation;
    }

    /**
     * Takes the step from a node to its scaled point s and expands the new node there. The new node's error
     * vector is the node's vector carried by the flow plus the local error of the step.
     */
    public Node step(Node from, double sr, double si, int id, double maxRadius) {
        double[] yRe = new double[n];
        double[] yIm = new double[n];
        double[] local = new double[n];
        from.evaluateScaled(sr, si, val, null, local, false);
        for (int i = 0; i < n; i++) {
            yRe[i] = val[2 * i];
            yIm[i] = val[2 * i + 1];
        }
        double[] eRe = new double[n];
        double[] eIm = new double[n];
        propagate(from, sr, si, eRe, eIm);
        for (int i = 0; i < n; i++) {
            double m = ComplexPairs.abs(eRe[i], eIm[i]);
            if (m > 0) {
                eRe[i] += local[i] * eRe[i] / m;
                eIm[i] += local[i] * eIm[i] / m;
            } else {
                eRe[i] = local[i];
            }
        }
        double tRe = from.tauRe() + from.radius() * sr;
        double tIm = from.tauIm() + from.radius() * si;
        projection.project(tRe, tIm, yRe, yIm);
        return expand(id, from.id(), tRe, tIm, yRe, yIm, eRe, eIm, from.suggestedRadius(), maxRadius);
    }

    /** The inherited error vector carried from the node to its scaled point s: Phi(s) e, absolute. */
    public void propagate(Node from, double sr, double si, double[] outRe, double[] outIm) {
        from.inheritedError(sr, si, outRe, outIm);
    }

    private double perturbationSize(double[] yRe, double[] yIm, double[] eRe, double[] eIm) {
        double rel = 0;
        for (int i = 0; i < n; i++) {
            rel = Math.max(rel, ComplexPairs.abs(eRe[i], eIm[i]) / (1 + ComplexPairs.abs(yRe[i], yIm[i])));
        }
        return ETA / rel;
    }

    private PadeApproximant[] perturbedApproximants(double tRe, double tIm, double[] yRe, double[] yIm,
                                                    double[] eRe, double[] eIm, double eta, double r0, double r,
                                                    int m) {
        double[] pr = new double[n];
        double[] pi = new double[n];
        for (int i = 0; i < n; i++) {
            pr[i] = yRe[i] + eta * eRe[i];
            pi[i] = yIm[i] + eta * eIm[i];
        }
        double[][] xr = new double[n][order + 1];
        double[][] xi = new double[n][order + 1];
        computeRaw(tRe, tIm, pr, pi, r0, xr, xi);
        rescale(xr, xi, r / r0);
        PadeApproximant[] out = new PadeApproximant[n];
        for (int i = 0; i < n; i++) {
            out[i] = RobustPade.approximate(cRe[i], cIm[i], m, m, rankTolerance, order);
        }
        return out;
    }

    private double[][] singularities(PadeApproximant[] hi) {
        double[] sr = new double[0];
        double[] si = new double[0];
        for (int i = 0; i < n; i++) {
            double[][] roots = PolynomialRoots.roots(hi[i].denominatorRe(), hi[i].denominatorIm());
            for (int j = 0; j < roots[0].length; j++) {
                double x = roots[0][j];
                double y = roots[1][j];
                if (Double.isFinite(x) && Double.isFinite(y) && ComplexPairs.abs(x, y) < SINGULARITY_WINDOW) {
                    sr = Arrays.copyOf(sr, sr.length + 1);
                    si = Arrays.copyOf(si, si.length + 1);
                    sr[sr.length - 1] = x;
                    si[si.length - 1] = y;
                }
            }
        }
        return new double[][] {sr, si};
    }

    private static boolean nonZero(double[] re, double[] im) {
        for (int i = 0; i < re.length; i++) {
            if (re[i] != 0 || im[i] != 0) {
                return true;
            }
        }
        return false;
    }

    /**
     * Radius of convergence of the raw series in units of the raw scale: 1 / max_k s_k^(1/k) over
     * k in [N/3, N], with s_k = max_i |c_ik| / (1 + |c_i0|) (root test).
     */
    private double convergenceRadius() {
        double g = 0;
        for (int k = Math.max(1, order / 3); k <= order; k++) {
            double s = 0;
            for (int i = 0; i < n; i++) {
                s = Math.max(s, ComplexPairs.abs(rawRe[i][k], rawIm[i][k]) / (1 + ComplexPairs.abs(rawRe[i][0], rawIm[i][0])));
            }
            if (s > 0) {
                g = Math.max(g, Math.pow(s, 1.0 / k));
            }
        }
        return g == 0 ? 1e6 : 1 / g;
    }

    private void computeRaw(double tRe, double tIm, double[] yRe, double[] yIm, double scale, double[][] outRe,
                            double[][] outIm) {
        kernel.coefficients(tRe, tIm, yRe, yIm, scale, outRe, outIm);
        expansions++;
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

    /** Scaled coefficients c[i][k] = raw[i][k] f^k into the work arrays. */
    private void rescale(double[][] re, double[][] im, double f) {
        for (int i = 0; i < n; i++) {
            double p = 1;
            for (int k = 0; k <= order; k++) {
                cRe[i][k] = re[i][k] * p;
                cIm[i][k] = im[i][k] * p;
                p *= f;
            }
        }
    }

    /**
     * Second largest over points of the unit circle of the relative local error estimate, as step control sees
     * it ({@link #controlled}: tolerances below the rounding level act as that level).
     */
    private double circleError(PadeApproximant[] hi, PadeApproximant[] lo) {
        double tol = settings.tolerance();
        boolean belowCap = tol < ROUNDING_CAP;
        double[] a = new double[belowCap ? 5 : 4];
        double[] b = new double[4];
        double[] coefficientRounding = new double[n];
        if (belowCap) {
            for (int i = 0; i < n; i++) {
                double mx = 0;
                for (int k = 0; k <= order; k++) {
                    mx = Math.max(mx, ComplexPairs.abs(cRe[i][k], cIm[i][k]));
                }
                coefficientRounding[i] = ROUNDING_ULPS * Math.ulp(1.0) * mx;
            }
        }
        double[] es = new double[CIRCLE_POINTS];
        for (int p = 0; p < CIRCLE_POINTS; p++) {
            double th = 2 * Math.PI * p / CIRCLE_POINTS + 0.1;
            double sr = Math.cos(th);
            double si = Math.sin(th);
            double e = 0;
            for (int i = 0; i < n; i++) {
                hi[i].evaluate(sr, si, a);
                lo[i].evaluate(sr, si, b);
                double scale = 1 + ComplexPairs.abs(a[0], a[1]);
                double rel = (ComplexPairs.abs(a[0] - b[0], a[1] - b[1]) + a[3] + b[3]) / scale;
                if (belowCap) {
                    rel = controlled(rel, (a[4] + coefficientRounding[i]) / scale, tol);
                }
                e = Math.max(e, Double.isFinite(rel) ? rel : Double.POSITIVE_INFINITY);
            }
            es[p] = e;
        }
        Arrays.sort(es);
        return es[CIRCLE_POINTS - 2];
    }
}
