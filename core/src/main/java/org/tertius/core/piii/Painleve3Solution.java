package org.tertius.core.piii;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.step.SolverSettings;

/**
 * A solution of Painleve III on the Riemann surface of its argument (z = 0 is a branch point; points are
 * {@link SurfacePoint}s). Values come with absolute error estimates. Instances are immutable to callers and
 * safe to share between threads; the integrated ones keep their path tree and reuse it (dense output).
 *
 * <p>Build one with {@link #builder(Painleve3)}; the symmetries of the equation act on solutions through
 * {@link #reciprocal()}, {@link #negated()} and {@link #scaledArgument(Complex)}.
 */
public abstract class Painleve3Solution {

    Painleve3Solution() {
    }

    /** The equation this function solves. */
    public abstract Painleve3 equation();

    /**
     * The value at a point of the Riemann surface.
     *
     * @throws org.tertius.core.UnreachableTargetException if the point cannot be reached to the tolerance
     */
    public abstract Painleve3Value evaluate(SurfacePoint point);

    /** Values at several points, in order. */
    public List<Painleve3Value> evaluate(List<SurfacePoint> points) {
        List<Painleve3Value> out = new ArrayList<>(points.size());
        for (SurfacePoint p : points) {
            out.add(evaluate(p));
        }
        return out;
    }

    /** Number of nodes in the path tree behind this solution. */
    public abstract int nodeCount();

    /** A line describing the polynomial form integrated (for output headers). */
    public abstract String formDescription();

    /** 1/w, a solution of {@link Painleve3#reciprocal()}. */
    public Painleve3Solution reciprocal() {
        Painleve3Solution base = this;
        return new SymmetryImage(base, equation().reciprocal(), "1/w") {
            @Override
            public Painleve3Value evaluate(SurfacePoint point) {
                Painleve3Value v = base.evaluate(point);
                Complex w = v.w();
                double m = w.norm();
                Complex iw = w.reciprocal();
                Complex idw = v.dw().negate().divide(w.multiply(w));
                double ew = v.errW() / (m * m);
                double edw = v.errDw() / (m * m) + 2 * v.dw().norm() * v.errW() / (m * m * m);
                return new Painleve3Value(point, iw, idw, ew, edw);
            }
        };
    }

    /** -w, a solution of {@link Painleve3#negated()}. */
    public Painleve3Solution negated() {
        Painleve3Solution base = this;
        return new SymmetryImage(base, equation().negated(), "-w") {
            @Override
            public Painleve3Value evaluate(SurfacePoint point) {
                Painleve3Value v = base.evaluate(point);
                return new Painleve3Value(point, v.w().negate(), v.dw().negate(), v.errW(), v.errDw());
            }
        };
    }

    /**
     * W(z) = w(lambda z), a solution of {@link Painleve3#scaledArgument(Complex)}. The point (z, k) of W is the
     * point of w with log coordinate log z + Log lambda (principal Log lambda).
     */
    public Painleve3Solution scaledArgument(Complex lambda) {
        Painleve3Solution base = this;
        Painleve3 eq = equation().scaledArgument(lambda);
        double lr = Math.log(lambda.norm());
        double li = lambda.getArgument();
        return new SymmetryImage(base, eq, "w(lambda z)") {
            @Override
            public Painleve3Value evaluate(SurfacePoint point) {
                SurfacePoint q = SurfacePoint.fromLog(point.logRe() + lr, point.logIm() + li);
                Painleve3Value v = base.evaluate(q);
                return new Painleve3Value(point, v.w(), v.dw().multiply(lambda), v.errW(),
                        v.errDw() * lambda.norm());
            }
        };
    }

    public static Builder builder(Painleve3 equation) {
        return new Builder(equation);
    }

    /** A solution obtained from another by a symmetry of the equation. */
    private abstract static class SymmetryImage extends Painleve3Solution {
        private final Painleve3Solution base;
        private final Painleve3 eq;
        private final String label;

        SymmetryImage(Painleve3Solution base, Painleve3 eq, String label) {
            this.base = base;
            this.eq = eq;
            this.label = label;
        }

        @Override
        public Painleve3 equation() {
            return eq;
        }

        @Override
        public int nodeCount() {
            return base.nodeCount();
        }

        @Override
        public String formDescription() {
            return label + " of: " + base.formDescription();
        }
    }

    /**
     * Builder of an integrated solution from its data at a start point z0 (on the principal sheet; the sheet of
     * every other point is counted from there).
     */
    public static final class Builder {
        private final Painleve3 equation;
        private Complex z0;
        private Complex w0;
        private Complex dw0;
        private Complex d3w0;
        private SolverSettings settings = SolverSettings.defaults();

        private Builder(Painleve3 equation) {
            this.equation = equation;
        }

        /** Start data w(z0) = w0, w'(z0) = dw0. */
        public Builder start(Complex z0, Complex w0, Complex dw0) {
            this.z0 = z0;
            this.w0 = w0;
            this.dw0 = dw0;
            return this;
        }

        /**
         * The third derivative at z0, needed (only) when w0 = 0: a solution through a zero of w is fixed by
         * w'(z0) (which must satisfy w'(z0)^2 = -delta) together with w'''(z0).
         */
        public Builder thirdDerivativeAtZero(Complex d3w0) {
            this.d3w0 = d3w0;
            return this;
        }

        public Builder settings(SolverSettings settings) {
            this.settings = settings;
            return this;
        }

        public Painleve3Solution build() {
            if (z0 == null) {
                throw new InvalidInputException("z0", "start data are missing: give z0, w0 and w'(z0)");
            }
            check("z0", z0);
            check("w0", w0);
            check("dw0", dw0);
            SurfacePoint.of(z0, 0); // rejects z0 = 0 with a clear message
            return IntegratedSolution.create(equation, z0, w0, dw0, d3w0, settings);
        }

        private static void check(String name, Complex c) {
            if (c == null) {
                throw new InvalidInputException(name, "is required");
            }
            if (!Double.isFinite(c.getReal()) || !Double.isFinite(c.getImaginary())) {
                throw new InvalidInputException(name, "must be a finite complex number, got " + c);
            }
        }
    }
}
