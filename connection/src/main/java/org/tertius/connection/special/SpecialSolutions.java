package org.tertius.connection.special;

import java.util.ArrayList;
import java.util.List;
import org.tertius.core.piii.Painleve3Type;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * Which special solutions exist for given parameters, and why: the rational solutions built from the special
 * polynomials (type D6, NIST DLMF §32.8(iii)), the Bessel-type solutions (D6, DLMF §32.10(iv)), the constant
 * solutions (any type), the z^(1/3) algebraic hierarchy (D7), and a note for the quadrature cases (DLMF
 * §32.2(ii)). Equalities are tested exactly on the Gaussian-rational parameters.
 */
public final class SpecialSolutions {
    private SpecialSolutions() {
    }

    /**
     * One kind of special solution and whether the parameters admit it.
     *
     * @param kind rational, bessel, constant, algebraic or quadrature
     * @param exists whether the parameters admit it
     * @param count the number of solutions listed (0 if none; for Bessel-type: the number of one-parameter
     *     families)
     * @param condition the condition tested, as a formula
     * @param explanation one line: what holds or which condition fails, with the numbers found
     */
    public record Finding(String kind, boolean exists, int count, String condition, String explanation) {
        @Override
        public String toString() {
            return kind + ": " + (exists ? "yes" : "no") + " - " + explanation;
        }
    }

    /** The findings for all kinds, in a fixed order. */
    public static List<Finding> classify(ExactParameters p) {
        List<Finding> out = new ArrayList<>();
        out.add(rational(p));
        out.add(bessel(p));
        out.add(constant(p));
        out.add(algebraic(p));
        if (p.type() == Painleve3Type.QUADRATURE) {
            out.add(new Finding("quadrature", true, 0, "alpha = gamma = 0 or beta = delta = 0",
                    "the equation is solvable by quadrature (DLMF 32.2(ii)); its solutions are classical and are not"
                            + " listed as families here"));
        }
        return out;
    }

    /** All findings as lines of text, the parameters first. */
    public static String report(ExactParameters p) {
        StringBuilder b = new StringBuilder("PIII(" + p + "), type " + p.type().describe());
        for (Finding f : classify(p)) {
            b.append('\n').append(f);
        }
        return b.toString();
    }

    private static Finding rational(ExactParameters p) {
        String condition = "type D6 and alpha/a + beta/c = 4n, n >= 1, for some a = +-sqrt(gamma), c = +-sqrt(-delta)"
                + " (DLMF 32.8(iii): alpha + epsilon beta = 4n when gamma = 1, delta = -1)";
        List<RationalSolution> all = RationalSolution.all(p);
        if (all.isEmpty()) {
            return new Finding("rational", false, 0, condition, RationalSolution.whyNot(p));
        }
        StringBuilder e = new StringBuilder();
        for (int k = 0; k < all.size(); k += 2) {
            RationalSolution s = all.get(k);
            if (e.length() > 0) {
                e.append("; ");
            }
            e.append("n = ").append(s.index()).append(", mu = ").append(s.mu()).append(" (").append(s.choice().text())
                    .append(", alpha/a + beta/c = ").append(s.choice().sum()).append("): W = S_").append(s.index())
                    .append("(mu-1) S_").append(s.index() - 1).append("(mu) / (S_").append(s.index()).append("(mu) S_")
                    .append(s.index() - 1).append("(mu-1)), degrees ").append(s.polynomials().get(0).degree())
                    .append("+").append(s.polynomials().get(1).degree()).append(" over ")
                    .append(s.polynomials().get(2).degree()).append("+").append(s.polynomials().get(3).degree())
                    .append(", members sigma = +1, -1 (W(z) and -W(-z) rescaled)");
        }
        return new Finding("rational", true, all.size(), condition, e.toString());
    }

    private static Finding bessel(ExactParameters p) {
        String condition = "type D6 and alpha/a + beta/c = 4n + 2, n >= 0, for some a = +-sqrt(gamma),"
                + " c = +-sqrt(-delta) (DLMF 32.10(iv): alpha + epsilon beta = 4n + 2 when gamma = 1, delta = -1)";
        List<RootChoice> families = BesselTypeSolution.families(p);
        if (families.isEmpty()) {
            return new Finding("bessel", false, 0, condition, BesselTypeSolution.whyNot(p));
        }
        StringBuilder e = new StringBuilder();
        for (RootChoice f : families) {
            if (e.length() > 0) {
                e.append("; ");
            }
            long n = (f.sum() - 2) / 4;
            BesselTypeSolution s = BesselTypeSolution.of(p, f, GaussianRational.ONE,
                    GaussianRational.ZERO);
            e.append(f.text()).append(": alpha/a + beta/c = ").append(f.sum()).append(", a one-parameter family")
                    .append(" (u = A U1 + B U2) of Bessel order nu = ").append(s.order())
                    .append(Conversions.isInteger(s.order()) ? " (integer: logarithmic second solution)" : "")
                    .append(n == 0 ? ", Riccati seed" : ", " + n + " Backlund step" + (n > 1 ? "s" : "")
                            + " from the seed");
        }
        return new Finding("bessel", true, families.size(), condition, e.toString());
    }

    private static Finding constant(ExactParameters p) {
        String condition = "alpha c^2 + beta = 0 and gamma c^4 + delta = 0 with c != 0";
        String why = ConstantSolution.whyNot(p);
        if (why != null) {
            return new Finding("constant", false, 0, condition, why);
        }
        List<ConstantSolution> all = ConstantSolution.all(p);
        return new Finding("constant", true, all.size(), condition, all.size() + " constants: "
                + (p.alpha().isZero() ? "c^4 = -delta/gamma = " + p.delta().negate().multiply(p.gamma().reciprocal())
                : "c^2 = -beta/alpha = " + p.beta().negate().multiply(p.alpha().reciprocal())));
    }

    private static Finding algebraic(ExactParameters p) {
        String condition = "type D7 with gamma = 0 and beta^2/(-4 delta) = k^2, or delta = 0 and alpha^2/(4 gamma)"
                + " = k^2, k a non-negative integer";
        String why = AlgebraicSolution.whyNot(p);
        if (why != null) {
            return new Finding("algebraic", false, 0, condition, why);
        }
        List<AlgebraicSolution> all = AlgebraicSolution.all(p);
        return new Finding("algebraic", true, all.size(), condition, "3 solutions (the cube roots of A): "
                + all.get(0).description());
    }
}
