package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.List;
import org.hipparchus.complex.Complex;
import org.tertius.core.face.InvariantCheck;
import org.tertius.hierarchy.algebra.Polynomial;

/**
 * Evaluates the first integrals of a member solution at a state with error estimates: det a_-2 = s^2, the
 * trace form tr(a_-2 a_-1) = its start value, and the top coefficients of det A. Immutable.
 */
final class IntegralMonitor {
    private final List<String> names = new ArrayList<>();
    private final List<Linearized> functions = new ArrayList<>();
    private final List<Complex> expected = new ArrayList<>();

    IntegralMonitor(MemberEquations eq, Complex s, Complex traceIntegral) {
        add(eq, "det a_-2 = s^2", eq.detA2(), s.multiply(s));
        add(eq, "tr(a_-2 a_-1) = " + traceIntegral, eq.traceForm(), traceIntegral);
        eq.constraints().forEach((p, c) -> add(eq, "[lambda^" + p + "] det A = [lambda^" + p + "] (-mu^2)", c,
                Complex.ZERO));
    }

    private void add(MemberEquations eq, String name, Polynomial f, Complex value) {
        names.add(name);
        functions.add(new Linearized(f, eq.unknownCount()));
        expected.add(value);
    }

    /** What is checked, in the order of the checks. */
    List<String> names() {
        return List.copyOf(names);
    }

    /** The checks at a point: values of all ring variables (state, x, times, m) and errors of the unknowns. */
    List<InvariantCheck> check(List<Complex> values, double[] err) {
        List<InvariantCheck> out = new ArrayList<>();
        for (int k = 0; k < functions.size(); k++) {
            Linearized f = functions.get(k);
            out.add(new InvariantCheck(names.get(k), f.value(values), expected.get(k), f.bound(values, err)));
        }
        return out;
    }
}
