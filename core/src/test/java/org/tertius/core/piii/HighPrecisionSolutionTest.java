package org.tertius.core.piii;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.ArrayList;
import java.util.List;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.highprecision.HighPrecisionValue;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.number.SurfacePoint;

class HighPrecisionSolutionTest {
    /** The generic D6 case of the benchmark. */
    private static HighPrecisionSolution generic(int digits) {
        return HighPrecisionSolution.of(Painleve3Solution.builder(Painleve3.exact("1", "-1/2", "1", "-1"))
                .start("1", "1/2", "1/3").build(), digits);
    }

    /** log10 of |x - y| / |y|, computed at the given digits. */
    private static double log10RelativeError(Apcomplex x, Apcomplex y, int digits) {
        MpContext c = new MpContext(digits);
        MpComplex a = c.fromApcomplex(x);
        MpComplex b = c.fromApcomplex(y);
        MpComplex d = c.subtract(a, b);
        return d.isZero() ? -digits : (d.log2Abs() - b.log2Abs()) / MpContext.LOG2_10;
    }

    private static void assertHonest(HighPrecisionValue v, Apcomplex[] ref, int digits) {
        double ew = log10RelativeError(v.value(0), ref[0], digits + 30);
        double edw = log10RelativeError(v.value(1), ref[1], digits + 30);
        assertTrue(v.correctDigits() >= digits, "estimated " + v.correctDigits() + " digits, wanted " + digits);
        // honest: the true relative error is below the estimate 10^-correctDigits
        assertTrue(ew < -v.correctDigits(), "w error 1e" + ew + " exceeds the estimate 1e-" + v.correctDigits());
        assertTrue(edw < -v.correctDigits(), "w' error 1e" + edw + " exceeds the estimate 1e-" + v.correctDigits());
    }

    private static HighPrecisionSolution riccati(BesselRiccatiReference ref, int digits) {
        String[] p = ref.parameters();
        Apcomplex[] start = ref.value(SurfacePoint.of(1, 0));
        return HighPrecisionSolution.of(Painleve3Solution.builder(Painleve3.exact(p[0], p[1], p[2], p[3]))
                .start("1", BesselRiccatiReference.text(start[0]), BesselRiccatiReference.text(start[1])).build(),
                digits);
    }

    @Test
    void besselRiccatiSolutionAt50DigitsMatchesApfloat0F1() {
        // reference: Apfloat's hypergeometric0F1 at 120 digits (DLMF 10.16.9 and 32.10(iii)); start data given to
        // 120 digits, far more than the 50 requested
        BesselRiccatiReference ref = new BesselRiccatiReference("1", "3/10", "1", "1", "7/10+1/5i", 120);
        HighPrecisionSolution s = riccati(ref, 50);
        for (SurfacePoint p : List.of(SurfacePoint.of(2.5, 1.5), SurfacePoint.of(-1, 0.5, 0))) {
            assertHonest(s.evaluate(p), ref.value(p), 50);
        }
    }

    @Test
    void besselRiccatiSolutionAt200DigitsMatchesApfloat0F1() {
        // reference: Apfloat's hypergeometric0F1 at 260 digits (DLMF 10.16.9 and 32.10(iii))
        assertRiccatiAt(200, 260);
    }

    @Test
    @org.junit.jupiter.api.Tag("slow")
    void besselRiccatiSolutionAt400DigitsWithBigIntegerProductsMatchesApfloat0F1() {
        // reference: Apfloat's hypergeometric0F1 at 460 digits (DLMF 10.16.9 and 32.10(iii)); 400 digits are past
        // the limb count where the kernel and the continued fractions form their products with BigInteger
        assertRiccatiAt(400, 460);
    }

    private static void assertRiccatiAt(int digits, int referenceDigits) {
        BesselRiccatiReference ref = new BesselRiccatiReference("1", "3/10", "1", "1", "7/10+1/5i", referenceDigits);
        HighPrecisionSolution s = riccati(ref, digits);
        SurfacePoint p = SurfacePoint.of(1.5, 0.75);
        assertHonest(s.evaluate(p), ref.value(p), digits);
    }

    @Test
    void resultsAtDAndTwiceDAgreeToDDigits() {
        SurfacePoint p = SurfacePoint.of(3, 2);
        HighPrecisionValue v30 = generic(30).evaluate(p);
        HighPrecisionValue v60 = generic(60).evaluate(p);
        assertTrue(v30.correctDigits() >= 30);
        // the 60-digit value serves as the reference for the 30-digit one: their difference must lie within the
        // 30-digit estimate
        assertTrue(log10RelativeError(v30.value(0), v60.value(0), 90) < -v30.correctDigits());
        assertTrue(log10RelativeError(v30.value(1), v60.value(1), 90) < -v30.correctDigits());
        // the printed strings carry the requested digits
        String w = v30.text(0);
        assertTrue(w.startsWith("-1.16006808225917596926288703089"), w);
    }

