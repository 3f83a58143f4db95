package org.tertius.core.mp;

import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.tertius.core.TertiusException;

/**
 * The threads of the parallel parts of high-precision runs (the continued fractions of the components of a
 * step; the lockstep partner of an expansion, {@link LockstepPartner}; the two accuracies of a
 * {@code HighPrecisionSolution}): a shared pool of daemon threads that grows as
 * needed (tasks may wait for tasks without a deadlock) and lets idle threads go after a minute. On a machine with
 * one processor, or with {@code -Dtertius.parallel=false}, nothing is run in parallel.
 */
public final class Workers {
    /**
     * Whether parallel parts run in parallel: with more than one processor, unless the system property
     * {@code tertius.parallel} is {@code false} (for benchmarks and for hosts that share their processors).
     */
    public static final boolean PARALLEL = Runtime.getRuntime().availableProcessors() > 1
            && !"false".equals(System.getProperty("tertius.parallel"));
    private static final ExecutorService POOL = Executors.newCachedThreadPool(r -> {
        Thread t = new Thread(r, "tertius-high-precision");
        t.setDaemon(true);
        return t;
    });

    private Workers() {
    }

    /** Starts the task on a pool thread. */
    public static <T> Future<T> submit(Callable<T> task) {
        return POOL.submit(task);
    }

    /**
     * Waits for a task's result; its exception (unchecked) is rethrown as it is. When the waiting thread is
     * interrupted, the task is cancelled (its thread interrupted, which a high-precision run notices at its next
     * step) and a {@link TertiusException} reports the cancellation.
     */
    public static <T> T join(Future<T> f) {
        try {
            return f.get();
        } catch (InterruptedException e) {
            f.cancel(true);
            Thread.currentThread().interrupt();
            throw new TertiusException("high-precision computation cancelled (thread interrupted)", e);
        } catch (ExecutionException e) {
            Throwable c = e.getCause();
            if (c instanceof RuntimeException) {
                throw (RuntimeException) c;
            }
            if (c instanceof Error) {
                throw (Error) c;
            }
            throw new TertiusException("high-precision task failed: " + c, c);
        }
    }
}
