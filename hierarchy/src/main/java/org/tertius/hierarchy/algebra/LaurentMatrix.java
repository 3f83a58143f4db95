package org.tertius.hierarchy.algebra;

import java.util.Map;
import java.util.TreeMap;

/**
 * A Laurent polynomial in the spectral parameter lambda with {@link Matrix2} coefficients,
 * {@code sum_k c_k lambda^k}. Immutable.
 */
public final class LaurentMatrix {
    private final int variables;
    private final TreeMap<Integer, Matrix2> coefficients;

    private LaurentMatrix(int variables, TreeMap<Integer, Matrix2> coefficients) {
        this.variables = variables;
        this.coefficients = coefficients;
    }

    /** The Laurent polynomial with the given coefficients (power -> matrix). */
    public static LaurentMatrix of(int variables, Map<Integer, Matrix2> coefficients) {
        TreeMap<Integer, Matrix2> c = new TreeMap<>();
        for (Map.Entry<Integer, Matrix2> e : coefficients.entrySet()) {
            if (!e.getValue().isZero()) {
                c.put(e.getKey(), e.getValue());
            }
        }
        return new LaurentMatrix(variables, c);
    }

    /** The coefficient of lambda^k (zero if absent). */
    public Matrix2 coefficient(int k) {
        Matrix2 m = coefficients.get(k);
        return m == null ? Matrix2.zero(variables) : m;
    }

    /** Lowest power with a non-zero coefficient (0 for the zero series). */
    public int lowest() {
        return coefficients.isEmpty() ? 0 : coefficients.firstKey();
    }

    /** Highest power with a non-zero coefficient (0 for the zero series). */
    public int highest() {
        return coefficients.isEmpty() ? 0 : coefficients.lastKey();
    }

    public LaurentMatrix add(LaurentMatrix o) {
        TreeMap<Integer, Matrix2> c = new TreeMap<>(coefficients);
        for (Map.Entry<Integer, Matrix2> e : o.coefficients.entrySet()) {
            c.merge(e.getKey(), e.getValue(), Matrix2::add);
        }
        return of(variables, c);
    }

    /** [this, o] as a Laurent polynomial. */
    public LaurentMatrix commutator(LaurentMatrix o) {
        TreeMap<Integer, Matrix2> c = new TreeMap<>();
        for (Map.Entry<Integer, Matrix2> a : coefficients.entrySet()) {
            for (Map.Entry<Integer, Matrix2> b : o.coefficients.entrySet()) {
                c.merge(a.getKey() + b.getKey(), a.getValue().commutator(b.getValue()), Matrix2::add);
            }
        }
        return of(variables, c);
    }

    /** Entrywise product of the coefficients' polynomials with a polynomial (a scalar factor). */
    public LaurentMatrix scale(Polynomial f) {
        TreeMap<Integer, Matrix2> c = new TreeMap<>();
        for (Map.Entry<Integer, Matrix2> e : coefficients.entrySet()) {
            c.put(e.getKey(), e.getValue().scale(f));
        }
        return of(variables, c);
    }

    /** d/dlambda. */
    public LaurentMatrix lambdaDerivative() {
        TreeMap<Integer, Matrix2> c = new TreeMap<>();
        for (Map.Entry<Integer, Matrix2> e : coefficients.entrySet()) {
            if (e.getKey() != 0) {
                c.put(e.getKey() - 1, e.getValue().scale(GaussianRational.of(e.getKey(), 0)));
            }
        }
        return of(variables, c);
    }

    /** The scalar Laurent coefficients of det of this matrix polynomial (power -> polynomial). */
    public Map<Integer, Polynomial> determinant() {
        TreeMap<Integer, Polynomial> d = new TreeMap<>();
        for (Map.Entry<Integer, Matrix2> a : coefficients.entrySet()) {
            for (Map.Entry<Integer, Matrix2> b : coefficients.entrySet()) {
                Matrix2 x = a.getValue();
                Matrix2 y = b.getValue();
                // det(sum A_i l^i) = sum_{i,j} (A_i)_11 (A_j)_22 - (A_i)_12 (A_j)_21
                Polynomial p = x.entry(1, 1).multiply(y.entry(2, 2)).subtract(x.entry(1, 2).multiply(y.entry(2, 1)));
                d.merge(a.getKey() + b.getKey(), p, Polynomial::add);
            }
        }
        d.values().removeIf(Polynomial::isZero);
        return d;
    }
}
