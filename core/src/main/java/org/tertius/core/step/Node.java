package org.tertius.core.step;

import java.util.Arrays;
import org.tertius.core.number.ComplexPairs;
import org.tertius.core.pade.PadeApproximant;

/**
 * One expansion point of a path tree: its position tau (in the integration variable), the state there,
 * the radius r of its disk, the Pade approximants of every component in the scaled variable
 * {@code s = (tau - tau0) / r} (two orders, whose difference estimates the error), the singularities of the
 * approximants near the disk, and the error already accumulated on the way from the start.
 *
 * <p>Immutable and thread-safe.
 */
public final class Node {
    /**
     * Per-thread work arrays of an evaluation (a node is shared between threads): evaluations run by the million
     * in a grid pass, and the quick compiler of short runs does not keep such arrays off the heap.
     */
    private static final ThreadLocal<double[][]> EVALUATION =
            ThreadLocal.withInitial(() -> new double[][] {new double[5], new double[4]});

    /**
     * Safety factor on the local error in what is reported and propagated: the difference of two orders is an
     * estimate, not a bound (common practice; calibrated on the reference tests, where the true error came up
     * to twice the unscaled estimate).
     */
    static final double SAFETY = 3.0;
    /**
     * Safety factor on the inherited error in what is reported: it is carried along one direction only (the
     * local errors are added along the carried vector, whose direction the flow then lines up with its most
     * expanding one), while the local errors of a path have other directions, which the flow may amplify more
     * (common practice; measured: up to 1.15 times the unscaled estimate on paths of the complex D6 reference
     * scenario that pass a zero of w, where the carried vector turns towards the companion unknown).
     */
    static final double INHERITED_SAFETY = 2.0;
    private final int id;
    private final int parent;
    private final double tauRe;
    private final double tauIm;
    private final double[] yRe;
    private final double[] yIm;
    private final double radius;
    private final PadeApproximant[] high;
    private final PadeApproximant[] low;
    private final double[] singRe;
    private final double[] singIm;
    private final double[] roundingFloor;
    private final double[] errRe;
    private final double[] errIm;
    private final PadeApproximant[] perturbed;
    private final double eta;
    private final double accumulatedError;
    private final double suggestedRadius;

    Node(int id, int parent, double tauRe, double tauIm, double[] yRe, double[] yIm, double radius,
         PadeApproximant[] high, PadeApproximant[] low, double[] singRe, double[] singIm,
         double[] roundingFloor, double[] errRe, double[] errIm, PadeApproximant[] perturbed, double eta,
         double suggestedRadius) {
        this.id = id;
        this.parent = parent;
        this.tauRe = tauRe;
        this.tauIm = tauIm;
        this.yRe = yRe;
        this.yIm = yIm;
        this.radius = radius;
        this.high = high;
        this.low = low;
        this.singRe = singRe;
        this.singIm = singIm;
        this.roundingFloor = roundingFloor;
        this.errRe = errRe;
        this.errIm = errIm;
        this.perturbed = perturbed;
        this.eta = eta;
        this.suggestedRadius = suggestedRadius;
        double acc = 0;
        for (int i = 0; i < yRe.length; i++) {
            acc = Math.max(acc, ComplexPairs.abs(errRe[i], errIm[i]) / (1 + ComplexPairs.abs(yRe[i], yIm[i])));
        }
        this.accumulatedError = acc;
    }

    /** Returns a copy of this node with a new id and parent (used when a path is merged into a tree). */
    public Node renumbered(int newId, int newParent) {
        return new Node(newId, newParent, tauRe, tauIm, yRe, yIm, radius, high, low, singRe, singIm,
                roundingFloor, errRe, errIm, perturbed, eta, suggestedRadius);
    }

    public int id() {
        return id;
    }

    /** Id of the node this one was stepped from, or -1 for a root. */
    public int parent() {
        return parent;
    }

    public double tauRe() {
        return tauRe;
    }

    public double tauIm() {
        return tauIm;
    }

    public double radius() {
        return radius;
    }

    /** The radius to try first at a node stepped to from this one (from this node's error model). */
    public double suggestedRadius() {
        return suggestedRadius;
    }

    public int dimension() {
        return yRe.length;
    }

    public double stateRe(int i) {
        return yRe[i];
    }

    public double stateIm(int i) {
        return yIm[i];
    }

