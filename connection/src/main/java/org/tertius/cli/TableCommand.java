package org.tertius.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.Function;
import org.apache.commons.cli.Options;
import org.tertius.connection.scan.Shard;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;
import org.tertius.core.face.ComputedSolution;
import org.tertius.core.number.ComplexText;
import org.tertius.core.number.ExactPoint;
import org.tertius.core.number.SurfacePoint;
import org.tertius.core.region.Grid;
import org.tertius.core.region.GridResult;
import org.tertius.core.region.PoleFinder;
import org.tertius.core.region.RegionSettings;
import org.tertius.core.region.RegionSolver;
import org.tertius.core.region.RegionTree;
import org.tertius.core.region.Singularity;
import org.tertius.hierarchy.OriginSolution;
import org.tertius.hierarchy.PlaneGrid;

/** Values of any solution on a line or a grid, streamed to CSV, resumable. */
public final class TableCommand implements Command {
    /** Grid rows per band: a band is computed, then written. */
    private static final int BAND = 16;

    final SolutionOptions solution = new SolutionOptions();
    final DigitsOption precision = new DigitsOption("line only: D significant digits in arbitrary precision (exact"
            + " start data, parameters and abscissae)");
    final RegionOptions region = new RegionOptions();
    final PlaneOptions plane = new PlaneOptions();
    String line;
    Path out;
    boolean resume;
    String shard;
    String format;
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
                + " interrupted run keeps them and --resume continues it. Poles met along a line are reported."
                + " --shard I/N computes one share of the points (for one job of a job array); 'tertius merge' joins"
                + " the N shard files into the bytes of the whole table.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solution, precision, region, plane);
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--line", "A:B:N", "N points from A to B (complex), e.g. 0.5:10:200"));
        o.addOption(OptionKinds.value("--out", "FILE", "CSV file (default: standard output)"));
        o.addOption(OptionKinds.flag("--resume", "continue an interrupted run in --out FILE"));
        o.addOption(OptionKinds.value("--shard", "I/N", "compute shard I of N only: the grid rows (line points) k with"
                + " k mod N = I - 1; join the N files with 'tertius merge'"));
        o.addOption(OptionKinds.value("--format", "csv|npy", "csv (default) or npy: a NumPy file of records, one per"
                + " point in the shape of the grid, values as complex fields (needs --out; not resumable)"));
    }

    @Override
    public void read(Arguments a) {
        line = a.text("--line");
        out = a.path("--out");
        resume = a.has("--resume");
        shard = a.text("--shard");
        format = a.choice("--format", "csv", "npy");
    }

    @Override
    public int run(PrintWriter stdout, PrintWriter console) {
        this.stdout = stdout;
        this.console = console;
        ProblemFile f = solution.file();
        solution.monodromy.refuseDigits(precision.given(f));
        Shard part = shard == null ? Shard.WHOLE : Shard.parse("--shard", shard);
        boolean npy = format.equals("npy");
        if (npy) {
            checkNpy(precision.given(f));
        }
        if (plane.given()) {
            if (shard != null) {
                throw new InvalidInputException("--shard", "applies to --line, --grid and --log-strip tables; the"
                        + " (x, t_n) plane is computed with its symmetries in one process");
            }
            if (line != null || region.given()) {
                throw new InvalidInputException("--plane", "give one of --line, --grid, --log-strip and --plane");
            }
            if (precision.given(f)) {
                throw new InvalidInputException("--digits", "the (x, t_n) plane is tabulated in double precision; for"
                        + " many digits take table --line (or eval) at one --times");
            }
            return planeTable();
        }
        String lineSpec = line != null ? line : (region.given() ? null : f.get("line"));
        String gridSpec = region.gridSpec(f, lineSpec != null);
        if ((lineSpec == null) == (gridSpec == null && region.logStrip == null)) {
            throw new InvalidInputException("--line", "give exactly one of --line A:B:N, --grid"
                    + " RE0:RE1:NX,IM0:IM1:NY and --log-strip");
        }
        int k = solution.sheet(region.sheet);
        if (out != null) {
            OutputFile.checkWritable("--out", out);
        }
        ComputedSolution s = solution.solution();
        ValueRows rows = new ValueRows(s);
        if (precision.given(f)) {
            if (lineSpec == null) {
                throw new InvalidInputException("--digits", "applies to --line tables (and eval), not to grids");
            }
            List<ExactPoint> exact = Targets.exactLine("--line", lineSpec, k, s.coordinate());
            WorkLimits.checkPrecise("--line", exact, precision.digits);
            return preciseLine(s, rows, exact, lineSpec, k, TableShard.of(part, exact.size(), 1));
        }
        // every argument is read and checked before the first line is written
        List<SurfacePoint> linePoints = lineSpec == null ? null : Targets.line("--line", lineSpec, k, s.coordinate());
        Grid grid = lineSpec != null ? null : region.grid(gridSpec, k, s.coordinate());
        if (grid != null) {
            grid.checkMemory("--grid", s.valueNames().size());
            String note = RegionOptions.branchPointNote(grid, s.coordinate());
            if (note != null) {
                console.println("tertius: " + note);
            }
        }
        String signature = "tertius table " + solution.describe() + (lineSpec != null ? " line=" + lineSpec
                : " grid=" + gridSpec + " log-strip=" + region.logStrip) + " sheet=" + k;
        int status;
        TableShard share = linePoints != null ? TableShard.of(part, linePoints.size(), 1)
                : TableShard.of(part, grid.ny(), grid.nx());
        TableSink sink = npy ? NpyTable.create(out, rows, linePoints != null ? new int[] {linePoints.size()}
                : new int[] {grid.ny(), grid.nx()})
                : new CsvTable(TableWriter.open(stdout, out, resume, signature, share.line(),
                        solution.withNotes(rows.comments()), rows.columns()), rows);
        try (TableSink w = sink;
             Progress progress = new Progress("table")) {
            // on Ctrl-C the rows computed so far reach a CSV file
            Thread hook = new Thread(w::flushQuietly);
            Runtime.getRuntime().addShutdownHook(hook);
            try {
                if (linePoints != null) {
                    status = line(s, linePoints, share, w, progress);
                } else {
                    status = grid(s, grid, share, w, progress);
                }
                w.finish();
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

    /** Refuses the options that a NumPy file cannot serve, with the reason, before anything is written. */
    private void checkNpy(boolean digits) {
        if (out == null) {
            throw new InvalidInputException("--format", "npy is binary: give --out FILE.npy");
        }
        if (resume) {
            throw new InvalidInputException("--resume", "npy files are written whole (a temporary file moved into"
                    + " place at the end) and cannot be resumed; write CSV for a resumable run");
        }
        if (shard != null) {
            throw new InvalidInputException("--shard", "shards are CSV files (merge joins CSV); drop --format npy");
        }
        if (plane.given()) {
            throw new InvalidInputException("--format", "npy applies to --line, --grid and --log-strip tables; the"
                    + " (x, t_n) plane is written as CSV");
        }
        if (digits) {
            throw new InvalidInputException("--format", "npy holds doubles; --digits tables are CSV (decimal"
                    + " strings)");
        }
    }

    /** The physical plane of a member started at x = t_n = 0: rows x, t_n, q, err (by rows of t_n), resumable. */
    private int planeTable() {
        Grid g = plane.grid();
        if (out != null) {
            OutputFile.checkWritable("--out", out);
        }
        OriginSolution o = PlaneOptions.solution(solution);
        String t = "t_" + o.member().order();
        String signature = "tertius table " + solution.describe() + " plane=" + plane.plane;
        List<String> comments = List.of("member " + o.member().order() + " of the Painleve III hierarchy started at x = "
                + t + " = 0, s = " + o.s() + ", m = " + o.m() + ", a_-2(0) = " + o.originData(),
                "q over the plane of real x and real " + t + "; err and q_err: its estimated absolute error");
        try (TableWriter w = TableWriter.open(stdout, out, resume, signature, comments, ValueRows.planeColumns(t));
             Progress progress = new Progress("table")) {
            long skip = w.existingRows();
            int j0 = (int) (skip / g.nx());
            if (j0 < g.ny()) {
                PlaneGrid.Result r = PlaneOptions.compute(o, g, j0, progress, console);
                for (int j = 0; j < g.ny() - j0; j++) {
                    for (int i = 0; i < g.nx(); i++) {
                        if ((long) (j0 + j) * g.nx() + i < skip) {
                            continue;
                        }
                        w.row(ValueRows.planeRow(g.re(i), g.im(j0 + j), r.q(j, i), r.error(j, i)));
                    }
                    w.flush();
                }
            }
        }
        if (out != null) {
            console.println("tertius: wrote " + out);
        }
        return 0;
    }

    private int preciseLine(ComputedSolution s, ValueRows rows, List<ExactPoint> points, String lineSpec, int k,
                            TableShard share) {
        String signature = "tertius table " + solution.describe() + " line=" + lineSpec + " sheet=" + k
                + " digits=" + precision.digits;
        try (Progress progress = new Progress("table")) {
            // the digits and the exactness of the data are checked here, before the file is opened
            Function<ExactPoint, String> row = precision.rows(s, solution.special.built(), rows, progress);
            try (TableWriter w = TableWriter.open(stdout, out, resume, signature, share.line(),
                    solution.withNotes(precision.comments(rows, solution.special.built())), rows.preciseColumns())) {
                int[] own = share.ownBlocks();
                for (int i = (int) w.existingRows(); i < own.length; i++) {
                    w.row(row.apply(points.get(own[i])));
                    w.flush();
                }
            }
        }
        return 0;
    }

    private int line(ComputedSolution s, List<SurfacePoint> points, TableShard share, TableSink w,
                     Progress progress) {
        int unreached = 0;
        long skip = w.existingRows();
        // the tree is grown along the whole line, also on resume and in a shard: every row is the row of an
        // uninterrupted run of the whole table
        RegionTree tree = RegionTree.growAlong(s, points, RegionSettings.defaults());
        int[] own = share.ownBlocks();
        for (int i = (int) skip; i < own.length; i++) {
            SurfacePoint p = points.get(own[i]);
            try {
                w.value(tree.value(p));
            } catch (TertiusException e) {
                unreached++;
                w.unreached(p.re(), p.im(), p.sheet());
                console.println("tertius: point " + p + " not reached: " + e.getMessage());
            }
            if (i % 16 == 15) {
                w.flush();
            }
            progress.update(i + 1, own.length);
        }
        if (tree.integrated()) {
            for (Singularity pole : PoleFinder.alongLine(tree, points)) {
                String msg = String.format(Locale.ROOT, "%s on the line at %s (lead %s, position error %.1e)",
                        pole.kind().label(), pole.point(), ComplexText.format(pole.lead()), pole.error());
                w.comment(msg);
                console.println("tertius: " + msg);
            }
        }
        w.flush();
        return unreached == 0 ? 0 : Main.EXIT_UNREACHED;
    }

    private int grid(ComputedSolution s, Grid g, TableShard share, TableSink w, Progress progress) {
        long skip = w.existingRows();
        int nx = g.nx();
        int failed = 0;
        // the tree is grown over the whole grid, also on resume and in a shard, so that every band reads the same tree
        RegionTree tree = RegionTree.grow(s, g, RegionSettings.defaults());
        int[] own = share.ownBlocks();
        for (int k = (int) (skip / nx); k < own.length; ) {
            // a band: up to BAND consecutive grid rows of this share
            int j0 = own[k];
            int m = 1;
            while (m < BAND && k + m < own.length && own[k + m] == j0 + m) {
                m++;
            }
            Grid band = g.rows(j0, j0 + m - 1);
            GridResult r = RegionSolver.solve(tree, band, RegionSettings.defaults());
            failed += r.statistics().failed();
            for (int j = 0; j < band.ny(); j++) {
                for (int i = 0; i < nx; i++) {
                    if ((long) (k + j) * nx + i < skip) {
                        continue;
                    }
                    if (r.computed(i, j)) {
                        w.value(r.value(i, j));
                    } else {
                        w.unreached(band.re(i), band.im(j), band.sheet());
                    }
                }
            }
            w.flush();
            k += m;
            progress.update((long) k * nx, (long) own.length * nx);
        }
        return failed == 0 ? 0 : Main.EXIT_UNREACHED;
    }
}
