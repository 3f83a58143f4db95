package org.tertius.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.DirectoryStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.PathMatcher;
import java.util.ArrayList;
import java.util.List;
import org.apache.commons.cli.Options;
import org.tertius.connection.scan.SweepMerge;
import org.tertius.core.InvalidInputException;

/**
 * Joins the shard files of a sweep ({@code scan --shard}) or of a table ({@code table --shard}) into the file of the
 * whole sweep or table.
 */
public final class MergeCommand implements Command {
    String shards;
    Path output;
    Path plot;

    @Override
    public String name() {
        return "merge";
    }

    @Override
    public String description() {
        return "Join the N shard files of a sweep (written by 'tertius scan --shard I/N') or of a table ('tertius"
                + " table --shard I/N') into the CSV of the whole sweep or table, the same bytes as one process"
                + " writes. The files must be all N shards of one sweep (same parameters, solver settings and"
                + " version) or of one table (same problem, region and options), each complete; otherwise one line"
                + " names the file at fault and nothing is written.";
    }

    @Override
    public void declare(Options o) {
        o.addOption(OptionKinds.required("--shards", "FILES", "the shard files, separated by commas; a name may hold the"
                + " wildcards * and ? (quote it: 'parts/shard-*.csv')"));
        o.addOption(OptionKinds.value("--out", "FILE", "CSV file of the whole sweep; default standard output"));
        o.addOption(OptionKinds.value("--output", "FILE", "the same as --out"));
        o.addOption(OptionKinds.value("--plot", "FILE.png", "PNG picture of the whole sweep (sweeps only)"));
    }

    @Override
    public void read(Arguments a) {
        shards = a.text("--shards");
        if (a.has("--out") && a.has("--output")) {
            throw new UsageException("give --out or --output (the same option), not both");
        }
        output = a.path(a.has("--out") ? "--out" : "--output");
        plot = a.path("--plot");
    }

    @Override
    public int run(PrintWriter out, PrintWriter err) {
        List<Path> files = files("--shards", shards);
        if (output != null) {
            OutputFile.checkWritable("--out", output);
            for (Path f : files) {
                if (sameFile(f, output)) {
                    throw new InvalidInputException("--out", output + " is one of the shard files; give another file");
                }
            }
        }
        if (plot != null) {
            OutputFile.checkPicture("--plot", plot);
        }
        if (!files.isEmpty() && TableMerge.isTable(files.get(0))) {
            return mergeTable(files, out, err);
        }
        SweepMerge merge = SweepMerge.of("--shards", files);
        StringBuilder text = new StringBuilder();
        for (String line : merge.header()) {
            text.append(line).append('\n');
        }
        for (String row : merge.rows()) {
            text.append(row).append('\n');
        }
        if (output == null) {
            out.print(text);
            out.flush();
        } else {
            OutputFile.writeWhole("--out", output, p -> Files.writeString(p, text, StandardCharsets.UTF_8));
        }
        if (plot != null) {
            OutputFile.writeWhole("--plot", plot, merge::plot);
        }
        err.println("tertius: merge: " + files.size() + " shard files, " + merge.rows().size() + " rows"
                + (output == null ? "" : " -> " + output));
        return 0;
    }

    private int mergeTable(List<Path> files, PrintWriter out, PrintWriter err) {
        if (plot != null) {
            throw new InvalidInputException("--plot", "draws sweeps; the shards given are of a table (draw it with"
                    + " 'tertius field')");
        }
        TableMerge merge = TableMerge.of("--shards", files);
        if (output == null) {
            try {
                merge.write(out);
            } catch (IOException e) {
                throw new UncheckedIOException(e);
            }
            out.flush();
        } else {
            OutputFile.writeWhole("--out", output, merge::write);
        }
        err.println("tertius: merge: " + files.size() + " table shard files, " + merge.rows() + " rows"
                + (output == null ? "" : " -> " + output));
        return 0;
    }

    /** The files named by a comma-separated list whose names may hold * and ? (expanded in name order). */
    static List<Path> files(String option, String list) {
        List<Path> out = new ArrayList<>();
        for (String item : list.split(",")) {
            String name = item.trim();
            if (name.isEmpty()) {
                throw new InvalidInputException(option, "empty file name in '" + list + "'");
            }
            Path p = Path.of(name);
            String last = p.getFileName().toString();
            if (!last.contains("*") && !last.contains("?")) {
                out.add(p);
                continue;
            }
            Path dir = p.getParent() == null ? Path.of(".") : p.getParent();
            PathMatcher matcher = dir.getFileSystem().getPathMatcher("glob:" + last);
            List<Path> matches = new ArrayList<>();
            try (DirectoryStream<Path> entries = Files.newDirectoryStream(dir)) {
                for (Path e : entries) {
                    if (matcher.matches(e.getFileName()) && Files.isRegularFile(e)) {
                        matches.add(p.getParent() == null ? e.getFileName() : e);
                    }
                }
            } catch (IOException e) {
                throw new InvalidInputException(option, "cannot list " + dir + ": " + e.getMessage());
            }
            if (matches.isEmpty()) {
                throw new InvalidInputException(option, "no file matches '" + name + "'");
            }
            matches.sort(null);
            out.addAll(matches);
        }
        return out;
    }

    private static boolean sameFile(Path a, Path b) {
        try {
            return Files.exists(a) && Files.exists(b) && Files.isSameFile(a, b);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
