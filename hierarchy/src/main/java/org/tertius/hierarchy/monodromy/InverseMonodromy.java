package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import java.util.function.UnaryOperator;
import org.tertius.core.TertiusException;
import org.tertius.core.number.AnalyticArithmetic;

/**
 * The inverse monodromy map: the member state at a chosen point (x, the times, s, m and the exponent m0 at 0 given)
 * whose monodromy data satisfy prescribed {@link MonodromyCondition conditions} (all data, or a subset plus
 * constraints such as trivial Stokes matrices at 0), optionally under the reality symmetry r = -conj(q).
 *
 * <p>Method: Levenberg-Marquardt iteration ({@link LeastSquares}) on the direct map ({@link MonodromyMap}) in the
 * coordinates of {@link StateChart}, with a Jacobian by finite differences (step sqrt(epsilon) times the size of the
 * coordinate) and steps limited to half the size of the iterate (a trust region), started from a given state or
 * from generated ones (a few fixed generic states, tried in turn), first directly, then along a homotopy: the residuals
 * r(z) - (1 - tau) r(z_start) are driven to zero for tau = 0 .. 1 in steps that halve when an iteration fails
 * (common practice for continuation; an intermediate stage ends at its least-squares point, since with more
 * conditions than unknowns its targets need not be attainable). The iteration stops when every residual is within
 * twice the error estimate of its quantity. The error estimate of the state is the least-squares propagation of
 * the final residuals plus their estimates ({@link InverseEstimate}); directions the conditions leave free, such as
 * a gauge, are reported by {@link MonodromySolution#freeDirections()}. Immutable; build with {@link #builder}
 * ({@link InverseMonodromyBuilder}).
 *
 * @param <T> number type
 */
public final class InverseMonodromy<T> {
    private static final int MAX_ITERATIONS = 40;
    private static final double SMALLEST_STAGE = 1.0 / 16;
    /** First guesses generated when none is given. */
    private static final int GENERATED_STARTS = 6;
    /** Iterations without a tenfold decrease of the residual after which an attempt is abandoned. */
    private static final int STAGNATION = 8;

    private final MonodromyMap<T> map;
    private final AnalyticArithmetic<T> ar;
    private final UnaryOperator<T> conj;
    private final int order;
    private final T x;
    private final List<T> times;
    private final T s;
    private final T m;
    private final T m0;
    private final double topArgument;
    private final List<MonodromyCondition<T>> conditions;
    private final boolean reality;
    private final List<T> firstGuess;

    InverseMonodromy(InverseMonodromyBuilder<T> b) {
        this.map = b.map;
        this.ar = b.map.arithmetic();
        this.conj = Conjugation.of(ar);
        this.order = b.order;
        this.x = b.x;
        this.times = List.copyOf(b.times);
        this.s = b.s;
        this.m = b.m;
        this.m0 = b.m0;
        this.topArgument = b.topArgument;
        this.conditions = List.copyOf(b.conditions);
        this.reality = b.reality;
        this.firstGuess = b.firstGuess == null ? null : List.copyOf(b.firstGuess);
    }

    /** A builder of the inverse problem of member n (1 &lt;= n &lt;= 8) in the arithmetic of the map. */
    public static <T> InverseMonodromyBuilder<T> builder(MonodromyMap<T> map, int order) {
        return new InverseMonodromyBuilder<>(map, order);
    }

    /**
     * Solves for the state.
     *
     * @throws TertiusException if the iteration does not converge from the first guess (with the residual reached)
     */
    public MonodromySolution<T> solve() {
        T trace = ar.multiply(ar.multiply(ar.of(0, 2), s), m0);
        boolean pivot12 = firstGuess == null || ar.abs(firstGuess.get(1)) >= ar.abs(firstGuess.get(2));
        StateChart<T> chart = new StateChart<>(ar, order, x, times, s, m, trace, reality, pivot12);
        List<List<T>> starts = new ArrayList<>();
        if (firstGuess != null) {
            starts.add(chart.coordinates(firstGuess));
        } else {
            for (int k = 0; k < GENERATED_STARTS; k++) {
                starts.add(chart.generatedCoordinates(k));
            }
        }
        String failure = "";
        for (List<T> start : starts) {
            try {
                return solveFrom(chart, start);
            } catch (TertiusException e) {
                failure = e.getMessage();
            }
        }
        throw new TertiusException("the inverse monodromy map did not converge from " + (firstGuess == null
                ? GENERATED_STARTS + " generated first guesses" : "the first guess given") + " (last: " + failure
                + "); give a first guess closer to the solution, or conditions that fix it");
    }

