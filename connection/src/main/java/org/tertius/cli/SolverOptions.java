package org.tertius.cli;

import org.apache.commons.cli.Options;
import org.tertius.core.step.SolverSettings;

/** Integrator settings. */
public final class SolverOptions implements OptionGroup {
    Double tolerance;
    Integer order;
    Integer maxSteps;

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--tol", "TOL",
                "local error tolerance per step, relative to 1+|y| (default 1e-13; range 1e-16..1e-2)"));
        o.addOption(OptionKinds.value("--order", "N", "Taylor order per step, even, 8..400 (default 32)"));
        o.addOption(OptionKinds.value("--max-steps", "N", "step budget per path (default 20000)"));
    }

    @Override
    public void read(Arguments a) {
        tolerance = a.number("--tol", "a number in [1e-16, 1e-2]");
        order = a.integer("--order", "an even integer in [8, 400]");
        maxSteps = a.integer("--max-steps", "an integer >= 1");
    }

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
