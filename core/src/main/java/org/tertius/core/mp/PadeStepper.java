package org.tertius.core.mp;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Future;
import java.util.concurrent.atomic.AtomicLong;
import org.tertius.core.number.MpComplex;
import org.tertius.core.number.MpContext;

/**
 * The Pade steps (pole vaulting) of a {@link SegmentIntegrator}: when the Taylor coefficients say that a pole
 * near the line would make Taylor steps short, the continued fractions of every component (Viskovatov's
 * algorithm, {@link ContinuedFraction}) are built from the series and a step is accepted where their last
 * convergents agree to the tolerance. Each trial length is screened in double precision before its full
 * evaluation.
 *
 * <p>Immutable (the product count it adds to is its integrator's, an atomic one), so one stepper serves several
 * threads like its integrator.
 */
final class PadeStepper {
    /**
     * Pade is tried when Taylor would need more than this many steps for the rest of the segment (Pade steps are
     * typically several times longer than Taylor steps of the same order).
     */
    private static final double PADE_TRIGGER = 1.5;
    /** Extra digits for the continued fractions (Viskovatov's algorithm loses some to cancellation). */
    private static final int PADE_EXTRA_DIGITS = 10;
    /** Later waypoints a Pade step tries to reach directly, and their largest distance in units of the scale. */
    private static final int SHORTCUT_CANDIDATES = 3;
    private static final double SHORTCUT_REACH = 1.2;
    /** First Pade trial length in units of the scale, before any step has told how far the fractions reach. */
    private static final double FIRST_REACH = 2.0;
    /**
     * Factors by which the trial length shrinks after a rejected trial and grows for the next step (a rejected
     * trial costs a double-precision screen, so the lengths may lie close).
     */
    private static final double SHRINK = 0.95;
    private static final double GROW = 1.25;
    /**
     * Row growth (bits) of a continued fraction above which it is built again in more digits. The fractions are
     * built about 60 bits above the tolerance (PADE_EXTRA_DIGITS and the guard digits); measured at 100 to 300
     * digits, the bits lost stayed below 20 for growths up to 34 bits and below growth + 10 above (46 to 55 bits
     * for growths of 47 to 176), so growths above 40 bits are not covered by the margin alone.
     */
    private static final double ROW_GROWTH_CHECK = 40;
    /** Bits by which the screen of a trial may exceed the tolerance and still go to the full evaluation. */
    private static final double SCREEN_MARGIN_BITS = 1;
    /** Orders from which the continued fractions of the components are built in parallel. */
    private static final int PARALLEL_ORDER = 40;

    private final MpContext ctx;
    /** log2 of the local tolerance (as the integrator's). */
    private final double log2Tolerance;
    /** The integrator's count of complex products: the continued fractions add theirs. */
    private final AtomicLong products;

    PadeStepper(MpContext ctx, double log2Tolerance, AtomicLong products) {
        this.ctx = ctx;
        this.log2Tolerance = log2Tolerance;
        this.products = products;
    }

    /**
     * A Pade step when Taylor steps would be short: to the farthest of the next few waypoints within reach whose
     * convergents meet the tolerance, else along the current line, first to the target or to GROW times the last
     * accepted reach (whichever is nearer), then shrinking by SHRINK; null when no Pade value is accepted farther
     * than 1.5 Taylor steps. Every trial length is screened in double precision first
     * ({@link ContinuedFraction#screenLog2Error}), and only the lengths that pass are evaluated in full, so the
     * lengths can lie close together. {@code reach[0]} carries the accepted length to the next step (NaN before
     * the first: FIRST_REACH times the scale is tried then). The length, not its ratio to the scale, is carried:
     * at high orders the fractions reach well past the radius of convergence, and the scale follows that radius.
     */
    SegmentStep padeStep(TaylorSeries series, MpComplex tau, List<MpComplex> waypoints, int next, double dist,
                            double hT, double[] reach) {
        if (dist <= PADE_TRIGGER * hT) {
            return null;
        }
        ContinuedFraction[] fractions = series.fractions(() -> fractions(series));
        if (fractions == null) {
            return null;
        }
        MpComplex r = ctx.fromDouble(series.scale(), 0);
        int last = Math.min(waypoints.size() - 1, next + SHORTCUT_CANDIDATES);
        for (int j = last; j > next; j--) {
            MpComplex d = ctx.subtract(waypoints.get(j), tau);
            if (d.abs() > SHORTCUT_REACH * series.scale()) {
                continue;
            }
            MpComplex sp = ctx.divide(d, r);
            MpComplex[] v = screened(fractions, sp) ? padeValue(ctx, fractions, sp, log2Tolerance) : null;
            if (v != null) {
                return new SegmentStep(sp, v, fractions, j);
            }
        }
        MpComplex remaining = ctx.subtract(waypoints.get(next), tau);
        MpComplex dir = ctx.divide(remaining, ctx.fromDouble(dist, 0));
        double guess = Double.isNaN(reach[0]) ? FIRST_REACH * series.scale() : GROW * reach[0];
        double first = Math.min(dist, Math.max(guess, PADE_TRIGGER * hT));
        // the whole remaining distance first when it is not far beyond the guess: a remainder costs a step of its
        // own (an expansion and its fractions), a failed trial only a screen
        List<Double> trials = new ArrayList<>();
        if (first < dist && (dist <= 2 * first || dist - first < PADE_TRIGGER * hT)) {
            trials.add(dist);
        }
        for (double len = first; ; len *= SHRINK) {
            trials.add(len);
            if (len <= PADE_TRIGGER * hT) {
                break;
            }
        }
        for (double len : trials) {
            boolean whole = len == dist;
            MpComplex sp = whole ? ctx.divide(remaining, r) : ctx.divide(ctx.multiply(dir, ctx.fromDouble(len, 0)), r);
            MpComplex[] v = screened(fractions, sp) ? padeValue(ctx, fractions, sp, log2Tolerance) : null;
            if (v != null) {
                if (!whole || Double.isNaN(reach[0]) || len >= reach[0]) {
                    reach[0] = len;
                }
                return new SegmentStep(sp, v, fractions, whole ? next : -1);
            }
        }
        return null;
    }

