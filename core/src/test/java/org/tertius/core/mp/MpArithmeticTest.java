package org.tertius.core.mp;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.doubles;
import static org.quicktheories.generators.SourceDSL.longs;

import java.math.BigDecimal;
import java.math.BigInteger;
import java.util.Random;
import org.apfloat.Apcomplex;
import org.apfloat.ApcomplexMath;
import org.apfloat.Apfloat;
import org.hipparchus.complex.Complex;
import org.junit.jupiter.api.Test;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;
import org.tertius.core.taylor.DoubleTaylorKernel;
import org.tertius.core.taylor.RecurrencePlan;

/** The binary arithmetic, the fixed-point kernel and the continued fractions of the high-precision layer. */
class MpArithmeticTest {
    private static final int DIGITS = 60;
    private static final MpContext C = new MpContext(DIGITS);

    /** log10 |x - ref| / |ref| with ref from Apfloat. */
    private static double error(MpComplex x, Apcomplex ref) {
        MpContext wide = C.widen(20);
        MpComplex r = wide.fromApcomplex(ref);
        MpComplex d = wide.subtract(x, r);
        return d.isZero() ? -1000 : (d.log2Abs() - r.log2Abs()) / MpContext.LOG2_10;
    }

    private static Apcomplex ap(double re, double im) {
        return new Apcomplex(new Apfloat(new BigDecimal(re), DIGITS + 30),
                new Apfloat(new BigDecimal(im), DIGITS + 30));
    }

    @Test
    void productsQuotientsAndExponentialsAgreeWithApfloatToTheWorkingPrecision() {
        // reference: Apfloat at 90 digits; the working precision is 60 digits (plus guard bits), so one rounding
        // leaves a relative error below 1e-60
        qt().withExamples(200).forAll(doubles().between(-50, 50), doubles().between(-50, 50), doubles().between(-3, 3),
                doubles().between(-3, 3)).checkAssert((a, b, c, d) -> {
                    MpComplex x = C.fromDouble(a, b);
                    MpComplex y = C.fromDouble(c, d);
                    Apcomplex ax = ap(a, b);
                    Apcomplex ay = ap(c, d);
                    assertTrue(error(C.multiply(x, y), ax.multiply(ay)) < -DIGITS);
                    if (c != 0 || d != 0) {
                        assertTrue(error(C.divide(x, y), ax.divide(ay)) < -DIGITS);
                    }
                    assertTrue(error(C.add(x, y), ax.add(ay)) < -DIGITS + 2);
                    // e^y: the argument reduction costs a few bits, kept by the guard bits of exp
                    assertTrue(error(C.exp(y), ApcomplexMath.exp(ay)) < -DIGITS);
                });
    }

    @Test
    void squareRootsAndLogarithmsAgreeWithApfloatOnThePrincipalBranch() {
        // reference: Apfloat's ApcomplexMath.sqrt and log at 90 digits (principal branches, Im log in (-pi, pi]);
        // the moduli span 1e-30..1e30 so that the scaling by powers of 2 (and e log 2) is exercised
        qt().withExamples(100).forAll(doubles().between(-30, 30), doubles().between(-1, 1), doubles().between(-1, 1))
                .checkAssert((e, a, b) -> {
                    if (a == 0 && b == 0) {
                        return;
                    }
                    double m = Math.pow(10, e);
                    MpComplex x = C.fromDouble(a * m, b * m);
                    Apcomplex ax = ap(a * m, b * m);
                    assertTrue(error(C.sqrt(x), ApcomplexMath.sqrt(ax)) < -DIGITS, "sqrt of " + x);
                    assertTrue(error(C.log(x), ApcomplexMath.log(ax)) < -DIGITS + 1, "log of " + x);
                });
        // the negative real axis lies on the cut: log(-4) = log 4 + i pi, sqrt(-4) = 2i
        Apcomplex minusFour = ap(-4, 0);
        assertTrue(error(C.log(C.fromLong(-4)), ApcomplexMath.log(minusFour)) < -DIGITS);
        assertTrue(error(C.sqrt(C.fromLong(-4)), ApcomplexMath.sqrt(minusFour)) < -DIGITS);
        assertTrue(error(C.pi(), new Apcomplex(org.apfloat.ApfloatMath.pi(DIGITS + 30))) < -DIGITS);
    }

