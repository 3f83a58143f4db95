package org.tertius.core.number;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;

import java.util.List;
import java.util.stream.Stream;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.hipparchus.complex.ComplexUtils;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;

/** The arithmetic family: the double and the arbitrary-precision implementations compute the same functions. */
class ArithmeticFamilyTest {
    private static final long SEED = 20260512L;
    private static final ApcomplexArithmetic HP = new ApcomplexArithmetic(40);

    /** One code path, written once for every analytic arithmetic. */
    private static <T> List<Complex> results(AnalyticArithmetic<T> ar, Complex x, Complex y) {
        T a = ar.of(x.getReal(), x.getImaginary());
        T b = ar.of(y.getReal(), y.getImaginary());
        return Stream.of(ar.add(a, b), ar.subtract(a, b), ar.multiply(a, b), ar.divide(a, b), ar.negate(a),
                ar.reciprocal(a), ar.exp(a), ar.log(a), ar.sqrt(a), ar.pow(a, b)).map(ar::toComplex).toList();
    }

    @Test
    void doubleAgreesWithArbitraryPrecision() {
        // moduli and arguments: 0, where the logarithm has no value, is left out
        qt().withFixedSeed(SEED).withExamples(200)
                .forAll(doubles().between(0.1, 3), doubles().between(-3.1, 3.1), doubles().between(0.1, 3),
                        doubles().between(-3.1, 3.1))
                .checkAssert((p, q, r, s) -> {
                    Complex x = ComplexUtils.polar2Complex(p, q);
                    Complex y = ComplexUtils.polar2Complex(r, s);
                    List<Complex> d = results(ComplexArithmetic.INSTANCE, x, y);
                    // reference: Apfloat's complex functions at 40 digits (principal branches)
                    List<Complex> h = results(HP, x, y);
                    for (int i = 0; i < d.size(); i++) {
                        double scale = Math.max(h.get(i).norm(), Double.MIN_NORMAL);
                        assertTrue(d.get(i).subtract(h.get(i)).norm() <= 1e-13 * scale,
                                "operation " + i + " at " + x + ", " + y + ": " + d.get(i) + " vs " + h.get(i));
                    }
                    Apcomplex a = HP.of(x.getReal(), x.getImaginary());
                    assertEquals(ComplexArithmetic.INSTANCE.abs(x), HP.abs(a), 1e-15 * p);
                    assertEquals(ComplexArithmetic.INSTANCE.logAbs(x), HP.logAbs(a), 1e-14);
                });
    }

    @Test
    void arbitraryPrecisionConvertsExactlyAndKeepsItsDigits() {
        // a double is converted exactly: 0.3 is the binary fraction nearest 3/10, 1.11e-17 below it
        Apcomplex gap = HP.subtract(HP.ratio(3, 10), HP.of(0.3));
        assertEquals(1.1102230246251565e-17, HP.abs(gap), 1e-30);
        Apcomplex third = HP.ratio(1, 3);
        assertTrue(HP.abs(HP.subtract(HP.multiply(third, HP.of(3)), HP.one())) <= 1e-39);
        assertEquals(0, HP.abs(HP.subtract(HP.reciprocal(HP.of(4)), HP.ratio(1, 4))));
        assertEquals(1e-40, HP.epsilon());
        assertEquals(40, HP.digits());
        assertEquals(0, HP.abs(HP.parse("1e-400")));
        assertEquals(Double.POSITIVE_INFINITY, HP.abs(HP.parse("1e400")));
        assertEquals(400 * Math.log(10), HP.logAbs(HP.parse("1e400")), 1e-12);
        assertEquals(Double.NEGATIVE_INFINITY, HP.logAbs(HP.zero()));
        assertThrows(InvalidInputException.class, () -> new ApcomplexArithmetic(15));
    }

    @Test
    void magnitudesBoundTheModuliOfComplexResults() {
        MagnitudeArithmetic m = MagnitudeArithmetic.INSTANCE;
        ComplexArithmetic c = ComplexArithmetic.INSTANCE;
        qt().withFixedSeed(SEED).withExamples(200)
                .forAll(doubles().between(-5, 5), doubles().between(-5, 5), doubles().between(-5, 5),
                        doubles().between(-5, 5))
                .checkAssert((p, q, r, s) -> {
                    Complex x = new Complex(p, q);
                    Complex y = new Complex(r, s);
                    double ax = x.norm();
                    double ay = y.norm();
                    double tol = 1e-15 * (1 + ax) * (1 + ay);
                    assertTrue(c.add(x, y).norm() <= m.add(ax, ay) + tol);
                    assertTrue(c.subtract(x, y).norm() <= m.subtract(ax, ay) + tol);
                    assertEquals(c.multiply(x, y).norm(), m.multiply(ax, ay), tol);
                    assertEquals(c.negate(x).norm(), m.negate(ax), 0);
                    assertEquals(c.divide(x, y).norm(), m.divide(ax, ay), 1e-15 * ax / ay);
                    assertEquals(c.reciprocal(x).norm(), m.reciprocal(ax), 1e-15 / ax);
                });
        assertEquals(0.0, m.zero());
        assertEquals(1.0, m.one());
    }
}
