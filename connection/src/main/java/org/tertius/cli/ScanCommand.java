package org.tertius.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.apache.commons.cli.Options;
import org.tertius.connection.scan.Classification;
import org.tertius.connection.scan.DecayingClassifier;
import org.tertius.connection.scan.ScanPlot;
import org.tertius.connection.scan.ScanRunner;
import org.tertius.core.InvalidInputException;

/** A sweep of the decaying family over lambda with classification of each member. */
public final class ScanCommand implements Command {
    final SolverOptions solver = new SolverOptions();
    String range;
    Path output;
    Path plot;
    int threads;

    @Override
    public String name() {
        return "scan";
    }

    @Override
    public String description() {
        return "Sweep lambda of the decaying family w ~ 1 - 2 lambda K0(2x) of PIII(0,0,1,-1); classify each member"
                + " (pole-free on the positive axis, first zero or pole, behaviour at 0) to CSV streamed in order;"
                + " progress on standard error; resume by re-running with the same --output.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solver);
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.required("--range", "A:B:N", "lambda from A to B, N values"));
        o.addOption(OptionKinds.value("--out", "FILE", "CSV file (rows already there are kept and their tasks skipped);"
                + " default standard output"));
        o.addOption(OptionKinds.value("--output", "FILE", "the same as --out"));
        o.addOption(OptionKinds.value("--plot", "FILE.png", "PNG plot of the first singularity and sigma"));
        o.addOption(OptionKinds.value("--threads", "N", "worker threads (default: processors)"));
    }

    @Override
    public void read(Arguments a) {
        range = a.text("--range");
        if (a.has("--out") && a.has("--output")) {
            throw new UsageException("give --out or --output (the same option), not both");
        }
        output = a.path(a.has("--out") ? "--out" : "--output");
        plot = a.path("--plot");
        Integer n = a.integer("--threads", "an integer >= 1");
        threads = n != null ? n : Runtime.getRuntime().availableProcessors();
    }

    @Override
    public int run(PrintWriter out, PrintWriter err) throws InterruptedException {
        String[] p = range.split(":");
        if (p.length != 3) {
            throw new InvalidInputException("--range", "expected A:B:N, e.g. 0.05:0.6:50");
        }
        double a = parse(p[0]);
        double b = parse(p[1]);
        int n = Targets.count("--range", p[2], 2);
        List<Double> grid = ScanRunner.grid(a, b, n);
        Map<Integer, Classification> done = ScanRunner.readExisting(output);
        DecayingClassifier classifier = new DecayingClassifier(solver.settings());
        List<Classification> rows;
        try (Writer w = writer(out)) {
            w.write("# decaying family of PIII(0,0,1,-1), w ~ 1 - 2 lambda K0(2x); scan of lambda " + range + "\n");
            w.write(Classification.CSV_HEADER + "\n");
            rows = new ScanRunner(threads).run(grid, classifier::classify, done, w,
                    (k, total, c) -> err.printf(Locale.ROOT, "scan: %d/%d lambda=%.6g %s%n", k, total, c.parameter(),
                            c.kind()));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        if (plot != null) {
            ScanPlot.write(rows, "Decaying family of PIII(0,0,1,-1): first real zero/pole and sigma", "lambda",
                    plot);
        }
        return 0;
    }

    private Writer writer(PrintWriter out) throws IOException {
        if (output == null) {
            return new KeepOpen(out);
        }
        return Files.newBufferedWriter(output, StandardCharsets.UTF_8);
    }

    /** Standard output for the try-with-resources: flushed, not closed. */
    private static final class KeepOpen extends FilterWriter {
        KeepOpen(Writer out) {
            super(out);
        }

        @Override
        public void close() throws IOException {
            flush();
        }
    }

    private static double parse(String s) {
        return EquationOptions.value("--range", s).getReal();
    }
}
