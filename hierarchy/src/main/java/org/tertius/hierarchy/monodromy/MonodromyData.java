package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The monodromy data of the lambda-equation at one point of a member-n solution, each number with its error
 * estimate: the 2n Stokes multipliers at lambda = infinity, the two at lambda = 0, the connection matrix E and the
 * formal monodromy exponents m (at infinity) and m0 (at 0). The conventions are those of {@link MonodromyMap};
 * this class only holds the numbers and the results of the self-checks. Immutable.
 *
 * @param <T> number type
 */
public final class MonodromyData<T> {
    /** How the free diagonal factor of the canonical solutions at lambda = 0 is fixed. */
    public enum ConnectionNormalization {
        /** E11 = E22, with Re E11 &gt; 0 (or Re E11 = 0 and Im E11 &gt; 0): the rule whenever E11 E22 != 0. */
        DIAGONAL,
        /** E12 = -E21 with Re E12 &gt; 0: the rule when E11 or E22 vanishes (within its error estimate). */
        ANTI_DIAGONAL
    }

    private final AnalyticArithmetic<T> ar;
    private final MatrixArithmetic<T> ma;
    private final int order;
    private final List<Estimate<T>> stokesInfinity;
    private final List<Estimate<T>> stokesZero;
    private final MatrixEstimate<T> connection;
    private final ConnectionNormalization normalization;
    private final Estimate<T> exponentInfinity;
    private final Estimate<T> exponentZero;
    private final double[] meeting;
    private final double worstCheck;
    private final List<String> checks;

    MonodromyData(AnalyticArithmetic<T> ar, int order, List<Estimate<T>> stokesInfinity, List<Estimate<T>> stokesZero,
                  MatrixEstimate<T> connection, ConnectionNormalization normalization, Estimate<T> exponentInfinity,
                  Estimate<T> exponentZero, double[] meeting, List<String> checks) {
        this(ar, order, stokesInfinity, stokesZero, connection, normalization, exponentInfinity, exponentZero, meeting,
                0, checks);
    }

    private MonodromyData(AnalyticArithmetic<T> ar, int order, List<Estimate<T>> stokesInfinity,
                          List<Estimate<T>> stokesZero, MatrixEstimate<T> connection,
                          ConnectionNormalization normalization, Estimate<T> exponentInfinity, Estimate<T> exponentZero,
                          double[] meeting, double worstCheck, List<String> checks) {
        this.ar = ar;
        this.ma = new MatrixArithmetic<>(ar);
        this.order = order;
        this.stokesInfinity = List.copyOf(stokesInfinity);
        this.stokesZero = List.copyOf(stokesZero);
        this.connection = connection;
        this.normalization = normalization;
        this.exponentInfinity = exponentInfinity;
        this.exponentZero = exponentZero;
        this.meeting = meeting.clone();
        this.worstCheck = worstCheck;
        this.checks = List.copyOf(checks);
    }

    MonodromyData<T> withChecks(double worst, List<String> lines) {
        return new MonodromyData<>(ar, order, stokesInfinity, stokesZero, connection, normalization, exponentInfinity,
                exponentZero, meeting, worst, lines);
    }

    public AnalyticArithmetic<T> arithmetic() {
        return ar;
    }

    /** The member n. */
    public int order() {
        return order;
    }

    /** The Stokes multiplier of S^inf_k, 1 &lt;= k &lt;= 2n (upper triangular for even k, lower for odd k). */
    public Estimate<T> stokesAtInfinity(int k) {
        if (k < 1 || k > 2 * order) {
            throw new InvalidInputException("k", "Stokes matrices at infinity are numbered 1 .. " + 2 * order
                    + " for member " + order + ", got " + k);
        }
        return stokesInfinity.get(k - 1);
    }

