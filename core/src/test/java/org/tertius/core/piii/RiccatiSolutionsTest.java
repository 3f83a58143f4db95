package org.tertius.core.piii;

import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.stream.Stream;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;
import org.tertius.core.number.SurfacePoint;

/**
 * The Riccati (Bessel-type) solutions of NIST DLMF §32.10(iii), evaluated independently with Apfloat's 0F1
 * (see {@link RiccatiReference}), against the engine at complex points of several sheets.
 *
 * <p>Budgets: the reported error estimate must bound the true error (honesty), and the estimate itself must
 * stay below 1e-7 relative. The Riccati solutions are unstable inside the two-parameter family (a
 * perturbation of 1e-12 in the data grows to about 5e-5 at |z| = 10 for the first case, measured with the
 * engine), so digits are lost in proportion; the estimate tracks that growth.
 */
class RiccatiSolutionsTest {

    static Stream<Arguments> cases() {
        return Stream.of(
                // a, b, c, A, B of the Riccati equation z w' = a z w^2 + b w + c z and u = A z^{2mu} F1 + B F2
                Arguments.of(new Complex(1), new Complex(0.3), new Complex(1), new Complex(1), new Complex(0.7, 0.2)),
                Arguments.of(new Complex(1), new Complex(-0.4, 0.2), new Complex(1), new Complex(0.5), new Complex(1)),
                Arguments.of(new Complex(0.8, 0.1), new Complex(0.25), new Complex(1.2), new Complex(1),
                        new Complex(-0.3, 0.4)));
    }

    @ParameterizedTest
    @MethodSource("cases")
    void valuesOnSeveralSheetsAgreeWithBesselFunctionsWithinTheirEstimates(Complex a, Complex b, Complex c,
                                                                           Complex ca, Complex cb) {
        RiccatiReference ref = new RiccatiReference(a, b, c, ca, cb);
        Painleve3 eq = ref.equation();
        SurfacePoint p0 = SurfacePoint.of(1, 0.2);
        Complex[] s = ref.value(p0);
        Painleve3Solution sol = Painleve3Solution.builder(eq).start(p0.z(), s[0], s[1]).build();
        SurfacePoint[] targets = {SurfacePoint.of(2.5, 1.5), SurfacePoint.of(-2, 1, 0), SurfacePoint.of(-2, -1, 0),
            SurfacePoint.of(-2, -1, 1), SurfacePoint.of(0.5, -2.5, 1), SurfacePoint.of(1.5, 0.5, -1),
            SurfacePoint.of(0.3, 0.1, 2), SurfacePoint.of(1e-3, 2e-3), SurfacePoint.of(4, -3)};
        for (SurfacePoint t : targets) {
            Painleve3Value v = sol.evaluate(t);
            Complex[] r = ref.value(t);
            double errW = v.w().subtract(r[0]).norm();
            double errDw = v.dw().subtract(r[1]).norm();
            String where = "at " + t + " for " + eq;
            assertTrue(errW <= v.errW(), "true error of w " + errW + " above its estimate " + v.errW() + " " + where);
            assertTrue(errDw <= v.errDw(), "true error of w' " + errDw + " above its estimate " + v.errDw() + " " + where);
            assertTrue(v.errW() <= 1e-7 * (1 + r[0].norm()), "estimate " + v.errW() + " too large " + where);
        }
    }
}