    @Test
    void residualOfTheEquationVanishesToTheRequestedDigits() {
        int digits = 30;
        HighPrecisionSolution s = generic(digits);
        // w at M points z_j near a circle of radius r around z* = 2+i; the interpolating polynomial through the
        // exact points gives w'(z*) and w''(z*) with truncation error about (r / R)^M, R ~ 0.4 the distance to the
        // nearest pole (common practice: Cauchy-type differentiation on a circle)
        double r = 0.05;
        int m = 40;
        MpContext c = new MpContext(digits + 20);
        MpComplex zc = c.fromDouble(2, 1);
        MpComplex[][] v = new MpComplex[m][m + 1];
        for (int j = 0; j < m; j++) {
            double th = 2 * Math.PI * j / m;
            SurfacePoint q = SurfacePoint.of(2 + r * Math.cos(th), 1 + r * Math.sin(th));
            HighPrecisionValue val = s.evaluate(q);
            assertTrue(val.correctDigits() >= digits);
            MpComplex e = c.subtract(c.fromDouble(q.re(), q.im()), zc);
            MpComplex p = c.fromLong(1);
            for (int k = 0; k < m; k++) {
                v[j][k] = p;
                p = c.multiply(p, e);
            }
            v[j][m] = c.fromApcomplex(val.value(0));
        }
        MpComplex[] coef = solve(c, v);
        MpComplex w = coef[0];
        MpComplex dw = coef[1];
        MpComplex d2w = c.multiply(coef[2], 2);
        // z w w'' - z w'^2 + w w' - alpha w^3 - beta w - gamma z w^4 - delta z (DLMF 32.2.3 times z w)
        MpComplex w2 = c.multiply(w, w);
        MpComplex res = c.multiply(zc, c.subtract(c.multiply(w, d2w), c.multiply(dw, dw)));
        res = c.add(res, c.multiply(w, dw));
        res = c.subtract(res, c.multiply(w2, w));
        res = c.add(res, c.divide(w, 2));
        res = c.subtract(res, c.multiply(zc, c.multiply(w2, w2)));
        res = c.add(res, zc);
        // the second derivative amplifies the 1e-30 errors of w by about 2 / r^2 = 800
        assertTrue(res.log2Abs() / MpContext.LOG2_10 < -digits + 4, "residual 2^" + res.log2Abs());
    }

    /** Gaussian elimination with partial pivoting on the augmented matrix [A | b]. */
    private static MpComplex[] solve(MpContext c, MpComplex[][] a) {
        int n = a.length;
        for (int k = 0; k < n; k++) {
            int piv = k;
            for (int i = k + 1; i < n; i++) {
                if (a[i][k].abs() > a[piv][k].abs()) {
                    piv = i;
                }
            }
            MpComplex[] t = a[k];
            a[k] = a[piv];
            a[piv] = t;
            for (int i = k + 1; i < n; i++) {
                MpComplex f = c.divide(a[i][k], a[k][k]);
                for (int j = k; j <= n; j++) {
                    a[i][j] = c.subtract(a[i][j], c.multiply(f, a[k][j]));
                }
            }
        }
        MpComplex[] x = new MpComplex[n];
        for (int i = n - 1; i >= 0; i--) {
            MpComplex sum = a[i][n];
            for (int j = i + 1; j < n; j++) {
                sum = c.subtract(sum, c.multiply(a[i][j], x[j]));
            }
            x[i] = c.divide(sum, a[i][i]);
        }
        return x;
    }

    @Test
    void agreesWithTheDoubleEngineWithinItsErrorEstimate() {
        SurfacePoint p = SurfacePoint.of(3, 2);
        HighPrecisionValue hp = generic(40).evaluate(p);
        Painleve3Value d = Painleve3Solution.builder(Painleve3.of(1, -0.5, 1, -1))
                .start(new Complex(1), new Complex(0.5), new Complex(1.0 / 3)).build().evaluate(p);
        Complex w = new Complex(hp.value(0).real().doubleValue(), hp.value(0).imag().doubleValue());
        Complex dw = new Complex(hp.value(1).real().doubleValue(), hp.value(1).imag().doubleValue());
        assertTrue(w.subtract(d.w()).norm() <= d.errW(), "double error " + w.subtract(d.w()).norm() + " > " + d.errW());
        assertTrue(dw.subtract(d.dw()).norm() <= d.errDw());
    }

