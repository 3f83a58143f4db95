package org.tertius.hierarchy.nls;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.hierarchy.MemberValue;

/**
 * Large-X asymptotics of the profile at T = 0. Derivation (this project; hierarchy/README.md): at T = 0 with
 * m = 0, trace integral 0 and r = -conj q, member 1 reduces to a(-2)11 = i s cos theta, a(-2)12 = i s e^(i phase)
 * sin theta, Psi = -theta_X / 2 e^(i phase), and theta(zeta), zeta = 4 sqrt(s X), solves the radial sine-Gordon
 * form of Painleve III, {@code theta'' + theta'/zeta + sin theta = 0}, theta(0) = theta0 = pi/2 (a11 = 0). Its
 * energy theta'^2/2 + 1 - cos theta decays (its zeta-derivative is -theta'^2/zeta), so theta -> 0 and, by
 * multiple scales (hierarchy/tools/far_field.py),
 * <pre>
 *   theta = A zeta^(-1/2) cos psi + zeta^(-3/2) [ (A^3/32) cos psi + (A/8 - 3A^5/1024) sin psi - (A^3/192) cos 3psi ]
 *           + zeta^(-5/2) [ ... ] + O(zeta^(-7/2)),      psi = zeta - (A^2/16) log zeta + phi,
 *   Psi(X, 0) = -(4 s / zeta) theta'(zeta) e^(i phase) ~ (A/2) s^(1/4) X^(-3/4) sin psi e^(i phase):
 * </pre>
 * a decaying oscillation with a logarithmic phase correction. The constants A, phi are fitted from the integrated
 * solution ({@link #fit}) and compared with the closed form (recalled, from memory, as the connection formula of
 * the radial sine-Gordon equation, and confirmed by the fit): with nu = -(1/pi) log cos(theta0/2),
 * A^2 = 16 nu, phi = pi/4 - 2 nu log 2 + arg Gamma(i nu) (for the profile nu = log 2 / (2 pi)). Immutable.
 */
public final class FarField {
    /** Amplitude and phase constants with their estimated errors. */
    public record Constants(double amplitude, double amplitudeError, double phase, double phaseError) {
    }

    /** One comparison point: the integrated value, the asymptotic form, and both error estimates. */
    public record Comparison(double x, Complex integrated, double integratedError, Complex asymptotic,
                             double asymptoticError) {
        /** |integrated - asymptotic|. */
        public double difference() {
            return integrated.subtract(asymptotic).norm();
        }

        /** Whether they agree within the sum of the estimates. */
        public boolean agrees() {
            return difference() <= integratedError + asymptoticError;
        }
    }

    private final double s;
    private final double gauge;
    private final Constants constants;

    /**
     * The asymptotic form for a relative with scale s and phase gauge, with the given constants.
     */
    public FarField(double s, double gauge, Constants constants) {
        if (!(s > 0) || !Double.isFinite(gauge) || constants == null) {
            throw new InvalidInputException("s", "needs s > 0, a finite phase and constants");
        }
        this.s = s;
        this.gauge = gauge;
        this.constants = constants;
    }

    /** The closed-form constants for theta(0) = theta0 in (0, pi): A^2 = 16 nu, phi = pi/4 - 2 nu log 2 + arg Gamma(i nu). */
    public static Constants closedForm(double theta0) {
        if (!(theta0 > 0 && theta0 < Math.PI)) {
            throw new InvalidInputException("theta0", "must lie in (0, pi), got " + theta0);
        }
        double nu = -Math.log(Math.cos(0.5 * theta0)) / Math.PI;
        double phi = Math.PI / 4 - 2 * nu * Math.log(2) + LogGamma.argument(new Complex(0, nu));
        return new Constants(4 * Math.sqrt(nu), 0, wrap(phi), 0);
    }

    public Constants constants() {
        return constants;
    }

    /** Psi(X, 0) by the asymptotic form at X &gt; 0. */
    public Complex psi(double x) {
        double zeta = 4 * Math.sqrt(s * x);
        double[] th = SineGordonTail.theta(constants.amplitude(), constants.phase(), zeta);
        double psi = -(4 * s / zeta) * th[1];
        return new Complex(psi * Math.cos(gauge), psi * Math.sin(gauge));
    }

    /**
     * The estimated error of the asymptotic form at X: the size of its last included order (zeta^(-5/2) in
     * theta) times 4/zeta, carried into Psi, plus the effect of the constants' errors.
     */
    public double error(double x) {
        double zeta = 4 * Math.sqrt(s * x);
        double a = constants.amplitude();
        double last = SineGordonTail.lastOrder(a, zeta);
        double fromConstants = (4 * s / zeta) * Math.pow(zeta, -0.5) * (constants.amplitudeError()
                + a * constants.phaseError() + a * a * a / 8 * Math.log(zeta) * constants.amplitudeError() / a);
        return (4 * s / zeta) * 4 * last / zeta + fromConstants;
    }

