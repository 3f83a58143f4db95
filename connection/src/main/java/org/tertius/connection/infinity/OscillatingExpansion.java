package org.tertius.connection.infinity;

import org.hipparchus.complex.Complex;
import org.tertius.connection.zero.LocalValue;
import org.tertius.core.InvalidInputException;

/**
 * The oscillating two-parameter family of real solutions of PIII(alpha = 0, beta = 0, gamma = -1, delta = 1) at
 * +infinity, in double precision. Derived here. With w = e^u the equation
 * w'' = w'^2/w - w'/x + gamma w^3 + delta/w becomes (w'' - w'^2/w + w'/x = (u'' + u'/x) w)
 * <pre>  u'' + u'/x = gamma e^(2u) + delta e^(-2u) = -2 sinh 2u,</pre>
 * whose linearisation u'' + u'/x + 4u = 0 has the decaying oscillating solutions x^(-1/2) cos 2x. The ansatz
 * (derived here)
 * <pre>  u = sum_{j &gt;= 0} x^(-1/2-j) sum_{k odd} a_jk e^(ik theta),
 *   theta = 2x + c log x + phi,  a_j,-k = conj(a_jk),</pre>
 * with a_01 = A/2 (so u ~ A x^(-1/2) cos theta), uses the operator identity (derived here, m = 1/2 + j)
 * <pre>  L[x^-m e^(ik theta)] = x^-m e^(ik theta) [(4 - 4k^2) - 4k(ij + kc)/x + (m - ikc)^2/x^2],
 *   L = d^2 + (1/x) d + 4,</pre>
 * and L u = -(2 sinh 2u - 4u) order by order in x^(-1/2-n):
 * <pre>  (4 - 4k^2) a_nk - 4k(i(n-1) + kc) a_(n-1)k + (n - 3/2 - ikc)^2 a_(n-2)k = N_nk,</pre>
 * N_n the x^(-1/2-n) coefficient of -(2 sinh 2u - 4u) (it involves U_0 .. U_(n-1) only, computed from the
 * power series of e^(+-2u) in x^(-1/2)). For |k| != 1 this gives a_nk. For k = 1 it is a condition: at n = 1 it
 * fixes the phase drift c = A^2/2 (-4c A/2 = N_11 = -A^3), at n &gt;= 2 it fixes a_(n-1)1, which enters N_n
 * through -8 U_0^2 U_(n-1): with R = N_n1(a_(n-1)1 = 0) - (n - 3/2 - ic)^2 a_(n-2)1 the condition is
 * -4i(n-1) a + 2A^2 (a + conj a) = R, a 2 x 2 real system, solvable for n &gt;= 2. So
 * <pre>  u = A x^(-1/2) cos theta + x^(-3/2) [(A^3/48) cos 3theta + ...] + ...,
 *   theta = 2x + (A^2/2) log x + phi.</pre>
 * The series in x^-1 is asymptotic (the linear part is the Hankel expansion of J0/Y0); it is truncated before
 * its smallest order and the error estimate is the size of the first omitted order. Immutable and thread-safe.
 */
public final class OscillatingExpansion {
    /** Largest |A| accepted: the range verified against the core engine (see the README). */
    public static final double MAX_AMPLITUDE = 3;

    private final double amp;
    private final double phi;
    private final double c;
    private final int orders;
    private final int width;
    /** a[j][k + width] real and imaginary parts. */
    private final double[][] re;
    private final double[][] im;

    private OscillatingExpansion(double amp, double phi, int orders) {
        this.amp = amp;
        this.phi = phi;
        this.c = amp * amp / 2;
        this.orders = orders;
        this.width = 2 * orders + 5;
        this.re = new double[orders + 2][2 * width + 1];
        this.im = new double[orders + 2][2 * width + 1];
        build();
    }

    /**
     * The expansion with amplitude A and phase constant phi, coefficients up to x^(-1/2-orders).
     *
     * @throws InvalidInputException for A or phi not finite, |A| &gt; {@link #MAX_AMPLITUDE}, orders outside [2, 60]
     */
    public static OscillatingExpansion create(double amplitude, double phase, int orders) {
        if (!Double.isFinite(amplitude) || Math.abs(amplitude) > MAX_AMPLITUDE) {
            throw new InvalidInputException("A", "must be a finite real number with |A| <= " + MAX_AMPLITUDE
                    + " (the amplitude of u = log w ~ A x^(-1/2) cos(2x + (A^2/2) log x + phi); the expansion is"
                    + " verified against the integrator only there); for larger |A| give the solution by start data"
                    + " (--z0 --w0 --dw0) instead, got " + amplitude);
        }
        if (!Double.isFinite(phase)) {
            throw new InvalidInputException("phi", "must be a finite real number, got " + phase);
        }
        if (orders < 2 || orders > 60) {
            throw new InvalidInputException("orders", "must be in [2, 60], got " + orders);
        }
        return new OscillatingExpansion(amplitude, phase, orders);
    }