    @Test
    void rationalsAndApfloatNumbersConvertWithOneRounding() {
        MpComplex third = C.fromExact(ExactNumber.parse("x", "1/3-2/7i"));
        Apcomplex ref = new Apcomplex(new Apfloat(1, 100).divide(new Apfloat(3, 100)),
                new Apfloat(-2, 100).divide(new Apfloat(7, 100)));
        assertTrue(error(third, ref) < -DIGITS);
        assertTrue(error(C.fromApcomplex(ref), ref) < -DIGITS);
        assertTrue(error(C.fromApcomplex(C.toApcomplex(third)), ref) < -DIGITS + 1);
    }

    @Test
    void fixedPointKernelMatchesTheDoubleKernelOnTheSamePlan() {
        // z y' = y^2 p + (1/2) z y, z p' = -y p^2 + z^2 (a system with products and powers of the base)
        PolynomialSystem sys = PolynomialSystem.builder(IndependentVariable.LOG, "y", "p")
                .term(0, new Complex(1), 0, 2, 1).term(0, new Complex(0.5), 1, 1, 0)
                .term(1, new Complex(-1), 0, 1, 2).term(1, new Complex(0, 1), 2, 0, 0).build();
        RecurrencePlan plan = RecurrencePlan.compile(sys);
        int order = 24;
        MpComplex[] coef = new MpComplex[sys.coefficientValues().size()];
        for (int i = 0; i < coef.length; i++) {
            Complex v = sys.coefficientValues().get(i);
            coef[i] = C.fromDouble(v.getReal(), v.getImaginary());
        }
        FixedPointKernel k = new FixedPointKernel(plan, coef, order, C);
        TaylorSeries s = k.expand(C.fromDouble(0.1, 0.2), new MpComplex[] {C.fromDouble(0.5, 0.25),
            C.fromDouble(-0.3, 0.1)}, 0.2);
        DoubleTaylorKernel dk = new DoubleTaylorKernel(plan, sys, order);
        double[][] re = new double[2][order + 1];
        double[][] im = new double[2][order + 1];
        dk.coefficients(0.1, 0.2, new double[] {0.5, -0.3}, new double[] {0.25, 0.1}, 0.2, re, im);
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j <= order; j++) {
                Complex hp = s.coefficient(C, i, j).toComplex();
                // the double kernel is accurate to a few ulps of the largest coefficient (common practice)
                assertTrue(hp.subtract(new Complex(re[i][j], im[i][j])).norm() < 1e-13, "coefficient " + i + "," + j);
            }
        }
    }

    @Test
    void expansionThatOutgrowsItsIntegerLimbsGoesOnWiderWithTheSameCoefficients() {
        // y' = y^2, p' = y p in tau, y(0) = p(0) = 1: y = p = 1 / (1 - tau), scaled coefficients r^k. With r = 1.3
        // they pass the one integer limb a series starts with near order 69 (1.3^100 ~ 2^38), and the expansion
        // widens its limbs there and goes on; fixed-point products are rounded at 2^-F whatever the integer limbs,
        // so it must give exactly the coefficients of an expansion started with four integer limbs
        PolynomialSystem sys = PolynomialSystem.builder(IndependentVariable.LOG, "y", "p")
                .term(0, new Complex(1), 0, 2, 0).term(1, new Complex(1), 0, 1, 1).build();
        RecurrencePlan plan = RecurrencePlan.compile(sys);
        int order = 100;
        MpComplex[] coef = {C.fromLong(1), C.fromLong(1)};
        FixedPointKernel k = new FixedPointKernel(plan, coef, order, C);
        MpComplex[] y0 = {C.fromLong(1), C.fromLong(1)};
        TaylorSeries widened = k.expand(MpComplex.ZERO, y0, 1.3);
        TaylorSeries wide = k.expand(MpComplex.ZERO, y0, 1.3, 4);
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j <= order; j++) {
                MpComplex a = widened.coefficient(C, i, j);
                assertTrue(C.subtract(a, wide.coefficient(C, i, j)).isZero(), "coefficient " + i + "," + j);
                // and they are the powers 1.3^j (a few ulps of double precision, common practice)
                assertTrue(Math.abs(a.toComplex().getReal() / Math.pow(1.3, j) - 1) < 1e-13, "coefficient " + i + "," + j);
            }
        }
    }

    @Test
    void kernelWithBigIntegerProductsAgreesWithTheLimbKernel() {
        // the same plan at 400 digits (BigInteger products, the known terms summed in two threads), at 200 digits
        // and at 60 digits (limb columns): the coefficients agree to the 60-digit rounding (common practice: two
        // implementations of one recurrence checked against each other)
        PolynomialSystem sys = PolynomialSystem.builder(IndependentVariable.LOG, "y", "p")
                .term(0, new Complex(1), 0, 2, 1).term(0, new Complex(0.5), 1, 1, 0)
                .term(1, new Complex(-1), 0, 1, 2).term(1, new Complex(0, 1), 2, 0, 0)
                .term(1, new Complex(0.25), 2, 1, 0).build();
        RecurrencePlan plan = RecurrencePlan.compile(sys);
        int order = 30;
        MpContext big = new MpContext(400);
        assertTrue(new LimbFormat(big.bits() + 16, 1).bigProducts(), "400 digits should use BigInteger products");
        // 200 digits: limb products with the known terms of the higher orders summed in two threads
        TaylorSeries[] s = new TaylorSeries[3];
        MpContext[] ctx = {C, big, new MpContext(200)};
        for (int m = 0; m < 3; m++) {
            MpContext c = ctx[m];
            MpComplex[] coef = new MpComplex[sys.coefficientValues().size()];
            for (int i = 0; i < coef.length; i++) {
                Complex v = sys.coefficientValues().get(i);
                coef[i] = c.fromDouble(v.getReal(), v.getImaginary());
            }
            s[m] = new FixedPointKernel(plan, coef, order, c).expand(c.fromDouble(0.1, 0.2),
                    new MpComplex[] {c.fromDouble(0.5, 0.25), c.fromDouble(-0.3, 0.1)}, 0.2);
        }
        for (int i = 0; i < 2; i++) {
            for (int j = 0; j <= order; j++) {
                for (int m = 1; m < 3; m++) {
                    MpComplex d = C.subtract(s[0].coefficient(C, i, j), s[m].coefficient(C, i, j));
                    assertTrue(d.isZero() || d.log2Abs() < -(DIGITS - 2) * MpContext.LOG2_10, "coefficient " + i
                            + "," + j + " differs by 2^" + d.log2Abs() + " at " + ctx[m]);
                }
            }
        }
    }

    @Test
    void continuedFractionReproducesARationalFunctionBeyondItsRadiusOfConvergence() {
        // f = (1 + 2s) / (1 - s/2 - 3 s^2 / 10): its [1/2] Pade approximant is f itself, so the convergents agree
        // with f far outside the disk of convergence of the series (radius about 1.5)
        int n = 20;
        MpComplex[] c = new MpComplex[n + 1];
        // series by the recurrence q f = p: c_k = p_k + c_{k-1}/2 + 3 c_{k-2}/10
        MpComplex half = C.fromDouble(0.5, 0);
        MpComplex threeTenths = C.fromExact(ExactNumber.parse("x", "3/10"));
        for (int k = 0; k <= n; k++) {
            MpComplex v = C.fromLong(k == 0 ? 1 : k == 1 ? 2 : 0);
            if (k >= 1) {
                v = C.add(v, C.multiply(half, c[k - 1]));
            }
            if (k >= 2) {
                v = C.add(v, C.multiply(threeTenths, c[k - 2]));
            }
            c[k] = v;
        }
        ContinuedFraction f = ContinuedFraction.of(C, c);
        MpComplex s = C.fromDouble(3, 1);
        MpComplex[] conv = f.lastConvergents(s);
        MpComplex exact = C.divide(C.add(C.fromLong(1), C.multiply(s, 2)),
                C.subtract(C.subtract(C.fromLong(1), C.multiply(half, s)), C.multiply(threeTenths, C.multiply(s, s))));
        Apcomplex ref = C.toApcomplex(exact);
        assertTrue(error(conv[2], ref) < -DIGITS + 20, "last convergent");
    }

    @Test
    void padeAcceptanceHoldsForTolerancesBelowTheDoubleRange() {
        // e^s (c_k = 1/k!, common practice) at s = 1e-11 with 30 coefficients: the last convergents differ by
        // about 1e-370, which is far above a tolerance of 1e-400 but below the smallest double; the acceptance
        // test works with base-2 logarithms, so the value is refused (a test in doubles would see 0 <= 0)
        MpContext c400 = new MpContext(420);
        MpComplex[] c = exponentialSeries(c400, 30);
        ContinuedFraction[] f = {ContinuedFraction.of(c400, c)};
        MpComplex s = c400.fromDouble(1e-11, 0);
        MpComplex[] conv = f[0].lastConvergents(s);
        double log2Diff = c400.subtract(conv[2], conv[1]).log2Abs();
        assertTrue(log2Diff < -1023 && log2Diff > -400 * MpContext.LOG2_10, "difference 2^" + log2Diff
                + " should lie between 1e-400 and the double range");
        assertTrue(PadeStepper.padeValue(c400, f, s, -400 * MpContext.LOG2_10) == null,
                "a Pade value 1e-370 off was accepted at a tolerance of 1e-400");
        assertTrue(PadeStepper.padeValue(c400, f, s, -300 * MpContext.LOG2_10) != null,
                "the same value must pass a tolerance of 1e-300");
    }

    /** The Taylor coefficients 1/k! of e^s, k = 0..n (common practice). */
    private static MpComplex[] exponentialSeries(MpContext ctx, int n) {
        MpComplex[] c = new MpComplex[n + 1];
        MpComplex term = ctx.fromLong(1);
        for (int k = 0; k <= n; k++) {
            c[k] = term;
            term = ctx.divide(term, k + 1);
        }
        return c;
    }

    @Test
    void continuedFractionOfTheExponentialConvergesToItBeyondTheTaylorPolynomial() {
        // e^s from c_k = 1/k! (common practice), 41 coefficients, at s = 3 + 4i; reference: Apfloat's exp. The
        // [20/20] Pade approximant errs there by 9.5e-33 relative, the Taylor polynomial of degree 40 by 7.3e-23
        // (both computed with mpmath's pade and exp as an independent check); the budget 1e-31 leaves a factor 10
        // for the digits the rows of the fraction lose to cancellation, and a Taylor-quality value fails it
        MpComplex[] c = exponentialSeries(C, 40);
        for (boolean big : new boolean[] {false, true}) {
            ContinuedFraction f = ContinuedFraction.of(C, c, big);
            MpComplex[] conv = f.lastConvergents(C.fromDouble(3, 4));
            Apcomplex ref = ApcomplexMath.exp(ap(3, 4));
            double e = error(conv[2], ref);
            assertTrue(e < -31, "last convergent off by 1e" + e + (big ? " (BigInteger products)" : ""));
        }
    }

    @Test
    void wideComplexArithmeticKeepsDoublePrecisionFarBeyondTheDoubleRange() {
        // operands with binary exponents up to +-5000 (beyond any double); reference: the same operations in
        // MpContext at 60 digits; budget 1e-14 relative (a few double roundings; sums of terms of equal size)
        qt().withExamples(300).forAll(longs().all()).checkAssert(seed -> {
                    Random r = new Random(seed);
                    double a = 2 * r.nextDouble() - 1;
                    double b = 2 * r.nextDouble() - 1;
                    double c = 2 * r.nextDouble() - 1;
                    double d = 2 * r.nextDouble() - 1;
                    int ex = r.nextInt(10001) - 5000;
                    int ey = r.nextInt(10001) - 5000;
                    MpComplex x = C.fromDouble(a, b).scalb((int) ex);
                    MpComplex y = C.fromDouble(c, d).scalb((int) ey);
                    WideComplex wx = WideComplex.of(x);
                    WideComplex wy = WideComplex.of(y);
                    assertWide(wx.multiply(wy), C.multiply(x, y), "product");
                    assertWide(wx.divide(wy), C.divide(x, y), "quotient");
                    // sums: compared relative to the larger operand (cancellation is exact in neither)
                    MpComplex sum = C.add(x, y);
                    double scale = Math.max(x.log2Abs(), y.log2Abs());
                    WideComplex ws = wx.add(wy);
                    MpComplex back = ws.isZero() ? MpComplex.ZERO : C.fromDouble(ws.re, ws.im).scalb((int) ws.exp);
                    double err = C.subtract(back, sum).log2Abs() - scale;
                    assertTrue(err < -46, "sum off by 2^" + err);
                });
    }

    private static void assertWide(WideComplex w, MpComplex ref, String what) {
        MpComplex back = C.fromDouble(w.re, w.im).scalb((int) w.exp);
        double err = C.subtract(back, ref).log2Abs() - ref.log2Abs();
        assertTrue(err < -46, what + " off by 2^" + err);
    }

    @Test
    void doublePrecisionScreenOfTheConvergentsAgreesWithTheFullEvaluation() {
        // the screen (determinant formula of continued fractions, Jones and Thron 1980, section 2.1) must give the
        // same log2 of the convergents' relative difference as the full-precision evaluation, up to double
        // rounding (budget 1e-6 bits: both are accurate to about 1e-12 relative) where the difference lies above
        // the working precision; e^s and log(1 + s) / s
        // (c_k = (-1)^k / (k + 1), a branch point at s = -1), common practice, at points of every size of error
        int n = 40;
        MpComplex[][] series = {exponentialSeries(C, n), new MpComplex[n + 1]};
        for (int k = 0; k <= n; k++) {
            series[1][k] = C.divide(C.fromLong(k % 2 == 0 ? 1 : -1), k + 1);
        }
        for (MpComplex[] c : series) {
            ContinuedFraction f = ContinuedFraction.of(C, c);
            for (double[] s : new double[][] {{0.1, 0}, {1, 1}, {3, 4}, {-0.9, 0.2}, {6, -2}, {-3, 0.5}}) {
                MpComplex sp = C.fromDouble(s[0], s[1]);
                MpComplex[] conv = f.lastConvergents(sp);
                double log2Scale = Math.log(1 + Math.pow(2, conv[2].log2Abs())) / Math.log(2);
                double full = Math.max(C.subtract(conv[2], conv[1]).log2Abs(), C.subtract(conv[2], conv[0]).log2Abs())
                        - log2Scale;
                double screen = f.screenLog2Error(sp);
                if (full < 30 - C.bits()) {
                    // below the working precision the full evaluation sees rounding only, the screen the true size
                    assertTrue(screen < 40 - C.bits(), "s = " + s[0] + " + " + s[1] + "i: screen 2^" + screen
                            + " where the full evaluation sees rounding");
                    continue;
                }
                assertTrue(Math.abs(screen - full) < 1e-6, "s = " + s[0] + " + " + s[1] + "i: screen 2^" + screen
                        + ", full evaluation 2^" + full);
            }
        }
    }

    @Test
    void fractionWhoseRowsGrowIsBuiltInMoreDigitsAndKeepsItsPrecision() {
        // 1 + 2^-90 s + sum_{k>=2} s^k / k!: the first difference row leads with 2^-90 before O(1) entries (a
        // near-singular minor, common practice), so the normalised rows grow by about 90 bits and the value of a
        // fraction built at the usual precision loses bits to rounding. Reference: the same fraction built 80
        // digits wider. Budget: the value within 2^8 units of the working precision (measured: the fraction built
        // again is off by 2^-376 at a working precision of 2^-341; the one built at the usual precision by 2^-286)
        MpContext work = new MpContext(100);
        MpContext wide = work.widen(10);
        int n = 60;
        MpComplex[] c = exponentialSeries(wide.widen(150), n);
        c[1] = wide.widen(150).fromLong(1).scalb(-90);
        int f = 2000;
        BigInteger[][] re = new BigInteger[1][n + 1];
        BigInteger[][] im = new BigInteger[1][n + 1];
        for (int k = 0; k <= n; k++) {
            re[0][k] = MpContext.fixedRe(c[k], f);
            im[0][k] = MpContext.fixedIm(c[k], f);
        }
        TaylorSeries series = new TaylorSeries(work.fromLong(0), 1, f, re, im);
        ContinuedFraction plain = ContinuedFraction.of(wide, exactCoefficients(series, wide, n));
        assertTrue(plain.rowGrowth() > 80, "rows grew by 2^" + plain.rowGrowth());
        ContinuedFraction adapted = PadeStepper.fraction(series, wide, 0);
        assertTrue(adapted.context().digits() > wide.digits(), "the fraction was not built again in more digits");
        MpContext ref = wide.widen(80);
        MpComplex s = work.fromDouble(0.7, 0.4);
        MpComplex exact = ContinuedFraction.of(ref, exactCoefficients(series, ref, n)).lastConvergents(s)[2];
        MpComplex v = adapted.lastConvergents(s)[2];
        double err = ref.subtract(v, exact).log2Abs() - exact.log2Abs();
        assertTrue(err < 8 - work.bits(), "value off by 2^" + err + ", working precision 2^-" + work.bits());
    }

    private static MpComplex[] exactCoefficients(TaylorSeries series, MpContext ctx, int n) {
        MpComplex[] c = new MpComplex[n + 1];
        for (int k = 0; k <= n; k++) {
            c[k] = series.coefficient(ctx, 0, k);
        }
        return c;
    }

    @Test
    void continuedFractionStopsAtASingularMinorInsteadOfFailing() {
        // 1 + s^2: u_2(0) = 0 (the [0/1] approximant does not exist); the fraction is cut there
        MpComplex[] c = {C.fromLong(1), MpComplex.ZERO, C.fromLong(1), MpComplex.ZERO, MpComplex.ZERO};
        ContinuedFraction f = ContinuedFraction.of(C, c);
        assertTrue(f.depth() < c.length);
        MpComplex[] conv = f.lastConvergents(C.fromDouble(0.5, 0));
        assertTrue(conv == null || conv[2] != null);
    }

    @Test
    void shiftRoundRoundsToNearest() {
        assertTrue(MpContext.shiftRound(BigInteger.valueOf(5), 1).intValue() == 3);
        assertTrue(MpContext.shiftRound(BigInteger.valueOf(-5), 1).intValue() == -2);
        assertTrue(MpContext.shiftRound(BigInteger.valueOf(7), 2).intValue() == 2);
    }
}
