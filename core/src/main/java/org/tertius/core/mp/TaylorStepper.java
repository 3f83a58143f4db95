package org.tertius.core.mp;
import java.util.concurrent.atomic.AtomicLong;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * The Taylor side of the steps of a {@link SegmentIntegrator}: the series at a point, expanded by the
 * {@link FixedPointKernel} with a scale near its radius of convergence; that radius by the root test; and the
 * length of a Taylor step from the last coefficients (A. Jorba and M. Zou, Experimental Math. 14 (2005)).
 *
 * <p>Immutable, so one stepper serves several threads like its integrator.
 */
final class TaylorStepper {
    /** Safety factor on the Taylor step (the truncation error then lies a few digits below the tolerance). */
    private static final double TAYLOR_SAFETY = 0.95;

    private final FixedPointKernel kernel;
    private final int toleranceDigits;

    /**
     * @param kernel the recurrence kernel
     * @param toleranceDigits the local tolerance is 10^-toleranceDigits relative to 1 + |y_i|
     */
    TaylorStepper(FixedPointKernel kernel, int toleranceDigits) {
        this.kernel = kernel;
        this.toleranceDigits = toleranceDigits;
    }

    /** The series at tau with scale r; its products are added to {@code counter}. */
    private TaylorSeries expand(MpComplex tau, MpComplex[] y, double r, AtomicLong counter) {
        counter.addAndGet(kernel.productsPerExpansion());
        return kernel.expand(tau, y, r);
    }

    /**
     * Expands at tau with a scale near the radius of convergence (re-expanding once or twice when the root test
     * says that the guess was far off), so that the fixed-point coefficients neither grow nor shrink fast.
     */
    TaylorSeries expandScaled(MpComplex tau, MpComplex[] y, double r, AtomicLong counter) {
        TaylorSeries series = null;
        // a scale beyond the radius of convergence makes the scaled coefficients grow like (r / rho)^k: the kernel
        // stops early when they grow too fast (or overflow), and the scale shrinks by the growth seen
        for (int shrink = 0; series == null; shrink++) {
            try {
                series = expand(tau, y, r, counter);
            } catch (CoefficientGrowth.ScaleTooLarge e) {
                if (shrink >= 12) {
                    throw new UnreachableTargetException("the high-precision series near tau = " + tau.toComplex()
                            + " keeps growing as its scale shrinks: the path runs into a singularity");
                }
                r /= 1.2 * e.growth;
            } catch (UnreachableTargetException e) {
                if (shrink >= 12) {
                    throw e;
                }
                r *= 0.25;
            }
        }
        for (int attempt = 0; attempt < 3; attempt++) {
            double q = rootRadius(series);
            if (q >= 0.4 && q <= 2.5 || !Double.isFinite(q) || q <= 0) {
                break;
            }
            r = r * Math.max(1e-4, Math.min(1e4, q));
            series = expand(tau, y, r, counter);
        }
        return series;
    }

    /**
     * Radius of convergence in units of the scale by the root test, 1 / max_k (|c_k| / (1 + |c_0|))^(1/k) over
     * k in [N/3, N] and all components.
     */
    static double rootRadius(TaylorSeries series) {
        int n = series.order();
        double g = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < series.dimension(); i++) {
            double c0 = MpContext.log2OnePlus(series.log2Coefficient(i, 0));
            for (int k = Math.max(1, n / 3); k <= n; k++) {
                double l = series.log2Coefficient(i, k);
                if (l > Double.NEGATIVE_INFINITY) {
                    g = Math.max(g, (l - c0) / k);
                }
            }
        }
        return g == Double.NEGATIVE_INFINITY ? 1e4 : Math.pow(2, -g);
    }

    /**
     * The Taylor step in units of the scale: the largest |s| with |c_k| |s|^k &lt;= tol (1 + |y|) for the last four
     * orders k of every component, times a safety factor.
     */
    double taylorStep(TaylorSeries series, MpComplex[] y) {
        int n = series.order();
        double log2Tol = -toleranceDigits * MpContext.LOG2_10;
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < series.dimension(); i++) {
            double allowed = log2Tol + MpContext.log2OnePlus(y[i].log2Abs());
            for (int k = n - 3; k <= n; k++) {
                double l = series.log2Coefficient(i, k);
                if (l > Double.NEGATIVE_INFINITY) {
                    best = Math.min(best, (allowed - l) / k);
                }
            }
        }
        return best == Double.POSITIVE_INFINITY ? 1e4 : TAYLOR_SAFETY * Math.pow(2, best);
    }
}
