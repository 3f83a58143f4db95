package org.tertius.bench;

import org.tertius.core.equation.StateProjection;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.path.PathSelector;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.solution.Solution;
import org.tertius.core.step.Node;
import org.tertius.core.step.SolverSettings;
import org.tertius.core.step.TaylorPadeStepper;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * Counts the work of one path with a stepper of its own: the same start expansion, the same path selection
 * and the same steps as a fresh solution asked for one target (in the log variable, largest radius 4, the
 * values of the engine for this form), then the propagation of the final estimate (counted if it expands). It
 * exists only to read {@link TaylorPadeStepper#expansions()}, which the solution keeps to its own thread-local steppers;
 * its node count is checked against the solution's.
 *
 * <p>Valid for forms without a projection (the Hamiltonian form used for delta != 0 and w0 != 0).
 */
final class EngineDriver {
    /** Largest radius of a node in the log variable (as in the engine). */
    private static final double MAX_RADIUS = 4.0;
    private static final int MAX_APPROACHES = 6;

    /** What one path cost. */
    static final class Work {
        final int nodes;
        final long expansions;

        Work(int nodes, long expansions) {
            this.nodes = nodes;
            this.expansions = expansions;
        }

        double expansionsPerNode() {
            return (double) expansions / nodes;
        }
    }

    private EngineDriver() {
    }

    /** Integrates from the start of a (fresh) solution to the target, counting nodes and expansions. */
    static Work integrate(Painleve3Solution fresh, SurfacePoint target) {
        Solution engine = fresh.engineReading().orElseThrow().tree();
        SolverSettings settings = engine.settings();
        TaylorPadeStepper stepper = new TaylorPadeStepper(engine.system(), RecurrencePlan.compile(engine.system()),
                settings, StateProjection.NONE);
        Node root = engine.root();
        int n = root.dimension();
        double[] re = new double[n];
        double[] im = new double[n];
        for (int i = 0; i < n; i++) {
            re[i] = root.stateRe(i);
            im[i] = root.stateIm(i);
        }
        Node current = stepper.expandStart(0, root.tauRe(), root.tauIm(), re, im,
                Math.min(settings.initialStep(), MAX_RADIUS), MAX_RADIUS);
        double tRe = target.logRe();
        double tIm = target.logIm();
        double tol = settings.tolerance();
        int nodes = 1;
        int approaches = 0;
        while (true) {
            PathSelector.Choice c = PathSelector.choose(current, tRe, tIm, stepper, tol);
            if (c != null && c.reachesTarget()) {
                break;
            }
            if (Math.hypot(tRe - current.tauRe(), tIm - current.tauIm()) <= current.radius()
                    && ++approaches > MAX_APPROACHES) {
                break;
            }
            if (c == null || nodes > settings.maxSteps()) {
                throw new IllegalStateException("target not reached");
            }
            current = stepper.step(current, c.sr(), c.si(), nodes, MAX_RADIUS);
            nodes++;
        }
        // the final estimate propagates the inherited error to the target
        double[] pr = new double[n];
        double[] pi = new double[n];
        stepper.propagate(current, (tRe - current.tauRe()) / current.radius(),
                (tIm - current.tauIm()) / current.radius(), pr, pi);
        return new Work(nodes, stepper.expansions());
    }
}
