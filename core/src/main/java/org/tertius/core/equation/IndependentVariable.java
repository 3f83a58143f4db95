package org.tertius.core.equation;

/**
 * How the integration variable tau of a {@link PolynomialSystem} relates to the user's variable.
 */
public enum IndependentVariable {
    /**
     * tau = log z: the system reads {@code z dy/dz = F(y, z)}, i.e. {@code dy/dtau = F(y, e^tau)}. z = 0 is a
     * branch point at Re tau = -infinity, and Im tau carries the sheet. Used by Painleve III.
     */
    LOG,
    /** tau = x: the system reads {@code dy/dx = F(y, x)} with no branch point. */
    PLAIN
}
