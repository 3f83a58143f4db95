package org.tertius.core.solution;

import org.tertius.core.UnreachableTargetException;

/**
 * A target that lies next to a pole of a component, closer than the uncertainty of the pole's position: the
 * error estimate of that component is not below its value, so not one digit of it is known in double precision.
 * A picture may show such a point as a pole; a table must not print a number for it.
 */
public final class PoleProximityException extends UnreachableTargetException {
    private static final long serialVersionUID = 1L;
    private final int component;

    PoleProximityException(String message, int component) {
        super(message);
        this.component = component;
    }

    /** The index of the component (in the system's order of unknowns) whose pole the target lies next to. */
    public int component() {
        return component;
    }
}
