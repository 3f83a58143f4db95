package org.tertius.core.taylor;

import java.util.Arrays;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.number.ComplexPairs;

/**
 * Runs a {@link RecurrencePlan} in double-precision complex arithmetic on primitive arrays. A kernel owns its
 * work arrays and is therefore confined to one thread; create one per thread (they are cheap). No allocation
 * happens per arithmetic operation or per call once the kernel exists.
 */
public final class DoubleTaylorKernel {
    private final RecurrencePlan plan;
    private final int order;
    private final int stride;
    private final double[] re;
    private final double[] im;
    private final double[] baseRe;
    private final double[] baseIm;
    private final double[] coefRe;
    private final double[] coefIm;
    private final double[] fr;
    private final double[] fi;

    /**
     * @param plan the compiled recurrence
     * @param system the system the plan was compiled from (supplies the coefficient values)
     * @param order the highest Taylor order N computed
     */
    public DoubleTaylorKernel(RecurrencePlan plan, PolynomialSystem system, int order) {
        this.plan = plan;
        this.order = order;
        this.stride = order + 1;
        this.re = new double[plan.seriesCount() * stride];
        this.im = new double[plan.seriesCount() * stride];
        this.baseRe = new double[plan.basePowers.length * stride];
        this.baseIm = new double[plan.basePowers.length * stride];
        this.fr = new double[plan.n];
        this.fi = new double[plan.n];
        int nc = plan.coefficientCount;
        this.coefRe = new double[nc];
        this.coefIm = new double[nc];
        for (int c = 0; c < nc; c++) {
            coefRe[c] = system.coefficientValues().get(c).getReal();
            coefIm[c] = system.coefficientValues().get(c).getImaginary();
        }
    }

    public int order() {
        return order;
    }

    public RecurrencePlan plan() {
        return plan;
    }

    /**
     * Computes the Taylor coefficients {@code Y_i[k]}, k = 0..N, of the solution through {@code y0} at
     * {@code tau0}, in the scaled variable s with {@code tau = tau0 + scale * s}.
     *
     * @param tau0Re real part of the expansion point
     * @param tau0Im imaginary part of the expansion point
     * @param y0Re real parts of the state
     * @param y0Im imaginary parts of the state
     * @param scale the step scale r (&gt; 0)
     * @param outRe out: real parts, {@code outRe[i][k]}
     * @param outIm out: imaginary parts
     */
    public void coefficients(double tau0Re, double tau0Im, double[] y0Re, double[] y0Im, double scale,
                             double[][] outRe, double[][] outIm) {
        final int n = plan.n;
        final int N = order;
        final int st = stride;
        fillBase(tau0Re, tau0Im, scale);
        for (int i = 0; i < n; i++) {
            re[i * st] = y0Re[i];
            im[i * st] = y0Im[i];
        }
        final int[] pa = plan.prodA;
        final int[] pb = plan.prodB;
        final int np = pa.length;
        final int ng = plan.groupEq.length;
        final double[] fr = this.fr;
        final double[] fi = this.fi;
        for (int k = 0; k < N; k++) {
            // products, coefficient k
            for (int p = 0; p < np; p++) {
                int a = pa[p] * st;
                int b = pb[p] * st;
                double sr = 0;
                double si = 0;
                for (int i = 0; i <= k; i++) {
                    double ar = re[a + i];
                    double ai = im[a + i];
                    double br = re[b + k - i];
                    double bi = im[b + k - i];
                    sr += ar * br - ai * bi;
                    si += ar * bi + ai * br;
                }
                int o = (n + p) * st + k;
                re[o] = sr;
                im[o] = si;
            }
            Arrays.fill(fr, 0.0);
            Arrays.fill(fi, 0.0);
            // groups, coefficient k, and their contribution to F_k
            for (int g = 0; g < ng; g++) {
                double sr = 0;
                double si = 0;
                for (int t = plan.groupStart[g]; t < plan.groupStart[g + 1]; t++) {
                    int s = plan.termSeries[t];
                    double vr;
                    double vi;
                    if (s < 0) {
                        if (k != 0) {
                            continue;
                        }
                        vr = 1;
                        vi = 0;
                    } else {
                        vr = re[s * st + k];
                        vi = im[s * st + k];
                    }
                    int c = plan.termCoef[t];
                    sr += coefRe[c] * vr - coefIm[c] * vi;
                    si += coefRe[c] * vi + coefIm[c] * vr;
                }
                int gs = (n + np + g) * st;
                re[gs + k] = sr;
                im[gs + k] = si;
                int e = plan.groupEq[g];
                int bIdx = plan.groupBase[g];
                if (bIdx < 0) {
                    fr[e] += sr;
                    fi[e] += si;
                } else {
                    int bs = bIdx * st;
                    double cr = 0;
                    double ci = 0;
                    for (int i = 0; i <= k; i++) {
                        double ar = baseRe[bs + i];
                        double ai = baseIm[bs + i];
                        double br = re[gs + k - i];
                        double bi = im[gs + k - i];
                        cr += ar * br - ai * bi;
                        ci += ar * bi + ai * br;
                    }
                    fr[e] += cr;
                    fi[e] += ci;
                }
            }
            double f = scale / (k + 1);
            for (int i = 0; i < n; i++) {
                re[i * st + k + 1] = f * fr[i];
                im[i * st + k + 1] = f * fi[i];
            }
        }
        for (int i = 0; i < n; i++) {
            System.arraycopy(re, i * st, outRe[i], 0, N + 1);
            System.arraycopy(im, i * st, outIm[i], 0, N + 1);
        }
    }

