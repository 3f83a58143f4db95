package org.tertius.cli;

import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * A progress bar on standard error for runs that last more than a second, shown only when standard error is a
 * terminal (so that logs and pipes stay clean). Thread-safe.
 */
final class Progress implements AutoCloseable {
    private static final long DELAY_NANOS = 1_000_000_000L;
    private final String task;
    private final long start = System.nanoTime();
    private final boolean enabled;
    private ProgressBar bar;

    Progress(String task) {
        this.task = task;
        this.enabled = System.console() != null && !Boolean.getBoolean("tertius.noProgress");
    }

    /** Reports done out of total; the bar appears once a second has passed. */
    synchronized void update(long done, long total) {
        if (!enabled) {
            return;
        }
        if (bar == null) {
            if (System.nanoTime() - start < DELAY_NANOS) {
                return;
            }
            bar = new ProgressBarBuilder().setTaskName(task).setInitialMax(total).setStyle(ProgressBarStyle.ASCII)
                    .setUpdateIntervalMillis(200).setConsumer(new ConsoleProgressBarConsumer(System.err))
                    .showSpeed().build();
        }
        bar.maxHint(total);
        bar.stepTo(done);
    }

    @Override
    public synchronized void close() {
        if (bar != null) {
            bar.close();
        }
    }
}