    public double amplitude() {
        return amp;
    }

    public double phase() {
        return phi;
    }

    /** Coefficient a_jk as a complex number. */
    public Complex coefficient(int j, int k) {
        return new Complex(re[j][k + width], im[j][k + width]);
    }

    private void build() {
        int n2 = 2 * orders + 4;
        // P[m], Q[m]: coefficients of eps^m (eps = x^(-1/2)) in e^(2u), e^(-2u), as harmonic arrays
        double[][][] p = new double[n2 + 1][][];
        double[][][] q = new double[n2 + 1][][];
        p[0] = unit();
        q[0] = unit();
        re[0][1 + width] = amp / 2;
        re[0][-1 + width] = amp / 2;
        for (int n = 1; n <= orders + 1; n++) {
            if (n >= 2) {
                // the k = 1 condition at order n fixes a_(n-1)1
                set(n - 1, 1, 0, 0);
                double[] nn = nonlinear(n, p, q);
                double r0 = nn[0];
                double r1 = nn[1];
                double[] d2 = d2(n - 2, 1);
                double ar = re[n - 2][1 + width];
                double ai = im[n - 2][1 + width];
                r0 -= d2[0] * ar - d2[1] * ai;
                r1 -= d2[0] * ai + d2[1] * ar;
                double x = -r1 / (4.0 * (n - 1));
                double y = (r0 - 4 * amp * amp * x) / (4.0 * (n - 1));
                set(n - 1, 1, x, y);
            }
            if (n > orders) {
                break;
            }
            double[][] nk = nonlinearAll(n, p, q);
            for (int k = 3; k <= 2 * n + 1; k += 2) {
                double r0 = nk[0][k + width];
                double r1 = nk[1][k + width];
                // - D1_(n-1)k a_(n-1)k, D1 = -4k(i(n-1) + kc)
                double d1r = -4.0 * k * k * c;
                double d1i = -4.0 * k * (n - 1);
                double ar = re[n - 1][k + width];
                double ai = im[n - 1][k + width];
                r0 -= d1r * ar - d1i * ai;
                r1 -= d1r * ai + d1i * ar;
                if (n >= 2) {
                    double[] d2 = d2(n - 2, k);
                    ar = re[n - 2][k + width];
                    ai = im[n - 2][k + width];
                    r0 -= d2[0] * ar - d2[1] * ai;
                    r1 -= d2[0] * ai + d2[1] * ar;
                }
                double d0 = 4 - 4.0 * k * k;
                set(n, k, r0 / d0, r1 / d0);
            }
        }
    }

    /** (m - ikc)^2 with m = 1/2 + j. */
    private double[] d2(int j, int k) {
        double m = 0.5 + j;
        double b = -k * c;
        return new double[] {m * m - b * b, 2 * m * b};
    }

    private void set(int j, int k, double x, double y) {
        re[j][k + width] = x;
        im[j][k + width] = y;
        re[j][-k + width] = x;
        im[j][-k + width] = -y;
    }

    private double[][] unit() {
        double[][] r = new double[2][2 * width + 1];
        r[0][width] = 1;
        return r;
    }

    private double[] nonlinear(int n, double[][][] p, double[][][] q) {
        double[][] all = nonlinearAll(n, p, q);
        return new double[] {all[0][1 + width], all[1][1 + width]};
    }

    /** N_n = -(P'_(2n+1) - Q'_(2n+1)), P' without the u_(2n+1) term; recomputes P_m, Q_m for 2n-1 &lt;= m &lt;= 2n. */
    private double[][] nonlinearAll(int n, double[][][] p, double[][][] q) {
        for (int m = Math.max(1, 2 * n - 1); m <= 2 * n; m++) {
            p[m] = expStep(m, p, 2, m);
            q[m] = expStep(m, q, -2, m);
        }
        double[][] pp = expStep(2 * n + 1, p, 2, 2 * n - 1);
        double[][] qq = expStep(2 * n + 1, q, -2, 2 * n - 1);
        double[][] r = new double[2][2 * width + 1];
        for (int i = 0; i < r[0].length; i++) {
            r[0][i] = -(pp[0][i] - qq[0][i]);
            r[1][i] = -(pp[1][i] - qq[1][i]);
        }
        return r;
    }

