package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.hierarchy.algebra.Polynomial;

/**
 * q, r, dq/dx, dr/dx and the first integrals of one member solution from its state at a point, with first-order
 * error bounds (as {@link MemberSolution#evaluate} reports them). Immutable.
 */
final class StateObservables {
    private final MemberParameters parameters;
    private final Linearized[] observables;
    private final IntegralMonitor monitor;

    /** For the solution through {@code start} at x0 (which fixes the trace integral). */
    StateObservables(HierarchyMember member, MemberParameters parameters, Complex x0, List<Complex> start) {
        MemberEquations eq = member.equations();
        this.parameters = parameters;
        int u = eq.unknownCount();
        List<Polynomial> xf = eq.xFlow();
        int xi = eq.timeIndex(1);
        this.observables = new Linearized[] {new Linearized(eq.q(), u), new Linearized(eq.r(), u),
            new Linearized(eq.q().derivativeAlong(xf, xi), u), new Linearized(eq.r().derivativeAlong(xf, xi), u)};
        Complex trace = new Linearized(eq.traceForm(), u).value(values(start, x0));
        this.monitor = new IntegralMonitor(eq, parameters.s(), trace);
    }

    private List<Complex> values(List<Complex> state, Complex x) {
        List<Complex> v = new ArrayList<>(state);
        v.addAll(parameters.ringValues(x));
        return v;
    }

    MemberValue value(Complex x, List<Complex> state, double[] err) {
        List<Complex> v = values(state, x);
        Complex[] qr = new Complex[4];
        double[] qrErr = new double[4];
        for (int k = 0; k < 4; k++) {
            qr[k] = observables[k].value(v);
            qrErr[k] = observables[k].bound(v, err);
        }
        return new MemberValue(x, 0, state, err, qr, qrErr, monitor.check(v, err));
    }
}
