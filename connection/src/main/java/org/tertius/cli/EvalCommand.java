package org.tertius.cli;

import java.io.PrintWriter;
import java.util.List;
import org.apache.commons.cli.Options;
import org.tertius.core.TertiusException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.HighPrecisionSolution;
import org.tertius.core.piii.Painleve3Solution;

/** Values of one solution at chosen points of the Riemann surface. */
public final class EvalCommand implements Command {
    /** What --digits accepts (the high-precision solver checks the range). */
    static final String DIGITS = "an integer in [" + HighPrecisionSolution.MIN_DIGITS + ", "
            + HighPrecisionSolution.MAX_DIGITS + "]";

    final SolutionOptions solution = new SolutionOptions();
    final MemberOptions member = new MemberOptions();
    String at;
    Integer sheet;
    Integer digits;

    @Override
    public String name() {
        return "eval";
    }

    @Override
    public String description() {
        return "Evaluate a solution at points of its Riemann surface; CSV with error estimates."
                + " err is the larger of the estimated absolute errors of w and w'.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solution, member);
    }

    @Override
    public void declare(Options o) {
        o.addOption(Opts.value("--at", "Z[,Z...]", "targets, complex numbers a+bi separated by commas"));
        o.addOption(Opts.value("--sheet", "K", "sheet of the targets (argument in (-pi,pi] + 2 pi K)"));
        o.addOption(Opts.value("--digits", "D", "compute to D significant digits (16..5000) in arbitrary precision;"
                + " start data and parameters are then read exactly (decimals or p/q)"));
    }

    @Override
    public void read(Arguments a) {
        at = a.text("--at");
        sheet = a.integer("--sheet", null);
        digits = a.integer("--digits", DIGITS);
    }

    @Override
    public int run(PrintWriter out, PrintWriter err) {
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
                HighPrecisionSolution hp = HighPrecisionRows.solution(solution, digits, progress);
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
