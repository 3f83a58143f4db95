package org.tertius.core.highprecision;

import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * The number of correct digits of a value from two passes at different accuracies: the relative difference d of
 * their results measures the error amplification of the path, A = d / (steps * tol_cheap), and the accurate result
 * is credited with 10 * steps * tol * max(1, A) (each step contributes at most the local tolerance, amplified
 * alike). This assumes that each pass's error scales with its tolerance: an error floor below the cheap pass's
 * precision would not be seen.
 */
final class DigitEstimate {
    private DigitEstimate() {
    }

    /**
     * Estimated correct significant digits of each value of {@code accurate} (relative to its modulus), at most
     * {@code digits}: the rule of the class comment with the difference of that value alone.
     */
    static int[] correctDigitsEach(Outcome accurate, int accurateDigits, Outcome cheap, int cheapDigits, int digits) {
        int[] out = new int[accurate.values.length];
        for (int k = 0; k < out.length; k++) {
            double log10Diff = relativeDifference(accurate.ctx, accurate.values[k], cheap.values[k]);
            double log10Amp = Math.max(0, log10Diff + cheapDigits - Math.log10(cheap.steps + 1.0));
            double log10Err = 1 + Math.log10(accurate.steps + 1.0) - accurateDigits + log10Amp;
            out[k] = (int) Math.max(0, Math.min(digits, Math.floor(-log10Err)));
        }
        return out;
    }

    /** log10 of |a - b| / |a| (or of |a - b| when a = 0), a at the precision of c. */
    private static double relativeDifference(MpContext c, MpComplex a, MpComplex b) {
        MpComplex d = c.subtract(a, b);
        if (d.isZero()) {
            return -c.digits();
        }
        double l = d.log2Abs() - (a.isZero() ? 0 : a.log2Abs());
        return l / MpContext.LOG2_10;
    }

    /**
     * The tolerance digits of the accurate pass for a path of about that many steps: 4 guard digits and those that
     * the accumulation of the local errors over the steps takes.
     */
    static int accurateDigits(int digits, int expectedSteps) {
        return digits + 4 + (int) Math.ceil(Math.log10(expectedSteps + 1.0));
    }

    /** The tolerance digits of the cheap pass. */
    static int cheapDigits(int digits) {
        return Math.max(20, digits / 3 + 5);
    }
}
