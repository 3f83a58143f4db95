package org.tertius.connection.special;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apfloat.Apcomplex;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.core.number.MpArithmetic;
import org.tertius.core.number.MpComplex;
import org.tertius.core.piii.Painleve3Value;

/**
 * A sequence of {@link BacklundTransformation}s applied left to right, with the parameter bookkeeping of each
 * step, applied pointwise to values of any solution (computed by the engine or special) with first-order error
 * propagation, or to a special solution as a whole ({@link #image}). Immutable.
 *
 * <p>Text form ({@link #parse}): steps separated by spaces or semicolons; {@code T1}..{@code T4} are DLMF
 * 32.7.11-14 (signs of a, c: T1 = T(+a,+c), T2 = T(-a,+c), T3 = T(+a,-c), T4 = T(-a,-c)), {@code T5}, {@code T6}
 * are DLMF 32.7.16-17 (T7(+c), T7(-c)), {@code T7'(+a)}, {@code T7'(-a)} their delta = 0 counterparts,
 * {@code S1} or {@code -w}, {@code S2} or {@code 1/w}; the explicit forms {@code T(+a,-c)}, {@code T7(-c)} are
 * accepted as well.
 */
public final class BacklundChain {
    private final List<BacklundTransformation> steps;

    private BacklundChain(List<BacklundTransformation> steps) {
        this.steps = List.copyOf(steps);
    }

    public static BacklundChain of(BacklundTransformation... steps) {
        return new BacklundChain(List.of(steps));
    }

    public static BacklundChain of(List<BacklundTransformation> steps) {
        return new BacklundChain(steps);
    }

    /**
     * Reads a chain such as {@code "T1 T1 S2"} or {@code "T(+a,-c); -w"}.
     *
     * @throws InvalidInputException naming the step that cannot be read and the accepted names
     */
    public static BacklundChain parse(String text) {
        if (text == null || text.isBlank()) {
            throw new InvalidInputException("backlund", "give at least one transformation: " + NAMES);
        }
        List<BacklundTransformation> out = new ArrayList<>();
        for (String token : text.trim().split("[;\\s]+")) {
            out.add(step(token));
        }
        return new BacklundChain(out);
    }

    private static final String NAMES = "T1, T2, T3, T4 (DLMF 32.7.11-14), T5, T6 (DLMF 32.7.16-17), T7'(+a),"
            + " T7'(-a), S1 or -w, S2 or 1/w, or T(+a,+c) with any signs";

    private static BacklundTransformation step(String token) {
        String t = token.toUpperCase(Locale.ROOT).replace(" ", "");
        switch (t) {
            case "T1":
                return BacklundTransformation.d6(1, 1);
            case "T2":
                return BacklundTransformation.d6(-1, 1);
            case "T3":
                return BacklundTransformation.d6(1, -1);
            case "T4":
                return BacklundTransformation.d6(-1, -1);
            case "T5":
            case "T7(+C)":
                return BacklundTransformation.gammaZero(1);
            case "T6":
            case "T7(-C)":
                return BacklundTransformation.gammaZero(-1);
            case "T7'(+A)":
                return BacklundTransformation.deltaZero(1);
            case "T7'(-A)":
                return BacklundTransformation.deltaZero(-1);
            case "S1":
            case "-W":
                return BacklundTransformation.negation();
            case "S2":
            case "1/W":
                return BacklundTransformation.reciprocal();
            default:
                if (t.matches("T\\([+-]A,[+-]C\\)")) {
                    return BacklundTransformation.d6(t.charAt(2) == '+' ? 1 : -1, t.charAt(5) == '+' ? 1 : -1);
                }
                throw new InvalidInputException("backlund", "unknown transformation '" + token + "'; known: " + NAMES);
        }
    }

    public List<BacklundTransformation> steps() {
        return steps;
    }

    /**
     * The parameters after all steps.
     *
     * @throws InvalidInputException if a step does not apply to the parameters it meets (the message names the
     *     step, its position and the condition)
     */
    public ParameterSet apply(ParameterSet p) {
        List<ParameterSet> trail = trail(p);
        return trail.get(trail.size() - 1);
    }

    /** The parameters before the first step and after each step. */
    public List<ParameterSet> trail(ParameterSet p) {
        List<ParameterSet> out = new ArrayList<>();
        out.add(p);
        for (int k = 0; k < steps.size(); k++) {
            try {
                p = steps.get(k).apply(p);
            } catch (InvalidInputException e) {
                throw new InvalidInputException("backlund", "step " + (k + 1) + " of " + steps.size() + ": "
                        + e.getMessage());
            }
            out.add(p);
        }
        return out;
    }

    /** One line per step: the formula and the parameters reached. */
    public String description(ParameterSet p) {
        List<ParameterSet> trail = trail(p);
        StringBuilder b = new StringBuilder("start: " + p.text());
        for (int k = 0; k < steps.size(); k++) {
            b.append('\n').append(k + 1).append(". ").append(steps.get(k).description()).append("\n   -> ")
                    .append(trail.get(k + 1).text());
        }
        return b.toString();
    }

