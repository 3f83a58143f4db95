package org.tertius.hierarchy;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.taylor.DoubleTaylorKernel;
import org.tertius.core.taylor.RecurrencePlan;

/**
 * The member-2 potential q(x, t_2) for small |t_2| as a Taylor series in t_2 at fixed x, from the member-1 solution
 * (its slice t_2 = 0): with q = sum_k q_k(x) t^k, r = sum_k r_k(x) t^k, the flow i q_t + q_xx/2 - q^2 r = 0,
 * -i r_t + r_xx/2 - r^2 q = 0 (hierarchy/README.md) gives
 * <pre>
 *   (k+1) q_{k+1} = i (q_k''/2 - sum_{a+b+c=k} q_a q_b r_c),   (k+1) r_{k+1} = -i (r_k''/2 - sum r_a r_b q_c),
 * </pre>
 * run on truncated Taylor series in x at the point (q_0 = a(-1)12/x, r_0 = a(-1)21/x from the core's recurrence
 * for member 1 in the variable x; each step uses two orders of them: the Cauchy-Kovalevskaya construction, valid
 * because the solution is analytic in (x, t_2)). This is a route to small t_2 independent of the t_2-flow, and
 * it does not suffer from the fast oscillations exp(i x^2 / (2 t_2)) of the member-2 x-flow as t_2 -> 0.
 *
 * <p>Errors: truncation of the t-series estimated by twice the last two terms; the state's error carried to
 * first order by the same construction through the perturbed state; rounding 16 eps times the size of the terms
 * (the construction run on moduli). Immutable and thread-safe (work arrays per call).
 */
public final class NlsTimeSeries {
    /** Taylor order in x; the t-series has ORDER / 2 terms. */
    private static final int ORDER = 40;
    /** Relative size of the perturbation that carries the error vector. */
    private static final double PERTURBATION = 1e-7;

    private final PolynomialSystem system;
    private final RecurrencePlan plan;

    /** For the member-1 solutions with these constants (s, m). */
    public NlsTimeSeries(MemberParameters memberOne) {
        if (memberOne.order() != 1) {
            throw new InvalidInputException("parameters", "the small-time series starts from member 1, not member "
                    + memberOne.order());
        }
        MemberEquations eq = HierarchyMember.of(1).equations();
        this.system = SystemAssembler.assemble(eq, eq.xFlow(), IndependentVariable.PLAIN, eq.timeIndex(1),
                memberOne.ringValues(Complex.ZERO));
        this.plan = RecurrencePlan.compile(system);
    }

    /**
     * q at (x, t) from the member-1 state at x != 0 (real or complex) and its errors.
     *
     * @param x the point
     * @param state the member-1 unknowns at x
     * @param errors their absolute errors
     * @param t the member-2 time
     * @param radius a step in x well inside the disk of analyticity at x (the t-series converges for
     *     |t| below about radius^2 / 2)
     */
    public PotentialValue at(Complex x, List<Complex> state, double[] errors, Complex t, double radius) {
        if (x.norm() == 0) {
            throw new InvalidInputException("x", "the member-1 equations are singular at x = 0; there use the t-series"
                    + " of OriginSolution");
        }
        int n = system.dimension();
        double[] re = new double[n];
        double[] im = new double[n];
        double rel = 0;
        for (int i = 0; i < n; i++) {
            re[i] = state.get(i).getReal();
            im[i] = state.get(i).getImaginary();
            rel = Math.max(rel, errors[i] / (1 + state.get(i).norm()));
        }
        double h = Math.min(radius, 0.5 * x.norm());
        DoubleTaylorKernel kernel = new DoubleTaylorKernel(plan, system, ORDER);
        Complex[] series = series(kernel, x, re, im, h, t);
        double propagated = 0;
        if (rel > 0) {
            double eta = PERTURBATION / rel;
            double[] pr = re.clone();
            double[] pi = im.clone();
            for (int i = 0; i < n; i++) {
                pr[i] += eta * errors[i];
            }
            Complex[] perturbed = series(kernel, x, pr, pi, h, t);
            propagated = perturbed[0].subtract(series[0]).norm() / eta;
        }
        return new PotentialValue(x, series[0], propagated + series[1].getReal() + series[2].getReal());
    }

