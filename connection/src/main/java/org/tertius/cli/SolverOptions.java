package org.tertius.cli;

import org.tertius.core.step.SolverSettings;
import picocli.CommandLine.Option;

/** Integrator settings. */
public final class SolverOptions {
    @Option(names = "--tol", paramLabel = "TOL",
            description = "local error tolerance per step, relative to 1+|y| (default 1e-13; range 1e-16..1e-2)")
    Double tolerance;
    @Option(names = "--order", paramLabel = "N", description = "Taylor order per step, even, 8..400 (default 32)")
    Integer order;
    @Option(names = "--max-steps", paramLabel = "N", description = "step budget per path (default 20000)")
    Integer maxSteps;

    void defaults(ProblemFile p) {
        if (tolerance == null && p.has("tolerance")) {
            tolerance = p.doubleValue("tolerance");
        }
        if (order == null && p.has("order")) {
            order = p.intValue("order");
        }
    }

    SolverSettings settings() {
        SolverSettings.Builder b = SolverSettings.builder();
        if (tolerance != null) {
            b.tolerance(tolerance);
        }
        if (order != null) {
            b.order(order);
        }
        if (maxSteps != null) {
            b.maxSteps(maxSteps);
        }
        return b.build();
    }
}
