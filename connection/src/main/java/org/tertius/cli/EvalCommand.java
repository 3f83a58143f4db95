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
    @Option(names = "--digits", paramLabel = "D", description = "compute to D significant digits (16..5000) in"
            + " arbitrary precision; start data and parameters are then read exactly (decimals or p/q)")
    Integer digits;
    @Mixin
    MemberOptions member = new MemberOptions();

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        PrintWriter err = spec.commandLine().getErr();
        ProblemFile f = solution.file();
        String targets = at != null ? at : f.get("at");
        List<SurfacePoint> points = Targets.list("--at", targets, solution.sheet(sheet));
        member.defaults(f);
        if (member.given()) {
            return members(points, out, err);
        }
        if (digits == null && f.has("digits")) {
            digits = f.intValue("digits");
        }
        if (digits != null) {
            try (Progress progress = new Progress("eval")) {
                org.tertius.core.piii.HighPrecisionSolution hp = HighPrecisionRows.solution(solution, digits, progress);
                out.println("# " + solution.equationValue() + ", " + digits + " digits; digits: estimated correct"
                        + " significant digits of w and w'");
                out.println(HighPrecisionRows.HEADER);
                for (SurfacePoint p : points) {
                    out.println(HighPrecisionRows.row(hp.evaluate(p)));
                }
            }
            out.flush();
            return 0;
        }
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

    private int members(List<SurfacePoint> points, PrintWriter out, PrintWriter err) {
        org.tertius.hierarchy.MemberSolution ms = member.solution(solution.solver.settings());
        out.println("# member " + ms.member().order() + " of the Painleve III hierarchy, " + ms.parameters()
                + "; err: largest estimated absolute error of q, r, q', r'; integrals: first integrals within their"
                + " estimates (ok) or drifting");
        out.println(MemberOptions.HEADER);
        int unreached = 0;
        for (SurfacePoint p : points) {
            try {
                org.tertius.hierarchy.MemberValue v = ms.evaluate(p);
                out.println(MemberOptions.row(v));
                if (v.warning() != null && !v.warning().isEmpty()) {
                    err.println("tertius: at " + p + ": " + v.warning());
                }
            } catch (TertiusException e) {
                unreached++;
                out.println(MemberOptions.unreachedRow(p));
                err.println("tertius: target " + p + " not reached: " + e.getMessage());
            }
        }
        out.flush();
        return unreached == 0 ? 0 : Main.EXIT_UNREACHED;
    }
}
