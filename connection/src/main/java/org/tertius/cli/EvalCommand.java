package org.tertius.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.concurrent.Callable;
import org.tertius.core.TertiusException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** Values of one solution at chosen points of the Riemann surface. */
@Command(name = "eval", mixinStandardHelpOptions = true,
        description = "Evaluate a solution at points of its Riemann surface; CSV with error estimates."
                + " err is the larger of the estimated absolute errors of w and w'.")
public final class EvalCommand implements Callable<Integer> {
    @Spec
    CommandSpec spec;
    @Mixin
    SolutionOptions solution = new SolutionOptions();
    @Option(names = "--at", paramLabel = "Z[,Z...]", description = "targets, complex numbers a+bi separated by commas")
    String at;
    @Option(names = "--sheet", paramLabel = "K", description = "sheet of the targets (argument in (-pi,pi] + 2 pi K)")
    Integer sheet;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        ProblemFile f = solution.file();
        String targets = at != null ? at : f.get("at");
        List<SurfacePoint> points = Targets.list("--at", targets, solution.sheet(sheet));
        Painleve3Solution s = solution.solution();
        ValueCsv.header(out, s.equation() + " [" + s.equation().type().describe() + "]",
                "integrated in the " + s.formDescription());
        int unreached = 0;
        for (SurfacePoint p : points) {
            try {
                out.println(ValueCsv.row(s.evaluate(p)));
            } catch (TertiusException e) {
                unreached++;
                out.println(ValueCsv.unreachedRow(p));
                err.println("tertius: target " + p + " not reached: " + e.getMessage());
            }
        }
        out.flush();
        return unreached == 0 ? 0 : Main.EXIT_UNREACHED;
    }
}
