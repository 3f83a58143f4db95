package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Map;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.family.Families;
import org.tertius.connection.match.DecayingConnection;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.LogarithmicAtZero;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/**
 * The log-series of the member lambda = 1/pi at 0 (derived in {@link LogarithmicAtZero}; leading constant of
 * McCoy, Tracy and Wu, J. Math. Phys. 18 (1977) 1058, in the form confirmed by this module) against the same
 * member integrated in from +infinity (DecayingTransseries, then the core engine: {@code DecayingConnection}).
 */
class LogarithmicAtZeroTest {
    private static final double LAMBDA = 1 / Math.PI;

    /**
     * At x = 1e-4 .. 0.05 the series and the member from +infinity agree within the sum of the two error
     * estimates (the series' own, and the engine's reported one, which carries the start errors at x = 1 inward),
     * times 2 for rounding in the comparison. Measured: absolute 1.5e-15 .. 5e-12, the series' estimate being
     * 100x conservative at x = 0.05 (it bounds the omitted x^8 s^4 terms with a safety factor 4).
     */
    @Test
    void seriesAgreesWithTheMemberIntegratedFromInfinity() {
        Painleve3Solution fromInfinity = DecayingConnection.solution(LAMBDA, SolverSettings.defaults());
        for (double x : new double[] {1e-4, 1e-3, 1e-2, 0.05}) {
            LocalValue<Complex> v = LogarithmicAtZero.at(x);
            Painleve3Value e = fromInfinity.evaluate(SurfacePoint.of(new Complex(x), 0));
            assertEquals(0, v.w().subtract(e.w()).norm(), 2 * (v.errW() + e.errW()), "w at " + x);
            assertEquals(0, v.dw().subtract(e.dw()).norm(), 2 * (v.errDw() + e.errDw()), "w' at " + x);
        }
    }

    /**
     * The x^4 correction is seen by the numerics: at x = 0.01 the leading form -x s alone is off by
     * x^4 f(s) |w| ~ 1e-9 (far outside the engine's estimate 2e-13), the corrected series agrees to 5e-13 relative.
     */
    @Test
    void firstCorrectionIsConfirmedByTheEngine() {
        double x = 0.01;
        Painleve3Value e = DecayingConnection.solution(LAMBDA, SolverSettings.defaults())
                .evaluate(SurfacePoint.of(new Complex(x), 0));
        double leading = -x * (Math.log(x / 4) + 0.57721566490153286);
        assertTrue(Math.abs(leading - e.w().getReal()) > 1e-10, "the correction is visible");
        assertEquals(e.w().getReal(), LogarithmicAtZero.at(x).w().getReal(), 1e-12);
    }

    /**
     * Families "decaying" with lambda = 1/pi and x0 = 1e-3 (start at 0) against the default start at +infinity,
     * at x = 0.5 and 1: budget 1e-12 absolute, engine tolerance 1e-13 per step over some dozens of steps; the
     * outward growth of a perturbation (like I0(2x)) is below 3 here. Measured 4e-14.
     */
    @Test
    void familyStartsFromZeroAtTheLogarithmicMember() {
        Painleve3Solution fromZero = Families.create(DecayingConnection.equation(), "decaying",
                Map.of("lambda", Double.toString(LAMBDA), "x0", "1e-3"), SolverSettings.defaults());
        Painleve3Solution fromInfinity = DecayingConnection.solution(LAMBDA, SolverSettings.defaults());
        for (double x : new double[] {0.5, 1}) {
            SurfacePoint p = SurfacePoint.of(new Complex(x), 0);
            assertEquals(0, fromZero.evaluate(p).w().subtract(fromInfinity.evaluate(p).w()).norm(), 1e-12, "x = " + x);
        }
        InvalidInputException other = assertThrows(InvalidInputException.class, () -> Families.create(
                DecayingConnection.equation(), "decaying", Map.of("lambda", "0.2", "x0", "1e-3"),
                SolverSettings.defaults()));
        assertTrue(other.getMessage().contains("only for the logarithmic member"), other.getMessage());
        assertThrows(InvalidInputException.class, () -> LogarithmicAtZero.at(0.5));
    }
}
