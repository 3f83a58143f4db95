package org.tertius.cli;

import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.piii.Painleve3;
import picocli.CommandLine.Option;

/** The four parameters of Painleve III (complex numbers a+bi or rationals p/q). */
public final class EquationOptions {
    @Option(names = "--alpha", paramLabel = "A", description = "alpha (complex a+bi or p/q)")
    String alpha;
    @Option(names = "--beta", paramLabel = "B", description = "beta")
    String beta;
    @Option(names = "--gamma", paramLabel = "G", description = "gamma")
    String gamma;
    @Option(names = "--delta", paramLabel = "D", description = "delta")
    String delta;

    /** Fills unset options from a problem file. */
    void defaults(ProblemFile p) {
        alpha = p.fill(alpha, "alpha");
        beta = p.fill(beta, "beta");
        gamma = p.fill(gamma, "gamma");
        delta = p.fill(delta, "delta");
    }

    Painleve3 equation() {
        return Painleve3.of(value("--alpha", alpha), value("--beta", beta), value("--gamma", gamma),
                value("--delta", delta));
    }

    /** The raw texts (for exact high-precision parsing). */
    String[] texts() {
        return new String[] {alpha, beta, gamma, delta};
    }

    static Complex value(String name, String text) {
        if (text == null) {
            throw new InvalidInputException(name, "is required (give it as an option or in the --problem file)");
        }
        return ComplexText.parse(name, text);
    }
}