    /**
     * Error accumulated from the start to this node, relative: max_i |e_i| / (1 + |y_i|), where e is the
     * propagated error vector (see {@link TaylorPadeStepper}).
     */
    public double accumulatedError() {
        return accumulatedError;
    }

    /** Component i of the propagated (absolute) error vector at the node, real part. */
    public double errorRe(int i) {
        return errRe[i];
    }

    /** Component i of the propagated (absolute) error vector at the node, imaginary part. */
    public double errorIm(int i) {
        return errIm[i];
    }

    /**
     * The inherited error vector carried by the flow from the node to the scaled point s: {@code Phi(s) e},
     * from the approximants of the solution through the perturbed state {@code y + eta e} (a directional
     * finite difference); zeros when the node carries no error.
     */
    public void inheritedError(double sr, double si, double[] outRe, double[] outIm) {
        if (perturbed == null) {
            Arrays.fill(outRe, 0);
            Arrays.fill(outIm, 0);
            return;
        }
        double[] a = new double[4];
        double[] b = new double[4];
        for (int i = 0; i < high.length; i++) {
            high[i].evaluate(sr, si, a);
            perturbed[i].evaluate(sr, si, b);
            double dRe = (b[0] - a[0]) / eta;
            double dIm = (b[1] - a[1]) / eta;
            double linear = ComplexPairs.abs(dRe, dIm);
            // the same direction, the size of the reciprocal model next to a pole (see reciprocalModel)
            double f = linear > 0 ? reciprocalModel(ComplexPairs.abs(a[0], a[1]), ComplexPairs.abs(b[0], b[1]), linear) / linear : 1;
            outRe[i] = dRe * f;
            outIm[i] = dIm * f;
            if (!Double.isFinite(outRe[i]) || !Double.isFinite(outIm[i])) {
                outRe[i] = Double.POSITIVE_INFINITY;
                outIm[i] = 0;
            }
        }
    }

    /** Number of singularities (poles of the approximants of any component) recorded near the disk. */
    public int singularityCount() {
        return singRe.length;
    }

    /** Position (tau) of singularity j, real part. */
    public double singularityRe(int j) {
        return tauRe + radius * singRe[j];
    }

    /** Position (tau) of singularity j, imaginary part. */
    public double singularityIm(int j) {
        return tauIm + radius * singIm[j];
    }

    /** Singularity j in the scaled variable s. */
    double singularityS(int j, boolean imag) {
        return imag ? singIm[j] : singRe[j];
    }

    public PadeApproximant approximant(int component) {
        return high[component];
    }

    public PadeApproximant lowerApproximant(int component) {
        return low[component];
    }

    /**
     * Evaluates every component at tau from this node's approximants.
     *
     * @param out out: {@code out[2i], out[2i+1]} = value of component i
     * @param err out: {@code err[i]} = |high - low| at the point (local estimate, absolute)
     */
    public void evaluate(double tRe, double tIm, double[] out, double[] err) {
        double sr = (tRe - tauRe) / radius;
        double si = (tIm - tauIm) / radius;
        evaluateScaled(sr, si, out, err);
    }

    /** As {@link #evaluate} but at the scaled point s. */
    public void evaluateScaled(double sr, double si, double[] out, double[] err) {
        evaluateScaled(sr, si, out, err, false);
    }

    /**
     * Evaluates at the scaled point s.
     *
     * @param truncationOnly if true, {@code err} holds only the truncation part of the local error (the
     *     difference of the two orders and the defects), which is what step-size control can act on; otherwise
     *     it also holds the rounding errors of the coefficients and of the evaluation, which grow next to
     *     singularities whatever the step
     */
    public void evaluateScaled(double sr, double si, double[] out, double[] err, boolean truncationOnly) {
        if (truncationOnly) {
            evaluateScaled(sr, si, out, err, null);
        } else {
            evaluateScaled(sr, si, out, null, err);
        }
    }

    /**
     * Evaluates at the scaled point s, filling either or both error arrays: {@code trunc} with the truncation
     * part of the local error (difference of the orders and defects, what step control acts on), {@code total}
     * with the reported error: the truncation part and the rounding errors of the coefficients and of the
     * evaluation, times {@link #SAFETY}, plus the inherited error carried by the flow to s.
     */
    public void evaluateScaled(double sr, double si, double[] out, double[] trunc, double[] total) {
        evaluateScaled(sr, si, out, trunc, total, true);
    }

