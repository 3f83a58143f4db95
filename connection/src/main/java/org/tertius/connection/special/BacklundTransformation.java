package org.tertius.connection.special;

import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * One Backlund transformation of Painleve III (NIST DLMF §32.7(iii)), acting on the data (z, w, w') of a
 * solution and on its parameters. With a = +-sqrt(gamma) and c = +-sqrt(-delta) (principal roots times the
 * chosen signs):
 * <ul>
 *   <li>{@link #d6}(sa, sc), gamma delta != 0: w~ = c (z w' + a z w^2 - (beta/c + 1) w + c z) /
 *       (a w (z w' + a z w^2 + (alpha/a + 1) w + c z)), (alpha, beta) -> (alpha + 2a, beta + 2c). For gamma = 1,
 *       delta = -1 the four sign choices are DLMF 32.7.11-14 (T1: a = c = 1; T2: a = -1, c = 1; T3: a = 1,
 *       c = -1; T4: a = c = -1); the general form follows by the rescaling W(z) = kappa w(lambda z) of
 *       {@link RootChoice}.</li>
 *   <li>{@link #gammaZero}(sc), gamma = 0, alpha delta != 0: w~ = (c z w' - delta z - (beta + c) w) / (alpha w^2),
 *       beta -> beta + 2c (DLMF 32.7.16-17, there for alpha = 1, delta = -1, rescaled).</li>
 *   <li>{@link #deltaZero}(sa), delta = 0, beta gamma != 0: w~ = beta / (a z w' - gamma z w^2 - (alpha - a) w),
 *       alpha -> alpha - 2a (the previous one conjugated by w -> 1/w; DLMF: "similar results hold").</li>
 *   <li>{@link #negation()}: w~ = -w, (alpha, beta) -> (-alpha, -beta) (DLMF 32.7.8).</li>
 *   <li>{@link #reciprocal()}: w~ = 1/w, (alpha, beta, gamma, delta) -> (-beta, -alpha, -delta, -gamma)
 *       (DLMF 32.7.9).</li>
 * </ul>
 * Every map was checked symbolically (sympy: the image satisfies the equation with the new parameters when
 * w'' is taken from the old one) and is checked numerically in the tests against the engine. w~' comes from
 * the chain rule along the solution, w'' from the equation itself; the errors of w, w' and of every rounding
 * are propagated to first order ({@link Tracked}). A point where a denominator vanishes within its error is
 * refused. Immutable.
 */
public final class BacklundTransformation {
    /** The kinds of transformation. */
    public enum Kind { D6, GAMMA_ZERO, DELTA_ZERO, NEGATION, RECIPROCAL }

    private final Kind kind;
    private final int signA;
    private final int signC;

    private BacklundTransformation(Kind kind, int signA, int signC) {
        this.kind = kind;
        this.signA = signA;
        this.signC = signC;
    }

    /** The D6 transformation with a = signA sqrt(gamma), c = signC sqrt(-delta). */
    public static BacklundTransformation d6(int signA, int signC) {
        return new BacklundTransformation(Kind.D6, sign("signA", signA), sign("signC", signC));
    }

    /** The D7 transformation for gamma = 0 with c = signC sqrt(-delta). */
    public static BacklundTransformation gammaZero(int signC) {
        return new BacklundTransformation(Kind.GAMMA_ZERO, 1, sign("signC", signC));
    }

    /** The D7 transformation for delta = 0 with a = signA sqrt(gamma). */
    public static BacklundTransformation deltaZero(int signA) {
        return new BacklundTransformation(Kind.DELTA_ZERO, sign("signA", signA), 1);
    }

    public static BacklundTransformation negation() {
        return new BacklundTransformation(Kind.NEGATION, 1, 1);
    }

    public static BacklundTransformation reciprocal() {
        return new BacklundTransformation(Kind.RECIPROCAL, 1, 1);
    }

    private static int sign(String name, int s) {
        if (s != 1 && s != -1) {
            throw new InvalidInputException(name, "must be 1 or -1, got " + s);
        }
        return s;
    }

    public Kind kind() {
        return kind;
    }

    /**
     * The parameters of the image.
     *
     * @throws InvalidInputException if the transformation does not apply to equations of these parameters
     */
    public ParameterSet apply(ParameterSet p) {
        boolean g = !p.gamma().isZero();
        boolean d = !p.delta().isZero();
        switch (kind) {
            case D6:
                if (!g || !d) {
                    throw new InvalidInputException("transformation", "the D6 transformation " + name()
                            + " needs gamma delta != 0, got " + p.text());
                }
                return p.shifted(signA, signC);
            case GAMMA_ZERO:
                if (g || !d || p.exact().map(e -> e.alpha().isZero()).orElse(false)) {
                    throw new InvalidInputException("transformation", "the transformation " + name()
                            + " needs gamma = 0, alpha != 0, delta != 0, got " + p.text());
                }
                return p.shifted(0, signC);
            case DELTA_ZERO:
                if (d || !g || p.exact().map(e -> e.beta().isZero()).orElse(false)) {
                    throw new InvalidInputException("transformation", "the transformation " + name()
                            + " needs delta = 0, beta != 0, gamma != 0, got " + p.text());
                }
                return p.shifted(-signA, 0);
            case NEGATION:
                return p.negated();
            default:
                return p.reciprocal();
        }
    }

    /** A short name, e.g. {@code T(+a,-c)}, {@code T7(-c)}, {@code -w}, {@code 1/w}. */
    public String name() {
        String a = signA > 0 ? "+a" : "-a";
        String c = signC > 0 ? "+c" : "-c";
        switch (kind) {
            case D6:
                return "T(" + a + "," + c + ")";
            case GAMMA_ZERO:
                return "T7(" + c + ")";
            case DELTA_ZERO:
                return "T7'(" + a + ")";
            case NEGATION:
                return "-w";
            default:
                return "1/w";
        }
    }

    /** The formula and the parameter change in words. */
    public String description() {
        String a = (signA > 0 ? "" : "-") + "sqrt(gamma)";
        String c = (signC > 0 ? "" : "-") + "sqrt(-delta)";
        switch (kind) {
            case D6:
                return name() + ": w -> c (z w' + a z w^2 - (beta/c + 1) w + c z) / (a w (z w' + a z w^2"
                        + " + (alpha/a + 1) w + c z)), alpha -> alpha + 2a, beta -> beta + 2c, with a = " + a
                        + ", c = " + c + " (DLMF 32.7.11-14, rescaled)";
            case GAMMA_ZERO:
                return name() + ": w -> (c z w' - delta z - (beta + c) w) / (alpha w^2), beta -> beta + 2c, with c = "
                        + c + " (gamma = 0; DLMF 32.7.16-17, rescaled)";
            case DELTA_ZERO:
                return name() + ": w -> beta / (a z w' - gamma z w^2 - (alpha - a) w), alpha -> alpha - 2a, with a = "
                        + a + " (delta = 0; conjugate of T7 by w -> 1/w)";
            case NEGATION:
                return "-w: w -> -w, (alpha, beta) -> (-alpha, -beta) (DLMF 32.7.8)";
            default:
                return "1/w: w -> 1/w, (alpha, beta, gamma, delta) -> (-beta, -alpha, -delta, -gamma) (DLMF 32.7.9)";
        }
    }

    /**
     * The image (w~, w~') of (z, w, w') with error bounds, for a solution of the equation with parameters p.
     *
     * @throws InvalidInputException where the map is singular (a denominator vanishes within its error)
     */
    <T> Tracked<T> map(Tracked.Ops<T> ops, ParameterSet p, T z, Tracked<T> w) {
        AnalyticArithmetic<T> ar = ops.ar;
        if (kind == Kind.NEGATION) {
            return ops.negate(w);
        }
        String where = "the Backlund transformation " + name() + " is singular at z = " + ar.toComplex(z)
                + " for this solution (a denominator vanishes within its error)";
        if (kind == Kind.RECIPROCAL) {
            return ops.divide(ops.exact(ar.one()), w, where);
        }
        T alpha = p.alpha(ar);
        T beta = p.beta(ar);
        T gamma = p.gamma(ar);
        T delta = p.delta(ar);
        // w' as a tracked value: its derivative w'' from the equation, with the error bound of that evaluation
        Tracked<T> d2w = secondDerivative(ops, alpha, beta, gamma, delta, z, w,
                where.replace("a denominator vanishes within its error", "w vanishes within its error"));
        Tracked<T> dw = new Tracked<>(w.derivative, d2w.value, w.logErrDerivative, d2w.logErrValue);
        Tracked<T> zt = ops.variable(z);
        Tracked<T> zdw = ops.multiply(zt, dw);
        switch (kind) {
            case D6: {
                Tracked<T> a = ops.constant(signed(ar, ar.sqrt(gamma), signA));
                Tracked<T> c = ops.constant(signed(ar, ar.sqrt(p.minusDelta(ar)), signC));
                Tracked<T> azw2 = ops.multiply(a, ops.multiply(zt, ops.multiply(w, w)));
                Tracked<T> cz = ops.multiply(c, zt);
                Tracked<T> one = ops.exact(ar.one());
                Tracked<T> bOverC = ops.add(ops.divide(ops.constant(beta), c, where), one);
                Tracked<T> aOverA = ops.add(ops.divide(ops.constant(alpha), a, where), one);
                Tracked<T> num = ops.add(ops.subtract(ops.add(zdw, azw2), ops.multiply(bOverC, w)), cz);
                Tracked<T> den = ops.add(ops.add(ops.add(zdw, azw2), ops.multiply(aOverA, w)), cz);
                return ops.divide(ops.multiply(c, num), ops.multiply(ops.multiply(a, w), den), where);
            }
            case GAMMA_ZERO: {
                Tracked<T> c = ops.constant(signed(ar, ar.sqrt(p.minusDelta(ar)), signC));
                Tracked<T> num = ops.subtract(ops.subtract(ops.multiply(c, zdw), ops.multiply(ops.constant(delta), zt)),
                        ops.multiply(ops.add(ops.constant(beta), c), w));
                return ops.divide(num, ops.multiply(ops.constant(alpha), ops.multiply(w, w)), where);
            }
            default: {
                Tracked<T> a = ops.constant(signed(ar, ar.sqrt(gamma), signA));
                Tracked<T> den = ops.subtract(ops.subtract(ops.multiply(a, zdw),
                        ops.multiply(ops.constant(gamma), ops.multiply(zt, ops.multiply(w, w)))),
                        ops.multiply(ops.subtract(ops.constant(alpha), a), w));
                return ops.divide(ops.constant(beta), den, where);
            }
        }
    }

    /**
     * w'' = w'^2/w - w'/z + (alpha w^2 + beta)/z + gamma w^3 + delta/w (DLMF 32.2.3) with its error bound, from w
     * and w' (and their errors) as scalars.
     */
    static <T> Tracked<T> secondDerivative(Tracked.Ops<T> ops, T alpha, T beta, T gamma, T delta, T z, Tracked<T> w,
                                           String where) {
        AnalyticArithmetic<T> ar = ops.ar;
        Tracked<T> ws = new Tracked<>(w.value, ar.zero(), w.logErrValue, Double.NEGATIVE_INFINITY);
        Tracked<T> dws = new Tracked<>(w.derivative, ar.zero(), w.logErrDerivative, Double.NEGATIVE_INFINITY);
        Tracked<T> zs = ops.exact(z);
        Tracked<T> r = ops.divide(ops.multiply(dws, dws), ws, where);
        r = ops.subtract(r, ops.divide(dws, zs, where));
        r = ops.add(r, ops.divide(ops.add(ops.multiply(ops.constant(alpha), ops.multiply(ws, ws)), ops.constant(beta)),
                zs, where));
        r = ops.add(r, ops.multiply(ops.constant(gamma), ops.multiply(ws, ops.multiply(ws, ws))));
        return ops.add(r, ops.divide(ops.constant(delta), ws, where));
    }

    private static <T> T signed(AnalyticArithmetic<T> ar, T x, int sign) {
        return sign > 0 ? x : ar.negate(x);
    }

    @Override
    public String toString() {
        return name();
    }
}
