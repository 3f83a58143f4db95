package org.tertius.connection.scan;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.Map;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorCompletionService;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import org.tertius.core.InvalidInputException;
import org.tertius.core.TertiusException;

/**
 * Runs the tasks of a sweep, or of one shard of it, on a thread pool and streams the rows as CSV lines in task
 * order (a row is written as soon as it and all rows before it are done, so the output is the same for any
 * number of threads). Rows already known (resume) are not run again. Each task is a pure function of its
 * index, so shards run on different machines give, together, the rows of the whole sweep.
 */
public final class ScanRunner {
    /** Progress: tasks done (including resumed ones) out of the shard's total. */
    @FunctionalInterface
    public interface Progress<R> {
        void update(int done, int total, R last);
    }

    private final int threads;

    public ScanRunner(int threads) {
        if (threads < 1) {
            throw new InvalidInputException("threads", "must be >= 1, got " + threads);
        }
        this.threads = threads;
    }

    /**
     * Runs the tasks of {@code shard} that are not in {@code done} and writes the rows of the shard in task order
     * to {@code out}, leaving out the first {@code written} of them (the output holds them already). A task that
     * fails with a {@link TertiusException} gets the sweep's failed row.
     *
     * @param done rows known already, by task index (tasks outside the shard are ignored)
     * @return the rows of the shard's tasks in task order
     */
    public <R extends ScanRow> List<R> run(Sweep<R> sweep, Shard shard, Map<Integer, R> done, int written,
                                           Writer out, Progress<? super R> progress) throws InterruptedException {
        int[] tasks = shard.tasks(sweep.size());
        int total = tasks.length;
        List<R> result = new ArrayList<>(Collections.nCopies(total, null));
        int pending = 0;
        for (int k = 0; k < total; k++) {
            R known = done.get(tasks[k]);
            if (known != null) {
                result.set(k, known);
            } else {
                pending++;
            }
        }
        ExecutorService pool = Executors.newFixedThreadPool(threads, r -> {
            Thread t = new Thread(r, "tertius-scan");
            t.setDaemon(true);
            return t;
        });
        try {
            ExecutorCompletionService<Slot<R>> cs = new ExecutorCompletionService<>(pool);
            for (int k = 0; k < total; k++) {
                if (result.get(k) == null) {
                    int slot = k;
                    int task = tasks[k];
                    cs.submit(() -> new Slot<>(slot, safeRun(sweep, task)));
                }
            }
            int next = writeReady(result, written, out);
            int count = total - pending;
            for (int k = 0; k < pending; k++) {
                Slot<R> s = take(cs);
                result.set(s.slot, s.row);
                count++;
                next = writeReady(result, next, out);
                if (progress != null) {
                    progress.update(count, total, s.row);
                }
            }
        } finally {
            pool.shutdownNow();
        }
        return Collections.unmodifiableList(result);
    }

    /** A finished task and its place in the shard. */
    private static final class Slot<R> {
        final int slot;
        final R row;

        Slot(int slot, R row) {
            this.slot = slot;
            this.row = row;
        }
    }

    private static <R extends ScanRow> R safeRun(Sweep<R> sweep, int task) {
        try {
            return sweep.classify(task);
        } catch (TertiusException e) {
            return sweep.failed(task);
        }
    }

    private static <R> Slot<R> take(ExecutorCompletionService<Slot<R>> cs) throws InterruptedException {
        try {
            return cs.take().get();
        } catch (ExecutionException e) {
            throw new TertiusException("a scan task failed: " + e.getCause(), e.getCause());
        }
    }

    private static <R extends ScanRow> int writeReady(List<R> result, int from, Writer out) {
        int i = from;
        try {
            while (i < result.size() && result.get(i) != null) {
                out.write(result.get(i).csvRow());
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