    /** Directly, then along the homotopy. */
    private MonodromySolution<T> solveFrom(StateChart<T> chart, List<T> z) {
        Evaluation start = evaluate(chart, z);
        if (start == null) {
            throw new TertiusException("the monodromy data of the first guess cannot be computed");
        }
        List<T> r0 = start.values;
        Attempt direct = iterate(chart, z, r0, 0, true);
        if (direct.converged) {
            return result(chart, direct.z, direct.at, direct.iterations, 1);
        }
        double tau = 0;
        double stage = 0.5;
        int iterations = direct.iterations;
        int stages = 0;
        Evaluation at = start;
        while (tau < 1) {
            double next = Math.min(1, tau + stage);
            Attempt attempt = iterate(chart, z, r0, 1 - next, next == 1);
            iterations += attempt.iterations;
            if (attempt.converged) {
                z = attempt.z;
                at = attempt.at;
                tau = next;
                stage = Math.min(1, 2 * stage);
                stages++;
            } else {
                stage /= 2;
                if (stage < SMALLEST_STAGE) {
                    throw new TertiusException("homotopy stalled at tau = " + tau + " of 1, residual " + attempt.norm);
                }
            }
        }
        return result(chart, z, at, iterations, stages);
    }

    /** Residuals at z (null where the data cannot be computed). */
    private final class Evaluation {
        List<T> values = new ArrayList<>();
        List<Double> errors = new ArrayList<>();
        List<T> state;
        MonodromyData<T> data;
    }

    private Evaluation evaluate(StateChart<T> chart, List<T> z) {
        Evaluation e = new Evaluation();
        try {
            e.state = chart.state(z);
            LaxMatrix<T> lax = LaxMatrix.of(ar, order, x, times, s, m, e.state, new double[e.state.size()], topArgument);
            e.data = map.compute(lax);
        } catch (TertiusException | ArithmeticException ex) {
            // an iterate outside the domain of the chart or of the map: the step is rejected
            return null;
        }
        for (MonodromyCondition<T> c : conditions) {
            for (Estimate<T> r : c.residuals(e.data)) {
                if (reality) {
                    T twoI = ar.of(0, 2);
                    e.values.add(ar.divide(ar.add(r.value(), conj.apply(r.value())), ar.of(2)));
                    e.values.add(ar.divide(ar.subtract(r.value(), conj.apply(r.value())), twoI));
                    e.errors.add(r.error());
                    e.errors.add(r.error());
                } else {
                    e.values.add(r.value());
                    e.errors.add(r.error());
                }
            }
        }
        return e;
    }

    private final class Attempt {
        boolean converged;
        List<T> z;
        Evaluation at;
        int iterations;
        double norm;
    }

    private Attempt iterate(StateChart<T> chart, List<T> z, List<T> r0, double remaining, boolean last) {
        Attempt a = new Attempt();
        a.z = z;
        a.at = evaluate(chart, z);
        double mu = 1e-6;
        List<T> r = shifted(a.at, r0, remaining);
        a.norm = norm(r);
        double reference = a.norm;
        int sinceProgress = 0;
        for (int it = 0; it < MAX_ITERATIONS; it++) {
            a.iterations++;
            if (a.norm < 0.1 * reference) {
                reference = a.norm;
                sinceProgress = 0;
            } else if (++sinceProgress > STAGNATION && !done(a.at, r, last)) {
                a.converged = !last;
                return a;
            }
            if (done(a.at, r, last)) {
                a.converged = true;
                return a;
            }
            List<T[]> jac = jacobian(chart, a.z, r, r0, remaining);
            boolean improved = false;
            for (int tries = 0; tries < 12 && !improved; tries++) {
                T[] delta = LeastSquares.step(ar, conj, jac, r, mu);
                // a trust region: no step longer than half the size of the point (and at least 0.5)
                double length = 0;
                double size = 0;
                for (int i = 0; i < a.z.size(); i++) {
                    length = Math.max(length, ar.abs(delta[i]));
                    size = Math.max(size, ar.abs(a.z.get(i)));
                }
                T shrink = ar.of(Math.min(1, 0.5 * Math.max(1, size) / length));
                List<T> trial = new ArrayList<>();
                for (int i = 0; i < a.z.size(); i++) {
                    trial.add(ar.add(a.z.get(i), ar.multiply(shrink, delta[i])));
                }
                Evaluation e = evaluate(chart, trial);
                if (e != null) {
                    List<T> rt = shifted(e, r0, remaining);
                    double nt = norm(rt);
                    if (nt < a.norm) {
                        boolean slow = nt > 0.99 * a.norm;
                        a.z = trial;
                        a.at = e;
                        r = rt;
                        a.norm = nt;
                        if (slow && !last) {
                            // an intermediate stage of an overdetermined problem: its targets need not be reachable
                            // (data on the segment between two data sets violate the cyclic relation); the
                            // least-squares point is the next start
                            a.converged = true;
                            return a;
                        }
                        mu = Math.max(mu / 10, 1e-15);
                        improved = true;
                        continue;
                    }
                }
                mu *= 10;
            }
            if (!improved) {
                a.converged = done(a.at, r, last) || !last;
                return a;
            }
        }
        a.converged = done(a.at, r, last);
        return a;
    }

