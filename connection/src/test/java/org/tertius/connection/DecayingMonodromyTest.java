package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertTrue;

import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.closed.McCoyTracyWu;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.monodromy.Estimate;
import org.tertius.hierarchy.monodromy.LaxMatrix;
import org.tertius.hierarchy.monodromy.MonodromyData;
import org.tertius.hierarchy.monodromy.MonodromyMap;

/**
 * Monodromy data of the decaying family of PIII(0, 0, 1, -1), w ~ 1 - 2 lambda K0(2z) at +infinity (McCoy, Tracy and
 * Wu, J. Math. Phys. 18 (1977) 1058; built by DecayingConnection), through member 1 (Member1Map.forEquation with
 * s = 1/4: m = -1/2, m0 = 0). Derived here from the cyclic relation with E11 = 0: in the conventions of
 * MonodromyMap, s^inf_2 = s^0_2, tr M_0 = 2 + s^0_1 s^0_2 = -(2 + s^inf_1 s^inf_2) = 2 pi lambda, so that
 * lambda = (s^0_1 s^0_2 - s^inf_1 s^inf_2) / (4 pi): in the gauge s^inf_2 = -2 the Stokes multipliers are
 * s^inf_1 = 1 + pi lambda and s^0_1 = 1 - pi lambda. With the exponent sigma of w ~ B z^sigma at 0,
 * sigma = (2/pi) arcsin(pi lambda) (McCoy, Tracy and Wu), this is tr M_0 = 2 sin(pi sigma / 2), the eigenvalues of
 * M_0 being exp(+-i pi (1 - sigma)/2) (the link between sigma and the monodromy as in Jimbo, Publ. RIMS 18 (1982)
 * 1137; from memory).
 */
class DecayingMonodromyTest {
    private static final MonodromyMap<Complex> MAP = MonodromyMap.doublePrecision();

    private static double productError(Estimate<Complex> a, Estimate<Complex> b) {
        return a.error() * b.value().norm() + b.error() * a.value().norm() + a.error() * b.error();
    }

    @Test
    void theParameterLambdaIsAStokesMultiplierCombination() {
        for (double lambda : new double[] {0.1, 0.2, -0.15}) {
            Painleve3Solution sol = DecayingConnection.solution(lambda, SolverSettings.defaults());
            Complex[] firstProducts = null;
            for (double z : new double[] {1.0, 2.5}) {
                MonodromyData<Complex> d = MAP.compute(LaxMatrix.ofPainleve3(sol.equation(),
                        sol.evaluate(SurfacePoint.of(z, 0, 0)), new Complex(0.25)));
                String at = "lambda " + lambda + ", z " + z + ": ";
                assertTrue(d.checksHold(), at + d.checks());
                Estimate<Complex> e11 = d.connection(1, 1);
                assertTrue(e11.value().norm() <= 2 * e11.error(), at + "E11 = " + e11);
                Estimate<Complex> b = d.stokesAtInfinity(2);
                Estimate<Complex> d2 = d.stokesAtZero(2);
                assertTrue(b.value().subtract(d2.value()).norm() <= 2 * (b.error() + d2.error()), at + b + " vs " + d2);
                Complex zeroProduct = d.stokesAtZero(1).value().multiply(d2.value());
                Complex infinityProduct = d.stokesAtInfinity(1).value().multiply(b.value());
                double bound = 2 * (productError(d.stokesAtZero(1), d2) + productError(d.stokesAtInfinity(1), b));
                // lambda = (s^0_1 s^0_2 - s^inf_1 s^inf_2) / (4 pi)
                Complex recovered = zeroProduct.subtract(infinityProduct).divide(4 * Math.PI);
                assertTrue(recovered.subtract(lambda).norm() <= bound / (4 * Math.PI) + 1e-14, at + recovered);
                // tr M_0 = 2 sin(pi sigma / 2) with sigma(lambda) of McCoy, Tracy and Wu
                Complex trace = d.monodromyAtZero().m11().add(d.monodromyAtZero().m22());
                double expected = 2 * Math.sin(Math.PI * McCoyTracyWu.sigma(lambda) / 2);
                assertTrue(trace.subtract(expected).norm() <= bound + 1e-13, at + "tr M_0 = " + trace + ", expected "
                        + expected);
                // the gauge of the state differs from point to point (Member1Map: a(-1)12 = 1 there): compare the
                // gauge-free products along z
                if (firstProducts == null) {
                    firstProducts = new Complex[] {zeroProduct, infinityProduct};
                } else {
                    assertTrue(zeroProduct.subtract(firstProducts[0]).norm() <= bound
                            && infinityProduct.subtract(firstProducts[1]).norm() <= bound, at + "products along z");
                }
            }
        }
    }
}
