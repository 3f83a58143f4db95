package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.function.BiFunction;
import java.util.function.BinaryOperator;
import org.hipparchus.complex.Complex;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.number.Arithmetic;
import org.tertius.hierarchy.algebra.Evaluation;
import org.tertius.hierarchy.algebra.GaussianRational;
import org.tertius.hierarchy.algebra.Monomial;
import org.tertius.hierarchy.algebra.Polynomial;

/**
 * Turns exact right-hand sides into a core {@link PolynomialSystem}: the parameters other than the independent
 * variable are replaced by their values, the independent variable becomes the base of the system, and equal
 * monomials are merged. Stateless.
 */
final class SystemAssembler {
    private SystemAssembler() {
    }

    /**
     * @param eq the member's ring
     * @param rhs right-hand sides, one per unknown
     * @param variable PLAIN (d/db) or LOG (b d/db; every term then gets one more power of b)
     * @param baseIndex ring index of the independent variable b
     * @param parameters values of all ring variables from index {@code eq.unknownCount()} on (the entry of b is
     *     ignored)
     */
    static PolynomialSystem assemble(MemberEquations eq, List<Polynomial> rhs, IndependentVariable variable,
                                     int baseIndex, List<Complex> parameters) {
        int u = eq.unknownCount();
        PolynomialSystem.Builder b = PolynomialSystem.builder(variable,
                eq.names().subList(0, u).toArray(new String[0]));
        for (int i = 0; i < u; i++) {
            Map<List<Integer>, Complex> merged = merge(eq, rhs.get(i), variable, baseIndex, (mono, coefficient) -> {
                Complex c = coefficient.toComplex();
                for (int v = u; v < eq.variableCount(); v++) {
                    if (v != baseIndex && mono.exponent(v) != 0) {
                        c = c.multiply(parameters.get(v - u).pow(mono.exponent(v)));
                    }
                }
                return c;
            }, Complex::add);
            for (Map.Entry<List<Integer>, Complex> t : merged.entrySet()) {
                int[] exps = new int[u];
                for (int v = 0; v < u; v++) {
                    exps[v] = t.getKey().get(v);
                }
                b.term(i, t.getValue(), t.getKey().get(u), exps);
            }
        }
        return b.build();
    }

    /**
     * The coefficient values of the system {@link #assemble} builds, in its order, computed in another number type
     * (for example in arbitrary precision from exact parameters).
     *
     * @param parameters values of all ring variables from index {@code eq.unknownCount()} on, in that type
     */
    static <T> List<T> coefficients(MemberEquations eq, List<Polynomial> rhs, IndependentVariable variable,
                                    int baseIndex, List<T> parameters, Evaluation<T> evaluation) {
        int u = eq.unknownCount();
        Arithmetic<T> ar = evaluation.arithmetic();
        List<T> out = new ArrayList<>();
        for (int i = 0; i < u; i++) {
            out.addAll(merge(eq, rhs.get(i), variable, baseIndex, (mono, coefficient) -> {
                T c = evaluation.coefficient().apply(coefficient);
                for (int v = u; v < eq.variableCount(); v++) {
                    if (v != baseIndex && mono.exponent(v) != 0) {
                        c = ar.multiply(c, power(ar, parameters.get(v - u), mono.exponent(v)));
                    }
                }
                return c;
            }, ar::add).values());
        }
        return out;
    }

    private static <T> T power(Arithmetic<T> ar, T x, int e) {
        T base = e < 0 ? ar.reciprocal(x) : x;
        T p = ar.one();
        for (int k = 0; k < Math.abs(e); k++) {
            p = ar.multiply(p, base);
        }
        return p;
    }

    /**
     * The terms of one right-hand side with the parameters other than the base folded into their coefficients and
     * equal monomials of the unknowns and the base merged, in a fixed order (first appearance); the key holds the
     * exponents of the unknowns and, last, the power of the base.
     */
    private static <T> Map<List<Integer>, T> merge(MemberEquations eq, Polynomial rhs, IndependentVariable variable,
                                                   int baseIndex, BiFunction<Monomial, GaussianRational, T> value,
                                                   BinaryOperator<T> add) {
        int u = eq.unknownCount();
        int extra = variable == IndependentVariable.LOG ? 1 : 0;
        Map<List<Integer>, T> merged = new LinkedHashMap<>();
        for (Map.Entry<Monomial, GaussianRational> t : rhs.terms().entrySet()) {
            Monomial mono = t.getKey();
            Integer[] key = new Integer[u + 1];
            for (int v = 0; v < u; v++) {
                key[v] = mono.exponent(v);
            }
            key[u] = mono.exponent(baseIndex) + extra;
            merged.merge(Arrays.asList(key), value.apply(mono, t.getValue()), add);
        }
        return merged;
    }
}
