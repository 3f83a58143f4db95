package org.tertius.cli;

import java.nio.file.Path;
import java.util.List;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.core.piii.Painleve3;
import org.tertius.core.piii.Painleve3Solution;

/** Everything that fixes one solution: equation, start data (or a problem file), solver settings. */
public final class SolutionOptions implements OptionGroup {
    Path problem;
    final EquationOptions equation = new EquationOptions();
    final StartOptions start = new StartOptions();
    final SolverOptions solver = new SolverOptions();
    final FamilyOptions family = new FamilyOptions();
    private final List<OptionGroup> parts = List.of(equation, start, solver, family);

    private ProblemFile file;

    @Override
    public void declare(Options o) {
        o.addOption(Opts.value("--problem", "FILE", "problem file (key = value lines); options win"));
        for (OptionGroup g : parts) {
            g.declare(o);
        }
    }

    @Override
    public void read(Arguments a) {
        problem = a.path("--problem");
        for (OptionGroup g : parts) {
            g.read(a);
        }
    }

    /** The problem file (read once). */
    ProblemFile file() {
        if (file == null) {
            file = ProblemFile.read(problem);
            equation.defaults(file);
            start.defaults(file);
            solver.defaults(file);
            family.defaults(file);
        }
        return file;
    }

    Painleve3 equationValue() {
        file();
        return equation.equation();
    }

    Painleve3Solution solution() {
        file();
        Painleve3 eq = equation.equation();
        if (family.given()) {
            if (start.given()) {
                throw new InvalidInputException("--family", "give either --family with its parameters or start data"
                        + " --z0 --w0 --dw0, not both");
            }
            return family.solution(eq, solver.settings());
        }
        if (!start.given()) {
            throw new InvalidInputException("--z0", "start data are required: give --z0, --w0 and --dw0"
                    + " (or a --problem file with z0, w0, dw0)");
        }
        return Painleve3Solution.builder(eq).start(start.z0(), start.w0(), start.dw0())
                .thirdDerivativeAtZero(start.d3w0()).settings(solver.settings()).build();
    }

    /** A canonical one-line description of the problem (for table signatures). */
    String describe() {
        file();
        String[] eq = equation.texts();
        return "alpha=" + eq[0] + " beta=" + eq[1] + " gamma=" + eq[2] + " delta=" + eq[3]
                + (family.given() ? " family=" + family.describe() : "") + " z0=" + start.z0
                + " w0=" + start.w0 + " dw0=" + start.dw0 + (start.d3w0 == null ? "" : " d3w0=" + start.d3w0)
                + " tol=" + solver.settings().tolerance() + " order=" + solver.settings().order();
    }

    /** --sheet from the option or the problem file (default 0). */
    int sheet(Integer option) {
        if (option != null) {
            return option;
        }
        ProblemFile f = file();
        return f.has("sheet") ? f.intValue("sheet") : 0;
    }
}
