package org.tertius.cli;

import java.math.BigDecimal;
import java.math.MathContext;
import java.math.RoundingMode;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApcomplexMath;
import org.apfloat.ApfloatMath;
import org.hipparchus.complex.Complex;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.infinity.PreciseTransseries;
import org.tertius.connection.infinity.TransseriesAtInfinity;
import org.tertius.connection.match.PreciseInfinityFit;
import org.tertius.connection.match.PreciseZeroFit;
import org.tertius.connection.match.ZeroBehaviourFit;
import org.tertius.connection.zero.LocalValue;
import org.tertius.connection.zero.ZeroBehaviour;
import org.tertius.core.InvalidInputException;
import org.tertius.core.highprecision.HighPrecisionSolution;
import org.tertius.core.number.ApcomplexArithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;

/**
 * {@code connect --digits D}: at 0 the power behaviour of a solution with exact start data fitted in arbitrary
 * precision, and start data from exact (sigma, B) ({@link PreciseZeroFit}); at infinity start data from exact (c, p,
 * q) ({@link PreciseTransseries}). Typed numbers are read exactly.
 */
final class PreciseConnection {
    /** Rows of the series at 0 in arbitrary precision (the default point is chosen small enough for them). */
    static final int ROWS = 16;
    /** The radii tried for start data at infinity in D digits: 1, 1.25, 1.5, 2, 2.5, 3, 4, 5, 6, 8 times 10^k. */
    static final double[] INFINITY_RADII = radii();

    private PreciseConnection() {
    }

    private static double[] radii() {
        double[] steps = {1, 1.25, 1.5, 2, 2.5, 3, 4, 5, 6, 8};
        double[] r = new double[41];
        for (int i = 0; i < 40; i++) {
            r[i] = steps[i % 10] * Math.pow(10, i / 10);
        }
        r[40] = 1e4;
        return r;
    }

    /** The rows of the fit at 0 in D digits, after the double-precision rows (which decide the kind). */
    static void atZero(Painleve3Solution s, double angle, int sheet, int digits, ConnectionRows rows) {
        ZeroBehaviour estimate = ZeroBehaviourFit.analyse(s, angle, sheet);
        try (Progress progress = new Progress("connect")) {
            PreciseZeroFit.Result r = PreciseZeroFit.fit(s, estimate, angle, sheet, digits,
                    f -> progress.update(Math.round(f * 1000), 1000));
            rows.comment(digits + " digits: the solution replayed in arbitrary precision to z0 = " + r.point()
                    + ", the series at 0 of degree " + r.degree() + " solved there for sigma and B");
            rows.add("sigma", digits + " digits", complex(r.sigma(), digits),
                    ConnectionRows.error(r.sigmaError() + printed(r.sigma(), digits)), "",
                    "");
            rows.add("B", digits + " digits", complex(r.amplitude(), digits),
                    ConnectionRows.error(r.amplitudeError() + printed(r.amplitude(), digits)),
                    "", "");
        }
    }

    /** Refuses --digits with --at-infinity before anything is computed: D out of range, data not exact. */
    static void checkAtInfinity(Painleve3Solution s, int digits) {
        if (digits < HighPrecisionSolution.MIN_DIGITS || digits > PreciseInfinityFit.MAX_DIGITS) {
            throw new InvalidInputException("--digits", "must be in [" + HighPrecisionSolution.MIN_DIGITS + ", "
                    + PreciseInfinityFit.MAX_DIGITS + "] with --at-infinity, got " + digits);
        }
        if (s.equation().exactParameters() == null) {
            throw new InvalidInputException("--digits", "needs the equation's parameters exact (decimals or p/q)");
        }
        try {
            s.highPrecisionForm().requireDigits(digits + 5);
        } catch (InvalidInputException e) {
            throw new InvalidInputException("--digits", "needs exact start data (--z0 --w0 --dw0 as decimals or"
                    + " p/q, e.g. from --from-infinity C,P,Q --digits D): " + e.argument() + " " + e.reason());
        }
    }

