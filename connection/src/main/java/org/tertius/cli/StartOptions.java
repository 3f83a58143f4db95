package org.tertius.cli;

import org.hipparchus.complex.Complex;
import picocli.CommandLine.Option;

/** Start data w(z0) = w0, w'(z0) = dw0 (z0 on the principal sheet). */
public final class StartOptions {
    @Option(names = "--z0", paramLabel = "Z", description = "start point z0 != 0 (principal sheet)")
    String z0;
    @Option(names = "--w0", paramLabel = "W", description = "w(z0)")
    String w0;
    @Option(names = "--dw0", paramLabel = "DW", description = "w'(z0)")
    String dw0;
    @Option(names = "--d3w0", paramLabel = "D3W",
            description = "w'''(z0), needed only when w0 = 0 (a solution through a zero of w)")
    String d3w0;

    void defaults(ProblemFile p) {
        z0 = p.fill(z0, "z0");
        w0 = p.fill(w0, "w0");
        dw0 = p.fill(dw0, "dw0");
        d3w0 = p.fill(d3w0, "d3w0");
    }

    boolean given() {
        return z0 != null || w0 != null || dw0 != null;
    }

    Complex z0() {
        return EquationOptions.value("--z0", z0);
    }

    Complex w0() {
        return EquationOptions.value("--w0", w0);
    }

    Complex dw0() {
        return EquationOptions.value("--dw0", dw0);
    }

    Complex d3w0() {
        return d3w0 == null ? null : EquationOptions.value("--d3w0", d3w0);
    }
}
