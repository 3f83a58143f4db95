package org.tertius.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.commons.cli.Options;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.piii.Painleve3Solution;
import org.tertius.core.region.Grid;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.Singularity;

/** Values on a line or a grid, streamed to CSV, resumable. */
public final class TableCommand implements Command {
    /** Grid rows per band: a band is computed, then written. */
    private static final int BAND = 16;

    final SolutionOptions solution = new SolutionOptions();
    final MemberOptions member = new MemberOptions();
    String line;
    String grid;
    String logStrip;
    Integer sheet;
    Path out;
    boolean resume;
    Integer digits;
    private PrintWriter stdout;
    private PrintWriter console;

    @Override
    public String name() {
        return "table";
    }

    @Override
    public String description() {
        return "Tabulate a solution on a line (--line A:B:N), a grid of one sheet (--grid RE0:RE1:NX,IM0:IM1:NY)"
                + " or a strip in log z (--log-strip) to CSV (columns as eval). Rows are written as computed; an"
                + " interrupted run keeps them and --resume continues it. Poles met along a line are reported.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solution, member);
    }

    @Override
    public void declare(Options o) {
        o.addOption(Opts.value("--line", "A:B:N", "N points from A to B (complex), e.g. 0.5:10:200"));
        o.addOption(Opts.value("--grid", "RE0:RE1:NX,IM0:IM1:NY", "a grid of one sheet"));
        o.addOption(Opts.value("--log-strip", "LOGR0:LOGR1:NX,ARG0:ARG1:NY", Regions.LOG_STRIP_HELP));
        o.addOption(Opts.value("--sheet", "K", "sheet of the points (default 0)"));
        o.addOption(Opts.value("--out", "FILE", "CSV file (default: standard output)"));
        o.addOption(Opts.flag("--resume", "continue an interrupted run in --out FILE"));
        o.addOption(Opts.value("--digits", "D", "line only: D significant digits in arbitrary precision (exact"
                + " start data and parameters)"));
    }

    @Override
    public void read(Arguments a) {
        line = a.text("--line");
        grid = a.text("--grid");
        logStrip = a.text("--log-strip");
        sheet = a.integer("--sheet", null);
        out = a.path("--out");
        resume = a.has("--resume");
        digits = a.integer("--digits", EvalCommand.DIGITS);
    }

    @Override
    public int run(PrintWriter stdout, PrintWriter console) {
        this.stdout = stdout;
        this.console = console;
        ProblemFile f = solution.file();
        String lineSpec = line != null ? line : (grid == null ? f.get("line") : null);
        String gridSpec = grid != null ? grid : (line == null && logStrip == null ? f.get("grid") : null);
        if ((lineSpec == null) == (gridSpec == null && logStrip == null)) {
            throw new InvalidInputException("--line", "give exactly one of --line A:B:N, --grid"
                    + " RE0:RE1:NX,IM0:IM1:NY and --log-strip");
        }
        int k = solution.sheet(sheet);
        member.defaults(f);
        if (member.given()) {
            if (lineSpec == null) {
                throw new InvalidInputException("--member", "hierarchy members are tabulated on lines (--line A:B:N)");
            }
            return memberLine(Targets.line("--line", lineSpec, k), lineSpec, k);
        }
        if (digits == null && f.has("digits")) {
            digits = f.intValue("digits");
        }
        if (digits != null) {
            if (lineSpec == null) {
                throw new InvalidInputException("--digits", "applies to --line tables (and eval), not to grids");
            }
            return highPrecisionLine(Targets.line("--line", lineSpec, k), lineSpec, k);
        }
        Painleve3Solution s = solution.solution();
        String signature = "tertius table " + solution.describe() + (lineSpec != null ? " line=" + lineSpec
                : " grid=" + gridSpec + " log-strip=" + logStrip) + " sheet=" + k;
        List<String> comments = List.of(s.equation() + " [" + s.equation().type().describe() + "]",
                "integrated in the " + s.formDescription(),
                "err: the larger of the estimated absolute errors of w and w'");
        int status;
        try (TableWriter w = TableWriter.open(stdout, out, resume, signature, comments,
                ValueCsv.HEADER);
             Progress progress = new Progress("table")) {
            // on Ctrl-C the rows computed so far reach the file
            Thread hook = new Thread(w::flushQuietly);
            Runtime.getRuntime().addShutdownHook(hook);
            try {
                if (lineSpec != null) {
                    status = line(s, Targets.line("--line", lineSpec, k), w, progress, console);
                } else {
                    status = grid(s, Regions.region(gridSpec, logStrip, k), w, progress);
                }
            } finally {
                try {
                    Runtime.getRuntime().removeShutdownHook(hook);
                } catch (IllegalStateException shuttingDown) {
                    // the hook runs anyway
                }
            }
        }
        if (out != null) {
            console.println("tertius: wrote " + out);
        }
        return status;
    }

    private int memberLine(List<SurfacePoint> points, String lineSpec, int k) {
        org.tertius.hierarchy.MemberSolution ms = member.solution(solution.solver.settings());
        String signature = "tertius table member=" + member.member + " times=" + member.times + " s=" + member.s
                + " m=" + member.m + " x0=" + member.x0 + " state=" + member.state + " origin=" + member.origin
                + " line=" + lineSpec + " sheet=" + k;
        int unreached = 0;
        try (Progress progress = new Progress("table");
             TableWriter w = TableWriter.open(stdout, out, resume, signature,
                     List.of("member " + member.member + " of the Painleve III hierarchy, " + ms.parameters()),
                     MemberOptions.HEADER)) {
            for (int i = (int) w.existingRows(); i < points.size(); i++) {
                try {
                    w.row(MemberOptions.row(ms.evaluate(points.get(i))));
                } catch (TertiusException e) {
                    unreached++;
                    w.row(MemberOptions.unreachedRow(points.get(i)));
                    console.println("tertius: point " + points.get(i) + " not reached: "
                            + e.getMessage());
                }
                w.flush();
                progress.update(i + 1, points.size());
            }
        }
        return unreached == 0 ? 0 : Main.EXIT_UNREACHED;
    }

