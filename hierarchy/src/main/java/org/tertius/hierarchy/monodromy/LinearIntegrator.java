package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.UnreachableTargetException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.number.ComplexArithmetic;

/**
 * Taylor integration of the lambda-equation Phi' = A(lambda) Phi, A = sum_{k=-2}^{n-1} a_k lambda^k, along polar
 * paths (radial segments and circular arcs) in any {@link AnalyticArithmetic}. Multiplied by lambda^2 the equation
 * has the polynomial coefficient P = lambda^2 A of degree n + 1; at a centre c, with P(c + h) = sum_i p_i h^i,
 * the Taylor coefficients of Phi follow from
 * <pre>  c^2 (j+1) phi_{j+1} = sum_{i=0}^{min(j, n+1)} p_i phi_{j-i} - 2 c j phi_j - (j-1) phi_{j-1}.</pre>
 * The only finite singular point is lambda = 0, so a step is at most half the distance to 0; within that, the
 * largest step with |phi_N| h^N + |phi_{N-1}| h^(N-1) at most the tolerance times |phi_0| (common practice for
 * Taylor methods).
 *
 * <p>A vector solution is carried together with the propagator of every step (the fundamental matrix equal to I at
 * the step's centre, in double precision: it serves only the estimate). The error estimate of the vector at the end is first-order propagation of every local error
 * through the product of the step propagators from there to the end (accumulated backwards, so that no product of
 * large matrices with their inverses enters): the truncation estimate above and the rounding of the Taylor sum (the
 * working epsilon times the sum of the moduli of its terms), plus the propagated error of the start vector. (The
 * uncertainty of the coefficients a_k is propagated by {@link MonodromyMap} through the data themselves.) Immutable,
 * thread-safe.
 *
 * @param <T> number type
 */
final class LinearIntegrator<T> {
    /** The step propagators are computed in double precision. */
    private static final MatrixArithmetic<Complex> DOUBLE = new MatrixArithmetic<>(ComplexArithmetic.INSTANCE);
    /** Largest step as a fraction of the distance to lambda = 0. */
    private static final double REACH = 0.5;
    /** Most steps on one path before giving up. */
    private static final int MAX_STEPS = 20000;

    private final AnalyticArithmetic<T> ar;
    private final MatrixArithmetic<T> ma;
    private final List<Matrix<T>> polynomial;
    private final int order;
    private final double tolerance;
    /** j and 1/(j+1) at the working precision, j = 0 .. order. */
    private final List<T> integers = new ArrayList<>();
    private final List<T> reciprocals = new ArrayList<>();

    /** @param coefficients a_{-2} .. a_{n-1} */
    LinearIntegrator(MatrixArithmetic<T> ma, List<Matrix<T>> coefficients, int order) {
        this.ma = ma;
        this.ar = ma.numbers();
        this.polynomial = List.copyOf(coefficients);
        this.order = order;
        this.tolerance = ar.epsilon();
        for (int j = 0; j <= order; j++) {
            integers.add(ar.of(j));
            reciprocals.add(ar.ratio(1, j + 1));
        }
    }

    /**
     * A solution vector carried to the end of a polar path with its error estimate (maximum norm).
     *
     * @param value the vector at the end
     * @param error its estimated absolute error
     * @param steps the number of Taylor steps taken
     * @param <T> number type
     */
    record Transport<T>(Matrix.Vector<T> value, double error, int steps) {
    }

