package org.tertius.connection.infinity;

import java.util.ArrayList;
import java.util.List;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The summation of a {@link HarmonicTransseries} at a point: the terms x^(-n/2) u_nk E^k order by order, truncated at
 * the smallest pair of orders (the series is asymptotic), with the next pair and the rounding as the error estimate.
 * Utility.
 */
final class TransseriesSum {
    private TransseriesSum() {
    }

    /**
     * u and du/dy of {@code h} at y = exp(tauY), orders limited to {@code use} (the truncation sought among orders
     * 2..use-2, at the smallest pair of terms), with error estimates: the next pair, plus rounding multiplied by
     * {@code rounding} (the amplification of rounding by the recursion, where it was measured).
     */
    static <T> LocalValue<T> at(HarmonicTransseries<T> h, T tauY, int use, double rounding) {
        AnalyticArithmetic<T> ar = h.arithmetic();
        T mu = h.mu();
        T kappa = h.kappa();
        T y = ar.exp(tauY);
        T e = ar.exp(ar.add(ar.multiply(mu, y), ar.multiply(kappa, tauY)));
        T einv = ar.reciprocal(e);
        double ae = ar.abs(e);
        T root = ar.exp(ar.multiply(tauY, ar.ratio(-1, 2)));
        double ar0 = ar.abs(root);
        double[] size = new double[use + 1];
        double[] sizeD = new double[use + 1];
        List<T> term = new ArrayList<>();
        List<T> dterm = new ArrayList<>();
        term.add(ar.zero());
        dterm.add(ar.zero());
        List<T> powers = new ArrayList<>();
        List<T> inversePowers = new ArrayList<>();
        powers.add(ar.one());
        inversePowers.add(ar.one());
        T pow = ar.one();
        T yinv = ar.reciprocal(y);
        for (int n = 1; n <= use; n++) {
            pow = ar.multiply(pow, root);
            T s = ar.zero();
            T ds = ar.zero();
            for (int k = -n; k <= n; k += 2) {
                T coef = h.coefficient(n, k);
                double ac = ar.abs(coef);
                if (ac == 0) {
                    continue;
                }
                T t = ar.multiply(coef, k >= 0 ? power(ar, powers, e, k) : power(ar, inversePowers, einv, -k));
                s = ar.add(s, t);
                T factor = ar.add(ar.multiply(mu, ar.of(k)), ar.multiply(ar.subtract(ar.multiply(kappa, ar.of(k)),
                        ar.ratio(n, 2)), yinv));
                ds = ar.add(ds, ar.multiply(t, factor));
                size[n] += ac * Math.pow(ae, k);
                sizeD[n] += ac * Math.pow(ae, k) * ar.abs(factor);
            }
            size[n] *= Math.pow(ar0, n);
            sizeD[n] *= Math.pow(ar0, n);
            term.add(ar.multiply(s, pow));
            dterm.add(ar.multiply(ds, pow));
        }
        int stop = use - 2;
        double bestPair = Double.POSITIVE_INFINITY;
        for (int n = 2; n <= use - 2; n++) {
            double pair = size[n + 1] + size[n + 2];
            if (pair < bestPair) {
                bestPair = pair;
                stop = n;
            }
        }
        T uu = ar.zero();
        T du = ar.zero();
        double abs = 0;
        double absD = 0;
        for (int n = 1; n <= stop; n++) {
            uu = ar.add(uu, term.get(n));
            du = ar.add(du, dterm.get(n));
            abs += size[n];
            absD += ar.abs(dterm.get(n));
        }
        double eps = 2 * ar.epsilon() * rounding; // 2^-52 in double precision
        double errU = bestPair + 8 * eps * abs * (stop + 1);
        double errDu = sizeD[stop + 1] + sizeD[stop + 2] + 8 * eps * absD * (stop + 1);
        return new LocalValue<>(y, uu, du, errU, errDu);
    }

    /** base^k from the list of powers computed so far (extended by products). */
    private static <T> T power(AnalyticArithmetic<T> ar, List<T> powers, T base, int k) {
        while (powers.size() <= k) {
            powers.add(ar.multiply(powers.get(powers.size() - 1), base));
        }
        return powers.get(k);
    }
}