    /**
     * Fits A and phi from the integrated profile at T = 0: at each X the two-term form is inverted from
     * theta and theta' (read off the member-1 state), and the local constants, which drift like zeta^(-2) from the
     * omitted orders, are extrapolated by least squares in zeta^(-2); the error is the extrapolation's standard
     * error plus the drift over the window and the values' own errors.
     *
     * @param profile the profile
     * @param x sample abscissae, X &gt; 0, at least 4 (large enough for the form: zeta = 4 sqrt(s X) &gt;= 10)
     */
    public static Constants fit(NearFieldProfile profile, double[] x) {
        if (x.length < 4) {
            throw new InvalidInputException("x", "at least 4 sample points are needed, got " + x.length);
        }
        double s = profile.s();
        Constants guess = closedForm(Math.PI / 2);
        List<double[]> local = new ArrayList<>();
        for (double v : x) {
            double zeta = 4 * Math.sqrt(s * v);
            if (!(zeta >= 10)) {
                throw new InvalidInputException("x", "samples need zeta = 4 sqrt(s X) >= 10, got X = " + v);
            }
            MemberValue m = profile.solution().memberOne().evaluate(new Complex(v));
            Complex rotation = new Complex(Math.cos(profile.phase()), -Math.sin(profile.phase()));
            double cos = m.state().get(0).multiply(Complex.I.negate()).getReal() / s;
            double sin = m.state().get(1).multiply(Complex.I.negate()).multiply(rotation).getReal() / s;
            double theta = Math.atan2(sin, cos);
            double slope = -m.q().multiply(rotation).getReal() * zeta / (4 * s);
            double[] c = SineGordonTail.invert(theta, slope, zeta, guess.amplitude(), guess.phase());
            double err = m.errorQ() * zeta / (4 * s) * Math.sqrt(zeta) * 4 + Math.sqrt(zeta) * (m.error(0)
                    + m.error(1)) / s;
            local.add(new double[] {Math.pow(zeta, -2), c[0], c[1], err});
        }
        double[] a = extrapolate(local, 1);
        double[] p = extrapolate(local, 2);
        return new Constants(a[0], a[1], wrap(p[0]), p[1]);
    }

    /** Least squares y = c0 + c1 w over the samples; c0 with its error. */
    private static double[] extrapolate(List<double[]> samples, int column) {
        double reference = samples.get(0)[column];
        int n = samples.size();
        double sw = 0;
        double sy = 0;
        double sww = 0;
        double swy = 0;
        double own = 0;
        for (double[] r : samples) {
            double y = column == 2 ? reference + wrapSigned(r[column] - reference) : r[column];
            sw += r[0];
            sy += y;
            sww += r[0] * r[0];
            swy += r[0] * y;
            own = Math.max(own, r[3]);
        }
        double det = n * sww - sw * sw;
        double c1 = (n * swy - sw * sy) / det;
        double c0 = (sy - c1 * sw) / n;
        double rss = 0;
        double wMin = Double.POSITIVE_INFINITY;
        for (double[] r : samples) {
            double y = column == 2 ? reference + wrapSigned(r[column] - reference) : r[column];
            double e = y - c0 - c1 * r[0];
            rss += e * e;
            wMin = Math.min(wMin, r[0]);
        }
        double sigma = Math.sqrt(rss / Math.max(1, n - 2));
        double standard = sigma * Math.sqrt(sww / det);
        // the extrapolation from the nearest sample is itself an estimate: its size counts as error
        double drift = Math.abs(c1) * wMin;
        return new double[] {c0, 3 * standard + 0.5 * drift + own};
    }

    /** The integrated and asymptotic values side by side at the given X &gt; 0. */
    public List<Comparison> compare(NearFieldProfile profile, double[] x) {
        List<Comparison> out = new ArrayList<>();
        for (double v : x) {
            ProfileValue p = profile.value(v, 0);
            out.add(new Comparison(v, p.psi(), p.error(), psi(v), error(v)));
        }
        return out;
    }

    static double wrap(double phi) {
        double w = phi % (2 * Math.PI);
        return w < 0 ? w + 2 * Math.PI : w;
    }

    private static double wrapSigned(double d) {
        return d - 2 * Math.PI * Math.rint(d / (2 * Math.PI));
    }
}