    @Test
    void tabulationAgreesWithSingleEvaluationsAndOtherTabulations() {
        HighPrecisionSolution s = generic(30);
        SurfacePoint a = SurfacePoint.of(1.5, 0.5);
        SurfacePoint b = SurfacePoint.of(2, 1.5);
        List<HighPrecisionValue> t = s.tabulate(ExactPoint.of(a), ExactPoint.of(b), 7);
        assertEquals(7, t.size());
        HighPrecisionSolution fresh = generic(30);
        // the end points are the given points exactly
        for (int i : new int[] {0, 6}) {
            HighPrecisionValue v = fresh.evaluate(t.get(i).point());
            int digits = Math.min(v.correctDigits(), t.get(i).correctDigits());
            assertTrue(digits >= 30);
            assertTrue(log10RelativeError(t.get(i).value(0), v.value(0), 60) < -digits + 1);
        }
        // an interior point: 2/6 of the way in a 7-point table is 1/3 of the way in a 4-point table
        HighPrecisionValue third = fresh.tabulate(ExactPoint.of(a), ExactPoint.of(b), 4).get(1);
        assertTrue(log10RelativeError(t.get(2).value(0), third.value(0), 60) < -29);
        assertTrue(log10RelativeError(t.get(2).value(1), third.value(1), 60) < -29);
    }

    @Test
    void evaluationsThatShareTheFirstSeriesAtTheStartGiveTheValuesOfFreshSolutions() {
        // one solution evaluated at several points expands its first series at the start once and shares it; the
        // runs are deterministic, so each value must be the one a fresh solution gives, digit for digit
        HighPrecisionSolution shared = generic(40);
        for (SurfacePoint p : List.of(SurfacePoint.of(3, 2), SurfacePoint.of(-2, 1), SurfacePoint.of(0.5, -1.5))) {
            HighPrecisionValue again = shared.evaluate(p);
            HighPrecisionValue fresh = generic(40).evaluate(p);
            assertEquals(fresh.text(0), again.text(0), "w at " + p);
            assertEquals(fresh.text(1), again.text(1), "w' at " + p);
            assertEquals(fresh.correctDigits(), again.correctDigits(), "estimated digits at " + p);
        }
    }

    @Test
    void dataGivenAsBinaryDoublesAreRefusedForMoreDigitsThanTheyHold() {
        ExactNumber third = ExactNumber.ofDouble("dw0", new Complex(1.0 / 3));
        Painleve3Solution bySomeDoubles = Painleve3Solution.builder(Painleve3.exact("1", "-1/2", "1", "-1"))
                .start(ExactNumber.parse("z0", "1"), ExactNumber.parse("w0", "1/2"), third).build();
        InvalidInputException e = assertThrows(InvalidInputException.class,
                () -> HighPrecisionSolution.of(bySomeDoubles, 50));
        assertEquals("dw0", e.argument());
        assertTrue(e.getMessage().contains("binary double"), e.getMessage());
        assertThrows(InvalidInputException.class, () -> generic(15));
        assertThrows(InvalidInputException.class, () -> HighPrecisionSolution.of(Painleve3Solution.builder(
                Painleve3.exact("1", "-1/2", "1", "-1")).start("1", "0", "1").build(), 30));
    }

    @Test
    void progressIsReportedUpToOneAndInterruptionCancels() {
        List<Double> seen = new ArrayList<>();
        HighPrecisionSolution s = HighPrecisionSolution.of(Painleve3Solution.builder(Painleve3.exact("1", "-1/2", "1",
                "-1")).start("1", "1/2", "1/3").build(), 30, seen::add);
        s.evaluate(SurfacePoint.of(2, 1));
        assertEquals(1.0, seen.get(seen.size() - 1));
        for (int i = 1; i < seen.size(); i++) {
            assertTrue(seen.get(i) >= seen.get(i - 1) - 1e-12, "progress went back: " + seen);
        }
        HighPrecisionSolution t = generic(30);
        Thread.currentThread().interrupt();
        try {
            assertThrows(TertiusException.class, () -> t.evaluate(SurfacePoint.of(2, 1)));
        } finally {
            Thread.interrupted();
        }
        // the cancelled solution stays usable, and gives what a fresh one gives
        assertEquals(generic(30).evaluate(SurfacePoint.of(2, 1)).text(0), t.evaluate(SurfacePoint.of(2, 1)).text(0));
    }
}
