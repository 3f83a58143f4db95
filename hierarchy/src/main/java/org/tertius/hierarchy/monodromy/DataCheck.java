package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * Monodromy data given by a user, checked against their constraints (det E = 1, the cyclic relation
 * M_inf E = E M_0) and normalised like computed data ({@link MonodromyData.ConnectionNormalization}). Stateless.
 */
final class DataCheck {
    private DataCheck() {
    }

    static <T> MonodromyData<T> validated(AnalyticArithmetic<T> ar, List<T> stokesAtInfinity, List<T> stokesAtZero,
                                          Matrix<T> e, T m, T m0, double tolerance) {
        if (stokesAtInfinity == null || stokesAtInfinity.isEmpty() || stokesAtInfinity.size() % 2 != 0
                || stokesAtInfinity.size() > 2 * 8) {
            throw new InvalidInputException("Stokes multipliers at infinity", "member n has 2n of them (n = 1 .. 8), got "
                    + (stokesAtInfinity == null ? "none" : stokesAtInfinity.size()));
        }
        if (stokesAtZero == null || stokesAtZero.size() != 2) {
            throw new InvalidInputException("Stokes multipliers at 0", "there are 2 of them, got "
                    + (stokesAtZero == null ? "none" : stokesAtZero.size()));
        }
        if (e == null || m == null || m0 == null || !(tolerance > 0)) {
            throw new InvalidInputException("monodromy data", "need E, m, m0 and a positive tolerance");
        }
        MatrixArithmetic<T> ma = new MatrixArithmetic<>(ar);
        double size = Math.max(1, ma.norm(e));
        double det = ar.abs(ar.subtract(ma.determinant(e), ar.one()));
        if (!(det <= tolerance * size * size)) {
            throw new InvalidInputException("connection matrix", "violates det E = 1: det E - 1 = "
                    + ar.toComplex(ar.subtract(ma.determinant(e), ar.one())));
        }
        // normalise E (and the multipliers at 0) by the rule of DataAssembly: E11 = E22, or E12 = -E21
        T p = ar.multiply(e.m11(), e.m22());
        boolean diagonal = ar.abs(p) > 1e-3 * size * size;
        T delta = diagonal ? ar.divide(ar.sqrt(p), e.m11())
                : ar.divide(e.m12(), ar.sqrt(ar.negate(ar.multiply(e.m12(), e.m21()))));
        T inverse = ar.reciprocal(delta);
        Matrix<T> en = new Matrix<>(ar.multiply(e.m11(), delta), ar.multiply(e.m12(), inverse),
                ar.multiply(e.m21(), delta), ar.multiply(e.m22(), inverse));
        T d2 = ar.multiply(delta, delta);
        List<Estimate<T>> inf = new ArrayList<>();
        for (T s : stokesAtInfinity) {
            inf.add(new Estimate<>(s, 0));
        }
        List<Estimate<T>> zero = List.of(new Estimate<>(ar.divide(stokesAtZero.get(0), d2), 0),
                new Estimate<>(ar.multiply(stokesAtZero.get(1), d2), 0));
        MonodromyData<T> data = new MonodromyData<>(ar, stokesAtInfinity.size() / 2, inf, zero,
                new MatrixEstimate<>(en, 0, 0, 0, 0), diagonal ? MonodromyData.ConnectionNormalization.DIAGONAL
                : MonodromyData.ConnectionNormalization.ANTI_DIAGONAL, new Estimate<>(m, 0), new Estimate<>(m0, 0),
                new double[] {Double.NaN, Double.NaN}, List.of());
        Matrix<T> left = ma.multiply(data.monodromyAtInfinity(), en);
        Matrix<T> right = ma.multiply(en, data.monodromyAtZero());
        double scale = Math.max(1, ma.norm(data.monodromyAtInfinity())) * Math.max(1, ma.norm(en));
        double cyclic = ma.distance(left, right);
        if (!(cyclic <= tolerance * scale)) {
            throw new InvalidInputException("monodromy data", "violate the cyclic relation M_inf E = E M_0 (M_inf = e^(2 pi"
                    + " i m sigma3) (S^inf_1 ... S^inf_2n)^-1, M_0 = e^(2 pi i m0 sigma3) (S^0_1 S^0_2)^-1): |M_inf E - E M_0|"
                    + " = " + cyclic + ", allowed " + tolerance * scale);
        }
        return data;
    }
}