    /** Taylor coefficients in s of b^j for each distinct power j, with tau = tau0 + scale s. */
    private void fillBase(double t0r, double t0i, double scale) {
        int[] powers = plan.basePowers;
        for (int q = 0; q < powers.length; q++) {
            int j = powers[q];
            int o = q * stride;
            if (plan.variable == IndependentVariable.LOG) {
                // e^{j tau} = e^{j tau0} sum (j r s)^k / k!
                double m = Math.exp(j * t0r);
                double cr = m * Math.cos(j * t0i);
                double ci = m * Math.sin(j * t0i);
                baseRe[o] = cr;
                baseIm[o] = ci;
                for (int k = 1; k <= order; k++) {
                    double f = j * scale / k;
                    cr *= f;
                    ci *= f;
                    baseRe[o + k] = cr;
                    baseIm[o + k] = ci;
                }
            } else {
                // (x0 + r s)^j = x0^j sum binom(j, k) (r s / x0)^k
                double mod = ComplexPairs.abs(t0r, t0i);
                double arg = Math.atan2(t0i, t0r);
                double m = Math.pow(mod, j);
                double cr = m * Math.cos(j * arg);
                double ci = m * Math.sin(j * arg);
                baseRe[o] = cr;
                baseIm[o] = ci;
                // ratio r / x0
                double d = t0r * t0r + t0i * t0i;
                double qr = j >= 0 && d == 0 ? 0 : scale * t0r / d;
                double qi = j >= 0 && d == 0 ? 0 : -scale * t0i / d;
                for (int k = 1; k <= order; k++) {
                    if (j >= 0 && k > j) {
                        baseRe[o + k] = 0;
                        baseIm[o + k] = 0;
                        continue;
                    }
                    double f = (double) (j - k + 1) / k;
                    double nr;
                    double ni;
                    if (j >= 0) {
                        // binomial form without dividing by x0: coefficient binom(j,k) x0^{j-k} r^k
                        nr = 0;
                        ni = 0;
                        double pm = Math.pow(mod, j - k);
                        double c = binomial(j, k) * Math.pow(scale, k) * pm;
                        nr = c * Math.cos((j - k) * arg);
                        ni = c * Math.sin((j - k) * arg);
                    } else {
                        double tr = cr * qr - ci * qi;
                        double ti = cr * qi + ci * qr;
                        nr = f * tr;
                        ni = f * ti;
                    }
                    cr = nr;
                    ci = ni;
                    baseRe[o + k] = cr;
                    baseIm[o + k] = ci;
                }
            }
        }
    }

    private static double binomial(int j, int k) {
        double c = 1;
        for (int i = 0; i < k; i++) {
            c = c * (j - i) / (i + 1);
        }
        return c;
    }
}
