package org.tertius.core.number;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNotEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The shortest round-trip decimals of {@link ShortestDecimal} against exact arithmetic (java.math.BigDecimal, the
 * reference) on random doubles of every binade, subnormals included: each text reads back as the same double, no
 * decimal with one digit less does, it is the nearest decimal of its length, and it is never longer than the JDK's
 * {@link Double#toString} (JDK 17, which is not always shortest).
 */
class ShortestDecimalTest {
    private static void check(double v) {
        String s = ShortestDecimal.text(v);
        assertEquals(Double.doubleToRawLongBits(v), Double.doubleToRawLongBits(Double.parseDouble(s)), s);
        if (v == 0 || !Double.isFinite(v)) {
            return;
        }
        BigDecimal exact = new BigDecimal(Math.abs(v));
        BigDecimal ours = new BigDecimal(s).abs();
        int n = ours.stripTrailingZeros().precision();
        // the nearest decimal of n digits (half-even on exact ties, common practice) is ours, unless it does not read
        // back (below a power of two the rounding interval is half as wide as above it)
        BigDecimal nearest = exact.round(new MathContext(n, RoundingMode.HALF_EVEN));
        if (nearest.compareTo(ours) != 0) {
            assertNotEquals(Math.abs(v), nearest.doubleValue(), s + " for " + exact + ": " + nearest + " is nearer");
        }
        if (n > 1) {
            // no decimal of n - 1 digits reads back as v (the two around v are the only candidates), except that a
            // closer two-digit decimal is preferred to a one-digit one (the rule of Double.toString since Java 19)
            for (RoundingMode m : new RoundingMode[] {RoundingMode.FLOOR, RoundingMode.CEILING}) {
                BigDecimal shorter = exact.round(new MathContext(n - 1, m));
                if (n == 2 && shorter.doubleValue() == Math.abs(v)) {
                    assertTrue(ours.subtract(exact).abs().compareTo(shorter.subtract(exact).abs()) < 0, s);
                    continue;
                }
                assertNotEquals(Math.abs(v), shorter.doubleValue(), s + ": " + shorter + " is shorter");
            }
        }
        String jdk = Double.toString(Math.abs(v));
        int jdkDigits = new BigDecimal(jdk).stripTrailingZeros().precision();
        assertTrue(n <= Math.max(2, jdkDigits), s + " longer than " + jdk);
    }

    @Test
    void randomDoublesOfEveryBinadeAreShortestAndReadBack() {
        SplittableRandom r = new SplittableRandom(20261205);
        for (int i = 0; i < 60_000; i++) {
            double v = Double.longBitsToDouble(r.nextLong());
            if (!Double.isNaN(v)) {
                check(v);
            }
        }
        for (int i = 0; i < 20_000; i++) {
            check(r.nextDouble());
            check(r.nextDouble() * 1e6 - 5e5);
        }
    }

    @Test
    void subnormalsAndTheEdgesOfTheRangeAreShortestAndReadBack() {
        SplittableRandom r = new SplittableRandom(17);
        for (int i = 0; i < 20_000; i++) {
            check(Double.longBitsToDouble(r.nextLong() & ((1L << 52) - 1)));
            check(Double.longBitsToDouble(r.nextLong(1, 1000)));
        }
        double[] edges = {Double.MIN_VALUE, 2 * Double.MIN_VALUE, 3 * Double.MIN_VALUE, Double.MIN_NORMAL,
            Math.nextDown(Double.MIN_NORMAL), Double.MAX_VALUE, Math.nextDown(Double.MAX_VALUE), 1e23, 8.41e21,
            5.0e-324, 9007199254740992.0, 9007199254740994.0, 1e16, 1e15, 123456789012345680.0, 0.1, 0.3, 1.0 / 3,
            2.0 / 3, 1e-4, 9.999999999999999e-5, Math.scalb(1.0, -44), 4.35, 100, 1e-310};
        for (double v : edges) {
            check(v);
            check(-v);
        }
        // every power of two: the rounding interval is asymmetric there
        for (int e = -1074; e <= 1023; e++) {
            check(Math.scalb(1.0, e));
        }
    }

    @Test
    void theLayoutIsPlainBetweenOneEMinusFourAndOneESixteenAndScientificElsewhere() {
        assertEquals("0.0", ShortestDecimal.text(0.0));
        assertEquals("-0.0", ShortestDecimal.text(-0.0));
        assertEquals("nan", ShortestDecimal.text(Double.NaN));
        assertEquals("inf", ShortestDecimal.text(Double.POSITIVE_INFINITY));
        assertEquals("-inf", ShortestDecimal.text(Double.NEGATIVE_INFINITY));
        assertEquals("0.1", ShortestDecimal.text(0.1));
        assertEquals("12.0", ShortestDecimal.text(12));
        assertEquals("-1.5", ShortestDecimal.text(-1.5));
        assertEquals("0.0001", ShortestDecimal.text(1e-4));
        assertEquals("1.0e-5", ShortestDecimal.text(1e-5));
        assertEquals("1000000000000000.0", ShortestDecimal.text(1e15));
        assertEquals("1.0e16", ShortestDecimal.text(1e16));
        assertEquals("0.3333333333333333", ShortestDecimal.text(1.0 / 3));
        assertEquals("3.058099104651028e-13", ShortestDecimal.text(3.058099104651028e-13));
        assertEquals("6.9e-323", ShortestDecimal.text(14 * Double.MIN_VALUE));
        assertEquals("4.9e-324", ShortestDecimal.text(Double.MIN_VALUE));
        assertEquals("1.7976931348623157e308", ShortestDecimal.text(Double.MAX_VALUE));
        assertEquals("1.0e23", ShortestDecimal.text(1e23));
        // JDK 17 writes 2^-44 with 17 digits (5.6843418860808015E-14); 16 read back
        assertEquals("5.684341886080802e-14", ShortestDecimal.text(Math.scalb(1.0, -44)));
    }

    @Test
    void estimatesAreRoundedUpToTheDigitsAskedAndReadBackNoSmaller() {
        SplittableRandom r = new SplittableRandom(5);
        for (int i = 0; i < 20_000; i++) {
            double v = Math.abs(Double.longBitsToDouble(r.nextLong()));
            if (!Double.isFinite(v) || v == 0) {
                continue;
            }
            String s = ShortestDecimal.appendRoundedUp(new StringBuilder(), v, 4).toString();
            BigDecimal up = new BigDecimal(s);
            assertEquals(4, up.precision(), s);
            // never below the shortest decimal of v, and at most one unit of the fourth digit above it
            BigDecimal shortest = new BigDecimal(ShortestDecimal.text(v));
            assertTrue(up.compareTo(shortest) >= 0, s + " < " + shortest);
            assertTrue(up.subtract(shortest).compareTo(up.ulp()) < 0, s + " vs " + shortest);
            // the layout of %.3e without the plus sign and the leading zeros of the exponent
            String printf = String.format(Locale.ROOT, "%.3e", v);
            assertEquals(printf.substring(printf.indexOf('e')).replace("+", "").replace("e-0", "e-").replace("e0", "e")
                    .replace("e-0", "e-"), s.substring(s.indexOf('e')).replace("e-0", "e-"), printf + " vs " + s);
        }
        assertEquals("1.189e-12", ShortestDecimal.appendRoundedUp(new StringBuilder(), 1.1881e-12, 4).toString());
        assertEquals("1.000e1", ShortestDecimal.appendRoundedUp(new StringBuilder(), 9.99951, 4).toString());
        assertEquals("2.000e0", ShortestDecimal.appendRoundedUp(new StringBuilder(), 2, 4).toString());
        assertEquals("inf", ShortestDecimal.appendRoundedUp(new StringBuilder(), Double.POSITIVE_INFINITY, 4)
                .toString());
    }
}
