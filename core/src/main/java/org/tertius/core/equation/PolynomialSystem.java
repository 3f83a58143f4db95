package org.tertius.core.equation;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;

/**
 * A first-order system {@code dy_i/dtau = F_i(y, b)} whose right-hand sides are polynomials in the unknowns
 * y with coefficients that are Laurent polynomials in the base b (b = z = e^tau or b = x = tau, see
 * {@link IndependentVariable}). This is the one description that the Taylor recurrence plan is compiled from.
 *
 * <p>The structure (terms, exponents, powers of b) is separate from the coefficient values so that the same
 * structure can be run with coefficients in another precision ({@link #coefficientValues()} holds the
 * double-precision values). Immutable; build with {@link #builder(IndependentVariable, String...)}.
 */
public final class PolynomialSystem {
    private final IndependentVariable variable;
    private final List<String> unknowns;
    private final List<List<Term>> rhs;
    private final List<Complex> coefficients;

    private PolynomialSystem(Builder b) {
        this.variable = b.variable;
        this.unknowns = List.copyOf(b.unknowns);
        List<List<Term>> r = new ArrayList<>();
        for (List<Term> eq : b.rhs) {
            r.add(List.copyOf(eq));
        }
        this.rhs = Collections.unmodifiableList(r);
        this.coefficients = List.copyOf(b.coefficients);
    }

    public static Builder builder(IndependentVariable variable, String... unknowns) {
        return new Builder(variable, unknowns);
    }

    public IndependentVariable variable() {
        return variable;
    }

    public int dimension() {
        return unknowns.size();
    }

    public List<String> unknowns() {
        return unknowns;
    }

    /** The terms of the right-hand side of equation {@code i}. */
    public List<Term> terms(int i) {
        return rhs.get(i);
    }

    /** Double-precision coefficient values, indexed by {@link Term#coefficient()}. */
    public List<Complex> coefficientValues() {
        return coefficients;
    }

    /** Evaluates the right-hand side at a point (used for residual checks, not by the integrator). */
    public Complex[] evaluate(Complex base, Complex[] y) {
        Complex[] out = new Complex[dimension()];
        for (int i = 0; i < dimension(); i++) {
            Complex s = Complex.ZERO;
            for (Term t : rhs.get(i)) {
                Complex m = coefficients.get(t.coefficient()).multiply(base.pow(t.basePower()));
                for (int v = 0; v < dimension(); v++) {
                    for (int e = 0; e < t.exponent(v); e++) {
                        m = m.multiply(y[v]);
                    }
                }
                s = s.add(m);
            }
            out[i] = s;
        }
        return out;
    }

    /** Human-readable equations, e.g. {@code dw/dt = 2*w^2*p + ...}. */
    public String describe() {
        StringBuilder sb = new StringBuilder();
        String d = variable == IndependentVariable.LOG ? "z d/dz " : "d/dx ";
        String base = variable == IndependentVariable.LOG ? "z" : "x";
        for (int i = 0; i < dimension(); i++) {
            sb.append(d).append(unknowns.get(i)).append(" = ");
            boolean first = true;
            for (Term t : rhs.get(i)) {
                Complex c = coefficients.get(t.coefficient());
                if (!first) {
                    sb.append(" + ");
                }
                first = false;
                sb.append('(').append(formatCoefficient(c)).append(')');
                if (t.basePower() != 0) {
                    sb.append('*').append(base);
                    if (t.basePower() != 1) {
                        sb.append('^').append(t.basePower());
                    }
                }
                for (int v = 0; v < dimension(); v++) {
                    int e = t.exponent(v);
                    if (e > 0) {
                        sb.append('*').append(unknowns.get(v));
                        if (e > 1) {
                            sb.append('^').append(e);
                        }
                    }
                }
            }
            if (first) {
                sb.append('0');
            }
            sb.append(System.lineSeparator());
        }
        return sb.toString();
    }

    private static String formatCoefficient(Complex c) {
        if (c.getImaginary() == 0) {
            return Double.toString(c.getReal());
        }
        return c.getReal() + (c.getImaginary() < 0 ? "-" : "+") + Math.abs(c.getImaginary()) + "i";
    }

    /** Builder of a {@link PolynomialSystem}. Not thread-safe. */
    public static final class Builder {
        private final IndependentVariable variable;
        private final List<String> unknowns;
        private final List<List<Term>> rhs = new ArrayList<>();
        private final List<Complex> coefficients = new ArrayList<>();

        private Builder(IndependentVariable variable, String... unknowns) {
            if (unknowns.length == 0) {
                throw new InvalidInputException("unknowns", "a system needs at least one unknown");
            }
            this.variable = variable;
            this.unknowns = List.of(unknowns);
            for (int i = 0; i < unknowns.length; i++) {
                rhs.add(new ArrayList<>());
            }
        }

        /**
         * Adds {@code c * b^basePower * prod y_v^exponents[v]} to the right-hand side of equation {@code eq}.
         * A zero coefficient is kept (the structure of a system does not depend on parameter values, so that
         * the same plan can be run with coefficients computed in another precision).
         */
        public Builder term(int eq, Complex c, int basePower, int... exponents) {
            if (exponents.length != unknowns.size()) {
                throw new InvalidInputException("exponents", "expected " + unknowns.size() + " exponents, got "
                        + exponents.length);
            }
            for (int e : exponents) {
                if (e < 0) {
                    throw new InvalidInputException("exponents", "exponents of unknowns must be >= 0");
                }
            }
            if (!Double.isFinite(c.getReal()) || !Double.isFinite(c.getImaginary())) {
                throw new InvalidInputException("coefficient", "must be finite, got " + c);
            }
            coefficients.add(c);
            rhs.get(eq).add(new Term(coefficients.size() - 1, basePower, exponents));
            return this;
        }

        public Builder term(int eq, double c, int basePower, int... exponents) {
            return term(eq, new Complex(c), basePower, exponents);
        }

        public PolynomialSystem build() {
            return new PolynomialSystem(this);
        }
    }
}
