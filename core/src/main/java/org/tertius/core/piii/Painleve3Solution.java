package org.tertius.core.piii;

import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.Coordinate;
import org.tertius.core.face.EngineReading;
import org.tertius.core.face.HighPrecisionForm;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.ExactNumber;
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
public abstract class Painleve3Solution implements ComputedSolution {
    /** Painleve III solutions live on the Riemann surface of log z. */
    public static final Coordinate COORDINATE = Coordinate.logarithmic("z");
    /** The values of a Painleve III solution on the face: w and w'. */
    public static final List<String> VALUE_NAMES = List.of("w", "dw");

    Painleve3Solution() {
    }

    /** The equation this function solves. */
    public abstract Painleve3 equation();

    /**
     * The value at a point of the Riemann surface, from the path tree grown so far (see {@link #valueAt} for the
     * reproducible evaluation).
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

    @Override
    public String equationDescription() {
        return equation() + " [" + equation().type().describe() + "]";
    }

    @Override
    public String methodDescription() {
        return "integrated in the " + formDescription();
    }

    @Override
    public Coordinate coordinate() {
        return COORDINATE;
    }

    @Override
    public List<String> valueNames() {
        return VALUE_NAMES;
    }

    /**
     * The values w, w' at a point along its canonical path: a function of the start data, the settings and the point
     * alone, bit for bit (whatever was asked before, on whatever thread). {@link #evaluate} reuses the path tree
     * grown so far instead: faster for many nearby points, with values that may differ in the last digits (within
     * their estimates) with the order of the queries.
     *
     * @throws org.tertius.core.UnreachableTargetException if the point cannot be reached, or lies closer to a pole
     *     than the pole's position is known
     */
    @Override
    public abstract SolutionValue valueAt(SurfacePoint point);

    /** 1/w, a solution of {@link Painleve3#reciprocal()}. */
    public Painleve3Solution reciprocal() {
        return new SymmetryImage(this, equation().reciprocal(), SymmetryImage.Kind.RECIPROCAL, Complex.ONE);
    }

    /** -w, a solution of {@link Painleve3#negated()}. */
    public Painleve3Solution negated() {
        return new SymmetryImage(this, equation().negated(), SymmetryImage.Kind.NEGATED, Complex.ONE);
    }

    /**
     * W(z) = w(lambda z), a solution of {@link Painleve3#scaledArgument(Complex)}. The point (z, k) of W is the
     * point of w with log coordinate log z + Log lambda (principal Log lambda).
     */
    public Painleve3Solution scaledArgument(Complex lambda) {
        return new SymmetryImage(this, equation().scaledArgument(lambda), SymmetryImage.Kind.SCALED_ARGUMENT, lambda);
    }

    public static Builder builder(Painleve3 equation) {
        return new Builder(equation);
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
        private ExactNumber[] exactStart;
        private String computedBy;
        private double errW0;
        private double errDw0;
        private SolverSettings settings = SolverSettings.defaults();

        private Builder(Painleve3 equation) {
            this.equation = equation;
        }

        /** Start data w(z0) = w0, w'(z0) = dw0. */
        public Builder start(Complex z0, Complex w0, Complex dw0) {
            this.z0 = z0;
            this.w0 = w0;
            this.dw0 = dw0;
            this.exactStart = null;
            return this;
        }

        /** Start data given as exact texts (decimals, rationals p/q, complex a+bi of them; see {@link ExactNumber#parse}). */
        public Builder start(String z0, String w0, String dw0) {
            return start(ExactNumber.parse("z0", z0), ExactNumber.parse("w0", w0), ExactNumber.parse("dw0", dw0));
        }

        /**
         * Start data given exactly (decimals or rationals): the engine starts from their nearest doubles, the
         * high-precision replay ({@link #highPrecisionForm()}) from the exact values.
         */
        public Builder start(ExactNumber z0, ExactNumber w0, ExactNumber dw0) {
            if (z0 == null || w0 == null || dw0 == null) {
                throw new InvalidInputException(z0 == null ? "z0" : w0 == null ? "w0" : "dw0", "is required");
            }
            start(z0.toComplex(), w0.toComplex(), dw0.toComplex());
            this.exactStart = new ExactNumber[] {z0, w0, dw0};
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

        /**
         * Marks the start data as computed (by an expansion, a fit, another solution) in double precision rather
         * than given: the solution then refuses the high-precision replay with a message that names the source.
         */
        public Builder startComputedBy(String source) {
            this.computedBy = source;
            return this;
        }

        /**
         * Absolute errors of w0 and w'(z0) when the start data were computed (by a series, a map, another
         * solution): they are carried by the flow into the error estimate of every value, like the errors of the
         * steps. Default 0 (data taken as exact).
         */
        public Builder startErrors(double errW0, double errDw0) {
            if (!(errW0 >= 0) || !(errDw0 >= 0) || !Double.isFinite(errW0) || !Double.isFinite(errDw0)) {
                throw new InvalidInputException("start errors", "must be finite and >= 0, got " + errW0 + ", " + errDw0);
            }
            this.errW0 = errW0;
            this.errDw0 = errDw0;
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
            ExactNumber[] exact = exactStart != null ? exactStart : new ExactNumber[] {
                ExactNumber.ofDouble("z0", z0), ExactNumber.ofDouble("w0", w0), ExactNumber.ofDouble("dw0", dw0)};
            return IntegratedSolution.create(equation, z0, w0, dw0, d3w0, exact, computedBy, settings, errW0, errDw0);
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
