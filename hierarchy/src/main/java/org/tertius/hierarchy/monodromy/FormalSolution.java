package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The formal solution at an irregular singular point u = infinity of Poincare rank r of {@code dY/du = C(u) Y},
 * {@code C = sum_{k=kmin}^{r-1} c_k u^k} traceless with a diagonal leading term c_{r-1} = ell sigma3 (ell != 0):
 * <pre>  Y = H(u) exp(Lambda(u)),  H = sum_j h_j u^-j, h_0 = I,
 *   Lambda = sum_{k=0}^{r-1} b_k u^(k+1)/(k+1) + b_{-1} log u   (b_k diagonal).</pre>
 * Computed in two stages (the classical splitting of distinct leading eigenvalues, e.g. W. Wasow, Asymptotic
 * expansions for ordinary differential equations, 1965, ch. V): a gauge P = I + sum_{j>=1} p_j u^-j with
 * off-diagonal p_j makes P^-1 (C P - P') = B = sum_k b_k u^k diagonal; order by order in u^(r-1-j)
 * <pre>  [ell sigma3, p_j] - b_{r-1-j} = -c_{r-1-j} - sum_{i=1}^{j-1} (c_{r-1-i} p_{j-i} - p_{j-i} b_{r-1-i})
 *                                   - (j - r) p_{j-r},</pre>
 * whose diagonal gives b_{r-1-j} and whose off-diagonal gives p_j. Then H = P exp(E) with E the integral of the
 * part of B below u^-1, a diagonal series in 1/u exponentiated by the recurrence j f_j = sum_i i e_i f_{j-i}.
 *
 * <p>On request the recursion also completes the diagonal of c_{r-2} .. c_{-1} so that b_{r-2} .. b_{-1} take
 * prescribed values: b_k is the diagonal of c_k plus terms of higher coefficients only. For the hierarchy these are
 * the constraints det A = -mu^2 on the top coefficients (hierarchy/README.md). Immutable.
 *
 * @param <T> number type
 */
final class FormalSolution<T> {
    private final int rank;
    private final List<Matrix<T>> series;
    private final List<T> exponent11;
    private final List<T> exponent22;
    private final List<Matrix<T>> coefficients;
    private final int lowest;

    private FormalSolution(int rank, List<Matrix<T>> series, List<T> exponent11, List<T> exponent22,
                           List<Matrix<T>> coefficients, int lowest) {
        this.rank = rank;
        this.series = series;
        this.exponent11 = exponent11;
        this.exponent22 = exponent22;
        this.coefficients = coefficients;
        this.lowest = lowest;
    }

    /**
     * @param coefficients c_lowest .. c_{r-1} (traceless; c_{r-1} diagonal with entries ell, -ell)
     * @param targets if not null: the prescribed (1,1) entries of b_{r-2}, ..., b_{-1} (r values), which fix the
     *     diagonals of c_{r-2} .. c_{-1}
     * @param terms number of series coefficients h_1 .. h_terms
     */
    static <T> FormalSolution<T> compute(AnalyticArithmetic<T> ar, List<Matrix<T>> coefficients, int lowest,
                                         List<T> targets, int terms) {
        int r = lowest + coefficients.size();
        List<Matrix<T>> c = new ArrayList<>(coefficients);
        T ell = c.get(c.size() - 1).m11();
        T twoEll = ar.add(ell, ell);
        int steps = terms + r;
        List<T> p12 = new ArrayList<>();
        List<T> p21 = new ArrayList<>();
        List<T> b11 = new ArrayList<>();
        List<T> b22 = new ArrayList<>();
        p12.add(ar.zero());
        p21.add(ar.zero());
        b11.add(ell);
        b22.add(ar.negate(ell));
        for (int j = 1; j <= steps; j++) {
            int k = r - 1 - j;
            Matrix<T> ck = k >= lowest ? c.get(k - lowest) : null;
            T x11 = ck == null ? ar.zero() : ar.negate(ck.m11());
            T x12 = ck == null ? ar.zero() : ar.negate(ck.m12());
            T x21 = ck == null ? ar.zero() : ar.negate(ck.m21());
            T x22 = ck == null ? ar.zero() : ar.negate(ck.m22());
            for (int i = 1; i < j; i++) {
                int ki = r - 1 - i;
                T q12 = p12.get(j - i);
                T q21 = p21.get(j - i);
                if (ki >= lowest) {
                    Matrix<T> ci = c.get(ki - lowest);
                    x11 = ar.subtract(x11, ar.multiply(ci.m12(), q21));
                    x12 = ar.subtract(x12, ar.multiply(ci.m11(), q12));
                    x21 = ar.subtract(x21, ar.multiply(ci.m22(), q21));
                    x22 = ar.subtract(x22, ar.multiply(ci.m21(), q12));
                }
                x12 = ar.add(x12, ar.multiply(q12, b22.get(i)));
                x21 = ar.add(x21, ar.multiply(q21, b11.get(i)));
            }
            if (j - r >= 1) {
                T f = ar.of(j - r);
                x12 = ar.subtract(x12, ar.multiply(f, p12.get(j - r)));
                x21 = ar.subtract(x21, ar.multiply(f, p21.get(j - r)));
            }
            if (targets != null && j <= r) {
                // b11 = c11 - rest11 with x11 = -c11 + rest11: choose c11 so that b11 = target
                T old = ck == null ? ar.zero() : ck.m11();
                T rest11 = ar.add(x11, old);
                T rest22 = ar.subtract(x22, old);
                T c11 = ar.add(targets.get(j - 1), rest11);
                Matrix<T> base = ck == null ? new Matrix<>(ar.zero(), ar.zero(), ar.zero(), ar.zero()) : ck;
                Matrix<T> completed = new Matrix<>(c11, base.m12(), base.m21(), ar.negate(c11));
                c.set(k - lowest, completed);
                x11 = ar.subtract(rest11, c11);
                x22 = ar.add(rest22, c11);
            }
            b11.add(ar.negate(x11));
            b22.add(ar.negate(x22));
            p12.add(ar.divide(x12, twoEll));
            p21.add(ar.negate(ar.divide(x21, twoEll)));
        }
        List<T> f1 = exponentialSeries(ar, b11, r, terms);
        List<T> f2 = exponentialSeries(ar, b22, r, terms);
        List<Matrix<T>> h = new ArrayList<>();
        for (int j = 0; j <= terms; j++) {
            T h12 = ar.zero();
            T h21 = ar.zero();
            for (int i = 1; i <= j; i++) {
                h12 = ar.add(h12, ar.multiply(p12.get(i), f2.get(j - i)));
                h21 = ar.add(h21, ar.multiply(p21.get(i), f1.get(j - i)));
            }
            h.add(new Matrix<>(f1.get(j), h12, h21, f2.get(j)));
        }
        return new FormalSolution<>(r, List.copyOf(h), List.copyOf(b11.subList(0, r + 1)),
                List.copyOf(b22.subList(0, r + 1)), List.copyOf(c), lowest);
    }

    /** exp(E) for E = sum_{j>=1} e_j u^-j, e_j = b_{-1-j} / (-j), with b_{r-1-i} = b.get(i). */
    private static <T> List<T> exponentialSeries(AnalyticArithmetic<T> ar, List<T> b, int r, int terms) {
        List<T> e = new ArrayList<>();
        e.add(ar.zero());
        for (int j = 1; j <= terms; j++) {
            e.add(ar.divide(b.get(r + j), ar.of(-j)));
        }
        List<T> ie = new ArrayList<>();
        for (int i = 0; i <= terms; i++) {
            ie.add(ar.multiply(ar.of(i), e.get(i)));
        }
        List<T> f = new ArrayList<>();
        f.add(ar.one());
        for (int j = 1; j <= terms; j++) {
            T sum = ar.zero();
            for (int i = 1; i <= j; i++) {
                sum = ar.add(sum, ar.multiply(ie.get(i), f.get(j - i)));
            }
            f.add(ar.divide(sum, ar.of(j)));
        }
        return f;
    }

    int rank() {
        return rank;
    }

    /** h_0 .. h_terms. */
    List<Matrix<T>> series() {
        return series;
    }

    /** The (1,1) entry of b_k, k = r-1 .. -1 (b_{-1}: the formal monodromy exponent). */
    T exponent11(int k) {
        return exponent11.get(rank - 1 - k);
    }

    /** The (2,2) entry of b_k, k = r-1 .. -1. */
    T exponent22(int k) {
        return exponent22.get(rank - 1 - k);
    }

    /** The coefficients c_k after the completion of their diagonals (unchanged without targets). */
    Matrix<T> coefficient(int k) {
        return coefficients.get(k - lowest);
    }
}
