package org.tertius.core.solution;

import org.tertius.core.number.ComplexPairs;
import org.tertius.core.step.Node;
import org.tertius.core.step.TaylorPadeStepper;

/**
 * Reading a snapshot of a path tree: the node that serves a point best, the node a new path starts from, and
 * values with their error estimates. A snapshot is an array of nodes indexed by id with the spatial index of the
 * tree; ids in the index beyond the snapshot (nodes added later) are ignored, so every answer is a function of
 * the snapshot and the point alone. Stateless.
 */
final class TreeReader {
    /** Carried relative error above which a node is penalised as the start of a new path. */
    static final double PENALTY_FROM = 1e-10;

    /**
     * Per-thread work arrays of {@link #stored}, called for every point of a grid (the quick compiler of short
     * runs does not keep such arrays off the heap); the estimate returned holds copies.
     */
    private static final ThreadLocal<Work> WORK = ThreadLocal.withInitial(Work::new);

    private static final class Work {
        double[] out = new double[0];
        double[] err = new double[0];
        double[] trunc = new double[0];
        double[] rel = new double[0];
        int[] order = new int[0];

        /**
         * Arrays of exactly n components (their length is the estimate's dimension) and for at least that many
         * candidate nodes; contents are left over, each use writes before it reads.
         */
        Work fit(int n, int candidates) {
            if (err.length != n) {
                out = new double[2 * n];
                err = new double[n];
                trunc = new double[n];
            }
            if (rel.length < candidates) {
                rel = new double[candidates];
                order = new int[candidates];
            }
            return this;
        }
    }

    private TreeReader() {
    }

    /** The stored node whose disk holds tau with a local error below tol and the least total error, or null. */
    static Node bestCovering(Node[] snapshot, NodeIndex index, double tRe, double tIm, TaylorPadeStepper stepper,
                             double tol) {
        Node best = null;
        double bestErr = Double.POSITIVE_INFINITY;
        for (int id : index.candidates(tRe, tIm)) {
            if (id >= snapshot.length) {
                continue;
            }
            Node n = snapshot[id];
            double d = ComplexPairs.abs(tRe - n.tauRe(), tIm - n.tauIm());
            if (d > n.radius()) {
                continue;
            }
            double e = stepper.localError(n, (tRe - n.tauRe()) / n.radius(), (tIm - n.tauIm()) / n.radius());
            if (e > tol) {
                continue;
            }
            double total = e + n.accumulatedError();
            if (total < bestErr) {
                bestErr = total;
                best = n;
            }
        }
        return best;
    }

    /** Whether the disk of a node of the snapshot holds tau (the test of {@link #stored}). */
    static boolean inSomeDisk(Node[] snapshot, NodeIndex index, double tRe, double tIm) {
        for (int id : index.candidates(tRe, tIm)) {
            if (id < snapshot.length) {
                Node n = snapshot[id];
                if (ComplexPairs.abs(tRe - n.tauRe(), tIm - n.tauIm()) / n.radius() <= 1) {
                    return true;
                }
            }
        }
        return false;
    }

    /**
     * The node a new path starts from: the nearest disk, with a penalty for nodes that carry a large error
     * (half a radius per decade above {@link #PENALTY_FROM}), so that paths do not grow from nodes placed next
     * to poles when a cleaner node is almost as near (after the Fornberg-Weideman rule of starting from the
     * nearest node).
     */
    static Node nearest(Node[] snapshot, double tRe, double tIm) {
        Node best = snapshot[0];
        double bestScore = Double.POSITIVE_INFINITY;
        for (Node n : snapshot) {
            double dx = tRe - n.tauRe();
            double dy = tIm - n.tauIm();
            // the score is at least max(|dx|, |dy|) - radius (the penalty is not negative): a node that cannot
            // beat the best so far is passed over without its distance and logarithm (a margin of 1e-12 keeps
            // rounding from deciding, so the choice is the one of the full comparison)
            if (Math.max(Math.abs(dx), Math.abs(dy)) - n.radius() > bestScore * (1 + 1e-12)) {
                continue;
            }
            double d = ComplexPairs.abs(dx, dy) - n.radius();
            double decades = Math.max(0, Math.log10(Math.max(n.accumulatedError(), 1e-300) / PENALTY_FROM));
            double score = Math.max(d, 0) + 0.5 * n.radius() * decades;
            if (score < bestScore) {
                bestScore = score;
                best = n;
            }
        }
        return best;
    }

    /**
     * The value at tau from the snapshot only: the covering nodes in order of relative distance d / r, the first
     * whose truncation error is below {@code maxRelativeError} (relative to 1 + |y|) serves; null if none does.
     */
    static StateEstimate stored(Node[] snapshot, NodeIndex index, double tauRe, double tauIm,
                                double maxRelativeError) {
        int n = snapshot[0].dimension();
        int[] ids = index.candidates(tauRe, tauIm);
        Work w = WORK.get().fit(n, ids.length);
        double[] out = w.out;
        double[] err = w.err;
        double[] trunc = w.trunc;
        double[] rel = w.rel;
        int count = 0;
        int[] order = w.order;
        for (int id : ids) {
            if (id >= snapshot.length) {
                continue;
            }
            Node c = snapshot[id];
            double d = ComplexPairs.abs(tauRe - c.tauRe(), tauIm - c.tauIm()) / c.radius();
            if (d <= 1) {
                rel[count] = d;
                order[count++] = id;
            }
        }
        for (int pass = 0; pass < count; pass++) {
            int bestK = -1;
            for (int k = 0; k < count; k++) {
                if (order[k] >= 0 && (bestK < 0 || rel[k] < rel[bestK])) {
                    bestK = k;
                }
            }
            Node c = snapshot[order[bestK]];
            order[bestK] = -1;
            double sr = (tauRe - c.tauRe()) / c.radius();
            double si = (tauIm - c.tauIm()) / c.radius();
            c.evaluateScaled(sr, si, out, trunc, err);
            boolean ok = true;
            for (int i = 0; i < n && ok; i++) {
                ok = trunc[i] <= maxRelativeError * (1 + ComplexPairs.abs(out[2 * i], out[2 * i + 1]));
            }
            if (ok) {
                return toEstimate(tauRe, tauIm, out, err, c.id(), 0);
            }
        }
        return null;
    }

    /** The value of a node's approximants at tau with its error estimate. */
    static StateEstimate estimate(Node node, double tRe, double tIm, int steps) {
        int n = node.dimension();
        double[] out = new double[2 * n];
        double[] err = new double[n];
        node.evaluateScaled((tRe - node.tauRe()) / node.radius(), (tIm - node.tauIm()) / node.radius(), out, null,
                err);
        return toEstimate(tRe, tIm, out, err, node.id(), steps);
    }

    /** Packs interleaved values and their errors (plus a few ulps of the value) into an estimate. */
    static StateEstimate toEstimate(double tRe, double tIm, double[] out, double[] err, int nodeId, int steps) {
        int n = err.length;
        double[] re = new double[n];
        double[] im = new double[n];
        double[] e = new double[n];
        for (int i = 0; i < n; i++) {
            re[i] = out[2 * i];
            im[i] = out[2 * i + 1];
            e[i] = err[i] + 4 * Math.ulp(1.0) * ComplexPairs.abs(re[i], im[i]);
        }
        return new StateEstimate(tRe, tIm, re, im, e, nodeId, steps);
    }
}
