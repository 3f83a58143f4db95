package org.tertius.hierarchy;

import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;

/**
 * Checks of member-2 solutions against the focusing NLS equation
 * {@code i q_t + q_xx / 2 + |q|^2 q = 0} (t = t_2, reduction r = -conj(q)), which is the compatibility of the
 * x-flow and the t_2-flow of the Lax pair. Stateless.
 */
public final class NlsCheck {
    private NlsCheck() {
    }

    /** The residual and the size of its terms (the scale against which it is small). */
    public static final class Residual {
        private final Complex value;
        private final double scale;

        Residual(Complex value, double scale) {
            this.value = value;
            this.scale = scale;
        }

        /** i q_t + q_xx / 2 + |q|^2 q by central differences. */
        public Complex value() {
            return value;
        }

        /** |i q_t| + |q_xx / 2| + |q|^3 at the point. */
        public double scale() {
            return scale;
        }
    }

    /**
     * The NLS residual at real x and t = t_2 of {@code middle}, by central differences: q_t from the solutions
     * at t - k and t + k (earlier, later; equal spacing required), q_xx from x - h, x, x + h. The finite-difference
     * error is O(h^2 + k^2); rounding adds O(eps / h^2).
     */
    public static Residual residual(MemberSolution earlier, MemberSolution middle, MemberSolution later, double x,
                                    double h) {
        for (MemberSolution s : new MemberSolution[] {earlier, middle, later}) {
            if (s.member().order() != 2) {
                throw new InvalidInputException("solution", "the NLS check applies to member 2, not member "
                        + s.member().order());
            }
        }
        if (!(h > 0) || !Double.isFinite(x)) {
            throw new InvalidInputException("h", "the step must be > 0 and x finite, got h = " + h + ", x = " + x);
        }
        Complex t0 = earlier.parameters().time(2);
        Complex t1 = middle.parameters().time(2);
        Complex t2 = later.parameters().time(2);
        Complex k = t2.subtract(t1);
        if (t1.subtract(t0).subtract(k).norm() > 1e-12 * (t1.norm() + k.norm()) || k.norm() == 0) {
            throw new InvalidInputException("t_2", "the three solutions need equally spaced, distinct t_2; got " + t0
                    + ", " + t1 + ", " + t2);
        }
        Complex xc = new Complex(x);
        Complex q = middle.evaluate(xc).q();
        Complex qt = later.evaluate(xc).q().subtract(earlier.evaluate(xc).q()).divide(k.multiply(2));
        Complex qxx = middle.evaluate(new Complex(x + h)).q().add(middle.evaluate(new Complex(x - h)).q())
                .subtract(q.multiply(2)).divide(h * h);
        double q2 = q.norm() * q.norm();
        Complex res = Complex.I.multiply(qt).add(qxx.multiply(0.5)).add(q.multiply(q2));
        return new Residual(res, qt.norm() + 0.5 * qxx.norm() + q2 * q.norm());
    }

    /** A member-2 potential as a function of real (x, t) (for example a profile's values). */
    @FunctionalInterface
    public interface Field {
        Complex q(double x, double t);
    }

    /**
     * The NLS residual i q_t + q_xx / 2 + |q|^2 q of a field at (x, t) by central differences with steps h in x
     * and k in t: finite-difference error O(h^2 + k^2), rounding O(eps / h^2 + eps / k).
     */
    public static Residual residual(Field field, double x, double t, double h, double k) {
        if (!(h > 0) || !(k > 0) || !Double.isFinite(x) || !Double.isFinite(t)) {
            throw new InvalidInputException("h", "the steps h, k must be > 0 and x, t finite, got h = " + h + ", k = "
                    + k + ", x = " + x + ", t = " + t);
        }
        Complex q = field.q(x, t);
        Complex qt = field.q(x, t + k).subtract(field.q(x, t - k)).divide(2 * k);
        Complex qxx = field.q(x + h, t).add(field.q(x - h, t)).subtract(q.multiply(2)).divide(h * h);
        double q2 = q.norm() * q.norm();
        Complex res = Complex.I.multiply(qt).add(qxx.multiply(0.5)).add(q.multiply(q2));
        return new Residual(res, qt.norm() + 0.5 * qxx.norm() + q2 * q.norm());
    }

    /** The mass density |q|^2. */
    public static double density(MemberValue v) {
        return v.q().norm() * v.q().norm();
    }

    /** The mass flux J = Im(conj(q) q_x), with d/dt |q|^2 + d/dx J = 0 for focusing NLS. */
    public static double flux(MemberValue v) {
        return v.q().conjugate().multiply(v.dq()).getImaginary();
    }
}