    /**
     * Carries {@code start} (with its error) from the polar point {@code path[0]} along the polar points
     * path[1], path[2], ... ({logRadius, angle} each; consecutive points share their radius (an arc) or their angle
     * (a radial segment)). Angles are arguments on the universal cover; the points are exp(logRadius + i angle).
     */
    Transport<T> carry(Matrix.Vector<T> start, double startError, List<double[]> path) {
        Matrix.Vector<T> y = start;
        double logR = path.get(0)[0];
        double angle = path.get(0)[1];
        T c = point(logR, angle);
        List<Matrix<Complex>> propagators = new ArrayList<>();
        List<Double> local = new ArrayList<>();
        int steps = 0;
        for (int piece = 1; piece < path.size(); piece++) {
            double targetLogR = path.get(piece)[0];
            double targetAngle = path.get(piece)[1];
            boolean radial = targetAngle == angle;
            if (!radial && targetLogR != logR) {
                throw new IllegalArgumentException("a polar path moves along a ray or an arc, not both");
            }
            while (logR != targetLogR || angle != targetAngle) {
                if (++steps > MAX_STEPS) {
                    throw new UnreachableTargetException("the lambda-equation needs more than " + MAX_STEPS + " Taylor"
                            + " steps on one path (coefficients of A too large for its monodromy data to be computed)");
                }
                Step<T> st = step(c, y);
                double radius = Math.exp(logR);
                double length = st.length;
                if (radial) {
                    double next = targetLogR < logR ? Math.log(Math.max(radius - length, 0.0)) : Math.log(radius + length);
                    logR = targetLogR < logR ? Math.max(next, targetLogR) : Math.min(next, targetLogR);
                } else {
                    double turn = 2 * Math.asin(Math.min(1.0, length / (2 * radius)));
                    angle = targetAngle < angle ? Math.max(angle - turn, targetAngle) : Math.min(angle + turn, targetAngle);
                }
                double[] end = path.get(path.size() - 1);
                T next = logR == end[0] && angle == end[1] ? point(logR, angle) : nearPoint(logR, angle);
                T h = ar.subtract(next, c);
                y = sumVector(st.vectorSeries, h);
                propagators.add(sumMatrix(st.matrixSeries, ar.toComplex(h).divide(st.scale)));
                local.add(localError(st, ma.magnitude(h) / st.scale));
                c = next;
            }
        }
        // the propagator from the end of step i to the end of the path, accumulated backwards from the step ones
        Matrix<Complex> back = DOUBLE.identity();
        double error = 0;
        for (int i = propagators.size() - 1; i >= 0; i--) {
            error += DOUBLE.norm(back) * local.get(i);
            back = DOUBLE.multiply(back, propagators.get(i));
        }
        error += DOUBLE.norm(back) * startError;
        return new Transport<>(y, error, steps);
    }

    /**
     * An intermediate point: exp(logRadius + i angle) rounded to double (the path between its ends need not be
     * exact; its ends are).
     */
    private T nearPoint(double logRadius, double angle) {
        double r = Math.exp(logRadius);
        return ar.of(r * Math.cos(angle), r * Math.sin(angle));
    }

    /** exp(logRadius + i angle) with both doubles taken exactly. */
    T point(double logRadius, double angle) {
        return ar.exp(ar.of(logRadius, angle));
    }

    private static final class Step<T> {
        List<Matrix.Vector<T>> vectorSeries;
        /** Coefficients of the propagator in powers of h / scale (so that they stay within the range of doubles). */
        List<Matrix<Complex>> matrixSeries;
        double scale;
        double length;
        double[] vectorMagnitudes;
        double[] matrixMagnitudes;
    }

