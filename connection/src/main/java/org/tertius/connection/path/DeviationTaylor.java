package org.tertius.connection.path;

import java.util.Arrays;
import java.util.List;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * A Taylor-series integrator for the deviation v = w - c of a Painleve III solution from a constant c, along a
 * straight segment that avoids z = 0, in any {@link AnalyticArithmetic}. It serves two purposes the core engine (double
 * precision, errors relative to 1 + |w|) cannot: it keeps the relative accuracy of a small deviation from the
 * background c (the exponentially small tail of a decaying solution), and it runs in arbitrary precision.
 *
 * <p>The equation multiplied by z w (DLMF eq. 32.2.3), with w = c + V,
 * <pre>  z w V'' = z V'^2 - w V' + alpha (w^3 - c^3) + beta (w - c) + gamma z (w^4 - c^4)
 *             + [alpha c^3 + beta c + z (gamma c^4 + delta)],</pre>
 * where w^n - c^n is expanded in powers of V so that no rounding of c + V enters the small quantities. The
 * Taylor coefficients follow from the coefficient of h^n: v_{n+2} (n+1)(n+2) z0 w(z0) = [right side]_n -
 * sum_{i>=1} [z w]_i [V'']_{n-i}. Step length: the largest h with |v_N h^N| + |v_{N-1} h^(N-1)| at most
 * tolerance |v| (and at most half the distance to 0). Error estimate: the propagated relative error, i.e. the
 * sum of the local truncation errors relative to |v| (plus the relative error of the start data), times |v|
 * at the end (the dominant mode of a decaying solution grows at the same rate as v). Immutable, thread-safe.
 *
 * @param <T> number type
 */
public final class DeviationTaylor<T> {
    private final AnalyticArithmetic<T> ar;
    private final T alpha;
    private final T beta;
    private final T gamma;
    private final T delta;
    private final T c;
    private final int order;
    private final int maxSteps;

    private DeviationTaylor(AnalyticArithmetic<T> ar, List<T> p, T c, int order, int maxSteps) {
        this.ar = ar;
        this.alpha = p.get(0);
        this.beta = p.get(1);
        this.gamma = p.get(2);
        this.delta = p.get(3);
        this.c = c;
        this.order = order;
        this.maxSteps = maxSteps;
    }

    /**
     * @param parameters alpha, beta, gamma, delta
     * @param background the constant c (0 integrates w itself)
     * @param order Taylor order per step, in [8, 400]
     */
    public static <T> DeviationTaylor<T> create(AnalyticArithmetic<T> ar, List<T> parameters, T background, int order) {
        if (order < 8 || order > 400) {
            throw new InvalidInputException("order", "must be in [8, 400], got " + order);
        }
        return new DeviationTaylor<>(ar, parameters, background, order, 100000);
    }

    /**
     * Integrates from the deviation (z0, v0 = w(z0) - c, v0' = w'(z0)) with its error estimates to the target.
     * The result holds v = w - c and w' at the target.
     *
     * @throws UnreachableTargetException if the step size collapses (a zero or pole of w near the segment)
     */
    public LocalValue<T> integrate(LocalValue<T> start, T target, double tolerance) {
        T z = start.z();
        T v = start.w();
        T dv = start.dw();
        double rel = Math.max(start.errW() / Math.max(ar.abs(v), Double.MIN_NORMAL),
                start.errDw() / Math.max(ar.abs(dv), Double.MIN_NORMAL));
        for (int step = 0; step < maxSteps; step++) {
            T rest = ar.subtract(target, z);
            double restLen = ar.abs(rest);
            if (restLen == 0) {
                double av = ar.abs(v);
                double ad = ar.abs(dv);
                double e = ar.epsilon();
                return new LocalValue<>(z, v, dv, av * (rel + e), ad * (rel + e));
            }
            T[] co = coefficients(z, v, dv);
            double scale = Math.max(ar.abs(v), ar.abs(dv) * restLen) + Double.MIN_NORMAL;
            double hLen = Math.min(restLen, 0.5 * ar.abs(z));
            for (int n = order - 1; n <= order; n++) {
                double la = ar.logAbs(co[n]);
                if (la > Double.NEGATIVE_INFINITY) {
                    hLen = Math.min(hLen, Math.exp((Math.log(0.5 * tolerance * scale) - la) / n));
                }
            }
            if (hLen < 1e-12 * Math.max(1, ar.abs(z))) {
                throw new UnreachableTargetException("the Taylor step collapsed at z = " + ar.toComplex(z)
                        + " (a zero or pole of w next to the segment); integrate around it with the core engine");
            }
            T h = hLen >= restLen ? rest : ar.multiply(rest, ar.of(hLen / restLen));
            double ah = ar.abs(h);
            T nv = ar.zero();
            T nd = ar.zero();
            T hp = ar.one();
            for (int n = 0; n <= order; n++) {
                nv = ar.add(nv, ar.multiply(co[n], hp));
                if (n >= 1) {
                    nd = ar.add(nd, ar.multiply(ar.multiply(co[n], ar.of(n)), ar.divide(hp, h)));
                }
                hp = ar.multiply(hp, h);
            }
            double lh = Math.log(ah);
            double local = Math.exp(ar.logAbs(co[order]) + order * lh)
                    + Math.exp(ar.logAbs(co[order - 1]) + (order - 1) * lh);
            rel += local / Math.max(ar.abs(nv), Double.MIN_NORMAL) + ar.epsilon() * order;
            z = hLen >= restLen ? target : ar.add(z, h);
            v = nv;
            dv = nd;
        }
        throw new UnreachableTargetException("more than " + maxSteps + " Taylor steps; the segment is too long");
    }

