package org.tertius.cli;

import java.util.ArrayList;
import java.util.List;
import org.apache.commons.cli.Options;
import org.hipparchus.fraction.BigFraction;
import org.tertius.connection.special.AlgebraicSolution;
import org.tertius.connection.special.BacklundChain;
import org.tertius.connection.special.BacklundImage;
import org.tertius.connection.special.BesselTypeSolution;
import org.tertius.connection.special.ConstantSolution;
import org.tertius.connection.special.ExactParameters;
import org.tertius.connection.special.PointwiseSolution;
import org.tertius.connection.special.RationalSolution;
import org.tertius.connection.special.RootChoice;
import org.tertius.connection.special.SpecialFace;
import org.tertius.connection.special.SpecialSolution;
import org.tertius.core.InvalidInputException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.ExactNumber;
import org.tertius.hierarchy.algebra.GaussianRational;

/**
 * Special solutions as solutions of their own ({@code --special rational|bessel|constant|algebraic} with
 * {@code --special-index} and, for Bessel-type ones, {@code --bessel-coefficients}), and Backlund chains applied to
 * any Painleve III solution ({@code --backlund}). What the options build is remembered, so that commands reach its
 * N-digit evaluation and its parameter bookkeeping.
 */
public final class SpecialOptions implements OptionGroup {
    /** The kinds accepted by --special. */
    static final String[] KINDS = {"rational", "bessel", "constant", "algebraic"};

