package org.tertius.hierarchy.monodromy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.core.step.SolverSettings;
import org.tertius.hierarchy.MemberParameters;
import org.tertius.hierarchy.MemberSolution;

/**
 * The result of {@link InverseMonodromy}: the member state at the chosen point with its error estimate, its
 * monodromy data, the final residuals of the conditions (with the error estimates of their quantities) and the work
 * done. {@link #solution} builds the member solution from it. Immutable.
 *
 * @param <T> number type
 */
public final class MonodromySolution<T> {
    private final LaxMatrix<T> lax;
    private final MonodromyData<T> data;
    private final List<Estimate<T>> residuals;
    private final int iterations;
    private final int stages;
    private final int free;

    MonodromySolution(LaxMatrix<T> lax, MonodromyData<T> data, List<Estimate<T>> residuals, int iterations,
                      int stages, int free) {
        this.free = free;
        this.lax = lax;
        this.data = data;
        this.residuals = List.copyOf(residuals);
        this.iterations = iterations;
        this.stages = stages;
    }

    /** The state at the point, in the order of HierarchyMember.unknowns(). */
    public List<T> state() {
        return lax.state();
    }

    /** Estimated absolute error of state entry i. */
    public double stateError(int i) {
        return lax.stateError(i);
    }

    /** The lambda-equation at the point (state with its error estimates). */
    public LaxMatrix<T> laxMatrix() {
        return lax;
    }

    /** The monodromy data of the state found. */
    public MonodromyData<T> data() {
        return data;
    }

    /** The residuals of the conditions (real and imaginary parts separately under the reality symmetry). */
    public List<Estimate<T>> residuals() {
        return residuals;
    }

    /**
     * Real directions of the state space that the conditions leave free at the solution (numerical rank deficiency
     * of the Jacobian): 0 for a locally unique state; 1 for the gauge phase under the reality symmetry with
     * gauge-free conditions, 2 for the complex gauge without it. The state is then one representative.
     */
    public int freeDirections() {
        return free;
    }

    /** Levenberg-Marquardt iterations, over all homotopy stages. */
    public int iterations() {
        return iterations;
    }

    /** Homotopy stages taken (1 when the first guess was close enough). */
    public int stages() {
        return stages;
    }

    /** The member constants in double precision. */
    public MemberParameters parameters() {
        AnalyticArithmetic<T> ar = lax.arithmetic();
        List<Complex> t = new ArrayList<>();
        for (T time : lax.times()) {
            t.add(ar.toComplex(time));
        }
        return MemberParameters.builder(lax.order()).times(t.toArray(new Complex[0])).s(ar.toComplex(lax.s()))
                .m(ar.toComplex(lax.m())).build();
    }

    /**
     * The member solution started from this state (double precision) with its error estimate (carried into the
     * error estimates of the values), at x on the sheet given by the argument of x for member 1.
     */
    public MemberSolution solution(SolverSettings settings) {
        AnalyticArithmetic<T> ar = lax.arithmetic();
        Complex x = ar.toComplex(lax.x());
        int sheet = lax.order() == 1 ? (int) Math.round((lax.topArgument() - x.getArgument()) / (2 * Math.PI)) : 0;
        List<Complex> state = new ArrayList<>();
        double[] errors = new double[lax.state().size()];
        for (int i = 0; i < errors.length; i++) {
            Complex v = ar.toComplex(lax.state().get(i));
            state.add(v);
            // the rounding to double when the state was found in more digits
            errors[i] = lax.stateError(i) + (ar.epsilon() < 1e-16 ? Math.ulp(v.norm()) : 0);
        }
        return MemberSolution.builder(parameters()).settings(settings).start(x, sheet, state).startErrors(errors)
                .build();
    }
}