    /**
     * The Taylor coefficients at c of the vector (working precision) and of the step propagator (the fundamental
     * matrix equal to I at c; double precision, it serves only the error estimate).
     */
    private Step<T> step(T c, Matrix.Vector<T> y) {
        int degree = polynomial.size() - 1;
        List<Matrix<T>> p = shifted(c);
        List<Matrix<Complex>> pd = new ArrayList<>();
        for (Matrix<T> pi : p) {
            pd.add(new Matrix<>(ar.toComplex(pi.m11()), ar.toComplex(pi.m12()), ar.toComplex(pi.m21()),
                    ar.toComplex(pi.m22())));
        }
        T c2inv = ar.reciprocal(ar.multiply(c, c));
        T twoC = ar.add(c, c);
        Complex cd = ar.toComplex(c);
        Complex c2invD = cd.multiply(cd).reciprocal();
        // the propagator's coefficients in powers of h / rho, rho the largest step: its coefficients in powers of h
        // grow like |c|^-j and leave the range of doubles at high orders near lambda = 0 (found at 125 digits)
        double rho = REACH * ma.magnitude(c);
        List<Matrix.Vector<T>> ys = new ArrayList<>();
        List<Matrix<Complex>> ms = new ArrayList<>();
        ys.add(y);
        ms.add(DOUBLE.identity());
        for (int j = 0; j < order; j++) {
            T g = ar.negate(ar.multiply(twoC, integers.get(j)));
            Matrix.Vector<T> sy = ma.scale(g, ys.get(j));
            Matrix<Complex> sm = DOUBLE.scale(cd.multiply(-2.0 * j * rho), ms.get(j));
            if (j >= 1) {
                sy = add(sy, ma.scale(ar.negate(integers.get(j - 1)), ys.get(j - 1)));
                sm = DOUBLE.add(sm, DOUBLE.scale(new Complex(-(j - 1) * rho * rho), ms.get(j - 1)));
            }
            double power = rho;
            for (int i = 0; i <= Math.min(j, degree); i++) {
                sy = add(sy, ma.apply(p.get(i), ys.get(j - i)));
                sm = DOUBLE.add(sm, DOUBLE.scale(new Complex(power), DOUBLE.multiply(pd.get(i), ms.get(j - i))));
                power *= rho;
            }
            ys.add(ma.scale(ar.multiply(c2inv, reciprocals.get(j)), sy));
            ms.add(DOUBLE.scale(c2invD.divide(j + 1), sm));
        }
        Step<T> st = new Step<>();
        st.vectorSeries = ys;
        st.matrixSeries = ms;
        st.scale = rho;
        st.vectorMagnitudes = new double[order + 1];
        st.matrixMagnitudes = new double[order + 1];
        double logRho = Math.log(rho);
        for (int j = 0; j <= order; j++) {
            // |phi_j| rho^j, formed from logarithms: |phi_j| alone can exceed the range of doubles
            Matrix.Vector<T> v = ys.get(j);
            st.vectorMagnitudes[j] = Math.exp(Math.max(logMagnitude(v.top()), logMagnitude(v.bottom())) + j * logRho);
            st.matrixMagnitudes[j] = DOUBLE.norm(ms.get(j));
        }
        double length = rho;
        length = Math.min(length, rho * admissible(st.vectorMagnitudes));
        length = Math.min(length, rho * admissible(st.matrixMagnitudes));
        st.length = length;
        return st;
    }

    /**
     * The largest u with |c_N| u^N + |c_{N-1}| u^(N-1) &lt;= tolerance |c_0| (each term half of it), c_j the
     * coefficients in powers of u = h / scale.
     */
    private double admissible(double[] mag) {
        double scale = 0.5 * tolerance * mag[0];
        double h = Double.POSITIVE_INFINITY;
        for (int j = order - 1; j <= order; j++) {
            if (mag[j] > 0) {
                h = Math.min(h, Math.exp((Math.log(scale) - Math.log(mag[j])) / j));
            }
        }
        return h;
    }

    /** log |a|, -infinity for 0, also where |a| lies beyond the range of doubles. */
    private double logMagnitude(T a) {
        double m = ma.magnitude(a);
        if (m == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        return Double.isFinite(m) ? Math.log(m) : ar.logAbs(a);
    }

    private double localError(Step<T> st, double u) {
        double truncation = st.vectorMagnitudes[order - 1] * Math.pow(u, order - 1)
                + st.vectorMagnitudes[order] * Math.pow(u, order);
        double sum = 0;
        for (int j = 0; j <= order; j++) {
            sum += st.vectorMagnitudes[j] * Math.pow(u, j);
        }
        return truncation + 2 * tolerance * sum;
    }

    /** The coefficients of P(c + h) = sum_{d} a_{d-2} (c + h)^d in powers of h (repeated synthetic division). */
    private List<Matrix<T>> shifted(T c) {
        List<Matrix<T>> q = new ArrayList<>(polynomial);
        int degree = q.size() - 1;
        for (int i = 0; i <= degree; i++) {
            for (int d = degree - 1; d >= i; d--) {
                q.set(d, ma.add(q.get(d), ma.scale(c, q.get(d + 1))));
            }
        }
        return q;
    }

    private Matrix.Vector<T> add(Matrix.Vector<T> u, Matrix.Vector<T> v) {
        return new Matrix.Vector<>(ar.add(u.top(), v.top()), ar.add(u.bottom(), v.bottom()));
    }

    private Matrix.Vector<T> sumVector(List<Matrix.Vector<T>> series, T h) {
        Matrix.Vector<T> s = series.get(order);
        for (int j = order - 1; j >= 0; j--) {
            s = add(ma.scale(h, s), series.get(j));
        }
        return s;
    }

    private Matrix<Complex> sumMatrix(List<Matrix<Complex>> series, Complex h) {
        Matrix<Complex> s = series.get(order);
        for (int j = order - 1; j >= 0; j--) {
            s = DOUBLE.add(DOUBLE.scale(h, s), series.get(j));
        }
        return s;
    }
}
