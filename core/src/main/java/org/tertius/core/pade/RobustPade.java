package org.tertius.core.pade;

import java.util.Arrays;
import org.tertius.core.number.ComplexPairs;

/**
 * Diagonal (or near-diagonal) Pade approximants from Taylor coefficients, with robust degree reduction in the
 * spirit of Gonnet, Guttel and Trefethen, "Robust Pade approximation via SVD", SIAM Review 55 (2013): the
 * Toeplitz matrix of the linear conditions is tested for numerical rank and the degrees are lowered until it
 * has full rank, so that spurious pole-zero pairs (Froissart doublets) are not created. The rank test uses a
 * Householder QR factorisation with column pivoting (rank revealing in practice, and O(n^3) like the SVD but
 * several times cheaper); the null vector is then read off the triangular factor.
 *
 * <p>Stateless and thread-safe: all work arrays are local to a call.
 */
public final class RobustPade {
    /**
     * Per-thread storage of the Toeplitz matrix (its leading rows x cols entries in use): an approximant is built
     * several times per step, and the quick compiler of short runs does not keep such arrays off the heap.
     */
    private static final ThreadLocal<double[][]> MATRIX = ThreadLocal.withInitial(() -> new double[2][0]);

    private RobustPade() {
    }

    /**
     * The robust [m/n] approximant of the series with coefficients {@code c[0..m+n]}.
     *
     * @param cRe real parts of the coefficients (at least m+n+1 of them are used)
     * @param cIm imaginary parts
     * @param m numerator degree requested
     * @param n denominator degree requested
     * @param tol relative tolerance of the rank test (about 1e-14 in double precision)
     * @return the approximant, with degrees possibly lowered
     */
    public static PadeApproximant approximate(double[] cRe, double[] cIm, int m, int n, double tol) {
        return approximate(cRe, cIm, m, n, tol, m + n);
    }

    /**
     * As {@link #approximate(double[], double[], int, int, double)}, with the defect q f - p formed from the
     * coefficients {@code c[0..known]} ({@code known >= m + n}), so that error estimates see what a degree
     * reduction left out.
     */
    public static PadeApproximant approximate(double[] cRe, double[] cIm, int m, int n, double tol, int known) {
        PadeApproximant a = solve(cRe, cIm, m, n, tol);
        return withDefect(a, cRe, cIm, known);
    }

    private static PadeApproximant withDefect(PadeApproximant a, double[] cRe, double[] cIm, int known) {
        double[] qr = a.denominatorRe();
        double[] qi = a.denominatorIm();
        double[] pr = a.numeratorRe();
        double[] pi = a.numeratorIm();
        double[] dr = new double[known + 1];
        double[] di = new double[known + 1];
        int last = 0;
        for (int k = 0; k <= known; k++) {
            double sr = k < pr.length ? -pr[k] : 0;
            double si = k < pi.length ? -pi[k] : 0;
            for (int j = 0; j <= Math.min(k, qr.length - 1); j++) {
                sr += qr[j] * cRe[k - j] - qi[j] * cIm[k - j];
                si += qr[j] * cIm[k - j] + qi[j] * cRe[k - j];
            }
            dr[k] = sr;
            di[k] = si;
            if (sr != 0 || si != 0) {
                last = k;
            }
        }
        return new PadeApproximant(pr, pi, qr, qi, Arrays.copyOf(dr, last + 1),
                Arrays.copyOf(di, last + 1));
    }