    /** Taylor coefficients v_0..v_order of V at z0. */
    private T[] coefficients(T z0, T v0, T dv0) {
        int n1 = order + 1;
        T[] v = arr(n1);
        T[] d1 = arr(n1);
        T[] d2 = arr(n1);
        T[] v2 = arr(n1);
        T[] v3 = arr(n1);
        T[] v4 = arr(n1);
        T[] sq = arr(n1);
        v[0] = v0;
        v[1] = dv0;
        T c2 = ar.multiply(c, c);
        T c3 = ar.multiply(c2, c);
        T constant = ar.add(ar.multiply(alpha, c3), ar.multiply(beta, c));
        T zCoef = ar.add(ar.multiply(gamma, ar.multiply(c3, c)), delta);
        T w0 = ar.add(c, v0);
        T lead0 = ar.multiply(z0, w0);
        for (int n = 0; n + 2 <= order; n++) {
            d1[n] = ar.multiply(v[n + 1], ar.of(n + 1));
            v2[n] = conv(v, v, n);
            v3[n] = conv(v2, v, n);
            v4[n] = conv(v2, v2, n);
            sq[n] = conv(d1, d1, n);
            // W^3 - c^3 = 3c^2 V + 3c V^2 + V^3 ; W^4 - c^4 = 4c^3 V + 6c^2 V^2 + 4c V^3 + V^4
            T p3 = cube(n, v, v2, v3, c2, c);
            T p4 = fourth(n, v, v2, v3, v4, c3, c2, c);
            T p4prev = n >= 1 ? fourth(n - 1, v, v2, v3, v4, c3, c2, c) : ar.zero();
            T sqPrev = n >= 1 ? sq[n - 1] : ar.zero();
            // z V'^2 with z = z0 + h
            T rhs = ar.add(ar.multiply(z0, sq[n]), sqPrev);
            // - W V' = -(c V' + V V')
            rhs = ar.subtract(rhs, ar.add(ar.multiply(c, d1[n]), conv(v, d1, n)));
            rhs = ar.add(rhs, ar.add(ar.multiply(alpha, p3), ar.multiply(beta, v[n])));
            rhs = ar.add(rhs, ar.multiply(gamma, ar.add(ar.multiply(z0, p4), p4prev)));
            if (n == 0) {
                rhs = ar.add(rhs, ar.add(constant, ar.multiply(z0, zCoef)));
            } else if (n == 1) {
                rhs = ar.add(rhs, zCoef);
            }
            // [z W V'']_n = sum_i [zW]_i V''_{n-i}, [zW]_i = z0 (c delta_i0 + v_i) + v_{i-1} + c delta_i1
            T known = ar.zero();
            for (int i = 1; i <= n; i++) {
                T zw = ar.add(ar.multiply(z0, v[i]), v[i - 1]);
                if (i == 1) {
                    zw = ar.add(zw, c);
                }
                known = ar.add(known, ar.multiply(zw, d2[n - i]));
            }
            d2[n] = ar.divide(ar.subtract(rhs, known), lead0);
            v[n + 2] = ar.divide(d2[n], ar.of((double) (n + 1) * (n + 2)));
        }
        return v;
    }

    private T cube(int n, T[] v, T[] v2, T[] v3, T c2, T c1) {
        T s = ar.multiply(ar.multiply(c2, ar.of(3)), v[n]);
        s = ar.add(s, ar.multiply(ar.multiply(c1, ar.of(3)), v2[n]));
        return ar.add(s, v3[n]);
    }

    private T fourth(int n, T[] v, T[] v2, T[] v3, T[] v4, T c3, T c2, T c1) {
        T s = ar.multiply(ar.multiply(c3, ar.of(4)), v[n]);
        s = ar.add(s, ar.multiply(ar.multiply(c2, ar.of(6)), v2[n]));
        s = ar.add(s, ar.multiply(ar.multiply(c1, ar.of(4)), v3[n]));
        return ar.add(s, v4[n]);
    }

    private T conv(T[] x, T[] y, int n) {
        T s = ar.zero();
        for (int i = 0; i <= n; i++) {
            s = ar.add(s, ar.multiply(x[i], y[n - i]));
        }
        return s;
    }

    @SuppressWarnings("unchecked")
    private T[] arr(int n) {
        Object[] r = new Object[n];
        Arrays.fill(r, ar.zero());
        return (T[]) r;
    }
}