    /**
     * As {@link #evaluateScaled(double, double, double[], double[], double[])}; with {@code withInherited} false
     * the total holds the local error of this node only (what a step adds to the carried error vector).
     */
    public void evaluateScaled(double sr, double si, double[] out, double[] trunc, double[] total,
                               boolean withInherited) {
        evaluateInto(sr, si, out, trunc, null, total, withInherited);
    }

    /**
     * The value at the scaled point s with the two parts of its local error that step control weighs against
     * each other: {@code trunc} as in {@link #evaluateScaled(double, double, double[], double[], double[])}, and
     * {@code rounding} the rounding errors of the coefficients and of the evaluation (absolute, without the
     * safety factor), which no smaller step removes.
     */
    public void localErrors(double sr, double si, double[] out, double[] trunc, double[] rounding) {
        evaluateInto(sr, si, out, trunc, rounding, null, false);
    }

    private void evaluateInto(double sr, double si, double[] out, double[] trunc, double[] rounding,
                              double[] total, boolean withInherited) {
        double[][] work = EVALUATION.get();
        double[] a = work[0];
        double[] b = work[1];
        for (int i = 0; i < high.length; i++) {
            high[i].evaluate(sr, si, a);
            low[i].evaluate(sr, si, b);
            out[2 * i] = a[0];
            out[2 * i + 1] = a[1];
            double e = reciprocalModel(ComplexPairs.abs(a[0], a[1]), ComplexPairs.abs(b[0], b[1]), ComplexPairs.abs(a[0] - b[0], a[1] - b[1]))
                    + a[3] + b[3];
            if (trunc != null) {
                trunc[i] = Double.isFinite(e) ? e : Double.POSITIVE_INFINITY;
            }
            if (rounding != null) {
                double r = a[4] + roundingFloor[i];
                rounding[i] = Double.isFinite(r) ? r : Double.POSITIVE_INFINITY;
            }
            if (total != null) {
                double t = SAFETY * (e + a[4] + roundingFloor[i]);
                if (perturbed != null && withInherited) {
                    perturbed[i].evaluate(sr, si, b);
                    t += INHERITED_SAFETY * reciprocalModel(ComplexPairs.abs(a[0], a[1]), ComplexPairs.abs(b[0], b[1]),
                            ComplexPairs.abs(b[0] - a[0], b[1] - a[1]) / eta);
                }
                total[i] = Double.isFinite(t) ? t : Double.POSITIVE_INFINITY;
            }
        }
    }

    /**
     * The error of a value {@code a} estimated from a second value {@code b} of the same quantity (another Pade
     * order, or the solution through a perturbed state with the difference scaled to first order: then
     * {@code difference} is that scaled one), robust next to a pole. A difference of two rational functions whose
     * poles lie apart by delta grows like delta / d^2 at distance d from the poles only while d is larger than
     * delta; closer in it saturates at about |a| and would understate the error by the factor delta / d. The
     * reciprocal u = 1/w of a component with a pole is analytic there, so its difference stays linear in delta;
     * with eps = difference / (|a| |b|) the error of u, the error of w = 1/u is at most
     * eps |a|^2 / (1 - eps |a|) = difference |a| / (|b| - difference), and no digit is left once
     * {@code difference >= |b|} (then infinity). Used where |a| &gt; 1 (the value dominates the 1 of the relative
     * error measure 1 + |y|); it is never smaller than {@code difference} (|b| &lt;= |a| + difference), and equals it
     * to first order away from poles. Below, the plain difference (w itself is analytic next to its zeros).
     */
    static double reciprocalModel(double aAbs, double bAbs, double difference) {
        if (!(aAbs > 1) || difference == 0) {
            return difference;
        }
        double room = bAbs - difference;
        return room > 0 ? difference * (aAbs / room) : Double.POSITIVE_INFINITY;
    }

    /** Bytes held by this node (for memory accounting). */
    public long footprint() {
        long s = 160 + 48L * yRe.length + 16L * singRe.length;
        for (int i = 0; i < high.length; i++) {
            s += high[i].footprint() + low[i].footprint() + (perturbed == null ? 0 : perturbed[i].footprint());
        }
        return s;
    }
}