    /**
     * {q(x, t), (truncation, 0), (rounding, 0)}; stops once two terms in a row fall below 1e-17 of the sum.
     * Series are kept as arrays [re | im | modulus] of length 3 (len + 1).
     */
    private Complex[] series(DoubleTaylorKernel kernel, Complex x, double[] re, double[] im, double h, Complex t) {
        int n = system.dimension();
        double[][] cr = new double[n][ORDER + 1];
        double[][] ci = new double[n][ORDER + 1];
        kernel.coefficients(x.getReal(), x.getImaginary(), re, im, h, cr, ci);
        // 1/x = (1/x0) sum (-h s / x0)^j
        double[] inv = new double[3 * (ORDER + 1)];
        Complex ratio = new Complex(-h).divide(x);
        Complex p = x.reciprocal();
        for (int j = 0; j <= ORDER; j++) {
            inv[j] = p.getReal();
            inv[ORDER + 1 + j] = p.getImaginary();
            inv[2 * (ORDER + 1) + j] = p.norm();
            p = p.multiply(ratio);
        }
        int terms = ORDER / 2;
        double[][] q = new double[terms + 1][];
        double[][] r = new double[terms + 1][];
        double[][] qq = new double[terms + 1][];
        double[][] rr = new double[terms + 1][];
        q[0] = new double[3 * (ORDER + 1)];
        r[0] = new double[3 * (ORDER + 1)];
        multiplyAdd(withModuli(cr[4], ci[4]), inv, ORDER, q[0]);
        multiplyAdd(withModuli(cr[5], ci[5]), inv, ORDER, r[0]);
        Complex sum = new Complex(q[0][0], q[0][ORDER + 1]);
        double size = q[0][2 * (ORDER + 1)];
        Complex power = Complex.ONE;
        double last = Double.POSITIVE_INFINITY;
        double before = Double.POSITIVE_INFINITY;
        for (int k = 0; k < terms && !(Math.max(last, before) <= 1e-17 * size); k++) {
            int len = ORDER - 2 * (k + 1);
            qq[k] = new double[3 * (len + 1)];
            rr[k] = new double[3 * (len + 1)];
            for (int a = 0; a <= k; a++) {
                multiplyAdd(q[a], q[k - a], len, qq[k]);
                multiplyAdd(r[a], r[k - a], len, rr[k]);
            }
            double[] cq = new double[3 * (len + 1)];
            double[] cs = new double[3 * (len + 1)];
            for (int m = 0; m <= k; m++) {
                multiplyAdd(qq[m], r[k - m], len, cq);
                multiplyAdd(rr[m], q[k - m], len, cs);
            }
            q[k + 1] = step(q[k], cq, len, k, h, 1);
            r[k + 1] = step(r[k], cs, len, k, h, -1);
            power = power.multiply(t);
            Complex term = new Complex(q[k + 1][0], q[k + 1][len + 1]).multiply(power);
            sum = sum.add(term);
            size += q[k + 1][2 * (len + 1)] * power.norm();
            before = last;
            last = term.norm();
        }
        double truncation = 2 * (last + before);
        return new Complex[] {sum, new Complex(truncation), new Complex(16 * Math.ulp(1.0) * size)};
    }

    /** The next t-coefficient: sign i (f''/2 - cubic) / (k + 1), with moduli. */
    private static double[] step(double[] f, double[] cubic, int len, int k, double h, int sign) {
        int fl = f.length / 3;
        double[] out = new double[3 * (len + 1)];
        for (int j = 0; j <= len; j++) {
            double d = 0.5 * (j + 2.0) * (j + 1.0) / (h * h);
            double ar = f[j + 2] * d - cubic[j];
            double ai = f[fl + j + 2] * d - cubic[len + 1 + j];
            // times sign i / (k + 1)
            out[j] = -sign * ai / (k + 1);
            out[len + 1 + j] = sign * ar / (k + 1);
            out[2 * (len + 1) + j] = (f[2 * fl + j + 2] * d + cubic[2 * (len + 1) + j]) / (k + 1);
        }
        return out;
    }

    private static double[] withModuli(double[] re, double[] im) {
        int l = re.length;
        double[] out = new double[3 * l];
        for (int j = 0; j < l; j++) {
            out[j] = re[j];
            out[l + j] = im[j];
            out[2 * l + j] = Math.hypot(re[j], im[j]);
        }
        return out;
    }

    /** out += a * b truncated at len (Cauchy product; moduli multiplied as moduli). */
    private static void multiplyAdd(double[] a, double[] b, int len, double[] out) {
        int la = a.length / 3;
        int lb = b.length / 3;
        int lo = len + 1;
        for (int j = 0; j <= len; j++) {
            double sr = 0;
            double si = 0;
            double sm = 0;
            for (int l = 0; l <= j; l++) {
                double ar = a[l];
                double ai = a[la + l];
                double br = b[j - l];
                double bi = b[lb + j - l];
                sr += ar * br - ai * bi;
                si += ar * bi + ai * br;
                sm += a[2 * la + l] * b[2 * lb + j - l];
            }
            out[j] += sr;
            out[lo + j] += si;
            out[2 * lo + j] += sm;
        }
    }
}