    String kind;
    Integer index;
    String besselCoefficients;
    String backlund;
    private PointwiseSolution built;

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--special", "KIND", "a special solution of the equation given by --alpha .."
                + " --delta: rational (special polynomials, DLMF 32.8), bessel (Riccati type, DLMF 32.10), constant,"
                + " algebraic (z^(1/3) type); 'tertius special' lists those that exist"));
        o.addOption(OptionKinds.value("--special-index", "K", "which one of the solutions of that kind (0, 1, ..; in"
                + " the order 'tertius special' lists them; default 0)"));
        o.addOption(OptionKinds.value("--bessel-coefficients", "A,B", "bessel: u = A U1 + B U2 (exact numbers, not"
                + " both 0; default 1,0), w = -u'/(a u)"));
        o.addOption(OptionKinds.value("--backlund", "STEPS", "apply Backlund transformations (DLMF 32.7) to the"
                + " solution, left to right, separated by spaces or ';': T1..T4 (DLMF 32.7.11-14), T5, T6 (32.7.16-17),"
                + " T7'(+a), T7'(-a), S1 or -w, S2 or 1/w, T(+a,-c) with any signs; the parameters reached are"
                + " printed"));
    }

    @Override
    public void read(Arguments a) {
        kind = a.text("--special") == null ? null : a.choice("--special", KINDS);
        index = a.integer("--special-index", "an integer >= 0");
        besselCoefficients = a.text("--bessel-coefficients");
        backlund = a.text("--backlund");
    }

    /** Fills unset options from a problem file (keys special, special-index, bessel-coefficients, backlund). */
    void defaults(ProblemFile f) {
        if (kind == null && f.has("special")) {
            String k = f.get("special");
            if (!List.of(KINDS).contains(k)) {
                throw new InvalidInputException("--problem", "special = " + k + ": must be " + String.join(" or ",
                        KINDS));
            }
            kind = k;
        }
        if (index == null && f.has("special-index")) {
            index = f.intValue("special-index");
        }
        besselCoefficients = f.fill(besselCoefficients, "bessel-coefficients");
        backlund = f.fill(backlund, "backlund");
    }

    /** Whether a special solution was asked for. */
    boolean given() {
        return kind != null;
    }

    /** The options of this group that were given. */
    List<String> optionsGiven() {
        List<String> out = new ArrayList<>();
        String[] names = {"--special", "--special-index", "--bessel-coefficients", "--backlund"};
        Object[] values = {kind, index, besselCoefficients, backlund};
        for (int i = 0; i < names.length; i++) {
            if (values[i] != null) {
                out.add(names[i]);
            }
        }
        return out;
    }

    /** The options that need --special, given without it. */
    List<String> parametersGiven() {
        List<String> out = new ArrayList<>();
        if (index != null) {
            out.add("--special-index");
        }
        if (besselCoefficients != null) {
            out.add("--bessel-coefficients");
        }
        return out;
    }

    /** The special solution asked for (Backlund-transformed when --backlund is given), for these parameters. */
    ComputedSolution solution(String[] equation) {
        ExactParameters p = parameters(equation);
        if (besselCoefficients != null && !"bessel".equals(kind)) {
            throw new InvalidInputException("--bessel-coefficients", "applies to --special bessel only, not to --special "
                    + kind);
        }
        int k = index == null ? 0 : index;
        if (k < 0) {
            throw new InvalidInputException("--special-index", "must be >= 0, got " + k);
        }
        try {
            SpecialSolution s = special(p, k);
            built = backlund == null ? SpecialFace.of(s) : SpecialFace.of(s, chain());
        } catch (InvalidInputException e) {
            throw renamed(e);
        }
        return built;
    }

    /** A library refusal with its argument replaced by the option that sets it. */
    private static InvalidInputException renamed(InvalidInputException e) {
        String option;
        switch (e.argument()) {
            case "family":
                option = "--special";
                break;
            case "index":
            case "root":
                option = "--special-index";
                break;
            case "A":
                option = "--bessel-coefficients";
                break;
            case "backlund":
            case "transformation":
                option = "--backlund";
                break;
            default:
                return e;
        }
        return e.renamed(option);
    }

    private SpecialSolution special(ExactParameters p, int k) {
        switch (kind) {
            case "rational":
                return RationalSolution.of(p, k);
            case "constant":
                return ConstantSolution.of(p, k);
            case "algebraic":
                return AlgebraicSolution.of(p, k);
            default:
                List<RootChoice> families = BesselTypeSolution.families(p);
                if (families.isEmpty()) {
                    // the library's message names the failing condition
                    BesselTypeSolution.of(p, GaussianRational.ONE, GaussianRational.ZERO);
                }
                if (k >= families.size()) {
                    throw new InvalidInputException("--special-index", "must be in [0, " + (families.size() - 1)
                            + "] (the Bessel-type families of these parameters), got " + k);
                }
                GaussianRational[] ab = coefficients();
                return BesselTypeSolution.of(p, families.get(k), ab[0], ab[1]);
        }
    }

    private GaussianRational[] coefficients() {
        if (besselCoefficients == null) {
            return new GaussianRational[] {GaussianRational.ONE, GaussianRational.ZERO};
        }
        String[] parts = besselCoefficients.split(",");
        if (parts.length != 2) {
            throw new InvalidInputException("--bessel-coefficients", "give two exact numbers A,B (decimals, p/q or"
                    + " a+bi), got '" + besselCoefficients + "'");
        }
        return new GaussianRational[] {exact(parts[0].trim()), exact(parts[1].trim())};
    }

    private static GaussianRational exact(String text) {
        ExactNumber x = ExactNumber.parse("--bessel-coefficients", text);
        return GaussianRational.of(new BigFraction(x.realNumerator(), x.realDenominator()),
                new BigFraction(x.imaginaryNumerator(), x.imaginaryDenominator()));
    }

    private BacklundChain chain() {
        return BacklundChain.parse(backlund);
    }

    /** The solution with the Backlund chain of --backlund applied (the solution itself without it). */
    ComputedSolution transform(ComputedSolution base, String[] equation) {
        if (backlund == null) {
            return base;
        }
        try {
            built = BacklundImage.of(base, parameters(equation), chain());
        } catch (InvalidInputException e) {
            throw renamed(e);
        }
        return built;
    }

    /** The parameters from the texts of --alpha .. --delta, exactly. */
    static ExactParameters parameters(String[] texts) {
        String[] names = {"--alpha", "--beta", "--gamma", "--delta"};
        ExactNumber[] p = new ExactNumber[4];
        for (int i = 0; i < 4; i++) {
            p[i] = ExactText.parse(names[i], texts[i]);
        }
        return ExactParameters.of(p[0], p[1], p[2], p[3]);
    }

    /** The options of this group in one line (for table signatures); empty when none is given. */
    String describe() {
        return (kind == null ? "" : " special=" + kind + " special-index=" + index + " bessel-coefficients="
                + besselCoefficients) + (backlund == null ? "" : " backlund=" + backlund);
    }

    /** The pointwise solution built by the last call of {@link #solution} or {@link #transform}, or null. */
    PointwiseSolution built() {
        return built;
    }
}
