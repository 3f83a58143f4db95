package org.tertius.connection;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import java.util.List;
import java.util.Map;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.connection.family.Families;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.PowerSeriesAtZero;
import org.tertius.core.number.ApcomplexArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/** The expansions at 0 against the core engine started elsewhere, and their rounding behaviour. */
class SeriesAtZeroTest {
    private static final ComplexArithmetic AR = ComplexArithmetic.INSTANCE;
    private static final Painleve3 GENERIC = Painleve3.of(1, -0.5, 1, -1);

    private static List<Complex> params(Painleve3 eq) {
        return List.of(eq.alpha(), eq.beta(), eq.gamma(), eq.delta());
    }

    /**
     * The series at the largest z = 0.2 / 2^k where its own error estimate is below 1e-14, against the engine
     * started from the series at a smaller z (Families.create asks for 4e-15 there). Budget 1e-12 relative to
     * 1 + |w|: engine tolerance 1e-13 per step over a few dozen steps in log z.
     */
    @Test
    void powerSeriesAgreesWithEngineWhereBothAreValid() {
        qt().withExamples(5).withShrinkCycles(0).forAll(doubles().between(0.1, 0.8), doubles().between(0.5, 2.0))
                .checkAssert((sg, b) -> {
                    Painleve3Solution s = Families.create(GENERIC, "power", Map.of("sigma", Double.toString(sg), "B",
                            Double.toString(b)), SolverSettings.defaults());
                    LocalValue<Complex> v = PowerSeriesAtZero.create(AR, params(GENERIC), new Complex(sg),
                            new Complex(b), 40).startData(new Complex(0.2), 1e-14);
                    Painleve3Value e = s.evaluate(SurfacePoint.of(v.z(), 0));
                    assertEquals(0, v.w().subtract(e.w()).norm(), 1e-12 * (1 + e.w().norm()), "w at " + v.z());
                    assertEquals(0, v.dw().subtract(e.dw()).norm(), 1e-12 * (1 + e.dw().norm()), "w' at " + v.z());
                });
    }

    /** The family analytic at 0 (sigma = 0) at z = 0.3 and at a complex point, against the engine. */
    @Test
    void analyticFamilyAgreesWithEngine() {
        Painleve3Solution s = Families.create(GENERIC, "analytic", Map.of("w0", "0.7"), SolverSettings.defaults());
        PowerSeriesAtZero<Complex> series = PowerSeriesAtZero.create(AR, params(GENERIC), Complex.ZERO,
                new Complex(0.7), 40);
        for (Complex z : new Complex[] {new Complex(0.3), new Complex(0.1, 0.2)}) {
            LocalValue<Complex> v = series.at(z);
            Painleve3Value e = s.evaluate(SurfacePoint.of(z, 0));
            assertEquals(0, v.w().subtract(e.w()).norm(), 1e-12, "w at " + z);
        }
        // w(0) = w0 and w'(0) = (alpha w0^2 + beta) from the equation times z at z = 0 (derived: z w'' -> 0)
        LocalValue<Complex> small = series.at(new Complex(1e-8));
        assertEquals(0.7, small.w().getReal(), 1e-7);
        assertEquals(0.49 - 0.5, small.dw().getReal(), 1e-6);
    }

    /**
     * Rounding: the recurrence divides by e_ab^2 = (b (1 - sigma))^2 on the Y axis, so its error grows as sigma
     * approaches 1. The double coefficients are compared with 40-digit ones (Apfloat); the carried bound must
     * cover the actual error, and the amplification must be larger at sigma = 0.95 than at sigma = 0.3.
     */
    @Test
    void roundingBoundCoversActualCoefficientErrorAndGrowsNearResonance() {
        ApcomplexArithmetic hp = new ApcomplexArithmetic(40);
        double[] amp = new double[2];
        double[] sigmas = {0.3, 0.95};
        for (int i = 0; i < 2; i++) {
            PowerSeriesAtZero<Complex> d = PowerSeriesAtZero.create(AR, params(GENERIC), new Complex(sigmas[i]),
                    new Complex(1.3), 16);
            PowerSeriesAtZero<Apcomplex> q = PowerSeriesAtZero.create(hp, List.of(hp.of(1), hp.of(-0.5), hp.of(1),
                    hp.of(-1)), hp.of(sigmas[i]), hp.of(1.3), 16);
            amp[i] = d.roundingAmplification();
            for (int a = 0; a <= 16; a += 3) {
                for (int b = 0; a + b <= 16; b += 3) {
                    double actual = hp.toComplex(q.coefficient(a, b)).subtract(d.coefficient(a, b)).norm();
                    double bound = d.roundingAmplification() * AR.epsilon() * d.coefficient(a, b).norm() + 1e-300;
                    assertTrue(actual <= bound, "coefficient (" + a + "," + b + "): error " + actual + " > " + bound);
                }
            }
        }
        assertTrue(amp[1] > 10 * amp[0], "amplification " + amp[0] + " at 0.3, " + amp[1] + " at 0.95");
    }
}
