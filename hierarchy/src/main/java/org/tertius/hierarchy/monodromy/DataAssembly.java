package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * Monodromy data from the canonical columns at the meeting point: the canonical solutions as matrices, the Stokes
 * matrices S_k = Y_k^-1 Y_{k+1}, the connection matrix E = (Y^inf_1)^-1 Y^0_1 and its normalisation, with the
 * errors propagated to first order ({@link MatrixEstimate}); and the self-checks: det Y = 1, the unit-triangular
 * form of every S_k, the cyclic relation. Stateless.
 */
final class DataAssembly {
    /** The self-checks allow this multiple of their first-order bounds. */
    static final double CHECK_SAFETY = 2;
    /**
     * Relative error estimate of E11 and E22 up to which E is normalised by E11 = E22 (beyond it the factor d of the
     * normalisation would be uncertain).
     */
    private static final double NORMALISABLE = 0.1;

    private DataAssembly() {
    }

    /**
     * @param normalization the normalisation of E to use, or null to choose it: DIAGONAL unless the relative error
     *     estimate of E11 or E22 exceeds {@link #NORMALISABLE} (they vanish, or nearly, within their estimates)
     */
    static <T> MonodromyData<T> assemble(LaxMatrix<T> lax, CanonicalSolutions<T> cs,
                                         MonodromyData.ConnectionNormalization normalization) {
        AnalyticArithmetic<T> ar = lax.arithmetic();
        MatrixArithmetic<T> ma = new MatrixArithmetic<>(ar);
        int n = lax.order();
        Checks checks = new Checks();
        List<MatrixEstimate<T>> yInf = new ArrayList<>();
        for (int k = 1; k <= 2 * n + 1; k++) {
            yInf.add(canonical(cs.infinity(k - 1), cs.infinity(k), k % 2 == 1));
        }
        List<MatrixEstimate<T>> yZero = new ArrayList<>();
        for (int k = 1; k <= 3; k++) {
            yZero.add(canonical(cs.zero(k - 1), cs.zero(k), k % 2 == 0));
        }
        for (int k = 0; k < yInf.size(); k++) {
            checks.unit(ar, "det Y^inf_" + (k + 1), MatrixEstimate.determinant(ma, yInf.get(k)));
        }
        for (int k = 0; k < yZero.size(); k++) {
            checks.unit(ar, "det Y^0_" + (k + 1), MatrixEstimate.determinant(ma, yZero.get(k)));
        }
        List<Estimate<T>> sInf = new ArrayList<>();
        for (int k = 1; k <= 2 * n; k++) {
            MatrixEstimate<T> s = MatrixEstimate.multiply(ma, MatrixEstimate.inverse(ma, yInf.get(k - 1)), yInf.get(k));
            sInf.add(multiplier(ar, checks, "S^inf_" + k, s, k % 2 == 0));
        }
        List<Estimate<T>> sZero = new ArrayList<>();
        for (int k = 1; k <= 2; k++) {
            MatrixEstimate<T> s = MatrixEstimate.multiply(ma, MatrixEstimate.inverse(ma, yZero.get(k - 1)),
                    yZero.get(k));
            sZero.add(multiplier(ar, checks, "S^0_" + k, s, k % 2 == 1));
        }
        MatrixEstimate<T> e = MatrixEstimate.multiply(ma, MatrixEstimate.inverse(ma, yInf.get(0)), yZero.get(0));
        checks.unit(ar, "det E", MatrixEstimate.determinant(ma, e));
        // the right diagonal factor of the canonical solutions at 0 (G0 is fixed up to it by the state)
        double rel11 = e.e11() / ar.abs(e.value().m11());
        double rel22 = e.e22() / ar.abs(e.value().m22());
        double rel12 = e.e12() / ar.abs(e.value().m12());
        double rel21 = e.e21() / ar.abs(e.value().m21());
        boolean diagonal = normalization != null ? normalization == MonodromyData.ConnectionNormalization.DIAGONAL
                : (rel11 < NORMALISABLE && rel22 < NORMALISABLE) || !(rel12 < NORMALISABLE && rel21 < NORMALISABLE);
        T r;
        T delta;
        double relDelta;
        if (diagonal) {
            r = ar.sqrt(ar.multiply(e.value().m11(), e.value().m22()));
            delta = ar.divide(r, e.value().m11());
            relDelta = (rel11 + rel22) / 2;
        } else {
            r = ar.sqrt(ar.negate(ar.multiply(e.value().m12(), e.value().m21())));
            delta = ar.divide(e.value().m12(), r);
            relDelta = (rel12 + rel21) / 2;
        }
        T deltaInv = ar.reciprocal(delta);
        Matrix<T> en = new Matrix<>(ar.multiply(e.value().m11(), delta), ar.multiply(e.value().m12(), deltaInv),
                ar.multiply(e.value().m21(), delta), ar.multiply(e.value().m22(), deltaInv));
        double dAbs = ar.abs(delta);
        double eps = 4 * ar.epsilon();
        MatrixEstimate<T> connection = new MatrixEstimate<>(en,
                e.e11() * dAbs + ar.abs(en.m11()) * (relDelta + eps), e.e12() / dAbs + ar.abs(en.m12()) * (relDelta + eps),
                e.e21() * dAbs + ar.abs(en.m21()) * (relDelta + eps), e.e22() / dAbs + ar.abs(en.m22()) * (relDelta + eps));
        // S^0 upper entries scale by delta^-2, lower ones by delta^2
        T d2 = ar.multiply(delta, delta);
        List<Estimate<T>> sZeroNormal = new ArrayList<>();
        for (int k = 1; k <= 2; k++) {
            boolean upper = k % 2 == 1;
            T f = upper ? ar.reciprocal(d2) : d2;
            T v = ar.multiply(sZero.get(k - 1).value(), f);
            sZeroNormal.add(new Estimate<>(v, sZero.get(k - 1).error() * ar.abs(f) + ar.abs(v) * (2 * relDelta + eps)));
        }
        Estimate<T> mInf = exponent(ar, cs.exponentInfinity(), lax.m());
        T m0Trace = ar.divide(lax.traceIntegral(), ar.multiply(ar.of(0, 2), lax.s()));
        Estimate<T> mZero = exponent(ar, cs.exponentZero(), m0Trace);
        MonodromyData<T> data = new MonodromyData<>(ar, n, sInf, sZeroNormal, connection,
                diagonal ? MonodromyData.ConnectionNormalization.DIAGONAL
                        : MonodromyData.ConnectionNormalization.ANTI_DIAGONAL, mInf, mZero, cs.meetingPoint(),
                List.copyOf(checks.lines));
        double[] cyclic = data.cyclicResidual();
        checks.add("cyclic relation M_inf E = E M_0", cyclic[0], cyclic[1]);
        return data.withChecks(checks.worst, List.copyOf(checks.lines));
    }

