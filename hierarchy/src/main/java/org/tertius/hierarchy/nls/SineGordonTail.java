package org.tertius.hierarchy.nls;

import org.tertius.core.InvalidInputException;

/**
 * The decaying solutions of theta'' + theta'/zeta + sin theta = 0 at large zeta, to three orders (derived in
 * hierarchy/tools/far_field.py by multiple scales; coefficients p_jk cos k psi + q_jk sin k psi of zeta^(-1/2-j)):
 * <pre>
 *   j = 0: p01 = A
 *   j = 1: p11 = A^3/32, q11 = A/8 - 3A^5/1024, p13 = -A^3/192
 *   j = 2: p21 = -9A^9/2097152 + 13A^5/4096 - 9A/128, q21 = -A^7/4096 + 7A^3/256,
 *          p23 = -3A^5/4096, q23 = 3A^3 (A^4 - 128)/65536, p25 = A^5/20480
 *   psi = zeta - (A^2/16) log zeta + phi.
 * </pre>
 * Stateless.
 */
final class SineGordonTail {
    private SineGordonTail() {
    }

    /** {p_jk, q_jk} for j = 0 .. 2, k = 1, 3, 5 (index (k - 1) / 2). */
    private static double[][][] coefficients(double a) {
        double a2 = a * a;
        double a3 = a2 * a;
        double a5 = a3 * a2;
        double a7 = a5 * a2;
        double a9 = a7 * a2;
        return new double[][][] {
            {{a, 0}, {0, 0}, {0, 0}},
            {{a3 / 32, a / 8 - 3 * a5 / 1024}, {-a3 / 192, 0}, {0, 0}},
            {{-9 * a9 / 2097152 + 13 * a5 / 4096 - 9 * a / 128, -a7 / 4096 + 7 * a3 / 256},
                {-3 * a5 / 4096, 3 * a3 * (a2 * a2 - 128) / 65536}, {a5 / 20480, 0}}};
    }

    /** {theta, theta'} at zeta &gt; 0 for the constants (A, phi). */
    static double[] theta(double a, double phi, double zeta) {
        double nu = a * a / 16;
        double psi = zeta - nu * Math.log(zeta) + phi;
        double slope = 1 - nu / zeta;
        double[][][] c = coefficients(a);
        double th = 0;
        double dth = 0;
        for (int j = 0; j < 3; j++) {
            double pow = Math.pow(zeta, -0.5 - j);
            double f = 0;
            double df = 0;
            for (int m = 0; m < 3; m++) {
                int k = 2 * m + 1;
                double cos = Math.cos(k * psi);
                double sin = Math.sin(k * psi);
                f += c[j][m][0] * cos + c[j][m][1] * sin;
                df += k * (-c[j][m][0] * sin + c[j][m][1] * cos);
            }
            th += pow * f;
            dth += (-0.5 - j) * pow / zeta * f + pow * df * slope;
        }
        return new double[] {th, dth};
    }

    /** The size of the last order kept, zeta^(-5/2) sum_k (|p_2k| + |q_2k|). */
    static double lastOrder(double a, double zeta) {
        double s = 0;
        for (double[] pq : coefficients(a)[2]) {
            s += Math.abs(pq[0]) + Math.abs(pq[1]);
        }
        return s * Math.pow(zeta, -2.5);
    }

    /** The constants (A, phi) whose form matches theta and theta' at zeta (Newton from a guess). */
    static double[] invert(double theta, double slope, double zeta, double a0, double phi0) {
        double a = Math.sqrt(zeta * (theta * theta + slope * slope));
        double phi = Math.atan2(-slope, theta) - zeta + a * a / 16 * Math.log(zeta);
        if (!(a > 0)) {
            a = a0;
            phi = phi0;
        }
        for (int it = 0; it < 50; it++) {
            double[] f = theta(a, phi, zeta);
            double r0 = f[0] - theta;
            double r1 = f[1] - slope;
            double da = 1e-7 * Math.max(1, a);
            double[] fa = theta(a + da, phi, zeta);
            double[] fp = theta(a, phi + 1e-7, zeta);
            double j00 = (fa[0] - f[0]) / da;
            double j10 = (fa[1] - f[1]) / da;
            double j01 = (fp[0] - f[0]) / 1e-7;
            double j11 = (fp[1] - f[1]) / 1e-7;
            double det = j00 * j11 - j01 * j10;
            double stepA = (r0 * j11 - r1 * j01) / det;
            double stepP = (j00 * r1 - j10 * r0) / det;
            a -= stepA;
            phi -= stepP;
            if (Math.abs(stepA) < 1e-12 * a && Math.abs(stepP) < 1e-12) {
                return new double[] {a, phi};
            }
        }
        throw new InvalidInputException("x", "the asymptotic form cannot be matched at zeta = " + zeta
                + " (too close to the origin for the large-zeta expansion)");
    }
}