    /**
     * Whether the double-precision screen of every fraction at s lies within SCREEN_MARGIN_BITS of the tolerance
     * (the screen agrees with the full evaluation to about 1e-12 relative; the margin only keeps rounding from
     * deciding).
     */
    private boolean screened(ContinuedFraction[] fractions, MpComplex s) {
        for (ContinuedFraction f : fractions) {
            if (!(f.screenLog2Error(s) <= log2Tolerance + SCREEN_MARGIN_BITS)) {
                return false;
            }
        }
        return true;
    }

    /**
     * The continued fractions of every component (computed in parallel when the order makes it worth a thread),
     * or null when one of them stops before half the order (a Taylor step is taken then).
     */
    private ContinuedFraction[] fractions(TaylorSeries series) {
        MpContext wide = ctx.widen(PADE_EXTRA_DIGITS);
        int n = series.order();
        ContinuedFraction[] out = new ContinuedFraction[series.dimension()];
        if (Workers.PARALLEL && out.length > 1 && n >= PARALLEL_ORDER) {
            List<Future<ContinuedFraction>> others = new ArrayList<>();
            for (int i = 1; i < out.length; i++) {
                int component = i;
                others.add(Workers.submit(() -> fraction(series, wide, component)));
            }
            out[0] = fraction(series, wide, 0);
            for (int i = 1; i < out.length; i++) {
                out[i] = Workers.join(others.get(i - 1));
            }
        } else {
            for (int i = 0; i < out.length; i++) {
                out[i] = fraction(series, wide, i);
            }
        }
        boolean deep = true;
        for (ContinuedFraction f : out) {
            products.addAndGet(f.productCount());
            deep &= f.depth() >= n / 2;
        }
        return deep ? out : null;
    }

    /**
     * The fraction of one component, built PADE_EXTRA_DIGITS above the working precision, and built again wider
     * when its rows grew beyond ROW_GROWTH_CHECK bits (cancellation in the leading entries, which costs the value
     * of the fraction bits of its precision; see {@link ContinuedFraction#rowGrowth}): by the growth seen.
     */
    static ContinuedFraction fraction(TaylorSeries series, MpContext wide, int component) {
        ContinuedFraction f = fraction(series, wide, component, 0);
        if (f.rowGrowth() > ROW_GROWTH_CHECK) {
            f = fraction(series, wide, component, (int) Math.ceil(f.rowGrowth() / MpContext.LOG2_10)).replacing(f);
        }
        return f;
    }

    private static ContinuedFraction fraction(TaylorSeries series, MpContext wide, int component, int extraDigits) {
        MpContext c = extraDigits == 0 ? wide : wide.widen(extraDigits);
        MpComplex[] coefficients = new MpComplex[series.order() + 1];
        for (int k = 0; k < coefficients.length; k++) {
            coefficients[k] = series.coefficient(c, component, k);
        }
        return ContinuedFraction.of(c, coefficients);
    }

    /**
     * The Pade value at s of every component (see {@link ContinuedFraction#valueWithin}), rounded to ctx; null when
     * one of them misses the tolerance 2^log2Tol.
     */
    static MpComplex[] padeValue(MpContext ctx, ContinuedFraction[] fractions, MpComplex s, double log2Tol) {
        MpComplex[] out = new MpComplex[fractions.length];
        for (int i = 0; i < fractions.length; i++) {
            MpComplex v = fractions[i].valueWithin(s, log2Tol);
            if (v == null) {
                return null;
            }
            out[i] = ctx.round(v);
        }
        return out;
    }
}