    /**
     * The rows of the behaviour at infinity in D digits, after the double-precision rows (which decide the kind, the
     * background and the start of Newton's method): p, q and on an oscillating ray amplitude, phase and drift.
     */
    static void atInfinity(Painleve3Solution s, InfinityBehaviour estimate, int digits, ConnectionRows rows) {
        if (estimate.kind() == InfinityBehaviour.Kind.UNDECIDED) {
            throw new InvalidInputException("--digits", "the behaviour at infinity is undecided in double precision ("
                    + estimate.note() + "), so there is nothing to find to " + digits + " digits");
        }
        PreciseInfinityFit.Result r;
        try (Progress progress = new Progress("connect")) {
            r = PreciseInfinityFit.fit(s, estimate, digits, f -> progress.update(Math.round(f * 1000), 1000));
        }
        boolean both = estimate.kind() == InfinityBehaviour.Kind.OSCILLATING;
        rows.comment(digits + " digits: the solution replayed in arbitrary precision to z1 = "
                + ValueRows.exactComplex(r.fitPoint().z()) + " and z2 = " + ValueRows.exactComplex(r.checkPoint().z())
                + " (" + String.format(Locale.ROOT, "%.1f", r.replayDigits()) + " correct digits), the transseries"
                + " with " + r.orders() + " orders solved at z1 for p and q from w and w' by Newton's method ("
                + r.builds() + " builds); the errors include the disagreement at z2 ("
                + String.format(Locale.ROOT, "%.2g", r.disagreement()) + ") as far as it exceeds the errors there ("
                + String.format(Locale.ROOT, "%.2g", r.checkError()) + ")");
        if (!both) {
            rows.comment(digits + " digits, exponentially small: the amplitude of the exponential that grows along the"
                    + " ray is fitted too (linearly); start data rounded to D digits carry a tiny one, so it is not"
                    + " exactly 0, and such a solution leaves the background far out");
        }
        rows.add("p", digits + " digits", complex(r.p(), digits),
                ConnectionRows.error(r.errP() + printed(r.p(), digits)), "", "");
        rows.add("q", digits + " digits", complex(r.q(), digits),
                ConnectionRows.error(r.errQ() + printed(r.q(), digits)), "", "");
        if (!both) {
            return;
        }
        Painleve3 eq = s.equation();
        long precision = digits + PreciseTransseries.GUARD;
        Apcomplex pq = r.p().multiply(r.q());
        Apcomplex amplitude = ApcomplexMath.sqrt(pq).multiply(new Apfloat(2, precision));
        Apcomplex phase = ApcomplexMath.log(r.p().divide(r.q())).divide(new Apcomplex(Apfloat.ZERO,
                new Apfloat(2, precision)));
        InfinityBehaviour b = InfinityBehaviour.measured(estimate.kind(), estimate.angle(), estimate.sheet(),
                estimate.background(), toComplex(r.p()), toComplex(r.q()), r.errP(), r.errQ(), "");
        // drift = -i (kappa(p, q) - kappa(0, 0)); kappa is fixed at order 3 (4 orders built)
        int index = TransseriesAtInfinity.backgrounds(eq).indexOf(estimate.background());
        PreciseTransseries with = PreciseTransseries.create(eq, eq.exactParameters(), index, r.p(), r.q(), digits, 4);
        PreciseTransseries without = PreciseTransseries.create(eq, eq.exactParameters(), index, Apcomplex.ZERO,
                Apcomplex.ZERO, digits, 4);
        MpArithmetic ar = with.arithmetic();
        Apcomplex drift = ar.context().toApcomplex(ar.subtract(with.kappa(), without.kappa()))
                .multiply(new Apcomplex(Apfloat.ZERO, new Apfloat(-1, precision)));
        rows.add("amplitude", digits + " digits", complex(amplitude, digits),
                ConnectionRows.error(b.amplitudeError() + printed(amplitude, digits)),
                "", "");
        rows.add("phase", digits + " digits", complex(phase, digits),
                ConnectionRows.error(b.phaseError() + printed(phase, digits)), "", "");
        rows.add("drift", digits + " digits", complex(drift, digits),
                ConnectionRows.error(b.driftError(eq) + printed(drift, digits)), "", "");
    }

    private static Complex toComplex(Apcomplex a) {
        return new Complex(a.real().doubleValue(), a.imag().doubleValue());
    }