    /**
     * The parameter bookkeeping on one line: {@code (alpha = 1, beta = ..) -T1-> (alpha = 3, ..) -S2-> (..)}.
     *
     * @throws InvalidInputException if a step does not apply to the parameters it meets
     */
    public String trailText(ParameterSet p) {
        List<ParameterSet> trail = trail(p);
        StringBuilder b = new StringBuilder("(" + p.text() + ")");
        for (int k = 0; k < steps.size(); k++) {
            b.append(" -").append(steps.get(k).name()).append("-> (").append(trail.get(k + 1).text()).append(')');
        }
        return b.toString();
    }

    /** The chain on tracked data of a solution of the equation p, in any arithmetic. */
    <T> Tracked<T> map(Tracked.Ops<T> ops, ParameterSet p, T z, Tracked<T> w) {
        for (BacklundTransformation s : steps) {
            w = s.map(ops, p, z, w);
            p = s.apply(p);
        }
        return w;
    }

    /**
     * The image of a double-precision value (w, w' and their errors) of a solution of the equation p.
     *
     * @throws InvalidInputException where a step is singular or does not apply
     */
    public Painleve3Value apply(ParameterSet p, Painleve3Value v) {
        trail(p);
        ComplexArithmetic ar = ComplexArithmetic.INSTANCE;
        Tracked.Ops<Complex> ops = new Tracked.Ops<>(ar);
        Tracked<Complex> w = new Tracked<>(v.w(), v.dw(), Math.log(v.errW()), Math.log(v.errDw()));
        Tracked<Complex> r = map(ops, p, v.point().z(), w);
        return new Painleve3Value(v.point(), r.value, r.derivative, Math.exp(r.logErrValue),
                Math.exp(r.logErrDerivative));
    }

    /**
     * The image of a many-digit value, computed at the precision of the value plus 10 digits.
     *
     * @throws InvalidInputException where a step is singular or does not apply
     */
    public PreciseValue apply(ParameterSet p, PreciseValue v) {
        return apply(p, v, null);
    }

    /**
     * As {@link #apply(ParameterSet, PreciseValue)} at the point z given exactly (null: the double point of the
     * value).
     *
     * @throws InvalidInputException where a step is singular or does not apply
     */
    public PreciseValue apply(ParameterSet p, PreciseValue v, ExactNumber exactZ) {
        trail(p);
        long digits = Math.max(20, Math.min(100000, Math.max(v.w().precision(), v.dw().precision()) + 10));
        MpArithmetic ar = new MpArithmetic(Math.min(digits, 100000));
        Tracked.Ops<MpComplex> ops = new Tracked.Ops<>(ar);
        double ln10 = Math.log(10);
        Tracked<MpComplex> w = new Tracked<>(ar.context().fromApcomplex(v.w()), ar.context().fromApcomplex(v.dw()),
                v.log10ErrorW() * ln10, v.log10ErrorDw() * ln10);
        MpComplex z = exactZ == null ? ar.of(v.point().re(), v.point().im())
                : Conversions.of(ar, Conversions.exact(exactZ));
        Tracked<MpComplex> r = map(ops, p, z, w);
        Apcomplex wi = ar.context().toApcomplex(r.value);
        Apcomplex dwi = ar.context().toApcomplex(r.derivative);
        return new PreciseValue(v.point(), wi, dwi, r.logErrValue / ln10, r.logErrDerivative / ln10);
    }

    /**
     * The image of a special solution of this package, as a solution of its own.
     *
     * @throws InvalidInputException if a step does not apply to the parameters it meets
     */
    public SpecialSolution image(SpecialSolution s) {
        if (!(s instanceof ClosedFormSolution)) {
            throw new IllegalArgumentException("not a solution of this package: " + s.getClass().getName());
        }
        return new Image((ClosedFormSolution) s, this);
    }

    @Override
    public String toString() {
        StringBuilder b = new StringBuilder();
        for (BacklundTransformation s : steps) {
            b.append(b.length() == 0 ? "" : " ").append(s.name());
        }
        return b.toString();
    }

    /** A special solution transformed by a chain, evaluated through its source. */
    private static final class Image extends ClosedFormSolution {
        private final ClosedFormSolution source;
        private final BacklundChain chain;
        private final ParameterSet parameters;

        Image(ClosedFormSolution source, BacklundChain chain) {
            this.source = source;
            this.chain = chain;
            this.parameters = chain.apply(source.parameters());
        }

        @Override
        public ParameterSet parameters() {
            return parameters;
        }

        @Override
        public String kind() {
            return "backlund";
        }

        @Override
        public String description() {
            return "Backlund image " + chain + " of: " + source.description() + "\n" + chain.description(
                    source.parameters());
        }

        @Override
        <T> Estimate<T> compute(AnalyticArithmetic<T> ar, T z, int sheet) {
            Estimate<T> e = source.compute(ar, z, sheet);
            Tracked.Ops<T> ops = new Tracked.Ops<>(ar);
            Tracked<T> r = chain.map(ops, source.parameters(), z,
                    new Tracked<>(e.w(), e.dw(), e.logErrorW(), e.logErrorDw()));
            return new Estimate<>(r.value, r.derivative, r.logErrValue, r.logErrDerivative);
        }
    }
}
