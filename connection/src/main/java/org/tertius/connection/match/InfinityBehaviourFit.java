package org.tertius.connection.match;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.connection.infinity.InfinityBehaviour;
import org.tertius.connection.infinity.TransseriesAtInfinity;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.piii.Painleve3Type;
import org.tertius.core.piii.Painleve3Value;

/**
 * Finds the behaviour at infinity along a ray ({@link InfinityBehaviour}) of a computed D6 solution, or D7 with
 * gamma = 0 (double precision, core engine): samples |z| in [rMin, rMax] on the ray, picks the background c that log(w/c) approaches,
 * and fits the amplitudes of {@link TransseriesAtInfinity} to (w, w') by Newton's method at each radius. Both
 * amplitudes on the rays where mu z is imaginary, else the one of the decaying exponential (the other must vanish for
 * the solution to approach c). The errors of the data and of the truncated transseries are mapped through the
 * Jacobian; the fit with the smallest estimate is kept and the others must agree with it (their spread enters the
 * estimate), else the result is undecided. Immutable and thread-safe.
 */
public final class InfinityBehaviourFit {
    /** Default sample interval of |z|. */
    public static final double R_MIN = 10;
    public static final double R_MAX = 40;
    private static final int SAMPLES = 9;
    private static final int FITS = 4;

    private InfinityBehaviourFit() {
    }

    /** As {@link #analyse(Painleve3Solution, double, int, double, double)} on [{@link #R_MIN}, {@link #R_MAX}]. */
    public static InfinityBehaviour analyse(Painleve3Solution solution, double angle, int sheet) {
        return analyse(solution, angle, sheet, R_MIN, R_MAX);
    }

