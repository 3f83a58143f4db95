package org.tertius.core;

/**
 * The integrator could not reach a target point to the requested accuracy (too many steps, step size
 * collapsed next to a singularity, or the accumulated error estimate exceeded the accepted bound).
 */
public class UnreachableTargetException extends TertiusException {
    private static final long serialVersionUID = 1L;

    public UnreachableTargetException(String message) {
        super(message);
    }
}
