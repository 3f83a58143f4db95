package org.tertius.hierarchy;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.hipparchus.complex.Complex;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
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
        int extra = variable == IndependentVariable.LOG ? 1 : 0;
        PolynomialSystem.Builder b = PolynomialSystem.builder(variable,
                eq.names().subList(0, u).toArray(new String[0]));
        for (int i = 0; i < u; i++) {
            Map<List<Integer>, Complex> merged = new LinkedHashMap<>();
            for (Map.Entry<Monomial, GaussianRational> t : rhs.get(i).terms().entrySet()) {
                Monomial mono = t.getKey();
                Complex c = t.getValue().toComplex();
                for (int v = u; v < eq.variableCount(); v++) {
                    if (v != baseIndex && mono.exponent(v) != 0) {
                        c = c.multiply(parameters.get(v - u).pow(mono.exponent(v)));
                    }
                }
                Integer[] key = new Integer[u + 1];
                for (int v = 0; v < u; v++) {
                    key[v] = mono.exponent(v);
                }
                key[u] = mono.exponent(baseIndex) + extra;
                merged.merge(Arrays.asList(key), c, Complex::add);
            }
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
}
