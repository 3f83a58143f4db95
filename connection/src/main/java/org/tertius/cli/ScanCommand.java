package org.tertius.cli;

import java.io.FilterWriter;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.nio.file.attribute.PosixFilePermission;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.apache.commons.cli.Options;
import org.tertius.connection.scan.DecayingSweep;
import org.tertius.connection.scan.ParameterRange;
import org.tertius.connection.scan.PowerFamilySweep;
import org.tertius.connection.scan.ScanRow;
import org.tertius.connection.scan.ScanRunner;
import org.tertius.connection.scan.Shard;
import org.tertius.connection.scan.Sweep;
import org.tertius.connection.scan.SweepFile;
import org.tertius.connection.scan.SweepSignature;
import org.tertius.core.InvalidInputException;

/**
 * A sweep over a family with each member classified: the decaying family over lambda ({@code --range}) or the
 * power family over a rectangle of (sigma, B) ({@code --rectangle}); the whole sweep or one shard of it
 * ({@code --shard}, joined by {@link MergeCommand}); resumable.
 */
public final class ScanCommand implements Command {
    final SolverOptions solver = new SolverOptions();
    String range;
    String rectangle;
    String shard;
    Path output;
    Path plot;
    int threads;

    @Override
    public String name() {
        return "scan";
    }

    @Override
    public String description() {
        return "Sweep a family of PIII(0,0,1,-1) and classify each member, CSV streamed in task order; progress on"
                + " standard error. Either --range: the decaying family w ~ 1 - 2 lambda K0(2x) over lambda (pole-free"
                + " on the positive axis or not, first zero or pole, behaviour at 0); or --rectangle: the power family"
                + " w ~ B x^sigma at 0 over sigma and B (first zero or pole on [1e-4, 10]; the critical curve of the"
                + " pole-free members separates poles from zeros), drawn as a map by --plot. Resume by running the"
                + " same command again with the same --out. --shard I/N runs every N-th task only, for one job of a"
                + " job array; 'tertius merge' joins the N shard files into the file of the whole sweep.";
    }