    /** Y with the column of the first ray at position 1 (if firstIsColumn1) or 2, the second ray at the other. */
    private static <T> MatrixEstimate<T> canonical(LinearIntegrator.Transport<T> first, LinearIntegrator.Transport<T> second,
                                                   boolean firstIsColumn1) {
        return firstIsColumn1 ? MatrixEstimate.ofColumns(first.value(), first.error(), second.value(), second.error())
                : MatrixEstimate.ofColumns(second.value(), second.error(), first.value(), first.error());
    }

    private static <T> Estimate<T> multiplier(AnalyticArithmetic<T> ar, Checks checks, String name, MatrixEstimate<T> s,
                                              boolean upper) {
        Matrix<T> v = s.value();
        checks.add(name + " (1,1) = 1", ar.abs(ar.subtract(v.m11(), ar.one())), s.e11());
        checks.add(name + " (2,2) = 1", ar.abs(ar.subtract(v.m22(), ar.one())), s.e22());
        if (upper) {
            checks.add(name + " (2,1) = 0", ar.abs(v.m21()), s.e21());
            return new Estimate<>(v.m12(), s.e12());
        }
        checks.add(name + " (1,2) = 0", ar.abs(v.m12()), s.e12());
        return new Estimate<>(v.m21(), s.e21());
    }

    private static <T> Estimate<T> exponent(AnalyticArithmetic<T> ar, T computed, T expected) {
        return new Estimate<>(computed, ar.abs(ar.subtract(computed, expected)) + 16 * ar.epsilon() * (1 + ar.abs(computed)));
    }

    /** The self-checks: deviation against bound. */
    private static final class Checks {
        final List<String> lines = new ArrayList<>();
        double worst;

        <T> void unit(AnalyticArithmetic<T> ar, String name, Estimate<T> value) {
            add(name + " = 1", ar.abs(ar.subtract(value.value(), ar.one())), value.error());
        }

        void add(String name, double deviation, double bound) {
            double ratio = deviation / Math.max(bound, Double.MIN_NORMAL);
            worst = Math.max(worst, ratio);
            lines.add(String.format("%s: deviation %.3g, bound %.3g%s", name, deviation, bound,
                    ratio > CHECK_SAFETY ? " EXCEEDED" : ""));
        }
    }
}
