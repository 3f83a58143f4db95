package org.tertius.hierarchy.algebra;

import java.util.Arrays;

/**
 * A product of powers of the variables of a polynomial ring; exponents may be negative (for parameters such
 * as 1/t_n). Immutable, ordered lexicographically by exponent vector.
 */
public final class Monomial implements Comparable<Monomial> {
    private final int[] exponents;

    Monomial(int[] exponents) {
        this.exponents = exponents;
    }

    public int size() {
        return exponents.length;
    }

    public int exponent(int variable) {
        return exponents[variable];
    }

    Monomial times(Monomial o) {
        int[] e = exponents.clone();
        for (int i = 0; i < e.length; i++) {
            e[i] += o.exponents[i];
        }
        return new Monomial(e);
    }

    Monomial withExponent(int variable, int value) {
        int[] e = exponents.clone();
        e[variable] = value;
        return new Monomial(e);
    }

    @Override
    public int compareTo(Monomial o) {
        return Arrays.compare(o.exponents, exponents);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof Monomial && Arrays.equals(((Monomial) o).exponents, exponents);
    }

    @Override
    public int hashCode() {
        return Arrays.hashCode(exponents);
    }
}
