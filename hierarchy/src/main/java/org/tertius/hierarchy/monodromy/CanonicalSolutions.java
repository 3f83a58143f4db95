package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The columns of the canonical solutions at lambda = infinity and lambda = 0, each carried to one meeting point
 * lambda* on the circle |lambda| = rho* (conventions in {@link MonodromyMap}).
 *
 * <p>A column of a canonical solution is fixed by its asymptotics on the ray where it is most recessive (there the
 * exponential of the other column dominates by the factor exp|Lambda_1 - Lambda_2|, so the optimally truncated
 * formal series determines it up to a relative error of the size of its smallest term). On that ray it is started
 * from the formal series at the radius where the smallest term is below the working epsilon, carried radially to
 * rho* (it grows on the way, which is the stable direction), then along the circle to lambda*. The radius rho*
 * balances the exponents of both points: it minimises 2 |theta_infinity|(rho) + 2 |s| / rho with
 * |theta_infinity|(rho) = sum_j |t_j| rho^j (clamped between the start radii). Immutable.
 *
 * @param <T> number type
 */
final class CanonicalSolutions<T> {
    /** Coefficients of the formal series beyond n K / 2, K = log(1 / epsilon). */
    private static final int EXTRA_TERMS = 24;

    private final List<LinearIntegrator.Transport<T>> atInfinity;
    private final List<LinearIntegrator.Transport<T>> atZero;
    private final T exponentInfinity;
    private final T exponentZero;
    private final Matrix<T> eigenvectors;
    private final double[] meeting;
    private final double[] startRadii;
    private final double violation;

    private CanonicalSolutions(List<LinearIntegrator.Transport<T>> atInfinity, List<LinearIntegrator.Transport<T>> atZero,
                               T exponentInfinity, T exponentZero, Matrix<T> eigenvectors, double[] meeting,
                               double[] startRadii, double violation) {
        this.violation = violation;
        this.atInfinity = atInfinity;
        this.atZero = atZero;
        this.exponentInfinity = exponentInfinity;
        this.exponentZero = exponentZero;
        this.eigenvectors = eigenvectors;
        this.meeting = meeting;
        this.startRadii = startRadii;
    }

    /** The column of infinity-ray j (j = 0 .. 2n + 1): column 1 for even j, column 2 for odd j. */
    LinearIntegrator.Transport<T> infinity(int j) {
        return atInfinity.get(j);
    }

    /** The column of zero-ray j (j = 0 .. 3): column 2 for even j, column 1 for odd j. */
    LinearIntegrator.Transport<T> zero(int j) {
        return atZero.get(j);
    }

    /** The formal monodromy exponent at infinity computed from the equation (b_-1, entry 1,1). */
    T exponentInfinity() {
        return exponentInfinity;
    }

    /** The formal monodromy exponent at zero (lambda^(m0 sigma3)). */
    T exponentZero() {
        return exponentZero;
    }

    /** G0: eigenvectors of a_-2 for i s and -i s, det G0 = 1. */
    Matrix<T> eigenvectors() {
        return eigenvectors;
    }

    /** {rho*, angle of lambda*}. */
    double[] meetingPoint() {
        return meeting.clone();
    }

    /** {smallest start radius at infinity, largest start radius at zero}. */
    double[] startRadii() {
        return startRadii.clone();
    }

    /**
     * The largest relative deviation of the exponents at infinity b_{n-1} .. b_{-1} from -i theta_inf' and m: zero
     * when the diagonal entries a(k)11 satisfy their constraints.
     */
    double constraintViolation() {
        return violation;
    }

    /** Angle of ray j at infinity: (-pi/2 - arg t_n + j pi) / n. */
    static double infinityRay(int n, double topArgument, int j) {
        return (-Math.PI / 2 - topArgument + j * Math.PI) / n;
    }

    /** Angle of ray j at zero: arg s - pi/2 + j pi. */
    static double zeroRay(double argS, int j) {
        return argS - Math.PI / 2 + j * Math.PI;
    }