    /** m E_m = sum_{l odd &lt;= lmax} s l u_l E_(m-l), u_l = U_((l-1)/2), for E = e^(s u). */
    private double[][] expStep(int m, double[][][] e, double s, int lmax) {
        double[][] r = new double[2][2 * width + 1];
        for (int l = 1; l <= Math.min(m, lmax); l += 2) {
            int j = (l - 1) / 2;
            double f = s * l / m;
            double[][] other = e[m - l];
            int kmaxU = 2 * j + 1;
            int kmaxE = m - l;
            for (int a = -kmaxU; a <= kmaxU; a += 2) {
                double ur = re[j][a + width];
                double ui = im[j][a + width];
                if (ur == 0 && ui == 0) {
                    continue;
                }
                for (int b = -kmaxE; b <= kmaxE; b++) {
                    double er = other[0][b + width];
                    double ei = other[1][b + width];
                    int t = a + b + width;
                    r[0][t] += f * (ur * er - ui * ei);
                    r[1][t] += f * (ur * ei + ui * er);
                }
            }
        }
        return r;
    }

    /**
     * u = log w and u' at x, truncated before the smallest order, with the size of the first omitted order:
     * {u, u', err u, err u', orders used}.
     */
    public double[] logValue(double x) {
        if (!(x > 0) || !Double.isFinite(x)) {
            throw new InvalidInputException("x", "the expansion at +infinity needs a finite x > 0, got " + x);
        }
        double theta = 2 * x + c * Math.log(x) + phi;
        double dtheta = 2 + c / x;
        double[] size = new double[orders + 1];
        double[] sizeD = new double[orders + 1];
        double[] u = new double[orders + 1];
        double[] du = new double[orders + 1];
        for (int j = 0; j <= orders; j++) {
            double m = 0.5 + j;
            double xm = Math.pow(x, -m);
            double su = 0;
            double sd = 0;
            double mag = 0;
            double magD = 0;
            for (int k = 1; k <= 2 * j + 1; k += 2) {
                double ar = re[j][k + width];
                double ai = im[j][k + width];
                double cs = Math.cos(k * theta);
                double sn = Math.sin(k * theta);
                // 2 Re(a e^(ik theta)) and its derivative 2 Re(a e^(ik theta) (-m/x + ik theta'))
                double vr = ar * cs - ai * sn;
                double vi = ar * sn + ai * cs;
                su += 2 * vr;
                sd += 2 * (vr * (-m / x) - vi * k * dtheta);
                double ab = Math.hypot(ar, ai);
                mag += 2 * ab;
                magD += 2 * ab * Math.hypot(m / x, k * dtheta);
            }
            u[j] = xm * su;
            du[j] = xm * sd;
            size[j] = xm * mag;
            sizeD[j] = xm * magD;
        }
        // optimal truncation: stop before the first local minimum of the order sizes (orders 0, 1 always kept)
        int stop = orders;
        for (int j = 2; j < orders; j++) {
            if (size[j + 1] > size[j]) {
                stop = j;
                break;
            }
        }
        int last = stop - 1;
        double su = 0;
        double sd = 0;
        for (int j = last; j >= 0; j--) {
            su += u[j];
            sd += du[j];
        }
        double eps = 0x1p-52;
        double eu = size[stop] + 4 * eps * (Math.abs(su) + size[0]);
        double ed = sizeD[stop] + 4 * eps * (Math.abs(sd) + sizeD[0]);
        return new double[] {su, sd, eu, ed, last};
    }

    /** w = e^u and w' = u' e^u at x &gt; 0, with error estimates (first omitted order plus rounding). */
    public LocalValue<Complex> at(double x) {
        double[] v = logValue(x);
        double w = Math.exp(v[0]);
        double dw = v[1] * w;
        double errW = w * v[2] * 1.01 + 0x1p-52 * w;
        double errDw = w * (v[3] + Math.abs(v[1]) * v[2]) * 1.01 + 0x1p-52 * Math.abs(dw);
        return new LocalValue<>(new Complex(x), new Complex(w), new Complex(dw), errW, errDw);
    }
}