    @Override
    public List<OptionGroup> groups() {
        return List.of(solver);
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.value("--range", "A:B:N", "decaying family: lambda from A to B, N values"));
        o.addOption(OptionKinds.value("--rectangle", "S0:S1:NS,B0:B1:NB", "power family: sigma from S0 to S1 (NS values,"
                + " equally spaced, |sigma| < 1) and B from B0 to B1 (NB values, geometric, B > 0)"));
        o.addOption(OptionKinds.value("--shard", "I/N", "run shard I of N only (the tasks k with k mod N = I - 1),"
                + " 1 <= I <= N <= " + Shard.MAX_COUNT));
        o.addOption(OptionKinds.value("--out", "FILE", "CSV file (rows already there are kept and their tasks skipped);"
                + " default standard output"));
        o.addOption(OptionKinds.value("--output", "FILE", "the same as --out"));
        o.addOption(OptionKinds.value("--plot", "FILE.png", "PNG picture of the whole sweep (a plot over lambda, a map"
                + " over sigma and B)"));
        o.addOption(OptionKinds.value("--threads", "N", "worker threads (default: processors)"));
    }

    @Override
    public void read(Arguments a) {
        range = a.text("--range");
        rectangle = a.text("--rectangle");
        if ((range == null) == (rectangle == null)) {
            throw new UsageException("give either --range (decaying family) or --rectangle (power family)");
        }
        shard = a.text("--shard");
        if (a.has("--out") && a.has("--output")) {
            throw new UsageException("give --out or --output (the same option), not both");
        }
        output = a.path(a.has("--out") ? "--out" : "--output");
        plot = a.path("--plot");
        Integer n = a.integer("--threads", "an integer >= 1");
        if (n != null && n < 1) {
            throw new InvalidInputException("--threads", "must be an integer >= 1, got " + n);
        }
        threads = n != null ? n : Runtime.getRuntime().availableProcessors();
    }

    @Override
    public int run(PrintWriter out, PrintWriter err) throws InterruptedException {
        Sweep<? extends ScanRow> sweep = sweep();
        Shard part = shard == null ? Shard.WHOLE : Shard.parse("--shard", shard);
        if (plot != null && !part.isWhole()) {
            throw new InvalidInputException("--plot", "a shard holds part of the sweep; draw the picture from its"
                    + " shards with 'tertius merge --plot'");
        }
        if (output != null) {
            OutputFile.checkWritable("--out", output);
        }
        if (plot != null) {
            OutputFile.checkPicture("--plot", plot);
        }
        return execute(sweep, part, out, err);
    }

    private Sweep<? extends ScanRow> sweep() {
        if (range != null) {
            return new DecayingSweep(ParameterRange.parse("--range", range, false), solver.settings());
        }
        String[] p = rectangle.split(",", -1);
        if (p.length != 2) {
            throw new InvalidInputException("--rectangle", "expected S0:S1:NS,B0:B1:NB (sigma in (-1, 1), NS >= 2"
                    + " values; B > 0, NB >= 2 values), got '" + rectangle + "'");
        }
        ParameterRange sigma = ParameterRange.parse("--rectangle", p[0], false);
        if (!(Math.abs(sigma.from()) < 1 && Math.abs(sigma.to()) < 1)) {
            throw new InvalidInputException("--rectangle", "sigma must lie in (-1, 1) (|sigma| = 1 is the"
                    + " logarithmic case), got " + sigma);
        }
        ParameterRange b = ParameterRange.parse("--rectangle", p[1], false);
        if (!(b.from() > 0 && b.to() > 0)) {
            throw new InvalidInputException("--rectangle", "B must be > 0 (its values are spaced geometrically; B < 0"
                    + " is the image w -> -w of B > 0), got " + b.from() + " to " + b.to());
        }
        b = ParameterRange.geometric("--rectangle", b.from(), b.to(), b.count());
        if ((long) sigma.count() * b.count() > PowerFamilySweep.MAX_TASKS) {
            throw new InvalidInputException("--rectangle", sigma.count() + " x " + b.count() + " members is more"
                    + " than the " + PowerFamilySweep.MAX_TASKS + " allowed");
        }
        return new PowerFamilySweep(sigma, b, solver.settings());
    }

    private <R extends ScanRow> int execute(Sweep<R> sweep, Shard part, PrintWriter out, PrintWriter err)
            throws InterruptedException {
        List<String> header = SweepFile.header(sweep, part);
        Map<Integer, R> done = new HashMap<>();
        int written = output != null && Files.exists(output) ? resume(sweep, part, header, done) : 0;
        List<R> rows;
        try (Writer w = start(header, part, sweep.size(), done, written, out)) {
            rows = new ScanRunner(threads).run(sweep, part, done, written, w,
                    (k, total, row) -> err.println("scan: " + k + "/" + total + " " + row.summary()));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        long failed = rows.stream().filter(r -> ScanRow.FAILED.equals(r.kind())).count();
        if (failed > 0) {
            err.println("scan: " + failed + " of " + rows.size() + " members could not be classified to the"
                    + " accuracy (rows of kind 'failed')");
        }
        if (plot != null) {
            OutputFile.writeWhole("--plot", plot, p -> sweep.plot(rows, p));
        }
        return 0;
    }

    /**
     * Reads the rows of an existing output file of this sweep and shard into {@code done}; returns how many of
     * the shard's first tasks it holds without a gap. Refuses a file of another sweep or shard.
     */
    private <R extends ScanRow> int resume(Sweep<R> sweep, Shard part, List<String> header, Map<Integer, R> done) {
        SweepFile existing = SweepFile.read("--out", output);
        List<String> found = existing.header();
        boolean cutInHeader = existing.rows().isEmpty() && found.size() <= header.size()
                && header.subList(0, found.size()).equals(found);
        if (cutInHeader) {
            return 0; // empty, or cut before its first row: started anew
        }
        if (!found.equals(header)) {
            String signature = existing.signatureText("--out");
            String mine = sweep.signature().toString();
            if (!signature.equals(mine)) {
                throw new InvalidInputException("--out", output + " holds rows of another sweep ("
                        + SweepSignature.difference(signature, mine) + "); give another file, or delete it to start anew");
            }
            Shard other = existing.shard("--out");
            if (!other.equals(part)) {
                throw new InvalidInputException("--out", output + " holds " + (other.isWhole() ? "the whole sweep"
                        : "shard " + other) + ", not "
                        + (part.isWhole() ? "the whole sweep" : "shard " + part) + "; give another file");
            }
            throw new InvalidInputException("--out", output + " has another title or CSV header than this sweep;"
                    + " give another file");
        }
        for (Map.Entry<Integer, String> e : existing.rows().entrySet()) {
            int task = e.getKey();
            if (task >= sweep.size() || !part.contains(task)) {
                throw new InvalidInputException("--out", output + " holds a row of task " + task + ", which is not in"
                        + (part.isWhole() ? " this sweep" : " shard " + part));
            }
            try {
                done.put(task, sweep.parse(e.getValue()));
            } catch (InvalidInputException ex) {
                throw new InvalidInputException("--out", output + ": " + ex.getMessage());
            }
        }
        int prefix = 0;
        for (int task : part.tasks(sweep.size())) {
            if (!done.containsKey(task)) {
                break;
            }
            prefix++;
        }
        return prefix;
    }

    /**
     * The writer of the rows: standard output after the header, or the output file rewritten whole (header and
     * the first {@code written} rows, through a temporary file) and then appended to, so that no row already
     * computed is lost if the run is stopped.
     */
    private <R extends ScanRow> Writer start(List<String> header, Shard part, int size, Map<Integer, R> done,
                                             int written, PrintWriter out) throws IOException {
        StringBuilder text = new StringBuilder();
        for (String line : header) {
            text.append(line).append('\n');
        }
        int[] tasks = part.tasks(size);
        for (int k = 0; k < written; k++) {
            text.append(done.get(tasks[k]).csvRow()).append('\n');
        }
        if (output == null) {
            out.print(text);
            out.flush();
            return new KeepOpen(out);
        }
        if (done.isEmpty()) { // nothing to keep: a new file
            Writer w = Files.newBufferedWriter(output, StandardCharsets.UTF_8);
            w.write(text.toString());
            w.flush();
            return w;
        }
        Set<PosixFilePermission> permissions = permissions(output);
        OutputFile.writeWhole("--out", output, p -> Files.writeString(p, text, StandardCharsets.UTF_8));
        if (permissions != null) {
            Files.setPosixFilePermissions(output, permissions); // the temporary file's are the owner's only
        }
        return Files.newBufferedWriter(output, StandardCharsets.UTF_8, StandardOpenOption.APPEND);
    }

    /** The file's POSIX permissions, or null where the file system has none. */
    private static Set<PosixFilePermission> permissions(Path file) throws IOException {
        try {
            return Files.getPosixFilePermissions(file);
        } catch (UnsupportedOperationException e) {
            return null;
        }
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
}