    /** The Stokes multiplier of S^0_k, k = 1 (upper triangular) or 2 (lower triangular). */
    public Estimate<T> stokesAtZero(int k) {
        if (k < 1 || k > 2) {
            throw new InvalidInputException("k", "Stokes matrices at 0 are numbered 1 and 2, got " + k);
        }
        return stokesZero.get(k - 1);
    }

    /** S^inf_k as a unit triangular matrix. */
    public Matrix<T> stokesMatrixAtInfinity(int k) {
        return triangular(stokesAtInfinity(k).value(), k % 2 == 0);
    }

    /** S^0_k as a unit triangular matrix. */
    public Matrix<T> stokesMatrixAtZero(int k) {
        return triangular(stokesAtZero(k).value(), k % 2 == 1);
    }

    private Matrix<T> triangular(T s, boolean upper) {
        return upper ? new Matrix<>(ar.one(), s, ar.zero(), ar.one()) : new Matrix<>(ar.one(), ar.zero(), s, ar.one());
    }

    /** Entry (row, column) of the connection matrix E = (Y^inf_1)^-1 Y^0_1, normalised. */
    public Estimate<T> connection(int row, int column) {
        if (row < 1 || row > 2 || column < 1 || column > 2) {
            throw new InvalidInputException("entry", "rows and columns of E are 1 or 2, got (" + row + ", " + column + ")");
        }
        return new Estimate<>(connection.value().entry(row, column), connection.error(row, column));
    }

    public Matrix<T> connectionMatrix() {
        return connection.value();
    }

    public ConnectionNormalization connectionNormalization() {
        return normalization;
    }

    /**
     * The same data under the other normalisation of the canonical solutions at 0 (the diagonal factor D acting as
     * E -> E D; errors carried over relatively).
     */
    public MonodromyData<T> normalized(ConnectionNormalization kind) {
        if (kind == normalization) {
            return this;
        }
        Matrix<T> e = connection.value();
        T delta = kind == ConnectionNormalization.DIAGONAL
                ? ar.divide(ar.sqrt(ar.multiply(e.m11(), e.m22())), e.m11())
                : ar.divide(e.m12(), ar.sqrt(ar.negate(ar.multiply(e.m12(), e.m21()))));
        T inverse = ar.reciprocal(delta);
        double d = ar.abs(delta);
        Matrix<T> en = new Matrix<>(ar.multiply(e.m11(), delta), ar.multiply(e.m12(), inverse),
                ar.multiply(e.m21(), delta), ar.multiply(e.m22(), inverse));
        MatrixEstimate<T> c = new MatrixEstimate<>(en, connection.e11() * d, connection.e12() / d,
                connection.e21() * d, connection.e22() / d);
        T d2 = ar.multiply(delta, delta);
        List<Estimate<T>> zero = List.of(
                new Estimate<>(ar.divide(stokesZero.get(0).value(), d2), stokesZero.get(0).error() / (d * d)),
                new Estimate<>(ar.multiply(stokesZero.get(1).value(), d2), stokesZero.get(1).error() * d * d));
        return new MonodromyData<>(ar, order, stokesInfinity, zero, c, kind, exponentInfinity, exponentZero, meeting,
                worstCheck, checks);
    }

    /** E11 E22 = 1 + E12 E21: unchanged by the diagonal gauges at both points. */
    public Estimate<T> connectionProduct() {
        T p = ar.multiply(connection.value().m11(), connection.value().m22());
        double e = connection.e11() * ar.abs(connection.value().m22()) + connection.e22() * ar.abs(connection.value().m11());
        return new Estimate<>(p, e + 2 * ar.epsilon() * ar.abs(p));
    }

    /** The formal monodromy exponent m at infinity (Y ~ H lambda^(m sigma3) exp(-i theta sigma3)), from the equation. */
    public Estimate<T> exponentAtInfinity() {
        return exponentInfinity;
    }

    /** The formal monodromy exponent m0 at 0 (Y ~ G0 H lambda^(m0 sigma3) exp(-i s sigma3 / lambda)) = T / (2 i s). */
    public Estimate<T> exponentAtZero() {
        return exponentZero;
    }

