package org.tertius.connection.closed;

import java.math.BigDecimal;
import org.apfloat.Apcomplex;
import org.apfloat.Apfloat;
import org.apfloat.ApfloatMath;
import org.apfloat.FixedPrecisionApcomplexHelper;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;

/**
 * The connection formulas of the decaying family of PIII(0, 0, 1, -1) ({@link McCoyTracyWu}: McCoy, Tracy and Wu,
 * J. Math. Phys. 18 (1977) 1058) continued to every complex lambda and to every ray |arg x| &lt; pi/2 (the family is
 * w ~ 1 - 2 lambda K0(2x), one analytic function for each lambda):
 * <pre>  sigma = (2/pi) arcsin(pi lambda),   B = 2^(-2 sigma) Gamma((1 - sigma)/2) / Gamma((1 + sigma)/2),
 *   q = -lambda sqrt(pi)   (amplitude of e^(-2x) x^(-1/2) in log w, TransseriesAtInfinity about c = 1).</pre>
 * The continuation is ours (the paper treats real |lambda| &lt; 1/pi). For real |lambda| &gt; 1/pi, where zeros
 * (lambda &gt; 1/pi) or poles (lambda &lt; -1/pi) of w accumulate at 0, the exponent is taken on the edge in the
 * description with Im sigma &gt; 0, {@code sigma = sign(lambda) (1 + ...) = +-1 + (2i/pi) arccosh(pi |lambda|)}, and B
 * from the same formula; the numerical connection confirms both (test ContinuedDecayingFamilyTest). At lambda =
 * +-1/pi the solution is logarithmic ({@link McCoyTracyWu#logarithmicConstant()}). Gamma, arcsin and arccosh from
 * Apfloat. Immutable utility.
 */
public final class ContinuedMcCoyTracyWu {
    private ContinuedMcCoyTracyWu() {
    }

    /**
     * {sigma, B} in {@code digits} digits for lambda = re + i im (decimal texts, exact).
     *
     * @throws InvalidInputException at lambda = +-1/pi (logarithmic), for digits outside [16, 1000]
     */
    public static Apcomplex[] zeroData(String re, String im, long digits) {
        if (digits < 16 || digits > 1000) {
            throw new InvalidInputException("digits", "must be in [16, 1000], got " + digits);
        }
        long p = digits + 10;
        FixedPrecisionApcomplexHelper h = new FixedPrecisionApcomplexHelper(p);
        Apcomplex lambda = new Apcomplex(new Apfloat(re.trim(), p), new Apfloat(im.trim(), p));
        Apfloat pi = ApfloatMath.pi(p);
        Apcomplex x = h.multiply(lambda, pi);
        Apfloat one = new Apfloat(1, p);
        Apcomplex sigma;
        if (x.imag().signum() == 0 && ApfloatMath.abs(x.real()).compareTo(one) >= 0) {
            Apfloat a = ApfloatMath.abs(x.real());
            if (a.subtract(one).signum() == 0 || ApfloatMath.abs(a.subtract(one)).compareTo(ApfloatMath.scale(one,
                    -digits)) < 0) {
                throw new InvalidInputException("lambda", "lambda = +-1/pi is the logarithmic member; use"
                        + " McCoyTracyWu.logarithmicConstant() (w ~ -x (log(x/4) + gamma_E) for +1/pi)");
            }
            Apfloat nu = ApfloatMath.log(a.add(ApfloatMath.sqrt(a.multiply(a).subtract(one))));
            Apfloat two = new Apfloat(2, p);
            sigma = new Apcomplex(new Apfloat(x.real().signum(), p), two.multiply(nu).divide(pi));
        } else {
            sigma = h.divide(h.multiply(new Apcomplex(new Apfloat(2, p)), h.asin(x)), pi);
        }
        Apcomplex half = new Apcomplex(new Apfloat("0.5", p));
        Apcomplex onec = new Apcomplex(one);
        Apcomplex g1 = h.gamma(h.multiply(h.subtract(onec, sigma), half));
        Apcomplex g2 = h.gamma(h.multiply(h.add(onec, sigma), half));
        Apcomplex two = new Apcomplex(new Apfloat(2, p));
        Apcomplex b = h.divide(h.multiply(h.pow(two, h.multiply(sigma, new Apcomplex(new Apfloat(-2, p)))), g1), g2);
        FixedPrecisionApcomplexHelper out = new FixedPrecisionApcomplexHelper(digits);
        return new Apcomplex[] {out.valueOf(sigma), out.valueOf(b)};
    }

    /** {sigma, B} in double precision (30-digit evaluation). */
    public static Complex[] zeroData(Complex lambda) {
        InvalidInputException.requireFinite("lambda", lambda.getReal());
        InvalidInputException.requireFinite("lambda", lambda.getImaginary());
        Apcomplex[] d = zeroData(new BigDecimal(lambda.getReal()).toString(),
                new BigDecimal(lambda.getImaginary()).toString(), 30);
        return new Complex[] {toComplex(d[0]), toComplex(d[1])};
    }

    /** The amplitude q = -lambda sqrt(pi) of the decaying exponential about c = 1 (DLMF 10.40.2 for K0). */
    public static Complex amplitudeAtInfinity(Complex lambda) {
        return lambda.multiply(-Math.sqrt(Math.PI));
    }

    /**
     * The members of PIII(0, 0, -1, 1) with one oscillating exponential on the positive axis: W(x) = w(e^(i side pi/2)
     * x), w the decaying member lambda of PIII(0, 0, 1, -1) (z -> i z maps one equation to the other: DLMF eq. 32.2.3
     * with gamma, delta -> -gamma, -delta). With q = -lambda sqrt(pi) and the principal branch of the rotated
     * argument:
     * <pre>  side = +1:  W ~ B e^(i pi sigma/2) x^sigma at 0,  log W ~ q e^(-i pi/4) x^(-1/2) e^(-2ix) at infinity;
     *   side = -1:  W ~ B e^(-i pi sigma/2) x^sigma,      log W ~ q e^(i pi/4) x^(-1/2) e^(2ix),</pre>
     * i.e. amplitudes (p, q) = (0, q e^(-i pi/4)) or (q e^(i pi/4), 0) of TransseriesAtInfinity about c = 1
     * (mu = 2i). Derived here from the continued formulas; these complex solutions are the one-exponential edge of
     * the two-parameter oscillating family.
     *
     * @return {sigma, B, p, q}
     */
    public static Complex[] rotatedMember(Complex lambda, int side) {
        if (side != 1 && side != -1) {
            throw new InvalidInputException("side", "must be +1 or -1, got " + side);
        }
        Complex[] d = zeroData(lambda);
        Complex amplitude = d[1].multiply(new Complex(0, side * Math.PI / 2).multiply(d[0]).exp());
        Complex q = amplitudeAtInfinity(lambda).multiply(new Complex(0, -side * Math.PI / 4).exp());
        return side == 1 ? new Complex[] {d[0], amplitude, Complex.ZERO, q}
                : new Complex[] {d[0], amplitude, q, Complex.ZERO};
    }

    private static Complex toComplex(Apcomplex a) {
        return new Complex(a.real().doubleValue(), a.imag().doubleValue());
    }
}
