package org.tertius.cli;

import java.io.PrintWriter;
import java.util.List;
import org.apache.commons.cli.Options;
import org.tertius.connection.special.ExactParameters;
import org.tertius.connection.special.SpecialSolutions;

/** Which special solutions exist for given parameters, and under which conditions. */
public final class SpecialCommand implements Command {
    final EquationOptions equation = new EquationOptions();

    @Override
    public String name() {
        return "special";
    }

    @Override
    public String description() {
        return "List the special solutions of Painleve III for the parameters --alpha .. --delta (exact: decimals,"
                + " p/q, a+bi): rational (DLMF 32.8), Bessel-type (DLMF 32.10), constant and algebraic ones, each with"
                + " the condition tested and what holds or fails; the indices to pass to --special-index.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(equation);
    }

    @Override
    public void declare(Options o) {
        // the four parameters are the whole input
    }

    @Override
    public void read(Arguments a) {
        // nothing beyond the parameters
    }

    @Override
    public int run(PrintWriter out, PrintWriter err) {
        ExactParameters p = SpecialOptions.parameters(equation.texts());
        out.println("PIII(" + p + "), type " + p.type().describe());
        for (SpecialSolutions.Finding f : SpecialSolutions.classify(p)) {
            out.println(f.kind() + ": " + (f.exists() ? "yes" : "no"));
            out.println("  condition: " + f.condition());
            out.println("  " + (f.exists() ? "found: " : "fails: ") + f.explanation());
            if (f.exists() && f.count() > 0 && !"quadrature".equals(f.kind())) {
                out.println("  use: --special " + f.kind() + " --special-index K, K in [0, " + (f.count() - 1) + "]");
            }
        }
        out.flush();
        return 0;
    }
}