    static <T> CanonicalSolutions<T> compute(LaxMatrix<T> lax, int taylorOrder) {
        AnalyticArithmetic<T> ar = lax.arithmetic();
        MatrixArithmetic<T> ma = new MatrixArithmetic<>(ar);
        int n = lax.order();
        double eps = ar.epsilon();
        double k = Math.log(1 / eps) + 3;
        int terms = (int) Math.ceil(n * k / 2) + EXTRA_TERMS;

        // infinity, in u = lambda / L with L = |t_n|^(-1/n): c_k = L^(k+1) a_k
        T scaleInf = ar.of(Math.pow(ar.abs(lax.topTime()), -1.0 / n));
        List<Matrix<T>> cInf = new ArrayList<>();
        T power = ar.reciprocal(scaleInf);
        for (int j = -2; j <= n - 1; j++) {
            cInf.add(ma.scale(power, lax.coefficient(j)));
            power = ar.multiply(power, scaleInf);
        }
        FormalSolution<T> inf = FormalSolution.compute(ar, cInf, -2, null, terms);
        // the exponents at infinity must be -i theta_inf'(lambda) + m / lambda (the constraints on the diagonals)
        double violation = ar.abs(ar.subtract(inf.exponent11(-1), lax.m())) / (1 + ar.abs(lax.m()));
        T lk = scaleInf;
        for (int j = 0; j < n; j++) {
            T expected = ar.multiply(ar.multiply(ar.of(0, -(j + 1)), lax.time(j + 1)), lk);
            violation = Math.max(violation, ar.abs(ar.subtract(inf.exponent11(j), expected)) / (1 + ar.abs(expected)));
            lk = ar.multiply(lk, scaleInf);
        }

        // zero, in w = 1 / (L0 lambda), L0 = 1/|s|, in the eigenbasis G0 of a_-2: c_j = -L0^(j+1) G0^-1 a_{-j-2} G0
        Matrix<T> a2 = lax.coefficient(-2);
        T mu = ar.sqrt(ar.negate(ma.determinant(a2)));
        T is = ar.multiply(ar.of(0, 1), lax.s());
        if (ar.abs(ar.subtract(mu, is)) > ar.abs(ar.add(mu, is))) {
            mu = ar.negate(mu);
        }
        Matrix<T> g0 = eigenvectors(ma, a2, mu);
        Matrix<T> g0inv = ma.adjugate(g0);
        T scaleZero = ar.of(1 / ar.abs(lax.s()));
        List<Matrix<T>> cZero = new ArrayList<>();
        for (int j = -(n + 1); j <= 0; j++) {
            T f = ar.negate(integerPower(ar, scaleZero, j + 1));
            Matrix<T> hat = j == 0 ? ma.sigma3(mu) : ma.multiply(g0inv, ma.multiply(lax.coefficient(-j - 2), g0));
            cZero.add(ma.scale(f, hat));
        }
        FormalSolution<T> zero = FormalSolution.compute(ar, cZero, -(n + 1), null, terms);

        double argS = ar.toComplex(lax.s()).getArgument();
        AsymptoticStart<T> anchorInf = new AsymptoticStart<>(ar, ma, inf, eps, n, scaleInf, null, false);
        AsymptoticStart<T> anchorZero = new AsymptoticStart<>(ar, ma, zero, eps, 1, ar.reciprocal(scaleZero), g0, true);
        double rInf = Math.min(anchorInf.radius(1), anchorInf.radius(2));
        double rZero = Math.max(anchorZero.radius(1), anchorZero.radius(2));
        double rho = balancedRadius(ar, lax);
        rho = rZero < rInf ? Math.min(Math.max(rho, rZero), rInf) : Math.sqrt(rZero * rInf);
        double meet = (infinityRay(n, lax.topArgument(), 0) + zeroRay(argS, 0)) / 2 + Math.PI;

        LinearIntegrator<T> integrator = new LinearIntegrator<>(ma, lax.coefficients(), taylorOrder);
        List<LinearIntegrator.Transport<T>> infCols = new ArrayList<>();
        for (int j = 0; j <= 2 * n + 1; j++) {
            double angle = infinityRay(n, lax.topArgument(), j);
            infCols.add(anchorInf.carry(integrator, j % 2 == 0 ? 1 : 2, angle, rho, meet));
        }
        List<LinearIntegrator.Transport<T>> zeroCols = new ArrayList<>();
        for (int j = 0; j <= 3; j++) {
            double angle = zeroRay(argS, j);
            zeroCols.add(anchorZero.carry(integrator, j % 2 == 0 ? 2 : 1, angle, rho, meet));
        }
        return new CanonicalSolutions<>(infCols, zeroCols, inf.exponent11(-1), ar.negate(zero.exponent11(-1)), g0,
                new double[] {rho, meet}, new double[] {rInf, rZero}, violation);
    }

    private static <T> T integerPower(AnalyticArithmetic<T> ar, T base, int e) {
        T r = ar.one();
        T b = e >= 0 ? base : ar.reciprocal(base);
        for (int i = 0; i < Math.abs(e); i++) {
            r = ar.multiply(r, b);
        }
        return r;
    }

    /** Eigenvectors of a_-2 for mu and -mu as columns, scaled to determinant 1. */
    private static <T> Matrix<T> eigenvectors(MatrixArithmetic<T> ma, Matrix<T> a, T mu) {
        AnalyticArithmetic<T> ar = ma.numbers();
        Matrix.Vector<T> v1 = eigenvector(ma, a, mu);
        Matrix.Vector<T> v2 = eigenvector(ma, a, ar.negate(mu));
        T root = ar.sqrt(ma.determinant(v1, v2));
        T f = ar.reciprocal(root);
        return Matrix.ofColumns(ma.scale(f, v1), ma.scale(f, v2));
    }

    private static <T> Matrix.Vector<T> eigenvector(MatrixArithmetic<T> ma, Matrix<T> a, T mu) {
        AnalyticArithmetic<T> ar = ma.numbers();
        Matrix.Vector<T> first = new Matrix.Vector<>(a.m12(), ar.subtract(mu, a.m11()));
        Matrix.Vector<T> second = new Matrix.Vector<>(ar.add(mu, a.m11()), a.m21());
        return ma.norm(first) >= ma.norm(second) ? first : second;
    }

    /** The radius minimising 2 sum_j |t_j| rho^j + 2 |s| / rho (golden section in log rho). */
    private static <T> double balancedRadius(AnalyticArithmetic<T> ar, LaxMatrix<T> lax) {
        double lo = -60;
        double hi = 60;
        double g = (Math.sqrt(5) - 1) / 2;
        for (int i = 0; i < 200; i++) {
            double a = hi - g * (hi - lo);
            double b = lo + g * (hi - lo);
            if (exponentSize(ar, lax, a) < exponentSize(ar, lax, b)) {
                hi = b;
            } else {
                lo = a;
            }
        }
        return Math.exp((lo + hi) / 2);
    }

    private static <T> double exponentSize(AnalyticArithmetic<T> ar, LaxMatrix<T> lax, double logRho) {
        double rho = Math.exp(logRho);
        double sum = 2 * ar.abs(lax.s()) / rho;
        for (int j = 1; j <= lax.order(); j++) {
            sum += 2 * ar.abs(lax.time(j)) * Math.pow(rho, j);
        }
        return sum;
    }
}
