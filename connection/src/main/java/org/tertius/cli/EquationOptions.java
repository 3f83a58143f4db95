package org.tertius.cli;

import org.apache.commons.cli.Options;
import org.hipparchus.complex.Complex;
import org.tertius.core.InvalidInputException;
import org.tertius.core.number.ComplexText;
import org.tertius.core.piii.Painleve3;

/** The four parameters of Painleve III (complex numbers a+bi or rationals p/q). */
public final class EquationOptions implements OptionGroup {
    String alpha;
    String beta;
    String gamma;
    String delta;

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--alpha", "A", "alpha (complex a+bi or p/q)"));
        o.addOption(OptionKinds.value("--beta", "B", "beta"));
        o.addOption(OptionKinds.value("--gamma", "G", "gamma"));
        o.addOption(OptionKinds.value("--delta", "D", "delta"));
    }

    @Override
    public void read(Arguments a) {
        alpha = a.text("--alpha");
        beta = a.text("--beta");
        gamma = a.text("--gamma");
        delta = a.text("--delta");
    }

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