    /** Start data in D digits from exact (sigma, B) typed as the two parts of --from-zero. */
    static void fromZero(Painleve3 eq, List<String> parts, String startAt, double angle, int sheet, int digits,
                         ConnectionRows rows) {
        ApcomplexArithmetic ar = new ApcomplexArithmetic(digits + 10);
        Apcomplex sigma = PreciseZeroFit.exact(ar, ExactText.parse("--from-zero", parts.get(0)), digits);
        Apcomplex b = PreciseZeroFit.exact(ar, ExactText.parse("--from-zero", parts.get(1)), digits);
        List<Apcomplex> p = PreciseZeroFit.parameters(ar, eq, digits);
        Apcomplex twoPi = ar.multiply(ar.ratio(2, 1), ar.pi());
        Apcomplex turn = new Apcomplex(Apfloat.ZERO, ar.multiply(twoPi, ar.ratio(sheet, 1)).real());
        LocalValue<Apcomplex> v;
        if (startAt != null) {
            ExactNumber z = ExactText.parse("--start-at", startAt);
            if (z.isZero()) {
                throw new InvalidInputException("--start-at", "must be a point z != 0, got " + startAt);
            }
            Apcomplex tau = ar.add(ar.log(PreciseZeroFit.exact(ar, z, digits)), turn);
            v = PreciseZeroFit.expansion(ar, p, sigma, b, ROWS).at(tau);
            double target = Math.pow(10, -digits);
            if (!(v.errW() <= target * (1 + ar.abs(v.w())) && v.errDw() <= target * (1 + ar.abs(v.dw())))) {
                // once more with twice the rows (several times the cost); the errors say what was reached
                v = PreciseZeroFit.expansion(ar, p, sigma, b, 2 * ROWS).at(tau);
            }
        } else {
            Apcomplex phase = ar.add(new Apcomplex(Apfloat.ZERO, new Apfloat(Double.toString(angle), digits + 10)),
                    turn);
            v = PreciseZeroFit.startData(ar, PreciseZeroFit.expansion(ar, p, sigma, b, ROWS), phase, digits);
        }
        rows.comment("start data in " + digits + " digits from sigma = " + parts.get(0) + ", B = " + parts.get(1)
                + " (read exactly), from the series at 0; z on sheet " + sheet);
        rows.add("z", digits + " digits", complex(v.z(), digits), ConnectionRows.error(printed(v.z(), digits)), "", "");
        rows.add("sheet", "exact", Integer.toString(sheet), "0", "", "");
        rows.add("w", digits + " digits", complex(v.w(), digits),
                ConnectionRows.error(v.errW() + printed(v.w(), digits)), "", "");
        rows.add("dw", digits + " digits", complex(v.dw(), digits),
                ConnectionRows.error(v.errDw() + printed(v.dw(), digits)), "", "");
    }

    /**
     * Start data in D digits from the data at infinity typed as --from-infinity C,P,Q (P, Q read exactly; C names the
     * background of index {@code background}, computed exactly from the equation), at the typed radius or by default
     * at the smallest radius of {@link #INFINITY_RADII} where the transseries reaches D digits.
     */
    static void fromInfinity(Painleve3 eq, InfinityBehaviour data, int background, List<String> parts,
                             ConnectionOptions options, ConnectionRows rows) {
        int digits = options.digits;
        int sheet = options.sheetIndex();
        double phase = options.rayAngle() + 2 * Math.PI * sheet;
        double[] radii = INFINITY_RADII;
        if (options.startAt == null) {
            double planned = PreciseTransseries.plannedRadius(eq, data.background(), data.p(), data.q(), digits,
                    INFINITY_RADII, phase);
            if (planned < 0) {
                throw new InvalidInputException("--digits", digits + " digits are not reached by the transseries at"
                        + " infinity (" + PreciseTransseries.ordersFor(digits) + " orders) for |z| in [1, 1e4] on this"
                        + " ray; ask fewer digits");
            }
            radii = Arrays.stream(INFINITY_RADII).filter(r -> r >= planned).toArray();
        }
        PreciseTransseries t;
        try (Progress progress = new Progress("connect")) {
            progress.update(0, 1);
            t = PreciseTransseries.create(eq, eq.exactParameters(), background, ExactText.parse("--from-infinity",
                    parts.get(1)), ExactText.parse("--from-infinity", parts.get(2)), digits,
                    PreciseTransseries.ordersFor(digits));
            progress.update(1, 1);
        }
        MpArithmetic ar = t.arithmetic();
        long[] pi = options.rayPiMultiple();
        MpComplex angle = pi != null ? ar.multiply(ar.pi(), ar.ratio(pi[0], pi[1]))
                : ar.context().fromExact(ExactText.parse("--ray", options.ray == null ? "0" : options.ray));
        BigDecimal radius;
        if (options.startAt != null) {
            ExactNumber r = ExactText.parse("--start-at", options.startAt);
            double rd = r.toComplex().getReal();
            if (!r.imaginaryPart(MathContext.DECIMAL64).equals(BigDecimal.ZERO) || !(rd >= 1 && rd <= 1e4)) {
                throw new InvalidInputException("--start-at", "for --from-infinity it is the radius |z| on the ray, in"
                        + " [1, 1e4], got " + options.startAt);
            }
            radius = r.realPart(new MathContext(digits + PreciseTransseries.GUARD));
        } else {
            double r = t.reach(radii, phase);
            if (r < 0) {
                throw new InvalidInputException("--digits", digits + " digits are not reached by the transseries at"
                        + " infinity (" + t.orders() + " orders) for |z| in [1, 1e4] on this ray; ask fewer digits");
            }
            radius = new BigDecimal(Double.toString(r));
        }
        ExactNumber z = t.pointOnRay(radius, angle);
        LocalValue<MpComplex> v = t.startData(z, sheet);
        double rel = Math.max(v.errW() / ar.abs(v.w()), v.errDw() / (ar.abs(v.dw()) + ar.abs(v.w()) / radius
                .doubleValue()));
        if (!(rel < 1)) {
            throw new InvalidInputException("--start-at", "the transseries at |z| = " + radius + " does not fix the"
                    + " start data (estimated error " + (Double.isFinite(rel) ? String.format(Locale.ROOT, "%.2g", rel)
                    : "unbounded") + " relative to w or w'); choose a larger radius in [1, 1e4]");
        }
        Apcomplex w = ar.context().toApcomplex(v.w());
        Apcomplex dw = ar.context().toApcomplex(v.dw());
        rows.comment("start data in " + digits + " digits from c = root" + background + ", p = " + parts.get(1)
                + ", q = " + parts.get(2) + " (read exactly), from the transseries at infinity (" + t.orders()
                + " orders, rounding amplification " + String.format(Locale.ROOT, "%.3g", t.roundingAmplification())
                + ") at |z| = " + radius.toPlainString() + (options.startAt == null ? ", the smallest radius where it"
                + " reaches " + digits + " digits" : ""));
        rows.comment("z is exact (its parts rounded to " + (digits + PreciseTransseries.GUARD) + " digits, on the ray"
                + " to that accuracy); the errors of w and dw include the rounding of the printed digits");
        if (ar.abs(ar.context().fromExact(ExactText.parse("--from-infinity", parts.get(1)))) > 0
                || ar.abs(ar.context().fromExact(ExactText.parse("--from-infinity", parts.get(2)))) > 0) {
            // how well the start data fix the amplitudes: their part of w against the error (exponentially small rays)
            PreciseTransseries bare = PreciseTransseries.create(eq, eq.exactParameters(), background,
                    ExactNumber.ofInteger(0), ExactNumber.ofInteger(0), digits, t.orders());
            LocalValue<MpComplex> v0 = bare.startData(z, sheet);
            double carried = ar.abs(ar.subtract(v.w(), v0.w()));
            double resolution = (v.errW() + v0.errW()) / carried;
            rows.comment("the amplitudes change w here by " + String.format(Locale.ROOT, "%.2g", carried)
                    + (resolution < 1 ? ", so these start data fix them to about " + String.format(Locale.ROOT, "%.2g",
                    resolution) + " relative" : ", less than the error: these start data do not fix them (a ray on or"
                    + " near a Stokes line; start closer with --start-at, at fewer digits)"));
        }
        rows.add("z", "exact", ValueRows.exactComplex(z), "0", "", "");
        rows.add("sheet", "exact", Integer.toString(sheet), "0", "", "");
        rows.add("w", digits + " digits", complex(w, digits), ConnectionRows.error(v.errW() + printed(w, digits)), "",
                "");
        rows.add("dw", digits + " digits", complex(dw, digits), ConnectionRows.error(v.errDw() + printed(dw, digits)),
                "", "");
    }

