package org.tertius.core.pade;

import org.tertius.core.number.Cx;

/**
 * Roots of a complex polynomial by the Aberth-Ehrlich simultaneous iteration (O. Aberth, Math. Comp. 27
 * (1973)), started on a circle given by the Cauchy bound. Used to locate the poles of Pade denominators.
 * Stateless and thread-safe.
 */
public final class PolynomialRoots {
    private PolynomialRoots() {
    }

    /**
     * @param re real parts of the coefficients, lowest degree first
     * @param im imaginary parts
     * @return the roots as {re[], im[]}; empty arrays for a constant polynomial
     */
    public static double[][] roots(double[] re, double[] im) {
        int deg = re.length - 1;
        while (deg > 0 && re[deg] == 0 && im[deg] == 0) {
            deg--;
        }
        if (deg <= 0) {
            return new double[][] {new double[0], new double[0]};
        }
        // monic coefficients a_k = c_k / c_deg
        double lr = re[deg];
        double li = im[deg];
        double ld = lr * lr + li * li;
        double[] ar = new double[deg + 1];
        double[] ai = new double[deg + 1];
        for (int k = 0; k <= deg; k++) {
            ar[k] = (re[k] * lr + im[k] * li) / ld;
            ai[k] = (im[k] * lr - re[k] * li) / ld;
        }
        double bound = 0;
        for (int k = 0; k < deg; k++) {
            bound = Math.max(bound, Cx.abs(ar[k], ai[k]));
        }
        // a root radius estimate: geometric mean of |a_0|^(1/deg) and the Cauchy bound, kept positive
        double r0 = Math.pow(Math.max(Cx.abs(ar[0], ai[0]), 1e-300), 1.0 / deg);
        double radius = Math.min(1 + bound, Math.max(r0, 1e-12));
        double[] zr = new double[deg];
        double[] zi = new double[deg];
        for (int k = 0; k < deg; k++) {
            double t = 2 * Math.PI * k / deg + 0.4;
            zr[k] = radius * Math.cos(t);
            zi[k] = radius * Math.sin(t);
        }
        boolean[] done = new boolean[deg];
        for (int iter = 0; iter < 200; iter++) {
            double maxMove = 0;
            for (int k = 0; k < deg; k++) {
                if (done[k]) {
                    continue;
                }
                // p and p' by Horner
                double pr = 1;
                double pi = 0;
                double dr = 0;
                double di = 0;
                for (int j = deg - 1; j >= 0; j--) {
                    double t = dr * zr[k] - di * zi[k] + pr;
                    di = dr * zi[k] + di * zr[k] + pi;
                    dr = t;
                    t = pr * zr[k] - pi * zi[k] + ar[j];
                    pi = pr * zi[k] + pi * zr[k] + ai[j];
                    pr = t;
                }
                double pm = pr * pr + pi * pi;
                if (pm == 0) {
                    continue;
                }
                // ratio n = p/p'
                double dd = dr * dr + di * di;
                if (dd == 0) {
                    continue;
                }
                double nr = (pr * dr + pi * di) / dd;
                double ni = (pi * dr - pr * di) / dd;
                // s = sum 1/(z_k - z_j)
                double sr = 0;
                double si = 0;
                for (int j = 0; j < deg; j++) {
                    if (j == k) {
                        continue;
                    }
                    double xr = zr[k] - zr[j];
                    double xi = zi[k] - zi[j];
                    double xd = xr * xr + xi * xi;
                    if (xd == 0) {
                        xr = 1e-12;
                        xd = 1e-24;
                    }
                    sr += xr / xd;
                    si += -xi / xd;
                }
                // w = n / (1 - n s)
                double er = 1 - (nr * sr - ni * si);
                double ei = -(nr * si + ni * sr);
                double ed = er * er + ei * ei;
                double wr = (nr * er + ni * ei) / ed;
                double wi = (ni * er - nr * ei) / ed;
                zr[k] -= wr;
                zi[k] -= wi;
                double mv = Cx.abs(wr, wi) / Math.max(1e-300, Cx.abs(zr[k], zi[k]));
                if (mv < 1e-15) {
                    done[k] = true;
                }
                maxMove = Math.max(maxMove, mv);
            }
            if (maxMove < 1e-15) {
                break;
            }
        }
        return new double[][] {zr, zi};
    }
}
