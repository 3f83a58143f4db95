package org.tertius.cli;

import org.apache.commons.cli.Options;
import org.hipparchus.complex.Complex;

/** Start data w(z0) = w0, w'(z0) = dw0 (z0 on the principal sheet). */
public final class StartOptions implements OptionGroup {
    String z0;
    String w0;
    String dw0;
    String d3w0;

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--z0", "Z", "start point z0 != 0 (principal sheet)"));
        o.addOption(OptionKinds.value("--w0", "W", "w(z0)"));
        o.addOption(OptionKinds.value("--dw0", "DW", "w'(z0)"));
        o.addOption(OptionKinds.value("--d3w0", "D3W", "w'''(z0), needed only when w0 = 0 (a solution through a zero of w)"));
    }

    @Override
    public void read(Arguments a) {
        z0 = a.text("--z0");
        w0 = a.text("--w0");
        dw0 = a.text("--dw0");
        d3w0 = a.text("--d3w0");
    }

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
