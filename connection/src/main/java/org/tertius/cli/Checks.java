package org.tertius.cli;

import org.tertius.core.face.InvariantCheck;
import org.tertius.core.face.SolutionValue;

/** The report of invariants that drift beyond their estimates, one line. */
final class Checks {
    private Checks() {
    }

    /** Says which invariants of the value drift beyond the error estimate (empty if none does). */
    static String drift(SolutionValue v) {
        StringBuilder sb = new StringBuilder();
        for (InvariantCheck c : v.checks()) {
            if (!c.withinEstimate()) {
                sb.append(sb.length() == 0 ? "first integrals drift beyond the error estimate: " : "; ").append(c);
            }
        }
        return sb.toString();
    }
}
