package org.tertius.core.equation;

/**
 * An optional map applied to every new node's state to keep it on an invariant manifold of a redundant
 * formulation (for example u = 1/w when both w and 1/w are carried). Must be stateless and thread-safe.
 */
@FunctionalInterface
public interface StateProjection {
    /** Projects the state in place. */
    void project(double tauRe, double tauIm, double[] re, double[] im);

    /** The identity. */
    StateProjection NONE = (tr, ti, re, im) -> { };
}
