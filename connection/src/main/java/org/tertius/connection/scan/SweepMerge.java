package org.tertius.connection.scan;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import org.tertius.core.InvalidInputException;

/**
 * The merge of the shard files of a sweep into the file of the whole sweep: the same bytes as a run of the
 * whole sweep in one process (its header, then every row in task order). Refuses, before anything is written,
 * files that are not shards of one sweep (title, signature or CSV header differ), shards of different splits,
 * a shard given twice, a missing shard, a shard with a missing row (an unfinished job: run it again, it resumes),
 * a row outside its shard and a malformed row. Immutable.
 */
public final class SweepMerge {
    private final Sweep<? extends ScanRow> sweep;
    private final List<String> header;
    private final List<String> rows;

    private SweepMerge(Sweep<? extends ScanRow> sweep, List<String> header, List<String> rows) {
        this.sweep = sweep;
        this.header = header;
        this.rows = rows;
    }

    /**
     * Reads and checks the shard files.
     *
     * @param argument the option that named the files, for error messages
     * @throws InvalidInputException naming {@code argument} and the offending file if the files are not the
     *     complete set of shards of one sweep
     */
    public static SweepMerge of(String argument, List<Path> files) {
        if (files.isEmpty()) {
            throw new InvalidInputException(argument, "no shard files given");
        }
        List<SweepFile> read = new ArrayList<>();
        for (Path f : files) {
            read.add(SweepFile.read(argument, f));
        }
        SweepFile first = read.get(0);
        String signatureText = first.signatureText(argument);
        Shard firstShard = first.shard(argument);
        Map<Integer, SweepFile> byShard = new TreeMap<>();
        for (SweepFile f : read) {
            String s = f.signatureText(argument);
            if (!s.equals(signatureText)) {
                throw new InvalidInputException(argument, f.path() + " is a shard of another sweep than "
                        + first.path() + " (" + SweepSignature.difference(s, signatureText) + ")");
            }
            if (!withoutShard(f.header()).equals(withoutShard(first.header()))) {
                throw new InvalidInputException(argument, f.path() + " has another title or CSV header than "
                        + first.path());
            }
            Shard shard = f.shard(argument);
            if (shard.count() != firstShard.count()) {
                throw new InvalidInputException(argument, f.path() + " is shard " + shard + " but " + first.path()
                        + " is shard " + firstShard + ": shards of different splits of the sweep");
            }
            SweepFile twice = byShard.put(shard.index(), f);
            if (twice != null) {
                throw new InvalidInputException(argument, "shard " + shard + " is given twice: " + twice.path()
                        + " and " + f.path());
            }
        }
        int n = firstShard.count();
        if (byShard.size() != n) {
            throw new InvalidInputException(argument, Shard.missing(byShard.keySet(), n));
        }
        Sweep<? extends ScanRow> sweep = Sweeps.of(SweepSignature.parse(signatureText));
        int size = sweep.size();
        for (Map.Entry<Integer, SweepFile> e : byShard.entrySet()) {
            check(argument, sweep, Shard.of(e.getKey(), n), e.getValue());
        }
        List<String> rows = new ArrayList<>(size);
        for (int task = 0; task < size; task++) {
            rows.add(byShard.get(task % n + 1).rows().get(task));
        }
        return new SweepMerge(sweep, withoutShard(first.header()), Collections.unmodifiableList(rows));
    }

    /** Every task of the shard present, none other, each row readable. */
    private static void check(String argument, Sweep<? extends ScanRow> sweep, Shard shard, SweepFile f) {
        int[] tasks = shard.tasks(sweep.size());
        for (int task : f.rows().keySet()) {
            if (task >= sweep.size() || !shard.contains(task)) {
                throw new InvalidInputException(argument, f.path() + " holds a row of task " + task + ", which is not"
                        + " in shard " + shard + " of this sweep of " + sweep.size() + " tasks");
            }
        }
        for (int task : tasks) {
            String row = f.rows().get(task);
            if (row == null) {
                throw new InvalidInputException(argument, f.path() + " (shard " + shard + ") is incomplete: "
                        + f.rows().size() + " of " + tasks.length + " rows, task " + task + " missing; run the"
                        + " shard again to complete it (it resumes)");
            }
            try {
                sweep.parse(row);
            } catch (InvalidInputException ex) {
                throw new InvalidInputException(argument, f.path() + ": " + ex.getMessage());
            }
        }
    }

    /** The header lines without the shard line. */
    private static List<String> withoutShard(List<String> header) {
        List<String> out = new ArrayList<>();
        for (String line : header) {
            if (!line.startsWith(SweepFile.SHARD)) {
                out.add(line);
            }
        }
        return out;
    }

    /** The sweep the shards belong to. */
    public Sweep<? extends ScanRow> sweep() {
        return sweep;
    }

    /** The header of the whole sweep's file. */
    public List<String> header() {
        return header;
    }

    /** The rows of all tasks in task order, as read. */
    public List<String> rows() {
        return rows;
    }

    /** Draws the merged rows with the sweep's picture. */
    public void plot(Path png) {
        plot(sweep, rows, png);
    }

    private static <R extends ScanRow> void plot(Sweep<R> sweep, List<String> rows, Path png) {
        List<R> parsed = new ArrayList<>(rows.size());
        for (String row : rows) {
            parsed.add(sweep.parse(row));
        }
        sweep.plot(parsed, png);
    }
}
