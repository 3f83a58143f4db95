package org.tertius.connection.scan;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;

/**
 * Runs a sweep of independent classification tasks (one per parameter value) on a thread pool and streams the
 * results as CSV rows in task order (a row is written as soon as it and all rows before it are done, so the
 * output is the same for any number of threads). Resume: rows already present in the output file are read
 * back and their tasks skipped. Each task is a pure function of its index, so a sweep can be split between
 * machines by index range.
 */
public final class ScanRunner {
    /** A classification task. */
    @FunctionalInterface
    public interface Task {
        Classification run(int index, double parameter);
    }

    /** Progress: tasks done (including resumed ones) out of the total. */
    @FunctionalInterface
    public interface Progress {
        void update(int done, int total, Classification last);
    }

    private final int threads;

    public ScanRunner(int threads) {
        if (threads < 1) {
            throw new InvalidInputException("threads", "must be >= 1, got " + threads);
        }
        this.threads = threads;
    }

    /** Parameter values a, a + h, ..., b (n >= 2 values). */
    public static List<Double> grid(double a, double b, int n) {
        List<Double> out = new ArrayList<>();
        for (int i = 0; i < n; i++) {
            out.add(n == 1 ? a : a + (b - a) * i / (n - 1));
        }
        return out;
    }

    /** Rows of an existing output file (empty if it does not exist), keyed by task index. */
    public static Map<Integer, Classification> readExisting(Path file) {
        Map<Integer, Classification> done = new TreeMap<>();
        if (file == null || !Files.exists(file)) {
            return done;
        }
        try (BufferedReader r = Files.newBufferedReader(file, StandardCharsets.UTF_8)) {
            String line;
            while ((line = r.readLine()) != null) {
                if (line.isBlank() || line.startsWith("#") || line.startsWith("index")) {
                    continue;
                }
                Classification c = Classification.parse(line);
                done.put(c.index(), c);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return done;
    }

    /**
     * Runs the tasks not in {@code done} and writes every row (old and new, in index order) to {@code out}.
     * A task that fails is written with kind "failed" and the message goes to the progress listener's row.
     *
     * @return all classifications in index order
     */
    public List<Classification> run(List<Double> parameters, Task task, Map<Integer, Classification> done,
                                    Writer out, Progress progress) throws InterruptedException {
        int total = parameters.size();
        Classification[] result = new Classification[total];
        for (Map.Entry<Integer, Classification> e : done.entrySet()) {
            if (e.getKey() < total) {
                result[e.getKey()] = e.getValue();
            }
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "tertius-scan");
            t.setDaemon(true);
            return t;
        });
        try {
            ExecutorCompletionService<Classification> cs = new ExecutorCompletionService<>(pool);
            int submitted = 0;
            for (int i = 0; i < total; i++) {
                if (result[i] == null) {
                    int idx = i;
                    double p = parameters.get(i);
                    cs.submit(() -> safeRun(task, idx, p));
                    submitted++;
                }
            }
            int written = writeReady(result, 0, out);
            int count = total - submitted;
            for (int k = 0; k < submitted; k++) {
                Classification c = take(cs);
                result[c.index()] = c;
                count++;
                written = writeReady(result, written, out);
                if (progress != null) {
                    progress.update(count, total, c);
                }
            }
        } finally {
            pool.shutdownNow();
        }
        return List.of(result);
    }

    private static Classification safeRun(Task task, int idx, double p) {
        try {
            return task.run(idx, p).withIndex(idx);
        } catch (TertiusException e) {
            return new Classification(idx, p, false, Double.NaN, "failed", "unknown", Double.NaN, Double.NaN);
        }
    }

    private static Classification take(ExecutorCompletionService<Classification> cs) throws InterruptedException {
        try {
            return cs.take().get();
        } catch (ExecutionException e) {
            throw new TertiusException("a scan task failed: " + e.getCause(), e.getCause());
        }
    }

    private static int writeReady(Classification[] result, int from, Writer out) {
        int i = from;
        try {
            while (i < result.length && result[i] != null) {
                out.write(result[i].csvRow());
                out.write('\n');
                i++;
            }
            out.flush();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return i;
    }
}
