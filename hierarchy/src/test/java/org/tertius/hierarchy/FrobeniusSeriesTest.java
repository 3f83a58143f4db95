package org.tertius.hierarchy;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.number.ApcomplexArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.step.SolverSettings;

/** The generic Frobenius series at a regular singular point, and the t_n-series of member n at x = t_n = 0. */
class FrobeniusSeriesTest {
    private static final Complex TWO_I = new Complex(0, 2);

    @Test
    void timeSeriesInDoubleAgreesWithFortyDigits() {
        ApcomplexArithmetic ap = new ApcomplexArithmetic(40);
        Apcomplex i2 = ap.of(0, 2);
        FrobeniusSeries<Apcomplex> exact = OriginSolution.timeSeries(ap, 2, ap.zero(), ap.zero(), i2, i2, 40);
        FrobeniusSeries<Complex> dbl = OriginSolution.timeSeries(ComplexArithmetic.INSTANCE, 2, Complex.ZERO,
                Complex.ZERO, TWO_I, TWO_I, 40);
        int q = MemberEquations.index(0, 1);
        // a(0)12 = 2 t q and q(0, 0) = -2i a12 = 4: the first coefficient is 8 (derived in hierarchy/README.md)
        assertEquals(8.0, ap.toComplex(exact.coefficient(1, q)).getReal(), 1e-30);
        for (int j = 0; j <= 40; j++) {
            for (int i = 0; i < 9; i++) {
                double d = ap.toComplex(exact.coefficient(j, i)).subtract(dbl.coefficient(j, i)).norm();
                // rounding of the double recursion grows about linearly with j
                assertTrue(d <= 1e-14 * (j + 1) * (1 + dbl.size(j)), "t^" + j + ", unknown " + i + ": " + d);
            }
        }
    }

    @Test
    void timeSeriesSolvesTheTimeFlowOnTheAxis() {
        OriginSolution o = OriginSolution.create(2, new Complex(2), Complex.ZERO, Complex.ZERO, TWO_I, TWO_I,
                SolverSettings.defaults());
        FrobeniusSeries<Complex> series = o.timeSeries();
        Complex t = new Complex(0.01, 0.005);
        Complex[] y = series.value(t);
        Complex[] rate = o.member().timeFlow(o.parameters(t), Complex.ZERO).evaluate(t, y);
        for (int i = 0; i < y.length; i++) {
            Complex d = Complex.ZERO;
            for (int j = series.order(); j >= 1; j--) {
                d = d.multiply(t).add(series.coefficient(j, i).multiply(j));
            }
            assertTrue(d.subtract(rate[i]).norm() <= 1e-12 * (1 + rate[i].norm()), "unknown " + i + ": series "
                    + d + ", flow " + rate[i]);
        }
    }

    @Test
    void resonantFlowsAndDataOffTheRestPointAreRefused() {
        // m = 1/2: the exponent 1/2 + m = 1 is a positive integer
        InvalidInputException e = assertThrows(InvalidInputException.class, () -> OriginSolution.timeSeries(
                ComplexArithmetic.INSTANCE, 2, new Complex(0.5), Complex.ZERO, Complex.ONE, Complex.ONE.negate(), 10));
        assertEquals("origin", e.argument(), e.getMessage());
        assertTrue(e.getMessage().contains("resonant"), e.getMessage());
        MemberParameters p = MemberParameters.builder(1).s(Complex.ONE).build();
        PolynomialSystem flow = HierarchyMember.of(1).xFlow(p);
        Complex[] off = {Complex.ZERO, Complex.ONE, Complex.ONE.negate(), Complex.ZERO, Complex.ONE, Complex.ZERO};
        e = assertThrows(InvalidInputException.class, () -> FrobeniusSeries.compute(ComplexArithmetic.INSTANCE,
                OriginTimeSeries.fromSystem(flow), off, 10, "state"));
        assertEquals("state", e.argument(), e.getMessage());
    }
}