    private static PadeApproximant solve(double[] cRe, double[] cIm, int m, int n, double tol) {
        double norm = 0;
        for (int k = 0; k <= m + n; k++) {
            norm = Math.max(norm, ComplexPairs.abs(cRe[k], cIm[k]));
        }
        double ts = tol * norm;
        if (norm == 0) {
            return new PadeApproximant(new double[] {0}, new double[] {0}, new double[] {1}, new double[] {0}, new double[] {0}, new double[] {0});
        }
        // all numerator-relevant coefficients negligible -> the zero function
        boolean allSmall = true;
        for (int k = 0; k <= m; k++) {
            if (ComplexPairs.abs(cRe[k], cIm[k]) > ts) {
                allSmall = false;
                break;
            }
        }
        if (allSmall) {
            return new PadeApproximant(new double[] {0}, new double[] {0}, new double[] {1}, new double[] {0}, new double[] {0}, new double[] {0});
        }
        double[] qr;
        double[] qi;
        while (true) {
            if (n == 0) {
                qr = new double[] {1};
                qi = new double[] {0};
                break;
            }
            // Toeplitz matrix T (n x (n+1)), T[r][j] = c_{m+1+r-j}
            int rows = n;
            int cols = n + 1;
            double[][] matrix = MATRIX.get();
            if (matrix[0].length < rows * cols) {
                matrix[0] = new double[rows * cols];
                matrix[1] = new double[rows * cols];
            }
            double[] ar = matrix[0];
            double[] ai = matrix[1];
            Arrays.fill(ar, 0, rows * cols, 0.0);
            Arrays.fill(ai, 0, rows * cols, 0.0);
            for (int r = 0; r < rows; r++) {
                for (int j = 0; j < cols; j++) {
                    int idx = m + 1 + r - j;
                    if (idx >= 0) {
                        ar[r * cols + j] = cRe[idx];
                        ai[r * cols + j] = cIm[idx];
                    }
                }
            }
            int[] perm = new int[cols];
            int rank = qrPivot(ar, ai, rows, cols, perm, ts);
            if (rank < n) {
                int drop = n - rank;
                n = rank;
                m = m - drop;
                if (m < 0) {
                    // numerator degree exhausted; fall back to a polynomial of what is left
                    m = 0;
                    n = 0;
                }
                continue;
            }
            // null vector of R (upper trapezoidal n x (n+1)) in pivoted order: x_last = 1
            double[] xr = new double[cols];
            double[] xi = new double[cols];
            xr[cols - 1] = 1;
            for (int r = rows - 1; r >= 0; r--) {
                double sr = -ar[r * cols + cols - 1];
                double si = -ai[r * cols + cols - 1];
                for (int j = r + 1; j < cols - 1; j++) {
                    double tr = ar[r * cols + j];
                    double ti = ai[r * cols + j];
                    sr -= tr * xr[j] - ti * xi[j];
                    si -= tr * xi[j] + ti * xr[j];
                }
                double dr = ar[r * cols + r];
                double di = ai[r * cols + r];
                double d = dr * dr + di * di;
                xr[r] = (sr * dr + si * di) / d;
                xi[r] = (si * dr - sr * di) / d;
            }
            qr = new double[cols];
            qi = new double[cols];
            for (int j = 0; j < cols; j++) {
                qr[perm[j]] = xr[j];
                qi[perm[j]] = xi[j];
            }
            break;
        }
        // numerator p_k = sum_j q_j c_{k-j}
        double[] pr = new double[m + 1];
        double[] pi = new double[m + 1];
        for (int k = 0; k <= m; k++) {
            double sr = 0;
            double si = 0;
            for (int j = 0; j <= Math.min(k, qr.length - 1); j++) {
                sr += qr[j] * cRe[k - j] - qi[j] * cIm[k - j];
                si += qr[j] * cIm[k - j] + qi[j] * cRe[k - j];
            }
            pr[k] = sr;
            pi[k] = si;
        }
        // remove a common factor s^lambda (leading zeros of q and p)
        double qn = 0;
        for (int j = 0; j < qr.length; j++) {
            qn = Math.max(qn, ComplexPairs.abs(qr[j], qi[j]));
        }
        int lead = 0;
        while (lead < qr.length - 1 && ComplexPairs.abs(qr[lead], qi[lead]) <= tol * qn) {
            lead++;
        }
        if (lead > 0) {
            qr = Arrays.copyOfRange(qr, lead, qr.length);
            qi = Arrays.copyOfRange(qi, lead, qi.length);
            int pl = Math.min(lead, pr.length - 1);
            pr = Arrays.copyOfRange(pr, pl, pr.length);
            pi = Arrays.copyOfRange(pi, pl, pi.length);
        }
        // normalise q0 = 1
        double d = qr[0] * qr[0] + qi[0] * qi[0];
        double ir = qr[0] / d;
        double ii = -qi[0] / d;
        scale(qr, qi, ir, ii);
        scale(pr, pi, ir, ii);
        // trim negligible trailing coefficients
        int qd = trimmedLength(qr, qi, tol);
        double pnorm = 0;
        for (int k = 0; k < pr.length; k++) {
            pnorm = Math.max(pnorm, ComplexPairs.abs(pr[k], pi[k]));
        }
        int pd = pr.length;
        while (pd > 1 && ComplexPairs.abs(pr[pd - 1], pi[pd - 1]) <= tol * pnorm) {
            pd--;
        }
        return new PadeApproximant(Arrays.copyOf(pr, pd), Arrays.copyOf(pi, pd),
                Arrays.copyOf(qr, qd), Arrays.copyOf(qi, qd), new double[] {0}, new double[] {0});
    }

