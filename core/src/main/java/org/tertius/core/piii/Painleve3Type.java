package org.tertius.core.piii;

/**
 * The types of the third Painleve equation by its parameters (the usual D6/D7/D8 classification by the
 * symmetry type of its space of initial conditions; see NIST DLMF §32.2(ii) for the reductions by scaling).
 */
public enum Painleve3Type {
    /** gamma * delta != 0: the generic case. */
    D6,
    /** exactly one of gamma, delta is zero, and alpha != 0 when gamma = 0, beta != 0 when delta = 0. */
    D7,
    /** gamma = delta = 0 and alpha * beta != 0. */
    D8,
    /**
     * alpha = gamma = 0 or beta = delta = 0: the equation can be integrated by quadrature (DLMF §32.2(ii));
     * accepted and integrated numerically like the others, but reported as such.
     */
    QUADRATURE;

    /** A short description for messages and output headers. */
    public String describe() {
        switch (this) {
            case D6:
                return "D6 (gamma*delta != 0)";
            case D7:
                return "D7 (one of gamma, delta is zero)";
            case D8:
                return "D8 (gamma = delta = 0, alpha*beta != 0)";
            default:
                return "degenerate: solvable by quadrature (alpha = gamma = 0 or beta = delta = 0)";
        }
    }
}