    /** Converged: every residual within twice its error estimate (intermediate stages: 1e-6 relative). */
    private boolean done(Evaluation e, List<T> r, boolean last) {
        for (int i = 0; i < r.size(); i++) {
            double allowed = last ? 2 * e.errors.get(i) + 16 * ar.epsilon()
                    : 1e-6 * (1 + ar.abs(e.values.get(i))) + 2 * e.errors.get(i);
            if (!(ar.abs(r.get(i)) <= allowed)) {
                return false;
            }
        }
        return true;
    }

    private List<T> shifted(Evaluation e, List<T> r0, double remaining) {
        List<T> r = new ArrayList<>();
        T f = ar.of(remaining);
        for (int i = 0; i < r0.size(); i++) {
            r.add(ar.subtract(e.values.get(i), ar.multiply(f, r0.get(i))));
        }
        return r;
    }

    private double norm(List<T> r) {
        double sum = 0;
        for (T t : r) {
            double a = ar.abs(t);
            sum += a * a;
        }
        return Math.sqrt(sum);
    }

    private List<T[]> jacobian(StateChart<T> chart, List<T> z, List<T> r, List<T> r0, double remaining) {
        int p = z.size();
        List<T[]> rows = new ArrayList<>();
        for (int i = 0; i < r.size(); i++) {
            @SuppressWarnings("unchecked")
            T[] row = (T[]) new Object[p];
            rows.add(row);
        }
        double root = Math.sqrt(ar.epsilon());
        for (int c = 0; c < p; c++) {
            double h = root * Math.max(1, ar.abs(z.get(c)));
            List<T> moved = new ArrayList<>(z);
            moved.set(c, ar.add(z.get(c), ar.of(h)));
            Evaluation e = evaluate(chart, moved);
            if (e == null) {
                h = -h;
                moved.set(c, ar.add(z.get(c), ar.of(h)));
                e = evaluate(chart, moved);
                if (e == null) {
                    throw new TertiusException("the monodromy data cannot be computed next to the iterate");
                }
            }
            List<T> rm = shifted(e, r0, remaining);
            T hInv = ar.of(1 / h);
            for (int i = 0; i < r.size(); i++) {
                rows.get(i)[c] = ar.multiply(ar.subtract(rm.get(i), r.get(i)), hInv);
            }
        }
        return rows;
    }

    private MonodromySolution<T> result(StateChart<T> chart, List<T> z, Evaluation at, int iterations, int stages) {
        List<T> r = shifted(at, at.values, 0);
        List<T[]> jac = jacobian(chart, z, r, r, 0);
        InverseEstimate<T> estimate = new InverseEstimate<>(ar, chart, !reality, jac, r, at.errors, z, at.state);
        List<Estimate<T>> residuals = new ArrayList<>();
        for (int i = 0; i < r.size(); i++) {
            residuals.add(new Estimate<>(r.get(i), at.errors.get(i)));
        }
        LaxMatrix<T> lax = LaxMatrix.of(ar, order, x, times, s, m, at.state, estimate.stateErrors(), topArgument);
        return new MonodromySolution<>(lax, at.data, residuals, iterations, stages, estimate.freeDirections());
    }

}
