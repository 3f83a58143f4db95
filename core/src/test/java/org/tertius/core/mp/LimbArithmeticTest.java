package org.tertius.core.mp;
import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.quicktheories.QuickTheory.qt;
import static org.quicktheories.generators.SourceDSL.booleans;
import static org.quicktheories.generators.SourceDSL.integers;
import static org.quicktheories.generators.SourceDSL.longs;

import java.math.BigInteger;
import java.util.Random;
import org.junit.jupiter.api.Test;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/** The limb fixed-point arithmetic of the high-precision kernel against exact BigInteger arithmetic. */
class LimbArithmeticTest {
    /** A random fixed-point integer of |x| < 2^(f + 3), either sign. */
    private static BigInteger random(Random r, int f) {
        BigInteger x = new BigInteger(f + 3, r);
        return r.nextBoolean() ? x.negate() : x;
    }

    @Test
    void valuesSurviveTheLimbRepresentation() {
        qt().withExamples(300).forAll(longs().all(), integers().between(30, 900)).checkAssert((seed, bits) -> {
            Random r = new Random(seed);
            LimbFormat fmt = new LimbFormat(bits, 1);
            LimbVector v = new LimbVector(fmt, 1);
            BigInteger re = random(r, fmt.fractionBits());
            BigInteger im = random(r, fmt.fractionBits());
            v.set(0, re, im);
            assertEquals(re, v.re(0));
            assertEquals(im, v.im(0));
        });
    }

    @Test
    void valuesKeepTheirValueInAWiderFormat() {
        qt().withExamples(200).forAll(longs().all(), integers().between(30, 900), integers().between(1, 6))
                .checkAssert((seed, bits, more) -> {
                    Random r = new Random(seed);
                    LimbFormat fmt = new LimbFormat(bits, 1);
                    LimbVector v = new LimbVector(fmt, 3);
                    BigInteger[] x = new BigInteger[6];
                    for (int i = 0; i < 3; i++) {
                        // |x| < 2^(f + 20): the top limb of one integer limb is used, of either sign
                        x[2 * i] = new BigInteger(fmt.fractionBits() + 20, r);
                        x[2 * i] = r.nextBoolean() ? x[2 * i] : x[2 * i].negate();
                        x[2 * i + 1] = i == 2 ? x[2 * i].negate() : BigInteger.valueOf(-r.nextInt(3));
                        v.set(i, x[2 * i], x[2 * i + 1]);
                    }
                    LimbVector w = v.widened(new LimbFormat(bits, 1 + more));
                    for (int i = 0; i < 3; i++) {
                        assertEquals(x[2 * i], w.re(i));
                        assertEquals(x[2 * i + 1], w.im(i));
                    }
                });
    }

    @Test
    void dotProductsAreRoundedOnceFromTheExactSum() {
        // sum_i a_i b_{k-i} of complex fixed-point numbers, exact in BigInteger, then rounded to 2^-F: the limb
        // accumulator drops only columns far below the rounding (together worth < 2^-14 units), so its result differs
        // from the exactly rounded sum by at most one unit in each part
        // both ways of forming products: limb columns and BigInteger (the latter for many limbs)
        qt().withExamples(150).forAll(longs().all(), integers().between(30, 1500), integers().between(1, 60),
                booleans().all()).checkAssert((seed, bits, k, big) -> {
                    Random r = new Random(seed);
                    LimbFormat fmt = new LimbFormat(bits, 1);
                    int f = fmt.fractionBits();
                    LimbVector v = new LimbVector(fmt, 2 * (k + 1) + 1);
                    BigInteger[] re = new BigInteger[2 * (k + 1)];
                    BigInteger[] im = new BigInteger[2 * (k + 1)];
                    for (int i = 0; i < re.length; i++) {
                        re[i] = random(r, f);
                        im[i] = random(r, f);
                        v.set(i, re[i], im[i]);
                    }
                    BigInteger sr = BigInteger.ZERO;
                    BigInteger si = BigInteger.ZERO;
                    for (int i = 0; i <= k; i++) {
                        int j = k + 1 + k - i;
                        sr = sr.add(re[i].multiply(re[j])).subtract(im[i].multiply(im[j]));
                        si = si.add(re[i].multiply(im[j])).add(im[i].multiply(re[j]));
                    }
                    LimbFormat wide = new LimbFormat(bits, 2, big);
                    LimbAccumulator acc = new LimbAccumulator(wide);
                    LimbVector w = new LimbVector(wide, 2 * (k + 1) + 1);
                    for (int i = 0; i < re.length; i++) {
                        w.set(i, re[i], im[i]);
                    }
                    acc.convolve(w, 0, w, k + 1, k);
                    int out = 2 * (k + 1);
                    acc.store(w, out);
                    assertTrue(w.re(out).subtract(MpContext.shiftRound(sr, f)).abs().compareTo(BigInteger.ONE) <= 0);
                    assertTrue(w.im(out).subtract(MpContext.shiftRound(si, f)).abs().compareTo(BigInteger.ONE) <= 0);
                });
    }

    @Test
    void continuedFractionsAgreeWhicheverWayProductsAreFormed() {
        // the same series through Viskovatov's rows with limb-column products and with BigInteger products: the
        // last convergents agree to the working precision (both round each entry once from its exact value)
        qt().withExamples(40).forAll(longs().all(), integers().between(20, 400), integers().between(6, 40))
                .checkAssert((seed, digits, n) -> {
                    Random r = new Random(seed);
                    MpContext ctx = new MpContext(digits);
                    MpComplex[] c = new MpComplex[n + 1];
                    for (int k = 0; k <= n; k++) {
                        c[k] = ctx.fromDouble(r.nextDouble() - 0.5, r.nextDouble() - 0.5);
                    }
                    c[0] = ctx.fromLong(1);
                    MpComplex s = ctx.fromDouble(0.3, 0.2);
                    MpComplex[] a = ContinuedFraction.of(ctx, c, false).lastConvergents(s);
                    MpComplex[] b = ContinuedFraction.of(ctx, c, true).lastConvergents(s);
                    if (a == null || b == null) {
                        assertTrue(a == null && b == null, "one way gave convergents, the other not");
                        return;
                    }
                    MpComplex d = ctx.subtract(a[2], b[2]);
                    double rel = d.isZero() ? -1e9 : d.log2Abs() - a[2].log2Abs();
                    // a random series loses digits to cancellation in the rows alike in both ways: allow a third
                    assertTrue(rel < -ctx.bits() * 2.0 / 3, "relative difference 2^" + rel + " at " + ctx);
                });
    }

    @Test
    void divisionsBySmallIntegersRoundDown() {
        qt().withExamples(200).forAll(longs().all(), integers().between(1, 5000)).checkAssert((seed, d) -> {
            Random r = new Random(seed);
            LimbFormat fmt = new LimbFormat(200, 2);
            LimbVector v = new LimbVector(fmt, 1);
            BigInteger x = random(r, 200);
            v.set(0, x, x.negate());
            v.divide(0, d);
            BigInteger q = x.divide(BigInteger.valueOf(d));
            // floor division: differs from truncation by at most one
            assertTrue(v.re(0).subtract(q).abs().compareTo(BigInteger.ONE) <= 0);
            assertTrue(v.im(0).add(q).abs().compareTo(BigInteger.ONE) <= 0);
        });
    }
}
