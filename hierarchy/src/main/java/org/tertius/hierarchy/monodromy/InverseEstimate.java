package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.hipparchus.linear.Array2DRowRealMatrix;
import org.hipparchus.linear.RealMatrix;
import org.hipparchus.linear.SingularValueDecomposition;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The error estimate of the state found by {@link InverseMonodromy}: |J^+| (|r| + e) for the coordinates, with the
 * pseudo-inverse of the real Jacobian from its singular values above 1e-7 of the largest (the finite differences
 * are good to about sqrt(epsilon)), mapped to the entries of the state by the derivative of the chart; directions
 * the conditions leave free (a gauge) get no error and are counted. Immutable.
 *
 * @param <T> number type
 */
final class InverseEstimate<T> {
    private final double[] stateErrors;
    private final int free;

    /**
     * @param complex whether the coordinates are complex (complex chart) or real (real chart)
     * @param jac rows of the Jacobian of the residuals
     * @param r the residuals
     * @param errors their error estimates
     * @param z the coordinates
     * @param state the state at z
     */
    InverseEstimate(AnalyticArithmetic<T> ar, StateChart<T> chart, boolean complex, List<T[]> jac, List<T> r,
                    List<Double> errors, List<T> z, List<T> state) {
        int p = z.size();
        int cols = complex ? 2 * p : p;
        int rowCount = complex ? 2 * r.size() : r.size();
        double[][] jr = new double[rowCount][cols];
        double[] size = new double[rowCount];
        for (int i = 0; i < r.size(); i++) {
            for (int c = 0; c < p; c++) {
                Complex v = ar.toComplex(jac.get(i)[c]);
                if (complex) {
                    jr[2 * i][2 * c] = v.getReal();
                    jr[2 * i][2 * c + 1] = -v.getImaginary();
                    jr[2 * i + 1][2 * c] = v.getImaginary();
                    jr[2 * i + 1][2 * c + 1] = v.getReal();
                } else {
                    jr[i][c] = v.getReal();
                }
            }
            double e = ar.abs(r.get(i)) + errors.get(i);
            if (complex) {
                size[2 * i] = e;
                size[2 * i + 1] = e;
            } else {
                size[i] = e;
            }
        }
        SingularValueDecomposition svd = new SingularValueDecomposition(new Array2DRowRealMatrix(jr, false));
        double[] sv = svd.getSingularValues();
        double cut = 1e-7 * sv[0];
        int rank = 0;
        for (double v : sv) {
            rank += v > cut ? 1 : 0;
        }
        this.free = cols - rank;
        RealMatrix u = svd.getU();
        RealMatrix vm = svd.getV();
        double[] dz = new double[p];
        for (int c = 0; c < cols; c++) {
            double sum = 0;
            for (int i = 0; i < rowCount; i++) {
                double k = 0;
                for (int j = 0; j < rank; j++) {
                    k += vm.getEntry(c, j) * u.getEntry(i, j) / sv[j];
                }
                sum += Math.abs(k) * size[i];
            }
            dz[complex ? c / 2 : c] += sum;
        }
        double[] err = new double[state.size()];
        double root = Math.sqrt(ar.epsilon());
        for (int c = 0; c < p; c++) {
            double h = root * Math.max(1, ar.abs(z.get(c)));
            List<T> moved = new ArrayList<>(z);
            moved.set(c, ar.add(z.get(c), ar.of(h)));
            List<T> st = chart.state(moved);
            for (int j = 0; j < err.length; j++) {
                err[j] += ar.abs(ar.subtract(st.get(j), state.get(j))) / h * dz[c];
            }
        }
        for (int j = 0; j < err.length; j++) {
            err[j] += 4 * ar.epsilon() * ar.abs(state.get(j));
        }
        this.stateErrors = err;
    }

    double[] stateErrors() {
        return stateErrors.clone();
    }

    /** Real directions left free by the conditions (numerical rank deficiency of the Jacobian). */
    int freeDirections() {
        return free;
    }
}
