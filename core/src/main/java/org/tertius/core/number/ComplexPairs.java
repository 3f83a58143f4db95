package org.tertius.core.number;

/**
 * Small static helpers for complex numbers held as pairs of doubles in hot loops.
 */
public final class ComplexPairs {
    private ComplexPairs() {
    }

    /**
     * |re + i im| without the cost of {@link Math#hypot}: sqrt(re^2 + im^2), falling back to hypot only when
     * the squares overflow or underflow.
     */
    public static double abs(double re, double im) {
        double s = re * re + im * im;
        if (s < Double.MAX_VALUE && s > Double.MIN_NORMAL) {
            return Math.sqrt(s);
        }
        return Math.hypot(re, im);
    }
}