    /**
     * The behaviour at infinity of {@code solution} along arg z = angle on sheet {@code sheet}, from |z| in
     * [rMin, rMax].
     *
     * @throws InvalidInputException for an equation that is neither D6 nor D7 with gamma = 0, a bad interval, or a ray along which the solution
     *     has poles (a pole line: the forms at infinity do not apply; the message says where)
     */
    public static InfinityBehaviour analyse(Painleve3Solution solution, double angle, int sheet, double rMin,
                                            double rMax) {
        Painleve3 eq = solution.equation();
        List<Complex> backgrounds = TransseriesAtInfinity.backgrounds(eq); // refuses the other types
        InvalidInputException.requireFinite("angle", angle);
        if (!(rMin >= 2 && rMax > 1.5 * rMin && rMax <= 1e4)) {
            throw new InvalidInputException("radius", "the sample interval must satisfy 2 <= rMin < rMax/1.5, rMax <="
                    + " 1e4, got [" + rMin + ", " + rMax + "]");
        }
        double phase = angle + 2 * Math.PI * sheet;
        List<Complex> taus = new ArrayList<>();
        List<Painleve3Value> values = new ArrayList<>();
        double scale = (1 + backgrounds.get(0).norm()) * (eq.type() == Painleve3Type.D7 ? Math.cbrt(rMax) : 1);
        String failure = "";
        for (int j = 0; j < SAMPLES; j++) {
            double r = rMin * Math.pow(rMax / rMin, j / (double) (SAMPLES - 1));
            Complex tau = new Complex(Math.log(r), phase);
            Painleve3Value v;
            try {
                v = solution.evaluate(SurfacePoint.fromLog(tau.getReal(), tau.getImaginary()));
            } catch (TertiusException ex) {
                failure = "|z| = " + r + ": " + ex.getMessage();
                continue;
            }
            if (!(v.relativeError() < 1e-6)) {
                failure = "|z| = " + r + ": the computed value has relative error " + v.relativeError();
                continue;
            }
            if (!(v.w().norm() < 1e4 * scale) || !(v.w().norm() > 1e-4 * scale)) {
                throw poleLine(angle, sheet, r, "|w| = " + v.w().norm() + " there (relative error "
                        + v.relativeError() + ")");
            }
            taus.add(tau);
            values.add(v);
        }
        if (values.size() < 4) {
            return InfinityBehaviour.undecided(angle, sheet, "the solution is not known accurately enough on this ray"
                    + " for |z| in [" + rMin + ", " + rMax + "] (" + (SAMPLES - values.size()) + " of " + SAMPLES
                    + " points failed, e.g. " + failure + "); sample closer to where it was started");
        }
        Complex c = closestBackground(eq, backgrounds, taus, values);
        TransseriesAtInfinity probe = TransseriesAtInfinity.create(eq, c, Complex.ZERO, Complex.ZERO, 2);
        double worst = 0;
        double inner = 0;
        for (int j = 0; j < values.size(); j++) {
            double size = probe.logOf(taus.get(j), values.get(j).w(), values.get(j).dw())[0].norm();
            if (j < values.size() / 2) {
                inner = Math.max(inner, size);
            } else {
                worst = Math.max(worst, size);
            }
        }
        if (!(worst < 2) || (worst >= 0.5 && worst >= 0.9 * inner)) {
            throw poleLine(angle, sheet, rMax, "w does not approach any background "
                    + backgrounds.stream().map(ComplexText::brief).toList()
                    + " (|log(w/c)| up to " + worst + " on the outer half of [" + rMin + ", " + rMax + "], " + inner
                    + " on the inner half)");
        }
        double direction = probe.direction(phase);
        boolean oscillating = Math.abs(Math.cos(direction)) <= 1e-9;
        int free = oscillating ? 0 : (Math.cos(direction) > 0 ? -1 : 1);
        AmplitudeFit fit = new AmplitudeFit(eq, c, free);
        List<AmplitudeFit.Result> fits = new ArrayList<>();
        String last = "";
        for (int j = values.size() - 1; j >= 0 && fits.size() < FITS; j--) {
            try {
                fits.add(fit.at(taus.get(j), values.get(j)));
            } catch (RuntimeException ex) {
                last = ex.getMessage();
            }
        }
        InfinityBehaviour.Kind kind = oscillating ? InfinityBehaviour.Kind.OSCILLATING
                : InfinityBehaviour.Kind.EXPONENTIALLY_SMALL;
        if (fits.size() < 2) {
            return InfinityBehaviour.undecided(angle, sheet, "the amplitude fit about c = " + c + " failed" + (last.isEmpty()
                    ? "" : " (" + last + ")"));
        }
        AmplitudeFit.Result best = AmplitudeFit.combine(fits);
        if (best == null) {
            return InfinityBehaviour.undecided(angle, sheet, "the amplitude fits about c = " + c + " at the outer radii"
                    + " disagree beyond their estimates: " + AmplitudeFit.describe(fits));
        }
        if (oscillating) {
            // the transseries holds only while its terms decay, |Re kappa| < 1/2 (TransseriesAtInfinity)
            double growth = Math.abs(TransseriesAtInfinity.create(eq, c, best.p, best.q, 2).kappa().getReal());
            if (!(growth < 0.5)) {
                return InfinityBehaviour.undecided(angle, sheet, "the amplitudes fitted about c = "
                        + ComplexText.brief(c) + " on [" + rMin + ", " + rMax + "] (p = " + ComplexText.brief(best.p)
                        + ", q = " + ComplexText.brief(best.q) + ") give |Re kappa| = " + growth
                        + " >= 1/2: such an oscillation grows like |z|^(|Re kappa| - 1/2), so w does not approach c"
                        + " along this ray");
            }
        }
        return InfinityBehaviour.measured(kind, angle, sheet, c, best.p, best.q, best.errP, best.errQ,
                "fitted at " + fits.size() + " radii in [" + rMin + ", " + rMax + "]");
    }

    private static InvalidInputException poleLine(double angle, int sheet, double r, String what) {
        return new InvalidInputException("ray", "the ray arg z = " + angle + (sheet == 0 ? "" : " on sheet " + sheet)
                + " meets poles of the solution or no background near |z| = " + r + ": " + what + "; the forms at"
                + " infinity (oscillating about or exponentially close to a background) do not apply there; choose a"
                + " ray in a pole-free sector (see PoleFreeSector)");
    }

    private static Complex closestBackground(Painleve3 eq, List<Complex> backgrounds, List<Complex> taus,
                                             List<Painleve3Value> values) {
        Complex best = backgrounds.get(0);
        double bestScore = Double.POSITIVE_INFINITY;
        for (Complex c : backgrounds) {
            TransseriesAtInfinity t = TransseriesAtInfinity.create(eq, c, Complex.ZERO, Complex.ZERO, 2);
            double score = 0;
            for (int j = values.size() / 2; j < values.size(); j++) {
                Complex ratio = t.logOf(taus.get(j), values.get(j).w(), values.get(j).dw())[0].exp();
                score = Math.max(score, ratio.subtract(1).norm());
            }
            if (score < bestScore) {
                bestScore = score;
                best = c;
            }
        }
        return best;
    }
}
