package org.tertius.core.solution;

/**
 * The state of a system at one point with an error estimate per component. Immutable.
 */
public final class StateEstimate {
    private final double tauRe;
    private final double tauIm;
    private final double[] re;
    private final double[] im;
    private final double[] error;
    private final int nodeId;
    private final int newSteps;

    StateEstimate(double tauRe, double tauIm, double[] re, double[] im, double[] error, int nodeId, int newSteps) {
        this.tauRe = tauRe;
        this.tauIm = tauIm;
        this.re = re;
        this.im = im;
        this.error = error;
        this.nodeId = nodeId;
        this.newSteps = newSteps;
    }

    public double tauRe() {
        return tauRe;
    }

    public double tauIm() {
        return tauIm;
    }

    public int dimension() {
        return re.length;
    }

    public double re(int i) {
        return re[i];
    }

    public double im(int i) {
        return im[i];
    }

    /** Estimated absolute error of component i. */
    public double error(int i) {
        return error[i];
    }

    /**
     * The id of the node whose approximant gave the value; negative for a node outside the tree (canonical and
     * detached paths).
     */
    public int nodeId() {
        return nodeId;
    }

    /** Number of new steps taken to answer this evaluation (0 if served from stored nodes). */
    public int newSteps() {
        return newSteps;
    }
}
