package org.tertius.connection.special;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * Simultaneous approximation of all roots of a polynomial by the Aberth-Ehrlich iteration (O. Aberth, Math.
 * Comp. 27 (1973) 339; L. W. Ehrlich, Comm. ACM 10 (1967) 107), written once for any arithmetic: each root moves
 * by N_i / (1 - N_i sum_{j != i} 1/(z_i - z_j)) with N_i = p(z_i)/p'(z_i), updated in place (Gauss-Seidel
 * order). Cubic convergence to simple roots; used here only to find approximations, which
 * {@link RootIsolation} then certifies.
 */
final class AberthIteration {
    private AberthIteration() {
    }

    /**
     * Starting points on a circle of radius |c_0/c_d|^(1/d) (the geometric mean of the root moduli), rotated
     * off the real axis.
     */
    static <T> List<T> circle(NumericPolynomial<T> p) {
        AnalyticArithmetic<T> ar = p.arithmetic();
        int d = p.degree();
        double logR = (p.logAbsCoefficient(0) - p.logAbsCoefficient(d)) / d;
        double r = Math.exp(Math.max(-300, Math.min(300, logR)));
        List<T> z = new ArrayList<>(d);
        for (int k = 0; k < d; k++) {
            double t = 2 * Math.PI * k / d + 0.4;
            z.add(ar.of(r * Math.cos(t), r * Math.sin(t)));
        }
        return z;
    }

    /**
     * Iterates in place until every correction is below {@code tolerance} relative to its root (absolute for
     * roots of modulus below the tolerance), until the largest correction stops shrinking over {@code patience}
     * sweeps, or until {@code maxSweeps}.
     *
     * @return true if the tolerance was met
     */
    static <T> boolean iterate(NumericPolynomial<T> p, List<T> z, double tolerance, int maxSweeps, int patience) {
        AnalyticArithmetic<T> ar = p.arithmetic();
        int d = z.size();
        double best = Double.POSITIVE_INFINITY;
        int stale = 0;
        for (int sweep = 0; sweep < maxSweeps; sweep++) {
            double worst = 0;
            for (int i = 0; i < d; i++) {
                Object[] e = p.valueAndDerivative(z.get(i));
                @SuppressWarnings("unchecked")
                T value = (T) e[0];
                @SuppressWarnings("unchecked")
                T derivative = (T) e[1];
                if (ar.abs(value) == 0) {
                    continue; // an exact root: no correction
                }
                if (ar.abs(derivative) == 0) {
                    z.set(i, ar.add(z.get(i), ar.multiply(z.get(i), ar.of(1e-3, 1e-3))));
                    worst = Double.POSITIVE_INFINITY;
                    continue;
                }
                T ratio = ar.divide(value, derivative);
                T sum = ar.zero();
                for (int j = 0; j < d; j++) {
                    if (j != i) {
                        sum = ar.add(sum, ar.reciprocal(ar.subtract(z.get(i), z.get(j))));
                    }
                }
                T correction = ar.divide(ratio, ar.subtract(ar.one(), ar.multiply(ratio, sum)));
                double size = ar.abs(correction);
                if (Double.isNaN(size) || Double.isInfinite(size)) {
                    return false;
                }
                z.set(i, ar.subtract(z.get(i), correction));
                worst = Math.max(worst, size / Math.max(ar.abs(z.get(i)), tolerance));
            }
            if (worst <= tolerance) {
                return true;
            }
            if (worst < 0.5 * best) {
                best = worst;
                stale = 0;
            } else if (++stale >= patience) {
                return false;
            }
        }
        return false;
    }

    /**
     * Newton's iteration on each approximation separately, at most {@code maxSteps} steps each, stopping a root
     * when its correction falls below {@code tolerance} relative (quadratic convergence near a simple root; no
     * repulsion between the roots, so two approximations may meet: certification detects that).
     */
    static <T> void newton(NumericPolynomial<T> p, List<T> z, double tolerance, int maxSteps) {
        AnalyticArithmetic<T> ar = p.arithmetic();
        for (int i = 0; i < z.size(); i++) {
            T x = z.get(i);
            for (int step = 0; step < maxSteps; step++) {
                Object[] e = p.valueAndDerivative(x);
                @SuppressWarnings("unchecked")
                T value = (T) e[0];
                @SuppressWarnings("unchecked")
                T derivative = (T) e[1];
                if (ar.abs(value) == 0 || ar.abs(derivative) == 0) {
                    break;
                }
                T correction = ar.divide(value, derivative);
                x = ar.subtract(x, correction);
                if (ar.abs(correction) <= tolerance * Math.max(ar.abs(x), tolerance)) {
                    break;
                }
            }
            z.set(i, x);
        }
    }

    /** The values of {@code from} in another arithmetic (through Apcomplex, exact for double). */
    static <S, T> List<T> convert(AnalyticArithmetic<S> from, List<S> values, AnalyticArithmetic<T> to) {
        List<T> out = new ArrayList<>(values.size());
        for (S v : values) {
            out.add(Conversions.convert(from, v, to));
        }
        return out;
    }
}