    /** M_inf = exp(2 pi i m sigma3) (S^inf_1 ... S^inf_2n)^-1: Y^inf_1(lambda e^(2 pi i)) = Y^inf_1(lambda) M_inf. */
    public Matrix<T> monodromyAtInfinity() {
        return monodromy(stokesInfinity.size(), true, exponentInfinity.value());
    }

    /** M_0 = exp(2 pi i m0 sigma3) (S^0_1 S^0_2)^-1: Y^0_1(lambda e^(2 pi i)) = Y^0_1(lambda) M_0. */
    public Matrix<T> monodromyAtZero() {
        return monodromy(2, false, exponentZero.value());
    }

    private Matrix<T> monodromy(int count, boolean atInfinity, T exponent) {
        Matrix<T> product = ma.identity();
        for (int k = 1; k <= count; k++) {
            product = ma.multiply(product, atInfinity ? stokesMatrixAtInfinity(k) : stokesMatrixAtZero(k));
        }
        T phase = ar.exp(ar.multiply(ar.multiply(ar.of(0, 2), ar.pi()), exponent));
        return ma.multiply(ma.diagonal(phase, ar.reciprocal(phase)), ma.inverse(product));
    }

    /** {|M_inf E - E M_0| (row-sum norm), its first-order bound}. */
    double[] cyclicResidual() {
        MatrixEstimate<T> left = MatrixEstimate.multiply(ma, monodromyEstimate(true), connection);
        MatrixEstimate<T> right = MatrixEstimate.multiply(ma, connection, monodromyEstimate(false));
        double bound = Math.max(left.e11() + left.e12() + right.e11() + right.e12(),
                left.e21() + left.e22() + right.e21() + right.e22());
        return new double[] {ma.distance(left.value(), right.value()), bound};
    }

    private MatrixEstimate<T> monodromyEstimate(boolean atInfinity) {
        int count = atInfinity ? stokesInfinity.size() : 2;
        MatrixEstimate<T> product = new MatrixEstimate<>(ma.identity(), 0, 0, 0, 0);
        for (int k = 1; k <= count; k++) {
            Estimate<T> s = atInfinity ? stokesAtInfinity(k) : stokesAtZero(k);
            boolean upper = atInfinity ? k % 2 == 0 : k % 2 == 1;
            Matrix<T> v = triangular(s.value(), upper);
            product = MatrixEstimate.multiply(ma, product, new MatrixEstimate<>(v, 0, upper ? s.error() : 0,
                    upper ? 0 : s.error(), 0));
        }
        Estimate<T> m = atInfinity ? exponentInfinity : exponentZero;
        T phase = ar.exp(ar.multiply(ar.multiply(ar.of(0, 2), ar.pi()), m.value()));
        T inverse = ar.reciprocal(phase);
        double growth = 2 * Math.PI * m.error();
        MatrixEstimate<T> diagonal = new MatrixEstimate<>(ma.diagonal(phase, inverse), ar.abs(phase) * growth, 0, 0,
                ar.abs(inverse) * growth);
        return MatrixEstimate.multiply(ma, diagonal, MatrixEstimate.inverse(ma, product));
    }

    /** The largest deviation of a self-check relative to its first-order bound (det Y = 1, triangular S, cycle). */
    public double worstCheck() {
        return worstCheck;
    }

    /** Whether every self-check holds within {@code 2} times its bound. */
    public boolean checksHold() {
        return worstCheck <= DataAssembly.CHECK_SAFETY;
    }

    /** The self-checks, one line each. */
    public List<String> checks() {
        return checks;
    }

    /** {rho*, arg lambda*}: the point where the canonical solutions were compared. */
    public double[] meetingPoint() {
        return meeting.clone();
    }

