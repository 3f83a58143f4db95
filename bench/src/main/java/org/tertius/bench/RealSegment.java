package org.tertius.bench;

import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;

/**
 * Painleve III as the real first-order system y = (w, w') on [1, 2] for the scenario, integrated by
 * Hipparchus's DormandPrince853 with absolute and relative tolerance tol:
 * <pre>  w' = v,   v' = v^2/w - v/z + (alpha w^2 + beta)/z + gamma w^3 + delta/w </pre>
 */
final class RealSegment {
    private static final double ALPHA = 1;
    private static final double BETA = -0.5;
    private static final double GAMMA = 1;
    private static final double DELTA = -1;

    /** The end values and the number of right-hand-side evaluations. */
    static final class Result {
        final double w;
        final double dw;
        final int evaluations;

        Result(double w, double dw, int evaluations) {
            this.w = w;
            this.dw = dw;
            this.evaluations = evaluations;
        }
    }

    private RealSegment() {
    }

    static Result dormandPrince853(double tol) {
        int[] count = new int[1];
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double z, double[] y) {
                count[0]++;
                double w = y[0];
                double v = y[1];
                return new double[] {v, v * v / w - v / z + (ALPHA * w * w + BETA) / z + GAMMA * w * w * w + DELTA / w};
            }
        };
        DormandPrince853Integrator dp = new DormandPrince853Integrator(1e-12, 1.0, tol, tol);
        ODEStateAndDerivative end = dp.integrate(ode, new ODEState(Scenario.Z0.getReal(),
                new double[] {Scenario.W0.getReal(), Scenario.DW0.getReal()}), Scenario.SEGMENT_END);
        double[] y = end.getPrimaryState();
        return new Result(y[0], y[1], count[0]);
    }
}