    /**
     * A bound of the rounding of {@link #complex} to D digits: 0 where the printed digits are the value itself (an
     * exact abscissa such as 2^-7), else one unit in the D-th digit of the larger part.
     */
    static double printed(Apcomplex c, int digits) {
        Apfloat re = c.real();
        Apfloat im = c.imag();
        long top = Math.max(re.signum() == 0 ? Long.MIN_VALUE : re.scale(), im.signum() == 0 ? Long.MIN_VALUE
                : im.scale());
        if (top == Long.MIN_VALUE || re.equals(new Apfloat(part(re, digits, top)))
                && im.equals(new Apfloat(part(im, digits, top)))) {
            return 0;
        }
        double larger = Math.max(Math.abs(re.doubleValue()), Math.abs(im.doubleValue()));
        return larger * Math.pow(10, 1 - digits);
    }

    /** a+bi with D significant digits relative to the modulus. */
    static String complex(Apcomplex c, int digits) {
        Apfloat re = c.real();
        Apfloat im = c.imag();
        long top = Math.max(re.signum() == 0 ? Long.MIN_VALUE : re.scale(), im.signum() == 0 ? Long.MIN_VALUE
                : im.scale());
        String r = part(re, digits, top);
        String i = part(ApfloatMath.abs(im), digits, top);
        return r + (im.signum() < 0 ? "-" : "+") + i + "i";
    }

    private static String part(Apfloat x, int digits, long top) {
        if (x.signum() == 0 || top == Long.MIN_VALUE) {
            return "0";
        }
        long keep = digits - (top - x.scale());
        if (keep <= 0) {
            return "0";
        }
        return ApfloatMath.round(x, keep, RoundingMode.HALF_EVEN).toString(true);
    }
}
