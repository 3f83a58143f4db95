package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import org.hipparchus.complex.Complex;

/**
 * Which points of a (x, t_n) grid are computed and which are copied by a symmetry of the solution (see
 * {@link PlaneGrid}). The symmetries act as (x, t) -> (sx x, st t) with the value kept or conjugated; a point is
 * computed when it is the largest (t, then x) of its images that lie on the grid. Immutable.
 */
final class GridSymmetry {
    private final List<String> names;
    private final int[][] sourceRow;
    private final int[][] sourceCol;
    private final boolean[][] conjugate;

    private GridSymmetry(List<String> names, int[][] sourceRow, int[][] sourceCol, boolean[][] conjugate) {
        this.names = names;
        this.sourceRow = sourceRow;
        this.sourceCol = sourceCol;
        this.conjugate = conjugate;
    }

    static GridSymmetry of(OriginSolution solution, double[] x, double[] t) {
        int n = solution.member().order();
        List<Complex> a = solution.originData();
        boolean parity = a.get(0).getReal() == 0 && a.get(0).getImaginary() == 0;
        boolean reflection = a.get(0).getReal() == 0 && a.get(1).getReal() == 0 && a.get(2).getReal() == 0
                && solution.m().getImaginary() == 0;
        int odd = n % 2 == 0 ? 1 : -1;
        // elements {sx, st, conjugate}
        List<int[]> group = new ArrayList<>();
        group.add(new int[] {1, 1, 0});
        List<String> names = new ArrayList<>();
        if (parity) {
            group.add(new int[] {-1, odd, 0});
            names.add("q(x, t) = q(-x, " + (odd > 0 ? "t" : "-t") + ") (a11 = 0)");
        }
        if (reflection) {
            group.add(new int[] {1, -odd, 1});
            names.add("q(x, t) = conj q(x, " + (odd > 0 ? "-t" : "t") + ") (a_-2(0) imaginary, m real)");
        }
        if (parity && reflection) {
            group.add(new int[] {-1, -1, 1});
        }
        Index xi = new Index(x);
        Index ti = new Index(t);
        int[][] row = new int[t.length][x.length];
        int[][] col = new int[t.length][x.length];
        boolean[][] conj = new boolean[t.length][x.length];
        for (int i = 0; i < t.length; i++) {
            for (int j = 0; j < x.length; j++) {
                int bi = i;
                int bj = j;
                boolean bc = false;
                for (int[] g : group) {
                    int ii = ti.find(g[1] * t[i]);
                    int jj = xi.find(g[0] * x[j]);
                    if (ii < 0 || jj < 0) {
                        continue;
                    }
                    if (t[ii] > t[bi] || t[ii] == t[bi] && (x[jj] > x[bj] || x[jj] == x[bj] && ii * x.length + jj
                            > bi * x.length + bj)) {
                        bi = ii;
                        bj = jj;
                        bc = g[2] == 1;
                    }
                }
                row[i][j] = bi;
                col[i][j] = bj;
                conj[i][j] = bc;
            }
        }
        return new GridSymmetry(List.copyOf(names), row, col, conj);
    }

    List<String> names() {
        return names;
    }

    /** Rows with at least one computed point, in increasing |t| (the order their start states are made in). */
    List<Integer> computedRows() {
        List<Integer> rows = new ArrayList<>();
        for (int i = 0; i < sourceRow.length; i++) {
            if (columns(i).length > 0) {
                rows.add(i);
            }
        }
        return rows;
    }

    /** The computed columns of row i. */
    int[] columns(int i) {
        List<Integer> c = new ArrayList<>();
        for (int j = 0; j < sourceRow[i].length; j++) {
            if (sourceRow[i][j] == i && sourceCol[i][j] == j) {
                c.add(j);
            }
        }
        return c.stream().mapToInt(Integer::intValue).toArray();
    }

    /** Copies every point that is not computed from its source. */
    void fill(double[][] re, double[][] im, double[][] err, String[] method) {
        for (int i = 0; i < sourceRow.length; i++) {
            boolean copied = false;
            for (int j = 0; j < sourceRow[i].length; j++) {
                int si = sourceRow[i][j];
                int sj = sourceCol[i][j];
                if (si == i && sj == j) {
                    continue;
                }
                copied = true;
                re[i][j] = re[si][sj];
                im[i][j] = conjugate[i][j] ? -im[si][sj] : im[si][sj];
                err[i][j] = err[si][sj];
            }
            if (method[i] == null && copied) {
                method[i] = "symmetry";
            }
        }
    }

    /** Lookup of grid values to within 1e-12 of their size. */
    private static final class Index {
        private final double[] sorted;
        private final int[] order;

        Index(double[] v) {
            Integer[] idx = new Integer[v.length];
            for (int i = 0; i < v.length; i++) {
                idx[i] = i;
            }
            Arrays.sort(idx, Comparator.comparingDouble(i -> v[i]));
            order = new int[v.length];
            sorted = new double[v.length];
            for (int i = 0; i < v.length; i++) {
                order[i] = idx[i];
                sorted[i] = v[idx[i]];
            }
        }

        int find(double value) {
            int k = Arrays.binarySearch(sorted, value);
            if (k >= 0) {
                return order[k];
            }
            int p = -k - 1;
            double tol = 1e-12 * (1 + Math.abs(value));
            for (int c = Math.max(0, p - 1); c <= Math.min(sorted.length - 1, p); c++) {
                if (Math.abs(sorted[c] - value) <= tol) {
                    return order[c];
                }
            }
            return -1;
        }
    }
}
