package org.tertius.hierarchy;

import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Value;
import org.tertius.core.step.SolverSettings;

/**
 * The change of variables from member 1 to Painleve III (D6), derived for this project (hierarchy/tools/
 * member1_to_piii.py): with y = a(-2)12 / a(-1)12 = a(-2)12 / (x q),
 * <pre>
 *   z = c sqrt(x),   w(z) = K z y(x)  =  K c^2 a(-2)12 / (q z),
 *   alpha = 8 i (2m + 1) / (K c^2),  beta = 8 K T,  gamma = -16 / (K^2 c^4),  delta = 16 K^2 s^2,
 * </pre>
 * where T = tr(a_-2 a_-1) is the trace-form integral and w solves w'' = w'^2/w - w'/z + (alpha w^2 + beta)/z +
 * gamma w^3 + delta/w (NIST DLMF eq. 32.2.3). The canonical choice K = i/(4s), c^2 = 16 s gives
 * (alpha, beta, gamma, delta) = (4m + 2, 2iT/s, 1, -1) and w = 4i a(-2)12 / (q z). Points correspond through
 * log z = log c + (log x)/2 on the Riemann surfaces (log c = Log(c^2)/2, principal). Immutable.
 */
public final class Member1Map {
    private final Complex s;
    private final Complex k;
    private final Complex cSquared;
    private final Complex logC;

    private Member1Map(Complex s, Complex k, Complex cSquared) {
        this.s = s;
        this.k = k;
        this.cSquared = cSquared;
        this.logC = cSquared.log().multiply(0.5);
    }

    /** The canonical map for a given s != 0: K = i/(4s), c^2 = 16 s, giving gamma = 1, delta = -1. */
    public static Member1Map canonical(Complex s) {
        requireNonZero("s", s);
        return new Member1Map(s, Complex.I.divide(s.multiply(4)), s.multiply(16));
    }

    /**
     * The map onto a given D6 equation (gamma delta != 0) for a chosen s != 0: K = sqrt(delta)/(4s),
     * c^2 = 4i / (K sqrt(gamma)) (principal roots).
     */
    public static Member1Map forEquation(Painleve3 eq, Complex s) {
        requireNonZero("s", s);
        requireNonZero("gamma", eq.gamma());
        requireNonZero("delta", eq.delta());
        Complex k = eq.delta().sqrt().divide(s.multiply(4));
        return new Member1Map(s, k, Complex.I.multiply(4).divide(k.multiply(eq.gamma().sqrt())));
    }

    private static void requireNonZero(String name, Complex c) {
        if (c == null || !(c.norm() > 0) || !Double.isFinite(c.norm())) {
            throw new InvalidInputException(name, "must be a finite non-zero complex number for the map of member 1"
                    + " to Painleve III (D6), got " + c);
        }
    }

    public Complex s() {
        return s;
    }

    public Complex k() {
        return k;
    }

    public Complex cSquared() {
        return cSquared;
    }

    /** The Painleve III equation of member 1 with constant m and trace-form integral T. */
    public Painleve3 equation(Complex m, Complex traceIntegral) {
        Complex kc2 = k.multiply(cSquared);
        return Painleve3.of(Complex.I.multiply(8).multiply(m.multiply(2).add(1)).divide(kc2),
                k.multiply(8).multiply(traceIntegral), new Complex(-16).divide(kc2.multiply(kc2)),
                k.multiply(k).multiply(s.multiply(s)).multiply(16));
    }

    /** m from alpha. */
    public Complex m(Painleve3 eq) {
        return eq.alpha().multiply(k).multiply(cSquared).divide(Complex.I.multiply(8)).subtract(1).multiply(0.5);
    }

    /** The trace-form integral T from beta. */
    public Complex traceIntegral(Painleve3 eq) {
        return eq.beta().divide(k.multiply(8));
    }

    /**
     * Member-1 constants for a Painleve III equation; the equation must be the image of this map (its gamma and
     * delta must match).
     */
    public MemberParameters parameters(Painleve3 eq) {
        Painleve3 image = equation(m(eq), traceIntegral(eq));
        double scale = 1 + eq.gamma().norm() + eq.delta().norm();
        if (image.gamma().subtract(eq.gamma()).norm() > 1e-12 * scale
                || image.delta().subtract(eq.delta()).norm() > 1e-12 * scale) {
            throw new InvalidInputException("equation", eq + " is not reached by this map (it gives gamma = "
                    + image.gamma() + ", delta = " + image.delta() + "); use Member1Map.forEquation");
        }
        return MemberParameters.builder(1).s(s).m(m(eq)).build();
    }

