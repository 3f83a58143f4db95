package org.tertius.connection.special;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.AnalyticArithmetic;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * A constant solution w = c != 0: with w' = w'' = 0 the equation reads (alpha c^2 + beta)/z + gamma c^3 + delta/c
 * = 0 for all z, i.e. alpha c^2 + beta = 0 and gamma c^4 + delta = 0 (direct substitution). So: if alpha != 0,
 * c = +-sqrt(-beta/alpha) when beta != 0 and gamma beta^2 + delta alpha^2 = 0; if alpha = 0, beta must vanish
 * and c^4 = -delta/gamma (four values) when gamma delta != 0; all parameters zero admit every constant (a
 * quadrature case, not listed). Immutable.
 */
public final class ConstantSolution extends ClosedFormSolution {
    private final ExactParameters parameters;
    /** c^2 (alpha != 0) or c^4 (alpha = 0), exactly. */
    private final GaussianRational power;
    private final boolean fourth;
    private final int index;

    private ConstantSolution(ExactParameters parameters, GaussianRational power, boolean fourth, int index) {
        this.parameters = parameters;
        this.power = power;
        this.fourth = fourth;
        this.index = index;
    }

    /** All constant solutions (empty if there are none, and when all parameters vanish). */
    public static List<ConstantSolution> all(ExactParameters p) {
        List<ConstantSolution> out = new ArrayList<>();
        if (whyNot(p) != null) {
            return out;
        }
        if (!p.alpha().isZero()) {
            GaussianRational c2 = p.beta().negate().multiply(p.alpha().reciprocal());
            out.add(new ConstantSolution(p, c2, false, 0));
            out.add(new ConstantSolution(p, c2, false, 1));
        } else {
            GaussianRational c4 = p.delta().negate().multiply(p.gamma().reciprocal());
            for (int k = 0; k < 4; k++) {
                out.add(new ConstantSolution(p, c4, true, k));
            }
        }
        return out;
    }

    /** The condition that fails, in words; null if constant solutions exist. */
    static String whyNot(ExactParameters p) {
        GaussianRational a = p.alpha();
        GaussianRational b = p.beta();
        if (!a.isZero()) {
            if (b.isZero()) {
                return "alpha c^2 + beta = 0 with beta = 0 forces c = 0";
            }
            GaussianRational test = p.gamma().multiply(b).multiply(b).add(p.delta().multiply(a).multiply(a));
            if (!test.isZero()) {
                return "c^2 = -beta/alpha = " + b.negate().multiply(a.reciprocal()) + " must satisfy gamma c^4 + delta"
                        + " = 0, i.e. gamma beta^2 + delta alpha^2 = 0, but it is " + test;
            }
            return null;
        }
        if (!b.isZero()) {
            return "alpha = 0 makes alpha c^2 + beta = 0 impossible unless beta = 0, got beta = " + b;
        }
        if (p.gamma().isZero() || p.delta().isZero()) {
            return p.gamma().isZero() && p.delta().isZero() ? "all parameters vanish: every constant solves the"
                    + " equation (solvable by quadrature; not listed)"
                    : "gamma c^4 + delta = 0 needs gamma and delta both non-zero or both zero";
        }
        return null;
    }

    /**
     * The constant solution number {@code index} (0, 1 for alpha != 0; 0..3 for alpha = 0).
     *
     * @throws InvalidInputException if there is none, saying which condition fails
     */
    public static ConstantSolution of(ExactParameters p, int index) {
        String why = whyNot(p);
        if (why != null) {
            throw new InvalidInputException("family", "no constant solution: " + why);
        }
        List<ConstantSolution> all = all(p);
        if (index < 0 || index >= all.size()) {
            throw new InvalidInputException("index", "must be in [0, " + (all.size() - 1) + "], got " + index);
        }
        return all.get(index);
    }

    @Override
    public ParameterSet parameters() {
        return ParameterSet.of(parameters);
    }

    @Override
    public String kind() {
        return "constant";
    }

    @Override
    public String description() {
        String root = fourth ? "i^" + index + " (" + power + ")^(1/4) (principal fourth root)"
                : (index == 0 ? "" : "-") + "sqrt(" + power + ") (principal root)";
        return "constant solution w = " + root + " of PIII(" + parameters + "): alpha c^2 + beta = 0, gamma c^4"
                + " + delta = 0";
    }

    @Override
    <T> Estimate<T> compute(AnalyticArithmetic<T> ar, T z, int sheet) {
        T c = ar.sqrt(Conversions.of(ar, power));
        if (fourth) {
            c = ar.sqrt(c);
            for (int k = 0; k < index; k++) {
                c = ar.multiply(c, ar.of(0, 1));
            }
        } else if (index == 1) {
            c = ar.negate(c);
        }
        double logErr = Math.log(8 * ar.epsilon()) + ar.logAbs(c);
        return new Estimate<>(c, ar.zero(), logErr, Double.NEGATIVE_INFINITY);
    }
}
