package org.tertius.hierarchy.algebra;

import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.SortedMap;
import java.util.TreeMap;
import org.tertius.core.number.Arithmetic;

/**
 * A polynomial with exact {@link GaussianRational} coefficients in a fixed number of variables (Laurent in
 * any variable whose exponent goes negative). Immutable; terms with zero coefficient are never stored, so a
 * polynomial that cancels is exactly {@link #isZero() zero}.
 */
public final class Polynomial {
    private final int variables;
    private final SortedMap<Monomial, GaussianRational> terms;

    private Polynomial(int variables, SortedMap<Monomial, GaussianRational> terms) {
        this.variables = variables;
        this.terms = Collections.unmodifiableSortedMap(terms);
    }

    public static Polynomial zero(int variables) {
        return new Polynomial(variables, new TreeMap<>());
    }

    public static Polynomial constant(int variables, GaussianRational c) {
        return monomial(variables, c, new int[variables]);
    }

    /** The variable with the given index. */
    public static Polynomial variable(int variables, int index) {
        int[] e = new int[variables];
        e[index] = 1;
        return monomial(variables, GaussianRational.ONE, e);
    }

    /** c times the monomial with the given exponents. */
    public static Polynomial monomial(int variables, GaussianRational c, int[] exponents) {
        if (exponents.length != variables) {
            throw new IllegalArgumentException("expected " + variables + " exponents");
        }
        TreeMap<Monomial, GaussianRational> t = new TreeMap<>();
        if (!c.isZero()) {
            t.put(new Monomial(exponents.clone()), c);
        }
        return new Polynomial(variables, t);
    }

    public int variables() {
        return variables;
    }

    /** The terms, ordered, as an unmodifiable map from monomial to coefficient. */
    public SortedMap<Monomial, GaussianRational> terms() {
        return terms;
    }

    public boolean isZero() {
        return terms.isEmpty();
    }

    public Polynomial add(Polynomial o) {
        TreeMap<Monomial, GaussianRational> t = new TreeMap<>(terms);
        for (Map.Entry<Monomial, GaussianRational> e : o.terms.entrySet()) {
            accumulate(t, e.getKey(), e.getValue());
        }
        return new Polynomial(variables, t);
    }

    public Polynomial subtract(Polynomial o) {
        return add(o.negate());
    }

    public Polynomial negate() {
        return scale(GaussianRational.ONE.negate());
    }

    public Polynomial scale(GaussianRational c) {
        TreeMap<Monomial, GaussianRational> t = new TreeMap<>();
        if (!c.isZero()) {
            for (Map.Entry<Monomial, GaussianRational> e : terms.entrySet()) {
                t.put(e.getKey(), e.getValue().multiply(c));
            }
        }
        return new Polynomial(variables, t);
    }

    public Polynomial multiply(Polynomial o) {
        TreeMap<Monomial, GaussianRational> t = new TreeMap<>();
        for (Map.Entry<Monomial, GaussianRational> a : terms.entrySet()) {
            for (Map.Entry<Monomial, GaussianRational> b : o.terms.entrySet()) {
                accumulate(t, a.getKey().times(b.getKey()), a.getValue().multiply(b.getValue()));
            }
        }
        return new Polynomial(variables, t);
    }

    /** The partial derivative with respect to one variable. */
    public Polynomial derivative(int variable) {
        TreeMap<Monomial, GaussianRational> t = new TreeMap<>();
        for (Map.Entry<Monomial, GaussianRational> e : terms.entrySet()) {
            int k = e.getKey().exponent(variable);
            if (k != 0) {
                accumulate(t, e.getKey().withExponent(variable, k - 1),
                        e.getValue().multiply(GaussianRational.of(k, 0)));
            }
        }
        return new Polynomial(variables, t);
    }

    /**
     * The derivative along a flow: {@code sum_i dP/dy_i * rhs_i + dP/d(time)}, where the unknowns y_i are the
     * variables 0 .. rhs.size()-1 and {@code time} is the index of the independent variable.
     */
    public Polynomial derivativeAlong(List<Polynomial> rhs, int time) {
        Polynomial d = derivative(time);
        for (int i = 0; i < rhs.size(); i++) {
            Polynomial p = derivative(i);
            if (!p.isZero()) {
                d = d.add(p.multiply(rhs.get(i)));
            }
        }
        return d;
    }

    /** Evaluates the polynomial with the given values of all variables in the given number type. */
    public <T> T evaluate(Evaluation<T> in, List<T> values) {
        if (values.size() != variables) {
            throw new IllegalArgumentException("expected " + variables + " values");
        }
        Arithmetic<T> a = in.arithmetic();
        T sum = null;
        for (Map.Entry<Monomial, GaussianRational> e : terms.entrySet()) {
            T term = in.coefficient().apply(e.getValue());
            for (int v = 0; v < variables; v++) {
                int k = e.getKey().exponent(v);
                if (k != 0) {
                    T base = k > 0 ? values.get(v) : a.reciprocal(values.get(v));
                    for (int j = 0; j < Math.abs(k); j++) {
                        term = a.multiply(term, base);
                    }
                }
            }
            sum = sum == null ? term : a.add(sum, term);
        }
        return sum == null ? in.coefficient().apply(GaussianRational.ZERO) : sum;
    }

    /** Text with the given variable names, e.g. {@code -2*b0*t_2^-1 + 1/2*x}. */
    public String format(List<String> names) {
        if (terms.isEmpty()) {
            return "0";
        }
        StringBuilder sb = new StringBuilder();
        for (Map.Entry<Monomial, GaussianRational> e : terms.entrySet()) {
            String c = e.getValue().toString();
            boolean neg = c.startsWith("-");
            if (sb.length() > 0) {
                sb.append(neg ? " - " : " + ");
            } else if (neg) {
                sb.append('-');
            }
            String mag = neg ? c.substring(1) : c;
            StringBuilder mono = new StringBuilder();
            for (int v = 0; v < variables; v++) {
                int k = e.getKey().exponent(v);
                if (k != 0) {
                    mono.append(mono.length() > 0 ? "*" : "").append(names.get(v)).append(k != 1 ? "^" + k : "");
                }
            }
            if (mono.length() == 0) {
                sb.append(mag);
            } else if (mag.equals("1")) {
                sb.append(mono);
            } else {
                sb.append(mag).append('*').append(mono);
            }
        }
        return sb.toString();
    }

    private static void accumulate(TreeMap<Monomial, GaussianRational> t, Monomial m, GaussianRational c) {
        GaussianRational s = t.containsKey(m) ? t.get(m).add(c) : c;
        if (s.isZero()) {
            t.remove(m);
        } else {
            t.put(m, s);
        }
    }
}