    /** The point z = c sqrt(x) of the surface of log z. */
    public SurfacePoint z(SurfacePoint x) {
        return SurfacePoint.fromLog(logC.getReal() + 0.5 * x.logRe(), logC.getImaginary() + 0.5 * x.logIm());
    }

    /** The point x = (z / c)^2 of the surface of log x. */
    public SurfacePoint x(SurfacePoint z) {
        return SurfacePoint.fromLog(2 * (z.logRe() - logC.getReal()), 2 * (z.logIm() - logC.getImaginary()));
    }

    /** w and w' = dw/dz at the image of a member-1 value (which must come from a solution with this s). */
    public Painleve3Value toPainleve3(MemberValue v) {
        List<Complex> y = v.state();
        SurfacePoint zp = z(SurfacePoint.of(v.x(), v.sheet()));
        Complex z = zp.z();
        Complex x = v.x();
        Complex a = y.get(0);
        Complex b = y.get(1);
        Complex m = y.get(3);
        Complex u = y.get(4);
        if (u.norm() == 0 || b.norm() == 0) {
            throw new InvalidInputException("x", "w = 0 or infinity at x = " + x + " (a(-2)12 or a(-1)12 vanishes)");
        }
        Complex ratio = b.divide(u);
        Complex w = k.multiply(z).multiply(ratio);
        // w' = K (y + 2 x y_x), x y_x = -2a + 2m y + 2i x y^2
        Complex slope = m.multiply(4).add(1).add(Complex.I.multiply(8).multiply(x).multiply(ratio));
        Complex dw = k.multiply(ratio.add(a.multiply(-4)).add(m.multiply(4).multiply(ratio))
                .add(Complex.I.multiply(4).multiply(x).multiply(ratio).multiply(ratio)));
        double errRatio = ratio.norm() * (v.error(1) / b.norm() + v.error(4) / u.norm());
        double errW = k.norm() * z.norm() * errRatio + 4 * Math.ulp(1.0) * w.norm();
        double errDw = k.norm() * (slope.norm() * errRatio + 4 * v.error(0) + 4 * ratio.norm() * v.error(3))
                + 8 * Math.ulp(1.0) * dw.norm();
        return new Painleve3Value(zp, w, dw, errW, errDw);
    }

    /**
     * The member-1 state at x = (z/c)^2 for Painleve III data (w != 0) of an equation reached by this map,
     * in the gauge a(-1)12 = 1 at that point.
     */
    public List<Complex> state(Painleve3 eq, Painleve3Value value) {
        Complex m = m(eq);
        Complex t = traceIntegral(eq);
        Complex z = value.point().z();
        Complex x = x(value.point()).z();
        Complex w = value.w();
        if (w.norm() == 0) {
            throw new InvalidInputException("w", "the map needs w != 0 at the start point");
        }
        Complex y = w.divide(k.multiply(z));
        Complex xyx = value.dw().divide(k).subtract(y).multiply(0.5);
        Complex a = m.multiply(2).multiply(y).add(Complex.I.multiply(2).multiply(x).multiply(y).multiply(y))
                .subtract(xyx).multiply(0.5);
        Complex c = s.multiply(s).add(a.multiply(a)).negate().divide(y);
        Complex v = t.subtract(a.multiply(2).multiply(m)).subtract(c).divide(y);
        return List.of(a, y, c, m, Complex.ONE, v);
    }

    /** The member-1 solution through given Painleve III data w(z0), w'(z0) (w(z0) != 0). */
    public MemberSolution solution(Painleve3 eq, Painleve3Value start, SolverSettings settings) {
        SurfacePoint x0 = x(start.point());
        return MemberSolution.builder(parameters(eq)).settings(settings)
                .start(x0.z(), x0.sheet(), state(eq, start)).build();
    }

    /** The Painleve III value at z of a member-1 solution with this s. */
    public Painleve3Value evaluate(MemberSolution solution, SurfacePoint z) {
        if (solution.member().order() != 1) {
            throw new InvalidInputException("solution", "the map applies to member 1, not member "
                    + solution.member().order());
        }
        return toPainleve3(solution.evaluate(x(z)));
    }
}
