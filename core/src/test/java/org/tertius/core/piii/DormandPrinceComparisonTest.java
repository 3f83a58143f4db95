package org.tertius.core.piii;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.hipparchus.ode.ODEState;
import org.hipparchus.ode.ODEStateAndDerivative;
import org.hipparchus.ode.OrdinaryDifferentialEquation;
import org.hipparchus.ode.nonstiff.DormandPrince853Integrator;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.SurfacePoint;

/**
 * The engine against Hipparchus's DormandPrince853Integrator (an independent reference integrator) on a real
 * segment free of poles and zeros ([1, 2] for this solution; w changes sign between 2 and 2.5, where the
 * (w, w') form is singular), PIII written as the real first-order system (w, w'). Budget: DP853 at relative
 * tolerance 1e-12 is accurate to a few 1e-11 over this segment (its global error is not controlled, common
 * practice is a factor 10-100 over the local tolerance), so the two must agree to 1e-10 relative.
 */
class DormandPrinceComparisonTest {

    @Test
    void realPoleFreeSegmentAgreesWithDormandPrince853() {
        double alpha = 1;
        double beta = -0.5;
        double gamma = 1;
        double delta = -1;
        OrdinaryDifferentialEquation ode = new OrdinaryDifferentialEquation() {
            @Override
            public int getDimension() {
                return 2;
            }

            @Override
            public double[] computeDerivatives(double z, double[] y) {
                double w = y[0];
                double dw = y[1];
                return new double[] {dw, dw * dw / w - dw / z + (alpha * w * w + beta) / z + gamma * w * w * w + delta / w};
            }
        };
        DormandPrince853Integrator dp = new DormandPrince853Integrator(1e-8, 1.0, 1e-14, 1e-12);
        Painleve3Solution s = Painleve3Solution.builder(Painleve3.of(alpha, beta, gamma, delta))
                .start(Complex.ONE, new Complex(0.5), new Complex(1.0 / 3.0)).build();
        double[] y = {0.5, 1.0 / 3.0};
        double z = 1;
        for (double target : new double[] {1.2, 1.4, 1.6, 1.8, 2.0}) {
            ODEStateAndDerivative st = dp.integrate(ode, new ODEState(z, y), target);
            y = st.getPrimaryState();
            z = target;
            Painleve3Value v = s.evaluate(SurfacePoint.of(target, 0));
            double dw = Math.abs(v.w().getReal() - y[0]) / (1 + Math.abs(y[0]));
            double ddw = Math.abs(v.dw().getReal() - y[1]) / (1 + Math.abs(y[1]));
            assertTrue(dw <= 1e-10, "w at " + target + ": engine " + v.w() + ", DP853 " + y[0]);
            assertTrue(ddw <= 1e-10, "w' at " + target + ": engine " + v.dw() + ", DP853 " + y[1]);
            assertTrue(Math.abs(v.w().getImaginary()) <= v.errW(), "real data must give real values on the positive axis");
        }
    }
}
