package org.tertius.core.equation;

import java.util.Arrays;

/**
 * One monomial term {@code c * b^j * y_0^e_0 ... y_{n-1}^e_{n-1}} of a right-hand side, where b is the base
 * of the independent variable (z for {@link IndependentVariable#LOG}, x for {@link IndependentVariable#PLAIN})
 * and c is the coefficient with index {@link #coefficient()} in the system's coefficient list.
 * Immutable.
 */
public final class Term {
    private final int coefficient;
    private final int basePower;
    private final int[] exponents;

    Term(int coefficient, int basePower, int[] exponents) {
        this.coefficient = coefficient;
        this.basePower = basePower;
        this.exponents = exponents.clone();
    }

    public int coefficient() {
        return coefficient;
    }

    public int basePower() {
        return basePower;
    }

    public int exponent(int unknown) {
        return exponents[unknown];
    }

    public int[] exponents() {
        return exponents.clone();
    }

    public int degree() {
        return Arrays.stream(exponents).sum();
    }
}