    private static int trimmedLength(double[] re, double[] im, double tol) {
        double norm = 0;
        for (int k = 0; k < re.length; k++) {
            norm = Math.max(norm, ComplexPairs.abs(re[k], im[k]));
        }
        int len = re.length;
        while (len > 1 && ComplexPairs.abs(re[len - 1], im[len - 1]) <= tol * norm) {
            len--;
        }
        return len;
    }

    private static void scale(double[] re, double[] im, double sr, double si) {
        for (int k = 0; k < re.length; k++) {
            double t = re[k] * sr - im[k] * si;
            im[k] = re[k] * si + im[k] * sr;
            re[k] = t;
        }
    }

    /**
     * In-place Householder QR with column pivoting of a complex rows x cols matrix (row-major), returning
     * the numerical rank (number of diagonal entries of R above {@code threshold}). On return the upper
     * trapezoid holds R and {@code perm[j]} is the original column of pivoted column j.
     */
    static int qrPivot(double[] ar, double[] ai, int rows, int cols, int[] perm, double threshold) {
        double[] colNorm = new double[cols];
        for (int j = 0; j < cols; j++) {
            perm[j] = j;
            double s = 0;
            for (int r = 0; r < rows; r++) {
                s += ar[r * cols + j] * ar[r * cols + j] + ai[r * cols + j] * ai[r * cols + j];
            }
            colNorm[j] = s;
        }
        int steps = Math.min(rows, cols);
        for (int k = 0; k < steps; k++) {
            // pivot: column with the largest remaining norm (recomputed for robustness)
            int best = k;
            double bestNorm = -1;
            for (int j = k; j < cols; j++) {
                double s = 0;
                for (int r = k; r < rows; r++) {
                    s += ar[r * cols + j] * ar[r * cols + j] + ai[r * cols + j] * ai[r * cols + j];
                }
                colNorm[j] = s;
                if (s > bestNorm) {
                    bestNorm = s;
                    best = j;
                }
            }
            if (Math.sqrt(bestNorm) <= threshold) {
                return k;
            }
            if (best != k) {
                for (int r = 0; r < rows; r++) {
                    double t = ar[r * cols + k];
                    ar[r * cols + k] = ar[r * cols + best];
                    ar[r * cols + best] = t;
                    t = ai[r * cols + k];
                    ai[r * cols + k] = ai[r * cols + best];
                    ai[r * cols + best] = t;
                }
                int t = perm[k];
                perm[k] = perm[best];
                perm[best] = t;
            }
            // Householder reflector for column k, rows k..rows-1
            double alpha = Math.sqrt(bestNorm);
            double x0r = ar[k * cols + k];
            double x0i = ai[k * cols + k];
            double x0m = ComplexPairs.abs(x0r, x0i);
            double phr = x0m == 0 ? 1 : x0r / x0m;
            double phi = x0m == 0 ? 0 : x0i / x0m;
            // v = x + e^{i arg x0} alpha e1 ; R_kk = -e^{i arg x0} alpha
            double v0r = x0r + phr * alpha;
            double v0i = x0i + phi * alpha;
            double vnorm2 = v0r * v0r + v0i * v0i;
            for (int r = k + 1; r < rows; r++) {
                vnorm2 += ar[r * cols + k] * ar[r * cols + k] + ai[r * cols + k] * ai[r * cols + k];
            }
            if (vnorm2 == 0) {
                continue;
            }
            double beta = 2 / vnorm2;
            for (int j = k + 1; j < cols; j++) {
                // s = v^H a_j
                double sr = v0r * ar[k * cols + j] + v0i * ai[k * cols + j];
                double si = v0r * ai[k * cols + j] - v0i * ar[k * cols + j];
                for (int r = k + 1; r < rows; r++) {
                    double vr = ar[r * cols + k];
                    double vi = ai[r * cols + k];
                    sr += vr * ar[r * cols + j] + vi * ai[r * cols + j];
                    si += vr * ai[r * cols + j] - vi * ar[r * cols + j];
                }
                sr *= beta;
                si *= beta;
                // a_j -= v s
                ar[k * cols + j] -= v0r * sr - v0i * si;
                ai[k * cols + j] -= v0r * si + v0i * sr;
                for (int r = k + 1; r < rows; r++) {
                    double vr = ar[r * cols + k];
                    double vi = ai[r * cols + k];
                    ar[r * cols + j] -= vr * sr - vi * si;
                    ai[r * cols + j] -= vr * si + vi * sr;
                }
            }
            ar[k * cols + k] = -phr * alpha;
            ai[k * cols + k] = -phi * alpha;
            for (int r = k + 1; r < rows; r++) {
                ar[r * cols + k] = 0;
                ai[r * cols + k] = 0;
            }
        }
        return steps;
    }
}
