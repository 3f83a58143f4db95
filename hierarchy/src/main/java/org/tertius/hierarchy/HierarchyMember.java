package org.tertius.hierarchy;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import org.hipparchus.complex.Complex;
import org.hipparchus.fraction.BigFraction;
import org.tertius.core.InvalidInputException;
import org.tertius.core.equation.IndependentVariable;
import org.tertius.core.equation.PolynomialSystem;
import org.tertius.core.number.Arithmetic;
import org.tertius.core.number.ExactNumber;
import org.tertius.hierarchy.algebra.Evaluation;
import org.tertius.hierarchy.algebra.GaussianRational;
import org.tertius.hierarchy.algebra.Polynomial;

/**
 * Member n of the Painleve III hierarchy as a first-order polynomial system, generated from the Lax pair
 * (the convention is documented in hierarchy/README.md). The unknowns are the entries
 * {@code a(k)11, a(k)12, a(k)21} of the traceless coefficients a_k of A(lambda), k = -2 .. n-2; then
 * {@code q = a(n-2)12 / (n t_n)} and {@code r = a(n-2)21 / (n t_n)} (t_1 = x).
 *
 * <p>Member 1 is integrated in the log variable (x = 0 is a fixed singular point, and its solutions are
 * multivalued around it); members n &gt;= 2 are integrated in x itself. Immutable.
 */
public final class HierarchyMember {
    /** Largest member generated. */
    public static final int MAX_ORDER = 8;

    private final MemberEquations equations;

    private HierarchyMember(int n) {
        this.equations = new MemberEquations(n);
    }

    /** Member n, 1 &lt;= n &lt;= {@link #MAX_ORDER}. */
    public static HierarchyMember of(int n) {
        checkOrder(n);
        return new HierarchyMember(n);
    }

    static void checkOrder(int n) {
        if (n < 1 || n > MAX_ORDER) {
            throw new InvalidInputException("member", "must be in [1, " + MAX_ORDER + "], got " + n);
        }
    }

    public int order() {
        return equations.order();
    }

    /** Number of unknowns, 3(n + 1). */
    public int dimension() {
        return equations.unknownCount();
    }

    /** Names of the unknowns, in state order. */
    public List<String> unknowns() {
        return equations.names().subList(0, dimension());
    }

    MemberEquations equations() {
        return equations;
    }

    /** How the integration variable relates to x: LOG for member 1, PLAIN otherwise. */
    public IndependentVariable variable() {
        return order() == 1 ? IndependentVariable.LOG : IndependentVariable.PLAIN;
    }

    /** The x-flow as a core system with the given constants (member 1: {@code x d/dx}; else d/dx). */
    public PolynomialSystem xFlow(MemberParameters p) {
        requireSame(p);
        return SystemAssembler.assemble(equations, equations.xFlow(), variable(), equations.timeIndex(1),
                p.ringValues(Complex.ZERO));
    }

    /** The flow d/dt_n at fixed x as a core system in the variable t_n (members n &gt;= 2). */
    public PolynomialSystem timeFlow(MemberParameters p, Complex x) {
        requireSame(p);
        if (order() < 2) {
            throw new InvalidInputException("member", "member 1 has no time besides x; the t-flow exists for n >= 2");
        }
        return SystemAssembler.assemble(equations, equations.tFlow(), IndependentVariable.PLAIN,
                equations.timeIndex(order()), p.ringValues(x));
    }

    /**
     * Completes a start state: the diagonal entries a(k)11, k = -1 .. n-2, are fixed by x, the times and m
     * through the top coefficients of det A (see {@link MemberEquations#constraints()}); they are computed
     * here from the other entries, whose given values are kept. The entries a(k)11 of the input are ignored
     * for k &gt;= -1.
     *
     * @param state all 3(n+1) unknowns in the order of {@link #unknowns()}
     */
    public List<Complex> completeDiagonal(MemberParameters p, Complex x, List<Complex> state) {
        requireSame(p);
        checkState(state);
        List<Complex> values = new ArrayList<>(state);
        values.addAll(p.ringValues(x));
        return completeDiagonal(values, Evaluation.COMPLEX);
    }

    /**
     * As {@link #completeDiagonal(MemberParameters, Complex, List)} in exact arithmetic, from exact data (the times
     * and m as given exactly to the parameters): the completed state is exact too, so that the solution started from
     * it can be computed to any number of digits.
     */
    public List<ExactNumber> completeDiagonalExactly(MemberParameters p, ExactNumber x, List<ExactNumber> state) {
        requireSame(p);
        if (state == null || state.size() != dimension()) {
            throw new InvalidInputException("start state", "member " + order() + " has " + dimension()
                    + " unknowns " + unknowns() + ", got " + (state == null ? "none" : state.size() + " values"));
        }
        List<GaussianRational> values = new ArrayList<>();
        for (ExactNumber v : state) {
            values.add(exact(v));
        }
        values.add(exact(x));
        for (ExactNumber v : p.exactTimesAndM()) {
            values.add(exact(v));
        }
        List<ExactNumber> out = new ArrayList<>();
        for (GaussianRational v : completeDiagonal(values, Evaluation.EXACT)) {
            out.add(ExactNumber.ofComplexRational(v.re().getNumerator(), v.re().getDenominator(),
                    v.im().getNumerator(), v.im().getDenominator()));
        }
        return out;
    }

