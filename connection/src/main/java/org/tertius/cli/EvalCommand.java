package org.tertius.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.function.Function;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.face.SolutionValue;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;
import org.tertius.hierarchy.MemberSolution;
import org.tertius.hierarchy.OriginSolution;

/** Values of one solution (Painleve III, a family, a hierarchy member) at chosen points of its surface. */
public final class EvalCommand implements Command {
    final SolutionOptions solution = new SolutionOptions();
    final MemberChecks checks = new MemberChecks();
    final DigitsOption precision = new DigitsOption("compute to D significant digits (16..5000) in arbitrary"
            + " precision; data and targets are then read exactly (decimals or p/q)");
    String at;
    Integer sheet;
    String format;

    @Override
    public String name() {
        return "eval";
    }

    @Override
    public String description() {
        return "Evaluate a solution at points of its Riemann surface (or plane); CSV (or JSON) with error estimates."
                + " err is the largest of the estimated absolute errors of the values.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solution, precision, checks);
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--at", "Z[,Z...]", "targets, complex numbers a+bi separated by commas"));
        o.addOption(OptionKinds.value("--sheet", "K", "sheet of the targets (argument in (-pi,pi] + 2 pi K)"));
        o.addOption(OptionKinds.value("--format", "csv|json", "csv (default), or json: one object with the comments,"
                + " the columns and a record per point, numbers with the digits of the CSV"));
    }

    @Override
    public void read(Arguments a) {
        at = a.text("--at");
        sheet = a.integer("--sheet", null);
        format = a.choice("--format", "csv", "json");
    }

    /** Where the lines go: printed at once (CSV), or collected and printed as one JSON object at the end. */
    private static final class Output {
        private final PrintWriter out;
        private final JsonValueRows json;

        Output(PrintWriter out, boolean json) {
            this.out = out;
            this.json = json ? new JsonValueRows() : null;
        }

        void comment(String c) {
            if (json == null) {
                out.println("# " + c);
            } else {
                json.comment(c);
            }
        }

        void columns(String header) {
            if (json == null) {
                out.println(header);
            } else {
                json.columns(header);
            }
        }

        void row(String row) {
            if (json == null) {
                out.println(row);
            } else {
                json.row(row);
            }
        }

        void finish() {
            if (json != null) {
                out.println(json.text());
            }
            out.flush();
        }
    }

    @Override
    public int run(PrintWriter out, PrintWriter err) {
        ProblemFile f = solution.file();
        solution.monodromy.refuseDigits(precision.given(f));
        String targets = at != null ? at : f.get("at");
        int k = solution.sheet(sheet);
        checks.check(solution);
        MemberSolution member = solution.isMember() ? solution.memberSolution() : null;
        ComputedSolution s = member != null ? member : solution.solution();
        ValueRows rows = new ValueRows(s);
        Output output = new Output(out, "json".equals(format));
        if (precision.given(f)) {
            if (checks.given()) {
                throw new InvalidInputException("--digits", "the checks of members run in double precision; drop"
                        + " --integrals, --nls-residual and --painleve3 with --digits");
            }
            List<ExactPoint> points = Targets.exactList("--at", targets, k, s.coordinate());
            WorkLimits.checkPrecise("--at", points, precision.digits);
            try (Progress progress = new Progress("eval")) {
                Function<ExactPoint, String> row = precision.rows(s, solution.special.built(), rows, progress);
                for (String c : solution.withNotes(precision.comments(rows, solution.special.built()))) {
                    output.comment(c);
                }
                output.columns(rows.preciseColumns());
                for (ExactPoint p : points) {
                    output.row(row.apply(p));
                }
            }
            output.finish();
            return 0;
        }
        List<SurfacePoint> points = Targets.list("--at", targets, k, s.coordinate());
        OriginSolution plane = member == null ? null : solution.memberPlane();
        for (String c : solution.withNotes(rows.comments())) {
            output.comment(c);
        }
        if (member != null) {
            for (String c : checks.comments(member)) {
                output.comment(c);
            }
        }
        output.columns(rows.columns() + (member == null ? "" : checks.columns(member)));
        int unreached = 0;
        int drifting = 0;
        for (SurfacePoint p : points) {
            try {
                SolutionValue v = s.valueAt(p);
                output.row(rows.row(v) + (member == null ? "" : checks.row(member, plane, p, v)));
                if (!v.checksWithinEstimate()) {
                    drifting++;
                    err.println("tertius: at " + p + ": " + Checks.drift(v));
                }
            } catch (TertiusException e) {
                unreached++;
                output.row(rows.unreachedRow(p));
                err.println("tertius: target " + p + " not reached: " + e.getMessage());
            }
        }
        output.finish();
        // first integrals that drift beyond their estimates mean a value that cannot be vouched for
        return unreached == 0 && (drifting == 0 || checks.acceptDrift) ? 0 : Main.EXIT_UNREACHED;
    }
}
