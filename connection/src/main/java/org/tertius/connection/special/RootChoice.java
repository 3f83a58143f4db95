package org.tertius.connection.special;

import java.util.ArrayList;
import java.util.List;
import java.util.function.LongPredicate;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * A choice of the square roots a = signA sqrt(gamma) and c = signC sqrt(-delta) (principal roots times signs) of
 * a D6 equation (gamma delta != 0) for which x + y, x = alpha/a and y = beta/c, is a non-zero integer m, with
 * x and y exact. In the normalised variables W(z) = kappa w(lambda z), kappa = a lambda, lambda^2 = 1/(a c),
 * the equation becomes PIII(x, y, 1, -1) (direct substitution: gamma' = lambda^2 gamma / kappa^2 = 1,
 * delta' = lambda^2 kappa^2 delta = -1), so the conditions of NIST DLMF §32.8(iii) and §32.10(iv), stated there
 * for gamma = 1, delta = -1 as alpha + epsilon beta = 4n (rational) and 4n + 2 (Bessel type), read x + y = m.
 *
 * <p>Exactness: x^2 = alpha^2/gamma = A and y^2 = -beta^2/delta = B are Gaussian rationals; x + y = m != 0 forces
 * y = (m^2 + B - A)/(2m), so x and y are Gaussian rationals too, and the test x^2 = A, y^2 = B is exact. The sign
 * choice is only located in double precision (the exact test decides).
 *
 * @param signA sign of a relative to the principal sqrt(gamma)
 * @param signC sign of c relative to the principal sqrt(-delta)
 * @param sum m = x + y
 * @param x alpha / a, exactly
 * @param y beta / c, exactly
 */
public record RootChoice(int signA, int signC, long sum, GaussianRational x, GaussianRational y) {

    /** All sign choices with x + y a non-zero integer accepted by {@code acceptSum}. */
    static List<RootChoice> find(ExactParameters p, LongPredicate acceptSum) {
        List<RootChoice> out = new ArrayList<>();
        if (p.gamma().isZero() || p.delta().isZero()) {
            return out;
        }
        GaussianRational a2 = p.alphaInvariant();
        GaussianRational b2 = p.betaInvariant();
        Complex ra = p.gamma().toComplex().sqrt();
        Complex rc = p.delta().negate().toComplex().sqrt();
        Complex alpha = p.alpha().toComplex();
        Complex beta = p.beta().toComplex();
        for (int sa : new int[] {1, -1}) {
            for (int sc : new int[] {1, -1}) {
                Complex xd = alpha.divide(ra.multiply(sa));
                Complex yd = beta.divide(rc.multiply(sc));
                Complex s = xd.add(yd);
                double scale = 1 + xd.norm() + yd.norm();
                if (!(Math.abs(s.getImaginary()) <= 1e-6 * scale) || Math.abs(s.getReal()) > 1e15) {
                    continue;
                }
                long m = Math.round(s.getReal());
                if (m == 0 || Math.abs(s.getReal() - m) > 1e-6 * scale || !acceptSum.test(m)) {
                    continue;
                }
                GaussianRational mm = GaussianRational.of(m, 0);
                GaussianRational y = mm.multiply(mm).add(b2).subtract(a2).multiply(GaussianRational.of(2 * m, 0)
                        .reciprocal());
                GaussianRational x = mm.subtract(y);
                if (!x.multiply(x).equals(a2) || !y.multiply(y).equals(b2)) {
                    continue;
                }
                if (xd.subtract(x.toComplex()).norm() > 1e-6 * scale || yd.subtract(y.toComplex()).norm() > 1e-6 * scale) {
                    continue;
                }
                out.add(new RootChoice(sa, sc, m, x, y));
            }
        }
        return out;
    }

    /** a = signA sqrt(gamma) in an arithmetic. */
    <T> T a(AnalyticArithmetic<T> ar, ExactParameters p) {
        T r = ar.sqrt(Conversions.of(ar, p.gamma()));
        // 0 - r, not -r: no negative zero parts in double (they would move later square roots across their cut)
        return signA > 0 ? r : ar.subtract(ar.zero(), r);
    }

    /** c = signC sqrt(-delta) in an arithmetic. */
    <T> T c(AnalyticArithmetic<T> ar, ExactParameters p) {
        T r = ar.sqrt(Conversions.of(ar, p.delta().negate()));
        return signC > 0 ? r : ar.subtract(ar.zero(), r);
    }

    /** "a = sqrt(gamma)" or "a = -sqrt(gamma)" and the same for c, for descriptions. */
    String text() {
        return "a = " + (signA > 0 ? "" : "-") + "sqrt(gamma), c = " + (signC > 0 ? "" : "-") + "sqrt(-delta)";
    }
}