    private static GaussianRational exact(ExactNumber v) {
        return GaussianRational.of(new BigFraction(v.realNumerator(), v.realDenominator()),
                new BigFraction(v.imaginaryNumerator(), v.imaginaryDenominator()));
    }

    /** The diagonal entries solved from the constraints, each linear in its entry; values hold the whole ring. */
    private <T> List<T> completeDiagonal(List<T> values, Evaluation<T> in) {
        Arithmetic<T> ar = in.arithmetic();
        int n = order();
        for (Map.Entry<Integer, Polynomial> c : equations.constraints().entrySet()) {
            int slot = MemberEquations.index(c.getKey() - n + 1, 0);
            values.set(slot, ar.zero());
            T c0 = c.getValue().evaluate(in, values);
            values.set(slot, ar.one());
            T c1 = c.getValue().evaluate(in, values);
            values.set(slot, ar.divide(ar.negate(c0), ar.subtract(c1, c0)));
        }
        return List.copyOf(values.subList(0, dimension()));
    }

    void checkState(List<Complex> state) {
        if (state == null || state.size() != dimension()) {
            throw new InvalidInputException("start state", "member " + order() + " has " + dimension()
                    + " unknowns " + unknowns() + ", got " + (state == null ? "none" : state.size() + " values"));
        }
        for (int i = 0; i < state.size(); i++) {
            Complex c = state.get(i);
            if (c == null || !Double.isFinite(c.getReal()) || !Double.isFinite(c.getImaginary())) {
                throw new InvalidInputException("start state " + unknowns().get(i), "must be a finite complex number, got "
                        + c);
            }
        }
    }

    private void requireSame(MemberParameters p) {
        if (p.order() != order()) {
            throw new InvalidInputException("parameters", "are for member " + p.order() + ", not member " + order());
        }
    }

    /**
     * The unknowns and equations as text (exact coefficients; x, t_j, m are the constants).
     */
    public String describe() {
        int n = order();
        List<String> names = equations.names();
        String nl = System.lineSeparator();
        StringBuilder sb = new StringBuilder();
        sb.append("Member ").append(n).append(" of the Painleve III hierarchy").append(nl);
        sb.append("Lax pair: Phi_x = (-i lambda sigma3 + [[0, q], [r, 0]]) Phi, Phi_lambda = A Phi,").append(nl);
        sb.append("  A = sum_{k=-2}^{").append(n - 1).append("} a_k lambda^k, a_k = [[a(k)11, a(k)12], [a(k)21, -a(k)11]],")
                .append(" a_").append(n - 1).append(" = -i ").append(n).append(" t_").append(n == 1 ? "1 (= x)" : n)
                .append(" sigma3").append(nl);
        sb.append("  theta = x lambda");
        for (int j = 2; j <= n; j++) {
            sb.append(" + t_").append(j).append(" lambda^").append(j);
        }
        sb.append(" + s / lambda").append(nl);
        sb.append("Unknowns (").append(dimension()).append("): ").append(String.join(", ", unknowns())).append(nl);
        sb.append("q = ").append(equations.q().format(names)).append(", r = ").append(equations.r().format(names))
                .append(nl);
        sb.append("Equations (").append(n == 1 ? "d/dx; integrated as x d/dx in log x" : "d/dx").append("):").append(nl);
        appendFlow(sb, equations.xFlow(), "d/dx ");
        sb.append("First integrals:").append(nl);
        sb.append("  det a_-2 = s^2:  ").append(equations.detA2().format(names)).append(nl);
        sb.append("  trace form tr(a_-2 a_-1) = const:  ").append(equations.traceForm().format(names)).append(nl);
        for (Map.Entry<Integer, Polynomial> c : equations.constraints().entrySet()) {
            sb.append("  [lambda^").append(c.getKey()).append("] (det A + mu^2) = 0, fixes a(")
                    .append(c.getKey() - n + 1).append(")11:  ").append(c.getValue().format(names)).append(nl);
        }
        sb.append("  (mu = -i theta_lambda + m / lambda + O(lambda^-2) is an eigenvalue of A at lambda = infinity)").append(nl);
        if (n >= 2) {
            sb.append("Flow in t_").append(n).append(" at fixed x:").append(nl);
            appendFlow(sb, equations.tFlow(), "d/dt_" + n + " ");
        }
        return sb.toString();
    }

    private void appendFlow(StringBuilder sb, List<Polynomial> rhs, String d) {
        for (int i = 0; i < rhs.size(); i++) {
            sb.append("  ").append(d).append(unknowns().get(i)).append(" = ").append(rhs.get(i).format(equations.names()))
                    .append(System.lineSeparator());
        }
    }
}