    /**
     * The largest |difference| / (sum of error estimates) over all multipliers, the entries of E and the exponents
     * of two data sets of the same member (1 or less: they agree within their estimates).
     */
    public double deviationRatio(MonodromyData<T> other) {
        if (other.order != order) {
            throw new InvalidInputException("other", "data of member " + other.order + " compared with member " + order);
        }
        List<Estimate<T>> a = all();
        List<Estimate<T>> b = other.all();
        if (normalization != other.normalization) {
            // compare only what both normalisations share: the gauge-free product replaces the entries of E
            a = new ArrayList<>(a.subList(0, a.size() - 4));
            b = new ArrayList<>(b.subList(0, b.size() - 4));
            a.add(connectionProduct());
            b.add(other.connectionProduct());
        }
        double worst = 0;
        for (int i = 0; i < a.size(); i++) {
            double d = ar.abs(ar.subtract(a.get(i).value(), b.get(i).value()));
            worst = Math.max(worst, d / Math.max(a.get(i).error() + b.get(i).error(), Double.MIN_NORMAL));
        }
        return worst;
    }

    /** The same data with {@code extra[i]} added to the error of quantity i (in the order of all()). */
    MonodromyData<T> plusErrors(double[] extra) {
        List<Estimate<T>> q = all();
        int n2 = stokesInfinity.size();
        List<Estimate<T>> inf = new ArrayList<>();
        for (int i = 0; i < n2; i++) {
            inf.add(plus(q.get(i), extra[i]));
        }
        List<Estimate<T>> zero = List.of(plus(q.get(n2), extra[n2]), plus(q.get(n2 + 1), extra[n2 + 1]));
        int c = n2 + 4;
        MatrixEstimate<T> e = new MatrixEstimate<>(connection.value(), connection.e11() + extra[c],
                connection.e12() + extra[c + 1], connection.e21() + extra[c + 2], connection.e22() + extra[c + 3]);
        return new MonodromyData<>(ar, order, inf, zero, e, normalization, plus(exponentInfinity, extra[n2 + 2]),
                plus(exponentZero, extra[n2 + 3]), meeting, worstCheck, checks);
    }

    private static <T> Estimate<T> plus(Estimate<T> e, double extra) {
        return new Estimate<>(e.value(), e.error() + extra);
    }

    /**
     * All numbers in one list: s^inf_1 .. s^inf_2n, s^0_1, s^0_2, m, m0, E11, E12, E21, E22.
     */
    public List<Estimate<T>> quantities() {
        return all();
    }

    private List<Estimate<T>> all() {
        List<Estimate<T>> all = new ArrayList<>(stokesInfinity);
        all.addAll(stokesZero);
        all.add(exponentInfinity);
        all.add(exponentZero);
        for (int i = 1; i <= 2; i++) {
            for (int j = 1; j <= 2; j++) {
                all.add(connection(i, j));
            }
        }
        return all;
    }

    @Override
    public String toString() {
        StringBuilder sb = new StringBuilder("member " + order + " monodromy data");
        for (int k = 1; k <= 2 * order; k++) {
            sb.append(String.format("%n  s^inf_%d = %s +- %.2g", k, ar.toComplex(stokesAtInfinity(k).value()),
                    stokesAtInfinity(k).error()));
        }
        for (int k = 1; k <= 2; k++) {
            sb.append(String.format("%n  s^0_%d = %s +- %.2g", k, ar.toComplex(stokesAtZero(k).value()),
                    stokesAtZero(k).error()));
        }
        for (int i = 1; i <= 2; i++) {
            for (int j = 1; j <= 2; j++) {
                sb.append(String.format("%n  E%d%d = %s +- %.2g", i, j, ar.toComplex(connection(i, j).value()),
                        connection(i, j).error()));
            }
        }
        sb.append(String.format("%n  m = %s, m0 = %s (%s normalisation, worst check %.2g)",
                ar.toComplex(exponentInfinity.value()), ar.toComplex(exponentZero.value()), normalization, worstCheck));
        return sb.toString();
    }
}
