package org.tertius.hierarchy;

import java.math.BigInteger;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.hipparchus.complex.Complex;
import org.hipparchus.fraction.BigFraction;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.equation.Term;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.hierarchy.algebra.GaussianRational;
import org.tertius.hierarchy.algebra.Monomial;
import org.tertius.hierarchy.algebra.Polynomial;

/**
 * The t_n-flow of member n (n &gt;= 2) on the line x = 0 with t_2 = ... = t_{n-1} = 0, as a system
 * {@code t_n dy/dt_n = F(y, t_n)} for {@link FrobeniusSeries}, and its rest point at t_n = 0.
 *
 * <p>Derivation (this project; the flow is {@code A_t = B_lambda + [B, A]}, {@code B = sum_{k=0}^n w_k
 * lambda^(n-k)}, see hierarchy/README.md). The w_k solve {@code a_p = sum_j j t_j w_{j-1-p} (+ m sigma3 at
 * p = -1)}. With x = t_2 = ... = t_{n-1} = 0 only j = n is left:
 * <pre>
 *   w_k = a_{n-1-k} / (n t_n)  (k = 1 .. n-1),   w_n = (a_{-1} - m sigma3) / (n t_n),
 * </pre>
 * each with a simple pole at t_n = 0, so {@code t_n A_t = (t_n B)_lambda + [t_n B, A]} is polynomial in the
 * unknowns and t_n: t_n = 0 is a regular singular point of the t_n-flow on that line. (For x != 0 or a lower
 * time != 0 the recursion for w_k brings x / t_n^2, ...: an irregular singular point; no start there.)
 * F vanishes at t_n = 0 on {@code a_{-1} = m sigma3, a_0 = ... = a_{n-2} = 0, a_{-2}} free (det a_{-2} = s^2):
 * there A = a_{-2}/lambda^2 + m sigma3/lambda, member 1's A at x = 0 (its origin data). The exponents of the
 * linearised flow there (eigenvalues of dF/dy, computed with sympy for n = 2, 3) are 0 (four times), k/n
 * (k = 1 .. n-1) and (k +- 2m)/n (k = 0 .. n-1): 3(n+1) in all. A positive integer among them (2m a non-zero
 * integer) is a resonance; otherwise the solution analytic at t_n = 0 is unique, and it is this series. The
 * exponents k/n belong to a(k-1)11 ~ t_n^(k/n), excluded by a(k)11 being fixed by x = 0 and the times.
 */
final class OriginTimeSeries {
    private OriginTimeSeries() {
    }

    /** The terms of t_n dy/dt_n = F(y, t_n) on x = 0 with the lower times zero, over an arithmetic. */
    static <T> List<List<FrobeniusSeries.Term<T>>> timeSystem(AnalyticArithmetic<T> ar, MemberEquations eq, T m) {
        int n = eq.order();
        if (n < 2) {
            throw new InvalidInputException("member", "the t_n-flow exists for members n >= 2, got " + n);
        }
        int u = eq.unknownCount();
        int top = eq.timeIndex(n);
        List<List<FrobeniusSeries.Term<T>>> out = new ArrayList<>();
        for (Polynomial f : eq.tFlow()) {
            List<FrobeniusSeries.Term<T>> terms = new ArrayList<>();
            for (Map.Entry<Monomial, GaussianRational> t : f.terms().entrySet()) {
                Monomial mono = t.getKey();
                boolean vanishes = false;
                for (int v = u; v < eq.variableCount(); v++) {
                    // x = t_1 and t_2 .. t_{n-1} are zero on the start line
                    vanishes |= v != top && v != eq.mIndex() && mono.exponent(v) != 0;
                }
                if (vanishes) {
                    continue;
                }
                int base = mono.exponent(top) + 1;
                if (base < 0) {
                    throw new TertiusException("t_" + n + "-flow has a pole of order " + (1 - base) + " on x = 0");
                }
                T c = value(ar, t.getValue());
                for (int e = 0; e < mono.exponent(eq.mIndex()); e++) {
                    c = ar.multiply(c, m);
                }
                terms.add(new FrobeniusSeries.Term<>(c, base, factors(mono, u)));
            }
            out.add(terms);
        }
        return out;
    }

    /** The rest point at t_n = 0: a_{-2} given, a_{-1} = m sigma3, a_0 .. a_{n-2} = 0. */
    static <T> T[] restPoint(AnalyticArithmetic<T> ar, T[] into, T m, T a11, T a12, T a21) {
        for (int i = 0; i < into.length; i++) {
            into[i] = ar.zero();
        }
        into[MemberEquations.index(-2, 0)] = a11;
        into[MemberEquations.index(-2, 1)] = a12;
        into[MemberEquations.index(-2, 2)] = a21;
        into[MemberEquations.index(-1, 0)] = m;
        return into;
    }

    /** The terms of a core system whose base powers are all &gt;= 0 (a LOG system such as member 1's x-flow). */
    static List<List<FrobeniusSeries.Term<Complex>>> fromSystem(PolynomialSystem system) {
        return fromSystem(system, system.coefficientValues());
    }

    /** The terms of a system with its coefficient values given in another number type (same order). */
    static <T> List<List<FrobeniusSeries.Term<T>>> fromSystem(PolynomialSystem system, List<T> coefficients) {
        List<List<FrobeniusSeries.Term<T>>> out = new ArrayList<>();
        for (int i = 0; i < system.dimension(); i++) {
            List<FrobeniusSeries.Term<T>> terms = new ArrayList<>();
            for (Term t : system.terms(i)) {
                List<Integer> f = new ArrayList<>();
                for (int v = 0; v < system.dimension(); v++) {
                    for (int e = 0; e < t.exponent(v); e++) {
                        f.add(v);
                    }
                }
                terms.add(new FrobeniusSeries.Term<>(coefficients.get(t.coefficient()), t.basePower(),
                        f.stream().mapToInt(Integer::intValue).toArray()));
            }
            out.add(terms);
        }
        return out;
    }

    private static int[] factors(Monomial mono, int unknowns) {
        List<Integer> f = new ArrayList<>();
        for (int v = 0; v < unknowns; v++) {
            if (mono.exponent(v) < 0) {
                throw new TertiusException("negative power of an unknown in the t-flow");
            }
            for (int e = 0; e < mono.exponent(v); e++) {
                f.add(v);
            }
        }
        return f.stream().mapToInt(Integer::intValue).toArray();
    }

    /** An exact coefficient in the arithmetic (numerators and denominators of the generated flows are small). */
    static <T> T value(AnalyticArithmetic<T> ar, GaussianRational c) {
        T re = rational(ar, c.re());
        T im = rational(ar, c.im());
        return ar.add(re, ar.multiply(im, ar.of(0, 1)));
    }

    private static <T> T rational(AnalyticArithmetic<T> ar, BigFraction f) {
        BigInteger p = f.getNumerator();
        BigInteger q = f.getDenominator();
        if (p.bitLength() > 62 || q.bitLength() > 62) {
            throw new TertiusException("coefficient " + f + " too large for the series");
        }
        return ar.ratio(p.longValue(), q.longValue());
    }
}