    private int highPrecisionLine(List<SurfacePoint> points, String lineSpec, int k) {
        String signature = "tertius table " + solution.describe() + " line=" + lineSpec + " sheet=" + k
                + " digits=" + digits;
        try (Progress progress = new Progress("table");
             TableWriter w = TableWriter.open(stdout, out, resume, signature,
                     List.of(solution.equationValue() + ", " + digits + " digits; digits: estimated correct significant"
                             + " digits of w and w'"), HighPrecisionRows.HEADER)) {
            org.tertius.core.piii.HighPrecisionSolution hp = HighPrecisionRows.solution(solution, digits, progress);
            for (int i = (int) w.existingRows(); i < points.size(); i++) {
                w.row(HighPrecisionRows.row(hp.evaluate(points.get(i))));
                w.flush();
            }
        }
        return 0;
    }

    private int line(Painleve3Solution s, List<SurfacePoint> points, TableWriter w, Progress progress,
                     PrintWriter console) {
        int unreached = 0;
        long skip = w.existingRows();
        RegionSolver.growTowards(s, points.subList((int) Math.min(skip, points.size()), points.size()));
        for (int i = (int) skip; i < points.size(); i++) {
            SurfacePoint p = points.get(i);
            try {
                w.row(ValueCsv.row(s.evaluate(p)));
            } catch (TertiusException e) {
                unreached++;
                w.row(ValueCsv.unreachedRow(p));
                console.println("tertius: point " + p + " not reached: " + e.getMessage());
            }
            if (i % 16 == 15) {
                w.flush();
            }
            progress.update(i + 1, points.size());
        }
        for (Singularity pole : polesAlong(s, points)) {
            String msg = String.format(Locale.ROOT, "%s on the line at %s (lead %s, position error %.1e)",
                    pole.kind().label(), pole.point(), pole.lead(), pole.error());
            w.comment(msg);
            console.println("tertius: " + msg);
        }
        w.flush();
        return unreached == 0 ? 0 : Main.EXIT_UNREACHED;
    }

    /** Poles within half a spacing of the segment. */
    static List<Singularity> polesAlong(Painleve3Solution s, List<SurfacePoint> points) {
        List<Singularity> out = new ArrayList<>();
        if (points.size() < 2) {
            return out;
        }
        SurfacePoint a = points.get(0);
        SurfacePoint b = points.get(points.size() - 1);
        double h = Math.hypot(b.re() - a.re(), b.im() - a.im()) / (points.size() - 1);
        double m = Math.max(h, 1e-9);
        Grid box = Grid.of(Math.min(a.re(), b.re()) - m, Math.max(a.re(), b.re()) + m, 2,
                Math.min(a.im(), b.im()) - m, Math.max(a.im(), b.im()) + m, 2, a.sheet());
        for (Singularity p : PoleFinder.find(s, box)) {
            if (p.kind() == Singularity.Kind.POLE && distanceToSegment(p.point(), a, b) <= 0.5 * h + 1e-12) {
                out.add(p);
            }
        }
        return out;
    }

    private static double distanceToSegment(SurfacePoint p, SurfacePoint a, SurfacePoint b) {
        double dx = b.re() - a.re();
        double dy = b.im() - a.im();
        double t = ((p.re() - a.re()) * dx + (p.im() - a.im()) * dy) / (dx * dx + dy * dy);
        t = Math.max(0, Math.min(1, t));
        return Math.hypot(p.re() - (a.re() + t * dx), p.im() - (a.im() + t * dy));
    }

    private int grid(Painleve3Solution s, Grid g, TableWriter w, Progress progress) {
        g.checkMemory("--grid");
        long skip = w.existingRows();
        int nx = g.nx();
        int failed = 0;
        for (int j0 = (int) (skip / nx); j0 < g.ny(); j0 += BAND) {
            int j1 = Math.min(g.ny() - 1, j0 + BAND - 1);
            Grid band = g.rows(j0, j1);
            GridResult r = RegionSolver.solve(s, band, RegionSettings.defaults());
            failed += r.statistics().failed();
            for (int j = 0; j < band.ny(); j++) {
                for (int i = 0; i < nx; i++) {
                    long index = (long) (j0 + j) * nx + i;
                    if (index < skip) {
                        continue;
                    }
                    w.row(r.computed(i, j) ? ValueCsv.row(r.value(i, j)) : pointRow(band, i, j));
                }
            }
            w.flush();
            progress.update((long) (j1 + 1) * nx, (long) g.size());
        }
        return failed == 0 ? 0 : Main.EXIT_UNREACHED;
    }

    private static String pointRow(Grid g, int i, int j) {
        SurfacePoint p = g.point(i, j);
        return p == null ? String.format(Locale.ROOT, "%.17g,%.17g,%d,nan,nan,nan,nan,inf", g.re(i), g.im(j), g.sheet())
                : ValueCsv.unreachedRow(p);
    }
}
